import { describe, expect, it } from 'vitest';
import { brentRoot, createSeededRandom, linearLeastSquares } from '@/chem/numerics';

describe('brentRoot', () => {
  it('finds √2 as the root of x² − 2 (exact value known in closed form)', () => {
    const r = brentRoot((x) => x * x - 2, 0, 2, 1e-14);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.root - Math.SQRT2)).toBeLessThan(1e-13);
  });
  it('finds the Dottie number, the fixed point of cos x, 0.739085133215161 (OEIS A003957)', () => {
    const r = brentRoot((x) => Math.cos(x) - x, 0, 1, 1e-15);
    expect(Math.abs(r.root - 0.739085133215161)).toBeLessThan(1e-12);
  });
  it('refuses a bracket without a sign change', () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(RangeError);
  });
});

describe('linearLeastSquares', () => {
  it('recovers an exact line with zero standard errors', () => {
    const x = [1, 2, 3, 4];
    const f = linearLeastSquares(
      x,
      x.map((v) => 3 - 2 * v),
    );
    expect(f.slope).toBeCloseTo(-2, 12);
    expect(f.intercept).toBeCloseTo(3, 12);
    expect(f.slopeStandardError).toBeLessThan(1e-12);
  });
  it('matches the hand-computed textbook formulas on a small noisy set', () => {
    // x̄ = 2.5, Sxx = 5, Sxy = 9.5 → slope 1.9, intercept 0; residuals 0.1, −0.2, 0.1, 0 → SSE 0.06,
    // s² = 0.03, se(slope) = √(0.03/5) (formulas: any regression text, e.g. Montgomery & Runger ch. 11).
    const f = linearLeastSquares([1, 2, 3, 4], [2, 3.6, 5.8, 7.6]);
    expect(f.slope).toBeCloseTo(1.9, 12);
    expect(f.intercept).toBeCloseTo(0, 12);
    expect(f.slopeStandardError).toBeCloseTo(Math.sqrt(0.03 / 5), 12);
  });
  it('refuses equal x values', () => {
    expect(() => linearLeastSquares([1, 1, 1], [1, 2, 3])).toThrow(RangeError);
  });
});

describe('createSeededRandom', () => {
  it('repeats the same sequence for the same seed and differs for another', () => {
    const a = createSeededRandom(42);
    const b = createSeededRandom(42);
    const c = createSeededRandom(43);
    const sa = Array.from({ length: 5 }, () => a.uniform());
    expect(Array.from({ length: 5 }, () => b.uniform())).toStrictEqual(sa);
    expect(Array.from({ length: 5 }, () => c.uniform())).not.toStrictEqual(sa);
  });
  it('gives normal deviates with mean ≈ 0 and variance ≈ 1 (standard normal by definition)', () => {
    const r = createSeededRandom(7);
    const n = 20000;
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n; i++) {
      const z = r.normal();
      s += z;
      s2 += z * z;
    }
    const mean = s / n;
    // 5σ bounds for a sample of 20 000: se(mean) = 1/√n ≈ 0.007, se(var) ≈ √(2/n) ≈ 0.01.
    expect(Math.abs(mean)).toBeLessThan(0.035);
    expect(Math.abs(s2 / n - mean * mean - 1)).toBeLessThan(0.05);
  });
});
