import { z } from 'zod';
import {
  candidateRecordSchema,
  checkCustomIonPayload,
  customIonRecordFields,
  measurementRecordSchema,
  projectRecordSchema,
  type CandidateRecord,
  type CustomIonRecord,
  type MeasurementRecord,
  type ProjectRecord,
} from './records';

/**
 * The Saltsmith project file: our own versioned JSON format (documented in README.md, "Project
 * files"). A file names its format and version, the app that wrote it and when; every file that is
 * read passes through {@link restoreProjectFile}, which upgrades older versions and validates the
 * result with zod before anything touches the database.
 */

/** The `format` tag every project file carries. */
export const PROJECT_FILE_FORMAT = 'saltsmith-project';

/** The version this build writes. Version 1 is read through {@link upgradeV1}. */
export const PROJECT_FILE_VERSION = 2;

/** Largest file accepted, in bytes (UTF-16 code units of the text, a close upper bound for ASCII JSON). */
export const PROJECT_FILE_MAX_BYTES = 5 * 1024 * 1024;

/** Upper bounds on list lengths, so a hostile file cannot make the import run for minutes. */
export const PROJECT_FILE_LIMITS = { candidates: 500, measurements: 20_000, customIons: 1_000 } as const;

/** Why a file was refused. Each code has a plain-language message for the user. */
export type ProjectFileErrorCode =
  | 'too-large'
  | 'empty'
  | 'truncated'
  | 'not-json'
  | 'not-a-project-file'
  | 'newer-version'
  | 'invalid';

/** A project file that cannot be read. `message` says what is wrong in words a user can act on. */
export class ProjectFileError extends Error {
  readonly code: ProjectFileErrorCode;
  /** Field-level problems (path: message) for `invalid` files, at most 20. */
  readonly details: string[];
  constructor(code: ProjectFileErrorCode, message: string, details: string[] = []) {
    super(message);
    this.name = 'ProjectFileError';
    this.code = code;
    this.details = details;
  }
}

const isoDate = z.string().min(1).max(40);

// Every record in a file is checked by the schema of the stored record it becomes (records.ts), minus
// the fields the importing database assigns (schemaVersion, projectId); nothing is declared twice.

/** A shortlisted candidate as it appears in the file (ids are the exporting database's own). */
const fileCandidateSchema = candidateRecordSchema.omit({ schemaVersion: true, projectId: true });

const fileMeasurementSchema = measurementRecordSchema.omit({ schemaVersion: true, projectId: true });

const fileCustomIonSchema = customIonRecordFields
  .omit({ schemaVersion: true, projectId: true })
  .extend({
    /** 'project': belonged to the exported project; 'shared': available to every project there. */
    scope: z.enum(['project', 'shared']),
  })
  .superRefine(checkCustomIonPayload);

const fileProjectSchema = projectRecordSchema.omit({ id: true, schemaVersion: true });

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
        ctx.addIssue({ code: 'custom', path: ['candidates', i, 'id'], message: `duplicate candidate id ${c.id}` });
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
        ctx.addIssue({ code: 'custom', path: ['customIons', i, 'id'], message: `duplicate ion id ${ion.id}` });
      }
      ionIds.add(ion.id);
    });
  });
export type ProjectFile = z.infer<typeof projectFileSchema>;

/**
 * Version 1, the first layout (written by development builds before custom ions were exported):
 * `exportedAt` instead of `createdAt`, no `app` block, the compound and settings beside the project
 * name at the top level, settings without `extra`, candidates with a single `ratio` string such as
 * "2:1" (drug:counter-ion) and measurements without pH/temperature/medium.
 */
const v1Schema = z.object({
  format: z.literal(PROJECT_FILE_FORMAT),
  version: z.literal(1),
  exportedAt: isoDate,
  name: z.string(),
  compound: z.unknown(),
  settings: z.object({
    gastricChlorideM: z.number(),
    microenvironmentPh: z.number(),
    temperatureC: z.number(),
  }),
  candidates: z.array(
    z.object({
      id: z.string(),
      ionId: z.string(),
      ratio: z.string().regex(/^\d+:\d+$/, 'a ratio such as "1:1" or "2:1"'),
      hydrateWater: z.number().optional(),
    }),
  ),
  measurements: z.array(
    z.object({
      id: z.string(),
      candidateId: z.string(),
      kind: z.string(),
      value: z.number().nullable(),
      unit: z.string(),
      text: z.string().optional(),
    }),
  ),
});

