import {
  counterIonDescriptorsFromSmiles,
  getThermoIon,
  neutralParentSmiles,
  organicIonFromFormula,
  saltStoichiometryFromCharges,
  type CounterIon,
  type CounterIonDescriptors,
  type LibraryIon,
  type Stoichiometry,
  type ThermoIon,
} from '@/chem';
import type { CandidateRecord } from '@/persistence/records';

/**
 * What the screen needs of each shortlisted counter-ion, derived from the stored records: its salt
 * stoichiometry, its thermochemistry ion, and (for in-house ions) its descriptors.
 */

/** Pick the library stoichiometry matching the stored candidate, or balance charges on the first usable one. */
export function stoichiometryFor(
  ion: CounterIon,
  c: CandidateRecord,
  drugCharge: number,
): Stoichiometry & { label: string } {
  const exact = ion.stoichiometries.find(
    (s) =>
      s.drugPerSalt === c.drugPerSalt &&
      s.counterIonPerSalt === c.counterIonPerSalt &&
      c.drugPerSalt * Math.abs(drugCharge) === c.counterIonPerSalt * Math.abs(s.ionCharge),
  );
  if (exact) return exact;
  const balanced = ion.stoichiometries.find(
    (s) => c.drugPerSalt * Math.abs(drugCharge) === c.counterIonPerSalt * Math.abs(s.ionCharge),
  );
  if (balanced)
    return {
      ...balanced,
      label: `(${c.drugPerSalt}:${c.counterIonPerSalt})`,
      drugPerSalt: c.drugPerSalt,
      counterIonPerSalt: c.counterIonPerSalt,
    };
  const first = ion.stoichiometries[0];
  if (!first) throw new Error(`${ion.name} has no stoichiometry in the library`);
  const { drugPerSalt: m, counterIonPerSalt: n } = saltStoichiometryFromCharges(
    drugCharge,
    first.ionCharge,
  );
  return { ...first, drugPerSalt: m, counterIonPerSalt: n, label: `(${m}:${n})` };
}

export function counterThermoIon(ion: CounterIon, st: Stoichiometry): ThermoIon {
  const bundled = getThermoIon(ion.thermoId ?? ion.id);
  if (bundled && bundled.charge === st.ionCharge) return bundled;
  return organicIonFromFormula(st.ionFormula || ion.formula, st.ionCharge, ion.rings, {
    label: ion.name,
  });
}

/**
 * Descriptors of the shortlisted in-house ions for the salt-solubility model, read from the ion's
 * SMILES (neutralised to its parent) with openchemlib, loaded only when such an ion is shortlisted.
 * Bundled ions need none (the core ships theirs); an in-house ion without a SMILES keeps the
 * common-practice anchor, and a note says so.
 */
export async function inHouseIonDescriptors(
  ions: readonly LibraryIon[],
  notes: string[],
): Promise<Record<string, CounterIonDescriptors>> {
  const mine = ions.filter((i) => i.origin === 'in-house');
  if (mine.length === 0) return {};
  const out: Record<string, CounterIonDescriptors> = {};
  const withSmiles = mine.filter((i) => i.ionSmiles.trim() !== '');
  for (const i of mine)
    if (!withSmiles.includes(i))
      notes.push(
        `${i.name}: no SMILES, so its salt solubility rests on the anchor on S₀ (see the assumptions), not the model.`,
      );
  if (withSmiles.length === 0) return out;
  const ocl = await import('openchemlib');
  for (const i of withSmiles) {
    try {
      out[i.id] = counterIonDescriptorsFromSmiles(ocl, neutralParentSmiles(ocl, i.ionSmiles));
    } catch {
      notes.push(
        `${i.name}: its SMILES could not be read for descriptors; its salt solubility rests on the anchor.`,
      );
    }
  }
  return out;
}
