/**
 * The Saltsmith project file: our own versioned JSON format (documented in README.md, "Project
 * files"). A file names its format and version, the app that wrote it and when; every file that is
 * read passes through `restoreProjectFile` (restore.ts), which upgrades older versions and validates the
 * result with zod before anything touches the database.
 */

/** The `format` tag every project file carries. */
export const PROJECT_FILE_FORMAT = 'saltsmith-project';

/**
 * The version this build writes. Version 1 is read through `upgradeV1` (upgrade-v1.ts), version 2
 * (before the salt-screen plan) through `upgradeV2` (upgrade-v2.ts).
 */
export const PROJECT_FILE_VERSION = 3;

/**
 * The largest project Saltsmith holds, enforced where data are created (a measurement, a shortlisted
 * candidate, a project's in-house ion is refused beyond it: limits.ts) and on import. The counts are
 * common practice for a salt screen with room to spare (a library of 52 counter-ions, a few hundred
 * measurements per project in use); `exportBytes` bounds the project's file: an addition that would
 * make the project's export larger is refused, so every export stays under {@link PROJECT_FILE_MAX_BYTES}.
 */
export const PROJECT_LIMITS = {
  candidates: 500,
  measurements: 20_000,
  customIons: 1_000,
  screenPlans: 10,
  /** UTF-8 bytes of the project's export (compact JSON), checked when data are added. */
  exportBytes: 32 * 1024 * 1024 - 64 * 1024,
} as const;

/** Upper bounds on list lengths in a file: the project limits. */
export const PROJECT_FILE_LIMITS = PROJECT_LIMITS;

/**
 * Largest file accepted, in UTF-8 bytes, checked before the file is read: what an export of the
 * largest project can be ({@link PROJECT_LIMITS}.exportBytes) plus 64 KiB for the file's envelope and
 * the edits that do not grow a project by much (names, compound fields, settings).
 */
export const PROJECT_FILE_MAX_BYTES = 32 * 1024 * 1024;

/** Deepest nesting of arrays and objects a project file may have (the format itself needs 8). */
export const PROJECT_FILE_MAX_DEPTH = 32;

/** The version of this build (from package.json at build time), or "unknown" outside a build. */
export function appVersion(): string {
  return typeof __APP_VERSION__ === 'string' ? __APP_VERSION__ : 'unknown';
}
