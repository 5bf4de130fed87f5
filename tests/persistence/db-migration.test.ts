import Dexie from 'dexie';
import { afterEach, describe, expect, it } from 'vitest';
import { SaltsmithDb } from '@/persistence/db';
import { DEMO_COMPOUND, DEMO_SCREEN_PLAN } from '@/persistence/demo-project';
import { buildProject } from '@/persistence/projects-bundle';

/** Opening a database written by version 1 (before the salt-screen plan) with the current schema. */
const NAME = 'saltsmith-migration-test';

/** The version-1 schema exactly as released (db.ts, version(1)). */
function openVersion1() {
  const v1 = new Dexie(NAME);
  v1.version(1).stores({
    projects: 'id, updatedAt, archived',
    candidates: 'id, projectId, ionId, [projectId+ionId]',
    measurements: 'id, projectId, candidateId, kind',
    customIons: 'id, projectId, overridesIonId',
    settings: 'key',
  });
  return v1;
}

afterEach(async () => {
  await Dexie.delete(NAME);
});

describe('Dexie version 1 → 2 (salt-screen plans)', () => {
  it('keeps every version-1 record, adds the plan table and gives the demo project its example plan', async () => {
    const demo = buildProject('Demo', DEMO_COMPOUND, true);
    const mine = buildProject('Mine', DEMO_COMPOUND, false);
    const candidate = {
      id: 'c1',
      schemaVersion: 1,
      projectId: mine.id,
      ionId: 'mesylate',
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      hydrateWater: 0,
      addedAt: mine.createdAt,
      order: 0,
    };
    const v1 = openVersion1();
    await v1.table('projects').bulkAdd([demo, mine]);
    await v1.table('candidates').add(candidate);
    await v1.table('settings').put({ key: 'demoSeeded', value: true });
    v1.close();

    const db = new SaltsmithDb(NAME);
    await db.open();
    expect(db.verno).toBe(2);
    expect(await db.projects.count()).toBe(2);
    expect(await db.projects.get(mine.id)).toEqual(mine);
    expect(await db.candidates.get('c1')).toEqual(candidate);
    expect(await db.settings.get('demoSeeded')).toEqual({ key: 'demoSeeded', value: true });
    const plans = await db.screenPlans.toArray();
    expect(plans).toHaveLength(1);
    expect(plans[0]!.projectId).toBe(demo.id);
    expect(plans[0]!.plan).toEqual(DEMO_SCREEN_PLAN);
    expect(plans[0]!.outcomes).toEqual({});
    // one plan per project: the index refuses a second plan for the demo
    await expect(db.screenPlans.add({ ...plans[0]!, id: 'other' })).rejects.toThrow();
    db.close();
  });
});
