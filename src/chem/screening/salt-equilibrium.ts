import { brentRoot } from '../numerics/root-finding';
import { ChemInputError, finiteWithin, requireFiniteInRange } from '../result';
import { daviesLog10Gamma } from './activity';
import { log10ChargeFraction, log10SpeciesFractions, type Protolyte } from './speciation';

/**
 * Solubility of a salt D_m X_n at a fixed (buffered) pH from its mass and charge balances, for any
 * stoichiometry (1:1, 2:1, 1:2), polyprotic counter-ions and polyprotic drugs.
 *
 * Model and assumptions (stated to the user wherever a profile is shown):
 * - the pH is held by the medium (a buffer or titrant closes the charge balance), as in a
 *   pH–solubility measurement with pH adjustment;
 * - each dissolved formula unit releases m drug and n counter-ion molecules in every protonation
 *   state, so total drug = m·s and total counter-ion = n·s + c (c: counter-ion already in the medium,
 *   e.g. chloride of gastric fluid) — the mass balance;
 * - the solid is the salt with the ions in their salt charge states z_D and z_X (m·z_D + n·z_X = 0,
 *   the salt's own charge balance): K_sp = [D^zD]^m·[X^zX]^n·γ_D^m·γ_X^n;
 * - activities equal concentrations unless the Davies option is chosen; the pKa values are used as
 *   given (no ionic-strength correction of the pKa).
 * The 1:1 closed form of Bogardus & Blackwood 1979 assumes [X⁻] = [BH⁺]; this solver uses the mass
 * balance and agrees with it where the dissolved drug is fully ionised.
 */
export interface SaltEquilibriumInput {
  drug: Protolyte;
  /** Net charge of the drug ion in the salt (+1/+2 for a base, −1/−2 for an acid). */
  drugIonCharge: number;
  drugPerSalt: number;
  counterIon: Protolyte;
  /** Net charge of the counter-ion in the salt. */
  counterIonCharge: number;
  counterIonPerSalt: number;
  /** log₁₀ K_sp, K_sp in (mol/L)^(m+n). */
  log10Ksp: number;
  pH: number;
  /** Counter-ion (all protonation states) already in the medium, mol/L. */
  commonIonM?: number;
  activity?:
    | { model: 'ideal' }
    | { model: 'davies'; backgroundIonicStrengthM: number; temperatureK: number };
}

export interface SaltEquilibriumResult {
  /** Formula units dissolved, mol/L. */
  formulaUnitsM: number;
  /** Total dissolved drug (all protonation states), mol/L. */
  drugTotalM: number;
  /** True when the salt would dissolve beyond 10⁶ mol/L: it does not limit solubility at this pH. */
  unbounded: boolean;
  ionicStrengthM: number;
}

const LOG_S_MIN = -200;
const LOG_S_MAX = 6;

/** Everything of a salt equilibrium but the pH: the salt, its K_sp, the medium's own counter-ion, the activity model. */
export type SaltSystem = Omit<SaltEquilibriumInput, 'pH'>;

declare const checkedSaltSystem: unique symbol;
/**
 * A salt system checked by {@link checkSaltSystem}. Only that function makes one, so a solver that
 * takes it (solveCheckedSalt) never checks again and cannot be handed an unchecked system.
 */
export type CheckedSaltSystem = SaltSystem & { readonly [checkedSaltSystem]: true };

/**
 * The one check of a salt system, at the edge: whole counts 1–4, a neutral formula unit, log₁₀ K_sp,
 * the common ion's concentration and the Davies background ionic strength in range.
 */
export function checkSaltSystem(i: SaltSystem): CheckedSaltSystem {
  // every salt of a screen is checked several times: when it plainly passes, the checks below (which
  // build their messages as they go) are not run; when any would fail, they run in order and throw
  if (plainlyValidSystem(i)) return i as CheckedSaltSystem;
  for (const [f, v] of [
    ['drugPerSalt', i.drugPerSalt],
    ['counterIonPerSalt', i.counterIonPerSalt],
  ] as const) {
    if (!Number.isInteger(v) || v < 1 || v > 4)
      throw new ChemInputError(f, `${v} is not allowed`, 'an integer from 1 to 4');
  }
  if (i.drugPerSalt * i.drugIonCharge + i.counterIonPerSalt * i.counterIonCharge !== 0) {
    throw new ChemInputError(
      'stoichiometry',
      `${i.drugPerSalt}×(${i.drugIonCharge}) + ${i.counterIonPerSalt}×(${i.counterIonCharge}) is not neutral`,
      'drug and counter-ion charges that balance in the formula unit',
    );
  }
  requireFiniteInRange('log10Ksp', i.log10Ksp, -200, 20);
  requireFiniteInRange('commonIonConcentration', i.commonIonM ?? 0, 0, 20, 'mol/L');
  if (i.activity?.model === 'davies')
    requireFiniteInRange(
      'backgroundIonicStrength',
      i.activity.backgroundIonicStrengthM,
      0,
      5,
      'mol/L',
    );
  return i as CheckedSaltSystem;
}

