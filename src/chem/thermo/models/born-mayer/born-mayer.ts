import { COULOMB_KJ_A_PER_MOL } from '../../../constants/physical';
import { ChemInputError, requireFiniteInRange } from '../../../result';
import type { StructureType } from '../../thermo.types';
import type { CheckedFormulaUnit } from '../formula-unit';

/**
 * Madelung constants referred to the shortest cation–anion distance r₀, per formula unit, to be used with
 * |z₊z₋| (so the fluorite value 2.51939 × 2 = 5.03878 is the Coulomb sum over CaF₂ in units of e²/r₀).
 * Values from the usual tables (e.g. CRC Handbook, "Madelung constants";
 * Q. C. Johnson & D. H. Templeton, J. Chem. Phys. 34 (1961) 2004) — from memory. Rutile depends on the
 * cell's u parameter; 2.408 is the value for TiO₂'s own cell.
 */
export const MADELUNG_CONSTANTS: Record<StructureType, number> = {
  'rock-salt': 1.74756,
  'caesium-chloride': 1.76267,
  'zinc-blende': 1.63805,
  wurtzite: 1.64132,
  fluorite: 2.51939,
  rutile: 2.408,
};

/** Structure types' formula-unit geometry: r₀ from the formula-unit volume V_m (Å³). */
const R0_FROM_VOLUME: Partial<Record<StructureType, (vA3: number) => number>> = {
  // rock salt: V_m = a³/4, r₀ = a/2
  'rock-salt': (v) => Math.cbrt(4 * v) / 2,
  // CsCl: V_m = a³, r₀ = a√3/2
  'caesium-chloride': (v) => (Math.cbrt(v) * Math.sqrt(3)) / 2,
  // zinc blende and fluorite: V_m = a³/4, r₀ = a√3/4
  'zinc-blende': (v) => (Math.cbrt(4 * v) * Math.sqrt(3)) / 4,
  fluorite: (v) => (Math.cbrt(4 * v) * Math.sqrt(3)) / 4,
};

/** Born–Mayer repulsion range ρ, Å (M. Born & J. E. Mayer, Z. Phys. 75 (1932) 1; 0.345 Å, the value the CRC Handbook's lattice-energy section uses). */
export const BORN_MAYER_RHO_A = 0.345;

export function isStructureType(s: string): s is StructureType {
  return Object.prototype.hasOwnProperty.call(MADELUNG_CONSTANTS, s);
}

export function requireStructureType(s: unknown): StructureType {
  if (typeof s !== 'string' || !isStructureType(s)) {
    throw new ChemInputError(
      'structureType',
      `unknown structure type ${String(s)}`,
      Object.keys(MADELUNG_CONSTANTS).join(', '),
    );
  }
  return s;
}

/**
 * Shortest cation–anion distance r₀ (Å) of a cubic structure type from its formula-unit volume (nm³),
 * or undefined where the geometry is not fixed by the volume alone (wurtzite, rutile).
 */
export function nearestDistanceFromVolumeA(
  structure: StructureType,
  formulaUnitVolumeNm3: number,
): number | undefined {
  const f = R0_FROM_VOLUME[structure];
  return f ? f(formulaUnitVolumeNm3 * 1000) : undefined;
}

export interface BornMayerInput {
  /** Charges and counts, checked once (checkFormulaUnit). */
  formulaUnit: CheckedFormulaUnit;
  structureType: string;
  /** Shortest cation–anion distance r₀, Å. */
  nearestDistanceA: number;
}

/**
 * Born–Mayer lattice potential energy, kJ/mol (> 0):
 * U = 1389.35·M·|z₊z₋| / r₀ · (1 − ρ/r₀), ρ = 0.345 Å.
 * Source: M. Born, J. E. Mayer, Z. Phys. 75 (1932) 1; Coulomb constant from CODATA 2018.
 */
export function bornMayerPotentialKJ(input: BornMayerInput): number {
  const { cationCharge: zc, anionCharge: za } = input.formulaUnit;
  const s = requireStructureType(input.structureType);
  const r0 = requireFiniteInRange('nearestDistanceA', input.nearestDistanceA, 1, 10, 'Å');
  return (
    ((COULOMB_KJ_A_PER_MOL * MADELUNG_CONSTANTS[s] * Math.abs(zc * za)) / r0) *
    (1 - BORN_MAYER_RHO_A / r0)
  );
}

/**
 * Born–Landé lattice potential energy, kJ/mol (> 0): U = 1389.35·M·|z₊z₋|/r₀·(1 − 1/n), n the mean of the
 * ions' Born exponents (Pauling: He 5, Ne 7, Ar 9, Kr 10, Xe 12).
 * Source: M. Born, A. Landé, Verh. Dtsch. Phys. Ges. 20 (1918) 210; L. Pauling, The Nature of the Chemical Bond.
 */
export function bornLandePotentialKJ(input: BornMayerInput & { bornExponent: number }): number {
  const { cationCharge: zc, anionCharge: za } = input.formulaUnit;
  const s = requireStructureType(input.structureType);
  const r0 = requireFiniteInRange('nearestDistanceA', input.nearestDistanceA, 1, 10, 'Å');
  const n = requireFiniteInRange('bornExponent', input.bornExponent, 4, 14);
  return ((COULOMB_KJ_A_PER_MOL * MADELUNG_CONSTANTS[s] * Math.abs(zc * za)) / r0) * (1 - 1 / n);
}

export const BORN_MAYER_SOURCES = [
  'M. Born, J. E. Mayer, Z. Phys. 75 (1932) 1',
  'Madelung constants per formula unit referred to r₀ (rock salt 1.74756, CsCl 1.76267, fluorite 2.51939, …) — from memory of the usual tables',
];
export const BORN_LANDE_SOURCES = [
  'M. Born, A. Landé, Verh. Dtsch. Phys. Ges. 20 (1918) 210',
  'Born exponents: L. Pauling, The Nature of the Chemical Bond (1960)',
];
