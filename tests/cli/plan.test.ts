import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { DEMO_SCREEN_PLAN } from '@/persistence/demo-project';
import { runCli } from './support/run-cli';

/**
 * `saltsmith plan`: the pick list of a plate plan and the solvent table. The compound is chlorpromazine
 * base, C17H19ClN2S, M = 318.863 g/mol by hand from IUPAC 2021 atomic weights (see
 * tests/chem/plate-plan/plate-plan.test.ts for every step); 10 mg is 0.0313614 mmol, 1.05 eq 0.0329295 mmol.
 */
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-plan-'));
const compound = { name: 'chlorpromazine', formula: 'C17H19ClN2S', kind: 'base', pKas: [9.3] };
const plan = {
  counterIons: ['chloride', 'mesylate', 'sulfate', 'fumarate'],
  solvents: ['ethanol', 'water'],
  apiMgPerWell: 10,
  solventUlPerWell: 200,
  plate: 24,
  stock: { chloride: { solvent: 'water', molar: 1 } },
};
let n = 0;
const file = (content: unknown) => {
  const p = join(dir, `plan-${n++}.json`);
  writeFileSync(p, typeof content === 'string' ? content : JSON.stringify(content));
  return p;
};
const withPlan = (extra: Record<string, unknown>) =>
  file({ compound, plan: { ...plan, ...extra } });

describe('saltsmith plan --input', () => {
  it('writes the pick list as CSV with hand-computed amounts, the fill order and the cautions', async () => {
    const r = await runCli(['plan', '--input', withPlan({})]);
    expect(r.code).toBe(0);
    const [table, notes] = [r.out.split('\n# ')[0]!, r.out.split('\n# ').slice(1).join(' ')];
    const rows = Papa.parse<Record<string, string>>(table, { header: true }).data;
    expect(rows.map((x) => x.well)).toEqual(['A1', 'A2', 'A3', 'A4', 'A5', 'A6', 'B1', 'B2']);
    const byWell = Object.fromEntries(rows.map((x) => [x.well, x]));
    // stock: 1000 × 0.0329295 / 1.0 M = 32.93 µL of 1 M HCl
    expect(byWell.A1).toMatchObject({
      counter_ion: 'chloride',
      counter_ion_ul: '32.93',
      counter_ion_dosing: 'stock',
    });
    // liquid: MsOH 0.0329295 mmol × 96.100 = 3.165 mg; / 1.481 g/mL = 2.137 µL
    expect(byWell.A3).toMatchObject({
      counter_ion: 'mesylate',
      counter_ion_mg: '3.165',
      counter_ion_ul: '2.137',
    });
    // 2:1: 0.5 × 0.0313614 = 0.01568 mmol H2SO4 × 98.072 = 1.538 mg; / 1.83 = 0.8403 µL
    expect(byWell.A5).toMatchObject({
      counter_ion_equivalents: '0.5',
      counter_ion_mg: '1.538',
      counter_ion_ul: '0.8403',
    });
    // solid: fumaric acid 0.0329295 × 116.072 = 3.822 mg weighed in, no volume; in water it will not all dissolve
    expect(byWell.B2).toMatchObject({
      counter_ion: 'fumarate',
      solvent: 'water',
      counter_ion_mg: '3.822',
      counter_ion_ul: '',
    });
    expect(byWell.B2!.warnings).toMatch(/6\.3 g\/L in water/);
    expect(byWell.A1!.solvent_ich_q3c_class).toBe('3'); // ethanol, ICH Q3C Class 3
    expect(byWell.A2!.solvent_ich_q3c_class).toBe(''); // water: not in ICH Q3C
    expect(notes).toMatch(/row by row/);
    expect(notes).toMatch(/corrosive/);
  });

  it('writes JSON rows with the named fields (counter_ion_ul null for a solid) and --out atomically', async () => {
    const out = join(dir, 'plan-out.json');
    const r = await runCli(['plan', '--input', withPlan({}), '--format', 'json', '--out', out]);
    expect(r.code).toBe(0);
    expect(r.err).toContain('wrote 8 wells');
    const doc = JSON.parse(readFileSync(out, 'utf8'));
    expect(doc.format).toBe('saltsmith-plate-plan');
    const fum = doc.rows.find((x: { well: string }) => x.well === 'B1');
    expect(Object.keys(fum)).toEqual(
      expect.arrayContaining([
        'well',
        'counter_ion',
        'solvent',
        'api_mg',
        'api_mmol',
        'counter_ion_equivalents',
        'counter_ion_mmol',
        'counter_ion_mg',
        'counter_ion_ul',
        'solvent_ul',
        'solvent_ich_q3c_class',
      ]),
    );
    expect(fum.counter_ion_ul).toBeNull();
    expect(fum.api_mmol).toBe(0.03136); // 10 / 318.863, 4 significant digits
    expect(doc.emptyWells).toHaveLength(16);
    expect(doc.cautions.join(' ')).toMatch(/corrosive/);
  });

  it('refuses a Class 1 solvent (exit 1, field named) unless allowClass1', async () => {
    const r = await runCli(['plan', '--input', withPlan({ solvents: ['ethanol', 'benzene'] })]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/plan\.solvents\.1: Benzene is an ICH Q3C Class 1 solvent/);
    const ok = await runCli([
      'plan',
      '--input',
      withPlan({ solvents: ['benzene'], allowClass1: true }),
      '--format',
      'json',
    ]);
    expect(ok.code).toBe(0);
    expect(JSON.parse(ok.out).notes.join(' ')).toMatch(/Class 1/);
  });

  it('refuses bad input with the field named', async () => {
    const cases: [string, RegExp][] = [
      [withPlan({ plate: 30 }), /--input plan\.plate/],
      [
        withPlan({
          solvents: [
            'ethanol',
            'water',
            'acetone',
            'acetonitrile',
            'heptane',
            'toluene',
            'methanol',
          ],
        }),
        /plan\.plate: the plan needs 28 wells/,
      ],
      [withPlan({ counterIons: ['sodium'] }), /plan\.counterIons\.0/],
      [withPlan({ stock: {} }), /plan\.stock\.chloride/],
      [withPlan({ apiMgPerWell: -1 }), /--input plan\.apiMgPerWell/],
      [withPlan({ colour: 'red' }), /--input plan/],
      [file({ compound: { ...compound, pKas: [] }, plan }), /--input compound\.pKas/],
      [
        file({ compound: { ...compound, formula: 'C17H19ClN2S', smiles: 'CCN' }, plan }),
        /compound\.formula/,
      ],
      [file('{"compound": '), /not valid JSON/],
    ];
    for (const [path, message] of cases) {
      const r = await runCli(['plan', '--input', path]);
      expect(r.code, String(message)).toBe(1);
      expect(r.err).toMatch(message);
    }
  });

  it('usage errors exit 2', async () => {
    expect((await runCli(['plan'])).code).toBe(2);
    expect((await runCli(['plan', '--input', 'x.json', '--solvents'])).code).toBe(2);
    expect((await runCli(['plan', '--solvents', '--format', 'xml'])).code).toBe(2);
  });
});

