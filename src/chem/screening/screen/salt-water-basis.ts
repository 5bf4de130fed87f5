import { SALT_SOLUBILITY_MODEL } from '../salt-solubility/salt-solubility-model.data';
import { superscript } from '../../report/superscript';

/**
 * What a salt's water solubility actually rests on, as data: the one source every explanation of it
 * (the reasons, the "estimated K_sp" rule, the assumptions, the sheet, the CSV notes) is written from,
 * so no text can name a model the screen did not use. Built from the estimate itself (its origin and
 * method) and from the shipped model's own description (salt-solubility-model.data.ts), never from
 * a fixed sentence.
 */
/** Where a salt's water solubility came from (SaltWaterSolubility.origin). */
export type SaltWaterOrigin = 'model' | 'model+fusion' | 'measured' | 'anchor';

export interface SaltSolubilityBasis {
  origin: SaltWaterOrigin;
  /** The fitted model behind an estimate (origin model or model+fusion), from the shipped model file. */
  model: {
    id: string;
    kind: string;
    /** The model's predictors, as named in the model file. */
    predictors: readonly string[];
    nSalts: number;
    nDrugs: number;
    /** The leave-one-drug-out RMSE carried as its 1σ, decades. */
    cvRmseLog10: number | null;
    /** Whether a ΔH_sol term is one of its predictors. */
    usesSolutionEnthalpy: boolean;
  } | null;
  /** The anchor behind an estimate for a counter-ion without descriptors (origin anchor). */
  anchor: { decadesAboveS0: number; solutionEnthalpyShift: boolean } | null;
  /** Whether the bench's melting data moved the estimate ('applied'), or none was used. */
  /** 'shown': melting data gave an ideal solubility that is shown beside the estimate, not applied. */
  fusion: 'applied' | 'shown' | 'none';
  /**
   * What the bench reading says about a measured value (wt/bench's structured fields: which solid
   * limits it, the temperature step). Empty when nothing is known; each entry is one phrase.
   */
  bench: string[];
}

/** How the shipped model file names each predictor, in words (an unknown name is shown as is). */
export const PREDICTOR_WORDS: Record<string, string> = {
  drugLog10IntrinsicM: 'S₀',
  drugLogP: 'the drug’s log P',
  drugIsAcid: 'acid or base',
  counterIonLogPParent: 'counter-ion log P',
  counterIonAromaticRings: 'aromatic rings',
  counterIonHBondDonorsAcceptors: 'hydrogen-bond groups',
  counterIonHeavyAtoms: 'size',
  counterIonInorganic: 'inorganic or organic',
  multivalentSalt: 'charge',
  thermoShiftDecades: 'relative ΔH_sol',
  log10IdealMoleFraction: 'ideal solubility from the melting point',
};

interface ModelLiteral {
  readonly id: string;
  readonly kind: string;
  readonly featureNames: readonly string[];
  readonly nSalts: number;
  readonly nDrugs: number;
  readonly cvRmseLog10: number | null;
}

function modelOf(literal: ModelLiteral): NonNullable<SaltSolubilityBasis['model']> {
  return {
    id: literal.id,
    kind: literal.kind,
    predictors: literal.featureNames,
    nSalts: literal.nSalts,
    nDrugs: literal.nDrugs,
    cvRmseLog10: literal.cvRmseLog10,
    usesSolutionEnthalpy: literal.featureNames.includes('thermoShiftDecades'),
  };
}

/**
 * The shipped model as a basis names it: one object for every estimate (the model file is fixed), so
 * its words (modelWords) are written once too. Read-only: a reader that wants to change it copies it.
 */
let shippedBasis: NonNullable<SaltSolubilityBasis['model']> | null = null;
const shippedModelBasis = () => (shippedBasis ??= modelOf(SALT_SOLUBILITY_MODEL as ModelLiteral));

/** A hook for the bench reading's structured fields: each known field becomes one phrase. */
export type BenchReadingFields = Partial<{
  limitedBy: 'salt' | 'free-form' | 'unknown';
  impliedS0MgPerMl: number | null;
  temperatureAdjustment: string | null;
}>;

