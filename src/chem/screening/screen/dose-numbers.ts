import { doseNumber } from '../dose-number';
import { LOG_ORDER_MARGIN, type GridSolubility, type SaltGridPoints } from '../ph-grid-solubility';
import { solubilityAtPh, type ProfileSalt } from '../ph-profile';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import { ICH_M9_POINTS_PH, type IchM9PlanPoint } from './ich-m9-plan';
import type { DoseNumberAt } from './screen.types';

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

function doseAt(ctx: ScreenContext, pH: number, solubilityM: number, salt: boolean): DoseNumberAt {
  const mg = freeFormMgPerMl(ctx, solubilityM);
  return {
    pH,
    solubilityMgPerMl: mg,
    doseNumber: ctx.doseMg === null ? null : doseNumber(ctx.doseMg, mg),
    solid: salt ? 'salt' : 'free-form',
  };
}

/**
 * Dose numbers over the ICH M9 series, each from the grid where the pH is a grid point (the same
 * model at the same pH, so the same number as doseNumberAt) and solved on its own otherwise.
 */
export function ichM9DoseNumbers(
  ctx: ScreenContext,
  salt: ProfileSalt | null,
  grid: GridSolubility,
  plan: readonly IchM9PlanPoint[],
): DoseNumberAt[] {
  return plan.map(({ pH, k }) =>
    k < 0
      ? doseNumberAt(ctx, salt, pH)
      : doseAt(ctx, pH, grid.solubilityM[k]!, grid.saltSolid[k] === 1),
  );
}

/**
 * What a screen without profiles keeps of the series: the worst point over the whole series (the
 * same point worstDoseNumber picks from it) and the dose numbers at the three ICH M9 pH values and at
 * that worst pH, ascending — without making an object for every grid point.
 */
export function ichM9WorstAndNamed(
  ctx: ScreenContext,
  salt: ProfileSalt | null,
  grid: GridSolubility,
  plan: readonly IchM9PlanPoint[],
): { doses: DoseNumberAt[]; worst: DoseNumberAt } {
  const off = new Map<number, DoseNumberAt>();
  const mgAt = (i: number): number => {
    const { pH, k } = plan[i]!;
    if (k >= 0) return freeFormMgPerMl(ctx, grid.solubilityM[k]!);
    let d = off.get(i);
    if (!d) off.set(i, (d = doseNumberAt(ctx, salt, pH)));
    return d.solubilityMgPerMl;
  };
  const doseOf = (i: number): DoseNumberAt => {
    const { pH, k } = plan[i]!;
    return k < 0
      ? (off.get(i) ?? doseNumberAt(ctx, salt, pH))
      : doseAt(ctx, pH, grid.solubilityM[k]!, grid.saltSolid[k] === 1);
  };
  let w = 0;
  let wMg = mgAt(0);
  for (let i = 1; i < plan.length; i++) {
    const mg = mgAt(i);
    if (clearlyLower(mg, wMg)) {
      w = i;
      wMg = mg;
    }
  }
  const doses: DoseNumberAt[] = [];
  let worst: DoseNumberAt | null = null;
  for (let i = 0; i < plan.length; i++) {
    if (i !== w && !ICH_M9_POINTS_PH.includes(plan[i]!.pH)) continue;
    const d = doseOf(i);
    if (i === w) worst = d;
    doses.push(d);
  }
  return { doses, worst: worst! };
}

/**
 * ichM9WorstAndNamed for a salt's points taken one at a time (SaltGridPoints: ideal activities, no
 * common ion), with no array of the grid made. The worst point is found by the same scan, where each
 * comparison is decided from the logarithms when they are more than a margin apart (the exact values
 * would decide it the same way: see LOG_ORDER_MARGIN) and from the exact values otherwise (ties, near
 * ties), so the same point is chosen; the points kept are then evaluated exactly, as the grid has them.
 */
