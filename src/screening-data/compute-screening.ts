import {
  COUNTER_IONS,
  mergeLibrary,
  screenCompound,
  type CounterIon,
  type DrugIon,
  type LibraryIon,
  type ParsedStructure,
  type ScreenResult,
  type ScreeningCandidate,
  type ScreeningSettings,
} from '@/chem';
import type {
  CandidateRecord,
  CustomIonRecord,
  MeasurementRecord,
  ProjectRecord,
} from '@/persistence/records';
import { inHouseIonDescriptors } from './candidate-inputs';
import {
  candidateEnergetics,
  measurementsByCandidate,
  resolveCandidate,
  screeningCandidate,
  type CandidateEnergetics,
} from './candidate-screening';
import { drugIonOf, drugThermoOf, readStructure } from './drug-inputs';
import { screeningSettingsOf } from './screening-settings';

/** What the screening of a project starts from: the stored records, nothing else. */
export interface ScreeningInputs {
  project: ProjectRecord;
  candidates: readonly CandidateRecord[];
  measurements: readonly MeasurementRecord[];
  customIons: readonly CustomIonRecord[];
}

export type { CandidateEnergetics } from './candidate-screening';

/** The screen of one project: the core's result plus what the app needs to show it. */
export interface ProjectScreening {
  screen: ScreenResult;
  settings: ScreeningSettings;
  drugIon: DrugIon;
  /** The parsed structure when the compound has a SMILES (openchemlib, loaded on demand). */
  structure: ParsedStructure | null;
  /** Per candidate id: the salt's thermochemical cycle. */
  energetics: Record<string, CandidateEnergetics>;
  /** Per candidate id: the counter-ion's display name. */
  ionNames: Record<string, string>;
  /** Per candidate id: the library entry used. */
  counterIons: Record<string, CounterIon>;
  /** Shortlisted ions the library does not know (deleted in-house ions): listed, not screened. */
  missing: { candidateId: string; ionId: string; reason: string }[];
  /** Notes about the inputs (formula vs structure, fallbacks). */
  notes: string[];
}

/** The shortlist resolved for the screen: the core's inputs and what the app shows beside them. */
type PreparedShortlist = Pick<
  ProjectScreening,
  'energetics' | 'ionNames' | 'counterIons' | 'missing'
> & { screening: ScreeningCandidate[] };

/**
 * Resolve every shortlisted candidate against the library, estimate its salt's thermochemical
 * cycle and build the core's input; candidates that cannot be screened are listed with the reason.
 */
async function prepareShortlist(
  inputs: ScreeningInputs,
  dIon: DrugIon,
  notes: string[],
): Promise<PreparedShortlist> {
  const { project, candidates, measurements, customIons } = inputs;
  const library = mergeLibrary(COUNTER_IONS, customIons, project.id).ions;
  const byId = new Map(library.map((i) => [i.id, i]));
  const inHouseDescriptors = await inHouseIonDescriptors(
    candidates.map((c) => byId.get(c.ionId)).filter((i): i is LibraryIon => i !== undefined),
    notes,
  );
  const drugThermo = drugThermoOf(dIon);
  const byCandidate = measurementsByCandidate(measurements);
  const out: PreparedShortlist = {
    energetics: {},
    ionNames: {},
    counterIons: {},
    missing: [],
    screening: [],
  };
  for (const c of candidates) {
    const r = resolveCandidate(c, byId.get(c.ionId), dIon.charge, project.compound.kind);
    out.ionNames[c.id] = r.name;
    if (r.ion) out.counterIons[c.id] = r.ion;
    if (!r.ok) {
      out.missing.push({ candidateId: c.id, ionId: c.ionId, reason: r.reason });
      continue;
    }
    const energetics = candidateEnergetics(c.id, r.ion, r.st, dIon.charge, drugThermo);
    out.energetics[c.id] = energetics;
    out.screening.push(
      screeningCandidate(
        c,
        r.ion,
        r.st,
        inHouseDescriptors[r.ion.id],
        byCandidate.get(c.id) ?? [],
        energetics.thermo,
      ),
    );
  }
  return out;
}

/**
 * Screen a project: parse the structure (openchemlib, loaded lazily) when a SMILES is given, derive
 * the drug ion, resolve the shortlist against the library (bundled + in-house + per-project edits),
 * estimate each salt's thermochemical cycle, then run the core's `screenCompound`. Throws the core's
 * ChemInputError when the compound cannot be screened (its message names the field).
 */
export async function computeProjectScreening(inputs: ScreeningInputs): Promise<ProjectScreening> {
  const { project } = inputs;
  const compound = project.compound;
  const notes: string[] = [];
  const structure = await readStructure(compound, notes);
  const dIon = drugIonOf(compound, structure, notes);
  const settings = screeningSettingsOf(project);
  const { screening, energetics, ionNames, counterIons, missing } = await prepareShortlist(
    inputs,
    dIon,
    notes,
  );

  const screen = screenCompound({
    compound,
    drugIon: {
      molarMassGPerMol: dIon.molarMassGPerMol,
      freeFormMolarMassGPerMol: dIon.freeFormMolarMassGPerMol,
    },
    candidates: screening,
    settings,
  });
  return {
    screen,
    settings,
    drugIon: dIon,
    structure,
    energetics,
    ionNames,
    counterIons,
    missing,
    notes,
  };
}

/**
 * The part of the inputs the physics depends on, as a string: weights are left out, so moving a
 * weight slider never re-runs the screen (the ranking re-weights the stored rows instead).
 */
export function screeningInputsKey(inputs: ScreeningInputs): string {
  const settings = screeningSettingsOf(inputs.project);
  const { weights: _w, ...physics } = settings;
  return JSON.stringify([
    inputs.project.id,
    inputs.project.compound,
    physics,
    inputs.candidates.map((c) => [
      c.id,
      c.ionId,
      c.drugPerSalt,
      c.counterIonPerSalt,
      c.hydrateWater,
      c.order,
    ]),
    inputs.measurements.map((m) => [
      m.id,
      m.candidateId,
      m.kind,
      m.value,
      m.unit,
      m.ph,
      m.temperatureK,
      m.medium,
      m.text,
      m.solidForm ?? null,
    ]),
    inputs.customIons.map((i) => [i.id, i.updatedAt, i.projectId]),
  ]);
}
