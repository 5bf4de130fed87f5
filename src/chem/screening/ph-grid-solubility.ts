import { brentRootFrom } from '../numerics/root-finding';
import type { DrugGrids, DrugOnGrid, GridSolubility } from './drug-grid';
import type { ProfileSalt } from './ph-profile';
import { SALT_LOG10_S_LIMITS } from './salt-equilibrium';
import { chargeFractionsOn, log10SpeciesSum, log10UnnormalisedFraction } from './speciation';

export {
  drugGrids,
  drugOnGrid,
  fastPathApplies,
  freeFormOnGrid,
  gridFromPoints,
  PH_MAX_SCAN_STEP,
  profilePhs,
  type DrugGrids,
  type DrugOnGrid,
  type GridSolubility,
} from './drug-grid';

/**
 * The pH–solubility model of ph-profile.ts evaluated fast on fixed pH lists, for the screen: the same
 * equations and the same arithmetic (so the same numbers), with what does not depend on the salt
 * (the drug's speciation and free-form solubility) computed once per compound, and what does not
 * depend on the compound (a counter-ion's speciation on the grid) memoised across compounds.
 * Only the ideal-activity, no-common-ion case is taken here; every other case goes to the general
 * solver (salt-equilibrium.ts) point by point.
 */

/**
 * Margin, in decades, within which the logarithms below do not decide an order and the exact values
 * are taken. The logarithms differ from log₁₀ of the exact values by rounding of a few 1e-15 decade
 * (a sum of terms ≤ ~30 and one power good to an ulp); 1e-11 is over a thousand times that, and
 * also above the screen's tie tolerance (a relative 1e-12, 4.3e-13 decade: SOLUBILITY_TIE_REL), so a
 * difference beyond the margin is one the exact values and the tie rule decide the same way.
 */
export const LOG_ORDER_MARGIN = 1e-11;

/**
 * One salt's points on a drug grid (ideal activities, no common ion), one point at a time and without
 * arrays: the value at a point is exactly saltOnGrid's (`exactAt`, which takes the power), and its
 * log₁₀ (`log10At`) is found from the exponent alone wherever the margin decides which solid limits.
 * A screen that reduces the grid (the worst ICH M9 point) compares the logarithms and takes powers
 * only for the few points it keeps or cannot order otherwise. The caller checks the salt input first.
 */
export class SaltGridPoints {
  private readonly laX: Float64Array;
  private readonly m: number;
  private readonly n: number;
  private readonly lm: number;
  private readonly ln: number;
  private readonly K: number;
  /** Whether the salt was the limiting solid at the point `exactAt` last evaluated. */
  salt = false;

  constructor(
    readonly g: DrugOnGrid,
    s: ProfileSalt,
  ) {
    this.laX = chargeFractionsOn(s.counterIon, s.counterIonCharge, g.phs, g.gridKey);
    this.m = s.drugPerSalt;
    this.n = s.counterIonPerSalt;
    // saltLog10FormulaUnitsRaw with its logarithms taken once (the same values, so the same bits)
    this.lm = Math.log10(this.m);
    this.ln = Math.log10(this.n);
    this.K = s.log10Ksp;
  }

  /** log₁₀ formula units dissolved with the salt as the solid, unclamped (the solver's u). */
  private u(k: number): number {
    const { m, n } = this;
    return (this.K - m * (this.g.laD[k]! + this.lm) - n * (this.laX[k]! + this.ln)) / (m + n);
  }

  /** Total dissolved drug at point k, mol/L: pointAt's value in ph-profile.ts, same arithmetic. */
  exactAt(k: number): number {
    const g = this.g;
    const u = this.u(k);
    this.salt = false;
    // above the upper limit the salt does not limit (the solver's `unbounded`); far above the free
    // form (a thousandth of a decade) it does not either, and no power needs taking to see it
    if (u > SALT_LOG10_S_LIMITS.max || this.lm + u > g.log10FreeM[k]! + 1e-3) return g.freeM[k]!;
    const saltM = this.m * 10 ** Math.max(u, SALT_LOG10_S_LIMITS.min);
    if (!(saltM < g.freeM[k]!)) return g.freeM[k]!;
    this.salt = true;
    return saltM;
  }

