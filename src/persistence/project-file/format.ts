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

/** Largest file accepted, in bytes (UTF-16 code units of the text, a close upper bound for ASCII JSON). */
export const PROJECT_FILE_MAX_BYTES = 5 * 1024 * 1024;

/** Upper bounds on list lengths, so a hostile file cannot make the import run for minutes. */
export const PROJECT_FILE_LIMITS = {
  candidates: 500,
  measurements: 20_000,
  customIons: 1_000,
  screenPlans: 10,
} as const;

/** The version of this build (from package.json at build time), or "unknown" outside a build. */
export function appVersion(): string {
  return typeof __APP_VERSION__ === 'string' ? __APP_VERSION__ : 'unknown';
}
