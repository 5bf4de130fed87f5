import { celsiusToKelvin } from '../../units/temperature';
import type { Estimate } from '../../result';
import { estimateKsp, log10KspFromFormulaUnits } from '../ksp-estimate';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import type { Reason, SaltWaterSolubility, ScreenFlag } from './screen.types';
import { benchKspChoice } from './bench-ksp';
import { saltWaterOf, type KspChoice } from './ksp-choice-parts';
import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import {
  SALT_SOLUBILITY_MODEL_SOURCE,
  SALT_SOLUBILITY_SHARED_LOG10_SD,
  saltWaterNumbers,
  type SaltSolubilityOptions,
} from '../salt-solubility/estimate-salt-solubility';
import {
  enthalpyReasons,
  estimatedChoiceWords,
  modelWords,
  type ChoiceWords,
} from './salt-water-words';
import { LIBRARY_COUNTER_ION_DESCRIPTORS } from '../salt-solubility/library-descriptors.data';
import type { CounterIonDescriptors } from '../salt-solubility/counter-ion-descriptors';
import {
  fixedCounterIon,
  type SaltSolubilityInput,
} from '../salt-solubility/salt-solubility-features';

export type { KspChoice } from './ksp-choice-parts';

/**
 * K_sp of one prepared candidate: from a measured salt solubility when the bench has one that the
 * salt limited (or one whose limiting solid cannot be told, with a widened σ) — bench-ksp.ts decides —
 * else the labelled estimate: the calibrated salt-solubility model (salt-solubility/) when the
 * counter-ion has descriptors, else the common-practice anchor (ksp-estimate.ts). This is the one
 * place that chooses.
 */
export function chooseKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
): KspChoice {
  return kspWithWords(chooseKspNumbers(ctx, p, referenceSolutionEnthalpyPerDrugKJ));
}

/**
 * The same choice with an estimate's words left to be written when first read (EstimatedKsp): what a
 * screen computes for every candidate before it knows which rows it builds. A row takes
 * kspWithWords of it (screen-compound.ts).
 */
export function chooseKspNumbers(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
): KspChoice {
  const estimate = estimatedKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ);
  if (!p.measured?.allSolubilities.length) return estimate;
  return benchKspChoice(ctx, p, kspWithWords(estimate));
}

/** The estimate without any measured solubility: also "the rest of the evidence" a value is read against. */
function estimatedKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
): KspChoice {
  const descriptors =
    p.cand.counterIonDescriptors ?? LIBRARY_COUNTER_ION_DESCRIPTORS[p.cand.counterIon.id] ?? null;
  return descriptors
    ? modelKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ, descriptors)
    : anchorKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ);
}

/**
 * The common-practice anchor above S₀ (moved by the relative ΔH_sol), for a counter-ion without
 * descriptors; an estimated K_sp carries the salt's own spread beyond S₀'s (the robustness draw moves
 * S₀ separately), and its words are written when a row reads them (EstimatedKsp).
 */
function anchorKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
): KspChoice {
  const st = p.cand.stoichiometry;
  const logS0 = ctx.log10IntrinsicM;
  const origin = p.solutionEnthalpyOrigin;
  const k = estimateKsp({
    log10IntrinsicM: logS0,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    solutionEnthalpyKJ: p.solutionEnthalpyKJ,
    referenceSolutionEnthalpyPerDrugKJ,
    temperatureK: ctx.temperatureK,
    anchorLog10: ctx.settings.saltAnchorLog10,
  });
  const log10Ksp = k.log10Ksp;
  if (origin) log10Ksp.notes = [...(log10Ksp.notes ?? []), `ΔH_sol: ${origin}`];
  const log10DrugM = k.log10SaltLimitedDrugM;
  const sigma = log10DrugM.uncertainty;
  const words = () =>
    estimatedChoiceWords(sigma, saltWaterOf(p, ctx, log10DrugM, 'anchor', []), enthalpyReasons(p));
  const saltLog10Sigma = Math.sqrt(Math.max(0, sigma ** 2 - logS0.uncertainty ** 2));
  return new EstimatedKsp(log10Ksp, saltLog10Sigma, words);
}

