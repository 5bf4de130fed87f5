import {
  drugIon as deriveDrugIon,
  drugThermoIon,
  parseStructure,
  type DrugIon,
  type ParsedStructure,
  type ThermoIon,
} from '@/chem';
import type { ProjectRecord } from '@/persistence/records';

/**
 * What the screen needs of the drug itself, derived from the stored compound: its parsed structure,
 * its ion, and its thermochemistry ion (or why there is none). Each step adds its notes to `notes`.
 */

type Compound = ProjectRecord['compound'];

/**
 * The parsed structure when the compound has a SMILES (openchemlib, loaded lazily); null without one.
 * An unreadable SMILES falls back to the formula with a note, or throws when there is no formula.
 */
export async function readStructure(
  compound: Compound,
  notes: string[],
): Promise<ParsedStructure | null> {
  if (!compound.smiles.trim()) return null;
  try {
    return await parseStructure(compound.smiles);
  } catch (err) {
    if (!compound.formula.trim()) throw err;
    notes.push(
      `The SMILES could not be read (${err instanceof Error ? err.message : String(err)}); the molecular formula is used.`,
    );
    return null;
  }
}

/** The drug ion from the compound (and its structure when parsed), with the core's notes. */
export function drugIonOf(
  compound: Compound,
  structure: ParsedStructure | null,
  notes: string[],
): DrugIon {
  const dIon = deriveDrugIon(compound, structure ?? undefined);
  notes.push(...dIon.notes);
  if (!dIon.ringsKnown)
    notes.push(
      'Ring counts unknown (formula only): the drug ion’s volume estimate ignores ring corrections.',
    );
  return dIon;
}

/** The drug ion's thermochemistry ion, or the reason it cannot be built (then no salt gets a cycle). */
export function drugThermoOf(dIon: DrugIon): { ion: ThermoIon | null; reason: string | null } {
  try {
    return {
      ion: drugThermoIon({ formula: dIon.formula, charge: dIon.charge, rings: dIon.rings }),
      reason: null,
    };
  } catch (err) {
    return { ion: null, reason: err instanceof Error ? err.message : String(err) };
  }
}
