/**
 * Rank statistics for judging a solubility model within one series of salts.
 * Spearman's rank correlation ρ is Pearson's correlation of the ranks, ties given their mean rank
 * (Spearman 1904, Am. J. Psychol. 15, 72; tie handling as in Press et al., "Numerical Recipes",
 * 3rd ed. 2007, §14.6).
 */

/** Ranks 1..n of the values, ties sharing their mean rank. */
export function fractionalRanks(values: readonly number[]): number[] {
  const order = values.map((v, i) => ({ v, i })).sort((a, b) => a.v - b.v);
  const ranks = new Array<number>(values.length).fill(0);
  let start = 0;
  while (start < order.length) {
    let end = start;
    while (end + 1 < order.length && order[end + 1]!.v === order[start]!.v) end++;
    const meanRank = (start + end) / 2 + 1;
    for (let p = start; p <= end; p++) ranks[order[p]!.i] = meanRank;
    start = end + 1;
  }
  return ranks;
}

/** Pearson's correlation; NaN when either series is constant or shorter than 2. */
export function pearsonCorrelation(x: readonly number[], y: readonly number[]): number {
  const n = x.length;
  if (n < 2 || y.length !== n) return Number.NaN;
  const mx = x.reduce((a, b) => a + b, 0) / n;
  const my = y.reduce((a, b) => a + b, 0) / n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxy += (x[i]! - mx) * (y[i]! - my);
    sxx += (x[i]! - mx) ** 2;
    syy += (y[i]! - my) ** 2;
  }
  if (sxx === 0 || syy === 0) return Number.NaN;
  return sxy / Math.sqrt(sxx * syy);
}

/** Spearman's ρ; NaN when either series has no spread (e.g. one value predicted for every salt). */
export function spearmanRho(x: readonly number[], y: readonly number[]): number {
  return pearsonCorrelation(fractionalRanks(x), fractionalRanks(y));
}

/** Root-mean-square of the differences predicted − measured. */
export function rootMeanSquareError(
  predicted: readonly number[],
  measured: readonly number[],
): number {
  const n = predicted.length;
  if (n === 0) return Number.NaN;
  let s = 0;
  for (let i = 0; i < n; i++) s += (predicted[i]! - measured[i]!) ** 2;
  return Math.sqrt(s / n);
}

/**
 * Whether the least soluble salt (by measurement) is among the `k` lowest predicted. Ties in the
 * prediction count against the model: a salt tied with others at the cut is "among the lowest" only
 * if fewer than k salts are predicted strictly lower.
 */
export function leastSolubleAmongLowestPredicted(
  predicted: readonly number[],
  measured: readonly number[],
  k = 2,
): boolean {
  if (predicted.length === 0) return false;
  let worst = 0;
  for (let i = 1; i < measured.length; i++) if (measured[i]! < measured[worst]!) worst = i;
  const p = predicted[worst]!;
  const strictlyLower = predicted.filter((v) => v < p).length;
  const tied = predicted.filter((v) => v === p).length;
  return strictlyLower + tied <= k;
}
