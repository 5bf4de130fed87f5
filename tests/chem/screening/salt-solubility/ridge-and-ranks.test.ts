import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  fitRidge,
  predictRidge,
  solveSymmetricPositiveDefinite,
} from '@/chem/screening/salt-solubility/ridge-regression';
import {
  fractionalRanks,
  leastSolubleAmongLowestPredicted,
  spearmanRho,
} from '@/chem/screening/salt-solubility/rank-statistics';

describe('Cholesky solve of a symmetric positive-definite system', () => {
  it('2×2 by hand: [[4,2],[2,3]]·x = [2,1] → x = (1/8)·[[3,−2],[−2,4]]·[2,1] = [0.5, 0]', () => {
    const x = solveSymmetricPositiveDefinite(
      [
        [4, 2],
        [2, 3],
      ],
      [2, 1],
    );
    expect(x[0]).toBeCloseTo(0.5, 14);
    expect(x[1]).toBeCloseTo(0, 14);
  });

  it('3×3 with the textbook factor L = [[2,0,0],[6,1,0],[−8,5,3]] (A = L·Lᵀ, hand-multiplied), b = A·(1,1,1) = (0, 6, 39) → x = (1,1,1)', () => {
    const a = [
      [4, 12, -16],
      [12, 37, -43],
      [-16, -43, 98],
    ];
    const x = solveSymmetricPositiveDefinite(a, [0, 6, 39]);
    for (const v of x) expect(v).toBeCloseTo(1, 12);
  });

  it('refuses a matrix that is not positive definite ([[1,2],[2,1]] has eigenvalues 3 and −1)', () => {
    expect(() =>
      solveSymmetricPositiveDefinite(
        [
          [1, 2],
          [2, 1],
        ],
        [1, 1],
      ),
    ).toThrow(/not positive definite/);
  });

  it('A·x = b for random SPD systems A = MᵀM + I (property, fixed seed)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }).chain((k) =>
          fc.tuple(
            fc.array(
              fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: k, maxLength: k }),
              {
                minLength: k,
                maxLength: k,
              },
            ),
            fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: k, maxLength: k }),
          ),
        ),
        ([m, b]) => {
          const k = b.length;
          const a = Array.from({ length: k }, (_row, i) =>
            Array.from(
              { length: k },
              (_col, j) => m.reduce((s, row) => s + row[i]! * row[j]!, 0) + (i === j ? 1 : 0),
            ),
          );
          const x = solveSymmetricPositiveDefinite(a, b);
          for (let i = 0; i < k; i++) {
            const ax = a[i]!.reduce((s, v, j) => s + v * x[j]!, 0);
            expect(ax).toBeCloseTo(b[i]!, 8);
          }
        },
      ),
      { numRuns: 300, seed: 16 },
    );
  });
});