  /** log₁₀ of exactAt(k) to within ~1e-14 decade; the exact value is taken only near a tie of solids. */
  log10At(k: number): number {
    const logFree = this.g.log10FreeM[k]!;
    const u = this.u(k);
    if (u > SALT_LOG10_S_LIMITS.max) return logFree;
    const logSalt = this.lm + Math.max(u, SALT_LOG10_S_LIMITS.min);
    if (logSalt < logFree - LOG_ORDER_MARGIN) return logSalt;
    if (logSalt > logFree + LOG_ORDER_MARGIN) return logFree;
    return Math.log10(this.exactAt(k));
  }

  /**
   * The position in `ks` (grid indices, in order) of the point a scan keeping the current lowest and
   * moving on to a point only where `lower(value, lowest)` says so would end on — with each step
   * decided from log10At's logarithms where they are more than the margin apart (not lower at all;
   * far lower, beyond the tie tolerance `lower` applies) and by `lower` on exact values otherwise.
   * `lower` must be a "lower by more than a relative tolerance ≤ 1e-12" test, as clearlyLower is.
   */
  lowestOf(ks: Int32Array, lower: (b: number, a: number) => boolean): number {
    const { laD, log10FreeM } = this.g;
    const { laX, m, n, lm, ln, K } = this;
    const { min, max } = SALT_LOG10_S_LIMITS;
    let w = 0;
    let wLog = this.log10At(ks[0]!);
    for (let i = 1; i < ks.length; i++) {
      const k = ks[i]!;
      // log10At(k) written out (the same operations): the hot loop of the reduction
      const u = (K - m * (laD[k]! + lm) - n * (laX[k]! + ln)) / (m + n);
      let l = log10FreeM[k]!;
      if (!(u > max)) {
        const logSalt = lm + Math.max(u, min);
        if (logSalt < l - LOG_ORDER_MARGIN) l = logSalt;
        else if (!(logSalt > l + LOG_ORDER_MARGIN)) l = Math.log10(this.exactAt(k));
      }
      if (l > wLog) continue; // not lower at all, so not lower beyond the tolerance
      if (l < wLog - LOG_ORDER_MARGIN || lower(this.exactAt(ks[i]!), this.exactAt(ks[w]!))) {
        w = i;
        wLog = l;
      }
    }
    return w;
  }
}

/**
 * The salt on the grid as arrays, made when first read: for a screen that reads the arrays only for
 * the rows it writes (their words), while its ranking needs only a few points (SaltGridPoints).
 */
class SaltGridWhenRead implements GridSolubility {
  readonly phs: readonly number[];

  constructor(
    private readonly g: DrugOnGrid,
    private readonly salt: ProfileSalt,
  ) {
    this.phs = g.phs;
  }

  get solubilityM(): Float64Array {
    return this.make().solubilityM;
  }

  get saltSolid(): Uint8Array {
    return this.make().saltSolid;
  }

  /** The arrays, set on the object itself: later reads (a row's words loop over them) are plain. */
  private make(): GridSolubility {
    const made = saltOnGrid(this.g, this.salt);
    Object.defineProperty(this, 'solubilityM', { value: made.solubilityM });
    Object.defineProperty(this, 'saltSolid', { value: made.saltSolid });
    return made;
  }
}

/** saltOnGrid's arrays, made only if read (the same values). */
export function saltOnGridWhenRead(g: DrugOnGrid, salt: ProfileSalt): GridSolubility {
  return new SaltGridWhenRead(g, salt);
}

