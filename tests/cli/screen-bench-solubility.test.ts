import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { drugIon, getCounterIon, saltMolarMassGPerMol } from '@/chem';
import { captureIo } from './support/capture-io';

// Issue 16 on the command line: a bench solubility carries its equilibrium pH, temperature and the solid
// left, and each row says which solid limited it. The compound is a made-up test input (pKa 7.8 and
// S₀ 0.015 mg/mL stated as measured). The pH 7.6 value is the hand-computed case of
// tests/chem/screening/bench-solubility.test.ts: 0.0853049 mg/mL of free form, whose salt reading
// would put pH_max at 7.2 (below 7.6), here converted to mg/mL of besylate salt by the molar masses.
const FORMULA = 'C18H20ClN3O';
const di = drugIon({ kind: 'base', ionCharge: 1, formula: FORMULA });
const bes = getCounterIon('besylate')!;
const saltM = saltMolarMassGPerMol({
  freeFormMolarMassGPerMol: di.freeFormMolarMassGPerMol,
  drugIonMolarMassGPerMol: di.molarMassGPerMol,
  counterIonMolarMassGPerMol: bes.molarMassGPerMol,
  drugPerSalt: 1,
  counterIonPerSalt: 1,
  hydrateWater: 0,
});
const PH76_AS_SALT_MG = (0.0853049 * saltM) / di.freeFormMolarMassGPerMol;

const dir = mkdtempSync(join(tmpdir(), 'saltsmith-bench-'));
function input(extra: Record<string, unknown>): string {
  const p = join(dir, `in-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(
    p,
    JSON.stringify({
      name: 'test base',
      formula: FORMULA,
      kind: 'base',
      pKas: [{ value: 7.8, origin: 'measured' }],
      intrinsicSolubilityMgPerMl: 0.015,
      intrinsicSolubilityOrigin: 'measured',
      doseMg: 100,
      ions: ['besylate', 'mesylate'],
      ...extra,
    }),
  );
  return p;
}
async function run(args: string[]) {
  const c = captureIo();
  const code = await screenCommand.run(args, c.io);
  return { code, out: c.out(), err: c.err() };
}
const csvRows = (text: string) =>
  Papa.parse<Record<string, string>>(
    text
      .trim()
      .split('\n')
      .filter((l) => !l.startsWith('#'))
      .join('\n'),
    { header: true, skipEmptyLines: true },
  ).data;

describe('saltsmith screen: bench solubility by what it measures', () => {
  it('a pH 7.6 besylate value is free-form-limited: never "measured", K_sp stays estimated (CSV and JSON)', async () => {
    const bench = {
      besylate: {
        solubilityMgPerMl: PH76_AS_SALT_MG,
        solubilityPh: 7.6,
        solubilityTemperatureC: 37,
      },
    };
    const csv = await run(['--input', input({ bench })]);
    expect(csv.err).toBe('');
    expect(csv.code).toBe(0);
    const rows = csvRows(csv.out);
    const besylate = rows.find((r) => r.counter_ion === 'besylate')!;
    expect(besylate.bench_solubility_limited_by).toBe('free-form');
    expect(besylate.salt_solubility_origin).toBe('model');
    expect(besylate.ksp_origin).toBe('estimated');
    // no measured solubility: the column is empty
    expect(rows.find((r) => r.counter_ion === 'mesylate')!.bench_solubility_limited_by).toBe('');

    const json = await run(['--input', input({ bench }), '--format', 'json']);
    const j = JSON.parse(json.out) as { rows: Record<string, unknown>[] };
    const jb = j.rows.find((r) => r.counter_ion === 'besylate')!;
    expect(jb.bench_solubility_limited_by).toBe('free-form');
    expect(jb.salt_solubility_origin).not.toBe('measured');
  });

  it('the stated solid wins; a value without a pH is undecided but used (σ widened)', async () => {
    const stated = await run([
      '--input',
      input({
        bench: {
          besylate: { solubilityMgPerMl: PH76_AS_SALT_MG, solubilityPh: 7.6, solidForm: 'salt' },
        },
      }),
    ]);
    const s = csvRows(stated.out).find((r) => r.counter_ion === 'besylate')!;
    expect(s.bench_solubility_limited_by).toBe('salt');
    expect(s.salt_solubility_origin).toBe('measured');
    // its own pH_max (7.2) lies below the pH it was measured at: said in the flags
    expect(s.flags).toMatch(/below the pH the value was measured at/);

    const noPh = await run(['--input', input({ bench: { mesylate: { solubilityMgPerMl: 5 } } })]);
    const m = csvRows(noPh.out).find((r) => r.counter_ion === 'mesylate')!;
    expect(m.bench_solubility_limited_by).toBe('unknown');
    expect(m.salt_solubility_origin).toBe('measured');
    expect(Number(m.salt_solubility_water_log10_M_sd)).toBeGreaterThan(0.05);
  });

  it('bad bench solubility fields are refused with the field named', async () => {
    const cases: [Record<string, unknown>, RegExp][] = [
      [{ besylate: { solubilityMgPerMl: 1, solubilityPh: 15 } }, /bench\.besylate\.solubilityPh/],
      [
        { besylate: { solubilityMgPerMl: 1, solubilityTemperatureC: -5 } },
        /bench\.besylate\.solubilityTemperatureC/,
      ],
      [{ besylate: { solubilityMgPerMl: 1, solidForm: 'crystal' } }, /bench\.besylate\.solidForm/],
      [{ besylate: { meltingPointC: 200, solubilityPh: 7 } }, /bench\.besylate\.solubilityPh/],
    ];
    for (const [bench, message] of cases) {
      const r = await run(['--input', input({ bench })]);
      expect(r.code, JSON.stringify(bench)).toBe(1);
      expect(r.err, JSON.stringify(bench)).toMatch(message);
    }
  });
});
