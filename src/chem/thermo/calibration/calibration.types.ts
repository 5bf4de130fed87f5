/**
 * Shapes of the lattice-enthalpy calibration (see calibration.ts for the form and why it was
 * chosen). Units: kJ/mol for enthalpies, % for relative errors, fractions for shares.
 */

/** Salts of singly charged ions only (1:1) versus salts with at least one ion of |z| ≥ 2. */
export type ChargeClass = 'singly-charged' | 'multiply-charged';

/**
 * The kind of salt used to pick a measured uncertainty, as in the uncalibrated engine: both ions
 * monatomic with tabulated sizes ('halides'), or at least one polyatomic or estimated-size ion
 * ('polyatomic').
 */
export type ShapeGroup = 'halides' | 'polyatomic';

/** A lattice method with where its volume came from (VBT: cell or density vs ion volumes). */
export type CalibratedVariant =
  'kapustinskii' | 'vbt' | 'vbt-ion-volumes' | 'born-mayer' | 'born-lande';

/** Error of one variant on one cell (charge class × shape group) of the lattice reference salts. */
export interface LatticeErrorFigures {
  n: number;
  /** Mean of (model/reference − 1), %. */
  biasPercent: number;
  /** RMS of (model/reference − 1), %. */
  rmsPercent: number;
}

/** One calibration factor: ΔH_L,cal = factor × ΔH_L,raw for one variant, charge class and group. */
export interface LatticeFactor {
  variant: CalibratedVariant;
  chargeClass: ChargeClass;
  group: ShapeGroup;
  /** Median over the cell's reference salts of ΔH_L,reference / ΔH_L,raw. */
  factor: number;
  /** Reference salts the factor was fitted on. */
  n: number;
  /** The raw model's error on the same salts (no calibration, nothing fitted). */
  raw: LatticeErrorFigures;
  /**
   * Calibrated error, leave-one-salt-out: each salt predicted by a factor fitted without it. Its
   * RMS is the calibrated model's stated uncertainty for salts of this cell.
   */
  crossValidated: LatticeErrorFigures;
}

/** A cell with enough salts whose factor is not used, with the figures that decided it. */
export interface WithheldLatticeFactor extends LatticeFactor {
  reason: string;
}

/** The fitted calibration: one factor per (variant, charge class, group) with enough salts. */
export interface LatticeCalibration {
  /** Smallest number of reference salts a cell needs to get a factor. */
  minSalts: number;
  factors: LatticeFactor[];
  /** Cells whose calibrated leave-one-salt-out RMS error is not below the raw model's: kept raw. */
  withheld: WithheldLatticeFactor[];
}

/** ΔH_sol by Hess's law against the reference values, one set of figures. */
export interface SolutionErrorFigures {
  n: number;
  /** Mean error (estimate − reference), kJ/mol. */
  biasKJ: number;
  meanAbsErrorKJ: number;
  rmsErrorKJ: number;
  /** Share of salts with |error| ≤ 20 kJ/mol, fraction. */
  shareWithin20KJ: number;
  /** Share of salts whose reference lies within the stated ±2σ, fraction. */
  coverage2Sigma: number;
}

/** What calibration.data.ts ships: the coefficients, how they were made, and what they achieve. */
export interface ShippedLatticeCalibration extends LatticeCalibration {
  form: string;
  fittedOn: string;
  provenance: string;
  /** ΔH_sol over the solution reference salts: raw vs calibrated engine (leave-one-salt-out). */
  solution: { raw: SolutionErrorFigures; calibratedCrossValidated: SolutionErrorFigures };
}
