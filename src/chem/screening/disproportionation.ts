import { requireFiniteInRange } from '../result';
import {
  excipientPhEstimate,
  worstExcipient,
  type ExcipientRisk,
} from './excipients/excipient-risk';
import { EXCIPIENTS } from './excipients/excipients.data';

/**
 * Disproportionation risk of a salt in a solid dose form (Serajuddin 2007, Adv. Drug Deliv. Rev. 59,
 * 603, §3; Stephenson, Aburub & Woods 2011, J. Pharm. Sci. 100, 1607): a salt of a weak base converts
 * to its free base where the microenvironment pH exceeds pH_max (a salt of a weak acid: where it falls
 * below pH_max). The margin bands below (≥ 1 pH unit safe, 0–1 watch) are common practice.
 *
 * What the microenvironment pH is taken from (`basis`):
 * - `stated`: the user gave the formulation's microenvironment pH;
 * - `assumed`: nobody did — the screen scores against an assumed pH (7 by default) and says so, and
 *   every reason names the pH at which the salt would convert instead of claiming that it will;
 * - `excipients`: the formulation's excipients were chosen — each salt is judged against each of them
 *   (excipient-risk.ts) and the most likely converter decides.
 */
export type DisproportionationRisk = 'low' | 'watch' | 'high' | 'unknown';
export type MicroenvironmentBasis = 'stated' | 'assumed' | 'excipients';

export interface DisproportionationResult {
  risk: DisproportionationRisk;
  /** pH units between pH_max and the microenvironment pH, positive = on the salt's side. */
  marginPh: number | null;
  reason: string;
  basis: MicroenvironmentBasis;
  /** pH_max: the salt converts to the free form above it (base) or below it (acid). */
  thresholdPh: number | null;
  conversionSide: 'above' | 'below';
  /** The microenvironment pH judged against (stated, assumed, or the worst excipient's midpoint). */
  judgedAtPh: number | null;
  /** With excipients: the one most likely to convert the salt, and that probability. */
  worstExcipientId: string | null;
  probability: number | null;
}

const side = (kind: 'base' | 'acid'): 'above' | 'below' => (kind === 'base' ? 'above' : 'below');

/** Each bundled excipient's midpoint slurry pH (excipientPhEstimate), taken once. */
const EXCIPIENT_MIDPOINT_PH: readonly number[] = EXCIPIENTS.map((e) => excipientPhEstimate(e).ph);

/** "below the slurry pH of 14 of 27 bundled excipients (e.g. …)": what an unknown pH could meet. */
function excipientsBeyond(phMax: number, kind: 'base' | 'acid'): string {
  const beyond = EXCIPIENTS.filter((_, k) => {
    const ph = EXCIPIENT_MIDPOINT_PH[k]!;
    return kind === 'base' ? ph > phMax : ph < phMax;
  });
  if (beyond.length === 0) return `no bundled excipient's slurry pH lies ${side(kind)} it`;
  const eg = beyond
    .slice(0, 2)
    .map((e) => e.name.toLowerCase())
    .join(', ');
  return `${beyond.length} of ${EXCIPIENTS.length} bundled excipients have a slurry pH ${side(kind)} it (e.g. ${eg})`;
}

/**
 * The margin disproportionationRisk reports (its `marginPh`), after the same input check, without its
 * words: what a ranking scores, for rows that may never be written.
 */
export function disproportionationMarginPh(
  phMax: number | null,
  microenvironmentPh: number,
  drugKind: 'base' | 'acid',
): number | null {
  requireFiniteInRange('microenvironmentPh', microenvironmentPh, 0, 14);
  if (phMax === null) return null;
  return drugKind === 'base' ? phMax - microenvironmentPh : microenvironmentPh - phMax;
}

