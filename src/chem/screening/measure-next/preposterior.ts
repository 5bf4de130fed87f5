import { createSeededRandom } from '../../numerics/prng';
import {
  drawRobustnessPerturbation,
  perturbedCriteria,
  type RobustnessDraw,
  type RobustnessRow,
  type RobustnessShared,
} from '../rank-robustness';
import { criterionScores, weightedScore } from '../ranking';
import type { ScreeningWeights } from '../settings';

/**
 * The preposterior step of measure-next: one set of Monte Carlo draws (the rank-robustness draw,
 * drawRobustnessPerturbation and perturbedCriteria — the same sampler, not a copy) kept in memory, and for a measurement on
 * candidate j the probability that the best-looking candidate is truly first once its outcome is
 * known, averaged over the outcomes.
 *
 * The update is pathwise Gaussian conditioning (Matheron's rule; Wilson et al. 2020, ICML,
 * "Efficiently sampling functions from Gaussian process posteriors"): given an outcome y, each kept
 * draw's salt shift t of candidate j becomes t + k·(y − t − ε), k the measurement's gain, ε a draw of
 * its noise. Only candidate j moves, as in the workbench after a real measurement (a measured
 * solubility replaces that candidate's estimate and nobody else's); every other number of the draw
 * stays — common random numbers for every candidate and measurement, so a measurement that tells
 * nothing (k = 0) gives exactly the prior picture and a value of exactly zero.
 * Our simplification: the measured candidate's shift, once known, no longer moves with the shared
 * shifts it was tied to (S₀ when its estimate was anchored on S₀), exactly as after a real measurement;
 * the shared shifts are not themselves updated from it. So a measured candidate's pH_max starts to move
 * with S₀'s own uncertainty, which can make a measurement look very slightly worse than useless (read 0).
 */
export interface KeptDraws {
  /** Live candidates (no error), in row order. */
  n: number;
  /** Number of draws. */
  m: number;
  /** The draws themselves, as the sampler made them. */
  draws: RobustnessDraw[];
  /** Score of candidate i in draw d at d·n + i. */
  score: Float64Array;
  /** Index of the first and second candidate in each draw (ties: lower index first, as rankRobustness). */
  first: Int32Array;
  second: Int32Array;
}

/** A candidate's weighted score under a draw. */
export const scoreInDraw = (
  row: RobustnessRow,
  draw: RobustnessDraw,
  i: number,
  weights: ScreeningWeights,
  shared: RobustnessShared,
) => weightedScore(criterionScores(perturbedCriteria(row, draw, i, shared)), weights);

export function keepDraws(
  live: readonly RobustnessRow[],
  weights: ScreeningWeights,
  shared: RobustnessShared,
  iterations: number,
  seed: number,
): KeptDraws {
  const n = live.length;
  const rng = createSeededRandom(seed);
  const d: KeptDraws = {
    n,
    m: iterations,
    draws: [],
    score: new Float64Array(iterations * n),
    first: new Int32Array(iterations),
    second: new Int32Array(iterations),
  };
  for (let it = 0; it < iterations; it++) {
    const draw = drawRobustnessPerturbation(live, shared, rng);
    d.draws.push(draw);
    let a = -1;
    let b = -1;
    for (let i = 0; i < n; i++) {
      const s = scoreInDraw(live[i]!, draw, i, weights, shared);
      d.score[it * n + i] = s;
      if (a < 0 || s > d.score[it * n + a]!) {
        b = a;
        a = i;
      } else if (b < 0 || s > d.score[it * n + b]!) b = i;
    }
    d.first[it] = a;
    d.second[it] = b;
  }
  return d;
}

/** How often each candidate is first in the kept draws (counts). */
export function firstCounts(d: KeptDraws): Float64Array {
  const c = new Float64Array(d.n);
  for (let it = 0; it < d.m; it++) c[d.first[it]!]! += 1;
  return c;
}

/** Sample variance of candidate j's salt shift over the kept draws, decades². */
export function shiftVariance(d: KeptDraws, j: number): number {
  let s = 0;
  let s2 = 0;
  for (let it = 0; it < d.m; it++) {
    const x = d.draws[it]!.saltShift[j]!;
    s += x;
    s2 += x * x;
  }
  const mean = s / d.m;
  return Math.max(0, s2 / d.m - mean * mean);
}

export interface PreposteriorInput {
  draws: KeptDraws;
  live: readonly RobustnessRow[];
  weights: ScreeningWeights;
  shared: RobustnessShared;
  j: number;
  gain: number;
  noiseSd: number;
  /** Standard-normal outcome points (one per stratum), shared by every measurement. */
  outcomeZ: Float64Array;
  /** Standard-normal noise per kept draw, shared by every measurement. */
  noiseZ: Float64Array;
}

/**
 * For each outcome point, the largest share of draws any one candidate wins once candidate j is
 * updated; returns those shares (the preposterior probabilities of being right with the best pick).
 */
export function bestShareAfter(p: PreposteriorInput): Float64Array {
  const { draws: d, j, gain: k } = p;
  const row = p.live[j]!;
  const sdY = Math.sqrt(shiftVariance(d, j) + p.noiseSd ** 2);
  const counts = new Float64Array(d.n);
  const out = new Float64Array(p.outcomeZ.length);
  for (let o = 0; o < p.outcomeZ.length; o++) {
    const y = p.outcomeZ[o]! * sdY;
    counts.fill(0);
    for (let it = 0; it < d.m; it++) {
      const base = it * d.n;
      const draw = d.draws[it]!;
      const t = draw.saltShift[j]!;
      // Only candidate j moves; the draw is restored at once (every other number stays shared).
      draw.saltShift[j] = t + k * (y - t - p.noiseSd * p.noiseZ[it]!);
      const s = scoreInDraw(row, draw, j, p.weights, p.shared);
      draw.saltShift[j] = t;
      const other = d.first[it] === j ? d.second[it]! : d.first[it]!;
      const so = other < 0 ? Number.NEGATIVE_INFINITY : d.score[base + other]!;
      counts[s > so || (s === so && j < other) ? j : other]! += 1;
    }
    let best = 0;
    for (let i = 0; i < d.n; i++) if (counts[i]! > best) best = counts[i]!;
    out[o] = best / d.m;
  }
  return out;
}
