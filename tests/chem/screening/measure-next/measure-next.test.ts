import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  fusionPathExplainedVariance,
  measureNext,
  measurementGain,
  normalQuantile,
  type CriterionInputs,
  type MeasureNextStatus,
  type RobustnessRow,
  type RobustnessShared,
  type ScreeningWeights,
} from '@/chem';
import { bestShareAfter, firstCounts, keepDraws } from '@/chem/screening/measure-next/preposterior';

// Test rows are built by hand so that the expected values follow from a hand computation shown
// beside each assertion (no invented "expected" numbers).
const NO_WEIGHTS: ScreeningWeights = {
  saltFormation: 0,
  solubility: 0,
  gastric: 0,
  disproportionation: 0,
  massCost: 0,
  acceptability: 0,
  hygroscopicity: 0,
};
const criteria = (over: Partial<CriterionInputs> = {}): CriterionInputs => ({
  saltProbability: null,
  log10WorstDoseNumber: 1,
  log10GastricDoseNumber: null,
  phMaxMarginPh: null,
  activeFraction: 1,
  acceptabilityClass: null,
  hygroscopicity: null,
  ...over,
});
const row = (id: string, sigma: number, over: Partial<CriterionInputs> = {}): RobustnessRow => ({
  id,
  criteria: criteria(over),
  deltaPka: null,
  worstSolid: 'salt',
  gastricSolid: null,
  saltLog10Sigma: sigma,
  saltAnchoredOnIntrinsic: false,
});
const fresh = (id: string, meltingPointApplies = true): MeasureNextStatus => ({
  id,
  solubilityMeasured: false,
  meltingPointApplies,
  meltingPointMeasured: false,
});
// No shared uncertainty: only each salt's own solubility moves.
const SHARED: RobustnessShared = { drugKind: 'base', drugPkaSigma: 0, log10IntrinsicSigma: 0 };

describe('normalQuantile (Abramowitz & Stegun 26.2.23, |error| < 4.5e-4)', () => {
  it('matches the standard normal table', () => {
    // Standard normal table (e.g. Abramowitz & Stegun 1964, Table 26.5): z(0.975) = 1.959964,
    // z(0.841345) = 1.000000, z(0.5) = 0.
    expect(Math.abs(normalQuantile(0.975) - 1.959964)).toBeLessThan(4.5e-4);
    expect(Math.abs(normalQuantile(0.025) + 1.959964)).toBeLessThan(4.5e-4);
    expect(Math.abs(normalQuantile(0.841345) - 1)).toBeLessThan(4.5e-4);
    expect(Math.abs(normalQuantile(0.5))).toBeLessThan(4.5e-4);
  });
  it('refuses 0 and 1', () => {
    expect(() => normalQuantile(0)).toThrow(/strictly between 0 and 1/);
    expect(() => normalQuantile(1)).toThrow(/strictly between 0 and 1/);
  });
});

describe('measurementGain', () => {
  it('a solubility measured to 0.05 decades resolves V/(V + 0.05²) of a variance V', () => {
    // Hand computation: V = 0.09 → 0.09 / (0.09 + 0.0025) = 0.972973.
    expect(measurementGain('solubility', 0.09).gain).toBeCloseTo(0.972973, 5);
    expect(measurementGain('solubility', 0.09).noiseSd).toBe(0.05);
  });
  it('a melting point resolves what the fusion path removes by cross-validation, else nothing', () => {
    // Hand computation: cv 0.86 without, 0.60 with the fusion path → 0.86² − 0.60² = 0.3796.
    const check = (applies: boolean, rmseWith: number | null) => ({
      applies,
      rmseWithout: 0.86,
      rmseWith,
    });
    expect(fusionPathExplainedVariance(check(true, 0.6))).toBeCloseTo(0.3796, 10);
    expect(fusionPathExplainedVariance(check(true, 0.9))).toBe(0);
    expect(fusionPathExplainedVariance(check(false, 0.6))).toBe(0); // not applied: worth nothing
    expect(fusionPathExplainedVariance(check(true, null))).toBe(0);
    // Gain = explained / V: 0.045 / 0.09 = 0.5.
    expect(measurementGain('melting-point', 0.09, 0.045).gain).toBeCloseTo(0.5, 12);
    expect(measurementGain('melting-point', 0.09, 0).gain).toBe(0);
  });
});

