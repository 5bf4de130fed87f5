import { getDb } from './db';
import { newId, nowIso } from './ids';
import { RECORD_SCHEMA_VERSION, customIonRecordSchema, type CustomIonRecord } from './records';

/**
 * In-house counter-ions and per-project edits of bundled ions. The ion payload is validated by the
 * library schema in src/chem before it reaches this repository.
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
    await getDb().customIons.put(record);
    return record;
  },

  remove: (id: string): Promise<void> => getDb().customIons.delete(id),
};
