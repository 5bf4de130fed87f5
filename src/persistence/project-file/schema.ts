import { z } from 'zod';
import {
  candidateRecordSchema,
  checkCustomIonPayload,
  customIonRecordFields,
  isoDate,
  measurementRecordSchema,
  projectRecordSchema,
  screenPlanRecordSchema,
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

/** A salt-screen plan with its recorded well outcomes (version 3 on). */
const fileScreenPlanSchema = screenPlanRecordSchema.omit({ schemaVersion: true, projectId: true });

/** The fields of a version-2 file, kept as they were (upgrade-v2.ts reads version 2 through them). */
export const projectFileV2Fields = z.object({
  format: z.literal(PROJECT_FILE_FORMAT),
  version: z.literal(2),
  app: z.object({ name: z.string().max(100), version: z.string().max(40) }),
  createdAt: isoDate,
  project: fileProjectSchema,
  candidates: z.array(fileCandidateSchema).max(PROJECT_FILE_LIMITS.candidates),
  measurements: z.array(fileMeasurementSchema).max(PROJECT_FILE_LIMITS.measurements),
  customIons: z.array(fileCustomIonSchema).max(PROJECT_FILE_LIMITS.customIons),
});

/** Ids unique within the file, and every measurement's candidate in the file (every version). */
function checkCrossReferences(file: z.infer<typeof projectFileV2Fields>, ctx: z.RefinementCtx) {
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
}

/** The version-2 file as it was, with its cross-reference checks: read through `upgradeV2`. */
export const projectFileV2Schema = projectFileV2Fields.superRefine(checkCrossReferences);

/** The current (version 3) project file: version 2 and the project's salt-screen plans. */
export const projectFileSchema = projectFileV2Fields
  .extend({
    version: z.literal(PROJECT_FILE_VERSION),
    screenPlans: z.array(fileScreenPlanSchema).max(PROJECT_FILE_LIMITS.screenPlans),
  })
  .superRefine((file, ctx) => checkCrossReferences({ ...file, version: 2 }, ctx));
export type ProjectFile = z.infer<typeof projectFileSchema>;
