import { getDb } from './db';
import { newId, nowIso } from './ids';
import { RECORD_SCHEMA_VERSION, candidateRecordSchema, type CandidateRecord } from './records';

/** Salt candidates (the shortlist) of a project. */
export const candidatesRepo = {
  listForProject: async (projectId: string): Promise<CandidateRecord[]> =>
    (await getDb().candidates.where('projectId').equals(projectId).toArray()).sort(
      (a, b) => a.order - b.order,
    ),

  /** Add a counter-ion to the shortlist; adding one already there returns the existing record. */
  add: async (
    projectId: string,
    ionId: string,
    stoichiometry: { drugPerSalt: number; counterIonPerSalt: number } = {
      drugPerSalt: 1,
      counterIonPerSalt: 1,
    },
  ): Promise<CandidateRecord> => {
    const db = getDb();
    return db.transaction('rw', db.candidates, async () => {
      const existing = await db.candidates.where({ projectId, ionId }).first();
      if (existing) return existing;
      const count = await db.candidates.where('projectId').equals(projectId).count();
      const record = candidateRecordSchema.parse({
        id: newId('cand'),
        schemaVersion: RECORD_SCHEMA_VERSION,
        projectId,
        ionId,
        ...stoichiometry,
        hydrateWater: 0,
        addedAt: nowIso(),
        order: count,
      });
      await db.candidates.add(record);
      return record;
    });
  },

  update: async (id: string, patch: Partial<Omit<CandidateRecord, 'id' | 'projectId'>>) => {
    const db = getDb();
    await db.transaction('rw', db.candidates, async () => {
      const current = await db.candidates.get(id);
      if (!current) throw new Error(`No candidate with id ${id}`);
      await db.candidates.put(candidateRecordSchema.parse({ ...current, ...patch }));
    });
  },

  /** Remove a candidate and its measurements. */
  remove: async (id: string): Promise<void> => {
    const db = getDb();
    await db.transaction('rw', [db.candidates, db.measurements], async () => {
      await db.measurements.where('candidateId').equals(id).delete();
      await db.candidates.delete(id);
    });
  },
};
