import { compoundSchema, type Compound } from '@/chem';
import { getCounterIon } from '@/chem';
import { getDb } from './db';
import { newId, nowIso } from './ids';
import { DEMO_COMPOUND, DEMO_PROJECT_NAME, DEMO_SHORTLIST } from './demo-project';
import {
  RECORD_SCHEMA_VERSION,
  candidateRecordSchema,
  projectRecordSchema,
  projectSettingsSchema,
  type CandidateRecord,
  type CustomIonRecord,
  type MeasurementRecord,
  type ProjectRecord,
  type ProjectSettings,
} from './records';
import { saltStoichiometry } from './candidates-repo';
import { replayUnsavedEdits, trackWrite } from './unsaved-edits';

/** Everything that belongs to one project: what a delete removes and an undo puts back. */
export interface ProjectBundle {
  project: ProjectRecord;
  candidates: CandidateRecord[];
  measurements: MeasurementRecord[];
  customIons: CustomIonRecord[];
}

/**
 * Charge of a demo counter-ion in its first listed salt form (the library's usual one: hydrochloride,
 * hemisulfate, hydrogen maleate…), so that the demo shortlist is charge-balanced for the drug ion.
 */
function demoIonCharge(ionId: string): number {
  const ion = getCounterIon(ionId);
  return ion?.stoichiometries[0]?.ionCharge ?? ion?.charge ?? -1;
}

function demoCandidates(projectId: string): CandidateRecord[] {
  const now = nowIso();
  return DEMO_SHORTLIST.map((ionId, order) =>
    candidateRecordSchema.parse({
      id: newId('cand'),
      schemaVersion: RECORD_SCHEMA_VERSION,
      projectId,
      ionId,
      ...saltStoichiometry(DEMO_COMPOUND.ionCharge, demoIonCharge(ionId)),
      hydrateWater: 0,
      addedAt: now,
      order,
    }),
  );
}

/** Settings key that records the demo project was created once (so deleting it is respected). */
const DEMO_SEEDED_KEY = 'demoSeeded';

function build(name: string, compound: Compound, isDemo = false): ProjectRecord {
  const now = nowIso();
  return projectRecordSchema.parse({
    id: newId('prj'),
    schemaVersion: RECORD_SCHEMA_VERSION,
    name,
    createdAt: now,
    updatedAt: now,
    archived: false,
    isDemo,
    compound: compoundSchema.parse(compound),
    settings: projectSettingsSchema.parse({}),
  });
}

/** Lay `changes` over the stored compound, validate, write: one transaction (see patchCompound). */
async function writeCompoundChanges(id: string, changes: Partial<Compound>): Promise<Compound> {
  const db = getDb();
  return db.transaction('rw', db.projects, async () => {
    const current = await db.projects.get(id);
    if (!current) throw new Error(`No project with id ${id}`);
    const valid = compoundSchema.parse({ ...current.compound, ...changes });
    await db.projects.update(id, { compound: valid, updatedAt: nowIso() });
    return valid;
  });
}

/** Replace one extra settings block, leaving the other settings as stored: one transaction. */
async function writeExtraSettings(id: string, key: string, value: unknown): Promise<void> {
  const db = getDb();
  await db.transaction('rw', db.projects, async () => {
    const current = await db.projects.get(id);
    if (!current) throw new Error(`No project with id ${id}`);
    const settings = projectSettingsSchema.parse({
      ...current.settings,
      extra: { ...current.settings.extra, [key]: value },
    });
    await db.projects.update(id, { settings, updatedAt: nowIso() });
  });
}

