import { createSeededRandom } from '../numerics/prng';
import { ChemInputError } from '../result';
import { DEFAULT_DELTA_PKA_BANDS, saltProbabilityFor, type DeltaPkaBands } from './delta-pka';
import { criterionScores, weightedScore, type CriterionInputs } from './ranking';
import type { ScreeningWeights } from './settings';

/**
 * Rank robustness: Monte Carlo over the uncertainties of the screen's estimates, giving each
 * candidate's probability of staying in the top three (and its median rank). Reproducible: a seeded
 * generator (mulberry32), no clock, no Math.random.
 *
 * What is drawn each iteration (normal, 1σ as each estimate states it):
 * - one shared shift of the drug's pKa (σ by the pKa's origin) — moves every ΔpKa and pH_max together;
 * - one shared shift of log S₀ (measured or GSE) — moves free-form-limited dose numbers, and the
 *   salt-limited ones whose K_sp is anchored on S₀;
 * - per candidate, an independent shift of its salt-limited log solubility (the K_sp estimate's own
 *   spread, or the measurement's) — moves its salt-limited dose numbers and its pH_max.
 * Linearised propagation (our simplification): a dose number moves by −Δlog S on the branch that
 * limits it at the worst pH; pH_max moves by Δ(pKa) + Δ(log S₀) − Δ(log s_salt) for a base and by
 * Δ(pKa) − Δ(log S₀) + Δ(log s_salt) for an acid. Criteria without an uncertainty (mass cost, acceptability, measured hygroscopicity) stay fixed.
 */
export interface RobustnessRow {
  id: string;
  criteria: CriterionInputs;
  error?: string | null;
  deltaPka: number | null;
  worstSolid: 'salt' | 'free-form' | null;
  gastricSolid: 'salt' | 'free-form' | null;
  /** Independent 1σ of the salt-limited log₁₀ solubility, decades. */
  saltLog10Sigma: number;
  /** True when the salt-limited solubility is anchored on S₀ (estimated K_sp). */
  saltAnchoredOnIntrinsic: boolean;
}

export interface RobustnessShared {
  drugKind: 'base' | 'acid';
  drugPkaSigma: number;
  log10IntrinsicSigma: number;
  bands?: DeltaPkaBands;
}

export interface RobustnessResult {
  id: string;
  /** Share of iterations in which the candidate ranked 1–3. */
  pTop3: number;
  /** Share of iterations in which it ranked first. */
  pFirst: number;
  medianRank: number;
}

/**
 * One iteration's draw: the shared shifts and each candidate's shift of its salt-limited log₁₀
 * solubility (its own spread plus, when anchored, the shared S₀ shift), decades.
 */
export interface RobustnessDraw {
  dPka: number;
  dS0: number;
  /** Per live candidate, in the order of the rows given to {@link drawRobustnessShifts}. */
  saltShift: Float64Array;
}

/** The generator the draws take their normals from (a seeded one: createSeededRandom). */
export interface NormalSource {
  normal(): number;
}

/**
 * Draw one iteration of the Monte Carlo into `out` (the one place that knows what is drawn and in
 * which order; rankRobustness and the value-of-information loop of measure-next/ both use it).
 */
export function drawRobustnessShifts(
  rng: NormalSource,
  live: readonly RobustnessRow[],
  shared: RobustnessShared,
  out: RobustnessDraw,
): void {
  out.dPka = rng.normal() * shared.drugPkaSigma;
  out.dS0 = rng.normal() * shared.log10IntrinsicSigma;
  for (let i = 0; i < live.length; i++) {
    const r = live[i]!;
    const ds = rng.normal() * r.saltLog10Sigma;
    out.saltShift[i] = ds + (r.saltAnchoredOnIntrinsic ? out.dS0 : 0);
  }
}

/**
 * The weighted score of one candidate under a draw's shared shifts and its own salt shift
 * (linearised as described above).
 */
