import { ATOMIC_WEIGHT_G_PER_MOL } from '../../../data/thermo-elements';
import { ChemInputError } from '../../../result';

const FORMULA_ACCEPTED = 'a molecular formula such as C2H3O2 or (CH3)4N, elements H, B, C, N, O, F, Si, P, S, Cl, Se, Br, I (and Li–Ba for salts), counts 1–999';

/**
 * Parse a molecular formula into element counts. Accepts nested parentheses/brackets and a trailing charge
 * written `+`, `2-`, `^2-` or `⁺`/`⁻` forms, which is ignored (the charge is given separately).
 * Throws {@link ChemInputError} (field `formula`) on anything else.
 */
export function parseFormula(formula: string): Record<string, number> {
  if (typeof formula !== 'string' || formula.trim() === '') {
    throw new ChemInputError('formula', 'empty formula', FORMULA_ACCEPTED);
  }
  // A written charge is dropped: "SO4 2-", "SO4^2-", "SO4--", "NH4+", "SO₄²⁻". Digits before a sign count as
  // the charge only after a space or "^" ("SO42-" would read as 42 oxygens, so write "SO4 2-").
  let s = formula.trim().replace(/[⁺⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+$/u, '');
  s = s.replace(/(?:\s+|\^)\d*[+-]+$/, '').replace(/[+-]+$/, '').replace(/\s+/g, '');
  if (s.length === 0 || s.length > 200) throw new ChemInputError('formula', `cannot read "${formula}"`, FORMULA_ACCEPTED);
  let i = 0;
  const readCount = (): number => {
    const m = /^\d+/.exec(s.slice(i));
    if (!m) return 1;
    i += m[0].length;
    const n = Number(m[0]);
    if (n < 1 || n > 999) throw new ChemInputError('formula', `count ${n} out of range`, FORMULA_ACCEPTED);
    return n;
  };
  const parseGroup = (closing: string | null): Record<string, number> => {
    const counts: Record<string, number> = {};
    const add = (el: string, n: number) => {
      counts[el] = (counts[el] ?? 0) + n;
    };
    while (i < s.length) {
      const ch = s[i]!;
      if (ch === '(' || ch === '[') {
        i++;
        const inner = parseGroup(ch === '(' ? ')' : ']');
        const n = readCount();
        for (const [el, c] of Object.entries(inner)) add(el, c * n);
      } else if (ch === ')' || ch === ']') {
        if (ch !== closing) throw new ChemInputError('formula', `unbalanced "${ch}" in "${formula}"`, FORMULA_ACCEPTED);
        i++;
        return counts;
      } else {
        const m = /^[A-Z][a-z]?/.exec(s.slice(i));
        if (!m) throw new ChemInputError('formula', `unexpected "${ch}" in "${formula}"`, FORMULA_ACCEPTED);
        let el = m[0];
        // Prefer a known two-letter symbol, else fall back to one letter (e.g. "Co" is not listed, "C" + "o" fails).
        if (el.length === 2 && ATOMIC_WEIGHT_G_PER_MOL[el] === undefined) el = el[0]!;
        if (ATOMIC_WEIGHT_G_PER_MOL[el] === undefined) {
          throw new ChemInputError('formula', `unknown element "${m[0]}" in "${formula}"`, FORMULA_ACCEPTED);
        }
        i += el.length;
        add(el, readCount());
      }
    }
    if (closing) throw new ChemInputError('formula', `missing "${closing}" in "${formula}"`, FORMULA_ACCEPTED);
    return counts;
  };
  const counts = parseGroup(null);
  if (Object.keys(counts).length === 0) throw new ChemInputError('formula', `no atoms in "${formula}"`, FORMULA_ACCEPTED);
  return counts;
}

/** Molar mass from a formula, g/mol (IUPAC 2013 conventional atomic weights). */
export function molarMassGPerMol(formula: string | Record<string, number>): number {
  const counts = typeof formula === 'string' ? parseFormula(formula) : formula;
  let m = 0;
  for (const [el, n] of Object.entries(counts)) m += ATOMIC_WEIGHT_G_PER_MOL[el]! * n;
  return m;
}
