import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { roundToUncertainty, SCORE_DECIMALS } from '@/chem';
import { buildSheetModel } from '@/features/sheet/build-sheet-model';
import { sheetToCsv } from '@/features/sheet/sheet-csv';
import { demoCandidates } from '@/persistence/projects-bundle';
import type { MeasurementRecord } from '@/persistence/records';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import {
  demoAppScreening,
  demoCliOutput,
  demoProject,
} from '../features/ranking/support/demo-app-cli';

// Issue 19, item 1: precision follows σ, and every ±1σ the app shows is also in the CSVs — the
// sheet's CSV (the app's export) and the command line's. The fictional demo (invented numbers) drives
// both; the expected precision is the GUM's rule as src/chem/report/precision.ts applies it, checked
// by hand in tests/chem/report/shown-numbers.test.ts.

type Line = Record<string, string>;

function sheetCsvLines(csv: string): Line[] {
  const table = csv.split('\r\n\r\n')[0]!;
  return Papa.parse<Line>(table, { header: true }).data;
}

async function bothCsvs() {
  const data = await demoAppScreening();
  const sheet = buildSheetModel({
    project: demoProject,
    screening: data,
    validation: [],
    generatedAt: '2026-12-03T10:00:00.000Z',
    appVersion: 'test',
  });
  const sheetLines = sheetCsvLines(sheetToCsv(sheet));
  const cli = (JSON.parse(await demoCliOutput('json')) as { rows: Line[] }).rows;
  const drug = demoProject.compound.name;
  const pairs = data.screen.rows.map((row) => ({
    row,
    sheet: sheetLines.find((l) => l.Candidate === `${drug} ${row.label}`)!,
    cli: cli.find(
      (c) =>
        c.counter_ion === row.counterIonId &&
        c.stoichiometry_drug_to_ion === `${row.drugPerSalt}:${row.counterIonPerSalt}`,
    )!,
  }));
  for (const p of pairs) {
    expect(p.sheet, p.row.label).toBeDefined();
    expect(p.cli, p.row.label).toBeDefined();
  }
  return { data, sheetLines, pairs };
}

const decimalsOf = (x: string | number) => (String(x).split('.')[1] ?? '').length;

