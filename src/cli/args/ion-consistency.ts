import { ChemInputError, findThermoIonByFormula, parseFormula, type ThermoIon } from '@/chem';

/**
 * Checks that an ion written by hand adds up before the core estimates anything from it: the charge
 * written in a formula agrees with the charge given, a formula that is a bundled ion keeps that ion's
 * charge, and the charge has atoms that can carry it. (SMILES are checked by the core's one structure
 * check, `readSmilesStrictly`.)
 */

const SUPERSCRIPT_DIGITS: Record<string, string> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
};

/**
 * The charge written at the end of a formula (`NH4+`, `SO4 2-`, `SO4^2-`, `SO4--`, `SO₄²⁻`), or
 * undefined when none is written; NaN when it cannot be read (mixed signs). Digits directly after
 * the last element are a count, not a charge (`SO42-` reads as 42 O atoms, one minus), as the core's
 * formula reader does.
 */
export function writtenCharge(formula: string): number | undefined {
  const s = formula.trim();
  const sup = /([⁰¹²³⁴⁵⁶⁷⁸⁹]*)([⁺⁻]+)$/u.exec(s);
  if (sup) {
    const digits = [...sup[1]!].map((c) => SUPERSCRIPT_DIGITS[c]).join('');
    return signed(digits, sup[2]!.replace(/⁺/g, '+').replace(/⁻/g, '-'));
  }
  const spaced = /(?:\s+|\^)(\d*)([+-]+)$/.exec(s);
  if (spaced) return signed(spaced[1]!, spaced[2]!);
  const bare = /([+-]+)$/.exec(s);
  return bare ? signed('', bare[1]!) : undefined;
}

function signed(digits: string, signs: string): number {
  if (/^\++$/.test(signs) || /^-+$/.test(signs)) {
    const size = digits ? Number(digits) * (signs.length === 1 ? 1 : NaN) : signs.length;
    return signs[0] === '+' ? size : -size;
  }
  return NaN;
}

/** Atoms that carry a cation's charge in the ions salts are made of: ammonium-type N, phosphonium P, sulfonium S, arsonium As. */
const CATION_CENTRES = ['N', 'P', 'S', 'As'];
/** Atoms that carry an anion's charge: carboxylate/sulfonate/phosphate O, N, S, P, Se, B and the halogens. */
const ANION_CENTRES = ['O', 'N', 'S', 'P', 'Se', 'B', 'F', 'Cl', 'Br', 'I'];
/** Non-metals: an ion with any other element (a metal) is left to the bundled data and the core. */
const NON_METALS = new Set([
  'H',
  'B',
  'C',
  'N',
  'O',
  'F',
  'Si',
  'P',
  'S',
  'Cl',
  'As',
  'Se',
  'Br',
  'Te',
  'I',
]);

/**
 * Refuse a molecular ion whose charge has no atoms to sit on: a charge of +n needs at least n N, P, S
 * or As atoms (the protonated or quaternary centres of organic cations); −n needs at least n O, N, S,
 * P, Se, B or halogen atoms. Common practice for the ions salts are made of (our rule, no source);
 * metal-containing ions are left alone.
 */
export function requireChargeCarriers(field: string, formula: string, charge: number): void {
  const { elements } = parseFormula(formula, field);
  if (Object.keys(elements).some((el) => !NON_METALS.has(el))) return;
  const centres = charge > 0 ? CATION_CENTRES : ANION_CENTRES;
  const n = centres.reduce((sum, el) => sum + (elements[el] ?? 0), 0);
  if (n < Math.abs(charge)) {
    throw new ChemInputError(
      `${field}.charge`,
      `${formula} cannot carry charge ${charge > 0 ? '+' : ''}${charge}: it has ${n} atom(s) that can hold ${charge > 0 ? 'a positive' : 'a negative'} charge`,
      charge > 0
        ? 'a cation charge of at most the number of N, P, S or As atoms (ammonium, phosphonium, sulfonium)'
        : 'an anion charge of at most the number of O, N, S, P, Se, B or halogen atoms',
    );
  }
}

/** Refuse a formula whose written charge disagrees with `charge`, or that is a bundled ion of another charge. */
export function requireFormulaChargeAgrees(field: string, formula: string, charge: number): void {
  const written = writtenCharge(formula);
  if (written !== undefined && written !== charge) {
    throw new ChemInputError(
      `${field}.formula`,
      Number.isNaN(written)
        ? `cannot read the charge written in "${formula}"`
        : `"${formula}" is written with charge ${written} but charge is ${charge}`,
      'the formula without a charge, or with the same charge as "charge" (e.g. "SO4 2-" with -2)',
    );
  }
  if (findThermoIonByFormula(formula, charge)) return;
  for (const other of [-4, -3, -2, -1, 1, 2, 3, 4]) {
    const bundled = other === charge ? undefined : findThermoIonByFormula(formula, other);
    if (bundled) {
      throw new ChemInputError(
        `${field}.charge`,
        `${formula} is the bundled ion ${bundled.label}, charge ${other}, not ${charge}`,
        `charge ${other} for ${formula}`,
      );
    }
  }
}

/** After an ion is built from a formula or SMILES: its charge must have atoms to sit on. */
export function requireBuiltIonPlausible(field: string, ion: ThermoIon): void {
  if (ion.formula) requireChargeCarriers(field, ion.formula, ion.charge);
}
