import {
  COUNTER_IONS,
  drugIon as deriveDrugIon,
  drugThermoIon,
  estimateSaltThermo,
  mergeLibrary,
  parseStructure,
  screenCompound,
  type CounterIon,
  type LibraryIon,
  type Stoichiometry,
  type DrugIon,
  type ParsedStructure,
  type SaltThermoResult,
  type ScreenResult,
  type ScreeningCandidate,
  type ScreeningSettings,
  type ThermoIon,
} from '@/chem';
import type {
  CandidateRecord,
  CustomIonRecord,
  MeasurementRecord,
  ProjectRecord,
} from '@/persistence/records';
import { ionIdAsWords } from './candidate-label';
import { counterThermoIon, inHouseIonDescriptors, stoichiometryFor } from './candidate-inputs';
import { screeningSettingsOf } from './screening-settings';

/** What the screening of a project starts from: the stored records, nothing else. */
export interface ScreeningInputs {
  project: ProjectRecord;
  candidates: readonly CandidateRecord[];
  measurements: readonly MeasurementRecord[];
  customIons: readonly CustomIonRecord[];
}

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

/**
 * Screen a project: parse the structure (openchemlib, loaded lazily) when a SMILES is given, derive
 * the drug ion, resolve the shortlist against the library (bundled + in-house + per-project edits),
 * estimate each salt's thermochemical cycle, then run the core's `screenCompound`. Throws the core's
 * ChemInputError when the compound cannot be screened (its message names the field).
 */
export async function computeProjectScreening(inputs: ScreeningInputs): Promise<ProjectScreening> {
  const { project, candidates, measurements, customIons } = inputs;
  const compound = project.compound;
  const notes: string[] = [];
  let structure: ParsedStructure | null = null;
  if (compound.smiles.trim()) {
    try {
      structure = await parseStructure(compound.smiles);
    } catch (err) {
      if (!compound.formula.trim()) throw err;
      notes.push(
        `The SMILES could not be read (${err instanceof Error ? err.message : String(err)}); the molecular formula is used.`,
      );
    }
  }
  const dIon = deriveDrugIon(compound, structure ?? undefined);
  notes.push(...dIon.notes);
  if (!dIon.ringsKnown)
    notes.push(
      'Ring counts unknown (formula only): the drug ion’s volume estimate ignores ring corrections.',
    );

  const settings = screeningSettingsOf(project);
  const library = mergeLibrary(COUNTER_IONS, customIons, project.id).ions;
  const byId = new Map(library.map((i) => [i.id, i]));
  const inHouseDescriptors = await inHouseIonDescriptors(
    candidates.map((c) => byId.get(c.ionId)).filter((i): i is LibraryIon => i !== undefined),
    notes,
  );
  let drugThermo: ThermoIon | null = null;
  let drugThermoReason: string | null = null;
  try {
    drugThermo = drugThermoIon({ formula: dIon.formula, charge: dIon.charge, rings: dIon.rings });
  } catch (err) {
    drugThermoReason = err instanceof Error ? err.message : String(err);
  }

  const byCandidate = new Map<string, MeasurementRecord[]>();
  for (const m of measurements) {
    const list = byCandidate.get(m.candidateId) ?? [];
    list.push(m);
    byCandidate.set(m.candidateId, list);
  }

  const energetics: Record<string, CandidateEnergetics> = {};
  const ionNames: Record<string, string> = {};
  const counterIons: Record<string, CounterIon> = {};
  const missing: ProjectScreening['missing'] = [];
  const screening: ScreeningCandidate[] = [];
  const drugIsCation = dIon.charge > 0;
  for (const c of candidates) {
    const ion = byId.get(c.ionId);
    if (!ion) {
      missing.push({
        candidateId: c.id,
        ionId: c.ionId,
        reason: 'not in the counter-ion library (an in-house ion that was deleted?)',
      });
      ionNames[c.id] = ionIdAsWords(c.ionId);
      continue;
    }
    ionNames[c.id] = ion.name;
    counterIons[c.id] = ion;
    if ((ion.kind === 'anion') !== drugIsCation) {
      missing.push({
        candidateId: c.id,
        ionId: c.ionId,
        reason: `${ion.name} is ${ion.kind === 'anion' ? 'an anion' : 'a cation'}: it cannot make a salt with this ${compound.kind}`,
      });
      continue;
    }
    let st: Stoichiometry & { label: string };
    try {
      st = stoichiometryFor(ion, c, dIon.charge);
    } catch (err) {
      missing.push({
        candidateId: c.id,
        ionId: c.ionId,
        reason: err instanceof Error ? err.message : String(err),
      });
      continue;
    }
    const p = drugIsCation ? st.drugPerSalt : st.counterIonPerSalt;
    const q = drugIsCation ? st.counterIonPerSalt : st.drugPerSalt;
    let thermo: SaltThermoResult | null = null;
    let reason: string | null = drugThermoReason;
    const xLabel = ion.name;
    if (drugThermo) {
      try {
        const x = counterThermoIon(ion, st);
        thermo = estimateSaltThermo({
          cation: drugIsCation ? drugThermo : x,
          anion: drugIsCation ? x : drugThermo,
          cationsPerFormula: p,
          anionsPerFormula: q,
          method: 'auto',
        });
        if (
          ![thermo.latticeEnthalpyKJ, thermo.solutionEnthalpyKJ].every(
            (e) => Number.isFinite(e.value) && Number.isFinite(e.uncertainty),
          )
        ) {
          thermo = null;
          reason = 'the thermochemistry gave no finite result';
        }
      } catch (err) {
        reason = err instanceof Error ? err.message : String(err);
      }
    }
    energetics[c.id] = {
      candidateId: c.id,
      thermo,
      reason,
      cationLabel: drugIsCation ? 'drug ion' : xLabel,
      anionLabel: drugIsCation ? xLabel : 'drug ion',
      cationsPerFormula: p,
      anionsPerFormula: q,
    };
    screening.push({
      id: c.id,
      counterIon: ion,
      ...(inHouseDescriptors[ion.id] ? { counterIonDescriptors: inHouseDescriptors[ion.id] } : {}),
      stoichiometry: {
        label: st.label,
        drugPerSalt: st.drugPerSalt,
        counterIonPerSalt: st.counterIonPerSalt,
        ionCharge: st.ionCharge,
        ionMolarMassGPerMol: st.ionMolarMassGPerMol,
        pKaIndex: st.pKaIndex,
      },
      hydrateWater: c.hydrateWater,
      measurements: (byCandidate.get(c.id) ?? []).map((m) => ({
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
    });
  }

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