export function disproportionationRisk(
  phMax: number | null,
  microenvironmentPh: number,
  drugKind: 'base' | 'acid',
  basis: 'stated' | 'assumed' = 'stated',
): DisproportionationResult {
  const margin = disproportionationMarginPh(phMax, microenvironmentPh, drugKind);
  const noPhMax = phMax === null || margin === null;
  const risk = noPhMax ? 'unknown' : margin < 0 ? 'high' : margin < 1 ? 'watch' : 'low';
  // one literal, its keys in the order the result always had (serialised rows keep their bytes)
  return {
    basis,
    thresholdPh: phMax,
    conversionSide: side(drugKind),
    judgedAtPh: microenvironmentPh,
    worstExcipientId: null,
    probability: null,
    risk,
    marginPh: noPhMax ? null : margin,
    reason:
      noPhMax || risk === 'unknown'
        ? 'pH_max lies outside pH 0–14, so no disproportionation check was possible'
        : reasonFor(risk, margin, phMax, microenvironmentPh, drugKind, basis),
  };
}

function reasonFor(
  risk: 'high' | 'watch' | 'low',
  margin: number,
  phMax: number,
  pH: number,
  kind: 'base' | 'acid',
  basis: 'stated' | 'assumed',
): string {
  const where = `pH_max ${phMax.toFixed(1)} vs microenvironment pH ${pH.toFixed(1)}`;
  if (basis === 'stated') {
    if (risk === 'high') return `may convert to the free form in the dose form (${where})`;
    if (risk === 'watch') return `less than one pH unit from disproportionation (${where})`;
    return `salt side by ${margin.toFixed(1)} pH units (${where})`;
  }
  const would = `would convert to the free form ${side(kind)} pH ${phMax.toFixed(1)} (pH_max)`;
  const assumed = `microenvironment pH not stated, assumed ${pH.toFixed(1)}`;
  if (risk === 'low') return `${would}; salt side by ${margin.toFixed(1)} pH units (${assumed})`;
  return `${would} — ${excipientsBeyond(phMax, kind)} (${assumed}; choose the excipients to judge it)`;
}

const BAND_RISK = { likely: 'high', possible: 'watch', unlikely: 'low' } as const;

/**
 * The salt judged against the formulation's chosen excipients: the excipient most likely to convert
 * it decides the risk (likely → high, possible → watch, unlikely → low) and the margin the ranking
 * scores (pH_max against that excipient's midpoint pH).
 */
export function excipientDisproportionation(
  phMax: number | null,
  phMaxSigma: number,
  risks: readonly ExcipientRisk[],
  drugKind: 'base' | 'acid',
): DisproportionationResult {
  const worst = worstExcipient(risks);
  const base = {
    basis: 'excipients' as const,
    thresholdPh: phMax,
    conversionSide: side(drugKind),
  };
  if (phMax === null || worst === null || worst.band === 'unknown') {
    return {
      ...base,
      risk: 'unknown',
      marginPh: null,
      judgedAtPh: null,
      worstExcipientId: null,
      probability: null,
      reason: 'pH_max lies outside pH 0–14, so the salt could not be judged against the excipients',
    };
  }
  const ph = worst.excipientPh;
  const p = worst.probability!;
  const margin = drugKind === 'base' ? phMax - ph.ph : ph.ph - phMax;
  const detail = `${worst.excipientName}, slurry pH ${ph.phLow.toFixed(1)}–${ph.phHigh.toFixed(1)}; P = ${p.toFixed(2)} that it lies ${side(drugKind)} pH_max ${phMax.toFixed(1)} ± ${phMaxSigma.toFixed(1)}`;
  const reason =
    worst.band === 'likely'
      ? `likely to convert to the free form beside ${detail}`
      : worst.band === 'possible'
        ? `may convert to the free form beside ${detail}`
        : `salt side with every chosen excipient (most likely converter: ${detail})`;
  return {
    ...base,
    risk: BAND_RISK[worst.band],
    marginPh: margin,
    judgedAtPh: ph.ph,
    worstExcipientId: worst.excipientId,
    probability: p,
    reason,
  };
}
