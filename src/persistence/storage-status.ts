import { getDb } from './db';

/**
 * The browser's storage, seen from the workbench: whether it promised to keep our data
 * (`navigator.storage.persist()`), how much is used, and what a storage failure means in plain words.
 * Everything here degrades gracefully where the Storage API is missing (older browsers, jsdom).
 */

/** The answer to "will the browser keep this data under storage pressure?". */
export type PersistenceAnswer = 'kept' | 'not-promised' | 'unsupported';

/** Ask the browser to keep the workbench's data (it may grant silently, prompt, or refuse). */
export async function requestPersistence(): Promise<PersistenceAnswer> {
  const storage = typeof navigator !== 'undefined' ? navigator.storage : undefined;
  if (!storage || typeof storage.persist !== 'function') return 'unsupported';
  try {
    if (typeof storage.persisted === 'function' && (await storage.persisted())) return 'kept';
    return (await storage.persist()) ? 'kept' : 'not-promised';
  } catch {
    return 'unsupported';
  }
}

export interface StorageUsage {
  usageBytes: number;
  quotaBytes: number;
}

/** Bytes used and available to this site, or null where the browser does not say. */
export async function estimateStorage(): Promise<StorageUsage | null> {
  const storage = typeof navigator !== 'undefined' ? navigator.storage : undefined;
  if (!storage || typeof storage.estimate !== 'function') return null;
  try {
    const e = await storage.estimate();
    if (typeof e.usage !== 'number' || typeof e.quota !== 'number') return null;
    return { usageBytes: e.usage, quotaBytes: e.quota };
  } catch {
    return null;
  }
}

export type StorageProblemKind = 'quota' | 'blocked' | 'closed' | 'unavailable' | 'other';

export interface StorageProblem {
  kind: StorageProblemKind;
  /** What happened and what to do, for the banner. */
  message: string;
  /** The underlying error's name and message, for a bug report. */
  technical: string;
}

function errorChain(err: unknown): { name: string; message: string }[] {
  const chain: { name: string; message: string }[] = [];
  let cur: unknown = err;
  for (let i = 0; i < 5 && cur && typeof cur === 'object'; i++) {
    const e = cur as { name?: unknown; message?: unknown; inner?: unknown; cause?: unknown };
    chain.push({ name: String(e.name ?? ''), message: String(e.message ?? '') });
    cur = e.inner ?? e.cause;
  }
  return chain;
}

/**
 * Turn an IndexedDB/Dexie failure into a plain message, or null when the error is not a storage
 * failure at all. Error names are those of the IndexedDB spec (W3C Indexed Database API 3.0:
 * QuotaExceededError, VersionError, InvalidStateError, UnknownError) and Dexie 4's wrappers
 * (DatabaseClosedError, OpenFailedError, MissingAPIError).
 */
export function classifyStorageError(err: unknown): StorageProblem | null {
  const chain = errorChain(err);
  if (chain.length === 0) return null;
  const names = chain.map((c) => c.name);
  const technical = chain.map((c) => `${c.name}: ${c.message}`).join(' ← ');
  const has = (...n: string[]) => names.some((x) => n.includes(x));
  if (has('QuotaExceededError') || chain.some((c) => /quota/i.test(c.message))) {
    return {
      kind: 'quota',
      technical,
      message:
        'The browser refused to store more data (storage quota reached). Your last change was NOT saved. Export your project to a file now, then free space (delete archived projects or other sites’ data).',
    };
  }
  if (has('BlockedError', 'VersionError') || chain.some((c) => /blocked/i.test(c.message))) {
    return {
      kind: 'blocked',
      technical,
      message:
        'Saltsmith is open in another tab with an older or newer version, which blocks the database. Close the other Saltsmith tabs and reload this one; changes made meanwhile may not be saved.',
    };
  }
  if (has('DatabaseClosedError', 'InvalidStateError')) {
    return {
      kind: 'closed',
      technical,
      message:
        'The database was closed (another tab upgraded Saltsmith, or the browser cleared site data). Reload the page; your last change may not have been saved.',
    };
  }
  if (has('MissingAPIError', 'OpenFailedError', 'UnknownError')) {
    return {
      kind: 'unavailable',
      technical,
      message:
        'The browser will not let Saltsmith store data here (private window, disabled site storage, or a disk error). Nothing you enter can be kept: export to a file before closing the tab.',
    };
  }
  if (
    chain.some((c) =>
      /^(Dexie|IDB)|IndexedDB|AbortError|ConstraintError|DataError/i.test(`${c.name} ${c.message}`),
    )
  ) {
    return {
      kind: 'other',
      technical,
      message:
        'Saving failed because of a storage error. Your last change may not have been saved; try again, or export your project to a file.',
    };
  }
  return null;
}

/**
 * Watch the shared database for another tab asking to change its version (we close and say so) and
 * for our own open being blocked. `onProblem` receives the plain message. Returns an unsubscribe.
 */
export function watchDatabase(onProblem: (p: StorageProblem) => void): () => void {
  const db = getDb();
  const onBlocked = () =>
    onProblem({
      kind: 'blocked',
      technical: 'Dexie "blocked" event',
      message:
        'Another Saltsmith tab is keeping the database on an older version. Close the other tabs and reload this one; until then changes may not be saved.',
    });
  const onVersionChange = () => {
    onProblem({
      kind: 'closed',
      technical: 'Dexie "versionchange" event',
      message:
        'Another Saltsmith tab is upgrading or deleting the database, so this tab let go of it. Reload this tab to continue; edits made here until then are not saved.',
    });
    // Dexie's own handler closes the connection, so the other tab can go ahead.
  };
  db.on('blocked', onBlocked);
  db.on('versionchange', onVersionChange);
  return () => {
    db.on('blocked').unsubscribe(onBlocked);
    db.on('versionchange').unsubscribe(onVersionChange);
  };
}
