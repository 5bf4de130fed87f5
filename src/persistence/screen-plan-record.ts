import type { PlatePlanInput } from '@/chem';
import { newId, nowIso } from './ids';
import { RECORD_SCHEMA_VERSION, screenPlanRecordSchema, type ScreenPlanRecord } from './records';

/** A new, valid plan record for a project (not yet stored). */
export function buildScreenPlanRecord(projectId: string, plan: PlatePlanInput): ScreenPlanRecord {
  return screenPlanRecordSchema.parse({
    id: newId('plan'),
    schemaVersion: RECORD_SCHEMA_VERSION,
    projectId,
    plan,
    outcomes: {},
    updatedAt: nowIso(),
  });
}

/**
 * A plan record with its counter-ion ids renamed (a copied project's in-house ions get new ids): the
 * plan's list, its per-ion equivalents and stocks, and each outcome's counter-ion.
 */
export function renameScreenPlanIons(
  record: ScreenPlanRecord,
  rename: (ionId: string) => string,
): ScreenPlanRecord {
  const keys = <T>(r: Record<string, T> | undefined) =>
    r && Object.fromEntries(Object.entries(r).map(([k, v]) => [rename(k), v]));
  const eq = record.plan.equivalents;
  return {
    ...record,
    plan: {
      ...record.plan,
      counterIons: record.plan.counterIons.map(rename),
      equivalents: typeof eq === 'object' && !Array.isArray(eq) ? keys(eq) : eq,
      stock: keys(record.plan.stock),
    },
    outcomes: Object.fromEntries(
      Object.entries(record.outcomes).map(([w, o]) => [
        w,
        { ...o, counterIonId: rename(o.counterIonId) },
      ]),
    ),
  };
}
