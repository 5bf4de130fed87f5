import { ProjectFileError, invalidFileError } from './errors';
import {
  PROJECT_FILE_FORMAT,
  PROJECT_FILE_MAX_BYTES,
  PROJECT_FILE_VERSION,
  appVersion,
} from './format';
import { projectFileSchema, type ProjectFile } from './schema';
import { looksTruncated } from './truncation';
import { upgradeV1 } from './upgrade-v1';
import { upgradeV2 } from './upgrade-v2';

/**
 * The single restore/upgrade path: take any parsed JSON value, check the format tag and version,
 * upgrade older versions step by step and validate the result. Throws {@link ProjectFileError}.
 */
export function restoreProjectFile(raw: unknown): ProjectFile {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw new ProjectFileError(
      'not-a-project-file',
      'This file is JSON but not a Saltsmith project file (expected an object).',
    );
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
    throw new ProjectFileError(
      'invalid',
      `This project file has no valid "version" (found ${JSON.stringify(version ?? null)}).`,
    );
  }
  if (version > PROJECT_FILE_VERSION) {
    throw new ProjectFileError(
      'newer-version',
      `This project file is format version ${version}, written by a newer Saltsmith; this one (${appVersion()}) reads versions up to ${PROJECT_FILE_VERSION}. Update Saltsmith to open it.`,
    );
  }
  let current: unknown = raw;
  if (version === 1) current = upgradeV1(current);
  if (version <= 2) current = upgradeV2(current);
  const result = projectFileSchema.safeParse(current);
  if (!result.success) throw invalidFileError(result.error);
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
    throw new ProjectFileError(
      'not-json',
      'This file is not valid JSON, so it cannot be a Saltsmith project file.',
    );
  }
  return restoreProjectFile(raw);
}
