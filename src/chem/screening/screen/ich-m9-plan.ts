import { ICH_M9_PH_RANGE } from '../dose-number';
import type { PhProfile } from '../ph-profile';

/**
 * The pH series at which the screen reports dose numbers (ICH M9 points and every grid point in the
 * band), worked out once per compound. Apart from dose-numbers.ts so that the screen's context can
 * build it without importing the dose-number step (no import cycle).
 */

/** The pH points ICH M9 (2019) names for the solubility class: 1.2, 4.5 and 6.8. */
export const ICH_M9_POINTS_PH: readonly number[] = [1.2, 4.5, 6.8];

/** The ICH M9 points plus every profile point inside pH 1.2–6.8, ascending. */
export function ichM9Phs(profile: Pick<PhProfile, 'points'>): number[] {
  const ph = new Set<number>(ICH_M9_POINTS_PH);
  for (const p of profile.points) {
    if (p.pH >= ICH_M9_PH_RANGE[0] - 1e-9 && p.pH <= ICH_M9_PH_RANGE[1] + 1e-9) ph.add(p.pH);
  }
  return [...ph].sort((a, b) => a - b);
}

/** One pH of the ICH M9 series and its index on the grid (−1 when it is not a grid point). */
export interface IchM9PlanPoint {
  pH: number;
  k: number;
}

/** The ICH M9 series on a grid (ichM9Phs of the grid's points), with each pH's grid index: once per compound. */
export function ichM9Plan(phs: readonly number[]): IchM9PlanPoint[] {
  const index = new Map<number, number>();
  phs.forEach((pH, k) => index.set(pH, k));
  return ichM9Phs({ points: phs.map((pH) => ({ pH })) as PhProfile['points'] }).map((pH) => ({
    pH,
    k: index.get(pH) ?? -1,
  }));
}
