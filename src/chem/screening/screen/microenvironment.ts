import {
  disproportionationMarginPh,
  disproportionationRisk,
  excipientDisproportionation,
  type DisproportionationResult,
} from '../disproportionation';
import { excipientById, excipientRisks, type ExcipientRisk } from '../excipients/excipient-risk';
import type { ExcipientRecord } from '../excipients/excipients.data';
import type { ScreeningSettings } from '../settings';

/** The chosen excipients that the bundled table knows, in the order chosen. */
export function chosenExcipients(settings: ScreeningSettings): ExcipientRecord[] {
  return settings.excipients
    .map((id) => excipientById(id))
    .filter((e): e is ExcipientRecord => e !== undefined);
}

/** A salt judged against the microenvironment of its dose form (see microenvironmentJudgement). */
export interface MicroenvironmentJudgement {
  /** The disproportionation margin the ranking scores: `disproportionation.marginPh`, without words. */
  readonly marginPh: number | null;
  readonly disproportionation: DisproportionationResult;
  readonly excipientRisks: ExcipientRisk[];
}

/**
 * The judgement against the stated or the assumed microenvironment pH: its margin now (with the input
 * check), its result and reason words when first read — a ranking reads every salt's margin but the
 * words of the rows it writes only. The result is disproportionationRisk's, built from the same inputs.
 */
class JudgementAtPh implements MicroenvironmentJudgement {
  readonly marginPh: number | null;
  readonly excipientRisks: ExcipientRisk[] = [];
  private result: DisproportionationResult | null = null;

  constructor(
    private readonly phMax: number | null,
    private readonly microenvironmentPh: number,
    private readonly drugKind: 'base' | 'acid',
    private readonly basis: 'stated' | 'assumed',
  ) {
    this.marginPh = disproportionationMarginPh(phMax, microenvironmentPh, drugKind);
  }

  get disproportionation(): DisproportionationResult {
    return (this.result ??= disproportionationRisk(
      this.phMax,
      this.microenvironmentPh,
      this.drugKind,
      this.basis,
    ));
  }
}

/**
 * A salt against the microenvironment of its dose form: against every chosen excipient when there are
 * any (they replace the single pH), else against the stated or the assumed microenvironment pH.
 */
export function microenvironmentJudgement(
  settings: ScreeningSettings,
  phMax: number | null,
  phMaxSigma: number,
  drugKind: 'base' | 'acid',
): MicroenvironmentJudgement {
  const excipients = settings.excipients.length > 0 ? chosenExcipients(settings) : [];
  if (excipients.length > 0) {
    const risks = excipientRisks(phMax, phMaxSigma, excipients, drugKind);
    const disproportionation = excipientDisproportionation(phMax, phMaxSigma, risks, drugKind);
    return { marginPh: disproportionation.marginPh, disproportionation, excipientRisks: risks };
  }
  const basis = settings.microenvironmentPhStated ? 'stated' : 'assumed';
  return new JudgementAtPh(phMax, settings.microenvironmentPh, drugKind, basis);
}

/** Whether the judgement is against one pH (no chosen excipient the bundled table knows), as above. */
export function judgedAtOnePh(settings: ScreeningSettings): boolean {
  return settings.excipients.length === 0 || chosenExcipients(settings).length === 0;
}

/**
 * The margin at `lo` when the disproportionation score, clamp01(0.5 + margin/2) (ranking.ts), is the
 * same for every pH_max in [lo, hi]; else null. Against one pH the margin is pH_max − pH (base) or
 * pH − pH_max (acid): a rounded subtraction, monotone in pH_max, so between its values at lo and hi.
 * Both ≥ 1: 0.5 + margin/2 ≥ 1 rounds to ≥ 1 and the clamp gives 1; both ≤ −1: it rounds to ≤ 0 and
 * the clamp gives 0 (+0 when the sum is 0) — whatever pH_max in the span, the same bits. Against
 * excipients the score is a smooth probability: never saturated here.
 */
export function saturatedMarginOver(
  settings: ScreeningSettings,
  lo: number,
  hi: number,
  drugKind: 'base' | 'acid',
): number | null {
  if (!judgedAtOnePh(settings)) return null;
  const atLo = disproportionationMarginPh(lo, settings.microenvironmentPh, drugKind)!;
  const atHi = disproportionationMarginPh(hi, settings.microenvironmentPh, drugKind)!;
  return (atLo >= 1 && atHi >= 1) || (atLo <= -1 && atHi <= -1) ? atLo : null;
}

/** The line of the screen's assumptions that says what the disproportionation criterion rests on. */
export function microenvironmentAssumption(settings: ScreeningSettings): string {
  const excipients = chosenExcipients(settings);
  const unknown = settings.excipients.filter((id) => !excipientById(id));
  const skipped =
    unknown.length > 0 ? ` Not in the bundled table, left out: ${unknown.join(', ')}.` : '';
  if (excipients.length > 0)
    return (
      `Disproportionation is judged against the chosen excipients (${excipients.map((e) => e.name).join(', ')}) by their published slurry pH, ` +
      'each as a range with its spread, against pH_max ± 1σ; the excipient most likely to convert a salt decides. ' +
      'Not modelled: the excipients’ share of the blend and buffer capacity, water content, humidity and kinetics.' +
      skipped
    );
  if (settings.microenvironmentPhStated)
    return `Disproportionation is judged against the stated microenvironment pH ${settings.microenvironmentPh}.${skipped}`;
  return (
    `The microenvironment pH of the dose form is not stated: the disproportionation criterion is scored against an assumed pH ${settings.microenvironmentPh}, ` +
    'and each reason gives the pH beyond which the salt would convert. State the pH or choose the excipients to judge it.' +
    skipped
  );
}
