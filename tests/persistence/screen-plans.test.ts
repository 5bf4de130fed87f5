import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { beforeEach, describe, expect, it } from 'vitest';
import { resetDbForTests } from '../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { DEMO_COMPOUND, DEMO_SCREEN_PLAN } from '@/persistence/demo-project';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';
import {
  exportProjectText,
  importProjectText,
  loadProjectBundle,
} from '@/persistence/import-project';
import { parseProjectFileText } from '@/persistence/project-file/restore';
import { PROJECT_FILE_VERSION } from '@/persistence/project-file/format';

beforeEach(async () => {
  await resetDbForTests();
});

const fixture = (name: string) =>
  readFileSync(resolve(process.cwd(), 'fixtures/files', name), 'utf8');
const crystalline = {
  outcome: 'crystalline-solid' as const,
  meltingPointC: 201,
  note: 'needles',
  counterIonId: 'mesylate',
  solventId: 'ethanol',
};

describe('screen plans in the database', () => {
  it('stores one plan per project; a plan edit keeps the outcomes; outcomes are written per well', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    const saved = await screenPlansRepo.savePlan(p.id, DEMO_SCREEN_PLAN);
    await screenPlansRepo.recordOutcome(saved.id, 'A5', crystalline);
    await screenPlansRepo.recordOutcome(saved.id, 'A6', {
      ...crystalline,
      outcome: 'oil-or-gum',
      meltingPointC: null,
    });
    await screenPlansRepo.savePlan(p.id, { ...DEMO_SCREEN_PLAN, apiMgPerWell: 20 });
    const stored = (await screenPlansRepo.forProject(p.id))!;
    expect(stored.id).toBe(saved.id);
    expect(stored.plan.apiMgPerWell).toBe(20);
    expect(Object.keys(stored.outcomes).sort()).toEqual(['A5', 'A6']);
    expect(stored.outcomes.A5).toMatchObject({ outcome: 'crystalline-solid', meltingPointC: 201 });
    await screenPlansRepo.clearOutcome(saved.id, 'A6');
    expect(Object.keys((await screenPlansRepo.forProject(p.id))!.outcomes)).toEqual(['A5']);
  });

  it('refuses an invalid plan or outcome and stores nothing', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    await expect(
      screenPlansRepo.savePlan(p.id, { ...DEMO_SCREEN_PLAN, plate: 30 as 24 }),
    ).rejects.toThrow();
    expect(await screenPlansRepo.forProject(p.id)).toBeUndefined();
    const saved = await screenPlansRepo.savePlan(p.id, DEMO_SCREEN_PLAN);
    await expect(screenPlansRepo.recordOutcome(saved.id, 'Z9', crystalline)).rejects.toThrow();
    await expect(
      screenPlansRepo.recordOutcome(saved.id, 'A1', { ...crystalline, meltingPointC: 9999 }),
    ).rejects.toThrow();
    expect((await screenPlansRepo.forProject(p.id))!.outcomes).toEqual({});
  });

  it('goes with its project: duplicated, deleted and restored with it', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    const saved = await screenPlansRepo.savePlan(p.id, DEMO_SCREEN_PLAN);
    await screenPlansRepo.recordOutcome(saved.id, 'A5', crystalline);
    const copy = await projectsRepo.duplicate(p.id);
    const copied = (await screenPlansRepo.forProject(copy.id))!;
    expect(copied.id).not.toBe(saved.id);
    expect(copied.plan).toEqual(DEMO_SCREEN_PLAN);
    expect(copied.outcomes.A5?.meltingPointC).toBe(201);
    const bundle = await projectsRepo.removeWithUndo(p.id);
    expect(await screenPlansRepo.forProject(p.id)).toBeUndefined();
    await projectsRepo.restore(bundle!);
    expect((await screenPlansRepo.forProject(p.id))!.outcomes.A5?.outcome).toBe(
      'crystalline-solid',
    );
  });
});

describe('project file version 3 (the salt-screen plan)', () => {
  it('round-trips a plan with its outcomes through export and import', async () => {
    const p = await projectsRepo.create('P', DEMO_COMPOUND);
    const saved = await screenPlansRepo.savePlan(p.id, DEMO_SCREEN_PLAN);
    await screenPlansRepo.recordOutcome(saved.id, 'A5', crystalline);
    const text = await exportProjectText(p.id);
    const file = JSON.parse(text);
    expect(file.version).toBe(3);
    expect(file.screenPlans).toHaveLength(1);
    const outcome = await importProjectText(text, { mode: 'new' });
    const back = await loadProjectBundle(outcome.projectId);
    expect(back.screenPlans).toHaveLength(1);
    expect(back.screenPlans![0]!.plan).toEqual(DEMO_SCREEN_PLAN);
    expect(back.screenPlans![0]!.outcomes.A5).toEqual(
      (await screenPlansRepo.forProject(p.id))!.outcomes.A5,
    );
    expect(back.screenPlans![0]!.projectId).toBe(outcome.projectId);
  });

  it('reads a version-2 file (before plans) through the upgrade step: no plans', () => {
    expect(PROJECT_FILE_VERSION).toBe(3);
    const file = parseProjectFileText(fixture('project-v2.saltsmith.json'));
    expect(file.version).toBe(3);
    expect(file.screenPlans).toEqual([]);
    expect(file.project.name).toBe('Demorazine screen (version-2 file)');
    expect(file.candidates.length).toBeGreaterThan(0);
    // and version 1 is upgraded through version 2 to 3
    expect(parseProjectFileText(fixture('project-v1.saltsmith.json')).screenPlans).toEqual([]);
  });

  it('refuses a version-3 file whose plan is invalid, naming the field', () => {
    const file = JSON.parse(fixture('project-v2.saltsmith.json'));
    const bad = {
      ...file,
      version: 3,
      screenPlans: [
        { id: 'x', plan: { ...DEMO_SCREEN_PLAN, plate: 12 }, outcomes: {}, updatedAt: 'now' },
      ],
    };
    expect(() => parseProjectFileText(JSON.stringify(bad))).toThrow(/screenPlans\.0\.plan\.plate/);
  });
});
