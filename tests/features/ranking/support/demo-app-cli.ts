import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect } from 'vitest';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { demoCandidates } from '@/persistence/projects-bundle';
import { projectSettingsSchema, type ProjectRecord } from '@/persistence/records';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { captureIo } from '../../../cli/support/capture-io';

/**
 * The fictional demo compound (invented numbers, fixtures/demo and fixtures/screening) through both
 * pipelines: the app's screening of the seeded demo project and the CLI's `screen` of the same
 * compound. Only drives comparisons of the app with the CLI, never a model's expected value.
 */
export const DEMO_SCREEN_INPUT = 'fixtures/screening/demorazine-screen-input.json';

export const demoProject: ProjectRecord = {
  id: 'prj_same',
  schemaVersion: 1,
  name: 'App and CLI',
  createdAt: '2026-12-01T00:00:00.000Z',
  updatedAt: '2026-12-01T00:00:00.000Z',
  archived: false,
  isDemo: true,
  compound: DEMO_COMPOUND,
  settings: projectSettingsSchema.parse({}),
};

/** The app's screening of the demo project as seeded (its shortlist, default settings). */
export function demoAppScreening() {
  return computeProjectScreening({
    project: demoProject,
    candidates: demoCandidates(demoProject.id),
    measurements: [],
    customIons: [],
  });
}

/** `saltsmith screen` of the demo input with the app's default settings (the fixture's own dropped). */
export async function demoCliOutput(format: 'json' | 'csv'): Promise<string> {
  const input = JSON.parse(readFileSync(DEMO_SCREEN_INPUT, 'utf8')) as Record<string, unknown>;
  delete input.settings;
  // The fixture states S₀'s origin as the demo project does (it once left it out, and the CLI then
  // screened the demo's S₀ as not stated, 1σ 0.6 decades instead of 0.1).
  expect(input.intrinsicSolubilityOrigin).toBe(DEMO_COMPOUND.intrinsicSolubilityOrigin);
  const path = join(mkdtempSync(join(tmpdir(), 'same-ranking-')), 'input.json');
  writeFileSync(path, JSON.stringify(input));
  const c = captureIo();
  const code = await screenCommand.run(
    ['--input', path, '--format', format, '--iterations', '200'],
    c.io,
  );
  expect(code, c.err()).toBe(0);
  return c.out();
}
