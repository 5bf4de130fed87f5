import { ChemInputError } from '../result';
import { ATOMIC_WEIGHTS_G_PER_MOL, ELEMENT_SYMBOLS } from './atomic-weights';

/** Element symbol → number of atoms. */
export type ElementCounts = Record<string, number>;

export interface ParsedFormula {
  /** Atom counts, every count a positive integer. */
  elements: ElementCounts;
  /** Net charge written after the formula (`+`, `2-`, `^2-`, `(2+)`), 0 when none. */
  charge: number;
  /** The formula in Hill order, without charge (C, H, then the rest alphabetically). */
  hill: string;
}

const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';

const ACCEPTED =
  'element symbols with counts, optional parentheses and a hydrate part, e.g. C18H20ClN3O, Ca(C2H3O2)2, C4H4O4·H2O; a charge as a trailing + or - (±1), or 2- after a space, ^2-, (2-), -- or ²⁻';

/**
 * Parse a molecular formula as people write it: `C18H20ClN3O`, `Ca(OH)2`, `C9H8O4·2H2O`,
 * `CH3SO3-`, `C4H12N2^2+`, `SO4 2-`, `SO4²⁻`. The one formula parser of the core: compounds,
 * counter-ions and the thermochemistry engine's ions all read formulas here. Element symbols must be
 * real; elements without a bundled standard atomic weight are refused with a message naming them (no
 * mass is guessed).
 * @throws ChemInputError naming `field` on any unreadable part.
 */
export function parseFormula(text: string, field = 'formula'): ParsedFormula {
  if (typeof text !== 'string') throw new ChemInputError(field, 'a formula is text', ACCEPTED);
  // a formula of letters, digits and brackets only (C14H22N2O): no charge, space, superscript or
  // hydrate part for the steps below to find, so they are skipped (the same result)
  const plain = isPlainFormula(text);
  let t = text;
  let charge = 0;
  if (!plain) {
    const suffix = readChargeSuffix(text.trim());
    t = suffix.body.replace(/\s+/g, '');
    charge = suffix.charge;
    if (t === '') throw new ChemInputError(field, 'the formula is empty', ACCEPTED);
    if (t.length > 200) throw new ChemInputError(field, 'the formula is too long', ACCEPTED);
    t = t.replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹]/g, (c) => String(SUPERSCRIPT.indexOf(c)));
    if (Math.abs(charge) > 6)
      throw new ChemInputError(field, `charge ${charge} is not plausible`, ACCEPTED);
  }

  const elements: ElementCounts = {};
  const parts = plain ? [t] : t.split(/[·.*•]/);
  for (const part of parts) {
    if (part === '')
      throw new ChemInputError(field, 'an empty part around a hydrate dot', ACCEPTED);
    const lead = plain ? null : /^(\d+)(.*)$/.exec(part);
    const multiplier = lead ? Number(lead[1]) : 1;
    const body = lead ? lead[2]! : part;
    const counts = parseGroup(body, field);
    for (const [el, n] of Object.entries(counts))
      elements[el] = (elements[el] ?? 0) + n * multiplier;
  }
  for (const [el, n] of Object.entries(elements)) {
    if (n === 0) Reflect.deleteProperty(elements, el);
  }
  if (Object.keys(elements).length === 0)
    throw new ChemInputError(field, 'no atoms found', ACCEPTED);
  return { elements, charge, hill: hillFormula(elements) };
}

/**
 * 1 to 200 characters, each an ASCII letter, digit or bracket, the first not a digit: what
 * readChargeSuffix leaves whole with charge 0, with no space, superscript, hydrate dot or leading
 * multiplier in it.
 */
function isPlainFormula(text: string): boolean {
  const n = text.length;
  if (n < 1 || n > 200) return false;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    const letter = (c >= 65 && c <= 90) || (c >= 97 && c <= 122);
    const bracket = c === 40 || c === 41 || c === 91 || c === 93;
    if (!(letter || bracket || (i > 0 && isDigit(c)))) return false;
  }
  return true;
}

/** Minus signs people type for a charge: hyphen-minus, U+2212 minus, en dash, superscript minus. */
const MINUS = /[-−–⁻]/;

/**
 * Split a written charge off the end of a formula. Accepted, in this order: superscripts (`SO4²⁻`,
 * `Na⁺`); a charge after a space (`SO4 2-`, `NH4 +`); `^2-` or `(2-)`; repeated signs (`SO4--` is −2);
 * a bare trailing sign (±1, and digits before it belong to the formula: `CH3SO3-` is CH3SO3 with −1,
 * `SO42-` is 42 oxygens — write `SO4 2-` or `SO4^2-`).
 */