const wholeCount = (v: number) => Number.isInteger(v) && v >= 1 && v <= 4;

/** True exactly when checkSaltSystem's checks all pass. */
function plainlyValidSystem(i: SaltSystem): boolean {
  return (
    wholeCount(i.drugPerSalt) &&
    wholeCount(i.counterIonPerSalt) &&
    i.drugPerSalt * i.drugIonCharge + i.counterIonPerSalt * i.counterIonCharge === 0 &&
    finiteWithin(i.log10Ksp, -200, 20) &&
    finiteWithin(i.commonIonM ?? 0, 0, 20) &&
    (i.activity?.model !== 'davies' || finiteWithin(i.activity.backgroundIonicStrengthM, 0, 5))
  );
}

/** The pH a solver accepts, 0–14 (checked where a pH enters: a single point or a grid's ends). */
export function requirePh(pH: number, field = 'pH'): number {
  return finiteWithin(pH, 0, 14) ? pH : requireFiniteInRange(field, pH, 0, 14);
}

/** Check a salt system and its pH; returns the checked system. */
export function checkSaltInput(i: SaltEquilibriumInput): CheckedSaltSystem {
  const system = checkSaltSystem(i);
  requirePh(i.pH);
  return system;
}

/** Sum of c·z² over every dissolved species, for the ionic strength. */
function saltIonicContribution(i: SaltSystem, pH: number, s: number): number {
  const c = i.commonIonM ?? 0;
  let sum = 0;
  const add = (p: Protolyte, total: number) => {
    const f = log10SpeciesFractions(p, pH);
    f.forEach((lf, k) => {
      const z = p.mostProtonatedCharge - k;
      sum += total * 10 ** lf * z * z;
    });
  };
  add(i.drug, i.drugPerSalt * s);
  add(i.counterIon, i.counterIonPerSalt * s + c);
  return 0.5 * sum;
}

/**
 * log₁₀ of the formula units dissolved, s, without counter-ion in the medium (c = 0): the mass balance
 * then makes log K_sp linear in log s, m·(log α_D + log m + log s) + n·(log α_X + log n + log s) =
 * log K_sp − (activity term), solved in closed form rather than by a root search. `laD`, `laX`: log₁₀ of
 * the fractions of drug and counter-ion in their salt charge states. Above 10⁶ formula units per litre
 * the salt does not limit solubility (`unbounded`); below 10⁻²⁰⁰ the value is clamped there, as the
 * bracketed search clamps it.
 */
export function saltLog10FormulaUnitsNoCommonIon(
  m: number,
  n: number,
  laD: number,
  laX: number,
  log10KspLessGamma: number,
): { u: number; unbounded: boolean } {
  const u = saltLog10FormulaUnitsRaw(m, n, laD, laX, log10KspLessGamma);
  if (u > LOG_S_MAX) return { u: LOG_S_MAX, unbounded: true };
  if (u < LOG_S_MIN) return { u: LOG_S_MIN, unbounded: false };
  return { u, unbounded: false };
}

/** The closed form above before its limits are applied (no object made: hot loops call it). */
export function saltLog10FormulaUnitsRaw(
  m: number,
  n: number,
  laD: number,
  laX: number,
  log10KspLessGamma: number,
): number {
  return (log10KspLessGamma - m * (laD + Math.log10(m)) - n * (laX + Math.log10(n))) / (m + n);
}

/** The limits of log₁₀ s the solver works within: above, the salt does not limit; below, clamped. */
export const SALT_LOG10_S_LIMITS = { min: LOG_S_MIN, max: LOG_S_MAX } as const;

