import {
  ChemInputError,
  getCounterIon,
  parseStructure,
  saltStoichiometryFromCharges,
} from '@/chem';
import { ProjectFileError } from './errors';
import type { ProjectFile } from './schema';

/**
 * The rules of the forms that a field-by-field schema cannot say, applied to every project file
 * after its schema: the same counter-ion is shortlisted once; a salt's stoichiometry is one the
 * counter-ion lists, or the smallest charge-balanced formula for the drug ion (the two ways the app
 * makes a candidate), so a chloride 2:1 or a mesylate 4:4 is refused; and no text carries the
 * Unicode bidirectional controls (U+202A–U+202E, U+2066–U+2069, "Trojan Source", Boucher & Anderson
 * 2021), which can make a name read differently from what it is — such a file is refused, not
 * silently changed.
 */

const BIDI_CONTROLS = /[\u202A-\u202E\u2066-\u2069]/;

/** The path of the first string (key or value) carrying a bidirectional control, or null. */
export function bidiControlPath(value: unknown, path: string[] = [], depth = 0): string | null {
  if (typeof value === 'string')
    return BIDI_CONTROLS.test(value) ? path.join('.') || '(file)' : null;
  if (depth > 64 || typeof value !== 'object' || value === null) return null;
  for (const [key, v] of Object.entries(value)) {
    if (BIDI_CONTROLS.test(key)) return [...path, key].join('.');
    const found = bidiControlPath(v, [...path, key], depth + 1);
    if (found) return found;
  }
  return null;
}

type Ratio = { drugPerSalt: number; counterIonPerSalt: number };
const sameRatio = (a: Ratio, b: Ratio) =>
  a.drugPerSalt === b.drugPerSalt && a.counterIonPerSalt === b.counterIonPerSalt;

/** The stoichiometries a candidate of `ionId` may have, given the file's own ions; null if unknown. */
function allowedRatios(file: ProjectFile, ionId: string): Ratio[] | null {
  const own = file.customIons.find((i) => i.id === ionId && i.overridesIonId === null);
  const ion = own
    ? (own.ion as { charge?: number; stoichiometries?: Ratio[] })
    : getCounterIon(ionId);
  if (!ion) return null;
  const listed = Array.isArray(ion.stoichiometries) ? ion.stoichiometries : [];
  const charge = typeof ion.charge === 'number' ? ion.charge : 0;
  const drugCharge = file.project.compound.ionCharge;
  const balanced =
    charge !== 0 && drugCharge !== 0 ? [saltStoichiometryFromCharges(drugCharge, charge)] : [];
  return [...listed, ...balanced];
}

/** Apply the rules; throws a {@link ProjectFileError} naming every field that breaks one. */
export function checkFileRules(raw: unknown, file: ProjectFile): void {
  const problems: string[] = [];
  const bidi = bidiControlPath(raw);
  if (bidi) {
    problems.push(
      `${bidi}: contains a hidden text-direction control character (U+202A–U+202E or U+2066–U+2069)`,
    );
  }
  const seen = new Map<string, number>();
  file.candidates.forEach((c, i) => {
    const first = seen.get(c.ionId);
    if (first !== undefined) {
      problems.push(
        `candidates.${i}.ionId: "${c.ionId}" is already shortlisted (candidates.${first})`,
      );
    } else seen.set(c.ionId, i);
    const ratios = allowedRatios(file, c.ionId);
    if (ratios === null) {
      problems.push(
        `candidates.${i}.ionId: "${c.ionId}" is neither a bundled counter-ion nor one of the file's in-house ions`,
      );
    } else if (!ratios.some((r) => sameRatio(r, c))) {
      const words = ratios.map((r) => `${r.drugPerSalt}:${r.counterIonPerSalt}`);
      problems.push(
        `candidates.${i}: ${c.drugPerSalt}:${c.counterIonPerSalt} is not a salt form of "${c.ionId}" (accepted: ${[...new Set(words)].join(', ')})`,
      );
    }
  });
  if (problems.length) {
    throw new ProjectFileError(
      'invalid',
      `This project file does not pass validation: ${problems.slice(0, 3).join('; ')}${problems.length > 3 ? ' …' : ''}`,
      problems.slice(0, 20),
    );
  }
}

/**
 * The one structure check on the file's compound SMILES (openchemlib, loaded on demand): a SMILES it
 * cannot read completely, or with several components (`C1CC((((`, `CCN.Cl`), is refused with the
 * field named. Throws {@link ProjectFileError}.
 */
export async function checkFileStructures(file: ProjectFile): Promise<void> {
  const smiles = file.project.compound.smiles.trim();
  if (smiles === '') return;
  const field = 'project.compound.smiles';
  try {
    await parseStructure(smiles, { field });
  } catch (err) {
    if (!(err instanceof ChemInputError)) throw err;
    throw new ProjectFileError(
      'invalid',
      `This project file does not pass validation: ${field}: ${err.message}`,
      [`${field}: ${err.message}`],
    );
  }
}
