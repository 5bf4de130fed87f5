import { ChemInputError } from '../result';

/**
 * Quantile of the standard normal distribution (the inverse of Φ), by the rational approximation of
 * Abramowitz & Stegun 1964, "Handbook of Mathematical Functions", eq. 26.2.23 (Hastings' form;
 * |error| < 4.5 × 10⁻⁴). Constants from that equation (from memory):
 * c₀ 2.515517, c₁ 0.802853, c₂ 0.010328, d₁ 1.432788, d₂ 0.189269, d₃ 0.001308.
 * Accurate enough to place strata of a normal outcome (measure-next/); not for tail probabilities.
 */
const C0 = 2.515517;
const C1 = 0.802853;
const C2 = 0.010328;
const D1 = 1.432788;
const D2 = 0.189269;
const D3 = 0.001308;

export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) {
    throw new ChemInputError(
      'p',
      `${p} is not a probability strictly between 0 and 1`,
      '0 < p < 1',
    );
  }
  const q = p < 0.5 ? p : 1 - p;
  const t = Math.sqrt(-2 * Math.log(q));
  const x = t - (C0 + C1 * t + C2 * t * t) / (1 + D1 * t + D2 * t * t + D3 * t * t * t);
  return p < 0.5 ? -x : x;
}
