import { brentRoot } from '../numerics/root-finding';
import { ChemInputError, finiteWithin, requireFiniteInRange } from '../result';
import {
  checkSaltSystem,
  log10FreeFormSolubilityM,
  requirePh,
  solveCheckedSalt,
  type CheckedSaltSystem,
  type SaltEquilibriumInput,
  type SaltSystem,
} from './salt-equilibrium';
import { requireAscendingPkas, type Protolyte } from './speciation';

/** The drug's acid–base description used by every screening model. */
export interface DrugAcidBase {
  kind: 'base' | 'acid';
  /** pKa values at 25 °C, strictly ascending (for a base, of its conjugate acids). */
  pKas: readonly number[];
  /** Charge of the salt-forming drug ion (+1/+2 for a base, −1/−2 for an acid). */
  ionCharge: number;
}

/**
 * The drug as a protolyte: a base with n basic sites is fully protonated at charge +n; an acid with
 * n acidic protons is neutral when fully protonated. (A zwitterionic drug needs both and is not
 * covered: state it as a base or an acid by the group that forms the salt.)
 */
export function drugProtolyte(d: DrugAcidBase): Protolyte {
  // every screen step asks again for the same drug: when it plainly passes every check below, the
  // checks (which build their field names and messages as they go) are not run again
  if (plainlyValidDrug(d))
    return { pKas: d.pKas, mostProtonatedCharge: d.kind === 'base' ? d.pKas.length : 0 };
  requireAscendingPkas('pKas', d.pKas);
  if (d.pKas.length < 1) throw new ChemInputError('pKas', 'no pKa given', 'one to four pKa values');
  const sign = d.kind === 'base' ? 1 : -1;
  if (
    !Number.isInteger(d.ionCharge) ||
    d.ionCharge * sign < 1 ||
    Math.abs(d.ionCharge) > d.pKas.length
  ) {
    throw new ChemInputError(
      'ionCharge',
      `${d.ionCharge} does not fit a ${d.kind} with ${d.pKas.length} pKa value(s)`,
      `${d.kind === 'base' ? '+1' : '−1'} up to ${sign * d.pKas.length}`,
    );
  }
  return { pKas: d.pKas, mostProtonatedCharge: d.kind === 'base' ? d.pKas.length : 0 };
}

/** True when drugProtolyte's checks all pass (false: they run and throw their own error). */
function plainlyValidDrug(d: DrugAcidBase): boolean {
  const pKas = d.pKas;
  if (pKas.length < 1) return false;
  for (let i = 0; i < pKas.length; i++) {
    if (!finiteWithin(pKas[i], -10, 20)) return false;
    if (i > 0 && !(pKas[i]! > pKas[i - 1]!)) return false;
  }
  const sign = d.kind === 'base' ? 1 : -1;
  return (
    Number.isInteger(d.ionCharge) && d.ionCharge * sign >= 1 && Math.abs(d.ionCharge) <= pKas.length
  );
}

export interface ProfileSalt {
  counterIon: Protolyte;
  counterIonCharge: number;
  drugPerSalt: number;
  counterIonPerSalt: number;
  log10Ksp: number;
}

export interface ProfileOptions {
  /** pH range, default 1.0–8.0, step 0.1. */
  phFrom?: number;
  phTo?: number;
  phStep?: number;
  /** Counter-ion already in the medium, mol/L (e.g. gastric chloride). */
  commonIonM?: number;
  activity?: SaltEquilibriumInput['activity'];
}

export interface ProfilePoint {
  pH: number;
  /** Total dissolved drug, mol/L. */
  solubilityM: number;
  /** Free-form-limited branch, mol/L. */
  freeFormLimitedM: number;
  /** Salt-limited branch, mol/L (null for the free form alone or when the salt never limits). */
  saltLimitedM: number | null;
  /** The solid in equilibrium at this pH. */
  solid: 'salt' | 'free-form';
}

export interface PhProfile {
  points: ProfilePoint[];
  /** pH where both solids coexist; null when the branches do not cross within pH 0–14. */
  phMax: number | null;
  assumptions: string[];
}

export const PROFILE_ASSUMPTIONS: readonly string[] = [
  'pH held by the medium (buffered); activities equal concentrations unless the Davies option is on',
  'total dissolved counter-ion = (counter-ions per formula unit) × (formula units dissolved) + the medium’s own',
  'pKa values at 25 °C used as given; no self-association, no micelles, no complexation',
  'the less soluble solid (salt or free form) is the one in equilibrium at each pH',
];

/** The salt system of a profile (everything but the pH), checked once by checkSaltSystem. */
export function checkedSystem(
  d: Protolyte,
  drugIonCharge: number,
  salt: ProfileSalt,
  o: ProfileOptions,
): CheckedSaltSystem {
  const system: SaltSystem = {
    drug: d,
    drugIonCharge,
    drugPerSalt: salt.drugPerSalt,
    counterIon: salt.counterIon,
    counterIonCharge: salt.counterIonCharge,
    counterIonPerSalt: salt.counterIonPerSalt,
    log10Ksp: salt.log10Ksp,
    commonIonM: o.commonIonM ?? 0,
    activity: o.activity,
  };
  return checkSaltSystem(system);
}

