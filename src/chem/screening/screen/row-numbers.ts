import { saltDeltaPka, saltFormationVerdict, type SaltFormationVerdict } from '../delta-pka';
import { activeFraction, saltMassPerDoseMg } from '../mass-cost';
import {
  fastPathApplies,
  gridFromPoints,
  gridPhMax,
  saltOnGrid,
  saltOnGridWhenRead,
  SaltGridPoints,
  type GridSolubility,
} from '../ph-grid-solubility';
import { checkProfileInput, phSolubilityProfile, type ProfileSalt } from '../ph-profile';
import type { RobustnessShared } from '../rank-robustness';
import type { CriterionInputs } from '../ranking';
import { ichM9WorstAndNamedOnPoints, screenDoseNumbers } from './dose-numbers';
import type { KspChoice } from './ksp-choice';
import { mediumResults, type HydrochlorideReference, type ScreenMedium } from './media';
import { microenvironmentJudgement } from './microenvironment';
import { uncertaintiesOf } from './row-uncertainty';
import type { PreparedCandidate } from './prepare-candidate';
import { saltMassInput, type ScreenContext } from './screen-context';
import type { DoseNumberAt, MediumResult } from './screen.types';

/**
 * The numbers of one candidate's row — ΔpKa, mass cost, K_sp, pH_max, dose numbers, the media, the
 * microenvironment — and the ranking's criterion inputs made from them, without a word. The row
 * (screen-row.ts) adds the reasons and flags; a ranking that writes only its best rows (screen-top.ts)
 * ranks on these numbers and builds words only for the rows it writes, so both rank on the same numbers.
 */
export interface RowNumbers {
  dpKa: number | null;
  verdict: SaltFormationVerdict | null;
  activeFraction: number;
  massPerDose: number | null;
  ksp: KspChoice;
  salt: ProfileSalt;
  grid: GridSolubility;
  phMax: number | null;
  doses: DoseNumberAt[];
  worst: DoseNumberAt;
  media: MediumResult[];
  gastric: MediumResult | null;
  micro: ReturnType<typeof microenvironmentJudgement>;
  criteria: CriterionInputs;
}

/** The salt on the pH grid, its pH_max and its dose numbers (the series' worst and named points). */
interface SaltProfileNumbers {
  /** The grid (its arrays made when first read, in a screen without profiles: written rows only). */
  grid: GridSolubility;
  phMax: number | null;
  doses: DoseNumberAt[];
  worst: DoseNumberAt;
}

/**
 * The salt's points on the pH grid, its pH_max and dose numbers. With ideal activities the fast grid
 * evaluation (ph-grid-solubility.ts) gives the numbers phSolubilityProfile gives, after the same
 * input checks; the Davies option takes the general solver. A screen without profiles needs of the
 * grid only its worst and named ICH M9 points, found without making the grid's arrays
 * (ichM9WorstAndNamedOnPoints); the arrays are made, the same values, if a row's words read them.
 */
function saltProfile(ctx: ScreenContext, salt: ProfileSalt): SaltProfileNumbers {
  if (!fastPathApplies(ctx.grid)) {
    const profile = phSolubilityProfile(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
    const grid = gridFromPoints(profile.points);
    return { grid, phMax: profile.phMax, ...screenDoseNumbers(ctx, salt, grid) };
  }
  checkProfileInput(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
  const phMax = gridPhMax(ctx.grids, salt);
  if (ctx.profiles !== 'none') {
    const grid = saltOnGrid(ctx.grids.profile, salt);
    return { grid, phMax, ...screenDoseNumbers(ctx, salt, grid) };
  }
  const points = new SaltGridPoints(ctx.grids.profile, salt);
  const { doses, worst } = ichM9WorstAndNamedOnPoints(ctx, salt, points, ctx.ichM9Plan);
  return { grid: saltOnGridWhenRead(ctx.grids.profile, salt), phMax, doses, worst };
}

/** The numbers of one candidate's row (K_sp asked for after ΔpKa and mass cost, as the row did). */
export function rowNumbers(
  ctx: ScreenContext,
  p: PreparedCandidate,
  kspOf: () => KspChoice,
  media: readonly ScreenMedium[],
  hcl: HydrochlorideReference | null,
  shared: RobustnessShared,
): RowNumbers {
  const { cand, protolyte, measured } = p;
  const c = ctx.compound;
  const st = cand.stoichiometry;
  const dpKa = saltDeltaPka(ctx.drugProtolyte, c.ionCharge, protolyte, st.ionCharge);
  const verdict = dpKa === null ? null : saltFormationVerdict(dpKa, ctx.settings.deltaPkaBands);
  const f = activeFraction(saltMassInput(ctx, cand));
  const massPerDose = ctx.doseMg === null ? null : saltMassPerDoseMg(ctx.doseMg, f);
  const ksp = kspOf();
  const salt: ProfileSalt = {
    counterIon: protolyte,
    counterIonCharge: st.ionCharge,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    log10Ksp: ksp.log10Ksp.value,
  };
  const profile = saltProfile(ctx, salt);
  const { doses, worst } = profile;
  const mediaResults = mediumResults(ctx, cand, salt, media, hcl);
  const gastric = mediaResults[0] ?? null;
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
  const criteria: CriterionInputs = {
    saltProbability: verdict?.saltProbability ?? null,
    log10WorstDoseNumber: worst.doseNumber === null ? null : Math.log10(worst.doseNumber),
    log10GastricDoseNumber: gastric?.doseNumber == null ? null : Math.log10(gastric.doseNumber),
    phMaxMarginPh: micro.marginPh,
    activeFraction: f,
    acceptabilityClass: cand.counterIon.acceptabilityClass,
    hygroscopicity: measured?.hygroscopicity ?? null,
  };
  return {
    dpKa,
    verdict,
    activeFraction: f,
    massPerDose,
    ksp,
    salt,
    grid: profile.grid,
    phMax: profile.phMax,
    doses,
    worst,
    media: mediaResults,
    gastric,
    micro,
    criteria,
  };
}
