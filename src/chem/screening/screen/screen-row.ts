import { doseNumber, ICH_M9_PH_RANGE } from '../dose-number';
import type { GridSolubility } from '../ph-grid-solubility';
import type { RobustnessShared } from '../rank-robustness';
import type { CriterionInputs } from '../ranking';
import { clearlyLower, solubilityClassOf } from './dose-numbers';
import type { KspChoice } from './ksp-choice';
import type { HydrochlorideReference, ScreenMedium } from './media';
import type { PreparedCandidate } from './prepare-candidate';
import { rowNumbers, type RowNumbers } from './row-numbers';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
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

/** The words of a row: its reasons and flags, from its numbers, in the order the row lists them. */
function rowWords(
  ctx: ScreenContext,
  p: PreparedCandidate,
  label: string,
  n: RowNumbers,
): { reasons: Reason[]; flags: ScreenFlag[] } {
  const { cand, measured } = p;
  const name = saltName(label, cand.counterIon.name);
  const reasons: Reason[] = [];
  const flags: ScreenFlag[] = [];
  const bands = ctx.settings.deltaPkaBands;
  const formation = saltFormationWords(n.verdict, n.dpKa, bands.stableSaltMin);
  reasons.push(...formation.reasons);
  flags.push(...formation.flags);
  const heavy = massCostReason(n.activeFraction, n.massPerDose);
  if (heavy) reasons.push(heavy);
  reasons.push(...n.ksp.reasons);
  flags.push(...n.ksp.flags);
  reasons.push(worstSolubilityReason(name, n.worst));
  if (ctx.doseMg !== null) {
    const d0Water = doseNumber(ctx.doseMg, n.ksp.saltWater.mgPerMlAsFreeForm);
    if (d0Water > 1) flags.push(poorlySolubleFlag(n.ksp.saltWater, d0Water));
  }
  const saltFlag = saltBranchFlag(ctx, n.grid);
  if (saltFlag) flags.push(saltFlag);
  const gastricWords = n.gastric ? gastricReason(name, n.gastric, cand.counterIon.id) : null;
  if (gastricWords) reasons.push(gastricWords);
  const dispWords = disproportionationWords(n.micro.disproportionation);
  reasons.push(dispWords.reason);
  if (dispWords.flag) flags.push(dispWords.flag);
  reasons.push(acceptabilityReason(cand.counterIon));
  reasons.push(...measuredReasons(measured, cand.solutionEnthalpyKJ));
  return { reasons, flags };
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
  numbers?: RowNumbers,
): ScreenRow {
  const n = numbers ?? rowNumbers(ctx, p, kspOf, media, hcl, shared);
  const { reasons, flags } = rowWords(ctx, p, label, n);
  return assembleRow(ctx, p, label, n, reasons, flags);
}

/** The row object: the numbers, the words, the profile when asked for, and the robustness inputs. */
function assembleRow(
  ctx: ScreenContext,
  p: PreparedCandidate,
  label: string,
  n: RowNumbers,
  reasons: Reason[],
  flags: ScreenFlag[],
): ScreenRow {
  const { cand, measured } = p;
  const st = cand.stoichiometry;
  const { ksp, worst, gastric, criteria } = n;
  return {
    id: cand.id,
    label,
    counterIonId: cand.counterIon.id,
    counterIonName: cand.counterIon.name,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    hydrateWater: cand.hydrateWater ?? 0,
    error: null,
    deltaPka: n.dpKa,
    deltaPkaEach: deltaPkaEach(ctx, p),
    saltFormation: n.verdict,
    saltMolarMassGPerMol: p.saltMolarMassGPerMol,
    activeFraction: n.activeFraction,
    saltMassPerDoseMg: n.massPerDose,
    saltWaterSolubility: ksp.saltWater,
    log10Ksp: ksp.log10Ksp,
    kspOrigin: ksp.kspOrigin,
    benchSolubility: ksp.benchSolubility,
    phMax: n.phMax,
    profile: ctx.profiles === 'none' ? [] : profilePoints(ctx, n.grid),
    doseNumbers: n.doses,
    worst,
    solubilityClass: solubilityClassOf(worst),
    gastric,
    media: n.media,
    disproportionation: n.micro.disproportionation,
    excipientRisks: n.micro.excipientRisks,
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
      deltaPka: n.dpKa,
      worstSolid: worst.solid,
      gastricSolid: gastric?.solid ?? null,
      saltLog10Sigma: ksp.saltLog10Sigma,
      saltSharedLog10Sigma: ksp.saltSharedLog10Sigma,
      saltAnchoredOnIntrinsic: ksp.anchored,
    },
  };
}

/** The profile for a chart: the grid's points in mg/mL of free form, with the solid at each. */
function profilePoints(ctx: ScreenContext, grid: GridSolubility) {
  return grid.phs.map((pH, k) => ({
    pH,
    solubilityMgPerMl: freeFormMgPerMl(ctx, grid.solubilityM[k]!),
    solid: grid.saltSolid[k] === 1 ? ('salt' as const) : ('free-form' as const),
  }));
}

/** The row of a candidate that could not be screened: its error in words, every number empty. */
/** The criterion inputs of a candidate that failed: nothing known (the ranking scores it last). */
export const NO_CRITERIA: Readonly<CriterionInputs> = Object.freeze({
  saltProbability: null,
  log10WorstDoseNumber: null,
  log10GastricDoseNumber: null,
  phMaxMarginPh: null,
  activeFraction: 0,
  acceptabilityClass: null,
  hygroscopicity: null,
});

export function errorRow(cand: ScreeningCandidate, label: string, error: string): ScreenRow {
  const criteria: CriterionInputs = { ...NO_CRITERIA };
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
