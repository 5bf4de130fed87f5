import { phSolubilityProfile, solubilityAtPh, type PhProfile } from '../ph-profile';
import { doseNumber } from '../dose-number';
import type { HydrochlorideReference, ScreenMedium } from './media';
import { gridFromPoints } from '../ph-grid-solubility';
import { screenDoseNumbers, solubilityClassOf } from './dose-numbers';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import { freeFormPoorlySolubleFlag } from './screen-reasons';
import type { FreeFormResult, MediumResult, ScreenFlag } from './screen.types';

/** The free form on its own: its pH–solubility profile, dose numbers across ICH M9 pH and its flag. */
export function screenFreeForm(ctx: ScreenContext): { result: FreeFormResult; profile: PhProfile } {
  const profile = phSolubilityProfile(ctx.drug, ctx.log10IntrinsicM.value, null, ctx.grid);
  const { doses, worst } = screenDoseNumbers(ctx, null, gridFromPoints(profile.points));
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
        : profile.points.map((p) => ({
            pH: p.pH,
            solubilityMgPerMl: freeFormMgPerMl(ctx, p.solubilityM),
          })),
    doseNumbers: doses,
    worst,
    solubilityClass: solubilityClassOf(worst),
    gastric: null,
    flags,
  };
  return { result, profile };
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
  const logS0 = ctx.log10IntrinsicM.value;
  const activity =
    ctx.activity?.model === 'davies'
      ? { ...ctx.activity, backgroundIonicStrengthM: gastric.ionicStrengthM }
      : ctx.activity;
  const own = solubilityAtPh(ctx.drug, logS0, null, gastric.pH, { activity });
  let solubilityM = own.solubilityM;
  let convertsTo: string | null = null;
  const chlorideM = gastric.ions.chloride ?? 0;
  if (hcl && chlorideM > 0) {
    const h = solubilityAtPh(ctx.drug, logS0, hcl.salt, gastric.pH, {
      activity,
      commonIonM: chlorideM,
    });
    if (h.solid === 'salt' && h.solubilityM < solubilityM) {
      solubilityM = h.solubilityM;
      convertsTo = hcl.cand.stoichiometry.label ?? 'hydrochloride';
    }
  }
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