/** Upgrade a version-1 object to the version-2 shape (validated afterwards like any file). */
export function upgradeV1(raw: unknown): unknown {
  const parsed = v1Schema.safeParse(raw);
  if (!parsed.success) throw invalid(parsed.error, 'This version-1 project file');
  const v1 = parsed.data;
  return {
    format: PROJECT_FILE_FORMAT,
    version: 2,
    app: { name: 'Saltsmith (format-1 file)', version: 'version not recorded' },
    createdAt: v1.exportedAt,
    project: {
      name: v1.name,
      createdAt: v1.exportedAt,
      updatedAt: v1.exportedAt,
      archived: false,
      isDemo: false,
      compound: v1.compound,
      settings: { ...v1.settings, extra: {} },
    },
    candidates: v1.candidates.map((c, order) => {
      const [drug, counter] = c.ratio.split(':').map(Number);
      return {
        id: c.id,
        ionId: c.ionId,
        drugPerSalt: drug,
        counterIonPerSalt: counter,
        hydrateWater: c.hydrateWater ?? 0,
        addedAt: v1.exportedAt,
        order,
      };
    }),
    measurements: v1.measurements.map((m) => ({
      id: m.id,
      candidateId: m.candidateId,
      kind: m.kind,
      value: m.value,
      unit: m.unit,
      ph: null,
      temperatureK: null,
      medium: '',
      text: m.text ?? '',
      recordedAt: v1.exportedAt,
    })),
    customIons: [],
  };
}

function invalid(error: z.ZodError, what = 'This project file'): ProjectFileError {
  const details = error.issues
    .slice(0, 20)
    .map((i) => `${i.path.length ? i.path.join('.') : '(file)'}: ${i.message}`);
  const more = error.issues.length > 20 ? ` (and ${error.issues.length - 20} more)` : '';
  return new ProjectFileError(
    'invalid',
    `${what} does not pass validation: ${details.slice(0, 3).join('; ')}${more}${details.length > 3 ? ' …' : ''}`,
    details,
  );
}

/**
 * True when `text` stops in the middle of a JSON value: an open string, or more `{`/`[` than
 * closing brackets outside strings. Used to tell a cut-off download from a file that is not JSON.
 */
export function looksTruncated(text: string): boolean {
  let depth = 0;
  let inString = false;
  let escaped = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (inString) {
      if (escaped) escaped = false;
      else if (ch === '\\') escaped = true;
      else if (ch === '"') inString = false;
      continue;
    }
    if (ch === '"') inString = true;
    else if (ch === '{' || ch === '[') depth++;
    else if (ch === '}' || ch === ']') depth--;
  }
  return inString || depth > 0;
}

/**
 * The single restore/upgrade path: take any parsed JSON value, check the format tag and version,
 * upgrade older versions step by step and validate the result. Throws {@link ProjectFileError}.
 */
export function restoreProjectFile(raw: unknown): ProjectFile {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw new ProjectFileError('not-a-project-file', 'This file is JSON but not a Saltsmith project file (expected an object).');
  }
  const tagged = raw as { format?: unknown; version?: unknown };
  if (tagged.format !== PROJECT_FILE_FORMAT) {
    throw new ProjectFileError(
      'not-a-project-file',
      `This is not a Saltsmith project file: its "format" is ${JSON.stringify(tagged.format ?? null)}, expected "${PROJECT_FILE_FORMAT}".`,
    );
  }
  const version = tagged.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    throw new ProjectFileError('invalid', `This project file has no valid "version" (found ${JSON.stringify(version ?? null)}).`);
  }
  if (version > PROJECT_FILE_VERSION) {
    throw new ProjectFileError(
      'newer-version',
      `This project file is format version ${version}, written by a newer Saltsmith; this one (${appVersion()}) reads versions up to ${PROJECT_FILE_VERSION}. Update Saltsmith to open it.`,
    );
  }
  let current: unknown = raw;
  if (version === 1) current = upgradeV1(current);
  const result = projectFileSchema.safeParse(current);
  if (!result.success) throw invalid(result.error);
  return result.data;
}

