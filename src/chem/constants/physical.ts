/**
 * Physical constants used by the Saltsmith core. Each carries its unit in its name or doc comment
 * and the published release it comes from.
 */

/** Avogadro constant, mol⁻¹. Exact in the 2019 SI (CODATA 2018). */
export const AVOGADRO_PER_MOL = 6.02214076e23;

/** Elementary charge, C. Exact in the 2019 SI (CODATA 2018). */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;

/** Vacuum electric permittivity ε₀, F·m⁻¹ (CODATA 2018 recommended value, relative uncertainty 1.5e-10). */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;

/** Molar gas constant, J·mol⁻¹·K⁻¹. Exact in the 2019 SI (CODATA 2018). */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;

/** Molar gas constant in kJ·mol⁻¹·K⁻¹ (derived from {@link GAS_CONSTANT_J_PER_MOL_K}). */
export const GAS_CONSTANT_KJ_PER_MOL_K = GAS_CONSTANT_J_PER_MOL_K / 1000;

/** Standard temperature for thermochemical tables, K (IUPAC standard state convention, 298.15 K). */
export const STANDARD_TEMPERATURE_K = 298.15;

/**
 * Molar Coulomb constant N_A·e²/(4πε₀), kJ·Å·mol⁻¹ — the energy of two unit charges 1 Å apart,
 * per mole. Computed from the CODATA 2018 constants above: 1389.35 kJ·Å·mol⁻¹.
 */
export const COULOMB_KJ_A_PER_MOL =
  (AVOGADRO_PER_MOL * ELEMENTARY_CHARGE_C ** 2) /
  (4 * Math.PI * VACUUM_PERMITTIVITY_F_PER_M) /
  1e3 /
  1e-10;
