import { z } from 'zod';
import { OLDEST_STAMP, fieldChangeSchema, type FieldChange, type FieldPatch } from './field-stamps';

/**
 * Edits that must survive the page going away. An IndexedDB write takes a few round trips between
 * the page and the browser; a reload or a closed tab in that window aborts it, and the edit is lost.
 * So every field-level write of a project is tracked here until IndexedDB confirms it, and when the
 * page is hidden or goes away (`pagehide`, `visibilitychange` → hidden) the writes still in flight are
 * copied synchronously into localStorage. The next start replays them ({@link replayUnsavedEdits})
 * through the same validated, stamped write (stamped-writes.ts). Each copy keeps the stamp its write
 * was given, so a replay never writes an old value over a newer one from another tab: a field written
 * later carries a greater stamp and the old change is dropped (field-stamps.ts). A copy whose write
 * does complete is also removed again (when the page lives long enough to see it complete).
 *
 * Debounced writers (the ranking weights) register a flush with {@link flushBeforeLeaving}: it runs
 * before the copy is taken, so their last change is in flight, and therefore in the copy, too.
 */

/** localStorage key of the copies (one JSON list). */
export const UNSAVED_EDITS_KEY = 'saltsmith.unsaved-edits';

/** One stamped field patch of one record (see stamped-writes.ts). */
const patchEditSchema = z.object({
  id: z.string(),
  kind: z.literal('patch'),
  table: z.enum(['projects', 'candidates', 'measurements', 'customIons', 'screenPlans']),
  recordId: z.string().min(1),
  patch: z.array(fieldChangeSchema),
  stamp: z.string().min(1).max(64),
});

/**
 * Copies left by a version before field stamps: read as patches with the oldest stamp, so they only
 * fill a field nothing stamped has written since.
 */
const legacyEditSchema = z.discriminatedUnion('kind', [
  z.object({
    id: z.string(),
    kind: z.literal('compound'),
    projectId: z.string().min(1),
    changes: z.record(z.string(), z.unknown()),
  }),
  z.object({
    id: z.string(),
    kind: z.literal('extra-settings'),
    projectId: z.string().min(1),
    key: z.string().min(1),
    value: z.unknown(),
  }),
]);

const unsavedEditSchema = z.union([
  patchEditSchema,
  legacyEditSchema.transform((e): UnsavedEdit => {
    const patch: FieldChange[] =
      e.kind === 'compound'
        ? Object.entries(e.changes).map(([k, value]) => ({ path: ['compound', k], value }))
        : [{ path: ['settings', 'extra', e.key], value: e.value }];
    return {
      id: e.id,
      kind: 'patch',
      table: 'projects',
      recordId: e.projectId,
      patch,
      stamp: OLDEST_STAMP,
    };
  }),
]);
/** A write kept aside: one stamped field patch of one record. */
export interface UnsavedEdit {
  id: string;
  kind: 'patch';
  table: z.infer<typeof patchEditSchema>['table'];
  recordId: string;
  patch: FieldPatch;
  stamp: string;
}
type NewEdit = Omit<UnsavedEdit, 'id'>;

const inFlight = new Map<string, UnsavedEdit>();
const flushers = new Set<() => void>();
let seq = 0;
const pageToken = Math.random().toString(36).slice(2, 10);

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null; // storage disabled: the in-memory tracking still works while the page lives
  }
}

function readCopies(): UnsavedEdit[] {
  const text = storage()?.getItem(UNSAVED_EDITS_KEY);
  if (!text) return [];
  try {
    const parsed = z.array(unsavedEditSchema).safeParse(JSON.parse(text));
    return parsed.success ? (parsed.data as UnsavedEdit[]) : [];
  } catch {
    return [];
  }
}

function writeCopies(list: UnsavedEdit[]): void {
  const s = storage();
  if (!s) return;
  try {
    if (list.length) s.setItem(UNSAVED_EDITS_KEY, JSON.stringify(list));
    else s.removeItem(UNSAVED_EDITS_KEY);
  } catch {
    /* quota: nothing more can be done synchronously */
  }
}

/** Track a write until it settles; resolves and rejects like `write`. */
export function trackWrite<T>(edit: NewEdit, write: () => Promise<T>): Promise<T> {
  const id = `${pageToken}-${++seq}`;
  inFlight.set(id, { ...edit, id });
  const settle = (stored: boolean) => {
    inFlight.delete(id);
    // Stored: a copy taken when the page was hidden is obsolete. Failed: the copy stays, because a
    // page being torn down sees its transactions abort; the next start tries again, and drops the
    // copy if the write is refused once more.
    if (stored && storage()?.getItem(UNSAVED_EDITS_KEY)?.includes(id)) {
      writeCopies(readCopies().filter((e) => e.id !== id));
    }
  };
  return write().then(
    (v) => {
      settle(true);
      return v;
    },
    (err: unknown) => {
      settle(false);
      throw err;
    },
  );
}

/** Register a function that starts a pending debounced write at once; returns an unregister. */
export function flushBeforeLeaving(flush: () => void): () => void {
  flushers.add(flush);
  return () => flushers.delete(flush);
}

/** Run the flushes and copy every write still in flight to localStorage (synchronous). */
export function stashUnsavedEdits(): number {
  for (const flush of [...flushers]) {
    try {
      flush();
    } catch {
      /* one failing flush must not stop the copy */
    }
  }
  if (inFlight.size === 0) return 0;
  const known = new Set(readCopies().map((e) => e.id));
  const fresh = [...inFlight.values()].filter((e) => !known.has(e.id));
  if (fresh.length) writeCopies([...readCopies(), ...fresh]);
  return inFlight.size;
}

/** Listen for the page being hidden or going away; returns a remover. Installed once by the shell. */
export function guardUnsavedEdits(): () => void {
  if (typeof window === 'undefined') return () => undefined;
  const onHide = () => void stashUnsavedEdits();
  const onVisibility = () => {
    if (document.visibilityState === 'hidden') stashUnsavedEdits();
  };
  window.addEventListener('pagehide', onHide);
  document.addEventListener('visibilitychange', onVisibility);
  return () => {
    window.removeEventListener('pagehide', onHide);
    document.removeEventListener('visibilitychange', onVisibility);
  };
}

/**
 * Replay the copies a page left behind (oldest first) with `apply`, then forget them. A copy that
 * no longer applies (its project deleted, a value now invalid, every field written since) is dropped.
 * Returns how many applied (`apply` says whether anything was stored).
 */
export async function replayUnsavedEdits(
  apply: (edit: UnsavedEdit) => Promise<boolean>,
): Promise<number> {
  const copies = readCopies().filter((e) => !inFlight.has(e.id));
  if (copies.length === 0) return 0;
  let applied = 0;
  for (const edit of copies) {
    try {
      if (await apply(edit)) applied++;
    } catch {
      /* dropped: see the doc comment */
    }
    writeCopies(readCopies().filter((e) => e.id !== edit.id));
  }
  return applied;
}
