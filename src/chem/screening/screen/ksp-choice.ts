import { celsiusToKelvin } from '../../units/temperature';
import type { Estimate } from '../../result';
import { estimateKsp, log10KspFromFormulaUnits } from '../ksp-estimate';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import { estimatedKspFlag, measuredEnthalpyReason } from './screen-reasons';
import { saltWaterReason } from './salt-water-words';
import type { Reason, SaltWaterSolubility, ScreenFlag } from './screen.types';
import { benchKspChoice } from './bench-ksp';
import { saltWaterOf, type KspChoice } from './ksp-choice-parts';
import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import {
  SALT_SOLUBILITY_MODEL_SOURCE,
  SALT_SOLUBILITY_SHARED_LOG10_SD,
  saltWaterEstimateOf,
  saltWaterNumbers,
  type SaltSolubilityOptions,
  type SaltWaterNumbers,
} from '../salt-solubility/estimate-salt-solubility';
import { LIBRARY_COUNTER_ION_DESCRIPTORS } from '../salt-solubility/library-descriptors.data';
import type { CounterIonDescriptors } from '../salt-solubility/counter-ion-descriptors';
import type { SaltSolubilityInput } from '../salt-solubility/salt-solubility-features';

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
  const estimate = estimatedKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ);
  if (!p.measured?.allSolubilities.length) return estimate;
  return benchKspChoice(ctx, p, estimate);
}

/** The estimate without any measured solubility: also "the rest of the evidence" a value is read against. */
function estimatedKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
): KspChoice {
  const descriptors =
    p.cand.counterIonDescriptors ?? LIBRARY_COUNTER_ION_DESCRIPTORS[p.cand.counterIon.id] ?? null;
  const origin = p.solutionEnthalpyOrigin;
  const enthalpyReasons = (): Reason[] =>
    origin?.startsWith('measured') ? [measuredEnthalpyReason(origin)] : [];
  return descriptors
    ? modelKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ, descriptors, enthalpyReasons)
    : anchorKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ, enthalpyReasons);
}

/**
 * The common-practice anchor above S₀ (moved by the relative ΔH_sol), for a counter-ion without
 * descriptors; an estimated K_sp carries the salt's own spread beyond S₀'s (the robustness draw moves
 * S₀ separately), and its words are written when a row reads them (lazyChoice).
 */
function anchorKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
  enthalpyReasons: () => Reason[],
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
    estimatedChoiceWords(sigma, saltWaterOf(p, ctx, log10DrugM, 'anchor', []), enthalpyReasons());
  const saltLog10Sigma = Math.sqrt(Math.max(0, sigma ** 2 - logS0.uncertainty ** 2));
  return lazyChoice(log10Ksp, saltLog10Sigma, words);
}

/**
 * The counter-ion as the salt-solubility model reads it (its descriptors and its charge in this salt),
 * one object per descriptor record and charge: the descriptors are fixed, so every candidate salt of
 * every compound with that counter-ion reads the same object (a weak map, so a custom counter-ion's
 * record is let go with it).
 */
const withCharge = new WeakMap<
  CounterIonDescriptors,
  Map<number, SaltSolubilityInput['counterIon']>
>();
function counterIonWithCharge(
  d: CounterIonDescriptors,
  charge: number,
): SaltSolubilityInput['counterIon'] {
  let byCharge = withCharge.get(d);
  if (!byCharge) withCharge.set(d, (byCharge = new Map()));
  let c = byCharge.get(charge);
  if (!c) byCharge.set(charge, (c = { ...d, charge }));
  return c;
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
    counterIon: counterIonWithCharge(descriptors, st.ionCharge),
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
 * the first time a row reads them (lazyChoice), so a batch writing its best rows only does not
 * write them for every candidate. The object reads the same either way.
 */
function modelKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
  descriptors: CounterIonDescriptors,
  enthalpyReasons: () => Reason[],
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
  let words: (ChoiceWords & { kspNotes: string[] | undefined }) | null = null;
  const wordsOf = () => (words ??= modelWords(ctx, p, input, opts, num, sources, enthalpyReasons));
  const log10Ksp: Estimate = {
    value: log10KspFromFormulaUnits(num.value - Math.log10(m), m, n),
    uncertainty: (m + n) * num.uncertainty,
    method: num.applied ? 'salt-solubility-ridge-fusion' : 'salt-solubility-ridge',
    sources,
    get notes() {
      return wordsOf().kspNotes;
    },
    set notes(v) {
      wordsOf().kspNotes = v;
    },
  };
  // The shared per-drug level is drawn once per drug by the robustness Monte Carlo, the rest per salt.
  return lazyChoice(log10Ksp, num.withinLog10Sd, wordsOf, SALT_SOLUBILITY_SHARED_LOG10_SD);
}

