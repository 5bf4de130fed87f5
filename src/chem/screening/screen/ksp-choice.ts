import { celsiusToKelvin, kelvinToCelsius } from '../../units/temperature';
import type { Estimate } from '../../result';
import { estimateKsp, log10KspFromFormulaUnits } from '../ksp-estimate';
import { log10KspFromSaltSolubility } from '../salt-equilibrium';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import { estimatedKspFlag, measuredEnthalpyReason, measuredKspReason } from './screen-reasons';
import { saltWaterReason } from './salt-water-words';
import { saltSolubilityBasis } from './salt-water-basis';
import { measuredKspNotes } from './screen-notes';
import type { Reason, SaltWaterSolubility, ScreenFlag } from './screen.types';
import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import { estimateSaltWaterSolubility } from '../salt-solubility/estimate-salt-solubility';
import { LIBRARY_COUNTER_ION_DESCRIPTORS } from '../salt-solubility/library-descriptors.data';

/** Measured-solubility spread carried into K_sp, decades per ion (our assumption: ~±10 % in solubility). */
const MEASURED_LOG10_S_SIGMA = 0.05;
/** A measurement this far from the screening temperature, K, is noted (our choice). */
const TEMPERATURE_NOTE_K = 2;

/** The K_sp a candidate is screened with, where it came from, and what is said about it. */
export interface KspChoice {
  log10Ksp: Estimate;
  kspOrigin: 'measured' | 'estimated';
  /** Spread of the salt's own log₁₀ solubility beyond that of S₀, decades (rank robustness draws it). */
  saltLog10Sigma: number;
  /** True when the salt's solubility is anchored on S₀ (so it moves with S₀ in the robustness draw). */
  anchored: boolean;
  reasons: Reason[];
  flags: ScreenFlag[];
  /** The salt's own solubility in water behind this K_sp. */
  saltWater: SaltWaterSolubility;
}

/**
 * K_sp of one prepared candidate: from the measured salt solubility when there is one, else the
 * labelled estimate: the calibrated salt-solubility model (salt-solubility/) when the counter-ion
 * has descriptors, else the common-practice anchor (ksp-estimate.ts). This is the one place that
 * chooses.
 */
export function chooseKsp(
  ctx: ScreenContext,
  p: PreparedCandidate,
  referenceSolutionEnthalpyPerDrugKJ: number | null,
): KspChoice {
  const st = p.cand.stoichiometry;
  const T = ctx.temperatureK;
  const ms = p.measured?.solubility ?? null;
  if (ms) {
    const logK =
      ms.ph === null
        ? log10KspFromFormulaUnits(
            Math.log10(ms.formulaUnitsM),
            st.drugPerSalt,
            st.counterIonPerSalt,
          )
        : log10KspFromSaltSolubility({
            drug: ctx.drugProtolyte,
            drugIonCharge: ctx.compound.ionCharge,
            drugPerSalt: st.drugPerSalt,
            counterIon: p.protolyte,
            counterIonCharge: st.ionCharge,
            counterIonPerSalt: st.counterIonPerSalt,
            pH: ms.ph,
            formulaUnitsM: ms.formulaUnitsM,
          });
    const n = st.drugPerSalt + st.counterIonPerSalt;
    const farK = ms.temperatureK !== null && Math.abs(ms.temperatureK - T) > TEMPERATURE_NOTE_K;
    const notes = measuredKspNotes(
      ms.ph,
      farK ? kelvinToCelsius(ms.temperatureK!) : null,
      kelvinToCelsius(T),
    );
    return {
      log10Ksp: {
        value: logK,
        uncertainty: n * MEASURED_LOG10_S_SIGMA,
        method: 'measured-salt-solubility',
        sources: ['measured salt solubility (user data)'],
        notes,
      },
      kspOrigin: 'measured',
      saltLog10Sigma: MEASURED_LOG10_S_SIGMA,
      anchored: false,
      reasons: [measuredKspReason(ms.formulaUnitsM * p.saltMolarMassGPerMol)],
      flags: [],
      saltWater: saltWaterOf(
        p,
        ctx,
        {
          value: Math.log10(ms.formulaUnitsM * st.drugPerSalt),
          uncertainty: MEASURED_LOG10_S_SIGMA,
          method: 'measured-salt-solubility',
          sources: ['measured salt solubility (user data)'],
          notes,
        },
        'measured',
        [],
      ),
    };
  }
  const logS0 = ctx.log10IntrinsicM;
  const descriptors =
    p.cand.counterIonDescriptors ?? LIBRARY_COUNTER_ION_DESCRIPTORS[p.cand.counterIon.id] ?? null;
  const origin = p.solutionEnthalpyOrigin;
  const enthalpyReasons = origin?.startsWith('measured') ? [measuredEnthalpyReason(origin)] : [];
  if (descriptors) {
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
    const logSD = est.log10DrugM.value;
    const sigma = est.log10DrugM.uncertainty;
    const log10Ksp: Estimate = {
      value: log10KspFromFormulaUnits(logSD - Math.log10(m), m, n),
      uncertainty: (m + n) * sigma,
      method: est.log10DrugM.method,
      sources: est.log10DrugM.sources,
      notes: ['ESTIMATE — no salt solubility measured', ...(est.log10DrugM.notes ?? [])],
    };
    return estimatedChoice(
      log10Ksp,
      est.log10DrugM,
      logS0.uncertainty,
      saltWaterOf(p, ctx, est.log10DrugM, est.origin, est.drivers),
      enthalpyReasons,
    );
  }
  const k = estimateKsp({
    log10IntrinsicM: logS0,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    solutionEnthalpyKJ: p.solutionEnthalpyKJ,
    referenceSolutionEnthalpyPerDrugKJ,
    temperatureK: T,
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
  };
}

/** The salt's water solubility in the three units the workbench shows. */
function saltWaterOf(
  p: PreparedCandidate,
  ctx: ScreenContext,
  log10DrugM: Estimate,
  origin: SaltWaterSolubility['origin'],
  drivers: SaltWaterSolubility['drivers'],
): SaltWaterSolubility {
  const drugM = 10 ** log10DrugM.value;
  const anchorDecades = ctx.settings.saltAnchorLog10;
  return {
    log10DrugM,
    mgPerMlAsSalt: (drugM / p.cand.stoichiometry.drugPerSalt) * p.saltMolarMassGPerMol,
    mgPerMlAsFreeForm: drugM * ctx.freeFormMolarMassGPerMol,
    origin,
    drivers,
    basis: saltSolubilityBasis({ origin, log10DrugM }, { anchorDecades }),
  };
}
