import { saltFormationVerdict } from './delta-pka';
import { criterionScores, type CriterionInputs } from './ranking';
import type { RobustnessRow, RobustnessShared } from './rank-robustness';
import { CRITERIA, type CriterionKey, type ScreeningWeights } from './settings';
import { uncertaintiesOf } from './screen/row-uncertainty';

/**
 * What separates a shortlist: for each ranking criterion, the spread of the candidates' criterion
 * scores against the scores' own uncertainty.
 *
 * Statistic (our definition, stated in DEVELOPERS.md): for criterion k with scores s_i and 1σ u_i
 * over the n screened candidates,
 *   spread_k = max_i s_i − min_i s_i,   pooled σ_k = √(Σ u_i² / n),   ratio_k = spread_k / pooled σ_k;
 * the criterion **separates** the shortlist when ratio_k > 2 (a range wider than two pooled 1σ —
 * for two candidates, a difference of more than 1.4 σ of a difference), is **the same for all** when
 * spread_k < 0.02 (it moves no weighted score by more than 0.02 × its weight share; common practice),
 * and is **within uncertainty** otherwise. A criterion whose input is exact (tablet mass from the
 * formula, the acceptability class, a measured moisture class) has u_i = 0: any spread of 0.02 or
 * more separates. A criterion with weight 0 does not order anything and says so.
 *
 * u_i is the score's response to the input's 1σ, (score(x + σ) − score(x − σ))/2 (a central
 * difference, so a saturated score — every dose dissolving — has u_i = 0 and, with no spread, is the
 * same for all): ΔpKa moves by the drug pKa's 1σ, log₁₀ D₀ by the 1σ of whichever solid limits it, the
 * pH_max margin by pH_max's 1σ — the same σ the rank-robustness draw uses (uncertaintiesOf, screen/row-uncertainty.ts).
 *
 * The salts' own solubilities in water (not a criterion, but what a formulator asks first) are judged
 * by the same statistic on log₁₀ S(salt, water) with each salt's own 1σ beyond S₀ (the part not
 * shared by every salt of the drug).
 */
export type SeparationVerdict =
  'separates' | 'within-uncertainty' | 'same-for-all' | 'not-weighted';

export interface Separation {
  spread: number;
  pooledSigma: number;
  /** spread / pooled σ; Infinity for an exact criterion with a spread, 0 without one. */
  ratio: number;
  verdict: SeparationVerdict;
}

export interface CriterionSeparation extends Separation {
  key: CriterionKey;
}

/** A candidate as the statistic reads it: its criterion inputs, ΔpKa and 1σ (from the screen row). */
export interface SeparationCandidate {
  criteria: CriterionInputs;
  deltaPka: number | null;
  /** The worst-pH and gastric solids (which 1σ applies to their dose numbers). */
  worstSolid: 'salt' | 'free-form' | null;
  gastricSolid: 'salt' | 'free-form' | null;
  /** log₁₀ S(salt, water), decades (null without an estimate); its own 1σ is robustness.saltLog10Sigma. */
  saltWaterLog10: number | null;
  /** The salt's own 1σ beyond S₀ and whether it moves with S₀ (as the rank-robustness draw reads them). */
  robustness: Pick<RobustnessRow, 'saltLog10Sigma' | 'saltAnchoredOnIntrinsic'>;
}

/** Ratio above which a criterion separates the shortlist (our definition). */
export const SEPARATES_RATIO = 2;
/** Score spread below which a criterion is the same for every candidate (common practice). */
export const SAME_SPREAD = 0.02;

/** The statistic on plain numbers: values and their 1σ, a minimum spread, a weight. */
export function separationOf(
  values: readonly number[],
  sigmas: readonly number[],
  minSpread: number,
  weight = 1,
): Separation {
  if (values.length === 0) return { spread: 0, pooledSigma: 0, ratio: 0, verdict: 'same-for-all' };
  const spread = Math.max(...values) - Math.min(...values);
  const pooledSigma = Math.sqrt(sigmas.reduce((s, u) => s + u * u, 0) / sigmas.length);
  const ratio = pooledSigma > 0 ? spread / pooledSigma : spread > 0 ? Infinity : 0;
  const verdict: SeparationVerdict =
    weight <= 0
      ? 'not-weighted'
      : spread < minSpread
        ? 'same-for-all'
        : ratio > SEPARATES_RATIO
          ? 'separates'
          : 'within-uncertainty';
  return { spread, pooledSigma, ratio, verdict };
}

type Perturb = (c: SeparationCandidate, sign: 1 | -1) => CriterionInputs | null;

/** How each criterion's input moves by +1σ / −1σ (null: an exact input, u = 0). */
function perturbers(
  shared: RobustnessShared,
  sig: (c: SeparationCandidate) => ReturnType<typeof uncertaintiesOf>,
): Partial<Record<CriterionKey, Perturb>> {
  const logD = (solid: SeparationCandidate['worstSolid'], c: SeparationCandidate) =>
    solid === 'salt' ? sig(c).saltLogSigma : sig(c).freeLogSigma;
  return {
    saltFormation: (c, s) =>
      c.deltaPka === null
        ? null
        : {
            ...c.criteria,
            saltProbability: saltFormationVerdict(
              c.deltaPka + s * shared.drugPkaSigma,
              shared.bands,
            ).saltProbability,
          },
    solubility: (c, s) =>
      c.criteria.log10WorstDoseNumber === null
        ? null
        : {
            ...c.criteria,
            log10WorstDoseNumber: c.criteria.log10WorstDoseNumber + s * logD(c.worstSolid, c),
          },
    gastric: (c, s) =>
      c.criteria.log10GastricDoseNumber === null
        ? null
        : {
            ...c.criteria,
            log10GastricDoseNumber: c.criteria.log10GastricDoseNumber + s * logD(c.gastricSolid, c),
          },
    disproportionation: (c, s) =>
      c.criteria.phMaxMarginPh === null
        ? null
        : { ...c.criteria, phMaxMarginPh: c.criteria.phMaxMarginPh + s * sig(c).phMaxSigma },
  };
}

/** Each criterion's separation over the candidates, and that of the salts' own water solubilities. */
export interface ShortlistSeparation {
  criteria: CriterionSeparation[];
  /** The salts' own water solubilities (log₁₀), or null with fewer than two estimates. */
  saltWater: Separation | null;
}

export function shortlistSeparation(
  candidates: readonly SeparationCandidate[],
  shared: RobustnessShared,
  weights: ScreeningWeights,
): ShortlistSeparation {
  const sig = (c: SeparationCandidate) => uncertaintiesOf(c, shared);
  const moves = perturbers(shared, sig);
  const criteria = CRITERIA.map((key): CriterionSeparation => {
    const scores: number[] = [];
    const sigmas: number[] = [];
    for (const c of candidates) {
      scores.push(criterionScores(c.criteria)[key]);
      const up = moves[key]?.(c, 1) ?? null;
      const down = moves[key]?.(c, -1) ?? null;
      sigmas.push(
        up && down ? Math.abs(criterionScores(up)[key] - criterionScores(down)[key]) / 2 : 0,
      );
    }
    return { key, ...separationOf(scores, sigmas, SAME_SPREAD, weights[key]) };
  });
  const withWater = candidates.filter((c) => c.saltWaterLog10 !== null);
  const saltWater =
    withWater.length >= 2
      ? separationOf(
          withWater.map((c) => c.saltWaterLog10!),
          withWater.map((c) => c.robustness.saltLog10Sigma),
          0,
        )
      : null;
  return { criteria, saltWater };
}
