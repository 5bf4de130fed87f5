import { phSolubilityProfile, type PhProfile } from '../ph-profile';
import { gridFromPoints } from '../ph-grid-solubility';
import { screenDoseNumbers, solubilityClassOf } from './dose-numbers';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import { freeFormPoorlySolubleFlag } from './screen-reasons';
import type { FreeFormResult, ScreenFlag } from './screen.types';

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
    flags,
  };
  return { result, profile };
}
