import {
  estimateSaltThermo,
  type CounterIon,
  type CounterIonDescriptors,
  type LibraryIon,
  type SaltThermoResult,
  type ScreeningCandidate,
  type Stoichiometry,
  type ThermoIon,
} from '@/chem';
import type { CandidateRecord, MeasurementRecord } from '@/persistence/records';
import { ionIdAsWords } from './candidate-label';
import { counterThermoIon, stoichiometryFor } from './candidate-inputs';

/**
 * One shortlisted candidate on its way into the screen: its ion resolved against the library, its
 * salt's thermochemical cycle, and the core's candidate input with its bench data.
 */

/** One candidate's thermochemical cycle (for the energy picture), or why there is none. */
export interface CandidateEnergetics {
  candidateId: string;
  thermo: SaltThermoResult | null;
  reason: string | null;
  cationLabel: string;
  anionLabel: string;
  cationsPerFormula: number;
  anionsPerFormula: number;
}

type SaltStoichiometry = Stoichiometry & { label: string };

/** A candidate the screen can take (its ion and stoichiometry), or why it is listed unscreened. */
export type ResolvedCandidate =
  | { ok: true; ion: LibraryIon; name: string; st: SaltStoichiometry }
  | { ok: false; ion: LibraryIon | null; name: string; reason: string };

/** Resolve a stored candidate: a known ion, of the opposite charge to the drug, in a balanced salt. */
export function resolveCandidate(
  c: CandidateRecord,
  ion: LibraryIon | undefined,
  drugCharge: number,
  compoundKind: string,
): ResolvedCandidate {
  if (!ion)
    return {
      ok: false,
      ion: null,
      name: ionIdAsWords(c.ionId),
      reason: 'not in the counter-ion library (an in-house ion that was deleted?)',
    };
  if ((ion.kind === 'anion') !== drugCharge > 0)
    return {
      ok: false,
      ion,
      name: ion.name,
      reason: `${ion.name} is ${ion.kind === 'anion' ? 'an anion' : 'a cation'}: it cannot make a salt with this ${compoundKind}`,
    };
  try {
    return { ok: true, ion, name: ion.name, st: stoichiometryFor(ion, c, drugCharge) };
  } catch (err) {
    return {
      ok: false,
      ion,
      name: ion.name,
      reason: err instanceof Error ? err.message : String(err),
    };
  }
}

/** The salt's lattice and solution enthalpies (auto method), or null when not finite. */
function saltThermo(
  drugThermo: ThermoIon,
  ion: CounterIon,
  st: SaltStoichiometry,
  drugIsCation: boolean,
): SaltThermoResult | null {
  const x = counterThermoIon(ion, st);
  const thermo = estimateSaltThermo({
    cation: drugIsCation ? drugThermo : x,
    anion: drugIsCation ? x : drugThermo,
    cationsPerFormula: drugIsCation ? st.drugPerSalt : st.counterIonPerSalt,
    anionsPerFormula: drugIsCation ? st.counterIonPerSalt : st.drugPerSalt,
    method: 'auto',
  });
  const finite = [thermo.latticeEnthalpyKJ, thermo.solutionEnthalpyKJ].every(
    (e) => Number.isFinite(e.value) && Number.isFinite(e.uncertainty),
  );
  return finite ? thermo : null;
}

/** One candidate's thermochemical cycle, or the reason there is none. */
export function candidateEnergetics(
  candidateId: string,
  ion: CounterIon,
  st: SaltStoichiometry,
  drugCharge: number,
  drug: { ion: ThermoIon | null; reason: string | null },
): CandidateEnergetics {
  const drugIsCation = drugCharge > 0;
  let thermo: SaltThermoResult | null = null;
  let reason = drug.reason;
  if (drug.ion) {
    try {
      thermo = saltThermo(drug.ion, ion, st, drugIsCation);
      if (!thermo) reason = 'the thermochemistry gave no finite result';
    } catch (err) {
      reason = err instanceof Error ? err.message : String(err);
    }
  }
  return {
    candidateId,
    thermo,
    reason,
    cationLabel: drugIsCation ? 'drug ion' : inSentence(ion.name),
    anionLabel: drugIsCation ? inSentence(ion.name) : 'drug ion',
    cationsPerFormula: drugIsCation ? st.drugPerSalt : st.counterIonPerSalt,
    anionsPerFormula: drugIsCation ? st.counterIonPerSalt : st.drugPerSalt,
  };
}

/** The stored measurements grouped by candidate id. */
export function measurementsByCandidate(
  measurements: readonly MeasurementRecord[],
): Map<string, MeasurementRecord[]> {
  const byCandidate = new Map<string, MeasurementRecord[]>();
  for (const m of measurements) {
    const list = byCandidate.get(m.candidateId) ?? [];
    list.push(m);
    byCandidate.set(m.candidateId, list);
  }
  return byCandidate;
}

/** The core's input for one candidate: ion, stoichiometry, hydrate, bench data and ΔH_sol. */
export function screeningCandidate(
  c: CandidateRecord,
  ion: CounterIon,
  st: SaltStoichiometry,
  descriptors: CounterIonDescriptors | undefined,
  measurements: readonly MeasurementRecord[],
  thermo: SaltThermoResult | null,
): ScreeningCandidate {
  return {
    id: c.id,
    counterIon: ion,
    ...(descriptors ? { counterIonDescriptors: descriptors } : {}),
    stoichiometry: {
      label: st.label,
      drugPerSalt: st.drugPerSalt,
      counterIonPerSalt: st.counterIonPerSalt,
      ionCharge: st.ionCharge,
      ionMolarMassGPerMol: st.ionMolarMassGPerMol,
      pKaIndex: st.pKaIndex,
    },
    hydrateWater: c.hydrateWater,
    measurements: measurements.map((m) => ({
      kind: m.kind,
      value: m.value,
      unit: m.unit,
      ph: m.ph,
      temperatureK: m.temperatureK,
      medium: m.medium,
      text: m.text,
      solidForm: m.solidForm ?? null,
    })),
    solutionEnthalpyKJ: thermo?.solutionEnthalpyKJ ?? null,
  };
}

/** An ion's name inside a sentence: "Chloride" → "chloride"; a name like "L-Arginine" stays as it is. */
export function inSentence(name: string): string {
  return /^[A-Z][a-z]/.test(name) ? name[0]!.toLowerCase() + name.slice(1) : name;
}
