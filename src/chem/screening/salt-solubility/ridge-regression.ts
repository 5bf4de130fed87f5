/**
 * Ridge regression (Tikhonov-regularised least squares) on standardised predictors, the small,
 * interpretable linear model the salt-solubility estimate uses. Hoerl & Kennard 1970, Technometrics
 * 12, 55 ("Ridge regression: biased estimation for nonorthogonal problems"); the form with centred,
 * unit-variance predictors and an unpenalised intercept is that of Hastie, Tibshirani & Friedman,
 * "The Elements of Statistical Learning", 2nd ed. 2009, §3.4.1, eq. 3.41–3.44:
 * β̂ = (ZᵀZ + λI)⁻¹ Zᵀ(y − ȳ), with Z the standardised predictor matrix.
 */

export interface RidgeModel {
  /** Predictor names, in column order. */
  featureNames: readonly string[];
  /** Mean and standard deviation of each predictor over the training rows (for standardising). */
  featureMeans: readonly number[];
  featureScales: readonly number[];
  /** Intercept (the training mean of y) and coefficients on the standardised predictors. */
  intercept: number;
  coefficients: readonly number[];
  /** Penalty λ on the standardised coefficients. */
  lambda: number;
}

/** Solve A·x = b for a symmetric positive-definite A by Cholesky decomposition (A is k×k). */
export function solveSymmetricPositiveDefinite(
  a: readonly number[][],
  b: readonly number[],
): number[] {
  const k = b.length;
  const l: number[][] = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  for (let i = 0; i < k; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = a[i]![j]!;
      for (let p = 0; p < j; p++) sum -= l[i]![p]! * l[j]![p]!;
      if (i === j) {
        if (!(sum > 0))
          throw new RangeError('solveSymmetricPositiveDefinite: matrix is not positive definite');
        l[i]![i] = Math.sqrt(sum);
      } else {
        l[i]![j] = sum / l[j]![j]!;
      }
    }
  }
  const z = new Array<number>(k).fill(0);
  for (let i = 0; i < k; i++) {
    let sum = b[i]!;
    for (let p = 0; p < i; p++) sum -= l[i]![p]! * z[p]!;
    z[i] = sum / l[i]![i]!;
  }
  const x = new Array<number>(k).fill(0);
  for (let i = k - 1; i >= 0; i--) {
    let sum = z[i]!;
    for (let p = i + 1; p < k; p++) sum -= l[p]![i]! * x[p]!;
    x[i] = sum / l[i]![i]!;
  }
  return x;
}

/**
 * Fit a ridge model. A predictor that is constant over the training rows gets scale 1 and, being
 * all zeros once centred, coefficient 0. λ > 0 keeps the system positive definite.
 */
export function fitRidge(
  featureNames: readonly string[],
  x: readonly (readonly number[])[],
  y: readonly number[],
  lambda: number,
): RidgeModel {
  const n = y.length;
  const k = featureNames.length;
  if (n === 0 || x.length !== n)
    throw new RangeError('fitRidge: x and y must be non-empty and of equal length');
  if (!(lambda > 0)) throw new RangeError('fitRidge: lambda must be positive');
  const means = new Array<number>(k).fill(0);
  const scales = new Array<number>(k).fill(0);
  for (let j = 0; j < k; j++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += x[i]![j]!;
    means[j] = s / n;
    let v = 0;
    for (let i = 0; i < n; i++) v += (x[i]![j]! - means[j]!) ** 2;
    const sd = Math.sqrt(v / n);
    scales[j] = sd > 1e-12 ? sd : 1;
  }
  const yMean = y.reduce((a, b) => a + b, 0) / n;
  const ztz: number[][] = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  const zty = new Array<number>(k).fill(0);
  for (let i = 0; i < n; i++) {
    const z = x[i]!.map((v, j) => (v - means[j]!) / scales[j]!);
    for (let a = 0; a < k; a++) {
      zty[a] = zty[a]! + z[a]! * (y[i]! - yMean);
      for (let b = 0; b < k; b++) ztz[a]![b] = ztz[a]![b]! + z[a]! * z[b]!;
    }
  }
  for (let a = 0; a < k; a++) ztz[a]![a] = ztz[a]![a]! + lambda;
  const coefficients = solveSymmetricPositiveDefinite(ztz, zty);
  return {
    featureNames: [...featureNames],
    featureMeans: means,
    featureScales: scales,
    intercept: yMean,
    coefficients,
    lambda,
  };
}

/** Predict y for one row of raw (unstandardised) predictors. */
export function predictRidge(model: RidgeModel, row: readonly number[]): number {
  let y = model.intercept;
  for (let j = 0; j < model.coefficients.length; j++) {
    y += model.coefficients[j]! * ((row[j]! - model.featureMeans[j]!) / model.featureScales[j]!);
  }
  return y;
}

/** The contribution of each predictor to a prediction, in units of y (coefficient × standardised value). */
export function ridgeContributions(model: RidgeModel, row: readonly number[]): number[] {
  return model.coefficients.map(
    (c, j) => c * ((row[j]! - model.featureMeans[j]!) / model.featureScales[j]!),
  );
}
