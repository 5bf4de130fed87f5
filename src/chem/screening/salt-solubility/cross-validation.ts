import {
  leastSolubleAmongLowestPredicted,
  rootMeanSquareError,
  spearmanRho,
} from './rank-statistics';
import {
  featureRow,
  SALT_SOLUBILITY_FEATURES,
  type SaltSolubilityFeature,
} from './salt-solubility-features';
import {
  fitOn,
  predictSaltSolubility,
  type FittedSaltSolubilityModel,
  type SaltSolubilityModelKind,
  type SaltSolubilityTrainingRow,
} from './fit-salt-solubility';

/**
 * Judging the salt-solubility model. Validation is leave-one-drug-out (LODO): every drug's salts are
 * predicted by a model fitted without that drug, because a new compound meets the model the same
 * way. Whatever is chosen from data — the penalty λ, and the variant (variant-choice.ts) — is chosen
 * again inside each training fold by an inner LODO over the remaining drugs only (nested
 * cross-validation), so a reported error never saw the held-out drug in any way (Varma & Simon 2006,
 * BMC Bioinformatics 7, 91, on the optimism of choosing on the folds used for reporting).
 */

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
  /** The variant chosen inside this fold, when the procedure chooses one. */
  variant?: string;
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
  /** Series with three or more salts (those the ρ and the least-soluble count are taken over). */
  nRankedSeries: number;
  nSalts: number;
  nDrugs: number;
}

function median(xs: readonly number[]): number {
  if (xs.length === 0) return Number.NaN;
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

export function drugIds(rows: readonly SaltSolubilityTrainingRow[]): string[] {
  return [...new Set(rows.map((r) => r.drugId))].sort();
}

/** What one fold's procedure returns for the held-out drug's salts. */
export interface FoldPrediction {
  predicted: number[];
  lambda: number;
  /** The variant the procedure chose inside this fold (nested variant choice), if it chooses one. */
  variant?: string;
}

/**
 * A fitting procedure as cross-validation sees it: given the training rows only, predict the test
 * rows. Everything it learns must come from `train` — the leakage test in
 * tests/chem/screening/salt-solubility/cross-validation.test.ts checks that a held-out drug's own
 * measurements never reach its predictions.
 */
export type FoldProcedure = (
  train: readonly SaltSolubilityTrainingRow[],
  test: readonly SaltSolubilityTrainingRow[],
) => FoldPrediction;

/** The procedure "fit these predictors with this λ rule, predict". */
export function fixedVariantProcedure(
  features: readonly SaltSolubilityFeature[],
  kind: SaltSolubilityModelKind,
  lambdaFor: (train: readonly SaltSolubilityTrainingRow[]) => number,
): FoldProcedure {
  return (train, test) => {
    const lambda = lambdaFor(train);
    const m = fitOn(train, features, lambda, kind);
    return { predicted: predictRows(m, features, test), lambda };
  };
}

export function predictRows(
  m: FittedSaltSolubilityModel,
  features: readonly SaltSolubilityFeature[],
  rows: readonly SaltSolubilityTrainingRow[],
): number[] {
  return rows.map((r) =>
    predictSaltSolubility(m, featureRow(r.input, features), r.input.drug.log10IntrinsicM),
  );
}

/** Out-of-fold predictions only (no figures): every salt predicted by the procedure without its drug. */
export function lodoPredictions(
  rows: readonly SaltSolubilityTrainingRow[],
  procedure: FoldProcedure,
): { drugId: string; test: SaltSolubilityTrainingRow[]; fold: FoldPrediction }[] {
  return drugIds(rows).map((id) => {
    const train = rows.filter((r) => r.drugId !== id);
    const test = rows.filter((r) => r.drugId === id);
    return { drugId: id, test, fold: procedure(train, test) };
  });
}

/** λ with the lowest LODO RMSE over `rows` (ties → the larger λ, the simpler model). */
export function chooseLambda(
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[] = SALT_SOLUBILITY_FEATURES,
  grid: readonly number[] = RIDGE_LAMBDA_GRID,
  kind: SaltSolubilityModelKind = 'pooled',
): number {
  // Without a predictor λ changes nothing: skip the search.
  if (features.length === 0) return grid[grid.length - 1]!;
  let best = grid[grid.length - 1]!;
  let bestErr = Number.POSITIVE_INFINITY;
  for (const lambda of [...grid].reverse()) {
    const folds = lodoPredictions(
      rows,
      fixedVariantProcedure(features, kind, () => lambda),
    );
    const err = rootMeanSquareError(
      folds.flatMap((f) => f.fold.predicted),
      folds.flatMap((f) => f.test.map((r) => r.log10DrugM)),
    );
    if (err < bestErr - 1e-12) {
      bestErr = err;
      best = lambda;
    }
  }
  return best;
}

/** Leave-one-drug-out cross-validation of any procedure, with today's anchor on the same folds. */
export function crossValidateWith(
  rows: readonly SaltSolubilityTrainingRow[],
  procedure: FoldProcedure,
): CrossValidationReport {
  const folds: DrugFoldResult[] = lodoPredictions(rows, procedure).map(({ drugId, test, fold }) => {
    const measured = test.map((r) => r.log10DrugM);
    const anchor = test.map((r) => r.anchorLog10DrugM);
    const predicted = fold.predicted;
    return {
      drugId,
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
      lambda: fold.lambda,
      ...(fold.variant ? { variant: fold.variant } : {}),
    };
  });
  return summariseFolds(folds);
}

function summariseFolds(folds: DrugFoldResult[]): CrossValidationReport {
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
    nRankedSeries: ranked.length,
    nSalts: folds.reduce((s, f) => s + f.n, 0),
    nDrugs: folds.length,
  };
}

/** Nested leave-one-drug-out cross-validation of one variant (λ chosen inside each fold). */
export function crossValidateByDrug(
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[] = SALT_SOLUBILITY_FEATURES,
  grid: readonly number[] = RIDGE_LAMBDA_GRID,
  kind: SaltSolubilityModelKind = 'pooled',
): CrossValidationReport {
  return crossValidateWith(
    rows,
    fixedVariantProcedure(features, kind, (train) => chooseLambda(train, features, grid, kind)),
  );
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
