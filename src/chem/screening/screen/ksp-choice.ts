import type { Estimate } from '../../result';
import { estimateKsp, log10KspFromFormulaUnits } from '../ksp-estimate';
import { log10KspFromSaltSolubility } from '../salt-equilibrium';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import { estimatedKspFlag, measuredEnthalpyReason, measuredKspReason } from './screen-reasons';
import { measuredKspNotes } from './screen-notes';
import type { Reason, ScreenFlag } from './screen.types';

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
}

/**
 * K_sp of one prepared candidate: from the measured salt solubility when there is one, else the
 * labelled estimate (ksp-estimate.ts). This is the one place that chooses; a new salt-solubility
 * model plugs in here.
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
    const notes = measuredKspNotes(ms.ph, farK ? ms.temperatureK! - 273.15 : null, T - 273.15);
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
    };
  }
  const logS0 = ctx.log10IntrinsicM;
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
  const origin = p.solutionEnthalpyOrigin;
  if (origin) log10Ksp.notes = [...(log10Ksp.notes ?? []), `ΔH_sol: ${origin}`];
  const sigma = k.log10SaltLimitedDrugM.uncertainty;
  return {
    log10Ksp,
    kspOrigin: 'estimated',
    saltLog10Sigma: Math.sqrt(Math.max(0, sigma ** 2 - logS0.uncertainty ** 2)),
    anchored: true,
    reasons: origin?.startsWith('measured') ? [measuredEnthalpyReason(origin)] : [],
    flags: [estimatedKspFlag(sigma)],
  };
}
