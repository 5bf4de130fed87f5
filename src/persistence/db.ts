import Dexie, { type Table } from 'dexie';
import { DEMO_SCREEN_PLAN } from './demo-project';
import { buildScreenPlanRecord } from './screen-plan-record';
import type {
  CandidateRecord,
  CustomIonRecord,
  MeasurementRecord,
  ProjectRecord,
  ScreenPlanRecord,
  SettingRecord,
} from './records';

/** Name of the IndexedDB database. Kept in one place (see DEVELOPERS.md, "Storage"). */
export const DB_NAME = 'saltsmith';

/**
 * The one Dexie database of the workbench. This file is the only place the schema is declared.
 * A released `version(n)` is never edited: add `version(n + 1)` with an `upgrade()` instead.
 */
export class SaltsmithDb extends Dexie {
  projects!: Table<ProjectRecord, string>;
  candidates!: Table<CandidateRecord, string>;
  measurements!: Table<MeasurementRecord, string>;
  customIons!: Table<CustomIonRecord, string>;
  settings!: Table<SettingRecord, string>;
  screenPlans!: Table<ScreenPlanRecord, string>;

  constructor(name = DB_NAME) {
    super(name);
    this.version(1).stores({
      projects: 'id, updatedAt, archived',
      candidates: 'id, projectId, ionId, [projectId+ionId]',
      measurements: 'id, projectId, candidateId, kind',
      customIons: 'id, projectId, overridesIonId',
      settings: 'key',
    });
    // Version 2 (the salt-screen plan): one new table, one plan record per project with its well
    // outcomes. No existing record changes; the upgrade gives an existing demo project the demo's
    // example plan, as a freshly seeded demo gets (tests/persistence/db-migration.test.ts).
    this.version(2)
      .stores({ screenPlans: 'id, &projectId' })
      .upgrade(async (tx) => {
        const demos = await tx
          .table<ProjectRecord, string>('projects')
          .filter((p) => p.isDemo)
          .toArray();
        for (const p of demos) {
          await tx.table('screenPlans').add(buildScreenPlanRecord(p.id, DEMO_SCREEN_PLAN));
        }
      });
  }
}

let instance: SaltsmithDb | null = null;

/** The shared database handle (created on first use). */
export function getDb(): SaltsmithDb {
  instance ??= new SaltsmithDb();
  return instance;
}

/**
 * Close and forget the shared handle; the next {@link getDb} opens a fresh one. (Tests delete the
 * database after this: tests/support/db.ts.)
 */
export function closeDb(): void {
  instance?.close();
  instance = null;
}
