import { describe, expect, it } from 'vitest';
import {
  parseScreeningSettings,
  SAME_SPREAD,
  separationOf,
  shortlistSeparation,
  type SeparationCandidate,
} from '@/chem';

// The separation statistic (separation.ts, DEVELOPERS.md): spread = max − min, pooled σ = √(Σu²/n),
// ratio = spread / pooled σ, "separates" when ratio > 2. Every expected value below is computed by
// hand beside it from those definitions and the ranking's score maps (ranking.ts).

describe('separationOf (hand-computed cases)', () => {
  it('three scores 0.2, 0.5, 0.8 with 1σ 0.1 each: spread 0.6, pooled 0.1, ratio 6 → separates', () => {
    const s = separationOf([0.2, 0.5, 0.8], [0.1, 0.1, 0.1], SAME_SPREAD);
    expect(s.spread).toBeCloseTo(0.6, 12);
    expect(s.pooledSigma).toBeCloseTo(0.1, 12);
    expect(s.ratio).toBeCloseTo(6, 10);
    expect(s.verdict).toBe('separates');
  });

  it('0.4 ± 0.1 and 0.5 ± 0.2: spread 0.1, pooled √((0.01 + 0.04)/2) = 0.158114, ratio 0.632456 → within uncertainty', () => {
    const s = separationOf([0.4, 0.5], [0.1, 0.2], SAME_SPREAD);
    expect(s.pooledSigma).toBeCloseTo(0.158114, 6);
    expect(s.ratio).toBeCloseTo(0.632456, 6);
    expect(s.verdict).toBe('within-uncertainty');
  });

  it('ratio exactly 2 does not separate (the rule is > 2): 0.3 and 0.5 with 1σ 0.1', () => {
    expect(separationOf([0.3, 0.5], [0.1, 0.1], SAME_SPREAD).verdict).toBe('within-uncertainty');
  });

  it('exact inputs: a spread of 0.3 separates (ratio ∞), a spread of 0.01 < 0.02 is the same for all', () => {
    const a = separationOf([0.6, 0.9], [0, 0], SAME_SPREAD);
    expect(a.ratio).toBe(Infinity);
    expect(a.verdict).toBe('separates');
    expect(separationOf([0.5, 0.51], [0, 0], SAME_SPREAD).verdict).toBe('same-for-all');
  });

  it('a criterion with weight 0 orders nothing', () => {
    expect(separationOf([0, 1], [0, 0], SAME_SPREAD, 0).verdict).toBe('not-weighted');
  });
});

describe('shortlistSeparation on two candidates (hand-computed)', () => {
  const shared = {
    drugKind: 'base' as const,
    drugPkaSigma: 0.1,
    log10IntrinsicSigma: 0.3,
    bands: parseScreeningSettings({}).deltaPkaBands,
  };
  const base: Omit<SeparationCandidate, 'criteria'> = {
    deltaPka: 6,
    worstSolid: 'free-form',
    gastricSolid: 'salt',
    saltWaterLog10: -2,
    robustness: { saltLog10Sigma: 0.5, saltAnchoredOnIntrinsic: false },
  };
  const a: SeparationCandidate = {
    ...base,
    criteria: {
      saltProbability: 1,
      log10WorstDoseNumber: 0.5,
      log10GastricDoseNumber: 0.5,
      phMaxMarginPh: null,
      activeFraction: 0.9,
      acceptabilityClass: 1,
      hygroscopicity: null,
    },
  };
  const b: SeparationCandidate = {
    ...base,
    worstSolid: 'salt',
    saltWaterLog10: -1.5,
    criteria: { ...a.criteria, log10WorstDoseNumber: 1.5, activeFraction: 0.7 },
  };
  const weights = parseScreeningSettings({}).weights;
  const sep = shortlistSeparation([a, b], shared, weights);
  const get = (k: string) => sep.criteria.find((c) => c.key === k)!;

  it('dose at pH 1.2–6.8: scores 0.75 and 0.25, u 0.15 and 0.25 → ratio 2.425 → separates', () => {
    // score = 1 − max(0, log D₀)/2. A: log D₀ 0.5 ± 0.3 (free form, σ of S₀) → 0.6 / 0.9, u = 0.15.
    // B: 1.5 ± 0.5 (salt, own σ, not anchored) → 0 / 0.5, u = 0.25. spread 0.5,
    // pooled √((0.0225 + 0.0625)/2) = 0.206155, ratio 2.42536.
    const s = get('solubility');
    expect(s.spread).toBeCloseTo(0.5, 12);
    expect(s.pooledSigma).toBeCloseTo(0.206155, 6);
    expect(s.ratio).toBeCloseTo(2.42536, 4);
    expect(s.verdict).toBe('separates');
  });

  it('gastric D₀ identical (0.5 for both): spread 0 → the same for all', () => {
    expect(get('gastric').spread).toBe(0);
    expect(get('gastric').verdict).toBe('same-for-all');
  });

  it('tablet mass: active fractions 0.9 and 0.7 → scores 0.8 and 0.4, exact → separates', () => {
    expect(get('massCost').spread).toBeCloseTo(0.4, 12);
    expect(get('massCost').ratio).toBe(Infinity);
    expect(get('massCost').verdict).toBe('separates');
  });

  it('salt solubilities −2 and −1.5 with own 1σ 0.5: ratio 0.5/0.5 = 1 → not separable', () => {
    expect(sep.saltWater!.ratio).toBeCloseTo(1, 12);
    expect(sep.saltWater!.verdict).toBe('within-uncertainty');
  });
});
