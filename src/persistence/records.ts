import { z } from 'zod';
import {
  compoundSchema,
  counterIonEditSchema,
  counterIonSchema,
  platePlanSchema,
  wellOutcomeSchema,
} from '@/chem';
import { stampFieldsSchema } from './field-stamps';

/**
 * Stored record shapes. Every record carries `schemaVersion` so that a later version of Saltsmith
 * can upgrade it (see db.ts). Records are validated with zod when they are written and when they
 * come in from a file.
 */
export const RECORD_SCHEMA_VERSION = 1;

/** A record id; bounded so that a hostile project file cannot carry megabyte-long ids. */
const recordId = z.string().min(1).max(200);
/**
 * An ISO 8601 date-time as `Date.prototype.toISOString` writes it (UTC, or with an offset), and a real
 * date ("not a date" and 2026-13-45 are refused).
 */
export const isoDate = z
  .string()
  .max(40)
  .regex(
    /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/,
    'must be an ISO 8601 date-time, e.g. 2026-12-03T07:00:00.000Z',
  )
  .refine((s) => Number.isFinite(Date.parse(s)), 'is not a real date');

export const projectSettingsSchema = z.object({
  /**
   * Chloride in the gastric medium, mol/L. Default 0.12 M: USP "Simulated Gastric Fluid, TS" (2.0 g NaCl
   * and 7.0 mL hydrochloric acid per litre, pH ≈ 1.2) gives 0.034 M from NaCl plus ≈0.084 M from HCl
   * (composition from memory of the USP Reagents/Test Solutions text; editable per project).
   */
  gastricChlorideM: z.number().min(0).max(5).default(0.12),
  /** Microenvironment pH of the intended formulation (for the disproportionation flag). */
  microenvironmentPh: z.number().min(0).max(14).default(7),
  /**
   * True when the user stated the microenvironment pH, false when it is only the assumed 7. Absent in
   * records written before it existed: read by `microenvironmentPhStatedOf` (screening-settings.ts).
   */
  microenvironmentPhStated: z.boolean().optional(),
  /** Temperature of the screening, °C. */
  temperatureC: z.number().min(0).max(100).default(37),
  /** Extra screening settings owned by later features (weights, bands); each validated by its owner. */
  extra: z.record(z.string(), z.unknown()).default({}),
});
export type ProjectSettings = z.infer<typeof projectSettingsSchema>;

export const projectRecordSchema = z.object({
  id: recordId,
  schemaVersion: z.number().int(),
  name: z.string().trim().min(1).max(120),
  createdAt: isoDate,
  updatedAt: isoDate,
  archived: z.boolean(),
  /** True for the bundled fictional demo project. */
  isDemo: z.boolean(),
  compound: compoundSchema,
  settings: projectSettingsSchema,
  /** Per-field stamps of the last write (field-stamps.ts). */
  ...stampFieldsSchema,
});
export type ProjectRecord = z.infer<typeof projectRecordSchema>;

export const candidateRecordSchema = z.object({
  id: recordId,
  schemaVersion: z.number().int(),
  projectId: recordId,
  /** Library id of the counter-ion (bundled or custom). */
  ionId: recordId,
  /** Drug ions per counter-ion in the salt, e.g. 2:1 for a hemisulfate is drug 2, counter-ion 1. */
  drugPerSalt: z.number().int().min(1).max(4),
  counterIonPerSalt: z.number().int().min(1).max(4),
  /** Water molecules per formula unit when a hydrate is recorded. */
  hydrateWater: z.number().min(0).max(20),
  addedAt: isoDate,
  order: z.number(),
  ...stampFieldsSchema,
});
export type CandidateRecord = z.infer<typeof candidateRecordSchema>;

export const measurementKindSchema = z.enum([
  'solubility',
  'melting-point',
  'fusion-enthalpy',
  'solution-enthalpy',
  'mass-gain-80rh',
  'crystallinity',
  'note',
]);
export type MeasurementKind = z.infer<typeof measurementKindSchema>;

