import { compoundSchema, getCounterIon, type Compound } from '@/chem';
import { getDb } from './db';
import { newId, nowIso } from './ids';
import { DEMO_COMPOUND, DEMO_PROJECT_NAME, DEMO_SCREEN_PLAN, DEMO_SHORTLIST } from './demo-project';
import { buildScreenPlanRecord, renameScreenPlanIons } from './screen-plan-record';
import {
  RECORD_SCHEMA_VERSION,
  candidateRecordSchema,
  projectRecordSchema,
  projectSettingsSchema,
  type CandidateRecord,
  type CustomIonRecord,
  type MeasurementRecord,
  type ProjectRecord,
  type ScreenPlanRecord,
} from './records';
import { saltStoichiometry } from './candidates-repo';

/** Everything that belongs to one project: what a delete removes and an undo puts back. */
export interface ProjectBundle {
  project: ProjectRecord;
  candidates: CandidateRecord[];
  measurements: MeasurementRecord[];
  customIons: CustomIonRecord[];
  /** The project's salt-screen plan with its outcomes (absent in bundles made before version 2). */
  screenPlans?: ScreenPlanRecord[];
}

/**
 * Charge of a demo counter-ion in its first listed salt form (the library's usual one: hydrochloride,
 * hemisulfate, hydrogen maleate…), so that the demo shortlist is charge-balanced for the drug ion.
 */
function demoIonCharge(ionId: string): number {
  const ion = getCounterIon(ionId);
  return ion?.stoichiometries[0]?.ionCharge ?? ion?.charge ?? -1;
}

/** The demo shortlist as stored candidates: each ion in its first listed (the library’s usual) salt form. */
export function demoCandidates(projectId: string): CandidateRecord[] {
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

/** A new, valid project record (not yet stored). */
export function buildProject(name: string, compound: Compound, isDemo = false): ProjectRecord {
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

/**
 * The project-wide operations: delete, demo, bundle, undo and copy. Spread into `projectsRepo`
 * (projects-repo.ts), which is the one object callers use.
 */
export const projectBundleOps = {
  /** Delete a project and everything that belongs to it, in one transaction. */
  remove: async (id: string): Promise<void> => {
    const db = getDb();
    await db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
      async () => {
        await db.candidates.where('projectId').equals(id).delete();
        await db.measurements.where('projectId').equals(id).delete();
        await db.customIons.where('projectId').equals(id).delete();
        await db.screenPlans.where('projectId').equals(id).delete();
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
    return db.transaction(
      'rw',
      [db.projects, db.settings, db.candidates, db.screenPlans],
      async () => {
        const seeded = await db.settings.get(DEMO_SEEDED_KEY);
        if (seeded) return null;
        const record = buildProject(DEMO_PROJECT_NAME, DEMO_COMPOUND, true);
        await db.projects.add(record);
        await db.candidates.bulkAdd(demoCandidates(record.id));
        await db.screenPlans.add(buildScreenPlanRecord(record.id, DEMO_SCREEN_PLAN));
        await db.settings.put({ key: DEMO_SEEDED_KEY, value: true });
        return record.id;
      },
    );
  },

  /** Put back a fresh demo project with its shortlist (the old demo, if any, is replaced). */
  resetDemo: async (): Promise<string> => {
    const db = getDb();
    return db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons, db.settings, db.screenPlans],
      async () => {
        const old = await db.projects.filter((p) => p.isDemo).toArray();
        for (const p of old) await projectBundleOps.remove(p.id);
        const record = buildProject(DEMO_PROJECT_NAME, DEMO_COMPOUND, true);
        await db.projects.add(record);
        await db.candidates.bulkAdd(demoCandidates(record.id));
        await db.screenPlans.add(buildScreenPlanRecord(record.id, DEMO_SCREEN_PLAN));
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
      [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
      async () => {
        const project = await db.projects.get(id);
        if (!project) return undefined;
        return {
          project,
          candidates: await db.candidates.where('projectId').equals(id).toArray(),
          measurements: await db.measurements.where('projectId').equals(id).toArray(),
          customIons: await db.customIons.where('projectId').equals(id).toArray(),
          screenPlans: await db.screenPlans.where('projectId').equals(id).toArray(),
        };
      },
    );
  },

  /** Delete a project and return what was deleted, so that the caller can offer an undo. */
  removeWithUndo: async (id: string): Promise<ProjectBundle | undefined> => {
    const db = getDb();
    return db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
      async () => {
        const bundle = await projectBundleOps.bundle(id);
        if (bundle) await projectBundleOps.remove(id);
        return bundle;
      },
    );
  },

  /** Put a deleted project back exactly as it was (the undo of {@link projectBundleOps.removeWithUndo}). */
  restore: async (bundle: ProjectBundle): Promise<void> => {
    const db = getDb();
    await db.transaction(
      'rw',
      [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
      async () => {
        await db.projects.put(projectRecordSchema.parse(bundle.project));
        await db.candidates.bulkPut(bundle.candidates);
        await db.measurements.bulkPut(bundle.measurements);
        await db.customIons.bulkPut(bundle.customIons);
        await db.screenPlans.bulkPut(bundle.screenPlans ?? []);
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
      [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
      async () => {
        const source = await projectBundleOps.bundle(id);
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
        await db.screenPlans.bulkAdd(
          (source.screenPlans ?? []).map((p) => ({
            ...renameScreenPlanIons(p, (ionId) => ionIds.get(ionId) ?? ionId),
            id: newId('plan'),
            projectId: project.id,
          })),
        );
        return project;
      },
    );
  },
};