/** The salt on the grid as arrays: at each pH the value pointAt in ph-profile.ts gives. */
export function saltOnGrid(g: DrugOnGrid, salt: ProfileSalt): GridSolubility {
  const points = new SaltGridPoints(g, salt);
  const len = g.phs.length;
  const solubilityM = new Float64Array(len);
  const saltSolid = new Uint8Array(len);
  for (let k = 0; k < len; k++) {
    solubilityM[k] = points.exactAt(k);
    if (points.salt) saltSolid[k] = 1;
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
  // log₁₀(m·s) as log₁₀ m + log₁₀ s: numericalPhMax takes log₁₀ of m·10^u, equal but for rounding;
  // saltLog10FormulaUnitsRaw with its logarithms taken once (the same values, so the same bits)
  const lm = Math.log10(m);
  const ln = Math.log10(n);
  const K = salt.log10Ksp;
  const logSaltOf = (laD: number, laX: number) =>
    lm + Math.min(max, Math.max(min, (K - m * (laD + lm) - n * (laX + ln)) / (m + n)));
  const s = g.scan;
  const laX = chargeFractionsOn(salt.counterIon, salt.counterIonCharge, s.phs, s.gridKey);
  const p = g.drug;
  const ref = p.pKas[p.mostProtonatedCharge - g.ionCharge] ?? p.pKas[0]!;
  // the crossing nearest ref, the first of equals (as reducing the list of crossings picks it)
  let best: number | null = null;
  const take = (x: number) => {
    if (best === null || Math.abs(x - ref) < Math.abs(best - ref)) best = x;
  };
  let h: ((pH: number) => number) | null = null;
  const { laD, log10FreeM, phs } = s;
  let prev = logSaltOf(laD[0]!, laX[0]!) - log10FreeM[0]!;
  for (let k = 1; k < phs.length; k++) {
    // logSaltOf written out (the same operations in the same order): the hot loop of pH_max
    const u = (K - m * (laD[k]! + lm) - n * (laX[k]! + ln)) / (m + n);
    const cur = lm + Math.min(max, Math.max(min, u)) - log10FreeM[k]!;
    if (prev === 0) take(phs[k - 1]!);
    // h at the scan points is prev and cur, the same bits (the same fractions from the same sums)
    else if (prev * cur < 0) {
      h ??= brentFunction(g, salt, logSaltOf);
      take(brentRootFrom(h, phs[k - 1]!, phs[k]!, prev, cur, 1e-12).root);
    }
    prev = cur;
  }
  return best;
}

/**
 * log S_salt − log S_free at any pH, as numericalPhMax's function: the drug's salt-state fraction and
 * its neutral fraction (log10FreeFormSolubilityM) share one sum of species terms, taken once (each
 * fraction is its term minus that sum, as log10ChargeFraction computes it: the same bits). The drug's
 * two charges were checked when its grids were made (drugOnGrid) and the counter-ion's when its scan
 * fractions were (chargeFractionsOn, before any call), so no check is repeated per evaluation.
 */
function brentFunction(
  g: DrugGrids,
  salt: ProfileSalt,
  logSaltOf: (laD: number, laX: number) => number,
): (pH: number) => number {
  const drug = g.drug;
  const iSalt = drug.mostProtonatedCharge - g.ionCharge;
  const iFree = drug.mostProtonatedCharge;
  const log10S0 = g.log10IntrinsicM;
  const ion = salt.counterIon;
  const iIon = ion.mostProtonatedCharge - salt.counterIonCharge;
  return (pH: number) => {
    const logSum = log10SpeciesSum(drug, pH);
    const laD = log10UnnormalisedFraction(drug, pH, iSalt) - logSum;
    const laX = log10UnnormalisedFraction(ion, pH, iIon) - log10SpeciesSum(ion, pH);
    return logSaltOf(laD, laX) - (log10S0 - (log10UnnormalisedFraction(drug, pH, iFree) - logSum));
  };
}
