/**
 * Properties of liquid water used across the core — one definition each, with its source.
 */

/**
 * Molar mass of water, g/mol: 2 × 1.008 + 15.999 = 18.015, from the IUPAC conventional standard atomic
 * weights (CIAAW 2021: H 1.008, O 15.999).
 */
export const WATER_MOLAR_MASS_G_PER_MOL = 2 * 1.008 + 15.999;

/**
 * Relative permittivity ε_r of water at 298.15 K: 78.36 (D. G. Archer & P. Wang, J. Phys. Chem. Ref.
 * Data 19 (1990) 371 — from memory; checked against the CRC Handbook fit below, which gives 78.36).
 */
export const WATER_RELATIVE_PERMITTIVITY_298K = 78.36;

/** dε_r/dT of water at 298.15 K, K⁻¹: −0.361 (Archer & Wang 1990 — from memory; the CRC fit gives −0.355). */
export const WATER_DPERMITTIVITY_DT_298K_PER_K = -0.361;

/**
 * ε_r of water at temperature T (K), 273–373 K: ε_r = A + B·T + C·T² with A = 249.21, B = −0.79069 K⁻¹,
 * C = 0.00072997 K⁻² (CRC Handbook of Chemistry and Physics, "Permittivity (Dielectric Constant) of
 * Liquids", fit for water — from memory, checked 2026-12-01 against the CRC fit table reproduced in
 * CalebBell/chemicals "Permittivity (Dielectric Constant) of Liquids.tsv"). 78.36 at 298.15 K, the value
 * of {@link WATER_RELATIVE_PERMITTIVITY_298K}.
 */
export function waterRelativePermittivity(temperatureK: number): number {
  return 249.21 - 0.79069 * temperatureK + 0.00072997 * temperatureK * temperatureK;
}
