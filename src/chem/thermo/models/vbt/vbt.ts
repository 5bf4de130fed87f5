import { AVOGADRO_PER_MOL } from '../../../constants/physical';
import { requireFiniteInRange } from '../../../result';
import type { CheckedFormulaUnit } from '../formula-unit';

/**
 * Volume-based thermodynamics constants α (kJ·mol⁻¹·nm) and β (kJ/mol) for U_POT = 2I(α/V_m^(1/3) + β).
 * H. D. B. Jenkins, H. K. Roobottom, J. Passmore, L. Glasser, Inorg. Chem. 38 (1999) 3609, Table 2;
 * L. Glasser, H. D. B. Jenkins, J. Am. Chem. Soc. 122 (2000) 632. Values recalled
 * from memory — the validation measures how well they reproduce the reference set.
 */
export const VBT_CONSTANTS = {
  /** MX, charges 1:1 */
  '1:1': { alphaKJNm: 117.3, betaKJ: 51.9 },
  /** MX₂, charges 2:1 (M²⁺, 2 X⁻) */
  '2:1': { alphaKJNm: 133.5, betaKJ: 60.9 },
  /** M₂X, charges 1:2 (2 M⁺, X²⁻) */
  '1:2': { alphaKJNm: 165.3, betaKJ: -29.8 },
  /** general fit for other salts */
  general: { alphaKJNm: 138.7, betaKJ: 27.6 },
} as const;

/**
 * Electrostatic conversion factor A for U_POT = A·I·(2I/V_m)^(1/3), kJ·mol⁻¹·nm, for 5000 < U_POT ≤ 70 000
 * kJ/mol ("estimates within ±7 %"): L. Glasser, H. D. B. Jenkins, J. Am. Chem. Soc. 122 (2000) 632, abstract
 * (read 2026-12-01: A = 121.39).
 */
export const GLASSER_A_KJ_NM = 121.39;

export const VBT_SOURCES = [
  'H. D. B. Jenkins, H. K. Roobottom, J. Passmore, L. Glasser, Inorg. Chem. 38 (1999) 3609',
  'L. Glasser, H. D. B. Jenkins, J. Am. Chem. Soc. 122 (2000) 632',
];

/** Ionic strength factor I = ½Σnᵢzᵢ² of a formula unit M_pX_q. */
export function ionicStrengthFactor(
  cationCharge: number,
  anionCharge: number,
  p: number,
  q: number,
): number {
  return 0.5 * (p * cationCharge ** 2 + q * anionCharge ** 2);
}

/** Each α, β row with its key, made once (frozen: every salt of a kind shares it). */
const VBT_ROWS = {
  '1:1': Object.freeze({ key: '1:1' as const, ...VBT_CONSTANTS['1:1'] }),
  '2:1': Object.freeze({ key: '2:1' as const, ...VBT_CONSTANTS['2:1'] }),
  '1:2': Object.freeze({ key: '1:2' as const, ...VBT_CONSTANTS['1:2'] }),
  general: Object.freeze({ key: 'general' as const, ...VBT_CONSTANTS.general }),
};

/** Which α, β row applies to a salt. */
export function vbtConstantsFor(cationCharge: number, anionCharge: number, p: number, q: number) {
  const zc = Math.abs(cationCharge);
  const za = Math.abs(anionCharge);
  if (p === 1 && q === 1 && zc === 1 && za === 1) return VBT_ROWS['1:1'];
  if (p === 1 && q === 2 && zc === 2 && za === 1) return VBT_ROWS['2:1'];
  if (p === 2 && q === 1 && zc === 1 && za === 2) return VBT_ROWS['1:2'];
  return VBT_ROWS.general;
}

export interface VbtInput {
  /** Charges and counts, checked once (checkFormulaUnit). */
  formulaUnit: CheckedFormulaUnit;
  /** Formula-unit volume V_m, nm³ (0.005–10). */
  formulaUnitVolumeNm3: number;
}

/**
 * Lattice potential energy by VBT, kJ/mol (> 0): U_POT = 2I(α/V_m^(1/3) + β); where that exceeds
 * 5000 kJ/mol, Glasser's form U_POT = A·I·(2I/V_m)^(1/3) (A = 121.4 kJ·mol⁻¹·nm), as Glasser & Jenkins
 * recommend for highly charged lattices.
 */
export function vbtPotentialKJ(input: VbtInput): { valueKJ: number; form: string } {
  const t = vbtTerms(input);
  if (t.glasser) return { valueKJ: t.valueKJ, form: 'Glasser A·I·(2I/V_m)^(1/3)' };
  const c = t.constants;
  return {
    valueKJ: t.valueKJ,
    form: `2I(α/V_m^(1/3) + β), ${c.key} constants α = ${c.alphaKJNm}, β = ${c.betaKJ}`,
  };
}

/**
 * {@link vbtPotentialKJ}'s value alone (the same operations, without the words of its form): what a
 * ΔH_sol needs when its cycle's notes are not shown (solution-enthalpy-numbers.ts).
 */
export function vbtPotentialValueKJ(input: VbtInput): number {
  return vbtTerms(input).valueKJ;
}

/** U_POT and which form gave it (see vbtPotentialKJ). */
function vbtTerms(input: VbtInput): {
  valueKJ: number;
  glasser: boolean;
  constants: ReturnType<typeof vbtConstantsFor>;
} {
  const {
    cationCharge: zc,
    anionCharge: za,
    cationsPerFormula: p,
    anionsPerFormula: q,
  } = input.formulaUnit;
  const volumeNm3 = requireFiniteInRange(
    'formulaUnitVolumeNm3',
    input.formulaUnitVolumeNm3,
    0.005,
    10,
    'nm³',
  );
  const i = ionicStrengthFactor(zc, za, p, q);
  const c = vbtConstantsFor(zc, za, p, q);
  const potentialKJ = 2 * i * (c.alphaKJNm / Math.cbrt(volumeNm3) + c.betaKJ);
  if (potentialKJ > 5000) {
    const valueKJ = GLASSER_A_KJ_NM * i * Math.cbrt((2 * i) / volumeNm3);
    return { valueKJ, glasser: true, constants: c };
  }
  return { valueKJ: potentialKJ, glasser: false, constants: c };
}

/** Formula-unit volume from density: V_m = M / (ρ·N_A), nm³ (M in g/mol, ρ in g/cm³). */
export function volumeFromDensityNm3(molarMassGPerMol: number, densityGPerCm3: number): number {
  const massGPerMol = requireFiniteInRange('molarMassGPerMol', molarMassGPerMol, 1, 10000, 'g/mol');
  const rhoGPerCm3 = requireFiniteInRange('densityGPerCm3', densityGPerCm3, 0.3, 25, 'g/cm³');
  return (massGPerMol / (rhoGPerCm3 * AVOGADRO_PER_MOL)) * 1e21;
}
