/**
 * Precision that follows the uncertainty: the 1σ with two significant digits and the value to the
 * same decimal place — the GUM asks for uncertainties with at most two significant digits and the
 * value to the same place (JCGM 100:2008, §7.2.6; from memory). Used by the Ranking, the sheet and
 * its CSV, so one number reads the same everywhere.
 */
export interface RoundedToUncertainty {
  value: number;
  sigma: number;
  /** Decimal places of both (0 or more; a 1σ of 30 gives 0 and rounds the value to tens). */
  decimals: number;
}

export function roundToUncertainty(value: number, sigma: number): RoundedToUncertainty {
  if (!Number.isFinite(value) || !Number.isFinite(sigma) || sigma <= 0) {
    return { value, sigma, decimals: 3 };
  }
  // The decimal place of σ's second significant digit (at most 6 decimals).
  const place = Math.max(Math.floor(Math.log10(sigma)) - 1, -6);
  const decimals = Math.max(0, -place);
  const step = 10 ** place;
  const round = (x: number) => Number((Math.round(x / step) * step).toFixed(decimals));
  return { value: round(value), sigma: round(sigma), decimals };
}

/** "7.21 ± 0.31", "−161 ± 54" (a typographic minus), from roundToUncertainty. */
export function formatWithUncertainty(value: number, sigma: number): string {
  const r = roundToUncertainty(value, sigma);
  const minus = (s: string) => s.replace(/^-/, '−');
  return `${minus(r.value.toFixed(r.decimals))} ± ${r.sigma.toFixed(r.decimals)}`;
}

/** A quantity with a multiplicative error (a dose number, a solubility in mg/mL) as shown: value and ±1σ range. */
export interface RoundedRange {
  value: number;
  /** value ÷ 10^σ and value × 10^σ (σ in decades), at the same significant digits. */
  low: number;
  high: number;
  digits: number;
}

/**
 * Significant digits for a quantity whose 1σ is a factor (σ in log₁₀ units): the GUM's place of the
 * uncertainty's second significant digit (JCGM 100:2008 §7.2.6), with the upper relative error
 * r = 10^σ − 1 standing for the uncertainty — 1 − ⌊log₁₀ r⌋ digits (r = 0.26 for σ = 0.1 decades:
 * 2; r = 0.023: 3) — but never fewer than two, so that neighbouring candidates stay apart while the
 * ±1σ range beside the value carries the doubt (common practice), and at most six.
 */
export function significantDigitsForLog10Sigma(log10Sigma: number): number {
  if (!Number.isFinite(log10Sigma) || log10Sigma <= 0) return 6;
  const r = 10 ** log10Sigma - 1;
  return Math.min(6, Math.max(2, 1 - Math.floor(Math.log10(r))));
}

const toDigits = (x: number, digits: number) => (x === 0 ? 0 : Number(x.toPrecision(digits)));

/** A multiplicative-error quantity and its ±1σ range, all to {@link significantDigitsForLog10Sigma}. */
export function roundLogNormal(value: number, log10Sigma: number): RoundedRange {
  const digits = significantDigitsForLog10Sigma(log10Sigma);
  const f = Number.isFinite(log10Sigma) && log10Sigma > 0 ? 10 ** log10Sigma : 1;
  return {
    value: toDigits(value, digits),
    low: toDigits(value / f, digits),
    high: toDigits(value * f, digits),
    digits,
  };
}

/**
 * Decimal places of a candidate's score (0–1). The score carries no 1σ of its own; two decimals
 * resolve 0.01, half the 0.02 below which the separation statistic calls a criterion the same for
 * every candidate (src/chem/screening/separation.ts; common practice).
 */
export const SCORE_DECIMALS = 2;

/** A score as shown and exported: {@link SCORE_DECIMALS} decimal places. */
export function roundScore(score: number): number {
  return Number(score.toFixed(SCORE_DECIMALS));
}

/**
 * The 1σ of a proportion counted over Monte Carlo draws: the binomial √(p(1−p)/n), and at least that
 * of one draw in n (1/n), so that a proportion of 0 or 1 still says how many draws it rests on.
 */
export function monteCarloProportionSigma(p: number, draws: number): number {
  return Math.max(Math.sqrt((p * (1 - p)) / draws), 1 / draws);
}
