import { celsiusToKelvin } from '../../units/temperature';
import type { Estimate } from '../../result';
import { estimateKsp, log10KspFromFormulaUnits } from '../ksp-estimate';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import { estimatedKspFlag, measuredEnthalpyReason } from './screen-reasons';
import { saltWaterReason } from './salt-water-words';
import type { Reason, SaltWaterSolubility } from './screen.types';
import { benchKspChoice } from './bench-ksp';
import { saltWaterOf, type KspChoice } from './ksp-choice-parts';
import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import { estimateSaltWaterSolubility } from '../salt-solubility/estimate-salt-solubility';
import { LIBRARY_COUNTER_ION_DESCRIPTORS } from '../salt-solubility/library-descriptors.data';
import type { CounterIonDescriptors } from '../salt-solubility/counter-ion-descriptors';

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
  const enthalpyReasons = origin?.startsWith('measured') ? [measuredEnthalpyReason(origin)] : [];
  return descriptors
    ? modelKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ, descriptors, enthalpyReasons)
    : anchorKsp(ctx, p, referenceSolutionEnthalpyPerDrugKJ, enthalpyReasons);
}

/** The calibrated salt-solubility model's estimate, for a counter-ion with descriptors. */
function modelKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
  descriptors: CounterIonDescriptors,
  enthalpyReasons: Reason[],
): KspChoice {
  const st = p.cand.stoichiometry;
  const T = ctx.temperatureK;
  const logS0 = ctx.log10IntrinsicM;
  const m = st.drugPerSalt;
  const n = st.counterIonPerSalt;
  const dH = p.solutionEnthalpyKJ;
  const thermoShiftDecades =
    dH && referenceSolutionEnthalpyPerDrugKJ !== null
      ? -(dH.value - m * referenceSolutionEnthalpyPerDrugKJ) /
        ((m + n) * GAS_CONSTANT_KJ_PER_MOL_K * T * Math.LN10)
      : null;
  const meltingPointC = p.measured?.meltingPointC ?? null;
  const est = estimateSaltWaterSolubility(
    {
      drug: { kind: ctx.compound.kind, log10IntrinsicM: logS0.value, logP: ctx.compound.logP },
      counterIon: { ...descriptors, charge: st.ionCharge },
      drugPerSalt: m,
      counterIonPerSalt: n,
      meltingPointK: meltingPointC === null ? null : celsiusToKelvin(meltingPointC),
      fusionEnthalpyKJPerMol: p.measured?.fusionEnthalpyKJPerMol ?? null,
      thermoShiftDecades,
    },
    { log10IntrinsicSigma: logS0.uncertainty, temperatureK: T },
  );
  const log10Ksp: Estimate = {
    value: log10KspFromFormulaUnits(est.log10DrugM.value - Math.log10(m), m, n),
    uncertainty: (m + n) * est.log10DrugM.uncertainty,
    method: est.log10DrugM.method,
    sources: est.log10DrugM.sources,
    notes: ['ESTIMATE — no salt solubility measured', ...(est.log10DrugM.notes ?? [])],
  };
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
  const choice = estimatedChoice(log10Ksp, est.log10DrugM, logS0.uncertainty, saltWater, [
    ...remarks,
    ...enthalpyReasons,
  ]);
  // The shared per-drug level is drawn once per drug by the robustness Monte Carlo, the rest per salt.
  return {
    ...choice,
    saltLog10Sigma: est.withinLog10Sd,
    saltSharedLog10Sigma: est.sharedLog10Sd,
  };
}

/** The common-practice anchor above S₀ (moved by the relative ΔH_sol), for a counter-ion without descriptors. */
function anchorKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
  enthalpyReasons: Reason[],
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
  const saltWater = saltWaterOf(p, ctx, k.log10SaltLimitedDrugM, 'anchor', []);
  return estimatedChoice(
    log10Ksp,
    k.log10SaltLimitedDrugM,
    logS0.uncertainty,
    saltWater,
    enthalpyReasons,
  );
}

/**
 * An estimated K_sp as the screen carries it: the salt's own spread beyond S₀'s (the robustness draw
 * moves S₀ separately), its words and the "estimated" flag.
 */
function estimatedChoice(
  log10Ksp: Estimate,
  log10DrugM: Estimate,
  log10IntrinsicSigma: number,
  saltWater: SaltWaterSolubility,
  enthalpyReasons: Reason[],
): KspChoice {
  const sigma = log10DrugM.uncertainty;
  return {
    log10Ksp,
    kspOrigin: 'estimated',
    saltLog10Sigma: Math.sqrt(Math.max(0, sigma ** 2 - log10IntrinsicSigma ** 2)),
    anchored: true,
    reasons: [saltWaterReason(saltWater), ...enthalpyReasons],
    flags: [estimatedKspFlag(sigma, saltWater.basis)],
    saltWater,
    benchSolubility: null,
  };
}