describe('measureNext: one candidate dominates', () => {
  // Weights: acceptability 3, solubility 1. A is class 1 (score 1), B class 3 (0.2). The solubility
  // score lies in 0–1 whatever the draw, so A − B ≥ (3·(1 − 0.2) − 1·1)/4 = 0.35 > 0 in every draw:
  // A is always first, the doubt is 0 and no measurement can reduce it.
  const w = { ...NO_WEIGHTS, acceptability: 3, solubility: 1 };
  const rows = [row('A', 0.8, { acceptabilityClass: 1 }), row('B', 0.8, { acceptabilityClass: 3 })];
  const r = measureNext(rows, [fresh('A'), fresh('B')], w, SHARED, { iterations: 400, seed: 5 });
  it('has no doubt about first place and no measurement with value', () => {
    expect(r.leaderId).toBe('A');
    expect(r.pFirst.A).toBe(1);
    expect(r.doubt).toBe(0);
    expect(r.items.length).toBe(4);
    for (const x of r.items) expect(x.value).toBe(0);
  });
});

describe('measureNext: two candidates tied at the top', () => {
  // A and B are exchangeable: same criteria, same σ = 0.3 decades, only the solubility weighs, and the
  // score 1 − log D₀/2 is linear in the shift (log D₀ = 1 ± 0.3 stays inside 0–2). C is far behind
  // (log D₀ 1.8). Hand computation of the value of measuring A's solubility (σ_m = 0.05): gain
  // k = 0.09/0.0925 = 0.97297; P(A first | y) = Φ(k·y/σ·1/√(2 − k)) with y ~ N(0, σ² + σ_m²), so
  // Z = k·y/(σ√(2 − k)) ~ N(0, τ²), τ² = k/(2 − k) = 0.94737; E[max(Φ(Z), 1 − Φ(Z))] = ½ + arctan(τ)/π
  // (orthant probability of two normals), so the value is arctan(0.97333)/π = 0.2457 and the doubt ½.
  const w = { ...NO_WEIGHTS, solubility: 1 };
  const rows = [row('A', 0.3), row('B', 0.3), row('C', 0.3, { log10WorstDoseNumber: 1.8 })];
  const status = ['A', 'B', 'C'].map((id) => fresh(id));
  const opts = { iterations: 4000, outcomes: 32, seed: 11 };
  const r = measureNext(rows, status, w, SHARED, opts);
  it('puts the tied candidates’ measurements first', () => {
    expect(new Set(r.items.slice(0, 2).map((x) => `${x.id} ${x.measurement}`))).toEqual(
      new Set(['A solubility', 'B solubility']),
    );
    expect(r.doubt).toBeGreaterThan(0.45); // ½ by symmetry, less C's tiny share, ± MC error
    expect(r.doubt).toBeLessThan(0.55);
  });
  it('values a solubility at arctan(τ)/π = 0.246 (hand computation above)', () => {
    for (const x of r.items.slice(0, 2)) {
      expect(Math.abs(x.value - 0.2457)).toBeLessThan(0.03);
      expect(x.share).toBeGreaterThan(0.4); // 0.2457 / 0.5 = 0.49
    }
  });
  it('values the far-behind candidate near zero', () => {
    const c = r.items.find((x) => x.id === 'C' && x.measurement === 'solubility')!;
    expect(c.value).toBeLessThan(0.02);
  });
  it('says a melting point is worth nothing while the fusion path is not validated', () => {
    const r0 = measureNext(rows, status, w, SHARED, { ...opts, fusionExplainedVariance: 0 });
    const mp = r0.items.filter((x) => x.measurement === 'melting-point');
    expect(mp.length).toBe(3);
    for (const x of mp) {
      expect(x.value).toBe(0);
      expect(x.note).toBe('fusion-path-not-validated');
    }
  });
  it('values a melting point resolving half the variance at 1/6 (hand computation)', () => {
    // k = ½ → τ² = ½/(2 − ½) = ⅓, arctan(1/√3)/π = (π/6)/π = 1/6 = 0.1667.
    const r5 = measureNext(rows, status, w, SHARED, { ...opts, fusionExplainedVariance: 0.045 });
    const a = r5.items.find((x) => x.id === 'A' && x.measurement === 'melting-point')!;
    expect(a.gain).toBeGreaterThan(0.45); // 0.045 / (sample variance ≈ 0.09)
    expect(Math.abs(a.value - 1 / 6)).toBeLessThan(0.03);
  });
  it('is reproducible with its seed', () => {
    expect(measureNext(rows, status, w, SHARED, opts)).toStrictEqual(r);
  });
});