function readChargeSuffix(text: string): { body: string; charge: number } {
  const sign = (c: string) => (MINUS.test(c) ? -1 : 1);
  const cut = (m: RegExpExecArray, charge: number) => ({ body: text.slice(0, m.index), charge });
  const sup = /([⁰¹²³⁴⁵⁶⁷⁸⁹]*)([⁺⁻])$/.exec(text);
  if (sup) {
    const digits = [...sup[1]!].map((c) => SUPERSCRIPT.indexOf(c)).join('');
    return cut(sup, sign(sup[2]!) * (digits === '' ? 1 : Number(digits)));
  }
  const spaced = /\s+(\d*)([-+−–])$/.exec(text);
  if (spaced) return cut(spaced, sign(spaced[2]!) * (spaced[1] === '' ? 1 : Number(spaced[1])));
  const marked = /(?:\^(\d*)([-+−–])|\((\d*)([-+−–])\))$/.exec(text);
  if (marked) {
    const digits = marked[1] ?? marked[3] ?? '';
    return cut(marked, sign((marked[2] ?? marked[4])!) * (digits === '' ? 1 : Number(digits)));
  }
  const repeated = /(?:[-−–]{2,}|\+{2,})$/.exec(text);
  if (repeated) return cut(repeated, sign(repeated[0][0]!) * repeated[0].length);
  const bare = /[-+−–]$/.exec(text);
  if (bare) return cut(bare, sign(bare[0]));
  return { body: text, charge: 0 };
}

/**
 * One hydrate part's atoms. Read by character codes (no slice and regular expression per token): every
 * compound of a batch reads its formula here, and its drug ion again for the thermochemistry. The same
 * tokens as the patterns `^\d+` (ASCII digits) and `^[A-Z][a-z]?`, counts added in the same order.
 */
function parseGroup(body: string, field: string): ElementCounts {
  const stack: ElementCounts[] = [{}];
  let i = 0;
  const readCount = (): number => {
    let j = i;
    while (j < body.length && isDigit(body.charCodeAt(j))) j++;
    if (j === i) return 1;
    const n = Number(body.slice(i, j));
    i = j;
    if (n > 10000) throw new ChemInputError(field, `count ${n} is too large`, ACCEPTED);
    return n;
  };
  while (i < body.length) {
    const c = body.charCodeAt(i);
    if (c === 40 || c === 91) {
      // '(' or '['
      stack.push({});
      i++;
    } else if (c === 41 || c === 93) {
      // ')' or ']'
      if (stack.length < 2) throw new ChemInputError(field, `unmatched '${body[i]!}'`, ACCEPTED);
      i++;
      const n = readCount();
      const inner = stack.pop()!;
      const outer = stack[stack.length - 1]!;
      for (const [el, k] of Object.entries(inner)) outer[el] = (outer[el] ?? 0) + k * n;
    } else if (c >= 65 && c <= 90) {
      // an upper-case letter, with the lower-case letter after it when there is one
      const next = i + 1 < body.length ? body.charCodeAt(i + 1) : 0;
      const written = body.slice(i, next >= 97 && next <= 122 ? i + 2 : i + 1);
      const sym = elementSymbolOf(written, field);
      i += sym.length;
      const n = readCount();
      const top = stack[stack.length - 1]!;
      top[sym] = (top[sym] ?? 0) + n;
    } else {
      throw new ChemInputError(field, `unexpected '${body[i]!}' at position ${i + 1}`, ACCEPTED);
    }
  }
  if (stack.length !== 1) throw new ChemInputError(field, "unmatched '('", ACCEPTED);
  return stack[0]!;
}

const isDigit = (code: number) => code >= 48 && code <= 57;

/** The element a written symbol names (one or two letters); refused when unknown or weightless. */
function elementSymbolOf(written: string, field: string): string {
  let sym = written;
  // Prefer a two-letter symbol only when it is a real element (e.g. "Co" vs "C"+"o" is invalid anyway).
  if (sym.length === 2 && !ELEMENT_SYMBOLS.has(sym)) sym = sym[0]!;
  if (!ELEMENT_SYMBOLS.has(sym)) {
    throw new ChemInputError(field, `unknown element '${written}'`, ACCEPTED);
  }
  if (ATOMIC_WEIGHTS_G_PER_MOL[sym] === undefined) {
    throw new ChemInputError(
      field,
      `element ${sym} has no bundled standard atomic weight`,
      `elements ${Object.keys(ATOMIC_WEIGHTS_G_PER_MOL).join(' ')}`,
    );
  }
  return sym;
}

