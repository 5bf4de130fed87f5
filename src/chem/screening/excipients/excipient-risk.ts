import { normalCdf } from '../../numerics/normal-cdf';
import { ChemInputError, requireFiniteInRange } from '../../result';
import { EXCIPIENTS, SINGLE_VALUE_HALF_WIDTH_PH, type ExcipientRecord } from './excipients.data';

/**
 * How likely a salt is to convert to its free form beside one excipient (disproportionation in the
 * solid dose form, Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603, §3): a salt of a base converts
 * where the microenvironment pH exceeds pH_max, a salt of an acid where it falls below pH_max.
 *
 * Both pH values are uncertain. pH_max is normal with the screen's 1σ (pKa, S₀ and the salt's own
 * solubility, as the rank-robustness draw propagates them). The excipient's pH is known as a published
 * range; it is read as a rectangular distribution over that range and carried as a normal with the
 * same mean and standard deviation (GUM, JCGM 100:2008 §4.3.7: u = half-width/√3). Then, for a base,
 * P(conversion) = Φ((pH_exc − pH_max) / √(σ_max² + σ_exc²)), and the mirror image for an acid.
 *
 * Not modelled (said wherever the matrix is shown): the excipient's share of the blend and its
 * buffer capacity, the salt's own surface pH, water content and humidity, temperature, and kinetics —
 * a slurry pH says which side of pH_max an excipient pushes towards, not whether conversion happens in
 * the shelf life.
 */

/** Words for P(conversion), our own banding (no published standard; common practice for a screen). */
export type ConversionBand = 'unlikely' | 'possible' | 'likely';
/** The band in words, as the app, the sheet and the CSV say it. */
export const CONVERSION_BAND_WORDS: Record<ConversionBand | 'unknown', string> = {
  likely: 'conversion likely',
  possible: 'conversion possible',
  unlikely: 'conversion unlikely',
  unknown: 'not judged (no pH_max)',
};
/**
 * A probability as per cent for display: never "0 %" or "100 %" (the normal tails never reach them),
 * "<1 %" and ">99 %" instead.
 */
export function probabilityPercentText(p: number): string {
  if (p < 0.005) return '<1 %';
  if (p > 0.995) return '>99 %';
  return `${Math.round(p * 100)} %`;
}

/** P from which a pairing is "possible" and from which it is "likely" (our own choice). */
export const CONVERSION_BAND_LIMITS = { possibleFrom: 0.1, likelyFrom: 0.5 } as const;

/** Names of the excipient roles, for grouping the table. */
export const EXCIPIENT_ROLE_NAMES: Record<ExcipientRecord['role'], string> = {
  filler: 'Fillers',
  disintegrant: 'Disintegrants',
  lubricant: 'Lubricants',
  glidant: 'Glidants',
  binder: 'Binders',
  acidifier: 'Acidifiers',
  alkaliser: 'Alkalisers and buffers',
};

/** What the matrix does not model — said beside it in the app, on the sheet and in exports. */
export const EXCIPIENT_MATRIX_LIMITS =
  'Each excipient is judged by its published slurry pH alone: its share of the blend, its buffer capacity, the salt’s own surface pH, water content, humidity, temperature and the rate of conversion are not modelled. Measure the blend’s slurry pH and stress it before relying on a pairing.';

export interface ExcipientPhEstimate {
  /** Midpoint of the published range, pH. */
  ph: number;
  /** 1σ of the rectangular distribution over the range (widened single values included). */
  sigma: number;
  phLow: number;
  phHigh: number;
}

export interface ExcipientRisk {
  excipientId: string;
  excipientName: string;
  excipientPh: ExcipientPhEstimate;
  /** Probability that the excipient's pH lies on the free-form side of pH_max; null without pH_max. */
  probability: number | null;
  band: ConversionBand | 'unknown';
}

/** The excipient's pH as a midpoint with 1σ (rectangular over its range, GUM §4.3.7). */
export function excipientPhEstimate(e: ExcipientRecord): ExcipientPhEstimate {
  const single = e.phHigh - e.phLow < 1e-9;
  const phLow = single ? e.phLow - SINGLE_VALUE_HALF_WIDTH_PH : e.phLow;
  const phHigh = single ? e.phHigh + SINGLE_VALUE_HALF_WIDTH_PH : e.phHigh;
  return { ph: (phLow + phHigh) / 2, sigma: (phHigh - phLow) / Math.sqrt(12), phLow, phHigh };
}

/**
 * P(the excipient pushes the salt past pH_max), both pH values normal (see the file comment). With
 * no spread at all the answer is a step: 1 beyond pH_max, 0 on the salt's side, ½ exactly at it.
 */
export function conversionProbability(
  phMax: number,
  phMaxSigma: number,
  excipientPh: number,
  excipientPhSigma: number,
  drugKind: 'base' | 'acid',
): number {
  requireFiniteInRange('phMax', phMax, -2, 16);
  requireFiniteInRange('phMaxSigma', phMaxSigma, 0, 10);
  requireFiniteInRange('excipientPh', excipientPh, 0, 14);
  requireFiniteInRange('excipientPhSigma', excipientPhSigma, 0, 7);
  const beyond = drugKind === 'base' ? excipientPh - phMax : phMax - excipientPh;
  const s = Math.hypot(phMaxSigma, excipientPhSigma);
  if (s === 0) return beyond > 0 ? 1 : beyond < 0 ? 0 : 0.5;
  return normalCdf(beyond / s);
}

export function conversionBand(p: number): ConversionBand {
  if (p >= CONVERSION_BAND_LIMITS.likelyFrom) return 'likely';
  if (p >= CONVERSION_BAND_LIMITS.possibleFrom) return 'possible';
  return 'unlikely';
}

const BY_ID = new Map(EXCIPIENTS.map((e) => [e.id, e]));

/** The bundled excipient of that id, or undefined. */
export function excipientById(id: string): ExcipientRecord | undefined {
  return BY_ID.get(id);
}

/** The bundled excipients of these ids, in the given order; an unknown id is refused by name. */
export function resolveExcipients(ids: readonly string[], field = 'excipients'): ExcipientRecord[] {
  return ids.map((id, k) => {
    const e = BY_ID.get(id);
    if (!e)
      throw new ChemInputError(
        `${field}.${k}`,
        `"${id}" is not a bundled excipient`,
        `one of: ${EXCIPIENTS.map((x) => x.id).join(', ')}`,
      );
    return e;
  });
}

/** One salt against each chosen excipient (the row of the salt × excipient matrix). */
export function excipientRisks(
  phMax: number | null,
  phMaxSigma: number,
  excipients: readonly ExcipientRecord[],
  drugKind: 'base' | 'acid',
): ExcipientRisk[] {
  return excipients.map((e) => {
    const est = excipientPhEstimate(e);
    const probability =
      phMax === null ? null : conversionProbability(phMax, phMaxSigma, est.ph, est.sigma, drugKind);
    return {
      excipientId: e.id,
      excipientName: e.name,
      excipientPh: est,
      probability,
      band: probability === null ? 'unknown' : conversionBand(probability),
    };
  });
}

/** The excipient most likely to convert the salt (the first of equals), or null. */
export function worstExcipient(risks: readonly ExcipientRisk[]): ExcipientRisk | null {
  let worst: ExcipientRisk | null = null;
  for (const r of risks) {
    if (r.probability === null) continue;
    if (worst === null || r.probability > worst.probability!) worst = r;
  }
  return worst;
}