describe('measureNext: measurements already taken', () => {
  const w = { ...NO_WEIGHTS, solubility: 1 };
  it('does not propose a solubility again while its σ is narrow, and does while it is wide', () => {
    const rows = [row('A', 0.05), row('B', 0.3)];
    const taken = { ...fresh('A'), solubilityMeasured: true, meltingPointApplies: false };
    const r = measureNext(rows, [taken, fresh('B')], w, SHARED, { iterations: 300 });
    expect(r.leftOut).toContainEqual({
      id: 'A',
      measurement: 'solubility',
      reason: 'already-taken',
    });
    expect(r.items.some((x) => x.id === 'A')).toBe(false);
    const wide = measureNext([row('A', 0.5), row('B', 0.3)], [taken, fresh('B')], w, SHARED, {
      iterations: 300,
    });
    expect(wide.items.find((x) => x.id === 'A')?.retake).toBe(true);
  });
});

describe('measureNext properties (fast-check, fixed seed)', () => {
  const arbRow = (id: string) =>
    fc
      .record({
        sigma: fc.constantFrom(0, 0.2, 0.6, 1),
        logD: fc.double({ min: -0.5, max: 2.5, noNaN: true }),
        margin: fc.option(fc.double({ min: -1, max: 1, noNaN: true }), { nil: null }),
        acc: fc.constantFrom(1, 2, 3, null),
        anchored: fc.boolean(),
      })
      .map((x) => ({
        ...row(id, x.sigma, {
          log10WorstDoseNumber: x.logD,
          phMaxMarginPh: x.margin,
          acceptabilityClass: x.acc as 1 | 2 | 3 | null,
        }),
        saltAnchoredOnIntrinsic: x.anchored,
      }));
  const arb = fc.record({
    rows: fc.tuple(arbRow('A'), arbRow('B'), arbRow('C'), arbRow('D')),
    s0: fc.constantFrom(0, 0.5),
    w: fc.record({
      solubility: fc.constantFrom(0, 1, 2),
      disproportionation: fc.constantFrom(0, 1),
    }),
  });
  it('value ≥ 0 up to Monte Carlo error, ≤ the doubt; a candidate with σ 0 has value 0', () => {
    fc.assert(
      fc.property(arb, ({ rows, s0, w }) => {
        const shared = { ...SHARED, log10IntrinsicSigma: s0 };
        const weights = { ...NO_WEIGHTS, acceptability: 1, ...w };
        const r = measureNext(
          rows,
          rows.map((x) => fresh(x.id)),
          weights,
          shared,
          {
            iterations: 300,
            outcomes: 8,
            seed: 3,
          },
        );
        for (const x of r.items) {
          expect(x.rawValue).toBeGreaterThanOrEqual(-(3 * x.standardError + 0.03));
          expect(x.value).toBeLessThanOrEqual(r.doubt + 1e-12);
          const src = rows.find((q) => q.id === x.id)!;
          const noSpread = src.saltLog10Sigma === 0 && (!src.saltAnchoredOnIntrinsic || s0 === 0);
          if (noSpread) expect(x.value).toBe(0);
        }
      }),
      { seed: 20261203, numRuns: 40 },
    );
  });
  it('an update that tells nothing (gain 0) leaves every outcome at the prior pick (common random numbers)', () => {
    const live = [row('A', 0.3), row('B', 0.3), row('C', 0.6, { log10WorstDoseNumber: 1.2 })];
    const weights = { ...NO_WEIGHTS, solubility: 1 };
    const draws = keepDraws(live, weights, SHARED, 500, 9);
    const prior = Math.max(...firstCounts(draws)) / 500;
    const shares = bestShareAfter({
      draws,
      live,
      weights,
      shared: SHARED,
      j: 2,
      gain: 0,
      noiseSd: 1,
      outcomeZ: Float64Array.from([-1.5, 0, 1.5]),
      noiseZ: new Float64Array(500).fill(0.7),
    });
    for (const s of shares) expect(s).toBe(prior);
  });
});
