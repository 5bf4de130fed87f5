/**
 * Precision that follows the uncertainty: a value is written to the decimal place of its 1σ, and the
 * 1σ with one significant figure (two when its first digit is 1 or 2, so that rounding does not
 * change it by more than ~25 %). The GUM asks for uncertainties with at most two significant digits
 * and the value to the same place (JCGM 100:2008, §7.2.6; from memory); the 1-or-2 choice is common
 * practice. Used by the app, the sheet, the CSV and the CLI, so one number reads the same everywhere.
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
  const exp = Math.floor(Math.log10(sigma));
  const lead = Math.floor(sigma / 10 ** exp);
  const place = lead <= 2 ? exp - 1 : exp; // the last significant decimal place of σ
  const step = 10 ** place;
  const round = (x: number) => Number((Math.round(x / step) * step).toFixed(Math.max(0, -place)));
  return { value: round(value), sigma: round(sigma), decimals: Math.max(0, -place) };
}

/** "7.2 ± 0.3", "−160 ± 50" (a typographic minus), from roundToUncertainty. */
export function formatWithUncertainty(value: number, sigma: number): string {
  const r = roundToUncertainty(value, sigma);
  const minus = (s: string) => s.replace(/^-/, '−');
  return `${minus(r.value.toFixed(r.decimals))} ± ${r.sigma.toFixed(r.decimals)}`;
}