describe('the README example (the fictional demo plan)', () => {
  it("mirrors the demo project's plan and gives 16 wells, A1 … C4", async () => {
    const path = 'fixtures/demo/demorazine-plan.json';
    expect(JSON.parse(readFileSync(path, 'utf8')).plan).toEqual(DEMO_SCREEN_PLAN);
    const r = await runCli(['plan', '--input', path, '--format', 'json']);
    expect(r.code).toBe(0);
    const rows = JSON.parse(r.out).rows as { well: string }[];
    expect(rows.map((x) => x.well)).toHaveLength(16); // 4 counter-ions × 4 solvents
    expect(rows.at(-1)!.well).toBe('C4');
  });
});

describe('saltsmith plan --solvents', () => {
  it('lists the solvent table as a JSON array with the ICH Q3C class 1, 2, 3 or null', async () => {
    const r = await runCli(['plan', '--solvents', '--format', 'json']);
    expect(r.code).toBe(0);
    const rows = JSON.parse(r.out) as { id: string; name: string; ich_q3c_class: number | null }[];
    expect(Array.isArray(rows)).toBe(true);
    const cls = Object.fromEntries(rows.map((s) => [s.id, s.ich_q3c_class]));
    // ICH Q3C(R8): acetonitrile Table 2, ethanol Table 3, benzene Table 1; water not listed
    expect(cls).toMatchObject({ acetonitrile: 2, ethanol: 3, benzene: 1, water: null });
    const csv = await runCli(['plan', '--solvents']);
    expect(csv.out.split('\n')[0]).toMatch(/^id,name,ich_q3c_class/);
  });
});
