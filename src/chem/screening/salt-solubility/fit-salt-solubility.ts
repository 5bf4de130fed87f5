import { fitRidge, predictRidge, type RidgeModel } from './ridge-regression';
import {
  leastSolubleAmongLowestPredicted,
  rootMeanSquareError,
  spearmanRho,
} from './rank-statistics';
import {
  featureRow,
  SALT_SOLUBILITY_FEATURES,
  type SaltSolubilityFeature,
  type SaltSolubilityInput,
} from './salt-solubility-features';

/**
 * Fitting and judging the salt-solubility model. Pure functions: the script
 * fixtures/reference/fit-salt-solubility.ts reads the published reference set, computes the
 * counter-ion descriptors with openchemlib and calls these; the test suite calls the same functions
 * and checks that the shipped coefficients are what the script produces.
 *
 * Validation is leave-one-drug-out (LODO): every drug's salts are predicted by a model fitted without
 * that drug, because a new compound meets the model the same way. The penalty λ is itself chosen
 * inside each training fold by an inner LODO over the remaining drugs (nested cross-validation), so the
 * reported error never saw the held-out drug in any way (Varma & Simon 2006, BMC Bioinformatics 7,
 * 91, on the optimism of choosing a parameter on the folds used for reporting).
 */

export interface SaltSolubilityTrainingRow {
  drugId: string;
  /** Label of the salt for reports, e.g. "ephedrine · maleate (1:1)". */
  label: string;
  input: SaltSolubilityInput;
  /** Measured: log₁₀ of the drug's molar solubility from the salt in water, mol/L of drug. */
  log10DrugM: number;
  /** Today's anchor estimate for the same salt (10² × S₀, nudged by ΔH_sol), log₁₀ mol/L of drug. */
  anchorLog10DrugM: number;
}

/** Penalties tried for λ, on standardised predictors (a log grid; our choice). */
export const RIDGE_LAMBDA_GRID: readonly number[] = [0.1, 0.3, 1, 3, 10, 30, 100, 300];

export interface DrugFoldResult {
  drugId: string;
  n: number;
  labels: string[];
  measured: number[];
  predicted: number[];
  anchor: number[];
  rmse: number;
  anchorRmse: number;
  /** Spearman ρ of predicted vs measured within the drug's series (NaN if the prediction is flat). */
  spearman: number;
  anchorSpearman: number;
  leastSolubleInLowestTwo: boolean;
  anchorLeastSolubleInLowestTwo: boolean;
  /** λ chosen by the inner cross-validation for this fold. */
  lambda: number;
}

export interface CrossValidationReport {
  folds: DrugFoldResult[];
  /** RMSE over all salts, log₁₀ units (each salt predicted by a model that never saw its drug). */
  rmse: number;
  anchorRmse: number;
  /** Mean per-drug Spearman ρ over drugs with ≥ 3 salts (flat predictions count as 0; NaN with no such drug). */
  meanSpearman: number;
  anchorMeanSpearman: number;
  /** Median of the same. */
  medianSpearman: number;
  anchorMedianSpearman: number;
  /** Share of drugs (≥ 3 salts) whose least soluble salt is among the two lowest predicted. */
  leastSolubleHitRate: number;
  anchorLeastSolubleHitRate: number;
  nSalts: number;
  nDrugs: number;
}

