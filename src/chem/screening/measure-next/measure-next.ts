import { createSeededRandom } from '../../numerics/prng';
import { normalQuantile } from '../../numerics/normal-quantile';
import { ChemInputError } from '../../result';
import type { RobustnessRow, RobustnessShared } from '../rank-robustness';
import type { ScreeningWeights } from '../settings';
import {
  fusionPathExplainedVariance,
  measurementGain,
  STILL_WIDE_LOG10_SIGMA,
  type BenchMeasurement,
  type MeasureNextStatus,
} from './measurement-gain';
import {
  bestShareAfter,
  firstCounts,
  keepDraws,
  shiftVariance,
  type PreposteriorInput,
} from './preposterior';

/**
 * Measure next: which bench measurement would most reduce the doubt about first place — the
 * expected value of sample information of decision analysis (Raiffa & Schlaifer 1961, "Applied
 * Statistical Decision Theory", Harvard; Howard 1966, IEEE Trans. Syst. Sci. Cybern. 2, 22),
 * computed by preposterior analysis over the rank-robustness Monte Carlo.
 *
 * The decision: take into the lab the candidate most often first in the draws. Its doubt is
 * D = 1 − max_i P(i first). For a measurement, each outcome y is drawn from the current predictive
 * distribution (normal: the candidate's salt-shift variance V plus the measurement's noise), the
 * candidate is updated (preposterior.ts), the pick is made again, and
 *   value = E_y[max_i P(i first | y)] − max_i P(i first)   (≥ 0 in expectation, Jensen),
 * the expected reduction of D. The outcomes are `outcomes` strata of the predictive distribution
 * (one seeded point per stratum: stratified sampling), shared by every measurement (common random
 * numbers), as are the kept draws and their noise. A negative estimate (Monte Carlo noise) reads 0;
 * `standardError` is the spread across strata / √strata (an upper bound for stratified sampling; the
 * finite number of draws adds its own noise). With finitely many draws the prior's largest share is
 * biased up, so values near an exact tie read slightly low (about 0.01 below the hand computation with
 * 4000 draws in the tests).
 */
export interface MeasureNextItem {
  id: string;
  measurement: BenchMeasurement;
  /** Expected reduction of the probability that the pick is not the best, 0–1 (negative noise reads 0). */
  value: number;
  /** The estimate before a negative one is read as 0 (for checking the Monte Carlo error). */
  rawValue: number;
  standardError: number;
  /** value / doubt: the share of the doubt about first place it is expected to settle, 0–1. */
  share: number;
  /** Share of the candidate's salt-solubility variance the measurement resolves, 0–1. */
  gain: number;
  /** The candidate's current salt-solubility 1σ in the draw, decades. */
  currentSigmaLog10: number;
  /** True when the measurement was already taken (proposed again because its σ is still wide). */
  retake: boolean;
  /** Why a measurement resolves nothing, when it does not. */
  note: 'fusion-path-not-validated' | 'no-uncertainty' | null;
}

export interface MeasureNextResult {
  /** The candidate most often first (the pick), and D = 1 − its share. */
  leaderId: string | null;
  doubt: number;
  pFirst: Record<string, number>;
  /** Proposed measurements, highest value first. */
  items: MeasureNextItem[];
  /** Measurements not proposed and why. */
  leftOut: {
    id: string;
    measurement: BenchMeasurement;
    reason: 'already-taken' | 'not-applicable';
  }[];
  iterations: number;
  outcomes: number;
  seed: number;
}

export interface MeasureNextOptions {
  /** Kept Monte Carlo draws (default 1000, at most 100 000). */
  iterations?: number;
  /** Strata of each measurement's outcome (default 16, at most 256). */
  outcomes?: number;
  seed?: number;
  /** Variance the fusion path removes, decades² (default: from the shipped model). */
  fusionExplainedVariance?: number;
  /** Called after each candidate's measurements are valued (done, total). */
  onProgress?: (done: number, total: number) => void;
}

const KINDS: readonly BenchMeasurement[] = ['solubility', 'melting-point'];

/** Check a count (an integer from 1 to `max`), naming the field when refused. */
function requireCount(field: string, n: number, max: number): number {
  if (!Number.isInteger(n) || n < 1 || n > max)
    throw new ChemInputError(field, `${n} is not allowed`, `an integer from 1 to ${max}`);
  return n;
}

