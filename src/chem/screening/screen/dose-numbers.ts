import { doseNumber, ICH_M9_PH_RANGE } from '../dose-number';
import { solubilityAtPh, type PhProfile, type ProfilePoint, type ProfileSalt } from '../ph-profile';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import type { DoseNumberAt } from './screen.types';

/** The pH points ICH M9 (2019) names for the solubility class: 1.2, 4.5 and 6.8. */
const ICH_M9_POINTS_PH = [1.2, 4.5, 6.8];

/** Solubility and dose number at one pH, with the salt (or free form when null) as the limiting solid. */
export function doseNumberAt(
  ctx: ScreenContext,
  salt: ProfileSalt | null,
  pH: number,
  commonIonM = 0,
): DoseNumberAt {
  const p = solubilityAtPh(ctx.drug, ctx.log10IntrinsicM.value, salt, pH, {
    activity: ctx.activity,
    commonIonM,
  });
  const mg = freeFormMgPerMl(ctx, p.solubilityM);
  return {
    pH,
    solubilityMgPerMl: mg,
    doseNumber: ctx.doseMg === null ? null : doseNumber(ctx.doseMg, mg),
    solid: p.solid,
  };
}

/** The ICH M9 points plus every profile point inside pH 1.2–6.8, ascending. */
export function ichM9Phs(profile: Pick<PhProfile, 'points'>): number[] {
  const ph = new Set<number>(ICH_M9_POINTS_PH);
  for (const p of profile.points) {
    if (p.pH >= ICH_M9_PH_RANGE[0] - 1e-9 && p.pH <= ICH_M9_PH_RANGE[1] + 1e-9) ph.add(p.pH);
  }
  return [...ph].sort((a, b) => a - b);
}

/**
 * Dose numbers at the ICH M9 pH values, taking each from the profile point at that pH where there is
 * one (the same model at the same pH, so the same number as doseNumberAt) instead of solving again.
 */
export function ichM9DoseNumbers(
  ctx: ScreenContext,
  salt: ProfileSalt | null,
  points: readonly ProfilePoint[],
): DoseNumberAt[] {
  const byPh = new Map<number, ProfilePoint>();
  for (const p of points) byPh.set(p.pH, p);
  return ichM9Phs({ points: [...points] }).map((pH) => {
    const p = byPh.get(pH);
    if (!p) return doseNumberAt(ctx, salt, pH);
    const mg = freeFormMgPerMl(ctx, p.solubilityM);
    return {
      pH,
      solubilityMgPerMl: mg,
      doseNumber: ctx.doseMg === null ? null : doseNumber(ctx.doseMg, mg),
      solid: p.solid,
    };
  });
}

/**
 * Relative difference below which two solubilities count as tied. A minimum between two grid points
 * (a salt whose drug and counter-ion pKa values lie symmetric about it) gives two values that are
 * equal in exact arithmetic; without a tolerance the last bits of the solver would choose the pH.
 */
export const SOLUBILITY_TIE_REL = 1e-9;

/** True when `b` is lower than `a` by more than the tie tolerance. */
export const clearlyLower = (b: number, a: number): boolean => b < a * (1 - SOLUBILITY_TIE_REL);

/** The point of lowest solubility (the first one, lowest pH, on ties). */
export function worstDoseNumber(list: DoseNumberAt[]): DoseNumberAt {
  return list.reduce((a, b) => (clearlyLower(b.solubilityMgPerMl, a.solubilityMgPerMl) ? b : a));
}

/** High when the worst dose number is ≤ 1 (ICH M9 (2019) §2.1.1), low above, null without a dose. */
export function solubilityClassOf(worst: DoseNumberAt): 'high' | 'low' | null {
  return worst.doseNumber === null ? null : worst.doseNumber <= 1 ? 'high' : 'low';
}
