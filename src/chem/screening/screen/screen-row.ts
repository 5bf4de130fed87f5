import { saltDeltaPka, saltFormationVerdict } from '../delta-pka';
import { doseNumber, ICH_M9_PH_RANGE } from '../dose-number';
import { activeFraction, saltMassPerDoseMg } from '../mass-cost';
import {
  fastPathApplies,
  gridFromPoints,
  gridPhMax,
  saltOnGrid,
  type GridSolubility,
} from '../ph-grid-solubility';
import { checkProfileInput, phSolubilityProfile, type ProfileSalt } from '../ph-profile';
import type { RobustnessShared } from '../rank-robustness';
import type { CriterionInputs } from '../ranking';
import { clearlyLower, screenDoseNumbers, solubilityClassOf } from './dose-numbers';
import type { KspChoice } from './ksp-choice';
import { mediumResults, type HydrochlorideReference, type ScreenMedium } from './media';
import { microenvironmentJudgement } from './microenvironment';
import { uncertaintiesOf } from './row-uncertainty';
import type { PreparedCandidate } from './prepare-candidate';
import { freeFormMgPerMl, saltMassInput, type ScreenContext } from './screen-context';
import {
  acceptabilityReason,
  disproportionationWords,
  gastricReason,
  massCostReason,
  measuredReasons,
  notScreenedReason,
  saltFormationWords,
  saltName,
  saltPoorlySolubleFlag,
  worstSolubilityReason,
} from './screen-reasons';
import { poorlySolubleFlag } from './salt-water-words';
import { solutionEnthalpyShown } from './solution-enthalpy-shown';
import type { Reason, ScreenFlag, ScreeningCandidate, ScreenRow } from './screen.types';

/** ΔpKa against each of the counter-ion's pKa values, from the drug's pKa that forms the salt. */
function deltaPkaEach(ctx: ScreenContext, p: PreparedCandidate): number[] {
  const c = ctx.compound;
  const drugP = ctx.drugProtolyte;
  const drugLink =
    drugP.pKas[drugP.mostProtonatedCharge - c.ionCharge + (c.kind === 'base' ? 0 : -1)];
  if (drugLink === undefined) return [];
  return p.protolyte.pKas.map((x) => (c.kind === 'base' ? drugLink - x : x - drugLink));
}

/**
 * The lowest solubility on the salt branch (below pH_max, where the salt is the solid), as a flag when
 * even there the salt cannot carry the dose — unlike the free-form limit above pH_max, which every salt
 * of this drug shares and so does not tell one salt from another. Judged over the ICH M9 window
 * (pH 1.2–6.8) only, like every dose number, so the flag never cites a pH outside it.
 */
function saltBranchFlag(ctx: ScreenContext, grid: GridSolubility): ScreenFlag | null {
  if (ctx.doseMg === null) return null;
  let lowest = -1;
  for (let k = 0; k < grid.phs.length; k++) {
    if (grid.saltSolid[k] !== 1) continue;
    const pH = grid.phs[k]!;
    if (pH < ICH_M9_PH_RANGE[0] - 1e-9 || pH > ICH_M9_PH_RANGE[1] + 1e-9) continue;
    if (lowest < 0 || clearlyLower(grid.solubilityM[k]!, grid.solubilityM[lowest]!)) lowest = k;
  }
  if (lowest < 0) return null;
  const mg = freeFormMgPerMl(ctx, grid.solubilityM[lowest]!);
  const d0 = doseNumber(ctx.doseMg, mg);
  return d0 > 1 ? saltPoorlySolubleFlag(mg, grid.phs[lowest]!, d0) : null;
}

/**
 * The salt's points on the pH grid and its pH_max. With ideal activities the fast grid evaluation
 * (ph-grid-solubility.ts) gives the numbers phSolubilityProfile gives, after the same input checks;
 * the Davies option takes the general solver.
 */