/** The phrases of a bench reading, in order (a new field of wt/bench is one line here). */
export function benchReadingPhrases(b: BenchReadingFields | undefined): string[] {
  if (!b) return [];
  const out: string[] = [];
  if (b.limitedBy === 'salt') out.push('the salt was the solid at equilibrium');
  if (b.limitedBy === 'free-form') out.push('the free form limited it: evidence on S₀');
  if (b.limitedBy === 'unknown') out.push('which solid limited it is not known (σ widened)');
  if (b.impliedS0MgPerMl != null)
    out.push(`it implies S₀ ≈ ${b.impliedS0MgPerMl.toPrecision(2)} mg/mL`);
  if (b.temperatureAdjustment) out.push(b.temperatureAdjustment);
  return out;
}

/** The basis of one salt's water solubility, from the estimate the screen used. */
export function saltSolubilityBasis(
  s: { origin: SaltWaterOrigin; log10DrugM: { method: string } },
  opts: { anchorDecades?: number; bench?: BenchReadingFields } = {},
): SaltSolubilityBasis {
  const method = s.log10DrugM.method;
  const fitted = s.origin === 'model' || s.origin === 'model+fusion';
  return {
    origin: s.origin,
    model: fitted ? shippedModelBasis() : null,
    anchor:
      s.origin === 'anchor'
        ? {
            decadesAboveS0: opts.anchorDecades ?? 2,
            solutionEnthalpyShift: method === 'ksp-estimate-anchor-thermo',
          }
        : null,
    fusion: s.origin === 'model+fusion' ? 'applied' : 'none',
    bench: s.origin === 'measured' ? benchReadingPhrases(opts.bench) : [],
  };
}

const tenTo = (d: number) => `10${superscript(String(d), /[0-9.]/g)}`;

/** The fitted model in words, from its own description (which predictors, which data, which error). */
export function modelWords(m: NonNullable<SaltSolubilityBasis['model']>): string {
  if (m === shippedBasis) return (shippedWords ??= modelWordsOf(m));
  return modelWordsOf(m);
}
let shippedWords: string | null = null;

function modelWordsOf(m: NonNullable<SaltSolubilityBasis['model']>): string {
  const others = m.predictors
    .filter((p) => p !== 'drugLog10IntrinsicM' && p !== 'thermoShiftDecades')
    .map((p) => PREDICTOR_WORDS[p] ?? p);
  const level =
    m.kind === 'within-series'
      ? 'its level S₀ plus the average salt-to-S₀ offset of the published series'
      : m.kind === 'pooled'
        ? 'one fit pooled over all published salts'
        : `${m.kind} fit`;
  const cv =
    m.cvRmseLog10 === null
      ? ''
      : `; ±${m.cvRmseLog10.toFixed(2)} decades from leaving whole drugs out`;
  return `ridge regression in log₁₀ on S₀${others.length ? ` and ${others.join(', ')}` : ''} (${level}), fitted to ${m.nSalts} published salts of ${m.nDrugs} drugs${cv}; ${m.usesSolutionEnthalpy ? 'with a relative ΔH_sol term' : 'ΔH_sol not used'}`;
}

/** What a salt's water solubility rests on, in one sentence, written from its basis. */
export function basisWords(b: SaltSolubilityBasis): string {
  switch (b.origin) {
    case 'measured':
      return ['your measured solubility of this salt', ...b.bench].join('; ');
    case 'anchor':
      return `common-practice anchor ${tenTo(b.anchor?.decadesAboveS0 ?? 2)} × S₀ (no descriptors for this counter-ion)${b.anchor?.solutionEnthalpyShift ? ', moved by its ΔH_sol relative to the other candidates' : ''}`;
    default:
      return `model estimate: ${b.model ? modelWords(b.model) : 'salt-solubility model'}${b.fusion === 'applied' ? '; shifted by the ideal solubility from your melting data (Schröder–van Laar)' : ''}`;
  }
}

/** The same, short enough for a reason or a table cell. */
export function basisShortWords(b: SaltSolubilityBasis): string {
  switch (b.origin) {
    case 'measured':
      return ['measured', ...b.bench].join('; ');
    case 'anchor':
      return `anchor ${tenTo(b.anchor?.decadesAboveS0 ?? 2)} × S₀${b.anchor?.solutionEnthalpyShift ? ' moved by relative ΔH_sol' : ''}`;
    default:
      return `model from ${b.model?.nSalts ?? '?'} published salts${b.fusion === 'applied' ? ' + your melting data' : ''}`;
  }
}
