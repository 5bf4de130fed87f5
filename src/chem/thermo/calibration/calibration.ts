import { SHIPPED_LATTICE_CALIBRATION } from './calibration.data';
import type {
  CalibratedVariant,
  ChargeClass,
  LatticeCalibration,
  LatticeErrorFigures,
  LatticeFactor,
  ShapeGroup,
  WithheldLatticeFactor,
} from './calibration.types';

/**
 * Calibration of the lattice models' bias.
 *
 * Form: ΔH_L,cal = k · ΔH_L,raw, one factor k per lattice variant and cell, a cell being a charge
 * class (salts of singly charged ions only; salts with an ion of |z| ≥ 2) × a shape group (both
 * ions monatomic with tabulated sizes; a polyatomic or estimated-size ion), k = the median over the
 * cell's reference salts of ΔH_L,reference / ΔH_L,raw. A cell with fewer than
 * {@link CALIBRATION_MIN_SALTS} reference salts keeps the raw model, and so does a cell whose
 * calibrated leave-one-salt-out RMS error is not below the raw model's (VBT on the salts of doubly
 * charged monatomic ions). The calibrated uncertainty is the cell's leave-one-salt-out RMS error.
 *
 * Why this form (measured by fit-calibration.ts on the bundled reference set; ΔH_sol over 60 salts,
 * leave-one-salt-out, auto method; share within ±20 kJ/mol, mean error, RMSE):
 *
 *   raw model                                        27 %  −41.7  74.8 kJ/mol
 *   one factor (median)                              50 %  +20.4  76.6
 *   one affine a·x + b (least squares)               57 %   −3.1  64.9
 *   one additive offset (median)                     58 %   −5.6  62.5
 *   one factor per charge class                      62 %  −13.3  65.7
 *   one factor per charge class × group, cells ≥ 5   68 %   −9.6  75.8
 *   the same, cells ≥ 10 (shipped)                   70 %  −18.0  67.1
 *
 * - Multiplicative, not additive: a factor on Kapustinskii's equation is the same thing as
 *   refitting its constant K — the published 1214 vs 1202.5 kJ·Å/mol choice is such a factor — and
 *   a factor on VBT rescales α and β together. A factor keeps ΔH_L > 0 and every ordering the raw
 *   model has (larger ions, smaller lattice enthalpy), which an offset does not guarantee for large
 *   drug ions.
 * - Per charge class: the raw bias differs (Kapustinskii: median ratio ≈ 1.06 on the salts of
 *   singly charged ions, ≈ 1.00–1.02 with a doubly charged ion), so one factor for all
 *   over-corrects the 2:1 and 2:2 salts by 80–150 kJ/mol; VBT's published constants are
 *   charge-type specific for the same reason. Per shape group: Kapustinskii takes crystal radii
 *   for monatomic ions and thermochemical radii for polyatomic ones, VBT tabulated volumes vs sums
 *   — different inputs with different biases; drug ions fall in the polyatomic group and get the
 *   factor fitted on salts of polyatomic ions (nitrates, perchlorates, ammonium salts, hydroxides,
 *   acetates…).
 * - Cells of at least 10 salts: the one smaller cell (8 sulfates and carbonates) gave a factor that
 *   moved from fold to fold and, through its cross-validated error, switched the auto method to VBT
 *   for three sulfates, worsening them by 100–170 kJ/mol. Those salts keep the raw model.
 * - Median, not least squares: a handful of salts (ZnCl₂, the alkaline-earth sulfates, KH₂PO₄, the
 *   carbonates) are off by 100–250 kJ/mol for structural reasons (covalency, hydrogen bonding, ion
 *   shape) that no scale factor repairs; least squares lets those few set the factor for all.
 *
 * Fitted on lattice enthalpies, not on ΔH_sol: the calibration corrects the lattice model, and
 * fitting it on ΔH_sol would fold the hydration term's errors into it — harmless for the reference
 * salts (their hydration enthalpies are published; the cycle closes to about 2 kJ/mol RMS on the
 * halides, and the polyatomic salts' reference ΔH_L comes from the solution cycle itself) but wrong
 * for drug ions, whose hydration enthalpy comes from the Born model with its own, different error.
 * (Per charge class, the two targets gave the same 62 %.)
 *
 * What it does not do: the goal of 80 % within ±20 kJ/mol is met for the 35 salts of singly charged
 * ions (89 %, raw 14 %) but not for the 25 with a doubly charged ion (44 %, as raw). Their ΔH_L is
 * 1800–3100 kJ/mol, so ±20 kJ/mol is ±0.6–1.1 %, below the model's own scatter (1.7 % RMS on the
 * alkaline-earth halides after calibration, about 5 % on the sulfates and carbonates) — a trend
 * with the anion (fluorides high, iodides low) and structural misfits that a scale factor cannot
 * remove. The hydration term is not what limits it on this set: see the closure above.
 */