/** The words of a model estimate: the estimate with its words, the salt's water solubility, reasons, flag. */
function modelWords(
  ctx: ScreenContext,
  p: PreparedCandidate,
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions,
  num: SaltWaterNumbers,
  sources: string[],
  enthalpyReasons: () => Reason[],
): ChoiceWords & { kspNotes: string[] | undefined } {
  const est = saltWaterEstimateOf(input, opts, num, sources);
  const kspNotes = ['ESTIMATE — no salt solubility measured', ...(est.log10DrugM.notes ?? [])];
  const base = saltWaterOf(p, ctx, est.log10DrugM, est.origin, est.drivers);
  // Melting data that the check did not let shift the estimate are shown beside it, not applied.
  if (est.fusion && !est.fusion.applied) base.basis = { ...base.basis, fusion: 'shown' };
  const saltWater: SaltWaterSolubility = {
    ...base,
    sharedLog10Sd: est.sharedLog10Sd,
    withinLog10Sd: est.withinLog10Sd,
    outsideTrainingRange: est.domain.outside,
  };
  // The estimate's remarks (outside the training range, divalent cation, melting data) as reasons.
  const remarks: Reason[] = est.remarks.map((text) => ({
    kind: 'note',
    criterion: 'solubility',
    text,
  }));
  return {
    kspNotes,
    ...estimatedChoiceWords(est.log10DrugM.uncertainty, saltWater, [
      ...remarks,
      ...enthalpyReasons(),
    ]),
  };
}

/** What an estimated K_sp says about itself: the salt's water solubility, the reasons, the flag. */
interface ChoiceWords {
  reasons: Reason[];
  flags: ScreenFlag[];
  saltWater: SaltWaterSolubility;
}

/** An estimate's words: its water solubility as a reason, the other reasons, the "estimated" flag. */
function estimatedChoiceWords(
  sigma: number,
  saltWater: SaltWaterSolubility,
  otherReasons: Reason[],
): ChoiceWords {
  return {
    reasons: [saltWaterReason(saltWater), ...otherReasons],
    flags: [estimatedKspFlag(sigma, saltWater.basis)],
    saltWater,
  };
}

/**
 * An estimated K_sp whose words are written when first read. The screen ranks every candidate on the
 * numbers (log10Ksp.value, the σ split, anchored) and reads the words of the rows it shows only; the
 * words are own enumerable properties (getters, kept once written), so a spread, structured clone,
 * JSON or deep equality sees the same object, with the same keys in the same order, as when they were
 * written at once. Only words are deferred: they throw for no input that the numbers accepted.
 */
function lazyChoice(
  log10Ksp: Estimate,
  saltLog10Sigma: number,
  words: () => ChoiceWords,
  saltSharedLog10Sigma?: number,
): KspChoice {
  let w: ChoiceWords | null = null;
  const get = () => (w ??= words());
  const choice: KspChoice = {
    log10Ksp,
    kspOrigin: 'estimated',
    saltLog10Sigma,
    anchored: true,
    get reasons() {
      return get().reasons;
    },
    set reasons(v) {
      get().reasons = v;
    },
    get flags() {
      return get().flags;
    },
    set flags(v) {
      get().flags = v;
    },
    get saltWater() {
      return get().saltWater;
    },
    set saltWater(v) {
      get().saltWater = v;
    },
    benchSolubility: null,
  };
  if (saltSharedLog10Sigma !== undefined) choice.saltSharedLog10Sigma = saltSharedLog10Sigma;
  return choice;
}
