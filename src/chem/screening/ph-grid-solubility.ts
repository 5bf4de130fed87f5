import { brentRoot } from '../numerics/root-finding';
import type { ProfileOptions, ProfilePoint, ProfileSalt } from './ph-profile';
import {
  log10FreeFormSolubilityM,
  SALT_LOG10_S_LIMITS,
  saltLog10FormulaUnitsRaw,
} from './salt-equilibrium';
import { log10ChargeFraction, type Protolyte } from './speciation';

/**
 * The pH–solubility model of ph-profile.ts evaluated fast on fixed pH lists, for the screen: the same
 * equations and the same arithmetic (so the same numbers), with what does not depend on the salt
 * (the drug's speciation and free-form solubility) computed once per compound, and what does not
 * depend on the compound (a counter-ion's speciation on the grid) memoised across compounds.
 * Only the ideal-activity, no-common-ion case is taken here; every other case goes to the general
 * solver (salt-equilibrium.ts) point by point.
 */

/** The pH values of a profile grid, built exactly as phSolubilityProfile builds them. */
export function profilePhs(from: number, to: number, step: number): number[] {
  const n = Math.round((to - from) / step);
  const out: number[] = [];
  for (let k = 0; k <= n; k++) out.push(Number(Math.min(to, from + k * step).toFixed(10)));
  return out;
}

/** The scan points of the pH_max search, 0 to 14 in steps of 0.25 (as numericalPhMax takes them). */
export const PH_MAX_SCAN_STEP = 0.25;
const SCAN_PHS: readonly number[] = (() => {
  const out = [0];
  for (let pH = PH_MAX_SCAN_STEP; pH <= 14 + 1e-9; pH += PH_MAX_SCAN_STEP) out.push(pH);
  return out;
})();

/** Counter-ion speciation per pH list; bounded so that a long batch of custom ions cannot grow it. */
const ION_CACHE_LIMIT = 512;
const ionCache = new Map<string, Float64Array>();

function chargeFractionsOn(
  p: Protolyte,
  charge: number,
  phs: readonly number[],
  gridKey: string,
): Float64Array {
  const key = `${p.pKas.join(',')}|${p.mostProtonatedCharge}|${charge}|${gridKey}`;
  let v = ionCache.get(key);
  if (!v) {
    v = Float64Array.from(phs, (pH) => log10ChargeFraction(p, pH, charge));
    if (ionCache.size >= ION_CACHE_LIMIT) ionCache.clear();
    ionCache.set(key, v);
  }
  return v;
}

/** The drug's side of the model on one pH list: the salt-state fraction and the free-form solubility. */
export interface DrugOnGrid {
  phs: readonly number[];
  gridKey: string;
  /** log₁₀ fraction of the drug in its salt charge state. */
  laD: Float64Array;
  /** log₁₀ free-form solubility, mol/L. */
  log10FreeM: Float64Array;
  /** Free-form solubility, mol/L (10 to the power above). */
  freeM: Float64Array;
}

export function drugOnGrid(
  drug: Protolyte,
  ionCharge: number,
  log10IntrinsicM: number,
  phs: readonly number[],
  gridKey = phs.join(','),
): DrugOnGrid {
  const laD = new Float64Array(phs.length);
  const log10FreeM = new Float64Array(phs.length);
  const freeM = new Float64Array(phs.length);
  for (let k = 0; k < phs.length; k++) {
    laD[k] = log10ChargeFraction(drug, phs[k]!, ionCharge);
    log10FreeM[k] = log10FreeFormSolubilityM(drug, log10IntrinsicM, phs[k]!);
    freeM[k] = 10 ** log10FreeM[k]!;
  }
  return { phs, gridKey, laD, log10FreeM, freeM };
}

/** Per compound: the drug on the profile grid and on the pH_max scan points. */
export interface DrugGrids {
  drug: Protolyte;
  ionCharge: number;
  log10IntrinsicM: number;
  profile: DrugOnGrid;
  scan: DrugOnGrid;
}

export function drugGrids(
  drug: Protolyte,
  ionCharge: number,
  log10IntrinsicM: number,
  grid: { phFrom: number; phTo: number; phStep: number },
): DrugGrids {
  const phs = profilePhs(grid.phFrom, grid.phTo, grid.phStep);
  return {
    drug,
    ionCharge,
    log10IntrinsicM,
    profile: drugOnGrid(
      drug,
      ionCharge,
      log10IntrinsicM,
      phs,
      `${grid.phFrom}:${grid.phTo}:${grid.phStep}`,
    ),
    scan: drugOnGrid(drug, ionCharge, log10IntrinsicM, SCAN_PHS, 'scan'),
  };
}

/** True when the fast path applies: ideal activities and no counter-ion in the medium. */
export function fastPathApplies(o: ProfileOptions): boolean {
  return (o.activity === undefined || o.activity.model === 'ideal') && (o.commonIonM ?? 0) === 0;
}

