import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { getDb } from '@/persistence/db';
import { resetDbForTests } from '../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { inHouseIon } from '../support/in-house-ion';
import { ProjectFileError } from '@/persistence/project-file/errors';
import { parseProjectFileText } from '@/persistence/project-file/restore';
import type { ProjectFile } from '@/persistence/project-file/schema';
import {
  exportProjectText,
  importProjectText,
  loadProjectBundle,
  writeProjectFile,
} from '@/persistence/import-project';

const fixture = (name: string) =>
  readFileSync(resolve(process.cwd(), 'fixtures/files', name), 'utf8');

/** Everything in the database, ids included, for "nothing changed" checks. */
async function snapshot() {
  const db = getDb();
  return {
    projects: await db.projects.orderBy('id').toArray(),
    candidates: await db.candidates.orderBy('id').toArray(),
    measurements: await db.measurements.orderBy('id').toArray(),
    customIons: await db.customIons.orderBy('id').toArray(),
  };
}

/** The content of a project without ids, dates of storage or flags set by the import itself. */
async function content(projectId: string) {
  const b = await loadProjectBundle(projectId);
  // An in-house ion's library id (`ion.id`) is its record id: an id like the others, left out here.
  const withoutId = ({ id: _id, ...ion }: Record<string, unknown>) => ion;
  const ionName = new Map(b.customIons.map((i) => [i.id, JSON.stringify(withoutId(i.ion))]));
  const byCandidate = new Map(
    b.candidates.map((c) => [c.id, `${ionName.get(c.ionId) ?? c.ionId}`]),
  );
  return {
    name: b.project.name,
    compound: b.project.compound,
    settings: b.project.settings,
    candidates: b.candidates
      .sort((x, y) => x.order - y.order)
      .map(({ ionId, drugPerSalt, counterIonPerSalt, hydrateWater, addedAt, order }) => ({
        ion: ionName.get(ionId) ?? ionId,
        drugPerSalt,
        counterIonPerSalt,
        hydrateWater,
        addedAt,
        order,
      })),
    measurements: b.measurements
      .map(({ id: _i, projectId: _p, candidateId, schemaVersion: _s, ...rest }) => ({
        ...rest,
        candidate: byCandidate.get(candidateId),
      }))
      .sort((x, y) => (x.recordedAt + x.kind).localeCompare(y.recordedAt + y.kind)),
    // Ids are random, so the database's order of ions is too: compare them as a sorted list.
    customIons: b.customIons
      .map((i) => ({
        ion: withoutId(i.ion),
        overridesIonId: i.overridesIonId,
        scoped: i.projectId !== null,
      }))
      .sort((x, y) => JSON.stringify(x).localeCompare(JSON.stringify(y))),
  };
}

async function seed() {
  const p = await projectsRepo.create('Screen of the demo compound', DEMO_COMPOUND);
  await projectsRepo.updateSettings(p.id, {
    ...p.settings,
    microenvironmentPh: 6.2,
    microenvironmentPhStated: true,
    extra: { weights: { dose: 3 }, screening: { excipients: ['magnesium-stearate', 'mannitol'] } },
  });
  const own = await customIonsRepo.saveInHouse(
    inHouseIon(customIonsRepo.newInHouseId(), 'In-house ion'),
    p.id,
  );
  const shared = await customIonsRepo.save({
    projectId: null,
    overridesIonId: 'mesylate',
    ion: { name: 'Mesylate, lab pKa', charge: -1 },
  });
  const c1 = await candidatesRepo.add(p.id, 'chloride');
  const c2 = await candidatesRepo.add(p.id, 'sulfate', { drugPerSalt: 2, counterIonPerSalt: 1 });
  await candidatesRepo.add(p.id, own.id);
  await candidatesRepo.add(p.id, 'mesylate');
  await measurementsRepo.add({
    projectId: p.id,
    candidateId: c1.id,
    kind: 'solubility',
    value: 2.5,
    unit: 'mg/mL',
    ph: 1.2,
    temperatureK: 310.15,
    medium: 'SGF',
    text: '',
  });
  await measurementsRepo.add({
    projectId: p.id,
    candidateId: c2.id,
    kind: 'note',
    value: null,
    unit: '',
    ph: null,
    temperatureK: null,
    medium: '',
    text: 'plates =1+1',
  });
  return { project: p, shared };
}

beforeEach(async () => {
  await resetDbForTests();
});
afterEach(async () => {
  await resetDbForTests();
});

