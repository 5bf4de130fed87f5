import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { SCREENING_CAUTIONS } from '@/chem';
import { profileToCsv } from '@/features/ranking/ph-profile-csv';
import { pickListCsv } from '@/features/screen-plan/screen-plan-model';
import { buildSheetModel } from '@/features/sheet/build-sheet-model';
import { sheetToCsv } from '@/features/sheet/sheet-csv';
import { DEMO_COMPOUND, DEMO_SCREEN_PLAN } from '@/persistence/demo-project';
import { demoCandidates } from '@/persistence/projects-bundle';
import { projectSettingsSchema, type ProjectRecord } from '@/persistence/records';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { layOutPlan } from '@/screening-data/use-screen-outcomes';
import { runCli } from '../cli/support/run-cli';

// Issue 19: the cautions in full, once, in every export — one source (src/chem/report/cautions.ts).
// The fictional demo compound (invented numbers) only drives the exports; the assertions count
// sentences, never a model's value.
const project: ProjectRecord = {
  id: 'prj_cautions',
  schemaVersion: 1,
  name: 'Cautions',
  createdAt: '2026-12-01T00:00:00.000Z',
  updatedAt: '2026-12-01T00:00:00.000Z',
  archived: false,
  isDemo: true,
  compound: DEMO_COMPOUND,
  settings: projectSettingsSchema.parse({}),
};
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-cautions-'));
const SCREEN_INPUT = 'fixtures/screening/demorazine-screen-input.json';
const BATCH_INPUT = 'fixtures/batch/fictional-compounds.csv';

/** How often `sentence` occurs in `text` (CSV quoting doubles no quote in these sentences). */
const count = (text: string, sentence: string) => text.split(sentence).length - 1;

function expectEachCautionOnce(name: string, text: string) {
  for (const sentence of SCREENING_CAUTIONS) {
    expect(count(text, sentence), `${name}: “${sentence}”`).toBe(1);
  }
}

async function appExports(): Promise<Record<string, string>> {
  const candidates = demoCandidates(project.id);
  const screening = await computeProjectScreening({
    project,
    candidates,
    measurements: [],
    customIons: [],
  });
  const sheet = buildSheetModel({
    project,
    screening,
    validation: [],
    generatedAt: '2026-12-03T10:00:00.000Z',
    appVersion: 'test',
  });
  const salts = screening.screen.rows.filter((r) => !r.error).slice(0, 3);
  const profile = profileToCsv({
    data: screening,
    salts,
    labels: Object.fromEntries(salts.map((r) => [r.id, r.label])),
    generatedAt: '2026-12-03T10:00:00.000Z',
    appVersion: 'test',
  });
  const layout = layOutPlan(project, DEMO_SCREEN_PLAN, candidates, []);
  if (!layout.plan) throw layout.error;
  return {
    'sheet CSV (app)': sheetToCsv(sheet),
    'pH-profile CSV (app)': profile,
    'pick-list CSV (app)': pickListCsv(layout.plan),
  };
}

async function cliExports(): Promise<Record<string, string>> {
  const planFile = join(dir, 'plan.json');
  writeFileSync(
    planFile,
    JSON.stringify({
      compound: { name: 'chlorpromazine', formula: 'C17H19ClN2S', kind: 'base', pKas: [9.3] },
      plan: {
        counterIons: ['chloride', 'mesylate'],
        solvents: ['ethanol'],
        apiMgPerWell: 10,
        solventUlPerWell: 200,
        plate: 24,
        stock: { chloride: { solvent: 'water', molar: 1 } },
      },
    }),
  );
  const screen = ['screen', '--input', SCREEN_INPUT, '--iterations', '50'];
  const runs: Record<string, string[]> = {
    'screen CSV (CLI)': [...screen, '--format', 'csv'],
    'screen JSON (CLI)': [...screen, '--format', 'json'],
    'batch CSV (CLI)': ['screen', '--batch', BATCH_INPUT, '--jobs', '1', '--format', 'csv'],
    'batch JSON Lines (CLI)': [
      'screen',
      '--batch',
      BATCH_INPUT,
      '--jobs',
      '1',
      '--format',
      'jsonl',
    ],
    'plan CSV (CLI)': ['plan', '--input', planFile],
    'plan JSON (CLI)': ['plan', '--input', planFile, '--format', 'json'],
  };
  const out: Record<string, string> = {};
  for (const [name, argv] of Object.entries(runs)) {
    const r = await runCli(argv);
    expect(r.code, `${name}: ${r.err}`).toBe(0);
    out[name] = r.out;
  }
  return out;
}

describe('the cautions in full, exactly once, in every export (issue 19)', () => {
  it('the app’s sheet CSV, pH-profile CSV and pick-list CSV', async () => {
    const exports = await appExports();
    expect(Object.keys(exports)).toHaveLength(3);
    for (const [name, text] of Object.entries(exports)) expectEachCautionOnce(name, text);
  }, 60000);

  it('the command line’s screen (CSV, JSON), batch (CSV, JSON Lines) and plan (CSV, JSON)', async () => {
    const exports = await cliExports();
    for (const [name, text] of Object.entries(exports)) expectEachCautionOnce(name, text);
    // JSON documents carry them as one list, not as loose sentences in another field.
    const screenJson = JSON.parse(exports['screen JSON (CLI)']!) as { cautions: string[] };
    expect(screenJson.cautions).toStrictEqual(SCREENING_CAUTIONS);
    const planJson = JSON.parse(exports['plan JSON (CLI)']!) as { cautions: string[] };
    expect(planJson.cautions.slice(0, SCREENING_CAUTIONS.length)).toStrictEqual(SCREENING_CAUTIONS);
  }, 120000);
});
