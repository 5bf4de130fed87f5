import type { HygroscopicityClass } from './hygroscopicity';
import { CRITERIA, type CriterionKey, type ScreeningWeights } from './settings';

/**
 * The cheap weighting step of the screen: criterion scores (0–1) from the numbers screenCompound
 * computed once, a weighted mean, a sort. No physics runs here, so the UI can re-rank on every move
 * of a weight slider.
 *
 * Score maps (our own, documented choices — transparent, not calibrated):
 * - salt formation: the probability of a salt from the ΔpKa rule (0.5 when the rule does not apply);
 * - solubility (worst pH in 1.2–6.8) and gastric: 1 while D₀ ≤ 1, falling linearly in log₁₀ D₀ to 0 at
 *   D₀ = 100; 0.5 without a dose;
 * - disproportionation: 0.5 + margin/2 clamped to 0–1 (margin −1 pH unit → 0, +1 → 1); 0.5 unknown;
 * - mass cost: (f − 0.5)/0.5 clamped (a salt that is half counter-ion scores 0);
 * - acceptability class (Stahl & Wermuth 2002): 1 → 1, 2 → 0.6, 3 → 0.2, unclassified → 0.4;
 * - hygroscopicity (measured, Ph. Eur. 5.11): none 1, slightly 0.85, hygroscopic 0.5, very 0.15,
 *   deliquescent 0; not measured → 0.5.
 */
export interface CriterionInputs {
  saltProbability: number | null;
  log10WorstDoseNumber: number | null;
  log10GastricDoseNumber: number | null;
  phMaxMarginPh: number | null;
  activeFraction: number;
  acceptabilityClass: 1 | 2 | 3 | null;
  hygroscopicity: HygroscopicityClass | null;
}

const clamp01 = (x: number) => (x < 0 ? 0 : x > 1 ? 1 : x);
const doseScore = (logD0: number | null) =>
  logD0 === null ? 0.5 : clamp01(1 - Math.max(0, logD0) / 2);
const ACCEPTABILITY: Record<string, number> = { '1': 1, '2': 0.6, '3': 0.2, null: 0.4 };
const HYGRO: Record<HygroscopicityClass, number> = {
  'non-hygroscopic': 1,
  'slightly hygroscopic': 0.85,
  hygroscopic: 0.5,
  'very hygroscopic': 0.15,
  deliquescent: 0,
};

export type CriterionScores = Record<CriterionKey, number>;

export function criterionScores(c: CriterionInputs): CriterionScores {
  return {
    saltFormation: c.saltProbability ?? 0.5,
    solubility: doseScore(c.log10WorstDoseNumber),
    gastric: doseScore(c.log10GastricDoseNumber),
    disproportionation: c.phMaxMarginPh === null ? 0.5 : clamp01(0.5 + c.phMaxMarginPh / 2),
    massCost: clamp01((c.activeFraction - 0.5) / 0.5),
    acceptability: ACCEPTABILITY[String(c.acceptabilityClass)] ?? 0.4,
    hygroscopicity: c.hygroscopicity === null ? 0.5 : HYGRO[c.hygroscopicity],
  };
}

/** Weighted mean of the criterion scores (0 when every weight is 0). */
export function weightedScore(s: CriterionScores, w: ScreeningWeights): number {
  let num = 0;
  let den = 0;
  for (const k of CRITERIA) {
    num += w[k] * s[k];
    den += w[k];
  }
  return den > 0 ? num / den : 0;
}

export interface RankableRow {
  id: string;
  criteria: CriterionInputs;
  /** Rows with an error are listed last and never ranked. */
  error?: string | null;
}

export interface RankedRow {
  id: string;
  rank: number | null;
  score: number | null;
  scores: CriterionScores | null;
  /** Each criterion's share of the score, weight·score/Σweights (sums to the score). */
  contributions: Partial<Record<CriterionKey, number>>;
}

/** Rank rows by weighted score, best first; ties keep input order. Cheap: O(n log n), no physics. */
export function rankCandidates(
  rows: readonly RankableRow[],
  weights: ScreeningWeights,
): RankedRow[] {
  let den = 0;
  for (const k of CRITERIA) den += weights[k];
  const scored = rows.map((r, i) => {
    if (r.error)
      return {
        i,
        out: { id: r.id, rank: null, score: null, scores: null, contributions: {} } as RankedRow,
      };
    const scores = criterionScores(r.criteria);
    const contributions: Partial<Record<CriterionKey, number>> = {};
    for (const k of CRITERIA) contributions[k] = den > 0 ? (weights[k] * scores[k]) / den : 0;
    return {
      i,
      out: {
        id: r.id,
        rank: null,
        score: weightedScore(scores, weights),
        scores,
        contributions,
      } as RankedRow,
    };
  });
  scored.sort((a, b) => {
    const sa = a.out.score;
    const sb = b.out.score;
    if (sa === null && sb === null) return a.i - b.i;
    if (sa === null) return 1;
    if (sb === null) return -1;
    return sb - sa || a.i - b.i;
  });
  let rank = 0;
  return scored.map(({ out }) => (out.score === null ? out : { ...out, rank: ++rank }));
}

/** The ranked entry of a scored row (rank given), as rankCandidates builds it. */
function rankedEntry(
  r: RankableRow,
  kept: { score: number; scores: CriterionScores },
  weights: ScreeningWeights,
  den: number,
  rank: number,
): RankedRow {
  const { score, scores } = kept;
  const contributions: Partial<Record<CriterionKey, number>> = {};
  for (const k of CRITERIA) contributions[k] = den > 0 ? (weights[k] * scores[k]) / den : 0;
  return { id: r.id, rank, score, scores, contributions };
}

/**
 * The first `top` entries of {@link rankCandidates} — the same entries, numbers and order — each with
 * the index of its row, for a caller that writes only those (a batch with --top N): every row is
 * scored, but only the best are kept (ties keep input order, errors last), without a sort of all rows
 * or an entry object for each.
 */
export function rankTop(
  rows: readonly RankableRow[],
  weights: ScreeningWeights,
  top: number,
): { index: number; ranked: RankedRow }[] {
  let den = 0;
  for (const k of CRITERIA) den += weights[k];
  const best: { index: number; score: number; scores: CriterionScores }[] = [];
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    if (r.error) continue;
    const scores = criterionScores(r.criteria);
    const score = weightedScore(scores, weights);
    // a NaN score has no place in an order: the full ranking decides, as it always did
    if (Number.isNaN(score)) return fullRankTop(rows, weights, top);
    // insert after every kept row with a score at least as high (an earlier row wins a tie)
    let at = best.length;
    while (at > 0 && best[at - 1]!.score < score) at--;
    if (at >= top) continue;
    best.splice(at, 0, { index: i, score, scores });
    if (best.length > top) best.pop();
  }
  const out = best.map((b, k) => ({
    index: b.index,
    ranked: rankedEntry(rows[b.index]!, b, weights, den, k + 1),
  }));
  for (let i = 0; i < rows.length && out.length < top; i++) {
    const r = rows[i]!;
    if (r.error)
      out.push({
        index: i,
        ranked: { id: r.id, rank: null, score: null, scores: null, contributions: {} },
      });
  }
  return out;
}

/** rankCandidates cut to `top`, each entry with its row's index (ids are unique within a screen). */
function fullRankTop(rows: readonly RankableRow[], weights: ScreeningWeights, top: number) {
  return rankCandidates(rows, weights)
    .slice(0, top)
    .map((ranked) => ({ index: rows.findIndex((r) => r.id === ranked.id), ranked }));
}
