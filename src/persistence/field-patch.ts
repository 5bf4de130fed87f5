import {
  isKeyedList,
  observeStamp,
  pointerOf,
  type FieldChange,
  type FieldPatch,
  type FieldPath,
  type Stamped,
} from './field-stamps';

/** Segments that would reach an object's prototype: never part of a stored field path. */
const FORBIDDEN = new Set(['__proto__', 'constructor', 'prototype']);

type Obj = Record<string, unknown>;
const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The greatest stamp standing in the way of a change at `pointer` (itself, ancestors, descendants). */
function blockingStamp(stamps: Record<string, string>, floor: string, pointer: string): string {
  let max = floor;
  const consider = (s: string | undefined) => {
    if (s !== undefined && s > max) max = s;
  };
  consider(stamps[pointer]);
  for (let i = pointer.lastIndexOf('/'); i > 0; i = pointer.lastIndexOf('/', i - 1)) {
    consider(stamps[pointer.slice(0, i)]);
  }
  const below = `${pointer}/`;
  for (const [key, s] of Object.entries(stamps)) if (key.startsWith(below)) consider(s);
  return max;
}

/** The object holding the field at `path` (intermediate objects created), inside `root`. */
function parentOf(root: Obj, path: FieldPath): Obj {
  let node: Obj = root;
  for (const segment of path.slice(0, -1)) {
    if (segment.startsWith('#'))
      throw new Error(`A list element has no fields: ${pointerOf(path)}`);
    if (!isObj(node[segment])) node[segment] = {};
    node = node[segment] as Obj;
  }
  return node;
}

/** Set or remove the value at `change.path` inside `root` (a deep copy the caller owns). */
function writeAt(root: Obj, change: FieldChange): void {
  const last = change.path[change.path.length - 1]!;
  if (last.startsWith('#')) {
    if (change.path.length < 2) throw new Error('A list element needs its list');
    const listPath = change.path.slice(0, -1);
    const parent = parentOf(root, listPath);
    writeItem(parent, listPath[listPath.length - 1]!, last.slice(1), change);
    return;
  }
  const parent = parentOf(root, change.path);
  if ('removed' in change) delete parent[last];
  else parent[last] = change.value;
}

/** Apply one change to a keyed-list element: `parent[listKey]` is the list. */
function writeItem(parent: Obj, listKey: string, id: string, change: FieldChange): void {
  const current = parent[listKey];
  const list =
    Array.isArray(current) && (current.length === 0 || isKeyedList(current)) ? current : [];
  const at = list.findIndex((e: { id: string }) => e.id === id);
  const next = [...list] as unknown[];
  if ('removed' in change) {
    if (at >= 0) next.splice(at, 1);
  } else {
    const value = change.value;
    if (!isObj(value) || value.id !== id) throw new Error(`The element must carry the id "${id}"`);
    if (at >= 0) next[at] = value;
    else next.push(value);
  }
  parent[listKey] = next;
}

export interface PatchOutcome<T> {
  record: T;
  /** Changes applied (their stamp was the newest for their field). */
  applied: number;
  /** Changes dropped because the stored field holds a newer value. */
  dropped: number;
}

/**
 * Lay a stamped patch over a stored record (pure; see field-stamps.ts for the rule). The record is
 * copied; each change lands only if `stamp` is newer than every stamp on its path, and its field then
 * takes `stamp`. The caller validates the result with the record's schema before storing it.
 */
export function applyFieldPatch<T extends Stamped>(
  stored: T,
  patch: FieldPatch,
  stamp: string,
): PatchOutcome<T> {
  const record = structuredClone(stored) as T & Obj;
  const stamps: Record<string, string> = { ...(stored.fieldStamps ?? {}) };
  const floor = stored.stampFloor ?? '';
  observeStamp(floor);
  for (const s of Object.values(stamps)) observeStamp(s);
  let applied = 0;
  let dropped = 0;
  for (const change of patch) {
    if (change.path.length === 0 || change.path.some((s) => FORBIDDEN.has(s))) {
      throw new Error(`Not a field path: ${pointerOf(change.path)}`);
    }
    if (change.path[0] === 'fieldStamps' || change.path[0] === 'stampFloor') {
      throw new Error('The stamps are not a field');
    }
    const pointer = pointerOf(change.path);
    if (stamp <= blockingStamp(stamps, floor, pointer)) {
      dropped++;
      continue;
    }
    writeAt(record, change);
    for (const key of Object.keys(stamps)) if (key.startsWith(`${pointer}/`)) delete stamps[key];
    stamps[pointer] = stamp;
    applied++;
  }
  if (applied > 0) record.fieldStamps = stamps;
  return { record, applied, dropped };
}