describe('export and import of a project', () => {
  it('exports a project, deletes it, imports it and finds it identical', async () => {
    const { project } = await seed();
    const before = await content(project.id);
    const text = await exportProjectText(project.id);
    await projectsRepo.remove(project.id);
    expect(await projectsRepo.get(project.id)).toBeUndefined();

    const outcome = await importProjectText(text, { mode: 'new' });
    expect(outcome).toMatchObject({ name: project.name, candidates: 4, measurements: 2 });
    expect(await content(outcome.projectId)).toStrictEqual(before);
  });

  it('imports beside the original with fresh ids, leaving the original alone', async () => {
    const { project } = await seed();
    const before = await snapshot();
    const outcome = await importProjectText(await exportProjectText(project.id), { mode: 'new' });
    expect(outcome.projectId).not.toBe(project.id);
    const after = await snapshot();
    expect(after.projects.find((p) => p.id === project.id)).toStrictEqual(
      before.projects.find((p) => p.id === project.id),
    );
    expect(after.candidates.filter((c) => c.projectId === project.id)).toStrictEqual(
      before.candidates,
    );
    expect(after.candidates).toHaveLength(8);
    // The shared custom ion is already here with the same content: not duplicated.
    expect(after.customIons.filter((i) => i.projectId === null)).toHaveLength(1);
    // Same content under a name that tells the two cards apart (issue 19).
    const { name: importedName, ...importedContent } = await content(outcome.projectId);
    const { name: originalName, ...originalContent } = await content(project.id);
    expect(importedContent).toStrictEqual(originalContent);
    expect(originalName).toBe(project.name);
    expect(importedName).toBe(`${project.name} (imported)`);
    expect(outcome.name).toBe(importedName);
    // A second import of the same file takes the next free name.
    const again = await importProjectText(await exportProjectText(project.id), { mode: 'new' });
    expect(again.name).toBe(`${project.name} (imported 2)`);
  });

  it('replaces an existing project after confirmation, keeping its id and creation date', async () => {
    const { project } = await seed();
    const other = await projectsRepo.create('Other', {
      ...DEMO_COMPOUND,
      name: 'Other compound (fictional)',
    });
    await candidatesRepo.add(other.id, 'tosylate');
    const text = await exportProjectText(project.id);
    const outcome = await importProjectText(text, { mode: 'replace', projectId: other.id });
    expect(outcome.projectId).toBe(other.id);
    const replaced = await projectsRepo.get(other.id);
    expect(replaced?.createdAt).toBe(other.createdAt);
    expect(replaced?.compound).toStrictEqual(project.compound);
    expect((await candidatesRepo.listForProject(other.id)).map((c) => c.ionId)).not.toContain(
      'tosylate',
    );
    const { name: _a, ...replacedContent } = await content(other.id);
    const { name: _b, ...originalContent } = await content(project.id);
    expect(replacedContent).toStrictEqual(originalContent);
  });

  it.each([
    ['project-truncated.saltsmith.json', 'truncated'],
    ['project-newer-version.saltsmith.json', 'newer-version'],
    ['project-invalid.saltsmith.json', 'invalid'],
    ['not-a-project.txt', 'not-json'],
  ])('refuses %s (%s) and leaves the database unchanged', async (name, code) => {
    const { project } = await seed();
    const before = await snapshot();
    const err = await importProjectText(fixture(name), {
      mode: 'replace',
      projectId: project.id,
    }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ProjectFileError);
    expect((err as ProjectFileError).code).toBe(code);
    expect(await snapshot()).toStrictEqual(before);
  });

  it('rolls back a replacement that fails half-way (one transaction, all or nothing)', async () => {
    const { project } = await seed();
    const before = await snapshot();
    const good = parseProjectFileText(await exportProjectText(project.id));
    // Bypass file validation to make the write itself fail after the old records were deleted.
    const broken = {
      ...good,
      measurements: [{ ...good.measurements[0], kind: 'bogus' }],
    } as unknown as ProjectFile;
    await expect(
      writeProjectFile(broken, { mode: 'replace', projectId: project.id }),
    ).rejects.toThrow();
    expect(await snapshot()).toStrictEqual(before);
  });

  it('imports a version-1 file as a new project', async () => {
    const outcome = await importProjectText(fixture('project-v1.saltsmith.json'), { mode: 'new' });
    const c = await content(outcome.projectId);
    expect(c.name).toBe('Demorazine screen (version-1 file)');
    expect(c.candidates.map((x) => [x.ion, x.drugPerSalt, x.counterIonPerSalt])).toEqual([
      ['chloride', 1, 1],
      ['sulfate', 2, 1],
      ['mesylate', 1, 1],
    ]);
    expect(c.measurements.map((m) => [m.kind, m.candidate])).toEqual(
      expect.arrayContaining([
        ['solubility', 'chloride'],
        ['note', 'mesylate'],
      ]),
    );
  });

  it('keeps a conflicting shared ion as an ion of the imported project', async () => {
    const { project, shared } = await seed();
    const text = await exportProjectText(project.id);
    await customIonsRepo.save({
      id: shared.id,
      projectId: null,
      overridesIonId: 'mesylate',
      ion: { name: 'changed since' },
    });
    const outcome = await importProjectText(text, { mode: 'new' });
    const ions = (await loadProjectBundle(outcome.projectId)).customIons;
    expect(ions.filter((i) => i.projectId === outcome.projectId).map((i) => i.ion)).toEqual(
      expect.arrayContaining([{ name: 'Mesylate, lab pKa', charge: -1 }]),
    );
    expect((await customIonsRepo.listAll()).find((i) => i.id === shared.id)?.ion).toEqual({
      name: 'changed since',
    });
  });
});
