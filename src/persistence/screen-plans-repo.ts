import type { PlatePlanInput, WellOutcome } from '@/chem';
import { getDb } from './db';
import { nowIso } from './ids';
import { screenPlanRecordSchema, storedWellOutcomeSchema, type ScreenPlanRecord } from './records';
import { buildScreenPlanRecord } from './screen-plan-record';
import { patchRecord } from './stamped-writes';

export { buildScreenPlanRecord, renameScreenPlanIons } from './screen-plan-record';

/** The salt-screen plan of each project (one per project) and the outcomes recorded per well. */
export const screenPlansRepo = {
  forProject: (projectId: string): Promise<ScreenPlanRecord | undefined> =>
    getDb().screenPlans.where('projectId').equals(projectId).first(),

  /**
   * Store the plan of a project (creating its record on first save). Only the `plan` field is written,
   * so outcomes recorded meanwhile in another tab stay. An invalid plan throws and nothing changes.
   */
  savePlan: async (projectId: string, plan: PlatePlanInput): Promise<ScreenPlanRecord> => {
    const db = getDb();
    return db.transaction('rw', db.screenPlans, async () => {
      const current = await db.screenPlans.where('projectId').equals(projectId).first();
      const next = current
        ? screenPlanRecordSchema.parse({ ...current, plan, updatedAt: nowIso() })
        : buildScreenPlanRecord(projectId, plan);
      if (current)
        await db.screenPlans.update(current.id, { plan: next.plan, updatedAt: next.updatedAt });
      else await db.screenPlans.add(next);
      return next;
    });
  },

  /** Record what came out of one well (field-level: other wells' outcomes are not rewritten). */
  recordOutcome: async (
    planId: string,
    well: string,
    outcome: WellOutcome & { counterIonId: string; solventId: string },
  ): Promise<void> => {
    if (!/^[A-H](?:[1-9]|1[0-2])$/.test(well)) throw new Error(`"${well}" is not a well name`);
    const stored = storedWellOutcomeSchema.parse({ ...outcome, recordedAt: nowIso() });
    // A stamped field patch of this one well: other wells' outcomes are not rewritten, and an older
    // write (another tab, a replay) never lands over a newer outcome of the same well.
    await patchRecord('screenPlans', planId, [{ path: ['outcomes', well], value: stored }]);
  },

  /** Forget the outcome of one well. */
  clearOutcome: async (planId: string, well: string): Promise<void> => {
    const db = getDb();
    const current = await db.screenPlans.get(planId);
    if (!current) return;
    await patchRecord('screenPlans', planId, [{ path: ['outcomes', well], removed: true }]);
  },
};