function median(xs: readonly number[]): number {
  if (xs.length === 0) return Number.NaN;
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

/**
 * Two ways to fit the same predictors:
 * - `pooled`: one ridge regression of log₁₀ S over every salt (the drug's S₀ is a predictor);
 * - `within-series`: the fixed-effects form used for grouped data (e.g. Wooldridge, "Econometric
 *   Analysis of Cross Section and Panel Data", 2nd ed. 2010, §10.5): the counter-ion slopes are fitted
 *   on the differences between salts of the same drug only (each series centred on its own mean), the
 *   level as log₁₀ S₀ plus the average offset of the series. What tells one drug's salts apart is
 *   then learnt only from comparisons the same authors made on the same drug.
 */
export type SaltSolubilityModelKind = 'pooled' | 'within-series';

export interface FittedSaltSolubilityModel {
  kind: SaltSolubilityModelKind;
  ridge: RidgeModel;
  /** within-series: average of (series mean of log₁₀ S − log₁₀ S₀ − slope part); pooled: 0. */
  level: number;
}

export function predictSaltSolubility(
  m: FittedSaltSolubilityModel,
  row: readonly number[],
  log10IntrinsicM: number,
): number {
  if (m.kind === 'pooled') return predictRidge(m.ridge, row);
  return log10IntrinsicM + m.level + slopePart(m.ridge, row);
}

/** Σ βⱼ·xⱼ on the raw scale (the within-series fit has no intercept; the level carries it). */
function slopePart(r: RidgeModel, row: readonly number[]): number {
  let y = 0;
  for (let j = 0; j < r.coefficients.length; j++)
    y += (r.coefficients[j]! * row[j]!) / r.featureScales[j]!;
  return y;
}

function groupBy<T>(xs: readonly T[], key: (x: T) => string): Map<string, T[]> {
  const m = new Map<string, T[]>();
  for (const x of xs) m.set(key(x), [...(m.get(key(x)) ?? []), x]);
  return m;
}

function fitOn(
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[],
  lambda: number,
  kind: SaltSolubilityModelKind = 'pooled',
): FittedSaltSolubilityModel {
  const names = features.map((f) => f.name);
  if (kind === 'pooled') {
    return {
      kind,
      level: 0,
      ridge: fitRidge(
        names,
        rows.map((r) => featureRow(r.input, features)),
        rows.map((r) => r.log10DrugM),
        lambda,
      ),
    };
  }
  // Centre features and (log S − log S₀) within each drug; the drug-level predictors drop out.
  const x: number[][] = [];
  const y: number[] = [];
  const series = [...groupBy(rows, (r) => r.drugId).values()];
  for (const g of series) {
    const fx = g.map((r) => featureRow(r.input, features));
    const fy = g.map((r) => r.log10DrugM - r.input.drug.log10IntrinsicM);
    const mx = names.map((_, j) => fx.reduce((s, v) => s + v[j]!, 0) / g.length);
    const my = fy.reduce((s, v) => s + v, 0) / g.length;
    fx.forEach((v, i) => {
      x.push(v.map((xj, j) => xj - mx[j]!));
      y.push(fy[i]! - my);
    });
  }
  const ridge = fitRidge(names, x, y, lambda);
  // The slopes act on raw predictors (slopePart); the means kept here are those of every training
  // salt, so that a salt's contributions read "relative to the average published salt".
  const allRows = rows.map((r) => featureRow(r.input, features));
  const allMeans = names.map((_, j) => allRows.reduce((s, v) => s + v[j]!, 0) / allRows.length);
  const centred: RidgeModel = { ...ridge, intercept: 0, featureMeans: allMeans };
  const offsets = series.map(
    (g) =>
      g.reduce(
        (s, r) =>
          s +
          r.log10DrugM -
          r.input.drug.log10IntrinsicM -
          slopePart(centred, featureRow(r.input, features)),
        0,
      ) / g.length,
  );
  return { kind, ridge: centred, level: offsets.reduce((s, v) => s + v, 0) / offsets.length };
}

function drugIds(rows: readonly SaltSolubilityTrainingRow[]): string[] {
  return [...new Set(rows.map((r) => r.drugId))].sort();
}

/** One fold: fit without drug `id`, predict that drug's salts. */
function heldOutDrug(
  rows: readonly SaltSolubilityTrainingRow[],
  id: string,
  features: readonly SaltSolubilityFeature[],
  lambda: (train: readonly SaltSolubilityTrainingRow[]) => number,
  kind: SaltSolubilityModelKind,
): { test: SaltSolubilityTrainingRow[]; predicted: number[]; lambda: number } {
  const train = rows.filter((r) => r.drugId !== id);
  const test = rows.filter((r) => r.drugId === id);
  const l = lambda(train);
  const m = fitOn(train, features, l, kind);
  const predicted = test.map((r) =>
    predictSaltSolubility(m, featureRow(r.input, features), r.input.drug.log10IntrinsicM),
  );
  return { test, predicted, lambda: l };
}

/** λ with the lowest LODO RMSE over `rows` (ties → the larger λ, the simpler model). */
export function chooseLambda(
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[] = SALT_SOLUBILITY_FEATURES,
  grid: readonly number[] = RIDGE_LAMBDA_GRID,
  kind: SaltSolubilityModelKind = 'pooled',
): number {
  const ids = drugIds(rows);
  let best = grid[grid.length - 1]!;
  let bestErr = Number.POSITIVE_INFINITY;
  for (const lambda of [...grid].reverse()) {
    const pred: number[] = [];
    const meas: number[] = [];
    for (const id of ids) {
      const fold = heldOutDrug(rows, id, features, () => lambda, kind);
      pred.push(...fold.predicted);
      meas.push(...fold.test.map((r) => r.log10DrugM));
    }
    const err = rootMeanSquareError(pred, meas);
    if (err < bestErr - 1e-12) {
      bestErr = err;
      best = lambda;
    }
  }
  return best;
}

/** Nested leave-one-drug-out cross-validation of the model, with today's anchor on the same folds. */
export function crossValidateByDrug(
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[] = SALT_SOLUBILITY_FEATURES,
  grid: readonly number[] = RIDGE_LAMBDA_GRID,
  kind: SaltSolubilityModelKind = 'pooled',
): CrossValidationReport {
  const ids = drugIds(rows);
  const folds: DrugFoldResult[] = [];
  for (const id of ids) {
    const { test, predicted, lambda } = heldOutDrug(
      rows,
      id,
      features,
      (train) => chooseLambda(train, features, grid, kind),
      kind,
    );
    const measured = test.map((r) => r.log10DrugM);
    const anchor = test.map((r) => r.anchorLog10DrugM);
    folds.push({
      drugId: id,
      n: test.length,
      labels: test.map((r) => r.label),
      measured,
      predicted,
      anchor,
      rmse: rootMeanSquareError(predicted, measured),
      anchorRmse: rootMeanSquareError(anchor, measured),
      spearman: spearmanRho(predicted, measured),
      anchorSpearman: spearmanRho(anchor, measured),
      leastSolubleInLowestTwo: leastSolubleAmongLowestPredicted(predicted, measured, 2),
      anchorLeastSolubleInLowestTwo: leastSolubleAmongLowestPredicted(anchor, measured, 2),
      lambda,
    });
  }
  const ranked = folds.filter((f) => f.n >= 3);
  const rho = (x: number) => (Number.isNaN(x) ? 0 : x);
  const all = (k: 'predicted' | 'anchor' | 'measured') => folds.flatMap((f) => f[k]);
  return {
    folds,
    rmse: rootMeanSquareError(all('predicted'), all('measured')),
    anchorRmse: rootMeanSquareError(all('anchor'), all('measured')),
    meanSpearman: ranked.reduce((s, f) => s + rho(f.spearman), 0) / ranked.length,
    anchorMeanSpearman: ranked.reduce((s, f) => s + rho(f.anchorSpearman), 0) / ranked.length,
    medianSpearman: median(ranked.map((f) => rho(f.spearman))),
    anchorMedianSpearman: median(ranked.map((f) => rho(f.anchorSpearman))),
    leastSolubleHitRate: ranked.filter((f) => f.leastSolubleInLowestTwo).length / ranked.length,
    anchorLeastSolubleHitRate:
      ranked.filter((f) => f.anchorLeastSolubleInLowestTwo).length / ranked.length,
    nSalts: rows.length,
    nDrugs: ids.length,
  };
}

/** The shipped model: λ by LODO over every drug, then one fit on every salt. */
export function fitSaltSolubilityModel(
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[] = SALT_SOLUBILITY_FEATURES,
  grid: readonly number[] = RIDGE_LAMBDA_GRID,
  kind: SaltSolubilityModelKind = 'pooled',
): FittedSaltSolubilityModel {
  return fitOn(rows, features, chooseLambda(rows, features, grid, kind), kind);
}
