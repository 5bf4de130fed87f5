import { z } from 'zod';
import {
  candidateRecordSchema,
  checkCustomIonPayload,
  customIonRecordFields,
  isoDate,
  measurementRecordSchema,
  projectRecordSchema,
} from '../records';
import { PROJECT_FILE_FORMAT, PROJECT_FILE_LIMITS, PROJECT_FILE_VERSION } from './format';

/** An ISO 8601 date-time (bounded, a real date): the one rule of the stored records. */
export { isoDate };

// Every record in a file is checked by the schema of the stored record it becomes (records.ts), minus
// the fields the importing database assigns (schemaVersion, projectId); nothing is declared twice.

/** A shortlisted candidate as it appears in the file (ids are the exporting database's own). */
/** What a file never carries: the importing database assigns these (stamps: field-stamps.ts). */
const ASSIGNED = {
  schemaVersion: true,
  projectId: true,
  fieldStamps: true,
  stampFloor: true,
} as const;

const fileCandidateSchema = candidateRecordSchema.omit(ASSIGNED);

const fileMeasurementSchema = measurementRecordSchema.omit(ASSIGNED);

const fileCustomIonSchema = customIonRecordFields
  .omit(ASSIGNED)
  .extend({
    /** 'project': belonged to the exported project; 'shared': available to every project there. */
    scope: z.enum(['project', 'shared']),
  })
  .superRefine(checkCustomIonPayload);

const fileProjectSchema = projectRecordSchema.omit({
  id: true,
  schemaVersion: true,
  fieldStamps: true,
  stampFloor: true,
});

/** The current (version 2) project file. */
export const projectFileSchema = z
  .object({
    format: z.literal(PROJECT_FILE_FORMAT),
    version: z.literal(PROJECT_FILE_VERSION),
    app: z.object({ name: z.string().max(100), version: z.string().max(40) }),
    createdAt: isoDate,
    project: fileProjectSchema,
    candidates: z.array(fileCandidateSchema).max(PROJECT_FILE_LIMITS.candidates),
    measurements: z.array(fileMeasurementSchema).max(PROJECT_FILE_LIMITS.measurements),
    customIons: z.array(fileCustomIonSchema).max(PROJECT_FILE_LIMITS.customIons),
  })
  .superRefine((file, ctx) => {
    const candidateIds = new Set<string>();
    file.candidates.forEach((c, i) => {
      if (candidateIds.has(c.id)) {
        ctx.addIssue({
          code: 'custom',
          path: ['candidates', i, 'id'],
          message: `duplicate candidate id ${c.id}`,
        });
      }
      candidateIds.add(c.id);
    });
    file.measurements.forEach((m, i) => {
      if (!candidateIds.has(m.candidateId)) {
        ctx.addIssue({
          code: 'custom',
          path: ['measurements', i, 'candidateId'],
          message: `refers to candidate ${m.candidateId}, which is not in the file`,
        });
      }
    });
    const ionIds = new Set<string>();
    file.customIons.forEach((ion, i) => {
      if (ionIds.has(ion.id)) {
        ctx.addIssue({
          code: 'custom',
          path: ['customIons', i, 'id'],
          message: `duplicate ion id ${ion.id}`,
        });
      }
      ionIds.add(ion.id);
    });
  });
export type ProjectFile = z.infer<typeof projectFileSchema>;