describe('precision follows σ, the same in the sheet’s CSV and the CLI (issue 19)', () => {
  it('score: two decimals in both (was 0.636623 in the sheet’s CSV, three in the CLI)', async () => {
    const { pairs } = await bothCsvs();
    for (const { row, sheet, cli } of pairs) {
      expect(decimalsOf(sheet['Score (0–1)']!), row.label).toBeLessThanOrEqual(SCORE_DECIMALS);
      expect(decimalsOf(cli.score!), row.label).toBeLessThanOrEqual(SCORE_DECIMALS);
      expect(Number(sheet['Score (0–1)'])).toBe(Number(cli.score));
    }
  }, 60000);

  it('ΔpKa: to the decimal place of the pKa’s 1σ, with that 1σ in the sheet’s CSV (was 5.80622)', async () => {
    const { data, pairs } = await bothCsvs();
    const sigma = data.screen.robustnessShared.drugPkaSigma;
    // The demo's pKa is measured: 1σ 0.1 (README, Compound area), so two decimals (GUM §7.2.6).
    expect(sigma).toBe(0.1);
    for (const { row, sheet, cli } of pairs) {
      const expected = roundToUncertainty(row.deltaPka!, sigma).value;
      expect(Number(sheet['ΔpKa']), row.label).toBe(expected);
      expect(Number(sheet['ΔpKa uncertainty (1 sigma)']), row.label).toBe(0.1);
      expect(Number(cli.delta_pka), row.label).toBe(expected);
    }
  }, 60000);

  it('P(salt), always 1 and unexplained on paper, is gone: the sheet states the ΔpKa band as the CLI does', async () => {
    const { sheetLines, pairs } = await bothCsvs();
    expect(Object.keys(sheetLines[0]!).some((h) => /P\(salt\)/.test(h))).toBe(false);
    for (const { row, sheet, cli } of pairs) {
      expect(sheet['Salt formation'], row.label).toBe(cli.salt_formation);
    }
  }, 60000);

  it('D₀ and mg/mL: the same rounded value and ±1σ range in both CSVs (the CLI had no range, D₀ 2.42)', async () => {
    const { pairs } = await bothCsvs();
    // [the sheet CSV's value, −1σ and +1σ headings, the CLI's column]
    const columns = [
      [
        'Worst D₀ in pH 1.2–6.8',
        'Worst D₀ in pH 1.2–6.8 low (-1 sigma)',
        'Worst D₀ in pH 1.2–6.8 high (+1 sigma)',
        'worst_dose_number',
      ],
      [
        'Gastric D₀',
        'Gastric D₀ low (-1 sigma)',
        'Gastric D₀ high (+1 sigma)',
        'gastric_dose_number',
      ],
      [
        'Salt in water (mg/mL as salt)',
        'Salt in water low (-1 sigma) (mg/mL as salt)',
        'Salt in water high (+1 sigma) (mg/mL as salt)',
        'salt_solubility_water_mg_per_ml',
      ],
    ] as const;
    for (const { row, sheet, cli } of pairs) {
      for (const [value, low, high, c] of columns) {
        const label = `${row.label} ${c}`;
        expect(sheet[value], label).toBeDefined();
        expect(cli[c], label).not.toBe('');
        expect(Number(cli[c]), label).toBe(Number(sheet[value]));
        expect(Number(cli[`${c}_low`]), label).toBe(Number(sheet[low]));
        expect(Number(cli[`${c}_high`]), label).toBe(Number(sheet[high]));
      }
    }
  }, 60000);

  it('the words say a D₀ as the cells do: two significant figures (was “D₀ 2.42”, “D₀ 3.00” beside 2.4 and 3)', async () => {
    const { pairs } = await bothCsvs();
    const sigFigs = (x: string) => x.replace('.', '').replace(/^0+/, '').replace(/0+$/, '').length;
    let seen = 0;
    for (const { row, cli } of pairs) {
      const words = [cli.flags!, cli.reasons!].join(' ');
      for (const m of words.matchAll(/D₀ (\d+(?:\.\d+)?)/g)) {
        seen++;
        expect(sigFigs(m[1]!), `${row.label}: ${m[0]}`).toBeLessThanOrEqual(2);
      }
      // The worst-pH reason names the number in the worst-D₀ cell.
      const worst = /at pH [\d.]+ \([^)]*\) falls below the dose \(D₀ ([\d.]+)\)/.exec(
        cli.reasons!,
      );
      if (worst) expect(Number(worst[1]), row.label).toBe(Number(cli.worst_dose_number));
    }
    expect(seen).toBeGreaterThan(0);
  }, 60000);

  it('pH_max: its 1σ in both CSVs, the value to its place', async () => {
    const { pairs } = await bothCsvs();
    for (const { row, sheet, cli } of pairs) {
      expect(cli.ph_max_sd, row.label).not.toBe('');
      expect(Number(cli.ph_max_sd)).toBe(Number(sheet['pH_max uncertainty (1 sigma)']));
      expect(Number(cli.ph_max)).toBe(Number(sheet['pH_max']));
      expect(decimalsOf(cli.ph_max!)).toBeLessThanOrEqual(decimalsOf(cli.ph_max_sd!));
    }
  }, 60000);

  it('ΔH_sol per drug ion: the same value and 1σ in both, or “not informative” in both', async () => {
    const { pairs } = await bothCsvs();
    for (const { row, sheet, cli } of pairs) {
      const h = row.solutionEnthalpyPerDrugIon!;
      const shown = sheet['ΔH_sol (kJ/mol per drug ion)'];
      if (h.notInformative) {
        expect(cli.solution_enthalpy_kj_per_mol_drug_ion, row.label).toBe('');
        expect(shown, row.label).toBe('not informative');
      } else {
        expect(Number(cli.solution_enthalpy_kj_per_mol_drug_ion), row.label).toBe(Number(shown));
        expect(Number(cli.solution_enthalpy_kj_per_mol_drug_ion_sd), row.label).toBe(
          Number(sheet['ΔH_sol uncertainty (1 sigma) (kJ/mol per drug ion)']),
        );
      }
    }
  }, 60000);
});

describe('origin marks follow what limits each number (issue 19)', () => {
  it('a measured hydrochloride solubility marks its K_sp-limited numbers, not a D₀ the free form limits', async () => {
    const candidates = demoCandidates(demoProject.id);
    const hcl = candidates.find((c) => c.ionId === 'chloride')!;
    // An invented bench reading for the fictional demo (input only, never an expected value).
    const reading: MeasurementRecord = {
      id: 'm_hcl',
      schemaVersion: 1,
      projectId: demoProject.id,
      candidateId: hcl.id,
      kind: 'solubility',
      value: 5,
      unit: 'mg/mL',
      ph: null,
      temperatureK: 310.15,
      medium: 'water',
      text: '',
      solidForm: 'salt',
      recordedAt: '2026-12-02T00:00:00.000Z',
    };
    const data = await computeProjectScreening({
      project: demoProject,
      candidates,
      measurements: [reading],
      customIons: [],
    });
    const row = data.screen.rows.find((r) => r.counterIonId === 'chloride')!;
    expect(row.kspOrigin).toBe('measured');
    // The demo's hydrochloride is limited by the free form at its worst pH (pH 6.8 above pH_max).
    expect(row.worst?.solid).toBe('free-form');
    const sheet = buildSheetModel({
      project: demoProject,
      screening: data,
      validation: [],
      generatedAt: '2026-12-03T10:00:00.000Z',
      appVersion: 'test',
    });
    const cells = sheet.rows.find((r) => r.id === row.id)!.cells;
    // S₀ is entered as measured in the Compound area: the sheet's mark for an entered value.
    expect(cells.worstDoseNumber?.origin).toBe('input');
    expect(cells.phMax?.origin).toBe('measured');
    expect(cells.saltWaterMgPerMl?.origin).toBe('measured');
  }, 60000);
});
