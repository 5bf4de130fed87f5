import type { z } from 'zod';
import { getDb } from './db';
import { nowIso } from './ids';
import { applyFieldPatch, type PatchOutcome } from './field-patch';
import { nextStamp, type FieldPatch, type Stamped } from './field-stamps';
import {
  candidateRecordSchema,
  customIonRecordSchema,
  measurementRecordSchema,
  projectRecordSchema,
  screenPlanRecordSchema,
} from './records';
import { trackWrite } from './unsaved-edits';

/** The tables whose records take field patches, with the schema every patched record must pass. */
const TABLE_SCHEMAS = {
  projects: projectRecordSchema,
  candidates: candidateRecordSchema,
  measurements: measurementRecordSchema,
  customIons: customIonRecordSchema,
  screenPlans: screenPlanRecordSchema,
} satisfies Record<string, z.ZodType>;
export type StampedTable = keyof typeof TABLE_SCHEMAS;

/** Tables whose records carry an `updatedAt` that every stored change refreshes. */
const HAS_UPDATED_AT: ReadonlySet<StampedTable> = new Set([
  'projects',
  'customIons',
  'screenPlans',
]);

/**
 * Apply a stamped patch to one stored record in one transaction: read it, lay the changes that are
 * newer than the stored fields over it (field-patch.ts), validate the whole record with its schema and
 * store it. Nothing is written when every change is older than what is stored; an invalid result
 * throws and nothing is stored. Throws when the record does not exist (it was deleted).
 */
export async function writeFieldPatch(
  table: StampedTable,
  id: string,
  patch: FieldPatch,
  stamp: string,
): Promise<PatchOutcome<Record<string, unknown>>> {
  const db = getDb();
  const store = db.table<Stamped & Record<string, unknown>, string>(table);
  return db.transaction('rw', store, async () => {
    const current = await store.get(id);
    if (!current) throw new Error(`No ${table} record with id ${id}`);
    const outcome = applyFieldPatch(current, patch, stamp);
    if (outcome.applied === 0) return { ...outcome, record: current };
    if (HAS_UPDATED_AT.has(table)) outcome.record.updatedAt = nowIso();
    const valid = TABLE_SCHEMAS[table].parse(outcome.record) as Record<string, unknown>;
    await store.put(valid);
    return { ...outcome, record: valid };
  });
}

/**
 * THE write of the app: stamp a field patch now and store it (see field-stamps.ts). The write is
 * tracked until IndexedDB confirms it, so a page closed meanwhile leaves it to be replayed, under the
 * same stamp, on the next start — where it loses to anything written later.
 */
export function patchRecord(
  table: StampedTable,
  id: string,
  patch: FieldPatch,
): Promise<PatchOutcome<Record<string, unknown>>> {
  const stamp = nextStamp();
  return trackWrite({ kind: 'patch', table, recordId: id, patch, stamp }, () =>
    writeFieldPatch(table, id, patch, stamp),
  );
}