/** A solubility curve on a pH list as arrays (no object per point): what a screen reads from it. */
export interface GridSolubility {
  phs: readonly number[];
  /** Total dissolved drug, mol/L. */
  solubilityM: Float64Array;
  /** 1 where the salt is the solid in equilibrium, 0 where the free form is. */
  saltSolid: Uint8Array;
}

/** The free form alone on the grid. */
export function freeFormOnGrid(g: DrugOnGrid): GridSolubility {
  return { phs: g.phs, solubilityM: g.freeM, saltSolid: new Uint8Array(g.phs.length) };
}

/** A curve from profile points (the general solver's output) as arrays. */
export function gridFromPoints(points: readonly ProfilePoint[]): GridSolubility {
  return {
    phs: points.map((p) => p.pH),
    solubilityM: Float64Array.from(points, (p) => p.solubilityM),
    saltSolid: Uint8Array.from(points, (p) => (p.solid === 'salt' ? 1 : 0)),
  };
}

/**
 * The salt on the grid (ideal activities, no common ion): at each pH the value pointAt in
 * ph-profile.ts gives, with the same arithmetic. The caller checks the salt input first.
 */
export function saltOnGrid(g: DrugOnGrid, salt: ProfileSalt): GridSolubility {
  const laX = chargeFractionsOn(salt.counterIon, salt.counterIonCharge, g.phs, g.gridKey);
  const m = salt.drugPerSalt;
  const n = salt.counterIonPerSalt;
  const len = g.phs.length;
  const solubilityM = new Float64Array(len);
  const saltSolid = new Uint8Array(len);
  // saltLog10FormulaUnitsRaw with its logarithms taken once (the same values, so the same bits)
  const lm = Math.log10(m);
  const ln = Math.log10(n);
  const K = salt.log10Ksp;
  for (let k = 0; k < len; k++) {
    const free = g.freeM[k]!;
    const u = (K - m * (g.laD[k]! + lm) - n * (laX[k]! + ln)) / (m + n);
    // above the upper limit the salt does not limit (the solver's `unbounded`); far above the free
    // form (a thousandth of a decade) it does not either, and no power needs taking to see it
    if (u > SALT_LOG10_S_LIMITS.max || lm + u > g.log10FreeM[k]! + 1e-3) {
      solubilityM[k] = free;
      continue;
    }
    const saltM = m * 10 ** Math.max(u, SALT_LOG10_S_LIMITS.min);
    if (saltM < free) {
      solubilityM[k] = saltM;
      saltSolid[k] = 1;
    } else solubilityM[k] = free;
  }
  return { phs: g.phs, solubilityM, saltSolid };
}

/**
 * pH_max without a profile (ideal activities, no common ion): log S_salt − log S_free scanned at the
 * 0.25-step points from cached speciation, each sign change refined by Brent's method on the same
 * function, and the crossing nearest the drug's salt-forming pKa returned — the algorithm and the
 * function of numericalPhMax (ph-profile.ts), so the two agree to the root tolerance.
 */
export function gridPhMax(g: DrugGrids, salt: ProfileSalt): number | null {
  const m = salt.drugPerSalt;
  const n = salt.counterIonPerSalt;
  const { min, max } = SALT_LOG10_S_LIMITS;
  // log₁₀(m·s) as log₁₀ m + log₁₀ s: numericalPhMax takes log₁₀ of m·10^u, equal but for rounding
  const log10M = Math.log10(m);
  const logSaltOf = (laD: number, laX: number) =>
    log10M + Math.min(max, Math.max(min, saltLog10FormulaUnitsRaw(m, n, laD, laX, salt.log10Ksp)));
  const h = (pH: number) =>
    logSaltOf(
      log10ChargeFraction(g.drug, pH, g.ionCharge),
      log10ChargeFraction(salt.counterIon, pH, salt.counterIonCharge),
    ) - log10FreeFormSolubilityM(g.drug, g.log10IntrinsicM, pH);
  const s = g.scan;
  const laX = chargeFractionsOn(salt.counterIon, salt.counterIonCharge, s.phs, s.gridKey);
  const crossings: number[] = [];
  let prev = logSaltOf(s.laD[0]!, laX[0]!) - s.log10FreeM[0]!;
  for (let k = 1; k < s.phs.length; k++) {
    const cur = logSaltOf(s.laD[k]!, laX[k]!) - s.log10FreeM[k]!;
    if (prev === 0) crossings.push(s.phs[k - 1]!);
    else if (prev * cur < 0) crossings.push(brentRoot(h, s.phs[k - 1]!, s.phs[k]!, 1e-12).root);
    prev = cur;
  }
  if (crossings.length === 0) return null;
  const p = g.drug;
  const ref = p.pKas[p.mostProtonatedCharge - g.ionCharge] ?? p.pKas[0]!;
  return crossings.reduce((best, x) => (Math.abs(x - ref) < Math.abs(best - ref) ? x : best));
}
