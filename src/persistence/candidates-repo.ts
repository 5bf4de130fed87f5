import { saltStoichiometryFromCharges } from '@/chem';
import { getDb } from './db';
import { changesSetting } from './field-stamps';
import { patchRecord } from './stamped-writes';
import { requireRoomInProject } from './project-limits';
import { newId, nowIso } from './ids';
import { RECORD_SCHEMA_VERSION, candidateRecordSchema, type CandidateRecord } from './records';

/**
 * The smallest charge-balanced salt formula for a drug ion and a counter-ion: drug ions × |z_drug| =
 * counter-ions × |z_counter| (electroneutrality). A monobasic drug (+1) with sulfate (−2) gives 2:1,
 * the hemisulfate; with chloride (−1) 1:1.
 */
export function saltStoichiometry(
  drugCharge: number,
  counterIonCharge: number,
): { drugPerSalt: number; counterIonPerSalt: number } {
  return saltStoichiometryFromCharges(
    Math.round(drugCharge) || 1,
    Math.round(counterIonCharge) || 1,
  );
}

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
    const already = await db.candidates.where({ projectId, ionId }).first();
    if (already) return already;
    await requireRoomInProject(projectId, 'candidates', { ionId, ...stoichiometry });
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

  /** Store the given fields, each stamped (field-stamps.ts); an invalid result throws, nothing stored. */
  update: async (id: string, patch: Partial<Omit<CandidateRecord, 'id' | 'projectId'>>) => {
    await patchRecord('candidates', id, changesSetting([], patch));
  },

  /** The shortlisted counter-ion ids of every project, for the project overview (projectId → count). */
  countByProject: async (): Promise<Map<string, number>> => {
    const counts = new Map<string, number>();
    await getDb().candidates.each((c) =>
      counts.set(c.projectId, (counts.get(c.projectId) ?? 0) + 1),
    );
    return counts;
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
