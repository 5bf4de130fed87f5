/**
 * Ordinary least squares for a straight line y = intercept + slope·x, with the standard errors of
 * both parameters from the residual variance (any statistics text, e.g. Montgomery & Runger,
 * "Applied Statistics and Probability for Engineers", ch. 11: s² = SSE/(n − 2),
 * se(slope) = s/√Sxx, se(intercept) = s·√(1/n + x̄²/Sxx)).
 */
export interface LinearFit {
  slope: number;
  intercept: number;
  slopeStandardError: number;
  interceptStandardError: number;
  /** Coefficient of determination; 1 for a perfect fit (and for constant y). */
  rSquared: number;
  residuals: number[];
  degreesOfFreedom: number;
  n: number;
}

/** Fit y = a + b·x. Needs ≥ 2 points and ≥ 2 distinct x values (throws RangeError otherwise). */
export function linearLeastSquares(x: readonly number[], y: readonly number[]): LinearFit {
  const n = x.length;
  if (n !== y.length) throw new RangeError('linearLeastSquares: x and y differ in length');
  if (n < 2) throw new RangeError('linearLeastSquares: needs at least two points');
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i]!;
    sy += y[i]!;
  }
  const mx = sx / n;
  const my = sy / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - mx;
    const dy = y[i]! - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  if (!(sxx > 0)) throw new RangeError('linearLeastSquares: all x values are equal');
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  const residuals = x.map((xi, i) => y[i]! - (intercept + slope * xi));
  const sse = residuals.reduce((acc, r) => acc + r * r, 0);
  const dof = n - 2;
  const s2 = dof > 0 ? sse / dof : 0;
  return {
    slope,
    intercept,
    slopeStandardError: Math.sqrt(s2 / sxx),
    interceptStandardError: Math.sqrt(s2 * (1 / n + (mx * mx) / sxx)),
    rSquared: syy > 0 ? Math.max(0, 1 - sse / syy) : 1,
    residuals,
    degreesOfFreedom: dof,
    n,
  };
}
