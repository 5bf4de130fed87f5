/**
 * The standard normal cumulative distribution Φ(z) = ½ [1 + erf(z/√2)], with erf from Abramowitz &
 * Stegun, *Handbook of Mathematical Functions* (1964), eq. 7.1.26 (a rational approximation with
 * |ε(x)| ≤ 1.5 × 10⁻⁷ for x ≥ 0; the odd symmetry erf(−x) = −erf(x) covers x < 0). Its five
 * coefficients and p are those printed under 7.1.26.
 */
const P = 0.3275911;
const A = [0.254829592, -0.284496736, 1.421413741, -1.453152027, 1.061405429] as const;

/** erf(x) by Abramowitz & Stegun 7.1.26 (absolute error ≤ 1.5 × 10⁻⁷). */
export function erf(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  const sign = x < 0 ? -1 : 1;
  const ax = Math.abs(x);
  const t = 1 / (1 + P * ax);
  const poly = t * (A[0] + t * (A[1] + t * (A[2] + t * (A[3] + t * A[4]))));
  return sign * (1 - poly * Math.exp(-ax * ax));
}

/** Φ(z), the probability that a standard normal variable lies below z. */
export function normalCdf(z: number): number {
  if (z === Infinity) return 1;
  if (z === -Infinity) return 0;
  return 0.5 * (1 + erf(z / Math.SQRT2));
}
