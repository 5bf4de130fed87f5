import { saltDeltaPka, saltFormationVerdict, type SaltFormationVerdict } from '../delta-pka';
import { activeFraction, saltMassPerDoseMg } from '../mass-cost';
import {
  fastPathApplies,
  gridFromPoints,
  saltOnGrid,
  saltOnGridWhenRead,
  SaltGridPoints,
  type GridSolubility,
} from '../ph-grid-solubility';
import { gridPhMax, phMaxCrossingSpan, refinePhMax, scanPhMaxCrossings } from '../grid-ph-max';
import { checkProfileInput, phSolubilityProfile, type ProfileSalt } from '../ph-profile';
import type { RobustnessShared } from '../rank-robustness';
import type { CriterionInputs } from '../ranking';
import { ichM9WorstAndNamedOnPoints, screenDoseNumbers } from './dose-numbers';
import type { KspChoice } from './ksp-choice';
import { mediumResults, type HydrochlorideReference, type ScreenMedium } from './media';
import type { ExcipientRisk } from '../excipients/excipient-risk';
import {
  judgedAtOnePh,
  microenvironmentJudgement,
  saturatedMarginOver,
  type MicroenvironmentJudgement,
} from './microenvironment';
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
  /** NaN while pass 1 left it unrefined (`phMaxRefined` false): refinedRowNumbers gives it. */
  phMax: number | null;
  /**
   * False when a ranking's pass 1 skipped pH_max's Brent refinement because every crossing's bracket
   * gives the disproportionation score the same saturated value (microenvironment.ts
   * saturatedMarginOver): `micro` and `criteria.phMaxMarginPh` then hold the margin at the bracket's
   * end, which scores the same bits; refinedRowNumbers replaces them before anything else reads them.
   */
  phMaxRefined: boolean;
  doses: DoseNumberAt[];
  worst: DoseNumberAt;
  media: MediumResult[];
  gastric: MediumResult | null;
  micro: MicroenvironmentJudgement;
  criteria: CriterionInputs;
}

/** The salt on the pH grid, its pH_max and its dose numbers (the series' worst and named points). */
interface SaltProfileNumbers {
  /** The grid (its arrays made when first read, in a screen without profiles: written rows only). */
  grid: GridSolubility;
  /** NaN when left unrefined (`marginPh` then holds a margin of the same saturated score). */
  phMax: number | null;
  /** The saturated margin that stands for the unrefined pH_max's; null when pH_max is refined. */
  marginPh: number | null;
  doses: DoseNumberAt[];
  worst: DoseNumberAt;
}

/**
 * The margin that stands for pH_max's in a ranking's pass 1 (`scoreOnly`), after its scan, when the disproportionation
 * score is saturated over the whole span of the scan's crossings — the root cannot move the score
 * (saturatedMarginOver) —, else null (the roots are refined). Brent cannot fail inside a bracket (a
 * finite function, grid-ph-max.ts), so skipping it skips no error either.
 */
function saturatedMargin(ctx: ScreenContext, count: number): number | null {
  if (count === 0) return null;
  const { lo, hi } = phMaxCrossingSpan(ctx.grids, count);
  return saturatedMarginOver(ctx.settings, lo, hi, ctx.compound.kind);
}

/**
 * The salt's points on the pH grid, its pH_max and dose numbers. With ideal activities the fast grid
 * evaluation (ph-grid-solubility.ts) gives the numbers phSolubilityProfile gives, after the same
 * input checks; the Davies option takes the general solver. A screen without profiles needs of the
 * grid only its worst and named ICH M9 points, found without making the grid's arrays
 * (ichM9WorstAndNamedOnPoints); the arrays are made, the same values, if a row's words read them.
 */
