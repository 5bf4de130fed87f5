import { ChemInputError, requireFiniteInRange } from '../result';

/**
 * Acid–base speciation of a protolyte (a molecule with one or more dissociable protons) at a fixed
 * pH, from its macroscopic pKa values (Henderson–Hasselbalch generalised to a polyprotic ladder;
 * any analytical chemistry text, e.g. Harris, "Quantitative Chemical Analysis", ch. 10–11).
 *
 * Assumptions: concentration pKa values (activity effects folded into the pKa), 25 °C values used at
 * the screening temperature unless the caller shifts them, no micro-speciation (tautomers and
 * zwitterion/neutral microspecies are lumped by net charge).
 */
export interface Protolyte {
  /** Macroscopic pKa values, strictly ascending. */
  pKas: readonly number[];
  /** Net charge of the fully protonated form (0 for a neutral acid HₙA, +n for a base with n sites). */
  mostProtonatedCharge: number;
}

/** Throw a ChemInputError unless the pKa list is finite, within −10..20 and strictly ascending. */
export function requireAscendingPkas(field: string, pKas: readonly number[]): readonly number[] {
  pKas.forEach((p, i) => requireFiniteInRange(`${field}[${i}]`, p, -10, 20));
  for (let i = 1; i < pKas.length; i++) {
    if (!(pKas[i]! > pKas[i - 1]!)) {
      throw new ChemInputError(
        field,
        `pKa values out of order (${pKas.join(', ')})`,
        'pKa values in strictly ascending order, lowest (most acidic step) first',
      );
    }
  }
  return pKas;
}

/**
 * log₁₀ of the mole fraction of every species, index i = protons lost from the fully protonated
 * form (charge = mostProtonatedCharge − i). Computed in log space so that no fraction underflows to
 * zero and no log of zero appears downstream.
 */
export function log10SpeciesFractions(p: Protolyte, pH: number): number[] {
  const logs: number[] = [0];
  let acc = 0;
  for (const pKa of p.pKas) {
    acc += pH - pKa;
    logs.push(acc);
  }
  const max = Math.max(...logs);
  let sum = 0;
  for (const l of logs) sum += 10 ** (l - max);
  const logSum = max + Math.log10(sum);
  return logs.map((l) => l - logSum);
}

/** log₁₀ of the fraction of the protolyte carrying net charge `charge` (−Infinity never: throws instead). */
export function log10ChargeFraction(p: Protolyte, pH: number, charge: number): number {
  const i = p.mostProtonatedCharge - charge;
  if (!Number.isInteger(i) || i < 0 || i > p.pKas.length) {
    throw new ChemInputError(
      'charge',
      `no species of charge ${charge} for a protolyte with ${p.pKas.length} pKa value(s) whose fully protonated form has charge ${p.mostProtonatedCharge}`,
      `a charge from ${p.mostProtonatedCharge - p.pKas.length} to ${p.mostProtonatedCharge}`,
    );
  }
  return log10UnnormalisedFraction(p, pH, i) - log10SpeciesSum(p, pH);
}

/**
 * The two halves of {@link log10ChargeFraction} (species index i = protons lost): log₁₀ of the
 * species' unnormalised term (the running sum of pH − pKa) and log₁₀ of the sum of all terms. Their
 * difference is the fraction, bit for bit (the same sums as log10SpeciesFractions, in the same order,
 * without the arrays). Apart so that a caller wanting two fractions of one protolyte at one pH (the
 * pH_max search: the drug's salt-state and neutral fractions) takes the sum, with its powers, once.
 * The index is not checked here: log10ChargeFraction checks it.
 */
export function log10UnnormalisedFraction(p: Protolyte, pH: number, i: number): number {
  const pKas = p.pKas;
  let acc = 0;
  for (let k = 0; k < i; k++) acc += pH - pKas[k]!;
  return acc;
}

export function log10SpeciesSum(p: Protolyte, pH: number): number {
  const pKas = p.pKas;
  let acc = 0;
  let max = 0;
  for (let k = 0; k < pKas.length; k++) {
    acc += pH - pKas[k]!;
    if (acc > max) max = acc;
  }
  // One term is the largest, 10⁰ = 1 exactly: no power is taken for it (the same sum, bit for bit).
  let sum = max === 0 ? 1 : 10 ** (0 - max);
  acc = 0;
  for (let k = 0; k < pKas.length; k++) {
    acc += pH - pKas[k]!;
    const t = acc - max;
    sum += t === 0 ? 1 : 10 ** t;
  }
  return max + Math.log10(sum);
}

/**
 * The pKa linking the species of charge `lowerCharge` with the species of charge `lowerCharge + 1`
 * (the proton whose transfer makes or breaks the salt). Undefined when no such step exists.
 */
export function linkingPka(p: Protolyte, lowerCharge: number): number | undefined {
  const i = p.mostProtonatedCharge - lowerCharge - 1;
  return i >= 0 && i < p.pKas.length ? p.pKas[i] : undefined;
}

/**
 * Counter-ion speciation per pH list, memoised across compounds by the ion's numbers (pKa values,
 * charges, grid), found through a numeric hash and an exact comparison: no key string is built per
 * call (this is asked twice per candidate). Bounded so that a long batch of custom ions cannot grow it.
 */
interface IonEntry {
  pKas: readonly number[];
  top: number;
  charge: number;
  gridKey: string;
  v: Float64Array;
  next: IonEntry | undefined;
}
const ION_CACHE_LIMIT = 512;
const ionCache = new Map<number, IonEntry>();
let ionCacheSize = 0;

function ionHash(p: Protolyte, charge: number, gridKey: string): number {
  // the key's length tells the usual two lists apart (the profile grid's and the pH_max scan's)
  let h = Math.imul(Math.imul(p.mostProtonatedCharge, 31) + charge, 31) + gridKey.length;
  for (let k = 0; k < p.pKas.length; k++) h = (Math.imul(h, 31) + Math.round(p.pKas[k]! * 1e6)) | 0;
  return h & 0x3fffffff; // a small integer key: the map's fast path
}

function sameIon(e: IonEntry, p: Protolyte, charge: number, gridKey: string): boolean {
  if (e.top !== p.mostProtonatedCharge || e.charge !== charge || e.gridKey !== gridKey)
    return false;
  if (e.pKas.length !== p.pKas.length) return false;
  for (let k = 0; k < e.pKas.length; k++) if (e.pKas[k] !== p.pKas[k]) return false;
  return true;
}

export function chargeFractionsOn(
  p: Protolyte,
  charge: number,
  phs: readonly number[],
  gridKey: string,
): Float64Array {
  const h = ionHash(p, charge, gridKey);
  const first = ionCache.get(h);
  for (let e = first; e; e = e.next) if (sameIon(e, p, charge, gridKey)) return e.v;
  const v = Float64Array.from(phs, (pH) => log10ChargeFraction(p, pH, charge));
  if (ionCacheSize >= ION_CACHE_LIMIT) {
    ionCache.clear();
    ionCacheSize = 0;
  }
  const pKas = [...p.pKas];
  const next = ionCache.get(h);
  ionCache.set(h, { pKas, top: p.mostProtonatedCharge, charge, gridKey, v, next });
  ionCacheSize++;
  return v;
}
