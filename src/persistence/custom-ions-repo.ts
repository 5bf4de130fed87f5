import {
  counterIonEditSchema,
  counterIonSchema,
  type CounterIon,
  type CounterIonEdit,
} from '@/chem';
import { getDb } from './db';
import { changesBetween } from './field-stamps';
import { patchRecord } from './stamped-writes';
import { requireRoomInProject } from './project-limits';
import { newId, nowIso } from './ids';
import { RECORD_SCHEMA_VERSION, customIonRecordSchema, type CustomIonRecord } from './records';

/**
 * In-house counter-ions and per-project edits of bundled ions. Ion payloads are validated with the
 * library's zod schemas (src/chem/library) before they are stored: nothing half-valid reaches IndexedDB.
 */
export const customIonsRepo = {
  listAll: (): Promise<CustomIonRecord[]> => getDb().customIons.toArray(),

  save: async (
    rec: Omit<CustomIonRecord, 'id' | 'schemaVersion' | 'updatedAt'> & { id?: string },
  ): Promise<CustomIonRecord> => {
    const record = customIonRecordSchema.parse({
      ...rec,
      id: rec.id ?? newId('ion'),
      schemaVersion: RECORD_SCHEMA_VERSION,
      updatedAt: nowIso(),
    });
    const isNew = !(await getDb().customIons.get(record.id));
    if (isNew && record.projectId !== null) {
      await requireRoomInProject(record.projectId, 'customIons', record);
    }
    await getDb().customIons.put(record);
    return record;
  },

  /** A fresh id for an in-house ion (also used as its library id). */
  newInHouseId: (): string => newId('inhouse'),

  /** Store an in-house ion for every project (projectId null) or for one project. */
  saveInHouse: async (
    ion: CounterIon,
    projectId: string | null = null,
  ): Promise<CustomIonRecord> => {
    const valid = counterIonSchema.parse(ion);
    return customIonsRepo.save({
      id: valid.id,
      projectId,
      overridesIonId: null,
      ion: valid as unknown as Record<string, unknown>,
    });
  },

  /**
   * Record this project's edits of a bundled ion; the bundled value itself is never changed. `before`
   * is the edit the form started from: when the project already has an edit of this ion, only the
   * fields that differ from `before` are written, each stamped (field-stamps.ts), so a field another
   * tab edited meanwhile is kept.
   */
  saveEdit: async (
    projectId: string,
    ionId: string,
    edit: CounterIonEdit,
    before: CounterIonEdit = {},
  ): Promise<CustomIonRecord> => {
    const db = getDb();
    const merged = counterIonEditSchema.parse(edit);
    const found = await db.customIons
      .where('overridesIonId')
      .equals(ionId)
      .filter((r) => r.projectId === projectId)
      .first();
    if (found) {
      const patch = changesBetween(['ion'], before, merged);
      return (await patchRecord('customIons', found.id, patch)).record as CustomIonRecord;
    }
    return db.transaction('rw', db.customIons, async () => {
      const existing = await db.customIons
        .where('overridesIonId')
        .equals(ionId)
        .filter((r) => r.projectId === projectId)
        .first();
      const record = customIonRecordSchema.parse({
        id: existing?.id ?? newId('ionedit'),
        schemaVersion: RECORD_SCHEMA_VERSION,
        projectId,
        overridesIonId: ionId,
        ion: merged,
        updatedAt: nowIso(),
      });
      await db.customIons.put(record);
      return record;
    });
  },

  /** Drop this project's edits of a bundled ion: the bundled values apply again. */
  restoreBundled: async (projectId: string, ionId: string): Promise<void> => {
    const db = getDb();
    await db.customIons
      .where('overridesIonId')
      .equals(ionId)
      .filter((r) => r.projectId === projectId)
      .delete();
  },

  remove: (id: string): Promise<void> => getDb().customIons.delete(id),
};
