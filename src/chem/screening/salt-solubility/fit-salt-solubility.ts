import { fitRidge, predictRidge, type RidgeModel } from './ridge-regression';
import {
  featureRow,
  type SaltSolubilityFeature,
  type SaltSolubilityInput,
} from './salt-solubility-features';

/**
 * Fitting the salt-solubility model on a set of training rows (one fit, one λ). Pure functions; how
 * the model is judged (leave-one-drug-out, nested) lives in cross-validation.ts, the choice of the
 * shipped variant in variant-choice.ts, and the file I/O in fixtures/reference/fit-salt-solubility.ts.
 *
 * A variant with no predictor at all (`features` empty, kind `within-series`) is the no-descriptor
 * baseline: log₁₀ S₀ plus the average offset of the training series.
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

export function groupBy<T>(xs: readonly T[], key: (x: T) => string): Map<string, T[]> {
  const m = new Map<string, T[]>();
  for (const x of xs) m.set(key(x), [...(m.get(key(x)) ?? []), x]);
  return m;
}

export function fitOn(
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
