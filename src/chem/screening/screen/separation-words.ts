import {
  shortlistSeparation,
  type CriterionSeparation,
  type SeparationCandidate,
  type ShortlistSeparation,
} from '../separation';
import type { CriterionKey, ScreeningWeights } from '../settings';
import type { ScreenResult, ScreenRow } from './screen.types';

/**
 * What separates this shortlist, in one line and its details: the one text the Ranking area, the
 * sheet, the sheet's CSV and the CLI's CSV notes show (the statistic is separation.ts).
 */
export const CRITERION_SHORT_WORDS: Record<CriterionKey, string> = {
  saltFormation: 'salt formation (ΔpKa)',
  solubility: 'the dose dissolving at pH 1.2–6.8',
  gastric: 'gastric D₀',
  disproportionation: 'staying a salt in the tablet (pH_max)',
  massCost: 'tablet mass',
  acceptability: 'counter-ion class',
  hygroscopicity: 'moisture uptake',
};

export interface SeparationSummary extends ShortlistSeparation {
  /** One line: what the order rests on, and whether the salts' solubilities are separable. */
  headline: string;
  /** The rest in words: criteria within uncertainty, the same for all, and why. */
  details: string[];
}

/** A screen row as the separation statistic reads it. */
export function separationCandidateOf(row: ScreenRow): SeparationCandidate {
  return {
    criteria: row.criteria,
    deltaPka: row.deltaPka,
    worstSolid: row.worst?.solid ?? null,
    gastricSolid: row.gastric?.solid ?? null,
    saltWaterLog10: row.saltWaterSolubility?.log10DrugM.value ?? null,
    robustness: row.robustness,
  };
}

const list = (xs: readonly string[]) =>
  xs.length <= 1 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`;

const ratioWords = (c: CriterionSeparation) =>
  c.ratio === Infinity ? 'exact' : `spread ${c.ratio.toPrecision(2)} × its pooled 1σ`;

/** Why a criterion is the same for all, where the screen knows (gastric conversion). */
function gastricWhy(rows: readonly ScreenRow[]): string {
  const others = rows.filter((r) => r.counterIonId !== 'chloride' && r.gastric);
  const converted = others.filter((r) => r.gastric!.convertsTo);
  if (others.length >= 2 && converted.length === others.length) {
    return ` (every salt converts to the ${converted[0]!.gastric!.convertsTo!.replace(/\s*\([^)]*\)\s*$/, '')} in gastric chloride, so its D₀ is the same for all)`;
  }
  return '';
}

/**
 * When the disproportionation flag stands on most salts, say what it rests on (the structured basis
 * of the disproportionation result): an assumed microenvironment pH is an assumption, not a difference
 * between the salts; a stated pH or the chosen excipients are the user's formulation.
 */
function microPhWords(rows: readonly ScreenRow[]): string | null {
  const n = rows.length;
  const high = rows.filter((r) => r.disproportionation?.risk === 'high');
  if (n < 2 || high.length < 2 || high.length * 2 < n) return null;
  const d = high[0]!.disproportionation!;
  const at = d.judgedAtPh === null ? '' : ` ${d.judgedAtPh}`;
  const stands = `the free-form conversion risk stands on ${high.length} of ${n} salts`;
  if (d.basis === 'assumed')
    return `${stands} at the microenvironment pH${at} assumed until the formulation is known (Screening conditions): it reflects that assumption, not a difference between the salts`;
  if (d.basis === 'stated') return `${stands} at the stated microenvironment pH${at}`;
  return `${stands} against the chosen excipients`;
}

/** The summary of one screen under the given weights (the Ranking area's current ones). */
export function separationSummary(
  screen: Pick<ScreenResult, 'rows' | 'robustnessShared'>,
  weights: ScreeningWeights,
): SeparationSummary | null {
  const rows = screen.rows.filter((r) => !r.error);
  if (rows.length < 2) return null;
  const sep = shortlistSeparation(
    rows.map(separationCandidateOf),
    screen.robustnessShared,
    weights,
  );
  const by = (v: CriterionSeparation['verdict']) => sep.criteria.filter((c) => c.verdict === v);
  const separating = by('separates');
  const head =
    separating.length > 0
      ? `The order rests on ${list(separating.map((c) => CRITERION_SHORT_WORDS[c.key]))}`
      : 'No criterion separates this shortlist beyond its uncertainty: the screen does not decide the order';
  const w = sep.saltWater;
  const water = !w
    ? ''
    : w.verdict === 'separates'
      ? `; the salts’ solubilities in water differ beyond their uncertainty (span ${w.spread.toFixed(1)} decades, pooled 1σ ${w.pooledSigma.toFixed(1)})`
      : `; the salts’ solubilities in water are not separable before measurement (span ${w.spread.toFixed(1)} decades within a pooled 1σ of ${w.pooledSigma.toFixed(1)})`;
  const details: string[] = [];
  if (separating.length)
    details.push(
      `Separates: ${separating.map((c) => `${CRITERION_SHORT_WORDS[c.key]} (${ratioWords(c)})`).join('; ')}.`,
    );
  const within = by('within-uncertainty');
  if (within.length)
    details.push(
      `Within uncertainty (spread ≤ ${2} pooled 1σ): ${within.map((c) => `${CRITERION_SHORT_WORDS[c.key]} (${ratioWords(c)})`).join('; ')}.`,
    );
  const same = by('same-for-all');
  if (same.length)
    details.push(
      `Same for every candidate: ${same.map((c) => `${CRITERION_SHORT_WORDS[c.key]}${c.key === 'gastric' ? gastricWhy(rows) : ''}`).join('; ')}.`,
    );
  const unweighted = by('not-weighted');
  if (unweighted.length)
    details.push(
      `Not weighted: ${unweighted.map((c) => CRITERION_SHORT_WORDS[c.key]).join(', ')}.`,
    );
  const micro = microPhWords(rows);
  if (micro) details.push(`${micro.charAt(0).toUpperCase()}${micro.slice(1)}.`);
  return { ...sep, headline: `${head}${water}.`, details };
}