/** Solve the salt's solubility at one pH (checks the input: the public entry). */
export function solveSaltSolubility(i: SaltEquilibriumInput): SaltEquilibriumResult {
  return solveCheckedSalt(checkSaltInput(i), i.pH);
}

/**
 * The salt's solubility at one pH for a system checked once by {@link checkSaltSystem}; the pH is the
 * caller's, within 0–14 (a checked point or a point of a checked grid). No check is repeated here.
 */
export function solveCheckedSalt(i: CheckedSaltSystem, pH: number): SaltEquilibriumResult {
  const m = i.drugPerSalt;
  const n = i.counterIonPerSalt;
  const c = i.commonIonM ?? 0;
  const laD = log10ChargeFraction(i.drug, pH, i.drugIonCharge);
  const laX = log10ChargeFraction(i.counterIon, pH, i.counterIonCharge);
  const solveWith = (log10GammaTerm: number) => {
    if (c === 0)
      return saltLog10FormulaUnitsNoCommonIon(m, n, laD, laX, i.log10Ksp - log10GammaTerm);
    const g = (u: number) => {
      const s = 10 ** u;
      return (
        m * (laD + Math.log10(m) + u) +
        n * (laX + Math.log10(n * s + c)) +
        log10GammaTerm -
        i.log10Ksp
      );
    };
    if (g(LOG_S_MAX) < 0) return { u: LOG_S_MAX, unbounded: true };
    if (g(LOG_S_MIN) > 0) return { u: LOG_S_MIN, unbounded: false };
    return { u: brentRoot(g, LOG_S_MIN, LOG_S_MAX, 1e-13).root, unbounded: false };
  };
  let sol = solveWith(0);
  let ionicStrengthM = i.activity?.model === 'davies' ? i.activity.backgroundIonicStrengthM : 0;
  if (i.activity?.model === 'davies' && !sol.unbounded) {
    const { backgroundIonicStrengthM, temperatureK } = i.activity;
    for (let it = 0; it < 50; it++) {
      const ionic = Math.min(
        5,
        backgroundIonicStrengthM + saltIonicContribution(i, pH, 10 ** sol.u),
      );
      const term =
        m * daviesLog10Gamma(i.drugIonCharge, ionic, temperatureK) +
        n * daviesLog10Gamma(i.counterIonCharge, ionic, temperatureK);
      const next = solveWith(term);
      const done = Math.abs(next.u - sol.u) < 1e-12 && Math.abs(ionic - ionicStrengthM) < 1e-12;
      sol = next;
      ionicStrengthM = ionic;
      if (done || sol.unbounded) break;
    }
  }
  const s = 10 ** sol.u;
  return { formulaUnitsM: s, drugTotalM: m * s, unbounded: sol.unbounded, ionicStrengthM };
}

/** log₁₀ of the free form's solubility at a pH: log S₀ − log₁₀ α(neutral). */
export function log10FreeFormSolubilityM(
  drug: Protolyte,
  log10IntrinsicM: number,
  pH: number,
): number {
  return log10IntrinsicM - log10ChargeFraction(drug, pH, 0);
}

/**
 * log₁₀ K_sp from a salt solubility measured at a known pH (the inverse of
 * {@link solveSaltSolubility}, ideal activities): K_sp = (α_D·m·s)^m·(α_X·(n·s + c))^n with s the
 * formula units dissolved. Valid only when the salt, not the free form, was the solid at equilibrium
 * (check the residual solid; a result above pH_max is the free form's solubility).
 */
export function log10KspFromSaltSolubility(
  i: Omit<SaltEquilibriumInput, 'log10Ksp' | 'activity'> & { formulaUnitsM: number },
): number {
  if (!(i.formulaUnitsM > 0 && Number.isFinite(i.formulaUnitsM))) {
    throw new ChemInputError(
      'saltSolubility',
      `must be greater than zero, got ${i.formulaUnitsM}`,
      'a finite number > 0 mol/L',
    );
  }
  checkSaltInput({ ...i, log10Ksp: 0 });
  const m = i.drugPerSalt;
  const n = i.counterIonPerSalt;
  const c = i.commonIonM ?? 0;
  const laD = log10ChargeFraction(i.drug, i.pH, i.drugIonCharge);
  const laX = log10ChargeFraction(i.counterIon, i.pH, i.counterIonCharge);
  return (
    m * (laD + Math.log10(m * i.formulaUnitsM)) + n * (laX + Math.log10(n * i.formulaUnitsM + c))
  );
}
