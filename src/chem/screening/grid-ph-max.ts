import { brentRootFrom } from '../numerics/root-finding';
import type { DrugGrids } from './drug-grid';
import type { ProfileSalt } from './ph-profile';
import { SALT_LOG10_S_LIMITS } from './salt-equilibrium';
import { chargeFractionsOn, log10SpeciesSum, log10UnnormalisedFraction } from './speciation';

/**
 * The crossings of the last scan (scanPhMaxCrossings): at entry j, scan index at[j] = k with either a
 * zero at phs[k − 1] (fb[j] NaN) or a sign change between phs[k − 1] and phs[k] (fa, fb the values
 * there). Module buffers reused by every scan (no allocation per salt): read them before the next scan.
 */
let at = new Int32Array(16);
let fa = new Float64Array(16);
let fb = new Float64Array(16);

/** log S_salt − log S_free from the drug's and the counter-ion's log fractions (as numericalPhMax). */
class SaltLogDifference {
  readonly m: number;
  readonly n: number;
  readonly lm: number;
  readonly ln: number;
  readonly K: number;
  constructor(salt: ProfileSalt) {
    this.m = salt.drugPerSalt;
    this.n = salt.counterIonPerSalt;
    // log₁₀(m·s) as log₁₀ m + log₁₀ s: numericalPhMax takes log₁₀ of m·10^u, equal but for rounding;
    // saltLog10FormulaUnitsRaw with its logarithms taken once (the same values, so the same bits)
    this.lm = Math.log10(this.m);
    this.ln = Math.log10(this.n);
    this.K = salt.log10Ksp;
  }
  logSaltOf(laD: number, laX: number): number {
    const { min, max } = SALT_LOG10_S_LIMITS;
    const { m, n, lm, ln } = this;
    return lm + Math.min(max, Math.max(min, (this.K - m * (laD + lm) - n * (laX + ln)) / (m + n)));
  }
}

/**
 * The scan of pH_max (gridPhMax) without refining a crossing: log S_salt − log S_free at the 0.25-step
 * points from cached speciation, its zeros and sign changes kept in the module buffers; returns their
 * number. phMaxCrossingSpan gives the pH span they lie in (every root gridPhMax can return lies in it).
 */
export function scanPhMaxCrossings(g: DrugGrids, salt: ProfileSalt): number {
  const d = new SaltLogDifference(salt);
  const { m, n, lm, ln, K } = d;
  const { min, max } = SALT_LOG10_S_LIMITS;
  const s = g.scan;
  const laX = chargeFractionsOn(salt.counterIon, salt.counterIonCharge, s.phs, s.gridKey);
  const { laD, log10FreeM, phs } = s;
  let count = 0;
  let prev = d.logSaltOf(laD[0]!, laX[0]!) - log10FreeM[0]!;
  for (let k = 1; k < phs.length; k++) {
    // logSaltOf written out (the same operations in the same order): the hot loop of pH_max
    const u = (K - m * (laD[k]! + lm) - n * (laX[k]! + ln)) / (m + n);
    const cur = lm + Math.min(max, Math.max(min, u)) - log10FreeM[k]!;
    if (prev === 0 || prev * cur < 0) {
      if (count === at.length) growBuffers();
      at[count] = k;
      fa[count] = prev;
      fb[count] = prev === 0 ? NaN : cur;
      count++;
    }
    prev = cur;
  }
  return count;
}

function growBuffers(): void {
  const len = at.length * 2;
  const a = new Int32Array(len);
  const x = new Float64Array(len);
  const y = new Float64Array(len);
  a.set(at);
  x.set(fa);
  y.set(fb);
  at = a;
  fa = x;
  fb = y;
}

/** The pH span [lo, hi] holding every crossing of the last scan (count > 0). */
export function phMaxCrossingSpan(g: DrugGrids, count: number): { lo: number; hi: number } {
  const phs = g.scan.phs;
  const last = at[count - 1]!;
  return { lo: phs[at[0]! - 1]!, hi: Number.isNaN(fb[count - 1]!) ? phs[last - 1]! : phs[last]! };
}

/**
 * pH_max without a profile (ideal activities, no common ion): log S_salt − log S_free scanned at the
 * 0.25-step points from cached speciation, each sign change refined by Brent's method on the same
 * function, and the crossing nearest the drug's salt-forming pKa returned — the algorithm and the
 * function of numericalPhMax (ph-profile.ts), so the two agree to the root tolerance.
 */
export function gridPhMax(g: DrugGrids, salt: ProfileSalt): number | null {
  const count = scanPhMaxCrossings(g, salt);
  return count === 0 ? null : refinePhMax(g, salt, count);
}

/**
 * The crossings of the last scan (count > 0) refined in scan order, the one nearest the drug's
 * salt-forming pKa kept, the first of equals (as reducing the list of crossings picks it). Brent's
 * bracket is [phs[k − 1], phs[k]] and its root stays in it (root-finding.ts): the span of
 * phMaxCrossingSpan holds the result. h at the scan points is fa and fb, the same bits (the same
 * fractions from the same sums).
 */
export function refinePhMax(g: DrugGrids, salt: ProfileSalt, count: number): number {
  const p = g.drug;
  const ref = p.pKas[p.mostProtonatedCharge - g.ionCharge] ?? p.pKas[0]!;
  const phs = g.scan.phs;
  let best = NaN;
  let h: ((pH: number) => number) | null = null;
  for (let j = 0; j < count; j++) {
    const k = at[j]!;
    let x: number;
    if (Number.isNaN(fb[j]!)) x = phs[k - 1]!;
    else {
      h ??= brentFunction(g, salt, new SaltLogDifference(salt));
      x = brentRootFrom(h, phs[k - 1]!, phs[k]!, fa[j]!, fb[j]!, 1e-12).root;
    }
    if (j === 0 || Math.abs(x - ref) < Math.abs(best - ref)) best = x;
  }
  return best;
}

/**
 * log S_salt − log S_free at any pH, as numericalPhMax's function: the drug's salt-state fraction and
 * its neutral fraction (log10FreeFormSolubilityM) share one sum of species terms, taken once (each
 * fraction is its term minus that sum, as log10ChargeFraction computes it: the same bits). The drug's
 * two charges were checked when its grids were made (drugOnGrid) and the counter-ion's when its scan
 * fractions were (chargeFractionsOn, before any call), so no check is repeated per evaluation. Every
 * term is a finite sum of finite differences or the log of a sum ≥ 1: finite at every finite pH.
 */
function brentFunction(
  g: DrugGrids,
  salt: ProfileSalt,
  d: SaltLogDifference,
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
    return (
      d.logSaltOf(laD, laX) - (log10S0 - (log10UnnormalisedFraction(drug, pH, iFree) - logSum))
    );
  };
}
