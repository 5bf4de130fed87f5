import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { rankCandidates } from '@/chem';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { displayRows } from '@/features/ranking/ranking-rows';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { demoCandidates } from '@/persistence/projects-bundle';
import { projectSettingsSchema, type ProjectRecord } from '@/persistence/records';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { screeningSettingsOf } from '@/screening-data/screening-settings';
import { captureIo } from '../../cli/support/capture-io';

// One vocabulary from app to CLI. The fictional demo compound (invented numbers, fixtures/demo and
// fixtures/screening) only drives both pipelines: the assertions compare the app's Ranking rows with
// the CLI's rows — candidates, order and salt names — never a model's value.
const FIXTURE = 'fixtures/screening/demorazine-screen-input.json';

const project: ProjectRecord = {
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

interface CliRow {
  rank: number | null;
  candidate: string;
  counter_ion: string;
  stoichiometry_drug_to_ion: string;
}

/** The CLI's rows for the demo input, with the app's default settings (the fixture's own dropped). */
async function cliRows(): Promise<CliRow[]> {
  const input = JSON.parse(readFileSync(FIXTURE, 'utf8')) as Record<string, unknown>;
  delete input.settings;
  const path = join(mkdtempSync(join(tmpdir(), 'same-ranking-')), 'input.json');
  writeFileSync(path, JSON.stringify(input));
  const c = captureIo();
  const code = await screenCommand.run(
    ['--input', path, '--format', 'json', '--iterations', '200'],
    c.io,
  );
  expect(code, c.err()).toBe(0);
  return (JSON.parse(c.out()) as { rows: CliRow[] }).rows;
}

/** The app's Ranking rows for the demo project as seeded, with the project's weights. */
async function appRows() {
  const candidates = demoCandidates(project.id);
  const data = await computeProjectScreening({
    project,
    candidates,
    measurements: [],
    customIons: [],
  });
  const ranked = rankCandidates(data.screen.rows, screeningSettingsOf(project).weights);
  return displayRows(data, ranked).map((r) => ({
    label: r.label,
    ionId: r.row.counterIonId,
    ratio: `${r.row.drugPerSalt}:${r.row.counterIonPerSalt}`,
  }));
}

describe('the app and the CLI screen the demo compound alike', () => {
  it('the CLI input fixture is the demo compound (same structure, pKa, S₀, melting point, log P, dose)', () => {
    const input = JSON.parse(readFileSync(FIXTURE, 'utf8')) as Record<string, unknown>;
    expect(input.smiles).toBe(DEMO_COMPOUND.smiles);
    expect(input.pKas).toStrictEqual(
      DEMO_COMPOUND.pKas.map(({ value, origin }) => ({ value, origin })),
    );
    expect(input.intrinsicSolubilityMgPerMl).toBe(DEMO_COMPOUND.intrinsicSolubilityMgPerMl);
    expect(input.meltingPointC).toBe(DEMO_COMPOUND.meltingPointC);
    expect(input.logP).toBe(DEMO_COMPOUND.logP);
    expect(input.doseMg).toBe(DEMO_COMPOUND.doseMg);
  });

  it('same candidates in the same order under the same salt names; the CLI’s extra rows are only other listed forms', async () => {
    const [app, cli] = await Promise.all([appRows(), cliRows()]);
    const key = (ionId: string, ratio: string) => `${ionId} ${ratio}`;
    const appForms = new Set(app.map((r) => key(r.ionId, r.ratio)));
    const shared = cli.filter((r) => appForms.has(key(r.counter_ion, r.stoichiometry_drug_to_ion)));
    // Every form the app screens, the CLI screens too (as FORMS_NOTE says, it may screen more).
    expect(shared).toHaveLength(app.length);
    // Same order, same names: the app's Ranking rows read as the CLI's rows.
    expect(app.map((r) => r.label)).toStrictEqual(shared.map((r) => r.candidate));
    expect(app.map((r) => r.ionId)).toStrictEqual(shared.map((r) => r.counter_ion));
    // What the CLI adds is another listed form of an ion the app screens, never another ion.
    const extra = cli.filter((r) => !appForms.has(key(r.counter_ion, r.stoichiometry_drug_to_ion)));
    const appIons = new Set(app.map((r) => r.ionId));
    for (const r of extra) expect(appIons.has(r.counter_ion), r.candidate).toBe(true);
  });
});