export const CALIBRATION_MIN_SALTS = 10;

/** One reference salt as the fit sees it. */
export interface CalibrationRow {
  /** The salt's formula (a salt gives a row per variant; leave-one-salt-out drops them all). */
  id: string;
  variant: CalibratedVariant;
  chargeClass: ChargeClass;
  group: ShapeGroup;
  rawKJ: number;
  referenceKJ: number;
}

export function chargeClassOf(cationCharge: number, anionCharge: number): ChargeClass {
  return Math.abs(cationCharge) === 1 && Math.abs(anionCharge) === 1
    ? 'singly-charged'
    : 'multiply-charged';
}

/** Median of a non-empty list (mean of the middle two for an even count). */
export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

function errorFigures(relErrors: readonly number[]): LatticeErrorFigures {
  const n = relErrors.length;
  return {
    n,
    biasPercent: (relErrors.reduce((a, e) => a + e, 0) / n) * 100,
    rmsPercent: Math.sqrt(relErrors.reduce((a, e) => a + e * e, 0) / n) * 100,
  };
}

/**
 * Fit one factor per (variant, charge class, shape group) with at least `minSalts` rows, and
 * measure each by leave-one-salt-out: every row predicted by the median ratio of the other rows of
 * its cell. A factor whose leave-one-salt-out RMS error is not below the raw model's is withheld
 * (the cell keeps the raw model): calibration is used only where cross-validation shows it helps.
 * Pure and deterministic.
 */
export function fitLatticeCalibration(
  rows: readonly CalibrationRow[],
  minSalts = CALIBRATION_MIN_SALTS,
): LatticeCalibration {
  const cells = new Map<string, CalibrationRow[]>();
  for (const r of rows) {
    const key = `${r.variant}|${r.chargeClass}|${r.group}`;
    const list = cells.get(key) ?? [];
    list.push(r);
    cells.set(key, list);
  }
  const factors: LatticeFactor[] = [];
  const withheld: WithheldLatticeFactor[] = [];
  for (const cell of cells.values()) {
    if (cell.length < minSalts) continue;
    const ratios = cell.map((r) => r.referenceKJ / r.rawKJ);
    const factor = median(ratios);
    const cvErr = cell.map((r, i) => {
      const kOut = median(ratios.filter((_, j) => j !== i));
      return (kOut * r.rawKJ) / r.referenceKJ - 1;
    });
    const fitted: LatticeFactor = {
      variant: cell[0]!.variant,
      chargeClass: cell[0]!.chargeClass,
      group: cell[0]!.group,
      factor,
      n: cell.length,
      raw: errorFigures(cell.map((r) => r.rawKJ / r.referenceKJ - 1)),
      crossValidated: errorFigures(cvErr),
    };
    if (fitted.crossValidated.rmsPercent < fitted.raw.rmsPercent) factors.push(fitted);
    else
      withheld.push({ ...fitted, reason: 'leave-one-salt-out RMS error not below the raw model' });
  }
  const order: CalibratedVariant[] = [
    'kapustinskii',
    'vbt',
    'vbt-ion-volumes',
    'born-mayer',
    'born-lande',
  ];
  const byCell = (a: LatticeFactor, b: LatticeFactor) =>
    order.indexOf(a.variant) - order.indexOf(b.variant) ||
    a.chargeClass.localeCompare(b.chargeClass) ||
    a.group.localeCompare(b.group);
  factors.sort(byCell);
  withheld.sort(byCell);
  return { minSalts, factors, withheld };
}

/** The factor for a variant, charge class and group; undefined where the cell had too few salts. */
export function findLatticeFactor(
  cal: LatticeCalibration,
  variant: CalibratedVariant,
  chargeClass: ChargeClass,
  group: ShapeGroup,
): LatticeFactor | undefined {
  return cal.factors.find(
    (f) => f.variant === variant && f.chargeClass === chargeClass && f.group === group,
  );
}

/** Words for a cell, e.g. `35 singly-charged monatomic-ion reference salts`. */
export function cellLabel(f: LatticeFactor): string {
  const kind = f.group === 'halides' ? 'monatomic-ion' : 'polyatomic-ion';
  return `${f.n} ${f.chargeClass} ${kind} reference salts`;
}

/** The calibrated model's relative uncertainty (1σ, fraction): the cross-validated RMS error. */
export function calibratedRelU(f: LatticeFactor): { rel: number; basis: string } {
  const fig = f.crossValidated;
  return {
    rel: fig.rmsPercent / 100,
    basis:
      `leave-one-salt-out RMS error ${fig.rmsPercent.toFixed(1)} % of calibrated ${f.variant} ` +
      `on ${cellLabel(f)}`,
  };
}

export { SHIPPED_LATTICE_CALIBRATION };
