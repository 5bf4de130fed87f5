import { ChemInputError, requireFiniteInRange, type Estimate } from '../../result';

/**
 * Kapustinskii's constant in the form the CRC Handbook of Chemistry and Physics, "Lattice Energies"
 * (H. D. B. Jenkins and H. K. Roobottom), uses: U_POT = 121.4·ν·|z₊z₋|/(r₊ + r₋)·(1 − 0.0345/(r₊ + r₋))
 * kJ/mol with radii in nm, i.e. 1214 kJ·Å·mol⁻¹ with radii in Å.
 * Original: A. F. Kapustinskii, Q. Rev. Chem. Soc. 10 (1956) 283–294.
 */
export const KAPUSTINSKII_K_KJ_A_PER_MOL = 1214;

/** Repulsion range ρ in Kapustinskii's equation, Å (Kapustinskii 1956; CRC form, 0.0345 nm). */
export const KAPUSTINSKII_RHO_A = 0.345;

export interface KapustinskiiInput {
  /** Cation charge number z₊ (positive integer). */
  cationCharge: number;
  /** Anion charge number z₋ (negative integer). */
  anionCharge: number;
  /** Cation radius, Å. */
  cationRadiusA: number;
  /** Anion radius, Å. */
  anionRadiusA: number;
  /** Ions per formula unit ν; defaults to the count implied by the charges (e.g. 3 for MX₂). */
  ionsPerFormulaUnit?: number;
}

/** Greatest common divisor of two positive integers. */
function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * Formula-unit stoichiometry of a salt from its ion charges: p cations and q anions with
 * p·z₊ = q·|z₋| in lowest terms.
 */
export function stoichiometryFromCharges(cationCharge: number, anionCharge: number) {
  const zc = Math.round(cationCharge);
  const za = Math.round(Math.abs(anionCharge));
  const g = gcd(zc, za);
  return { cations: za / g, anions: zc / g };
}

/**
 * Lattice potential energy by Kapustinskii's equation, kJ/mol (dissociation sign convention: positive,
 * MX(s) → M⁺(g) + X⁻(g)).
 *
 * U_POT = K·ν·|z₊z₋| / (r₊ + r₋) · (1 − ρ/(r₊ + r₋)), K = 1214 kJ·Å·mol⁻¹, ρ = 0.345 Å.
 * Valid for ionic solids whose ions are near-spherical; the uncertainty attached here is a placeholder
 * of 5 % until the validation report supplies the measured error (see thermochemistry engine).
 */
export function kapustinskiiLatticeEnergyKJ(input: KapustinskiiInput): Estimate {
  const zc = requireFiniteInRange('cationCharge', input.cationCharge, 1, 4);
  const za = requireFiniteInRange('anionCharge', input.anionCharge, -4, -1);
  if (!Number.isInteger(zc) || !Number.isInteger(za)) {
    throw new ChemInputError('charge', 'charges must be whole numbers', 'integers, cation +1…+4, anion −1…−4');
  }
  const rc = requireFiniteInRange('cationRadiusA', input.cationRadiusA, 0.1, 10, 'Å');
  const ra = requireFiniteInRange('anionRadiusA', input.anionRadiusA, 0.1, 10, 'Å');
  const stoich = stoichiometryFromCharges(zc, za);
  const nu = input.ionsPerFormulaUnit ?? stoich.cations + stoich.anions;
  requireFiniteInRange('ionsPerFormulaUnit', nu, 2, 20);
  const d = rc + ra;
  const value =
    ((KAPUSTINSKII_K_KJ_A_PER_MOL * nu * Math.abs(zc * za)) / d) * (1 - KAPUSTINSKII_RHO_A / d);
  return {
    value,
    uncertainty: 0.05 * value,
    method: 'kapustinskii',
    sources: [
      'A. F. Kapustinskii, Q. Rev. Chem. Soc. 10 (1956) 283',
      'H. D. B. Jenkins, H. K. Roobottom, "Lattice Energies", CRC Handbook of Chemistry and Physics',
    ],
  };
}
