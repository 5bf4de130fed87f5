import { getDb } from './db';
import { changesSetting } from './field-stamps';
import { patchRecord } from './stamped-writes';
import { requireRoomInProject } from './project-limits';
import { newId, nowIso } from './ids';
import { RECORD_SCHEMA_VERSION, measurementRecordSchema, type MeasurementRecord } from './records';

export type NewMeasurement = Omit<MeasurementRecord, 'id' | 'schemaVersion' | 'recordedAt'>;

/** What the lab measured, per candidate. */
export const measurementsRepo = {
  listForProject: (projectId: string): Promise<MeasurementRecord[]> =>
    getDb().measurements.where('projectId').equals(projectId).toArray(),

  listForCandidate: (candidateId: string): Promise<MeasurementRecord[]> =>
    getDb().measurements.where('candidateId').equals(candidateId).toArray(),

  /**
   * Validate and store a measurement; an invalid one, or one the project has no room for
   * (project-limits.ts), throws and nothing is stored.
   */
  add: async (m: NewMeasurement): Promise<MeasurementRecord> => {
    const record = measurementRecordSchema.parse({
      ...m,
      id: newId('meas'),
      schemaVersion: RECORD_SCHEMA_VERSION,
      recordedAt: nowIso(),
    });
    await requireRoomInProject(record.projectId, 'measurements', record);
    await getDb().measurements.add(record);
    return record;
  },

  /**
   * Store the given fields of a measurement, each stamped (field-stamps.ts): a field another tab wrote
   * later is kept. An invalid result throws and nothing changes.
   */
  update: async (id: string, patch: Partial<NewMeasurement>): Promise<void> => {
    await patchRecord('measurements', id, changesSetting([], patch));
  },

  /** Count of measurements per project (projectId → count), for the project overview. */
  countByProject: async (): Promise<Map<string, number>> => {
    const counts = new Map<string, number>();
    await getDb().measurements.each((m) =>
      counts.set(m.projectId, (counts.get(m.projectId) ?? 0) + 1),
    );
    return counts;
  },

  remove: (id: string): Promise<void> => getDb().measurements.delete(id),

  /** Put a removed measurement back as it was (undo of a delete). */
  restore: async (record: MeasurementRecord): Promise<void> => {
    await getDb().measurements.put(measurementRecordSchema.parse(record));
  },
};
