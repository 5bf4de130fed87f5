import { compoundSchema, type Compound } from '@/chem/compound/compound.schema';
import { getDb } from './db';
import { newId, nowIso } from './ids';
import { DEMO_COMPOUND, DEMO_PROJECT_NAME } from './demo-project';
import {
  RECORD_SCHEMA_VERSION,
  projectRecordSchema,
  projectSettingsSchema,
  type ProjectRecord,
  type ProjectSettings,
} from './records';

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

  /** Validate and store a new compound definition; an invalid one throws and nothing is stored. */
  updateCompound: async (id: string, compound: Compound): Promise<void> => {
    const valid = compoundSchema.parse(compound);
    const n = await getDb().projects.update(id, { compound: valid, updatedAt: nowIso() });
    if (n === 0) throw new Error(`No project with id ${id}`);
  },

  updateSettings: async (id: string, settings: ProjectSettings): Promise<void> => {
    const valid = projectSettingsSchema.parse(settings);
    await getDb().projects.update(id, { settings: valid, updatedAt: nowIso() });
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
    await db.transaction('rw', [db.projects, db.candidates, db.measurements, db.customIons], async () => {
      await db.candidates.where('projectId').equals(id).delete();
      await db.measurements.where('projectId').equals(id).delete();
      await db.customIons.where('projectId').equals(id).delete();
      await db.projects.delete(id);
    });
  },

  /**
   * Create the fictional demo project on the very first start. Returns its id, or null when it was
   * created before (and perhaps deleted by the user since).
   */
  ensureDemo: async (): Promise<string | null> => {
    const db = getDb();
    return db.transaction('rw', [db.projects, db.settings], async () => {
      const seeded = await db.settings.get(DEMO_SEEDED_KEY);
      if (seeded) return null;
      const record = build(DEMO_PROJECT_NAME, DEMO_COMPOUND, true);
      await db.projects.add(record);
      await db.settings.put({ key: DEMO_SEEDED_KEY, value: true });
      return record.id;
    });
  },

  /** Put back a fresh demo project (the old demo, if any, is replaced). */
  resetDemo: async (): Promise<string> => {
    const db = getDb();
    const old = await db.projects.filter((p) => p.isDemo).toArray();
    for (const p of old) await projectsRepo.remove(p.id);
    const record = build(DEMO_PROJECT_NAME, DEMO_COMPOUND, true);
    await db.projects.add(record);
    await db.settings.put({ key: DEMO_SEEDED_KEY, value: true });
    return record.id;
  },
};