/** Hill order: C first, then H, then the rest alphabetically; with no carbon, all alphabetically. */
export function hillFormula(elements: ElementCounts): string {
  // one pass over the symbols and one sort (every compound's formula and drug ion come here)
  let hasC = false;
  let hasH = false;
  const rest: string[] = [];
  for (const s of Object.keys(elements)) {
    if (!((elements[s] ?? 0) > 0)) continue;
    if (s === 'C') hasC = true;
    else if (s === 'H') hasH = true;
    else rest.push(s);
  }
  if (!hasC && hasH) rest.push('H');
  rest.sort();
  let out = hasC ? hillPart(elements, 'C') + (hasH ? hillPart(elements, 'H') : '') : '';
  for (const s of rest) out += hillPart(elements, s);
  return out;
}

const hillPart = (elements: ElementCounts, s: string) =>
  elements[s] === 1 ? s : `${s}${elements[s]}`;

/**
 * Molar mass from atom counts, g/mol, with IUPAC 2021 abridged standard atomic weights
 * ({@link ATOMIC_WEIGHTS_G_PER_MOL}). The mass of electrons gained or lost by an ion (5.5e-4 g/mol per
 * charge) is ignored, as pharmacopoeias and openchemlib do.
 */
export function molarMassGPerMol(elements: ElementCounts): number {
  let m = 0;
  for (const [el, n] of Object.entries(elements)) {
    const w = ATOMIC_WEIGHTS_G_PER_MOL[el];
    if (w === undefined)
      throw new ChemInputError(
        'formula',
        `element ${el} has no bundled atomic weight`,
        'supported elements',
      );
    m += w * n;
  }
  return m;
}

/** Molar mass of a formula written as text, g/mol. @throws ChemInputError */
export function formulaMolarMassGPerMol(formula: string, field = 'formula'): number {
  return molarMassGPerMol(parseFormula(formula, field).elements);
}

/** Add (n > 0) or remove (n < 0) hydrogen atoms, as protonation and deprotonation do. */
export function withHydrogens(
  elements: ElementCounts,
  n: number,
  field = 'formula',
): ElementCounts {
  const h = (elements.H ?? 0) + n;
  if (h < 0) {
    throw new ChemInputError(
      field,
      `cannot remove ${-n} hydrogen atom(s) from a formula with ${elements.H ?? 0}`,
      'a formula with enough acidic hydrogen atoms for the charge',
    );
  }
  const { H: _dropped, ...rest } = elements;
  return h === 0 ? rest : { ...rest, H: h };
}

/** True when two atom-count maps describe the same formula. */
export function sameElements(a: ElementCounts, b: ElementCounts): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) if ((a[k] ?? 0) !== (b[k] ?? 0)) return false;
  return true;
}

/**
 * The order a chemist writes a small inorganic ion in, for display only: carbon-free oxo-ions as
 * acidic H, then the central atom, then O (HSO4, H2PO4, NO3, ClO4, CO3), hydroxide as OH and
 * ammonium as NH4 — the usual formula order of IUPAC, Nomenclature of Inorganic Chemistry (Red Book,
 * 2005), IR-4.4 (from memory). Formulas with carbon bonded to hydrogen, and anything else, stay in
 * Hill order (the form stored and compared everywhere in the core).
 */
export function conventionalFormula(hill: string): string {
  let elements: ElementCounts;
  try {
    elements = parseFormula(hill).elements;
  } catch {
    return hill;
  }
  const n = (el: string) => {
    const k = elements[el] ?? 0;
    return k === 0 ? '' : k === 1 ? el : `${el}${k}`;
  };
  const others = Object.keys(elements).filter((el) => el !== 'H' && el !== 'O');
  const hasCH = elements.C !== undefined && elements.H !== undefined;
  if (hasCH) return hill;
  if (others.length === 0 && elements.O !== undefined) return `${n('O')}${n('H')}`;
  if (others.length === 1 && elements.O === undefined && others[0] === 'N')
    return `${n('N')}${n('H')}`;
  if (others.length === 1 && elements.O !== undefined) return `${n('H')}${n(others[0]!)}${n('O')}`;
  return hill;
}

/** A formula in display order with its charge as superscript text, e.g. `CH3O3S⁻`, `SO4²⁻`, `Ca²⁺`. */
export function formatIonFormula(hill: string, charge: number): string {
  const shown = conventionalFormula(hill);
  if (charge === 0) return shown;
  const mag = Math.abs(charge);
  const digits =
    mag === 1
      ? ''
      : String(mag)
          .split('')
          .map((d) => SUPERSCRIPT[Number(d)])
          .join('');
  return `${shown}${digits}${charge > 0 ? '⁺' : '⁻'}`;
}
