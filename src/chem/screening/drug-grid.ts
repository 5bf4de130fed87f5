import type { ProfileOptions, ProfilePoint } from './ph-profile';
import {
  log10ChargeFraction,
  log10SpeciesSum,
  log10UnnormalisedFraction,
  type Protolyte,
} from './speciation';

/**
 * The drug's side of the fast pH-grid evaluation (ph-grid-solubility.ts): the pH lists, the drug's
 * speciation and free-form solubility on them (once per compound), and the arrays a screen reads.
 */

/** The pH values of a profile grid, built exactly as phSolubilityProfile builds them. */
export function profilePhs(from: number, to: number, step: number): number[] {
  const n = Math.round((to - from) / step);
  const out: number[] = [];
  for (let k = 0; k <= n; k++) out.push(Number(Math.min(to, from + k * step).toFixed(10)));
  return out;
}

/** One grid's pH list (frozen: shared by every screen on that grid) and its key. */
interface ProfileGridEntry {
  from: number;
  to: number;
  step: number;
  phs: readonly number[];
  key: string;
  /** For each pH_max scan point, the index of the same pH (Object.is) on this grid, else −1. */
  scanAt: Int32Array;
}

/**
 * The pH lists of the last few grids: the list depends on the grid settings alone, and a batch
 * screens every compound on the same grid, so it is built (with its toFixed per point) once rather
 * than per compound. Bounded (a handful of grids; the oldest is dropped), compared by the three numbers
 * (Object.is: -0 and NaN are grids of their own, never another grid's list).
 */
const PROFILE_GRIDS: ProfileGridEntry[] = [];
const PROFILE_GRIDS_MAX = 8;

function profileGrid(from: number, to: number, step: number): ProfileGridEntry {
  for (const e of PROFILE_GRIDS) {
    if (Object.is(e.from, from) && Object.is(e.to, to) && Object.is(e.step, step)) return e;
  }
  const phs = Object.freeze(profilePhs(from, to, step));
  const e = {
    from,
    to,
    step,
    phs,
    key: `${from}:${to}:${step}`,
    scanAt: sameFirstPh(SCAN_PHS, phs),
  };
  if (PROFILE_GRIDS.unshift(e) > PROFILE_GRIDS_MAX) PROFILE_GRIDS.pop();
  return e;
}

/** The scan points of the pH_max search, 0 to 14 in steps of 0.25 (as numericalPhMax takes them). */
export const PH_MAX_SCAN_STEP = 0.25;
const SCAN_PHS: readonly number[] = (() => {
  const out = [0];
  for (let pH = PH_MAX_SCAN_STEP; pH <= 14 + 1e-9; pH += PH_MAX_SCAN_STEP) out.push(pH);
  return Object.freeze(out);
})();

/** For each pH of `a`, the index of the first equal pH (Object.is) in `b`, else −1. */
function sameFirstPh(a: readonly number[], b: readonly number[]): Int32Array {
  const first = new Map<number, number>();
  for (let j = b.length - 1; j >= 0; j--) first.set(b[j]!, j);
  return Int32Array.from(a, (pH) => {
    const j = first.get(pH);
    return j !== undefined && Object.is(b[j], pH) ? j : -1;
  });
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
  known?: { grid: DrugOnGrid; at: Int32Array },
): DrugOnGrid {
  // the three arrays as views of one buffer: one allocation per list instead of three
  const n = phs.length;
  const buffer = new Float64Array(3 * n);
  const laD = buffer.subarray(0, n);
  const log10FreeM = buffer.subarray(n, 2 * n);
  const freeM = buffer.subarray(2 * n, 3 * n);
  // the charges checked once (log10ChargeFraction throws as it would per point), then each point's
  // two fractions from one sum of species terms: log10ChargeFraction's and
  // log10FreeFormSolubilityM's values, the same bits
  if (phs.length > 0) {
    log10ChargeFraction(drug, phs[0]!, ionCharge);
    log10ChargeFraction(drug, phs[0]!, 0);
  }
  const iSalt = drug.mostProtonatedCharge - ionCharge;
  const iFree = drug.mostProtonatedCharge;
  for (let k = 0; k < phs.length; k++) {
    // a pH the same drug was already evaluated at (`known`, for this drug, charge and S₀): the
    // values computed there, which this point's arithmetic would repeat bit for bit
    const j = known ? known.at[k]! : -1;
    if (j >= 0) {
      laD[k] = known!.grid.laD[j]!;
      log10FreeM[k] = known!.grid.log10FreeM[j]!;
      freeM[k] = known!.grid.freeM[j]!;
      continue;
    }
    const pH = phs[k]!;
    const logSum = log10SpeciesSum(drug, pH);
    laD[k] = log10UnnormalisedFraction(drug, pH, iSalt) - logSum;
    log10FreeM[k] = log10IntrinsicM - (log10UnnormalisedFraction(drug, pH, iFree) - logSum);
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
  const g = profileGrid(grid.phFrom, grid.phTo, grid.phStep);
  const profile = drugOnGrid(drug, ionCharge, log10IntrinsicM, g.phs, g.key);
  // the scan points the profile grid shares (pH 1 to 8 in steps of 0.25 on the default grid) are
  // taken from it
  const known = { grid: profile, at: g.scanAt };
  return {
    drug,
    ionCharge,
    log10IntrinsicM,
    profile,
    scan: drugOnGrid(drug, ionCharge, log10IntrinsicM, SCAN_PHS, 'scan', known),
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