export function scoreUnderShifts(
  r: RobustnessRow,
  weights: ScreeningWeights,
  shared: RobustnessShared,
  dPka: number,
  dS0: number,
  saltShift: number,
): number {
  const sign = shared.drugKind === 'base' ? 1 : -1;
  const c = r.criteria;
  const worstShift = r.worstSolid === 'salt' ? saltShift : r.worstSolid === 'free-form' ? dS0 : 0;
  const gastricShift =
    r.gastricSolid === 'salt' ? saltShift : r.gastricSolid === 'free-form' ? dS0 : 0;
  // margin = pH_max − micro-pH for a base, micro-pH − pH_max for an acid.
  const dMargin = sign * dPka + dS0 - saltShift;
  // Field by field (not a spread): this runs a million times in a value-of-information run.
  const perturbed: CriterionInputs = {
    saltProbability:
      r.deltaPka === null
        ? c.saltProbability
        : saltProbabilityFor(r.deltaPka + sign * dPka, shared.bands ?? DEFAULT_DELTA_PKA_BANDS),
    log10WorstDoseNumber:
      c.log10WorstDoseNumber === null ? null : c.log10WorstDoseNumber - worstShift,
    log10GastricDoseNumber:
      c.log10GastricDoseNumber === null ? null : c.log10GastricDoseNumber - gastricShift,
    phMaxMarginPh: c.phMaxMarginPh === null ? null : c.phMaxMarginPh + dMargin,
    activeFraction: c.activeFraction,
    acceptabilityClass: c.acceptabilityClass,
    hygroscopicity: c.hygroscopicity,
  };
  return weightedScore(criterionScores(perturbed), weights);
}

/** Check an iteration count (an integer from 1 to `max`), naming the field when refused. */
export function requireIterations(field: string, n: number, max = 1e6): number {
  if (!Number.isInteger(n) || n < 1 || n > max) {
    throw new ChemInputError(
      field,
      `${n} is not allowed`,
      `an integer from 1 to ${max.toLocaleString('en').replace(/,/g, ' ')}`,
    );
  }
  return n;
}

export function rankRobustness(
  rows: readonly RobustnessRow[],
  weights: ScreeningWeights,
  shared: RobustnessShared,
  opts: { iterations?: number; seed?: number } = {},
): RobustnessResult[] {
  const iterations = requireIterations('iterations', opts.iterations ?? 1000);
  const rng = createSeededRandom(opts.seed ?? 1);
  const live = rows.filter((r) => !r.error);
  const n = live.length;
  const top3 = new Float64Array(n);
  const first = new Float64Array(n);
  const rankCounts = live.map(() => new Uint32Array(n + 1));
  const scores = new Float64Array(n);
  const order = Array.from({ length: n }, (_, i) => i);
  const draw: RobustnessDraw = { dPka: 0, dS0: 0, saltShift: new Float64Array(n) };
  for (let it = 0; it < iterations; it++) {
    drawRobustnessShifts(rng, live, shared, draw);
    for (let i = 0; i < n; i++) {
      scores[i] = scoreUnderShifts(
        live[i]!,
        weights,
        shared,
        draw.dPka,
        draw.dS0,
        draw.saltShift[i]!,
      );
    }
    order.sort((a, b) => scores[b]! - scores[a]! || a - b);
    for (let k = 0; k < n; k++) {
      const i = order[k]!;
      if (k < 3) top3[i]! += 1;
      if (k === 0) first[i]! += 1;
      rankCounts[i]![k + 1]! += 1;
    }
  }
  const half = iterations / 2;
  return live.map((r, i) => {
    let cum = 0;
    let medianRank = n;
    const counts = rankCounts[i]!;
    for (let k = 1; k <= n; k++) {
      cum += counts[k]!;
      if (cum >= half) {
        medianRank = k;
        break;
      }
    }
    return { id: r.id, pTop3: top3[i]! / iterations, pFirst: first[i]! / iterations, medianRank };
  });
}