function saltProfile(
  ctx: ScreenContext,
  salt: ProfileSalt,
): { grid: GridSolubility; phMax: number | null } {
  if (!fastPathApplies(ctx.grid)) {
    const profile = phSolubilityProfile(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
    return { grid: gridFromPoints(profile.points), phMax: profile.phMax };
  }
  checkProfileInput(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
  return { grid: saltOnGrid(ctx.grids.profile, salt), phMax: gridPhMax(ctx.grids, salt) };
}

/** The screened row of one candidate, from its prepared inputs and its K_sp (asked for in step order). */
export function candidateRow(
  ctx: ScreenContext,
  p: PreparedCandidate,
  label: string,
  kspOf: () => KspChoice,
  media: readonly ScreenMedium[],
  hcl: HydrochlorideReference | null,
  shared: RobustnessShared,
): ScreenRow {
  const { cand, protolyte, measured } = p;
  const c = ctx.compound;
  const st = cand.stoichiometry;
  const name = saltName(label, cand.counterIon.name);
  const reasons: Reason[] = [];
  const flags: ScreenFlag[] = [];

  const dpKa = saltDeltaPka(ctx.drugProtolyte, c.ionCharge, protolyte, st.ionCharge);
  const verdict = dpKa === null ? null : saltFormationVerdict(dpKa, ctx.settings.deltaPkaBands);
  const formation = saltFormationWords(verdict, dpKa, ctx.settings.deltaPkaBands.stableSaltMin);
  reasons.push(...formation.reasons);
  flags.push(...formation.flags);

  const f = activeFraction(saltMassInput(ctx, cand));
  const massPerDose = ctx.doseMg === null ? null : saltMassPerDoseMg(ctx.doseMg, f);
  const heavy = massCostReason(f, massPerDose);
  if (heavy) reasons.push(heavy);

  const ksp = kspOf();
  reasons.push(...ksp.reasons);
  flags.push(...ksp.flags);

  const salt: ProfileSalt = {
    counterIon: protolyte,
    counterIonCharge: st.ionCharge,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    log10Ksp: ksp.log10Ksp.value,
  };
  const profile = saltProfile(ctx, salt);
  const { doses, worst } = screenDoseNumbers(ctx, salt, profile.grid);
  reasons.push(worstSolubilityReason(name, worst));
  if (ctx.doseMg !== null) {
    const d0Water = doseNumber(ctx.doseMg, ksp.saltWater.mgPerMlAsFreeForm);
    if (d0Water > 1) flags.push(poorlySolubleFlag(ksp.saltWater, d0Water));
  }
  const saltFlag = saltBranchFlag(ctx, profile.grid);
  if (saltFlag) flags.push(saltFlag);

  const mediaResults = mediumResults(ctx, cand, salt, media, hcl);
  const gastric = mediaResults[0] ?? null;
  const gastricWords = gastric ? gastricReason(name, gastric, cand.counterIon.id) : null;
  if (gastricWords) reasons.push(gastricWords);

  const { phMaxSigma } = uncertaintiesOf(
    {
      robustness: {
        saltLog10Sigma: ksp.saltLog10Sigma,
        saltSharedLog10Sigma: ksp.saltSharedLog10Sigma,
        saltAnchoredOnIntrinsic: ksp.anchored,
      },
    },
    shared,
  );
  const micro = microenvironmentJudgement(ctx.settings, profile.phMax, phMaxSigma, c.kind);
  const disp = micro.disproportionation;
  const dispWords = disproportionationWords(disp);
  reasons.push(dispWords.reason);
  if (dispWords.flag) flags.push(dispWords.flag);

  reasons.push(acceptabilityReason(cand.counterIon));
  reasons.push(...measuredReasons(measured, cand.solutionEnthalpyKJ));

  const criteria: CriterionInputs = {
    saltProbability: verdict?.saltProbability ?? null,
    log10WorstDoseNumber: worst.doseNumber === null ? null : Math.log10(worst.doseNumber),
    log10GastricDoseNumber: gastric?.doseNumber == null ? null : Math.log10(gastric.doseNumber),
    phMaxMarginPh: disp.marginPh,
    activeFraction: f,
    acceptabilityClass: cand.counterIon.acceptabilityClass,
    hygroscopicity: measured?.hygroscopicity ?? null,
  };
  return {
    id: cand.id,
    label,
    counterIonId: cand.counterIon.id,
    counterIonName: cand.counterIon.name,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    hydrateWater: cand.hydrateWater ?? 0,
    error: null,
    deltaPka: dpKa,
    deltaPkaEach: deltaPkaEach(ctx, p),
    saltFormation: verdict,
    saltMolarMassGPerMol: p.saltMolarMassGPerMol,
    activeFraction: f,
    saltMassPerDoseMg: massPerDose,
    saltWaterSolubility: ksp.saltWater,
    log10Ksp: ksp.log10Ksp,
    kspOrigin: ksp.kspOrigin,
    benchSolubility: ksp.benchSolubility,
    phMax: profile.phMax,
    profile:
      ctx.profiles === 'none'
        ? []
        : profile.grid.phs.map((pH, k) => ({
            pH,
            solubilityMgPerMl: freeFormMgPerMl(ctx, profile.grid.solubilityM[k]!),
            solid: profile.grid.saltSolid[k] === 1 ? ('salt' as const) : ('free-form' as const),
          })),
    doseNumbers: doses,
    worst,
    solubilityClass: solubilityClassOf(worst),
    gastric,
    media: mediaResults,
    disproportionation: disp,
    excipientRisks: micro.excipientRisks,
    solutionEnthalpyPerDrugIon: solutionEnthalpyShown(
      p.solutionEnthalpyKJ,
      st.drugPerSalt,
      p.solutionEnthalpyOrigin,
    ),
    measured,
    flags,
    reasons,
    criteria,
    robustness: {
      id: cand.id,
      criteria,
      error: null,
      deltaPka: dpKa,
      worstSolid: worst.solid,
      gastricSolid: gastric?.solid ?? null,
      saltLog10Sigma: ksp.saltLog10Sigma,
      saltSharedLog10Sigma: ksp.saltSharedLog10Sigma,
      saltAnchoredOnIntrinsic: ksp.anchored,
    },
  };
}

/** The row of a candidate that could not be screened: its error in words, every number empty. */
export function errorRow(cand: ScreeningCandidate, label: string, error: string): ScreenRow {
  const criteria: CriterionInputs = {
    saltProbability: null,
    log10WorstDoseNumber: null,
    log10GastricDoseNumber: null,
    phMaxMarginPh: null,
    activeFraction: 0,
    acceptabilityClass: null,
    hygroscopicity: null,
  };
  return {
    id: cand.id,
    label,
    counterIonId: cand.counterIon.id,
    counterIonName: cand.counterIon.name,
    drugPerSalt: cand.stoichiometry.drugPerSalt,
    counterIonPerSalt: cand.stoichiometry.counterIonPerSalt,
    hydrateWater: cand.hydrateWater ?? 0,
    error,
    deltaPka: null,
    deltaPkaEach: [],
    saltFormation: null,
    saltMolarMassGPerMol: 0,
    activeFraction: 0,
    saltMassPerDoseMg: null,
    saltWaterSolubility: null,
    log10Ksp: null,
    kspOrigin: null,
    benchSolubility: null,
    phMax: null,
    profile: [],
    doseNumbers: [],
    worst: null,
    solubilityClass: null,
    gastric: null,
    media: [],
    disproportionation: null,
    excipientRisks: [],
    solutionEnthalpyPerDrugIon: null,
    measured: null,
    flags: [],
    reasons: [notScreenedReason(error)],
    criteria,
    robustness: {
      id: cand.id,
      criteria,
      error,
      deltaPka: null,
      worstSolid: null,
      gastricSolid: null,
      saltLog10Sigma: 0,
      saltAnchoredOnIntrinsic: false,
    },
  };
}
