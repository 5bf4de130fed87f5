import { checkProfileInput, PROFILE_ASSUMPTIONS, type PhProfile } from '../ph-profile';
import { log10FreeFormSolubilityM, requirePh } from '../salt-equilibrium';
import { doseNumber } from '../dose-number';
import { hydrochlorideBelow, type HydrochlorideReference, type ScreenMedium } from './media';
import { freeFormOnGrid } from '../ph-grid-solubility';
import { screenDoseNumbers, solubilityClassOf } from './dose-numbers';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import { freeFormPoorlySolubleFlag } from './screen-reasons';
import type { FreeFormResult, MediumResult, ScreenFlag } from './screen.types';

/**
 * The free form on its own: its pH–solubility profile, dose numbers across ICH M9 pH and its flag.
 * The profile is the context's free-form grid (ctx.grids.profile: the pH list phSolubilityProfile
 * builds and, at each pH, the 10^(log₁₀ S_free) its points hold — the free form alone needs no activity
 * model), after phSolubilityProfile's input checks.
 */
export function screenFreeForm(ctx: ScreenContext): {
  result: FreeFormResult;
  profile: Pick<PhProfile, 'assumptions'>;
} {
  checkProfileInput(ctx.drug, ctx.log10IntrinsicM.value, null, ctx.grid);
  const grid = freeFormOnGrid(ctx.grids.profile);
  const { doses, worst } = screenDoseNumbers(ctx, null, grid);
  const flags: ScreenFlag[] = [];
  if (worst.doseNumber !== null && worst.doseNumber > 1) {
    flags.push(freeFormPoorlySolubleFlag({ ...worst, doseNumber: worst.doseNumber }));
  }
  const result: FreeFormResult = {
    log10IntrinsicM: ctx.log10IntrinsicM,
    intrinsicOrigin: ctx.intrinsicOrigin,
    profile:
      ctx.profiles === 'none'
        ? []
        : grid.phs.map((pH, k) => ({
            pH,
            solubilityMgPerMl: freeFormMgPerMl(ctx, grid.solubilityM[k]!),
          })),
    doseNumbers: doses,
    worst,
    solubilityClass: solubilityClassOf(worst),
    gastric: null,
    flags,
  };
  return { result, profile: { assumptions: [...PROFILE_ASSUMPTIONS] } };
}

/**
 * The free form in the gastric medium, read against the salts: a base dissolves there as its cation,
 * and when a 1:1 hydrochloride is among the candidates, gastric chloride can precipitate it (the same
 * check every salt gets, media.ts).
 */
export function freeFormGastric(
  ctx: ScreenContext,
  gastric: ScreenMedium | undefined,
  hcl: HydrochlorideReference | null,
): MediumResult | null {
  if (!gastric) return null;
  // solubilityAtPh(ctx.drug, S₀, null, pH) without what it repeats: the drug's checks passed when the
  // context made ctx.drugProtolyte from the same ctx.drug, and with no salt the activity model plays no
  // part (pointAt: 10 to the free form's log₁₀ solubility)
  requirePh(gastric.pH);
  const ownM =
    10 ** log10FreeFormSolubilityM(ctx.drugProtolyte, ctx.log10IntrinsicM.value, gastric.pH);
  const toHcl = hcl ? hydrochlorideBelow(ctx, hcl, gastric, ownM) : null;
  const solubilityM = toHcl?.solubilityM ?? ownM;
  const convertsTo = toHcl?.convertsTo ?? null;
  const mg = freeFormMgPerMl(ctx, solubilityM);
  return {
    id: gastric.id,
    label: gastric.label,
    pH: gastric.pH,
    commonIonM: 0,
    solubilityMgPerMl: mg,
    doseNumber: ctx.doseMg === null ? null : doseNumber(ctx.doseMg, mg),
    solid: convertsTo ? 'salt' : 'free-form',
    convertsTo,
  };
}
