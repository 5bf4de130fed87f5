import type * as OpenChemLib from 'openchemlib';
import { ChemInputError } from '../result';

/**
 * The one structure check for every SMILES that enters Saltsmith (command-line flags, --input files,
 * batch rows, eval requests, project files, the app's fields). openchemlib's SMILES parser is lenient:
 * it stops at the first space (`CCN garbage` reads as CCN), ignores an unclosed branch (`CCN(`), an
 * unclosed bracket (`CCN[`) or a lone `%`, and accepts five bonds on a carbon. A truncated or garbled
 * structure would then be screened as a different molecule. So a SMILES is accepted only when
 * 1. its text is whole: no white space inside, every `(` closed, every `[` closed, `%` followed by two
 *    digits (OpenSMILES ring-bond numbers), one component (no `.`);
 * 2. openchemlib reads it without error;
 * 3. every atom written in the text is in the molecule read (atoms counted in the text: organic-subset
 *    symbols, `*` and bracket atoms; a plain `[H]` may be folded into its neighbour), so nothing was
 *    skipped;
 * 4. no atom exceeds its valence (openchemlib's own valence rules, Molecule.validate).
 * openchemlib is passed in (the core never imports it statically; callers load it with `await import`).
 */

export type Ocl = typeof OpenChemLib;
export type OclMolecule = InstanceType<Ocl['Molecule']>;

export const SMILES_ACCEPTED =
  'a complete SMILES (OpenSMILES) of one component, e.g. CCN(CC)CC: every "(" and "[" closed, no spaces';

const MAX_SMILES_CHARS = 2000;

const shown = (s: string) => `"${s.length > 60 ? `${s.slice(0, 60)}…` : s}"`;

/** One message for a SMILES with several components, the same in every command and in the app. */
export function severalComponentsError(field: string, smiles: string): ChemInputError {
  return new ChemInputError(
    field,
    `${shown(smiles)} has several components (a salt or a mixture, joined by "."); Saltsmith screens one component`,
    'the SMILES of one component: the neutral free form of the drug, or one ion',
  );
}

/** Two-letter organic-subset symbols outside brackets (OpenSMILES). */
const TWO_LETTER = new Set(['Cl', 'Br']);
const ONE_LETTER = new Set([
  'B',
  'C',
  'N',
  'O',
  'P',
  'S',
  'F',
  'I',
  'b',
  'c',
  'n',
  'o',
  's',
  'p',
  '*',
]);

/**
 * The text checks (step 1) and the atoms the text writes: `atoms` in all, `plainHydrogens` of them
 * `[H]`-type bracket atoms that a parser may fold into their neighbour.
 */
export function checkSmilesText(
  smiles: string,
  field: string,
  opts: { allowComponents?: (part: string) => boolean } = {},
): { atoms: number; plainHydrogens: number } {
  const cut = (why: string) =>
    new ChemInputError(field, `${shown(smiles)} is not a complete SMILES: ${why}`, SMILES_ACCEPTED);
  if (smiles.trim() === '') throw new ChemInputError(field, 'the SMILES is empty', SMILES_ACCEPTED);
  if (smiles.length > MAX_SMILES_CHARS)
    throw new ChemInputError(
      field,
      `the SMILES is longer than ${MAX_SMILES_CHARS} characters`,
      SMILES_ACCEPTED,
    );
  if (/\s/.test(smiles)) throw cut('it contains a space (a SMILES ends at the first space)');
  if (smiles.includes('.')) {
    const parts = smiles.split('.');
    const extra = parts.filter((p) => !(opts.allowComponents?.(p) ?? false));
    if (parts.some((p) => p === '') || extra.length !== 1)
      throw severalComponentsError(field, smiles);
  }
  let atoms = 0;
  let plainHydrogens = 0;
  let open = 0;
  for (let i = 0; i < smiles.length; i++) {
    const c = smiles[i]!;
    if (c === '[') {
      const end = smiles.indexOf(']', i + 1);
      const nextOpen = smiles.indexOf('[', i + 1);
      if (end < 0 || (nextOpen >= 0 && nextOpen < end))
        throw cut(`"[" at character ${i + 1} is not closed`);
      const inside = smiles.slice(i + 1, end);
      if (!/[A-Za-z*]/.test(inside)) throw cut(`"[${inside}]" names no atom`);
      atoms++;
      if (/^H[+-]?\d*$/.test(inside) || inside === 'H') plainHydrogens++;
      i = end;
    } else if (c === '(') open++;
    else if (c === ')') {
      if (open === 0) throw cut(`")" at character ${i + 1} closes no branch`);
      open--;
    } else if (c === '%') {
      if (!/^[0-9]{2}$/.test(smiles.slice(i + 1, i + 3)))
        throw cut(`"%" at character ${i + 1} is not followed by a two-digit ring-bond number`);
      i += 2;
    } else if (TWO_LETTER.has(smiles.slice(i, i + 2))) {
      atoms++;
      i++;
    } else if (ONE_LETTER.has(c)) atoms++;
  }
  if (open > 0) throw cut(`${open} "(" not closed (the text looks cut off)`);
  return { atoms, plainHydrogens };
}

/**
 * Read a SMILES with openchemlib under the whole check (steps 1–4); returns the molecule.
 * `allowComponents` lets a caller accept named extra parts (a hydroxide beside a quaternary cation).
 * @throws ChemInputError naming `field`.
 */
export function readSmilesStrictly(
  ocl: Ocl,
  smiles: string,
  field: string,
  opts: { allowComponents?: (part: string) => boolean } = {},
): OclMolecule {
  const text = typeof smiles === 'string' ? smiles.trim() : '';
  const written = checkSmilesText(text, field, opts);
  let mol: OclMolecule;
  try {
    mol = ocl.Molecule.fromSmiles(text);
  } catch (err) {
    const raw = err instanceof Error ? err.message : String(err);
    const reason = raw.replace(/^.*SmilesParser:\s*/i, '').trim() || 'not a valid SMILES';
    throw new ChemInputError(field, `cannot read this SMILES (${reason})`, SMILES_ACCEPTED);
  }
  const read = mol.getAllAtoms();
  if (read === 0) throw new ChemInputError(field, 'no atoms found', SMILES_ACCEPTED);
  if (read > written.atoms || read < written.atoms - written.plainHydrogens) {
    throw new ChemInputError(
      field,
      `${shown(text)} was not read completely (${written.atoms} atoms written, ${read} read)`,
      SMILES_ACCEPTED,
    );
  }
  if (!opts.allowComponents && mol.getFragments().length > 1)
    throw severalComponentsError(field, text);
  try {
    mol.validate();
  } catch (err) {
    const raw = err instanceof Error ? err.message : String(err);
    // validate() also reports a net charge ("unbalanced atom charge"), which ions legitimately carry.
    if (/valence/i.test(raw)) {
      throw new ChemInputError(
        field,
        `${shown(text)} gives an atom more bonds than its valence allows`,
        SMILES_ACCEPTED,
      );
    }
  }
  return mol;
}
