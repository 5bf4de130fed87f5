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