/** What the model reads of one candidate salt. */
function modelInput(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
  descriptors: CounterIonDescriptors,
): SaltSolubilityInput {
  const st = p.cand.stoichiometry;
  const T = ctx.temperatureK;
  const m = st.drugPerSalt;
  const n = st.counterIonPerSalt;
  const dH = p.solutionEnthalpyKJ;
  const thermoShiftDecades =
    dH && referenceSolutionEnthalpyPerDrugKJ !== null
      ? -(dH.value - m * referenceSolutionEnthalpyPerDrugKJ) /
        ((m + n) * GAS_CONSTANT_KJ_PER_MOL_K * T * Math.LN10)
      : null;
  const meltingPointC = p.measured?.meltingPointC ?? null;
  return {
    drug: {
      kind: ctx.compound.kind,
      log10IntrinsicM: ctx.log10IntrinsicM.value,
      logP: ctx.compound.logP,
    },
    // The library's records are module constants: one object per record and charge, whose own
    // feature columns the model computes once. A candidate's own descriptors are read as given.
    counterIon:
      p.cand.counterIonDescriptors == null
        ? fixedCounterIon(descriptors, st.ionCharge)
        : { ...descriptors, charge: st.ionCharge },
    drugPerSalt: m,
    counterIonPerSalt: n,
    meltingPointK: meltingPointC === null ? null : celsiusToKelvin(meltingPointC),
    fusionEnthalpyKJPerMol: p.measured?.fusionEnthalpyKJPerMol ?? null,
    thermoShiftDecades,
  };
}

/**
 * The calibrated salt-solubility model's estimate, for a counter-ion with descriptors. The numbers
 * (K_sp, its σ, the σ split) are computed now: every candidate is ranked on them. The words — the
 * estimate's notes, the salt's water solubility with its basis, the reasons and the flag — are written
 * the first time a row reads them (EstimatedKsp), so a batch writing its best rows only does not
 * write them for every candidate. The object reads the same either way.
 */
function modelKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
  descriptors: CounterIonDescriptors,
): KspChoice {
  const st = p.cand.stoichiometry;
  const m = st.drugPerSalt;
  const n = st.counterIonPerSalt;
  const input = modelInput(ctx, p, referenceSolutionEnthalpyPerDrugKJ, descriptors);
  const opts: SaltSolubilityOptions = {
    log10IntrinsicSigma: ctx.log10IntrinsicM.uncertainty,
    temperatureK: ctx.temperatureK,
  };
  const num = saltWaterNumbers(input, opts);
  const sources = [SALT_SOLUBILITY_MODEL_SOURCE];
  const log10Ksp: Estimate = {
    value: log10KspFromFormulaUnits(num.value - Math.log10(m), m, n),
    uncertainty: (m + n) * num.uncertainty,
    method: num.applied ? 'salt-solubility-ridge-fusion' : 'salt-solubility-ridge',
    sources,
    notes: undefined, // written with the words (the key keeps its place)
  };
  const words = () => {
    const w = modelWords(ctx, p, input, opts, num, sources);
    log10Ksp.notes = w.kspNotes;
    return w;
  };
  // The shared per-drug level is drawn once per drug by the robustness Monte Carlo, the rest per salt.
  return new EstimatedKsp(log10Ksp, num.withinLog10Sd, words, SALT_SOLUBILITY_SHARED_LOG10_SD);
}

/**
 * An estimated K_sp whose words are written when first read: the screen ranks every candidate on the
 * numbers (log10Ksp.value, the σ split, anchored) and builds rows for some only. The words are read
 * through the class's getters (an object literal with its own accessors costs V8 about 2 µs, a class
 * getter nothing); a row, chooseKsp and the bench path take the plain object of kspWithWords, so what
 * they read is what was written at once before. Only words are deferred: they throw for no input that
 * the numbers accepted.
 */
class EstimatedKsp implements KspChoice {
  kspOrigin = 'estimated' as const;
  anchored = true;
  benchSolubility = null;
  saltSharedLog10Sigma?: number;
  private words: ChoiceWords | null = null;
  constructor(
    public log10Ksp: Estimate,
    public saltLog10Sigma: number,
    private readonly write: () => ChoiceWords,
    saltSharedLog10Sigma?: number,
  ) {
    if (saltSharedLog10Sigma !== undefined) this.saltSharedLog10Sigma = saltSharedLog10Sigma;
  }
  /** The words, written once. */
  written(): ChoiceWords {
    return (this.words ??= this.write());
  }
  get reasons(): Reason[] {
    return this.written().reasons;
  }
  get flags(): ScreenFlag[] {
    return this.written().flags;
  }
  get saltWater(): SaltWaterSolubility {
    return this.written().saltWater;
  }
}

/** A choice as a plain object with its words (the keys in the order an estimate always had). */
export function kspWithWords(k: KspChoice): KspChoice {
  if (!(k instanceof EstimatedKsp)) return k;
  const w = k.written();
  const plain: KspChoice = {
    log10Ksp: k.log10Ksp,
    kspOrigin: k.kspOrigin,
    saltLog10Sigma: k.saltLog10Sigma,
    anchored: k.anchored,
    reasons: w.reasons,
    flags: w.flags,
    saltWater: w.saltWater,
    benchSolubility: k.benchSolubility,
  };
  if (k.saltSharedLog10Sigma !== undefined) plain.saltSharedLog10Sigma = k.saltSharedLog10Sigma;
  return plain;
}
