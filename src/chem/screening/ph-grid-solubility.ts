import type { DrugOnGrid, GridSolubility } from './drug-grid';
import type { ProfileSalt } from './ph-profile';
import { SALT_LOG10_S_LIMITS } from './salt-equilibrium';
import { chargeFractionsOn } from './speciation';

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
export { gridPhMax } from './grid-ph-max';

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