/** Projects of the workbench. Only this module and its siblings in src/persistence call Dexie. */
export const projectsRepo = {
  list: async (includeArchived = false): Promise<ProjectRecord[]> => {
    const all = await getDb().projects.orderBy('updatedAt').reverse().toArray();
    return includeArchived ? all : all.filter((p) => !p.archived);
  },

  get: (id: string): Promise<ProjectRecord | undefined> => getDb().projects.get(id),

  create: async (name: string, compound: Compound): Promise<ProjectRecord> => {
    const record = build(name, compound);
    await getDb().projects.add(record);
    return record;
  },

  /**
   * Store the compound fields that changed, and only those: inside one transaction the stored compound
   * is read, the given fields are laid over it and the result is validated before it is written. A
   * second tab's stale copy of another field is therefore never written back (README, "Two tabs").
   * An invalid result throws and nothing is stored.
   */
  patchCompound: (id: string, changes: Partial<Compound>): Promise<Compound> =>
    trackWrite({ kind: 'compound', projectId: id, changes }, () =>
      writeCompoundChanges(id, changes),
    ),

  /** Store a whole compound definition (every field written; see {@link projectsRepo.patchCompound}). */
  updateCompound: async (id: string, compound: Compound): Promise<void> => {
    await projectsRepo.patchCompound(id, compound);
  },

  /**
   * Store the settings fields that are given (field-level, like {@link projectsRepo.patchCompound});
   * `extra` blocks are merged key by key, so a write of one block leaves the others as stored.
   */
  updateSettings: async (id: string, settings: Partial<ProjectSettings>): Promise<void> => {
    const db = getDb();
    await db.transaction('rw', db.projects, async () => {
      const current = await db.projects.get(id);
      if (!current) throw new Error(`No project with id ${id}`);
      const valid = projectSettingsSchema.parse({
        ...current.settings,
        ...settings,
        extra: { ...current.settings.extra, ...settings.extra },
      });
      await db.projects.update(id, { settings: valid, updatedAt: nowIso() });
    });
  },

  rename: async (id: string, name: string): Promise<void> => {
    const trimmed = name.trim();
    if (!trimmed) throw new Error('A project needs a name');
    await getDb().projects.update(id, { name: trimmed.slice(0, 120), updatedAt: nowIso() });
  },

  setArchived: async (id: string, archived: boolean): Promise<void> => {
    await getDb().projects.update(id, { archived, updatedAt: nowIso() });
  },

  /** Delete a project and everything that belongs to it, in one transaction. */
  remove: async (id: string): Promise<void> => {
    const db = getDb();
    await db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons],
      async () => {
        await db.candidates.where('projectId').equals(id).delete();
        await db.measurements.where('projectId').equals(id).delete();
        await db.customIons.where('projectId').equals(id).delete();
        await db.projects.delete(id);
      },
    );
  },

  /**
   * Create the fictional demo project on the very first start. Returns its id, or null when it was
   * created before (and perhaps deleted by the user since).
   */
  ensureDemo: async (): Promise<string | null> => {
    const db = getDb();
    return db.transaction('rw', [db.projects, db.settings, db.candidates], async () => {
      const seeded = await db.settings.get(DEMO_SEEDED_KEY);
      if (seeded) return null;
      const record = build(DEMO_PROJECT_NAME, DEMO_COMPOUND, true);
      await db.projects.add(record);
      await db.candidates.bulkAdd(demoCandidates(record.id));
      await db.settings.put({ key: DEMO_SEEDED_KEY, value: true });
      return record.id;
    });
  },

  /** Put back a fresh demo project with its shortlist (the old demo, if any, is replaced). */
  resetDemo: async (): Promise<string> => {
    const db = getDb();
    return db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons, db.settings],
      async () => {
        const old = await db.projects.filter((p) => p.isDemo).toArray();
        for (const p of old) await projectsRepo.remove(p.id);
        const record = build(DEMO_PROJECT_NAME, DEMO_COMPOUND, true);
        await db.projects.add(record);
        await db.candidates.bulkAdd(demoCandidates(record.id));
        await db.settings.put({ key: DEMO_SEEDED_KEY, value: true });
        return record.id;
      },
    );
  },

  /** Everything stored for one project (undefined when there is no such project). */
  bundle: async (id: string): Promise<ProjectBundle | undefined> => {
    const db = getDb();
    return db.transaction(
      'r',
      [db.projects, db.candidates, db.measurements, db.customIons],
      async () => {
        const project = await db.projects.get(id);
        if (!project) return undefined;
        return {
          project,
          candidates: await db.candidates.where('projectId').equals(id).toArray(),
          measurements: await db.measurements.where('projectId').equals(id).toArray(),
          customIons: await db.customIons.where('projectId').equals(id).toArray(),
        };
      },
    );
  },

  /** Delete a project and return what was deleted, so that the caller can offer an undo. */
  removeWithUndo: async (id: string): Promise<ProjectBundle | undefined> => {
    const db = getDb();
    return db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons],
      async () => {
        const bundle = await projectsRepo.bundle(id);
        if (bundle) await projectsRepo.remove(id);
        return bundle;
      },
    );
  },

  /** Put a deleted project back exactly as it was (the undo of {@link projectsRepo.removeWithUndo}). */
  restore: async (bundle: ProjectBundle): Promise<void> => {
    const db = getDb();
    await db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons],
      async () => {
        await db.projects.put(projectRecordSchema.parse(bundle.project));
        await db.candidates.bulkPut(bundle.candidates);
        await db.measurements.bulkPut(bundle.measurements);
        await db.customIons.bulkPut(bundle.customIons);
      },
    );
  },

  /**
   * Copy a project with its shortlist, measurements and per-project ions under a new name. The copy is
   * never a demo project (resetting the demo leaves it alone). Returns the new project.
   */
  duplicate: async (id: string, name?: string): Promise<ProjectRecord> => {
    const db = getDb();
    return db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons],
      async () => {
        const source = await projectsRepo.bundle(id);
        if (!source) throw new Error(`No project with id ${id}`);
        const now = nowIso();
        const project = projectRecordSchema.parse({
          ...source.project,
          id: newId('prj'),
          name: (name?.trim() || `${source.project.name} (copy)`).slice(0, 120),
          createdAt: now,
          updatedAt: now,
          archived: false,
          isDemo: false,
        });
        // The copy's own in-house ions get new ids (record and library id alike, so that no two
        // records claim one library id); its shortlist follows them.
        const ionIds = new Map<string, string>();
        const customIons = source.customIons.map((ion) => {
          if (ion.overridesIonId !== null)
            return { ...ion, id: newId('ionedit'), projectId: project.id };
          const copyId = newId('inhouse');
          ionIds.set(ion.id, copyId);
          return { ...ion, id: copyId, projectId: project.id, ion: { ...ion.ion, id: copyId } };
        });
        const candidateIds = new Map<string, string>();
        const candidates = source.candidates.map((c) => {
          const copyId = newId('cand');
          candidateIds.set(c.id, copyId);
          return { ...c, id: copyId, projectId: project.id, ionId: ionIds.get(c.ionId) ?? c.ionId };
        });
        const measurements = source.measurements.flatMap((m) => {
          const candidateId = candidateIds.get(m.candidateId);
          return candidateId
            ? [{ ...m, id: newId('meas'), projectId: project.id, candidateId }]
            : [];
        });
        await db.projects.add(project);
        await db.candidates.bulkAdd(candidates);
        await db.measurements.bulkAdd(measurements);
        await db.customIons.bulkAdd(customIons);
        return project;
      },
    );
  },

  /** Store a project's extra settings block (e.g. `screening`), validated by its owner beforehand. */
  updateExtraSettings: (id: string, key: string, value: unknown): Promise<void> =>
    trackWrite({ kind: 'extra-settings', projectId: id, key, value }, () =>
      writeExtraSettings(id, key, value),
    ),

  /**
   * Apply the edits a page left unconfirmed when it was reloaded or closed (see unsaved-edits.ts).
   * Called once at start, before a project is opened. Returns how many were applied.
   */
  replayUnsavedEdits: (): Promise<number> =>
    replayUnsavedEdits((edit) =>
      edit.kind === 'compound'
        ? writeCompoundChanges(edit.projectId, edit.changes as Partial<Compound>).then(
            () => undefined,
          )
        : writeExtraSettings(edit.projectId, edit.key, edit.value),
    ),
};
