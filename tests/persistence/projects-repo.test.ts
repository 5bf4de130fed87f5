import { beforeEach, describe, expect, it } from 'vitest';
import { resetDbForTests } from '../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo, saltStoichiometry } from '@/persistence/candidates-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { DEMO_COMPOUND, DEMO_SHORTLIST } from '@/persistence/demo-project';

beforeEach(async () => {
  await resetDbForTests();
});

const solubility = (projectId: string, candidateId: string, value: number) => ({
  projectId,
  candidateId,
  kind: 'solubility' as const,
  value,
  unit: 'mg/mL',
  ph: 1.2,
  temperatureK: 310.15,
  medium: 'simulated gastric fluid',
  text: '',
});

describe('saltStoichiometry (electroneutrality: Σ charges of a formula unit = 0)', () => {
  it.each([
    [1, -1, 1, 1],
    [1, -2, 2, 1], // hemisulfate of a monobasic drug
    [2, -1, 1, 2], // dihydrochloride of a dibasic drug
    [-1, 2, 2, 1], // calcium salt of a monoprotic acid
    [2, -3, 3, 2],
  ])('drug %i with counter-ion %i → %i:%i', (zd, zc, d, c) => {
    const s = saltStoichiometry(zd, zc);
    expect(s).toEqual({ drugPerSalt: d, counterIonPerSalt: c });
    expect(s.drugPerSalt * zd + s.counterIonPerSalt * zc).toBe(0);
  });
});

describe('projectsRepo', () => {
  it('seeds the demo once, with its shortlist in order and charge-balanced', async () => {
    const id = await projectsRepo.ensureDemo();
    expect(id).not.toBeNull();
    expect(await projectsRepo.ensureDemo()).toBeNull();
    const cands = await candidatesRepo.listForProject(id!);
    expect(cands.map((c) => c.ionId)).toEqual(DEMO_SHORTLIST);
    const sulfate = cands.find((c) => c.ionId === 'sulfate')!;
    expect(sulfate.drugPerSalt * DEMO_COMPOUND.ionCharge - 2 * sulfate.counterIonPerSalt).toBe(0);
  });

  it('duplicates a project with its shortlist and measurements re-linked to the copies', async () => {
    const p = await projectsRepo.create('Base A', { ...DEMO_COMPOUND, name: 'Base A' });
    const c1 = await candidatesRepo.add(p.id, 'chloride');
    const c2 = await candidatesRepo.add(p.id, 'mesylate');
    await measurementsRepo.add(solubility(p.id, c1.id, 1.5));
    await measurementsRepo.add(solubility(p.id, c2.id, 3));
    const copy = await projectsRepo.duplicate(p.id);
    expect(copy.name).toBe('Base A (copy)');
    expect(copy.isDemo).toBe(false);
    const copyCands = await candidatesRepo.listForProject(copy.id);
    expect(copyCands.map((c) => c.ionId)).toEqual(['chloride', 'mesylate']);
    expect(copyCands.every((c) => c.id !== c1.id && c.id !== c2.id)).toBe(true);
    const copyMeas = await measurementsRepo.listForProject(copy.id);
    expect(copyMeas).toHaveLength(2);
    const byIon = new Map(copyCands.map((c) => [c.id, c.ionId]));
    expect(copyMeas.map((m) => `${byIon.get(m.candidateId)}:${m.value}`).sort()).toEqual([
      'chloride:1.5',
      'mesylate:3',
    ]);
    // the original is untouched
    expect(await measurementsRepo.listForProject(p.id)).toHaveLength(2);
  });

  it('deletes with undo: everything comes back exactly', async () => {
    const p = await projectsRepo.create('Base B', { ...DEMO_COMPOUND, name: 'Base B' });
    const c = await candidatesRepo.add(p.id, 'tosylate');
    await measurementsRepo.add(solubility(p.id, c.id, 0.4));
    const before = await projectsRepo.bundle(p.id);
    const removed = await projectsRepo.removeWithUndo(p.id);
    expect(await projectsRepo.get(p.id)).toBeUndefined();
    expect(await measurementsRepo.listForProject(p.id)).toHaveLength(0);
    await projectsRepo.restore(removed!);
    expect(await projectsRepo.bundle(p.id)).toEqual(before);
  });

  it('resets the demo: a fresh demo with its shortlist replaces the edited one', async () => {
    const first = (await projectsRepo.ensureDemo())!;
    await projectsRepo.rename(first, 'Edited demo');
    const second = await projectsRepo.resetDemo();
    expect(await projectsRepo.get(first)).toBeUndefined();
    const demo = await projectsRepo.get(second);
    expect(demo?.name).toContain('Demorazine');
    expect((await candidatesRepo.listForProject(second)).length).toBe(DEMO_SHORTLIST.length);
  });

  it('keeps extra settings blocks side by side', async () => {
    const p = await projectsRepo.create('Base C', { ...DEMO_COMPOUND, name: 'Base C' });
    await projectsRepo.updateExtraSettings(p.id, 'screening', { a: 1 });
    await projectsRepo.updateExtraSettings(p.id, 'other', { b: 2 });
    expect((await projectsRepo.get(p.id))?.settings.extra).toEqual({
      screening: { a: 1 },
      other: { b: 2 },
    });
  });
});

describe('field-level compound writes (issue 13: two tabs on one project)', () => {
  it('a tab that writes log P leaves the melting point another tab stored', async () => {
    const p = await projectsRepo.create('P', { ...DEMO_COMPOUND, meltingPointC: 184 });
    await projectsRepo.patchCompound(p.id, { meltingPointC: 150 }); // tab A
    await projectsRepo.patchCompound(p.id, { logP: 2.7, logPOrigin: 'measured' }); // tab B, still showing 184
    const stored = (await projectsRepo.get(p.id))!.compound;
    expect(stored.meltingPointC).toBe(150);
    expect(stored.logP).toBe(2.7);
  });

  it('refuses a change that makes the stored compound invalid and keeps what was stored', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    await expect(projectsRepo.patchCompound(p.id, { meltingPointC: 5000 })).rejects.toThrow();
    expect((await projectsRepo.get(p.id))!.compound).toStrictEqual(p.compound);
  });

  it('writes one settings field without touching the extra blocks another tab stored', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    await projectsRepo.updateExtraSettings(p.id, 'screening', { weights: { a: 1 } });
    await projectsRepo.updateSettings(p.id, { temperatureC: 25 });
    const stored = (await projectsRepo.get(p.id))!.settings;
    expect(stored.temperatureC).toBe(25);
    expect(stored.extra.screening).toEqual({ weights: { a: 1 } });
  });
});
