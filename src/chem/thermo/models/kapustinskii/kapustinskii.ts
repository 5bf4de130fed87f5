import { ChemInputError, requireFiniteInRange } from '../../../result';
import { saltStoichiometryFromCharges } from '../../../compound/salt-stoichiometry';
import type { CheckedFormulaUnit } from '../formula-unit';

/**
 * Kapustinskii's constant in the form the CRC Handbook of Chemistry and Physics, "Lattice Energies"
 * (H. D. B. Jenkins and H. K. Roobottom), uses: U_POT = 121.4·ν·|z₊z₋|/(r₊ + r₋)·(1 − 0.0345/(r₊ + r₋))
 * kJ/mol with radii in nm, i.e. 1214 kJ·Å·mol⁻¹ with radii in Å (half the rock-salt Madelung constant
 * times the molar Coulomb constant: 0.87378 × 1389.35 = 1214.0).
 * Original: A. F. Kapustinskii, Q. Rev. Chem. Soc. 10 (1956) 283–294.
 */
export const KAPUSTINSKII_K_KJ_A_PER_MOL = 1214;

/**
 * The constant of the form of the equation most textbooks quote, with the same repulsion term:
 * U_POT = 1202.5·ν·|z₊z₋|/(r₊ + r₋)·(1 − 0.345/(r₊ + r₋)) kJ/mol, radii in Å, i.e.
 * 1.2025 × 10⁻⁴ J·m·mol⁻¹ — from memory of textbook quotations of Kapustinskii 1956. (The
 * 1.079 × 10⁻⁴ J·m·mol⁻¹ = 1079 kJ·Å·mol⁻¹ also quoted belongs to the simplified form without the
 * repulsion term, U_POT = 1079·ν·|z₊z₋|/(r₊ + r₋); from memory, not used here.) The validation compares
 * 1214 and 1202.5 in the form with the repulsion term; see `kapustinskiiVariants`.
 */
export const KAPUSTINSKII_K_ALT_KJ_A_PER_MOL = 1202.5;

/** Repulsion range ρ in Kapustinskii's equation, Å (Kapustinskii 1956; CRC form, 0.0345 nm). */
export const KAPUSTINSKII_RHO_A = 0.345;

export interface KapustinskiiInput {
  /** Charges and counts, checked once (checkFormulaUnit); ν = p + q. */
  formulaUnit: CheckedFormulaUnit;
  /** Cation radius, Å. */
  cationRadiusA: number;
  /** Anion radius, Å. */
  anionRadiusA: number;
  /** Kapustinskii constant, kJ·Å·mol⁻¹ (default {@link KAPUSTINSKII_K_KJ_A_PER_MOL}). */
  constantKJA?: number;
}

/**
 * Formula-unit stoichiometry of a salt from its ion charges: p cations and q anions with
 * p·z₊ = q·|z₋| in lowest terms (the cation in the first place of saltStoichiometryFromCharges).
 */
export function stoichiometryFromCharges(cationCharge: number, anionCharge: number) {
  const zc = Math.round(cationCharge);
  const za = Math.round(Math.abs(anionCharge));
  if (zc <= 0 || za <= 0) {
    throw new ChemInputError('charge', 'charges must be non-zero', 'cation +1…+4, anion −1…−4');
  }
  const st = saltStoichiometryFromCharges(zc, za);
  return { cations: st.drugPerSalt, anions: st.counterIonPerSalt };
}

/**
 * Lattice potential energy U_POT by Kapustinskii's equation, kJ/mol (dissociation sign convention: positive,
 * MX(s) → M⁺(g) + X⁻(g)), as a plain number.
 *
 * U_POT = K·ν·|z₊z₋| / (r₊ + r₋) · (1 − ρ/(r₊ + r₋)), K = 1214 kJ·Å·mol⁻¹, ρ = 0.345 Å.
 * Valid for ionic solids of near-spherical ions; radii 0.35–10 Å (so r₊ + r₋ > 2ρ, where the repulsion term keeps its meaning).
 */
export function kapustinskiiPotentialKJ(input: KapustinskiiInput): number {
  const u = input.formulaUnit;
  const rc = requireFiniteInRange('cationRadiusA', input.cationRadiusA, 0.35, 10, 'Å');
  const ra = requireFiniteInRange('anionRadiusA', input.anionRadiusA, 0.35, 10, 'Å');
  const nu = u.cationsPerFormula + u.anionsPerFormula;
  const k = requireFiniteInRange(
    'constantKJA',
    input.constantKJA ?? KAPUSTINSKII_K_KJ_A_PER_MOL,
    1000,
    1500,
    'kJ·Å/mol',
  );
  const d = rc + ra;
  return ((k * nu * Math.abs(u.cationCharge * u.anionCharge)) / d) * (1 - KAPUSTINSKII_RHO_A / d);
}

export const KAPUSTINSKII_SOURCES = [
  'A. F. Kapustinskii, Q. Rev. Chem. Soc. 10 (1956) 283',
  'H. D. B. Jenkins, H. K. Roobottom, "Lattice Energies", CRC Handbook of Chemistry and Physics',
];
