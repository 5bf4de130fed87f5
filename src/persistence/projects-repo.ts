import { compoundSchema, type Compound } from '@/chem';
import { getDb } from './db';
import { nowIso } from './ids';
import { projectSettingsSchema, type ProjectRecord, type ProjectSettings } from './records';
import { replayUnsavedEdits, trackWrite } from './unsaved-edits';
import { buildProject, projectBundleOps } from './projects-bundle';

export type { ProjectBundle } from './projects-bundle';

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
    const record = buildProject(name, compound);
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

  // Delete, demo, bundle, undo and copy (projects-bundle.ts).
  ...projectBundleOps,

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