export function ichM9WorstAndNamedOnPoints(
  ctx: ScreenContext,
  salt: ProfileSalt,
  points: SaltGridPoints,
  plan: readonly IchM9PlanPoint[],
): { doses: DoseNumberAt[]; worst: DoseNumberAt } {
  const { named, ks } = planIndicesOf(plan);
  if (ks) return worstAndNamedOnGrid(ctx, points, plan, named, ks);
  let off: Map<number, DoseNumberAt> | undefined; // points off the grid, solved once each
  const offDose = (i: number): DoseNumberAt => {
    off ??= new Map();
    let d = off.get(i);
    if (!d) off.set(i, (d = doseNumberAt(ctx, salt, plan[i]!.pH)));
    return d;
  };
  const log10Of = (i: number): number => {
    const k = plan[i]!.k;
    return k >= 0
      ? points.log10At(k)
      : Math.log10(offDose(i).solubilityMgPerMl / ctx.freeFormMolarMassGPerMol);
  };
  const mgAt = (i: number): number => {
    const k = plan[i]!.k;
    return k >= 0 ? freeFormMgPerMl(ctx, points.exactAt(k)) : offDose(i).solubilityMgPerMl;
  };
  const doseOf = (i: number): DoseNumberAt => {
    const { pH, k } = plan[i]!;
    if (k < 0) return offDose(i);
    const solubilityM = points.exactAt(k);
    return doseAt(ctx, pH, solubilityM, points.salt);
  };
  // a point off the grid (a grid not through 1.2, 4.5 or 6.8): the same scan, point by point
  let w = 0;
  let wLog = log10Of(0);
  for (let i = 1; i < plan.length; i++) {
    const l = log10Of(i);
    if (l > wLog) continue; // not lower at all, so not clearly lower
    if (l < wLog - LOG_ORDER_MARGIN || clearlyLower(mgAt(i), mgAt(w))) {
      w = i;
      wLog = l;
    }
  }
  const doses: DoseNumberAt[] = [];
  let worst: DoseNumberAt | null = null;
  for (let i = 0; i < plan.length; i++) {
    if (i !== w && named[i] !== 1) continue;
    const d = doseOf(i);
    if (i === w) worst = d;
    doses.push(d);
  }
  return { doses, worst: worst! };
}

/** The context lowerMg compares in (set just before each use: the calls are synchronous). */
let lowerMgCtx: ScreenContext | null = null;
const lowerMg = (b: number, a: number): boolean =>
  clearlyLower(freeFormMgPerMl(lowerMgCtx!, b), freeFormMgPerMl(lowerMgCtx!, a));

/**
 * ichM9WorstAndNamedOnPoints when every plan point is a grid point (the usual grid): the same scan
 * and the same exact values in the same order, without a closure made per salt (the screen calls it
 * for every candidate of every compound).
 */
function worstAndNamedOnGrid(
  ctx: ScreenContext,
  points: SaltGridPoints,
  plan: readonly IchM9PlanPoint[],
  named: Uint8Array,
  ks: Int32Array,
): { doses: DoseNumberAt[]; worst: DoseNumberAt } {
  lowerMgCtx = ctx;
  const w = points.lowestOf(ks, lowerMg);
  lowerMgCtx = null;
  const doses: DoseNumberAt[] = [];
  let worst: DoseNumberAt | null = null;
  for (let i = 0; i < plan.length; i++) {
    if (i !== w && named[i] !== 1) continue;
    const solubilityM = points.exactAt(ks[i]!);
    const d = doseAt(ctx, plan[i]!.pH, solubilityM, points.salt);
    if (i === w) worst = d;
    doses.push(d);
  }
  return { doses, worst: worst! };
}

/**
 * Per plan, once: which points are ICH M9's named pH values (1 = named), and the grid index of every
 * point when all are grid points (null otherwise). The plan is made once per compound and read for
 * each of its candidates in turn, so the last plan's indices are kept (one entry, by identity).
 */
type PlanIndices = { named: Uint8Array; ks: Int32Array | null };
let lastPlan: readonly IchM9PlanPoint[] | null = null;
let lastIndices: PlanIndices = { named: new Uint8Array(0), ks: null };
function planIndicesOf(plan: readonly IchM9PlanPoint[]): PlanIndices {
  if (plan !== lastPlan) {
    // plain loops: a typed array's from() with a mapping function is slow in V8
    const named = new Uint8Array(plan.length);
    const ks = new Int32Array(plan.length);
    let onGrid = plan.length > 0;
    for (let i = 0; i < plan.length; i++) {
      if (ICH_M9_POINTS_PH.includes(plan[i]!.pH)) named[i] = 1;
      ks[i] = plan[i]!.k;
      if (ks[i]! < 0) onGrid = false;
    }
    lastIndices = { named, ks: onGrid ? ks : null };
    lastPlan = plan;
  }
  return lastIndices;
}

/** The full series and its worst point ('full'), or the named points and the worst ('none'). */
export function screenDoseNumbers(
  ctx: ScreenContext,
  salt: ProfileSalt | null,
  grid: GridSolubility,
): { doses: DoseNumberAt[]; worst: DoseNumberAt } {
  if (ctx.profiles === 'none') return ichM9WorstAndNamed(ctx, salt, grid, ctx.ichM9Plan);
  const doses = ichM9DoseNumbers(ctx, salt, grid, ctx.ichM9Plan);
  return { doses, worst: worstDoseNumber(doses) };
}

/**
 * Relative difference below which two solubilities count as tied. A minimum between two grid points
 * (a salt whose drug and counter-ion pKa values lie symmetric about it) gives two values that are
 * equal in exact arithmetic; without a tolerance the last bits of the solver would choose the pH.
 * Kept far below any difference the model means (a nearly flat salt branch still differs by ~1e-9
 * from one grid point to the next) and above rounding (~1e-15).
 */
export const SOLUBILITY_TIE_REL = 1e-12;

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
