import { StrictJsonError, parseStrictJson } from '@/chem';
import { ProjectFileError, invalidFileError } from './errors';
import {
  PROJECT_FILE_FORMAT,
  PROJECT_FILE_MAX_BYTES,
  PROJECT_FILE_MAX_DEPTH,
  PROJECT_FILE_VERSION,
  appVersion,
} from './format';
import { projectFileSchema, type ProjectFile } from './schema';
import { looksTruncated } from './truncation';
import { checkFileRules } from './file-rules';
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
  checkFileRules(raw, result.data);
  return result.data;
}

/** A strict reader's refusal in the words of the project-file messages. */
function fromStrictJson(err: StrictJsonError, text: string | null): ProjectFileError {
  const where = err.path ? ` at ${err.path}` : '';
  switch (err.problem) {
    case 'too-large':
      return new ProjectFileError(
        'too-large',
        `This file is larger than ${PROJECT_FILE_MAX_BYTES / 1024 / 1024} MB, the most an export of the largest project Saltsmith holds can be.`,
      );
    case 'utf8':
      return new ProjectFileError(
        'not-json',
        'This file is not valid UTF-8 text (damaged bytes), so it cannot be a Saltsmith project file.',
      );
    case 'syntax':
      return text !== null && looksTruncated(text)
        ? new ProjectFileError(
            'truncated',
            'This file ends in the middle of its data — it was probably cut off while being copied or downloaded.',
          )
        : new ProjectFileError(
            'not-json',
            'This file is not valid JSON, so it cannot be a Saltsmith project file.',
          );
    case 'duplicate-key':
      return new ProjectFileError(
        'invalid',
        `This file gives the same field twice${where}; Saltsmith will not guess which one you meant.`,
        [`${err.path || '(file)'}: given twice`],
      );
    case 'too-deep':
      return new ProjectFileError(
        'invalid',
        `This file is nested deeper than ${PROJECT_FILE_MAX_DEPTH} levels${where}; a project file never is.`,
        [`${err.path || '(file)'}: nested too deep`],
      );
    default:
      return new ProjectFileError('invalid', `This file cannot be read${where}: ${err.message}`, [
        `${err.path || '(file)'}: ${err.message}`,
      ]);
  }
}

/**
 * Parse a file's bytes (or its text) with the one strict JSON reader (size cap, UTF-8, duplicate
 * keys, nesting) and restore it. Throws {@link ProjectFileError}.
 */
export function parseProjectFile(input: string | Uint8Array): ProjectFile {
  if ((typeof input === 'string' ? input.trim() : input.length === 0 ? '' : 'x') === '') {
    throw new ProjectFileError('empty', 'This file is empty.');
  }
  let raw: unknown;
  try {
    raw = parseStrictJson(input, {
      maxBytes: PROJECT_FILE_MAX_BYTES,
      maxDepth: PROJECT_FILE_MAX_DEPTH,
      field: 'file',
    });
  } catch (err) {
    if (!(err instanceof StrictJsonError)) throw err;
    const text = typeof input === 'string' ? input : new TextDecoder().decode(input.slice(-4096));
    throw fromStrictJson(err, text);
  }
  if (typeof input !== 'string' && raw === undefined) {
    throw new ProjectFileError('empty', 'This file is empty.');
  }
  return restoreProjectFile(raw);
}

/** Parse the text of a file and restore it (see {@link parseProjectFile}). */
export const parseProjectFileText = (text: string): ProjectFile => parseProjectFile(text);