describe('ridge regression on standardised predictors (Hastie, Tibshirani & Friedman 2009, eq. 3.44)', () => {
  it('one predictor by hand: x = (1,2,3), y = (1,3,2), λ = 1', () => {
    // x̄ = 2, population sd √(2/3), z = (−√1.5, 0, √1.5), ZᵀZ = 3, Zᵀ(y − ȳ) = √1.5 (ȳ = 2);
    // β = √1.5 / (3 + 1); prediction at x = 3: 2 + β·√1.5 = 2 + 1.5/4 = 2.375, at x = 1: 1.625.
    const m = fitRidge(['x'], [[1], [2], [3]], [1, 3, 2], 1);
    expect(m.intercept).toBeCloseTo(2, 14);
    expect(m.featureScales[0]).toBeCloseTo(Math.sqrt(2 / 3), 14);
    expect(m.coefficients[0]).toBeCloseTo(Math.sqrt(1.5) / 4, 14);
    expect(predictRidge(m, [3])).toBeCloseTo(2.375, 14);
    expect(predictRidge(m, [1])).toBeCloseTo(1.625, 14);
  });

  it('a constant predictor gets coefficient 0 and leaves the others as they were', () => {
    const a = fitRidge(['x'], [[1], [2], [3]], [1, 3, 2], 1);
    const b = fitRidge(
      ['x', 'c'],
      [
        [1, 5],
        [2, 5],
        [3, 5],
      ],
      [1, 3, 2],
      1,
    );
    expect(b.coefficients[1]).toBe(0);
    expect(b.coefficients[0]).toBeCloseTo(a.coefficients[0]!, 14);
  });

  it('satisfies its normal equations (ZᵀZ + λI)β = Zᵀ(y − ȳ), and a larger λ never lengthens β (property, fixed seed)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: -5, max: 5, noNaN: true }),
            fc.double({ min: -5, max: 5, noNaN: true }),
            fc.double({ min: -5, max: 5, noNaN: true }),
          ),
          { minLength: 4, maxLength: 20 },
        ),
        fc.double({ min: 0.01, max: 50, noNaN: true }),
        (data, lambda) => {
          const x = data.map(([a, b]) => [a, b]);
          const y = data.map(([, , c]) => c);
          const m = fitRidge(['a', 'b'], x, y, lambda);
          const z = x.map((r) => r.map((v, j) => (v - m.featureMeans[j]!) / m.featureScales[j]!));
          const yBar = y.reduce((s, v) => s + v, 0) / y.length;
          for (let a = 0; a < 2; a++) {
            let lhs = lambda * m.coefficients[a]!;
            for (let b = 0; b < 2; b++)
              lhs += z.reduce((s, r) => s + r[a]! * r[b]!, 0) * m.coefficients[b]!;
            const rhs = z.reduce((s, r, i) => s + r[a]! * (y[i]! - yBar), 0);
            expect(lhs).toBeCloseTo(rhs, 6);
          }
          const wider = fitRidge(['a', 'b'], x, y, lambda * 4);
          const norm = (c: readonly number[]) => Math.hypot(...c);
          expect(norm(wider.coefficients)).toBeLessThanOrEqual(norm(m.coefficients) + 1e-9);
        },
      ),
      { numRuns: 300, seed: 61 },
    );
  });
});

describe('Spearman’s ρ with ties (mean ranks; Press et al., Numerical Recipes 3rd ed. 2007, §14.6)', () => {
  it('ties share their mean rank: (10, 20, 20, 30) → (1, 2.5, 2.5, 4)', () => {
    expect(fractionalRanks([10, 20, 20, 30])).toEqual([1, 2.5, 2.5, 4]);
  });

  it('by hand with a tie: x = (1,2,2,3), y = (1,3,2,4) → ρ = 4.5/√(4.5·5) = 3/√10', () => {
    // ranks x (1, 2.5, 2.5, 4), y (1, 3, 2, 4); deviations from 2.5: Σdx·dy = 4.5, Σdx² = 4.5, Σdy² = 5
    expect(spearmanRho([1, 2, 2, 3], [1, 3, 2, 4])).toBeCloseTo(3 / Math.sqrt(10), 14);
  });

  it('the untied textbook example (IQ against hours of TV, 10 people) gives ρ = −29/165 (Wikipedia, "Spearman’s rank correlation coefficient", worked example — from memory)', () => {
    const iq = [106, 100, 86, 101, 99, 103, 97, 113, 112, 110];
    const tv = [7, 27, 2, 50, 28, 29, 20, 12, 6, 17];
    expect(spearmanRho(iq, tv)).toBeCloseTo(-29 / 165, 12);
  });

  it('is NaN when one side has no spread (a flat prediction ranks nothing)', () => {
    expect(spearmanRho([1, 1, 1], [1, 2, 3])).toBeNaN();
  });

  it('ties at the cut count against the model in the least-soluble check', () => {
    // measured least soluble is index 0; predicted flat → 3 tied at the cut of 2 → not a hit
    expect(leastSolubleAmongLowestPredicted([0, 0, 0], [-3, -1, -2], 2)).toBe(false);
    expect(leastSolubleAmongLowestPredicted([-2, 0, -1], [-3, -1, -2], 2)).toBe(true);
  });
});
