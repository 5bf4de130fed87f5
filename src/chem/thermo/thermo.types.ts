import type { Estimate } from '../result';

/**
 * Shape of an ion for the lattice-enthalpy correction of volume-based thermodynamics: the number of
 * degrees of freedom n = 3 (monatomic), 5 (linear) or 6 (non-linear polyatomic).
 * Source: H. D. B. Jenkins, H. K. Roobottom, J. Passmore, L. Glasser, Inorg. Chem. 38 (1999) 3609, eq. 2;
 * CRC Handbook of Chemistry and Physics, "Lattice Energies" (Jenkins & Roobottom).
 */
export type IonShape = 'monatomic' | 'linear' | 'nonlinear';

/** One ion as the thermochemistry engine sees it. */
export interface ThermoIon {
  /** Shared ion id (kebab-case English name) for bundled ions; absent for ions built from a formula. */
  id?: string;
  /** Display label, e.g. `Na⁺`, `SO₄²⁻`. */
  label: string;
  /** Charge number z (non-zero integer, sign included). */
  charge: number;
  shape: IonShape;
  /** Radius for Kapustinskii's equation, Å (Goldschmidt/Shannon for metal ions, thermochemical otherwise). */
  radiusA?: Estimate;
  /** Six-coordinate Shannon crystal radius, Å, for Born–Mayer distances (monatomic ions only). */
  crystalRadiusA?: Estimate;
  /** Ion volume for volume-based thermodynamics, nm³. */
  volumeNm3?: Estimate;
  /** Published single-ion hydration enthalpy, kJ/mol (conventional absolute scale), if one exists. */
  hydrationEnthalpyKJ?: Estimate;
  /** Born exponent n for Born–Landé (Pauling), from the ion's noble-gas shell; monatomic ions only. */
  bornExponent?: number;
  /** Molecular formula of the ion (no charge), when known. */
  formula?: string;
  /** Molar mass of the ion, g/mol, when the formula is known. */
  molarMassGPerMol?: number;
  /** True for ions whose size comes from an additive estimate rather than a published table. */
  estimatedSize?: boolean;
  /** Every source behind this ion's numbers. */
  sources: string[];
}

/** Lattice methods the engine offers. */
export type LatticeMethod = 'kapustinskii' | 'born-mayer' | 'born-lande' | 'vbt';

/** Crystal structure types with a tabulated Madelung constant. */
export type StructureType =
  'rock-salt' | 'caesium-chloride' | 'zinc-blende' | 'wurtzite' | 'fluorite' | 'rutile';

export interface SaltThermoRequest {
  cation: ThermoIon;
  anion: ThermoIon;
  /** Cations per formula unit (p in M_pX_q). */
  cationsPerFormula: number;
  /** Anions per formula unit (q in M_pX_q). */
  anionsPerFormula: number;
  method?: 'auto' | LatticeMethod;
  /** Structure type for Born–Mayer / Born–Landé (`rock-salt`, `fluorite`, …). */
  structureType?: string;
  /** Formula-unit volume V_m, nm³ (e.g. V_cell / Z). */
  formulaUnitVolumeNm3?: number;
  /** Measured density, g/cm³ (needs molarMassGPerMol). */
  densityGPerCm3?: number;
  /** Molar mass of the salt formula unit, g/mol (with density). */
  molarMassGPerMol?: number;
  /** Temperature, K (298.15 by default; the models are calibrated at 298.15 K). */
  temperatureK?: number;
}

export interface SaltThermoResult {
  /** Lattice dissociation enthalpy ΔH_L > 0, kJ/mol. */
  latticeEnthalpyKJ: Estimate;
  /** Hydration enthalpy of ONE cation, kJ/mol (< 0). */
  cationHydrationKJ: Estimate;
  /** Hydration enthalpy of ONE anion, kJ/mol (< 0). */
  anionHydrationKJ: Estimate;
  /** Enthalpy of solution at infinite dilution of one formula unit, kJ/mol. */
  solutionEnthalpyKJ: Estimate;
  methodChosen: LatticeMethod;
  methodReason: string;
  signConvention: string;
  /** Formula-unit volume used (VBT), nm³, and where it came from. */
  formulaUnitVolumeNm3?: Estimate;
}

/** One step of a thermochemical cycle, walked in the direction written; exactly one may be unknown. */
export interface CycleStep {
  /** What happens, e.g. `Na(s) → Na(g)`. */
  label: string;
  /** ΔH of the step as written, kJ/mol; `null` for the one unknown. */
  enthalpyKJ: number | null;
  /** Standard uncertainty of the step, kJ/mol (0 if not given). */
  uncertaintyKJ?: number;
  /** How many times the step is taken (e.g. 2 for two Cl atoms); default 1. */
  multiplier?: number;
  source?: string;
}

export interface CycleSolution {
  /** Index of the step that was unknown, or -1 if none was. */
  unknownIndex: number;
  /** The solved enthalpy of the unknown step (per single step, before its multiplier), kJ/mol. */
  unknown?: Estimate;
  /** Every step with its (now known) enthalpy. */
  steps: { label: string; enthalpyKJ: number; multiplier: number; uncertaintyKJ: number }[];
  /** Σ multiplier·ΔH around the cycle, kJ/mol; zero within rounding for a solved cycle. */
  closureKJ: number;
  /** True if |closure| ≤ tolerance (1e-9 of the largest step, or the given data's own uncertainty when all are known). */
  closes: boolean;
}

export interface ValidationRow {
  id: string;
  label: string;
  group: string;
  referenceKJ: number;
  estimateKJ: number;
  errorPercent: number;
  source: string;
}

export interface ModelValidation {
  model: string;
  label: string;
  group: string;
  n: number;
  meanAbsPercentError: number;
  maxAbsPercentError: number;
  signedBiasPercent: number;
  rmsPercentError: number;
  rows: ValidationRow[];
}
