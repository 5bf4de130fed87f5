import { compoundSchema, type Compound } from '@/chem';
import { getDb } from './db';
import { changesBetween, changesSetting, type FieldChange, type FieldPatch } from './field-stamps';
import type { ProjectRecord, ProjectSettings } from './records';
import { patchRecord, writeFieldPatch } from './stamped-writes';
import { replayUnsavedEdits } from './unsaved-edits';
import { buildProject, projectBundleOps } from './projects-bundle';

export type { ProjectBundle } from './projects-bundle';

const compoundChanges = (changes: Partial<Compound>): FieldChange[] =>
  Object.entries(changes).map(([key, value]) => ({ path: ['compound', key], value }));

/** Store a stamped patch of a project and return the stored project (stamped-writes.ts). */
const patchProject = async (id: string, patch: FieldPatch): Promise<ProjectRecord> =>
  (await patchRecord('projects', id, patch)).record as ProjectRecord;

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
   * Store a field patch of the project (field-stamps.ts): paths from the record's root, e.g.
   * `['settings', 'extra', 'screening', 'weights', 'dose']`. Each change lands only if no newer value
   * of its field is stored; the whole record is validated before it is written, and an invalid result
   * throws with nothing stored. Returns the project as stored.
   */
  patch: patchProject,

  /**
   * Store the compound fields that changed, and only those, each stamped (README, "Saving and two
   * tabs"). An invalid result throws and nothing is stored. Returns the compound as stored.
   */
  patchCompound: async (id: string, changes: Partial<Compound>): Promise<Compound> =>
    (await patchProject(id, compoundChanges(changes))).compound,

  /** Store a whole compound definition (every field written; see {@link projectsRepo.patchCompound}). */
  updateCompound: async (id: string, compound: Compound): Promise<void> => {
    await projectsRepo.patchCompound(id, compoundSchema.parse(compound));
  },

  /**
   * Store the given settings, field by field (an `extra` block is written leaf by leaf). Prefer
   * {@link projectsRepo.changeSettings}, which writes only what a form changed.
   */
  updateSettings: async (id: string, settings: Partial<ProjectSettings>): Promise<void> => {
    await patchProject(id, changesSetting(['settings'], settings));
  },

  /**
   * Store what a form changed in the settings: `before` is what the form started from (or last
   * saved), `after` what it holds now, both shaped like (a part of) `ProjectSettings`. Only the fields
   * that differ are written, so what another tab changed meanwhile is left as stored.
   */
  changeSettings: async (id: string, before: unknown, after: unknown): Promise<void> => {
    const patch = changesBetween(['settings'], before, after);
    if (patch.length) await patchProject(id, patch);
  },

  rename: async (id: string, name: string): Promise<void> => {
    const trimmed = name.trim();
    if (!trimmed) throw new Error('A project needs a name');
    await patchProject(id, [{ path: ['name'], value: trimmed.slice(0, 120) }]);
  },

  setArchived: async (id: string, archived: boolean): Promise<void> => {
    await patchProject(id, [{ path: ['archived'], value: archived }]);
  },

  // Delete, demo, bundle, undo and copy (projects-bundle.ts).
  ...projectBundleOps,

  /** Store a project's extra settings block (validated by its owner beforehand), leaf by leaf. */
  updateExtraSettings: async (id: string, key: string, value: unknown): Promise<void> => {
    await patchProject(id, changesSetting(['settings', 'extra', key], value));
  },

  /**
   * Apply the edits a page left unconfirmed when it was reloaded or closed (see unsaved-edits.ts),
   * each under the stamp it was given: a field written since keeps its newer value. Called once at
   * start, before a project is opened. Returns how many were applied (in part or whole).
   */
  replayUnsavedEdits: (): Promise<number> =>
    replayUnsavedEdits(
      async (edit) =>
        (await writeFieldPatch(edit.table, edit.recordId, edit.patch, edit.stamp)).applied > 0,
    ),
};
