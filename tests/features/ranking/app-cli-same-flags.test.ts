import { describe, expect, it } from 'vitest';
import { rankCandidates, type ReasonKind, type ScreenFlag } from '@/chem';
import { displayRows } from '@/features/ranking/ranking-rows';
import { buildSheetModel } from '@/features/sheet/build-sheet-model';
import { screeningSettingsOf } from '@/screening-data/screening-settings';
import { demoAppScreening, demoCliOutput, demoProject } from './support/demo-app-cli';

// One vocabulary from app to CLI (issue 19, item 2): each candidate of the fictional demo gets the
// same flags and the same reasons, in the same words, in the app's Ranking, on the comparison sheet
// and in the CLI's rows. Where a place words them differently, the mapping is stated here and tested.

/** Flags the Ranking table does not print as a flag, and what it shows instead. */
const APP_TABLE_SHOWS_INSTEAD: Partial<Record<ScreenFlag['id'], string>> = {
  'estimated-ksp': 'the est. mark on pH_max and on every number that rests on the K_sp',
};

/** The sheet's word before each reason, for the core's reason kinds (the CLI and the app print the core's own prefix). */
const SHEET_REASON_WORD: Record<ReasonKind, string> = {
  keeps: 'for',
  drops: 'against',
  watch: 'watch',
  measured: 'measured',
  note: 'note',
};

interface CliRow {
  candidate: string;
  counter_ion: string;
  stoichiometry_drug_to_ion: string;
  flags: string;
  reasons: string;
}

interface CliDoc {
  rows: CliRow[];
  freeForm: { flags: { id: string; text: string }[] };
}

async function pipelines() {
  const [data, cliText] = await Promise.all([demoAppScreening(), demoCliOutput('json')]);
  const ranked = rankCandidates(data.screen.rows, screeningSettingsOf(demoProject).weights);
  const app = displayRows(data, ranked);
  const cli = JSON.parse(cliText) as CliDoc;
  const cliByForm = new Map(
    cli.rows.map((r) => [`${r.counter_ion} ${r.stoichiometry_drug_to_ion}`, r]),
  );
  const sheet = buildSheetModel({
    project: demoProject,
    screening: data,
    validation: [],
    generatedAt: '2026-12-03T10:00:00.000Z',
    appVersion: 'test',
  });
  return { data, app, cli, cliByForm, sheet };
}

describe('the app, the sheet and the CLI give each demo candidate the same flags and reasons', () => {
  it('same flags: the Ranking table’s flags are the CLI’s less the estimated-K_sp flag, shown as est. marks', async () => {
    const { app, cliByForm } = await pipelines();
    expect(app.length).toBeGreaterThan(3);
    for (const r of app) {
      const cli = cliByForm.get(
        `${r.row.counterIonId} ${r.row.drugPerSalt}:${r.row.counterIonPerSalt}`,
      );
      expect(cli, r.label).toBeDefined();
      // Every flag, in the same words and order, as the CLI's flags column joins them.
      expect(r.row.flags.map((f) => f.text).join('; '), r.label).toBe(cli!.flags);
      // What the table prints as flags: all but those shown another way.
      const printed = r.row.flags.filter((f) => !(f.id in APP_TABLE_SHOWS_INSTEAD));
      const hidden = r.row.flags.filter((f) => f.id in APP_TABLE_SHOWS_INSTEAD);
      for (const f of printed) expect(cli!.flags, r.label).toContain(f.text);
      // The estimated-K_sp flag stands in the CLI exactly when the app marks pH_max est.
      const estimatedKsp = hidden.some((f) => f.id === 'estimated-ksp');
      expect(estimatedKsp, r.label).toBe(r.phMax?.origin === 'estimated');
      expect(cli!.flags.startsWith('K_sp estimated'), r.label).toBe(estimatedKsp);
    }
  }, 60000);

  it('same reasons: the app’s Why list reads as the CLI’s reasons column, word for word', async () => {
    const { app, cliByForm } = await pipelines();
    for (const r of app) {
      const cli = cliByForm.get(
        `${r.row.counterIonId} ${r.row.drugPerSalt}:${r.row.counterIonPerSalt}`,
      )!;
      expect(r.row.reasons.length, r.label).toBeGreaterThan(0);
      expect(r.row.reasons.map((x) => x.text).join('; '), r.label).toBe(cli.reasons);
    }
  }, 60000);

  it('the free form’s flags are the same in the app and the CLI', async () => {
    const { data, cli } = await pipelines();
    expect(data.screen.freeForm.flags.map((f) => [f.id, f.text])).toStrictEqual(
      cli.freeForm.flags.map((f) => [f.id, f.text]),
    );
  }, 60000);

  it('the sheet: the app’s salt name, every flag, and each reason under its stated word', async () => {
    const { app, sheet } = await pipelines();
    const sheetById = new Map(sheet.rows.map((s) => [s.id, s]));
    for (const r of app) {
      const s = sheetById.get(r.id)!;
      expect(s, r.label).toBeDefined();
      // The sheet names a salt as the Ranking and the CLI do (after the drug's name).
      expect(s.label, r.label).toBe(`${demoProject.compound.name} ${r.label}`);
      expect(s.flags).toStrictEqual(r.row.flags.map((f) => f.text));
      expect(s.reasons).toStrictEqual(
        r.row.reasons.map(
          (x) =>
            `${SHEET_REASON_WORD[x.kind]}: ${x.text.replace(/^(keeps|drops|watch|note|measured):\s*/, '')}`,
        ),
      );
    }
  }, 60000);
});
