import { getDb } from './db';
import { newId, nowIso } from './ids';
import {
  RECORD_SCHEMA_VERSION,
  measurementRecordSchema,
  type MeasurementRecord,
} from './records';

export type NewMeasurement = Omit<MeasurementRecord, 'id' | 'schemaVersion' | 'recordedAt'>;

/** What the lab measured, per candidate. */
export const measurementsRepo = {
  listForProject: (projectId: string): Promise<MeasurementRecord[]> =>
    getDb().measurements.where('projectId').equals(projectId).toArray(),

  listForCandidate: (candidateId: string): Promise<MeasurementRecord[]> =>
    getDb().measurements.where('candidateId').equals(candidateId).toArray(),

  /** Validate and store a measurement; an invalid one throws and nothing is stored. */
  add: async (m: NewMeasurement): Promise<MeasurementRecord> => {
    const record = measurementRecordSchema.parse({
      ...m,
      id: newId('meas'),
      schemaVersion: RECORD_SCHEMA_VERSION,
      recordedAt: nowIso(),
    });
    await getDb().measurements.add(record);
    return record;
  },

  remove: (id: string): Promise<void> => getDb().measurements.delete(id),
};
