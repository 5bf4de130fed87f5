import {
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

/**
 * A salt against the microenvironment of its dose form: against every chosen excipient when there are
 * any (they replace the single pH), else against the stated or the assumed microenvironment pH.
 */
export function microenvironmentJudgement(
  settings: ScreeningSettings,
  phMax: number | null,
  phMaxSigma: number,
  drugKind: 'base' | 'acid',
): { disproportionation: DisproportionationResult; excipientRisks: ExcipientRisk[] } {
  const excipients = chosenExcipients(settings);
  if (excipients.length > 0) {
    const risks = excipientRisks(phMax, phMaxSigma, excipients, drugKind);
    return {
      disproportionation: excipientDisproportionation(phMax, phMaxSigma, risks, drugKind),
      excipientRisks: risks,
    };
  }
  const basis = settings.microenvironmentPhStated ? 'stated' : 'assumed';
  return {
    disproportionation: disproportionationRisk(phMax, settings.microenvironmentPh, drugKind, basis),
    excipientRisks: [],
  };
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