function saltProfile(
  ctx: ScreenContext,
  salt: ProfileSalt,
  scoreOnly: boolean,
): SaltProfileNumbers {
  if (!fastPathApplies(ctx.grid)) {
    const profile = phSolubilityProfile(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
    const grid = gridFromPoints(profile.points);
    const { doses, worst } = screenDoseNumbers(ctx, salt, grid);
    return { grid, phMax: profile.phMax, marginPh: null, doses, worst };
  }
  checkProfileInput(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
  let phMax: number | null;
  let marginPh: number | null = null;
  if (!scoreOnly) phMax = gridPhMax(ctx.grids, salt);
  else {
    const count = scanPhMaxCrossings(ctx.grids, salt);
    marginPh = saturatedMargin(ctx, count);
    // refined straight after its scan (the crossings live in the scan's buffers until the next scan)
    phMax = count === 0 ? null : marginPh !== null ? NaN : refinePhMax(ctx.grids, salt, count);
  }
  if (ctx.profiles !== 'none') {
    const grid = saltOnGrid(ctx.grids.profile, salt);
    const { doses, worst } = screenDoseNumbers(ctx, salt, grid);
    return { grid, phMax, marginPh, doses, worst };
  }
  const points = new SaltGridPoints(ctx.grids.profile, salt);
  const { doses, worst } = ichM9WorstAndNamedOnPoints(ctx, salt, points, ctx.ichM9Plan);
  return { grid: saltOnGridWhenRead(ctx.grids.profile, salt), phMax, marginPh, doses, worst };
}

/**
 * The judgement of numbers whose pH_max pass 1 left unrefined: no reader may take it (refinedRowNumbers
 * replaces it first); one shared object, so a skipped root costs no allocation here either.
 */
const UNREFINED_JUDGEMENT: MicroenvironmentJudgement = Object.freeze({
  marginPh: null,
  get disproportionation(): never {
    throw new Error('pH_max was not refined: take refinedRowNumbers first');
  },
  excipientRisks: Object.freeze([]) as unknown as ExcipientRisk[],
});

/** The numbers of one candidate's row (K_sp asked for after ΔpKa and mass cost, as the row did). */
export function rowNumbers(
  ctx: ScreenContext,
  p: PreparedCandidate,
  kspOf: () => KspChoice,
  media: readonly ScreenMedium[],
  hcl: HydrochlorideReference | null,
  shared: RobustnessShared,
  scoreOnly = false,
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
  const profile = saltProfile(ctx, salt, scoreOnly);
  const { doses, worst } = profile;
  const mediaResults = mediumResults(ctx, cand, salt, media, hcl);
  const gastric = mediaResults[0] ?? null;
  // the saturated margin stands for pH_max's (see RowNumbers.phMaxRefined): scored as the root's
  const micro =
    profile.marginPh === null
      ? microenvironmentJudgement(
          ctx.settings,
          profile.phMax,
          phMaxSigmaOf(ctx, ksp, shared),
          c.kind,
        )
      : UNREFINED_JUDGEMENT;
  const criteria: CriterionInputs = {
    saltProbability: verdict?.saltProbability ?? null,
    log10WorstDoseNumber: worst.doseNumber === null ? null : Math.log10(worst.doseNumber),
    log10GastricDoseNumber: gastric?.doseNumber == null ? null : Math.log10(gastric.doseNumber),
    phMaxMarginPh: profile.marginPh ?? micro.marginPh,
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
    phMaxRefined: profile.marginPh === null,
    doses,
    worst,
    media: mediaResults,
    gastric,
    micro,
    criteria,
  };
}

/** pH_max's 1σ (row-uncertainty.ts) where the judgement reads it: against excipients only. */
function phMaxSigmaOf(ctx: ScreenContext, ksp: KspChoice, shared: RobustnessShared): number {
  if (judgedAtOnePh(ctx.settings)) return NaN; // the one-pH judgement reads no σ
  const robustness = {
    saltLog10Sigma: ksp.saltLog10Sigma,
    saltSharedLog10Sigma: ksp.saltSharedLog10Sigma,
    saltAnchoredOnIntrinsic: ksp.anchored,
  };
  return uncertaintiesOf({ robustness }, shared).phMaxSigma;
}

/**
 * A row's numbers with pH_max refined — the same call on the same salt as a full row makes, then the
 * judgement and the margin from it — for a row that is written (its words, columns and σ read them).
 * Numbers pass 1 refined already are returned as they are.
 */
export function refinedRowNumbers(
  ctx: ScreenContext,
  n: RowNumbers,
  shared: RobustnessShared,
): RowNumbers {
  if (n.phMaxRefined) return n;
  const phMax = gridPhMax(ctx.grids, n.salt);
  const sigma = phMaxSigmaOf(ctx, n.ksp, shared);
  const micro = microenvironmentJudgement(ctx.settings, phMax, sigma, ctx.compound.kind);
  const c = n.criteria;
  const criteria: CriterionInputs = {
    saltProbability: c.saltProbability,
    log10WorstDoseNumber: c.log10WorstDoseNumber,
    log10GastricDoseNumber: c.log10GastricDoseNumber,
    phMaxMarginPh: micro.marginPh,
    activeFraction: c.activeFraction,
    acceptabilityClass: c.acceptabilityClass,
    hygroscopicity: c.hygroscopicity,
  };
  return {
    dpKa: n.dpKa,
    verdict: n.verdict,
    activeFraction: n.activeFraction,
    massPerDose: n.massPerDose,
    ksp: n.ksp,
    salt: n.salt,
    grid: n.grid,
    phMax,
    phMaxRefined: true,
    doses: n.doses,
    worst: n.worst,
    media: n.media,
    gastric: n.gastric,
    micro,
    criteria,
  };
}
