import { createSeededRandom } from '../../numerics/prng';
import {
  drawRobustnessShifts,
  scoreUnderShifts,
  type RobustnessDraw,
  type RobustnessRow,
  type RobustnessShared,
} from '../rank-robustness';
import type { ScreeningWeights } from '../settings';

/**
 * The preposterior step of measure-next: one set of Monte Carlo draws (the rank-robustness draw,
 * drawRobustnessShifts — the same sampler, not a copy) kept in memory, and for a measurement on
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
 */
export interface KeptDraws {
  /** Live candidates (no error), in row order. */
  n: number;
  /** Number of draws. */
  m: number;
  dPka: Float64Array;
  dS0: Float64Array;
  /** Salt shift of candidate i in draw d at d·n + i, decades. */
  shift: Float64Array;
  /** Score of candidate i in draw d at d·n + i. */
  score: Float64Array;
  /** Index of the first and second candidate in each draw (ties: lower index first, as rankRobustness). */
  first: Int32Array;
  second: Int32Array;
}

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
    dPka: new Float64Array(iterations),
    dS0: new Float64Array(iterations),
    shift: new Float64Array(iterations * n),
    score: new Float64Array(iterations * n),
    first: new Int32Array(iterations),
    second: new Int32Array(iterations),
  };
  const draw: RobustnessDraw = { dPka: 0, dS0: 0, saltShift: new Float64Array(n) };
  for (let it = 0; it < iterations; it++) {
    drawRobustnessShifts(rng, live, shared, draw);
    d.dPka[it] = draw.dPka;
    d.dS0[it] = draw.dS0;
    let a = -1;
    let b = -1;
    for (let i = 0; i < n; i++) {
      const s = scoreUnderShifts(
        live[i]!,
        weights,
        shared,
        draw.dPka,
        draw.dS0,
        draw.saltShift[i]!,
      );
      d.shift[it * n + i] = draw.saltShift[i]!;
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
    const x = d.shift[it * d.n + j]!;
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
      const t = d.shift[base + j]!;
      const moved = t + k * (y - t - p.noiseSd * p.noiseZ[it]!);
      const s = scoreUnderShifts(row, p.weights, p.shared, d.dPka[it]!, d.dS0[it]!, moved);
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
