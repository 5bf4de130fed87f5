import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { idealSolubility, SALT_SOLUBILITY_FUSION_CHECK } from '@/chem';
import { captureIo } from './support/capture-io';

// Issue 10 on the command line: the salt's own water solubility in every row, in-house counter-ions
// from their SMILES, and bench data per counter-ion. The compound is a made-up test input; the
// assertions check structure, origins and identities, not its numbers.
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-sst-'));
function input(extra: Record<string, unknown>): string {
  const p = join(dir, `in-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(
    p,
    JSON.stringify({
      name: 'test base',
      formula: 'C17H20N2O2',
      kind: 'base',
      pKas: [8],
      intrinsicSolubilityMgPerMl: 0.02,
      doseMg: 100,
      ...extra,
    }),
  );
  return p;
}
async function run(args: string[]) {
  const c = captureIo();
  const code = await screenCommand.run([...args, '--iterations', '100'], c.io);
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

describe('saltsmith screen: the salt’s own solubility', () => {
  it('every CSV line and JSON row carries salt_solubility_water_log10_M, its sd and its origin', async () => {
    const csv = await run(['--input', input({ ions: ['chloride', 'mesylate', 'tosylate'] })]);
    expect(csv.code).toBe(0);
    const rows = csvRows(csv.out);
    expect(rows).toHaveLength(3);
    for (const r of rows) {
      expect(Number.isFinite(Number(r.salt_solubility_water_log10_M))).toBe(true);
      expect(Number(r.salt_solubility_water_log10_M_sd)).toBeGreaterThan(0);
      expect(r.salt_solubility_origin).toBe('model');
    }
    expect(new Set(rows.map((r) => r.salt_solubility_water_log10_M)).size).toBe(3);
    const json = await run([
      '--input',
      input({ ions: ['chloride', 'mesylate'] }),
      '--format',
      'json',
    ]);
    const j = JSON.parse(json.out) as { rows: Record<string, unknown>[] };
    for (const r of j.rows) {
      expect(r).toHaveProperty('salt_solubility_water_log10_M');
      expect(r).toHaveProperty('salt_solubility_water_log10_M_sd');
      expect(r.salt_solubility_origin).toBe('model');
    }
  });

  it('bench data: a measured solubility overrides the estimate; melting point + ΔH_fus give "model+fusion" only where the published check favours the correction, and are named in the reasons either way', async () => {
    const { out, code } = await run([
      '--input',
      input({
        ions: ['chloride', 'mesylate', 'tosylate'],
        bench: {
          chloride: { solubilityMgPerMl: 12 },
          mesylate: { meltingPointC: 210, fusionEnthalpyKJPerMol: 40 },
        },
      }),
    ]);
    expect(code).toBe(0);
    const rows = csvRows(out);
    const by = (ion: string) => rows.find((r) => r.counter_ion === ion)!;
    expect(by('chloride').salt_solubility_origin).toBe('measured');
    expect(Number(by('chloride').salt_solubility_water_mg_per_ml)).toBeCloseTo(12, 5);
    expect(by('mesylate').salt_solubility_origin).toBe(
      SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies ? 'model+fusion' : 'model',
    );
    expect(by('mesylate').reasons).toMatch(/ΔH_fus 40 kJ\/mol \(measured\)/);
    expect(by('tosylate').salt_solubility_origin).toBe('model');
  });

  it('the fusion path moves the estimate by the Schröder–van Laar difference between two melting points — or not at all where the published check says it hurts', async () => {
    const at = async (mp: number) => {
      const { out } = await run([
        '--input',
        input({
          ions: ['mesylate'],
          bench: { mesylate: { meltingPointC: mp, fusionEnthalpyKJPerMol: 40 } },
        }),
      ]);
      return Number(csvRows(out)[0]!.salt_solubility_water_log10_M);
    };
    const T = 310.15; // the default screening temperature, 37 °C
    const lo = idealSolubility({
      meltingPointK: 150 + 273.15,
      fusionEnthalpyKJPerMol: 40,
      temperatureK: T,
    });
    const hi = idealSolubility({
      meltingPointK: 250 + 273.15,
      fusionEnthalpyKJPerMol: 40,
      temperatureK: T,
    });
    const expected = (hi.lnMoleFraction - lo.lnMoleFraction) / Math.LN10;
    // The CSV keeps 3 significant digits (0.01 at these magnitudes), so two readings differ by ≤ 0.011.
    const moved = SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies ? expected : 0;
    expect(Math.abs(expected)).toBeGreaterThan(0.5);
    expect(Math.abs((await at(250)) - (await at(150)) - moved)).toBeLessThan(0.011);
  });

  it('customIons: an in-house counter-ion from its parent SMILES is screened, with descriptors (origin "model")', async () => {
    const { out, code, err } = await run([
      '--input',
      input({
        ions: ['chloride', 'my-sulfonate'],
        customIons: [
          { id: 'my-sulfonate', smiles: 'CCCCCCCCS(=O)(=O)O', charge: -1, pKas: [-1.9] },
        ],
      }),
    ]);
    expect(err).toBe('');
    expect(code).toBe(0);
    const mine = csvRows(out).find((r) => r.counter_ion === 'my-sulfonate')!;
    expect(mine.salt_solubility_origin).toBe('model');
    expect(Number.isFinite(Number(mine.delta_pka))).toBe(true);
  });

  it('bad entries are refused with the field named', async () => {
    const cases: [Record<string, unknown>, RegExp][] = [
      [
        { customIons: [{ id: 'mesylate', smiles: 'CS(=O)(=O)O', charge: -1 }] },
        /customIons\.0\.id.*bundled/,
      ],
      [
        { customIons: [{ id: 'my-ion', smiles: 'CS(=O)(=O)O', charge: 1 }] },
        /customIons\.0\.charge/,
      ],
      [
        { customIons: [{ id: 'my-ion', smiles: 'C[N+](C)(C)C', charge: -1 }] },
        /customIons\.0\.(smiles|charge)/,
      ],
      [
        { customIons: [{ id: 'my-ion', smiles: 'CS(=O)(=O)O.CCO', charge: -1 }] },
        /customIons\.0\.smiles/,
      ],
      [
        { customIons: [{ id: 'my-ion', smiles: 'CS(=O)(=O)O', charge: -1, extra: 1 }] },
        /customIons/,
      ],
      [{ ions: ['chloride'], bench: { sulfate: { meltingPointC: 200 } } }, /bench\.sulfate/],
      [{ ions: ['chloride'], bench: { chloride: {} } }, /bench/],
      [
        { ions: ['chloride'], bench: { chloride: { fusionEnthalpyKJPerMol: -4 } } },
        /bench\.chloride\.fusionEnthalpyKJPerMol/,
      ],
    ];
    for (const [extra, message] of cases) {
      const r = await run(['--input', input(extra)]);
      expect(r.code, JSON.stringify(extra)).not.toBe(0);
      expect(r.err, JSON.stringify(extra)).toMatch(message);
    }
  });
});