function outcomePoints(k: number, seed: number): Float64Array {
  const rng = createSeededRandom(seed);
  return Float64Array.from({ length: k }, (_, i) => normalQuantile((i + rng.uniform()) / k) || 0);
}

function proposal(
  s: MeasureNextStatus | undefined,
  kind: BenchMeasurement,
  sigma: number,
): 'new' | 'retake' | 'already-taken' | 'not-applicable' {
  const taken = kind === 'solubility' ? !!s?.solubilityMeasured : !!s?.meltingPointMeasured;
  if (kind === 'melting-point' && (!s?.meltingPointApplies || s.solubilityMeasured))
    return 'not-applicable';
  if (!taken) return 'new';
  // A melting point already in gives the same value again; a solubility may be worth repeating.
  return kind === 'solubility' && sigma > STILL_WIDE_LOG10_SIGMA ? 'retake' : 'already-taken';
}

/** Mean over the outcome strata of the best pick's share after the update, and its standard error. */
function meanBestShare(p: PreposteriorInput): { mean: number; se: number } {
  const shares = bestShareAfter(p);
  const k = shares.length;
  const mean = shares.reduce((a, b) => a + b, 0) / k;
  const v = shares.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, k - 1);
  return { mean, se: Math.sqrt(v / k) };
}

export function measureNext(
  rows: readonly RobustnessRow[],
  status: readonly MeasureNextStatus[],
  weights: ScreeningWeights,
  shared: RobustnessShared,
  opts: MeasureNextOptions = {},
): MeasureNextResult {
  const iterations = requireCount('iterations', opts.iterations ?? 1000, 100000);
  const outcomes = requireCount('outcomes', opts.outcomes ?? 16, 256);
  const seed = opts.seed ?? 1;
  const explained = opts.fusionExplainedVariance ?? fusionPathExplainedVariance();
  const live = rows.filter((r) => !r.error);
  const result: MeasureNextResult = {
    leaderId: null,
    doubt: 0,
    pFirst: {},
    items: [],
    leftOut: [],
    iterations,
    outcomes,
    seed,
  };
  if (live.length === 0) return result;
  const draws = keepDraws(live, weights, shared, iterations, seed);
  const counts = firstCounts(draws);
  let lead = 0;
  live.forEach((r, i) => {
    result.pFirst[r.id] = counts[i]! / iterations;
    if (counts[i]! > counts[lead]!) lead = i;
  });
  const prior = counts[lead]! / iterations;
  result.leaderId = live[lead]!.id;
  result.doubt = 1 - prior;
  const outcomeZ = outcomePoints(outcomes, seed + 1);
  const noiseRng = createSeededRandom(seed + 2);
  const noiseZ = Float64Array.from({ length: iterations }, () => noiseRng.normal());
  const ctx = { draws, live, weights, shared, outcomeZ, noiseZ };
  const byId = new Map(status.map((s) => [s.id, s]));
  live.forEach((row, j) => {
    const variance = shiftVariance(draws, j);
    const sigma = Math.sqrt(variance);
    for (const kind of KINDS) {
      const p = proposal(byId.get(row.id), kind, sigma);
      if (p === 'already-taken' || p === 'not-applicable') {
        result.leftOut.push({ id: row.id, measurement: kind, reason: p });
        continue;
      }
      const { gain, noiseSd } = measurementGain(kind, variance, explained);
      const { mean, se } =
        gain > 0 && result.doubt > 0
          ? meanBestShare({ ...ctx, j, gain, noiseSd })
          : { mean: prior, se: 0 };
      const value = Math.max(0, mean - prior);
      result.items.push({
        id: row.id,
        measurement: kind,
        value,
        rawValue: mean - prior,
        standardError: se,
        share: result.doubt > 0 ? value / result.doubt : 0,
        gain,
        currentSigmaLog10: sigma,
        retake: p === 'retake',
        note: gain > 0 ? null : variance > 0 ? 'fusion-path-not-validated' : 'no-uncertainty',
      });
    }
    opts.onProgress?.(j + 1, live.length);
  });
  const order = new Map(live.map((r, i) => [r.id, i]));
  result.items.sort(
    (a, b) =>
      b.value - a.value ||
      result.pFirst[b.id]! - result.pFirst[a.id]! ||
      order.get(a.id)! - order.get(b.id)! ||
      KINDS.indexOf(a.measurement) - KINDS.indexOf(b.measurement),
  );
  return result;
}
