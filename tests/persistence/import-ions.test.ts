import { beforeEach, describe, expect, it } from 'vitest';
import { COUNTER_IONS, getCounterIon, mergeLibrary } from '@/chem';
import { getDb } from '@/persistence/db';
import { resetDbForTests } from '../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { ProjectFileError } from '@/persistence/project-file/errors';
import { exportProjectText, importProjectText } from '@/persistence/import-project';
import { inHouseIonPayload } from '../support/in-house-ion';

// Issue 13: an imported in-house ion could take a bundled ion's id (`mesylate`, with pKa 11) and change
// the ranking of a project that was never touched; an invalid stored ion broke every project.

beforeEach(async () => {
  await resetDbForTests();
});

async function snapshot() {
  const db = getDb();
  return {
    projects: await db.projects.orderBy('id').toArray(),
    candidates: await db.candidates.orderBy('id').toArray(),
    customIons: await db.customIons.orderBy('id').toArray(),
  };
}

/** A project file with one shared in-house ion under `ionId`, shortlisted. */
async function fileWithSharedIon(ionId: string, ion: Record<string, unknown>): Promise<string> {
  const source = await projectsRepo.create('Source', DEMO_COMPOUND);
  await candidatesRepo.add(source.id, 'chloride');
  const text = await exportProjectText(source.id);
  await projectsRepo.remove(source.id);
  const file = JSON.parse(text) as { candidates: Record<string, unknown>[]; customIons: unknown[] };
  file.candidates.push({ ...file.candidates[0], id: 'cand_imported', ionId, order: 1 });
  file.customIons.push({
    id: ionId,
    scope: 'shared',
    overridesIonId: null,
    ion,
    updatedAt: '2026-12-01T00:00:00.000Z',
  });
  return JSON.stringify(file);
}

const libraryOf = async (projectId: string) =>
  mergeLibrary(COUNTER_IONS, await customIonsRepo.listAll(), projectId);

describe('imported in-house ions never shadow another ion', () => {
  it('a shared ion with the bundled id "mesylate" comes in under a fresh id; other projects keep the bundled Mesylate', async () => {
    const untouched = await projectsRepo.create('Untouched', DEMO_COMPOUND);
    await candidatesRepo.add(untouched.id, 'mesylate');
    const bundledPKa = getCounterIon('mesylate')!.pKas[0]!.value;
    expect(bundledPKa).toBeLessThan(0); // methanesulfonic acid is a strong acid (library value)

    const text = await fileWithSharedIon('mesylate', inHouseIonPayload('mesylate', 'Mesylate', 11));
    const outcome = await importProjectText(text, { mode: 'new' });

    const seen = (await libraryOf(untouched.id)).ions.filter((i) => i.name === 'Mesylate');
    expect(seen).toHaveLength(1);
    expect(seen[0]!.pKas[0]!.value).toBe(bundledPKa);
    // The imported project keeps its own ion (pKa 11) under a new id, and its candidate points at it.
    const imported = await candidatesRepo.listForProject(outcome.projectId);
    const ionId = imported.find((c) => c.ionId !== 'chloride')!.ionId;
    expect(ionId).not.toBe('mesylate');
    const own = (await libraryOf(outcome.projectId)).ions.find((i) => i.id === ionId)!;
    expect(own.pKas[0]!.value).toBe(11);
    expect((await customIonsRepo.listAll()).find((r) => r.id === ionId)?.projectId).toBe(
      outcome.projectId,
    );
  });

  it('a shared ion whose id another project already uses for a different ion comes in under a fresh id', async () => {
    const other = await projectsRepo.create('Other', DEMO_COMPOUND);
    await customIonsRepo.saveInHouse(
      inHouseIonPayload('inhouse_lab1', 'Lab ion A', -1) as never,
      other.id,
    );
    const text = await fileWithSharedIon(
      'inhouse_lab1',
      inHouseIonPayload('inhouse_lab1', 'Lab ion B', 3),
    );
    await importProjectText(text, { mode: 'new' });
    const mine = (await libraryOf(other.id)).ions.filter((i) => i.id === 'inhouse_lab1');
    expect(mine.map((i) => i.name)).toEqual(['Lab ion A']);
  });

  it('refuses an ion payload the library schema refuses ({"name": 5}) and leaves the database unchanged', async () => {
    const text = await fileWithSharedIon('inhouse_bad', { name: 5 });
    const before = await snapshot();
    await expect(importProjectText(text, { mode: 'new' })).rejects.toThrow(ProjectFileError);
    await expect(importProjectText(text, { mode: 'new' })).rejects.toThrow(/customIons\.0\.ion/);
    expect(await snapshot()).toStrictEqual(before);
  });

  it('refuses an in-house ion whose library id differs from its record id', async () => {
    const text = await fileWithSharedIon('inhouse_x', inHouseIonPayload('mesylate'));
    await expect(importProjectText(text, { mode: 'new' })).rejects.toThrow(/ion\.id/);
  });
});

describe('a stored invalid or shadowing in-house record', () => {
  it('is left out of every library and reported, and the other ions stay', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    // Records written by an older build, straight into the table (the repository would refuse them).
    await getDb().customIons.bulkPut([
      {
        id: 'inhouse_bad',
        schemaVersion: 1,
        projectId: null,
        overridesIonId: null,
        ion: { name: 5 },
        updatedAt: 'x',
      },
      {
        id: 'mesylate',
        schemaVersion: 1,
        projectId: null,
        overridesIonId: null,
        ion: inHouseIonPayload('mesylate', 'Mesylate', 11),
        updatedAt: 'x',
      },
    ]);
    await customIonsRepo.saveInHouse(inHouseIonPayload('inhouse_ok', 'Lab ion') as never);
    const lib = await libraryOf(p.id);
    expect(lib.rejected.map((r) => r.recordId).sort()).toEqual(['inhouse_bad', 'mesylate']);
    expect(lib.ions.filter((i) => i.id === 'mesylate')).toHaveLength(1);
    expect(lib.ions.find((i) => i.id === 'mesylate')!.origin).toBe('bundled');
    expect(lib.ions.some((i) => i.id === 'inhouse_ok')).toBe(true);
  });
});

describe('duplicating a project', () => {
  it('gives the copy its own ions (record and library id) and points its shortlist at them', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    const ion = await customIonsRepo.saveInHouse(
      inHouseIonPayload('inhouse_own', 'Own ion') as never,
      p.id,
    );
    await candidatesRepo.add(p.id, ion.id);
    const copy = await projectsRepo.duplicate(p.id);
    const [cand] = await candidatesRepo.listForProject(copy.id);
    expect(cand!.ionId).not.toBe('inhouse_own');
    const lib = await libraryOf(copy.id);
    expect(lib.rejected).toEqual([]);
    expect(lib.ions.find((i) => i.id === cand!.ionId)?.name).toBe('Own ion');
  });
});
