import { z } from 'zod';

/**
 * Field stamps: why an older value can never land over a newer one.
 *
 * Every write of a stored record is a *field patch* — a list of changes, each at one field path
 * (`['compound', 'meltingPointC']`, `['settings', 'extra', 'screening', 'weights', 'dose']`) — and the
 * whole patch carries one *stamp* taken when the write was started. The record keeps, per field path,
 * the stamp of the value it holds (`fieldStamps`, keyed by the path as a JSON Pointer, RFC 6901) and a
 * `stampFloor` (the stamp of its creation or import, standing for every field without its own stamp).
 * A change is applied only when its stamp is greater than the stamp of its path, of every ancestor and
 * of every stamped descendant; otherwise it is dropped, because the stored value is newer. Live writes,
 * debounced writes and the replays of writes a closed page left behind (unsaved-edits.ts) all go
 * through this one rule, in one IndexedDB transaction per record, so the stored value of every field
 * is the one with the greatest stamp ever written to it, whatever order the writes arrive in.
 *
 * The stamp is a hybrid logical clock (Kulkarni, Demirbas et al., "Logical Physical Clocks",
 * OPODIS 2014): the wall-clock milliseconds, a counter for writes within one millisecond or after the
 * clock stepped back, and the page's random id to break ties between tabs. The tabs of one browser
 * share its clock, so a value typed later carries a greater stamp; every stamp a page reads is also
 * "observed", so a write made after seeing a value is stamped after it even if the clock stepped back.
 * Written as a fixed-width string, stamps compare as plain strings.
 *
 * Lists whose elements all carry a string `id` (the dissolution media, for example) are *keyed*: an
 * element is a field of its own at `[...listPath, '#<id>']`, so two tabs adding different elements
 * both keep theirs, and a removal is a stamped change too (a late replay cannot bring it back). Other
 * lists are plain values. Object keys starting with '#' are therefore not allowed in stamped records.
 */

/** A field path from the record's root; `#<id>` addresses an element of a keyed list. */
export type FieldPath = readonly string[];
export type FieldChange =
  | { readonly path: FieldPath; readonly value: unknown }
  | { readonly path: FieldPath; readonly removed: true };
/** The changes of one write, applied together under one stamp. */
export type FieldPatch = readonly FieldChange[];

export const fieldChangeSchema = z.union([
  z.object({ path: z.array(z.string()).min(1).max(16), removed: z.literal(true) }),
  z.object({ path: z.array(z.string()).min(1).max(16), value: z.unknown() }),
]);

/** The stamp fields every stored record may carry (non-indexed: no Dexie version needed). */
export const stampFieldsSchema = {
  fieldStamps: z.record(z.string().max(2000), z.string().max(64)).optional(),
  stampFloor: z.string().max(64).optional(),
};
export interface Stamped {
  fieldStamps?: Record<string, string>;
  stampFloor?: string;
}

// --- The clock --------------------------------------------------------------------------------

const MS_DIGITS = 15;
const COUNTER_DIGITS = 6;

const format = (ms: number, counter: number, id: string) =>
  `${String(ms).padStart(MS_DIGITS, '0')}.${String(counter).padStart(COUNTER_DIGITS, '0')}.${id}`;

export interface StampClock {
  /** The next stamp (strictly greater than every stamp issued or observed). */
  next(now?: number): string;
  /** Take note of a stamp read from storage, so that the next stamp is greater. */
  observe(stamp: string | undefined): void;
}

/** A hybrid logical clock for one page (`id`: the tie-breaker between pages, 8 characters). */
export function createStampClock(id: string): StampClock {
  let lastMs = 0;
  let lastCounter = 0;
  return {
    next(now = Date.now()) {
      if (now > lastMs) {
        lastMs = now;
        lastCounter = 0;
      } else {
        lastCounter++;
      }
      return format(lastMs, lastCounter, id);
    },
    observe(stamp) {
      if (!stamp) return;
      const [msText, counterText] = stamp.split('.');
      const ms = Number(msText);
      const counter = Number(counterText);
      if (!Number.isFinite(ms) || !Number.isFinite(counter)) return;
      if (ms > lastMs || (ms === lastMs && counter > lastCounter)) {
        lastMs = ms;
        lastCounter = counter;
      }
    },
  };
}

const pageClock = createStampClock(Math.random().toString(36).slice(2, 10).padEnd(8, '0'));

/** The next stamp of this page (strictly greater than every stamp it issued or observed). */
export const nextStamp = (now?: number): string => pageClock.next(now);

/** Take note of a stamp read from storage, so that this page's next stamp is greater. */
export const observeStamp = (stamp: string | undefined): void => pageClock.observe(stamp);

/** The stamp that loses to every other: writes kept aside by a version without stamps carry it. */
export const OLDEST_STAMP = '0';

// --- Paths ------------------------------------------------------------------------------------

/** A field path as a JSON Pointer (RFC 6901): `/compound/meltingPointC`. */
export const pointerOf = (path: FieldPath): string =>
  path.map((s) => `/${s.replace(/~/g, '~0').replace(/\//g, '~1')}`).join('');

const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

/** A non-empty list whose elements are all objects with a distinct string `id`. */
export function isKeyedList(v: unknown): v is { id: string }[] {
  if (!Array.isArray(v) || v.length === 0) return false;
  const ids = new Set<string>();
  for (const e of v) {
    if (!isPlainObject(e) || typeof e.id !== 'string' || e.id === '' || ids.has(e.id)) return false;
    ids.add(e.id);
  }
  return true;
}

const itemSegment = (id: string) => `#${id}`;

/**
 * The changes that turn `before` into `after` at `prefix`, field by field: objects are walked,
 * keyed lists element by element (a missing element is a removal), anything else is one value.
 * A form passes the values it started from and the values it has now; only what the user changed
 * is written, so what another tab changed meanwhile is left alone.
 */
export function changesBetween(prefix: FieldPath, before: unknown, after: unknown): FieldChange[] {
  if (JSON.stringify(before) === JSON.stringify(after)) return [];
  if (isPlainObject(after) && (isPlainObject(before) || before === undefined)) {
    const was = before ?? {};
    const out: FieldChange[] = [];
    for (const key of new Set([...Object.keys(was), ...Object.keys(after)])) {
      if (key.startsWith('#')) throw new Error(`A stored field name cannot start with '#': ${key}`);
      if (!(key in after)) out.push({ path: [...prefix, key], removed: true });
      else out.push(...changesBetween([...prefix, key], was[key], after[key]));
    }
    return out;
  }
  const keyedBefore =
    before === undefined || (Array.isArray(before) && (before.length === 0 || isKeyedList(before)));
  if (keyedBefore && isKeyedList(after)) {
    const old = new Map(((before ?? []) as { id: string }[]).map((e) => [e.id, e]));
    const out: FieldChange[] = [];
    for (const e of after) {
      if (JSON.stringify(old.get(e.id)) !== JSON.stringify(e))
        out.push({ path: [...prefix, itemSegment(e.id)], value: e });
      old.delete(e.id);
    }
    for (const id of old.keys()) out.push({ path: [...prefix, itemSegment(id)], removed: true });
    return out;
  }
  if (isKeyedList(before) && Array.isArray(after) && after.length === 0) {
    return before.map((e) => ({ path: [...prefix, itemSegment(e.id)], removed: true }) as const);
  }
  return [{ path: prefix, value: after }];
}

/** The changes that set every field of `value` at `prefix` (a whole block, written field by field). */
export const changesSetting = (prefix: FieldPath, value: unknown): FieldChange[] =>
  changesBetween(prefix, undefined, value);
