import { describe, expect, it } from 'vitest';
import {
  drawRobustnessPerturbation,
  perturbedCriteria,
  uncertaintiesOf,
  type RobustnessRow,
  type RobustnessShared,
} from '@/chem';
import { createSeededRandom } from '@/chem/numerics/prng';

// Test inputs (not expected values): two model-estimated salts of one drug with the shared per-drug
// level and the within-series part of the salt-solubility σ, and one measured salt.
const criteria = {
  saltProbability: 1,
  log10WorstDoseNumber: 0.5,
  log10GastricDoseNumber: 0.2,
  phMaxMarginPh: 1,
  activeFraction: 0.8,
  acceptabilityClass: 1 as const,
  hygroscopicity: null,
};
const modelRow = (id: string, within: number, shared: number): RobustnessRow => ({
  id,
  criteria,
  deltaPka: 5,
  worstSolid: 'salt',
  gastricSolid: 'salt',
  saltLog10Sigma: within,
  saltSharedLog10Sigma: shared,
  saltAnchoredOnIntrinsic: true,
});
const sharedInputs: RobustnessShared = {
  drugKind: 'base',
  drugPkaSigma: 0,
  log10IntrinsicSigma: 0,
};

describe('the robustness draw: the salt model’s shared level once per drug, the within part per candidate', () => {
  it('with only a shared level every model salt moves by the same amount in a draw', () => {
    const rows = [modelRow('a', 0, 0.5), modelRow('b', 0, 0.5)];
    const rng = createSeededRandom(3);
    for (let k = 0; k < 50; k++) {
      const d = drawRobustnessPerturbation(rows, sharedInputs, rng);
      expect(d.saltShift[0]).toBe(d.saltShift[1]);
      expect(d.saltShift[0]).toBeCloseTo(0.5 * d.zSaltShared!, 14);
    }
  });

  it('over many draws: variance = shared² + within², correlation between two salts = shared²/(shared² + within²) (hand formula: 0.25/0.74 = 0.338)', () => {
    const rows = [modelRow('a', 0.7, 0.5), modelRow('b', 0.7, 0.5)];
    const rng = createSeededRandom(7);
    const n = 40000;
    let sa = 0;
    let sb = 0;
    let sab = 0;
    for (let k = 0; k < n; k++) {
      const d = drawRobustnessPerturbation(rows, sharedInputs, rng);
      sa += d.saltShift[0]! ** 2;
      sb += d.saltShift[1]! ** 2;
      sab += d.saltShift[0]! * d.saltShift[1]!;
    }
    // Monte Carlo error of a variance/correlation estimate on 40 000 draws is ~1 %: tolerances 0.02–0.03.
    expect(sa / n).toBeCloseTo(0.74, 1);
    expect(Math.abs(sb / n - 0.74)).toBeLessThan(0.03);
    expect(Math.abs(sab / Math.sqrt(sa * sb) - 0.25 / 0.74)).toBeLessThan(0.02);
  });

  it('a measured salt (no shared level) does not move with the model salts; consumes 3 + n normals per draw', () => {
    const measured: RobustnessRow = { ...modelRow('m', 0, 0), saltAnchoredOnIntrinsic: false };
    const rows = [modelRow('a', 0, 0.5), measured];
    const d = drawRobustnessPerturbation(rows, sharedInputs, createSeededRandom(1));
    expect(d.saltShift[1]).toBe(0);
    const next = createSeededRandom(1);
    drawRobustnessPerturbation(rows, sharedInputs, next);
    drawRobustnessPerturbation(rows, sharedInputs, next); // draws 5..9
    const after = createSeededRandom(1);
    for (let k = 0; k < 10; k++) after.normal();
    expect(next.normal()).toBe(after.normal());
  });

  it('a salt-limited dose number moves down by the salt’s shift (linearised: log D₀ − Δlog s)', () => {
    const rows = [modelRow('a', 0.3, 0.5)];
    const d = drawRobustnessPerturbation(rows, sharedInputs, createSeededRandom(9));
    const c = perturbedCriteria(rows[0]!, d, 0, sharedInputs);
    expect(c.log10WorstDoseNumber).toBeCloseTo(0.5 - d.saltShift[0]!, 14);
    expect(c.phMaxMarginPh).toBeCloseTo(1 - d.saltShift[0]!, 14);
  });

  it('the 1σ shown for a salt and its pH_max include the shared level (√(0.5² + 0.7² + 0.2²) by hand)', () => {
    const u = uncertaintiesOf(
      { robustness: modelRow('a', 0.7, 0.5) },
      { drugPkaSigma: 0, log10IntrinsicSigma: 0.2 },
    );
    expect(u.saltLogSigma).toBeCloseTo(Math.sqrt(0.25 + 0.49 + 0.04), 12);
    expect(u.phMaxSigma).toBeCloseTo(Math.sqrt(0.25 + 0.49), 12);
  });
});