/** Parse the text of a file (size, JSON, truncation checks) and restore it. Throws {@link ProjectFileError}. */
export function parseProjectFileText(text: string): ProjectFile {
  if (text.length > PROJECT_FILE_MAX_BYTES) {
    throw new ProjectFileError(
      'too-large',
      `This file is ${(text.length / 1024 / 1024).toFixed(1)} MB; project files are limited to ${PROJECT_FILE_MAX_BYTES / 1024 / 1024} MB.`,
    );
  }
  if (text.trim() === '') throw new ProjectFileError('empty', 'This file is empty.');
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    if (looksTruncated(text)) {
      throw new ProjectFileError(
        'truncated',
        'This file ends in the middle of its data — it was probably cut off while being copied or downloaded.',
      );
    }
    throw new ProjectFileError('not-json', 'This file is not valid JSON, so it cannot be a Saltsmith project file.');
  }
  return restoreProjectFile(raw);
}

function appVersion(): string {
  return typeof __APP_VERSION__ === 'string' ? __APP_VERSION__ : 'unknown';
}

/** The records of one project as they sit in the database. */
export interface ProjectBundle {
  project: ProjectRecord;
  candidates: CandidateRecord[];
  measurements: MeasurementRecord[];
  /** Custom ions of the project and the shared custom ions its shortlist uses. */
  customIons: CustomIonRecord[];
}

/** Build the file object for a project (pure: the caller supplies the date). */
export function buildProjectFile(bundle: ProjectBundle, createdAt: string): ProjectFile {
  const { project } = bundle;
  const file: ProjectFile = {
    format: PROJECT_FILE_FORMAT,
    version: PROJECT_FILE_VERSION,
    app: { name: 'Saltsmith', version: appVersion() },
    createdAt,
    project: {
      name: project.name,
      createdAt: project.createdAt,
      updatedAt: project.updatedAt,
      archived: project.archived,
      isDemo: project.isDemo,
      compound: project.compound,
      settings: project.settings,
    },
    candidates: [...bundle.candidates]
      .sort((a, b) => a.order - b.order)
      .map((c) => ({
        id: c.id,
        ionId: c.ionId,
        drugPerSalt: c.drugPerSalt,
        counterIonPerSalt: c.counterIonPerSalt,
        hydrateWater: c.hydrateWater,
        addedAt: c.addedAt,
        order: c.order,
      })),
    measurements: bundle.measurements.map((m) => ({
      id: m.id,
      candidateId: m.candidateId,
      kind: m.kind,
      value: m.value,
      unit: m.unit,
      ph: m.ph,
      temperatureK: m.temperatureK,
      medium: m.medium,
      text: m.text,
      recordedAt: m.recordedAt,
    })),
    customIons: bundle.customIons.map((ion) => ({
      id: ion.id,
      scope: ion.projectId === null ? ('shared' as const) : ('project' as const),
      overridesIonId: ion.overridesIonId,
      ion: ion.ion,
      updatedAt: ion.updatedAt,
    })),
  };
  // Validate what we write, so a file we export is always one we can read back.
  return projectFileSchema.parse(file);
}

/** Serialise a project file (pretty-printed, stable key order as built). */
export const serializeProjectFile = (file: ProjectFile): string => `${JSON.stringify(file, null, 2)}\n`;

/** A file name for the download: the project name made safe for file systems, plus the date. */
export function projectFileName(projectName: string, isoDateTime: string): string {
  const safe =
    projectName
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/^[-.]+|[-.]+$/g, '')
      .slice(0, 60) || 'project';
  return `${safe}-${isoDateTime.slice(0, 10)}.saltsmith.json`;
}