/** Solubility (mol/L, total drug) of the free form, or of the salt–free-form system, at one pH. */
export function solubilityAtPh(
  drug: DrugAcidBase,
  log10IntrinsicM: number,
  salt: ProfileSalt | null,
  pH: number,
  o: ProfileOptions = {},
): ProfilePoint {
  const p = drugProtolyte(drug);
  requirePh(pH);
  const system = salt ? checkedSystem(p, drug.ionCharge, salt, o) : null;
  return pointAt(p, log10IntrinsicM, system, pH);
}

/**
 * One point of a profile from checked inputs: `p` from drugProtolyte, `system` from checkedSystem,
 * pH within 0–14 (requirePh). No check is repeated here.
 */
export function pointAt(
  p: Protolyte,
  log10IntrinsicM: number,
  system: CheckedSaltSystem | null,
  pH: number,
): ProfilePoint {
  const freeFormLimitedM = 10 ** log10FreeFormSolubilityM(p, log10IntrinsicM, pH);
  if (!system)
    return {
      pH,
      solubilityM: freeFormLimitedM,
      freeFormLimitedM,
      saltLimitedM: null,
      solid: 'free-form',
    };
  const r = solveCheckedSalt(system, pH);
  const saltLimitedM = r.unbounded ? null : r.drugTotalM;
  if (saltLimitedM !== null && saltLimitedM < freeFormLimitedM) {
    return { pH, solubilityM: saltLimitedM, freeFormLimitedM, saltLimitedM, solid: 'salt' };
  }
  return { pH, solubilityM: freeFormLimitedM, freeFormLimitedM, saltLimitedM, solid: 'free-form' };
}

/**
 * pH_max: where the salt-limited and free-form-limited solubilities are equal, found by scanning
 * pH 0–14 for a sign change of log S_salt − log S_free and refining it with Brent's method.
 * Returns the crossing nearest the drug's salt-forming pKa when there is more than one.
 */
export function numericalPhMax(
  drug: DrugAcidBase,
  log10IntrinsicM: number,
  salt: ProfileSalt,
  o: ProfileOptions = {},
): number | null {
  const p = drugProtolyte(drug);
  const system = checkedSystem(p, drug.ionCharge, salt, o);
  const h = (pH: number) => {
    const r = solveCheckedSalt(system, pH);
    const logSalt = Math.log10(r.drugTotalM);
    return logSalt - log10FreeFormSolubilityM(p, log10IntrinsicM, pH);
  };
  const crossings: number[] = [];
  const step = 0.25;
  let prevPh = 0;
  let prev = h(0);
  for (let pH = step; pH <= 14 + 1e-9; pH += step) {
    const cur = h(pH);
    if (prev === 0) crossings.push(prevPh);
    else if (prev * cur < 0) crossings.push(brentRoot(h, prevPh, pH, 1e-12).root);
    prev = cur;
    prevPh = pH;
  }
  if (crossings.length === 0) return null;
  const ref = p.pKas[p.mostProtonatedCharge - drug.ionCharge] ?? p.pKas[0]!;
  return crossings.reduce((best, x) => (Math.abs(x - ref) < Math.abs(best - ref) ? x : best));
}

/**
 * The checks phSolubilityProfile makes before it computes anything (grid, S₀, drug, salt), in its
 * order, for callers that evaluate the same model another way (ph-grid-solubility.ts). Throws
 * ChemInputError.
 */
export function checkProfileInput(
  drug: DrugAcidBase,
  log10IntrinsicM: number,
  salt: ProfileSalt | null,
  o: ProfileOptions = {},
): { from: number; to: number; step: number; p: Protolyte; system: CheckedSaltSystem | null } {
  const from = o.phFrom ?? 1;
  const to = o.phTo ?? 8;
  const step = o.phStep ?? 0.1;
  // the checks below, in their order, run (and throw their own error) only when one would fail
  const plain =
    finiteWithin(from, 0, 14) &&
    finiteWithin(to, 0, 14) &&
    finiteWithin(step, 0.001, 14) &&
    to >= from &&
    finiteWithin(log10IntrinsicM, -20, 2);
  if (!plain) {
    requirePh(from, 'phFrom');
    requirePh(to, 'phTo');
    requireFiniteInRange('phStep', step, 0.001, 14);
    if (!(to >= from))
      throw new ChemInputError('phTo', `${to} is below phFrom ${from}`, 'phTo ≥ phFrom');
    requireFiniteInRange('log10IntrinsicSolubility', log10IntrinsicM, -20, 2, 'log₁₀ mol/L');
  }
  const p = drugProtolyte(drug);
  const system = salt ? checkedSystem(p, drug.ionCharge, salt, o) : null;
  return { from, to, step, p, system };
}

/** Solubility against pH, default 1.0–8.0 in steps of 0.1, with pH_max and the stated assumptions. */
export function phSolubilityProfile(
  drug: DrugAcidBase,
  log10IntrinsicM: number,
  salt: ProfileSalt | null,
  o: ProfileOptions = {},
): PhProfile {
  const { from, to, step, p, system } = checkProfileInput(drug, log10IntrinsicM, salt, o);
  const n = Math.round((to - from) / step);
  const points: ProfilePoint[] = [];
  for (let k = 0; k <= n; k++) {
    const pH = Math.min(to, from + k * step);
    points.push(pointAt(p, log10IntrinsicM, system, Number(pH.toFixed(10))));
  }
  return {
    points,
    phMax: salt ? numericalPhMax(drug, log10IntrinsicM, salt, o) : null,
    assumptions: [...PROFILE_ASSUMPTIONS],
  };
}