export const measurementRecordSchema = z.object({
  id: recordId,
  schemaVersion: z.number().int(),
  projectId: recordId,
  candidateId: recordId,
  kind: measurementKindSchema,
  /** The measured number in the unit named by `unit` (mg/mL, °C, kJ/mol, %), null for text-only kinds. */
  value: z.number().finite().nullable(),
  unit: z.string().max(20),
  /** Conditions: pH, temperature (K), medium. */
  ph: z.number().min(0).max(14).nullable(),
  temperatureK: z.number().positive().max(600).nullable(),
  medium: z.string().max(200),
  text: z.string().max(5000),
  /**
   * Solubility only: the solid the lab found left at equilibrium (e.g. XRPD of the residue); null or
   * absent: not stated. Optional and not indexed, so records written before it stay valid.
   */
  solidForm: z.enum(['salt', 'free-form', 'unknown']).nullable().optional(),
  recordedAt: isoDate,
  ...stampFieldsSchema,
});
export type MeasurementRecord = z.infer<typeof measurementRecordSchema>;

/** The fields of a stored custom ion (without the payload check; see {@link customIonRecordSchema}). */
export const customIonRecordFields = z.object({
  id: recordId,
  schemaVersion: z.number().int(),
  /** Null for an ion available to every project; a project id for a per-project override. */
  projectId: recordId.nullable(),
  /** When this record overrides a bundled ion, the bundled ion's id. */
  overridesIonId: recordId.nullable(),
  /** The ion's data: a whole ion (counterIonSchema) or, for an override, the edit (counterIonEditSchema). */
  ion: z.record(z.string(), z.unknown()),
  updatedAt: isoDate,
  ...stampFieldsSchema,
});

/**
 * The payload check every custom-ion record passes, stored or imported: an in-house ion is validated
 * by the library's own counterIonSchema and carries the record's id as its library id (so the record
 * id alone decides which library id it takes); an override is validated by counterIonEditSchema.
 */
export function checkCustomIonPayload(
  record: { id: string; overridesIonId: string | null; ion: Record<string, unknown> },
  ctx: z.RefinementCtx,
): void {
  const parsed =
    record.overridesIonId === null
      ? counterIonSchema.safeParse(record.ion)
      : counterIonEditSchema.safeParse(record.ion);
  if (!parsed.success) {
    for (const issue of parsed.error.issues.slice(0, 5)) {
      ctx.addIssue({
        code: 'custom',
        path: ['ion', ...issue.path.map(String)],
        message: issue.message,
      });
    }
    return;
  }
  if (record.overridesIonId === null && record.ion.id !== record.id) {
    ctx.addIssue({
      code: 'custom',
      path: ['ion', 'id'],
      message: `must be the record's id "${record.id}"`,
    });
  }
}

export const customIonRecordSchema = customIonRecordFields.superRefine(checkCustomIonPayload);
export type CustomIonRecord = z.infer<typeof customIonRecordSchema>;

export const settingRecordSchema = z.object({
  key: z.string().min(1),
  value: z.unknown(),
});
export type SettingRecord = z.infer<typeof settingRecordSchema>;

/** A well name on a plate of up to 96 wells (A1 … H12). */
const wellName = z.string().regex(/^[A-H](?:[1-9]|1[0-2])$/, 'a well name A1 … H12');

/**
 * What the lab recorded for one well, with the counter-ion and solvent the well held when it was
 * recorded (so an outcome is not read against a well whose contents changed with a later plan edit).
 */
export const storedWellOutcomeSchema = wellOutcomeSchema.extend({
  counterIonId: recordId,
  solventId: recordId,
  recordedAt: isoDate,
});
export type StoredWellOutcome = z.infer<typeof storedWellOutcomeSchema>;

/** A project's salt-screen plan (one per project) and the outcomes recorded per well (Dexie version 2). */
export const screenPlanRecordSchema = z.object({
  id: recordId,
  schemaVersion: z.number().int(),
  projectId: recordId,
  plan: platePlanSchema,
  outcomes: z.record(wellName, storedWellOutcomeSchema),
  updatedAt: isoDate,
  ...stampFieldsSchema,
});
export type ScreenPlanRecord = z.infer<typeof screenPlanRecordSchema>;
