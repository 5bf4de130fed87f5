import { createSeededRandom, type SeededRandom } from '../numerics/prng';
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
 * - one shared level of the salt-solubility model (σ `saltSharedLog10Sigma`): about half of the
 *   model's cross-validated error is a level common to every salt of one drug (salt-solubility/
 *   model-evidence.ts), so it is drawn ONCE per drug per iteration and moves every model-estimated
 *   salt of the drug together;
 * - per candidate, an independent shift of its salt-limited log solubility (σ `saltLog10Sigma`: the
 *   model's within-series part, or the measurement's spread) — moves its salt-limited dose numbers
 *   and its pH_max.
 * The draw is one function, {@link drawRobustnessPerturbation}, and its effect on a candidate's
 * criteria another, {@link perturbedCriteria}, so other Monte Carlo users (measure-next/) sample
 * exactly the same way.
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
  /** Independent (per-candidate) 1σ of the salt-limited log₁₀ solubility, decades. */
  saltLog10Sigma: number;
  /**
   * 1σ of the salt-solubility model's level shared by every salt of the drug, decades: drawn once per
   * drug per iteration (absent or 0 for measured and anchored values).
   */
  saltSharedLog10Sigma?: number;
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

/** One Monte Carlo draw of every uncertain input the criteria rest on. */
export interface RobustnessDraw {
  /** Shift of the drug's pKa (shared by every candidate). */
  dPka: number;
  /** Shift of log₁₀ S₀ (shared). */
  dLog10S0: number;
  /** Standard normal deviate of the salt-solubility model's shared per-drug level (0 if not drawn). */
  zSaltShared?: number;
  /** Per row (same order as the rows drawn for): total shift of its salt-limited log₁₀ solubility. */
  saltShift: Float64Array;
}

/**
 * Draw one perturbation for the given rows: the pKa shift, the S₀ shift, the salt model's shared
 * per-drug level (once), then each row's own salt shift = within part + shared level × the row's
 * shared σ + the S₀ shift when the estimate is anchored on S₀. Consumes 3 + rows.length normal
 * deviates, in that order. `out` may be passed to reuse its array.
 */
export function drawRobustnessPerturbation(
  rows: readonly RobustnessRow[],
  shared: RobustnessShared,
  rng: SeededRandom,
  out?: RobustnessDraw,
): RobustnessDraw {
  const d: RobustnessDraw = out ?? {
    dPka: 0,
    dLog10S0: 0,
    saltShift: new Float64Array(rows.length),
  };
  d.dPka = rng.normal() * shared.drugPkaSigma;
  d.dLog10S0 = rng.normal() * shared.log10IntrinsicSigma;
  const z = rng.normal();
  d.zSaltShared = z;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    d.saltShift[i] =
      rng.normal() * r.saltLog10Sigma +
      z * (r.saltSharedLog10Sigma ?? 0) +
      (r.saltAnchoredOnIntrinsic ? d.dLog10S0 : 0);
  }
  return d;
}

/** A row's criteria under one draw (linearised as described above); `i` is its index in the draw. */
export function perturbedCriteria(
  r: RobustnessRow,
  draw: RobustnessDraw,
  i: number,
  shared: RobustnessShared,
): CriterionInputs {
  const sign = shared.drugKind === 'base' ? 1 : -1;
  const saltShift = draw.saltShift[i]!;
  const dS0 = draw.dLog10S0;
  const c = r.criteria;
  const worstShift = r.worstSolid === 'salt' ? saltShift : r.worstSolid === 'free-form' ? dS0 : 0;
  const gastricShift =
    r.gastricSolid === 'salt' ? saltShift : r.gastricSolid === 'free-form' ? dS0 : 0;
  // margin = pH_max − micro-pH for a base, micro-pH − pH_max for an acid.
  const dMargin = sign * draw.dPka + dS0 - saltShift;
  // Field by field (not a spread): this runs about a million times in a measure-next run.
  return {
    saltProbability:
      r.deltaPka === null
        ? c.saltProbability
        : saltProbabilityFor(
            r.deltaPka + sign * draw.dPka,
            shared.bands ?? DEFAULT_DELTA_PKA_BANDS,
          ),
    log10WorstDoseNumber:
      c.log10WorstDoseNumber === null ? null : c.log10WorstDoseNumber - worstShift,
    log10GastricDoseNumber:
      c.log10GastricDoseNumber === null ? null : c.log10GastricDoseNumber - gastricShift,
    phMaxMarginPh: c.phMaxMarginPh === null ? null : c.phMaxMarginPh + dMargin,
    activeFraction: c.activeFraction,
    acceptabilityClass: c.acceptabilityClass,
    hygroscopicity: c.hygroscopicity,
  };
}

export function rankRobustness(
  rows: readonly RobustnessRow[],
  weights: ScreeningWeights,
  shared: RobustnessShared,
  opts: { iterations?: number; seed?: number } = {},
): RobustnessResult[] {
  const iterations = opts.iterations ?? 1000;
  if (!Number.isInteger(iterations) || iterations < 1 || iterations > 1e6) {
    throw new ChemInputError(
      'iterations',
      `${iterations} is not allowed`,
      'an integer from 1 to 1 000 000',
    );
  }
  const rng = createSeededRandom(opts.seed ?? 1);
  const live = rows.filter((r) => !r.error);
  const n = live.length;
  const top3 = new Float64Array(n);
  const first = new Float64Array(n);
  const rankCounts = live.map(() => new Uint32Array(n + 1));
  const scores = new Float64Array(n);
  const order = Array.from({ length: n }, (_, i) => i);
  let draw: RobustnessDraw | undefined;
  for (let it = 0; it < iterations; it++) {
    draw = drawRobustnessPerturbation(live, shared, rng, draw);
    for (let i = 0; i < n; i++) {
      scores[i] = weightedScore(
        criterionScores(perturbedCriteria(live[i]!, draw, i, shared)),
        weights,
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
