import { describe, expect, it } from 'vitest';
import { captureIo } from './support/capture-io';
import { TEST_COMPOUND_ARGS } from './support/test-compound';
import Papa from 'papaparse';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { registerBuiltInEvalKinds } from '@/cli/commands/eval/built-in-kinds';
import { evaluateRequest } from '@/cli/commands/eval/registry';
import { phMaxBase } from '@/chem';

async function run(args: string[]) {
  const c = captureIo();
  const code = await screenCommand.run(args, c.io);
  return { code, out: c.out(), err: c.err() };
}

// A test compound given by formula and made-up properties; assertions check structure and identities,
// not these inputs.
const BASE = [...TEST_COMPOUND_ARGS, '--iterations', '200'];

describe('saltsmith screen', () => {
  it('writes a ranked CSV with pH_max, dose numbers at pH 1.2 and 6.8, flags, reasons and the cautions', async () => {
    const { code, out } = await run([...BASE, '--ions', 'chloride,mesylate,sulfate']);
    expect(code).toBe(0);
    const lines = out.trim().split('\n');
    const cautions = lines.filter((l) => l.startsWith('#'));
    expect(cautions.join(' ')).toMatch(/do not establish a salt form/);
    const parsed = Papa.parse<Record<string, string>>(
      lines.filter((l) => !l.startsWith('#')).join('\n'),
      { header: true },
    );
    expect(parsed.errors).toHaveLength(0);
    const rows = parsed.data;
    expect(rows.map((r) => r.rank)).toStrictEqual(['1', '2', '3']);
    for (const k of [
      'ph_max',
      'dose_number_ph_1_2',
      'dose_number_ph_6_8',
      'gastric_dose_number',
      'flags',
      'reasons',
      'p_top3',
    ])
      expect(Object.keys(rows[0]!)).toContain(k);
    expect(rows.every((r) => !/NaN|Infinity/.test(Object.values(r).join(',')))).toBe(true);
    const hcl = rows.find((r) => r.counter_ion === 'chloride')!;
    expect(hcl.reasons).toMatch(/hydrochloride/);
  });

  it('writes JSON with the same rows and the cautions', async () => {
    const { code, out } = await run([...BASE, '--ions', 'chloride,mesylate', '--format', 'json']);
    expect(code).toBe(0);
    const doc = JSON.parse(out);
    expect(doc.format).toBe('saltsmith-screen');
    expect(doc.rows).toHaveLength(2);
    expect(doc.cautions.join(' ')).toMatch(/safety data sheet/);
  });

  it('is reproducible with a seed', async () => {
    const a = await run([...BASE, '--ions', 'chloride,mesylate,tosylate,besylate', '--seed', '5']);
    const b = await run([...BASE, '--ions', 'chloride,mesylate,tosylate,besylate', '--seed', '5']);
    expect(a.out).toBe(b.out);
  });

  it('reads a compound from --input JSON (the fictional demo file) and leaves cocrystal-band stoichiometries out, saying so', async () => {
    const { code, out } = await run([
      '--input',
      'fixtures/screening/demorazine-screen-input.json',
      '--format',
      'json',
      '--iterations',
      '100',
    ]);
    expect(code).toBe(0);
    const doc = JSON.parse(out);
    expect(doc.compound).toMatch(/fictional/);
    // ΔpKa rule (Cruz-Cabeza 2012): a stoichiometry below −1 is left out and listed.
    expect(doc.skippedCocrystalBand.length).toBeGreaterThan(0);
    for (const s of doc.skippedCocrystalBand) expect(s.deltaPka).toBeLessThan(-1);
    const kept = await run([
      '--input',
      'fixtures/screening/demorazine-screen-input.json',
      '--format',
      'json',
      '--iterations',
      '100',
      '--keep-cocrystal-band',
    ]);
    expect(JSON.parse(kept.out).rows.length).toBe(
      doc.rows.length + doc.skippedCocrystalBand.length,
    );
  });

  it('refuses bad input with a message and exit status 1', async () => {
    const outOfOrder = await run([
      '--formula',
      'C17H20N2O2',
      '--pka',
      '8,3',
      '--s0',
      '0.02',
      '--dose',
      '100',
    ]);
    expect(outOfOrder.code).toBe(1);
    expect(outOfOrder.err).toMatch(/out of order/);
    const zeroDose = await run([
      '--formula',
      'C17H20N2O2',
      '--pka',
      '8',
      '--s0',
      '0.02',
      '--dose',
      '0',
    ]);
    expect(zeroDose.code).toBe(1);
    expect(zeroDose.err).toMatch(/dose/i);
    const noS0 = await run(['--formula', 'C17H20N2O2', '--pka', '8', '--dose', '100']);
    expect(noS0.code).toBe(1);
    expect(noS0.err).toMatch(/melting point/);
    const badIon = await run([...BASE, '--ions', 'unobtainium']);
    expect(badIon.code).toBe(1);
    const coldT = await run([...BASE, '--temperature-c', '-300']);
    expect(coldT.code).toBe(1);
  });
});

describe('saltsmith eval: "kind":"ph-solubility"', () => {
  registerBuiltInEvalKinds();
  it('returns the profile and pH_max, with the 1:1 closed form beside it (Bogardus & Blackwood 1979)', async () => {
    const r = (await evaluateRequest({
      kind: 'ph-solubility',
      drug: { kind: 'base', pKas: [8], log10IntrinsicM: -5 },
      salt: { counterIon: 'chloride', log10Ksp: -3 },
    })) as { points: unknown[]; phMax: number; phMaxClosedForm1to1: number };
    expect(r.points).toHaveLength(71);
    expect(r.phMaxClosedForm1to1).toBeCloseTo(phMaxBase(8, 1e-5, 1e-3), 12);
    expect(Math.abs(r.phMax - r.phMaxClosedForm1to1)).toBeLessThan(1e-3);
    // Hand computation: 8 + log₁₀(1e-5/√1e-3) = 4.500.
    expect(r.phMaxClosedForm1to1).toBeCloseTo(4.5, 3);
  });
  it('the closed form takes the common ion the request passes: 5.038 with 0.1 M chloride, as the mass balance', async () => {
    const r = (await evaluateRequest({
      kind: 'ph-solubility',
      drug: { kind: 'base', pKas: [8], log10IntrinsicM: -5 },
      salt: { counterIon: 'chloride', log10Ksp: -3 },
      commonIonM: 0.1,
    })) as { phMax: number; phMaxClosedForm1to1: number };
    // Hand computation: [BH⁺] = (−0.1 + √(0.01 + 0.004))/2 = 0.0091608 M;
    // pH_max = 8 + log₁₀(1e-5/0.0091608) = 8 − 2.96194 = 5.038.
    expect(r.phMaxClosedForm1to1).toBeCloseTo(5.038, 3);
    expect(r.phMax).toBeCloseTo(5.038, 2);
  });
  it('rejects a pH outside 0–14', async () => {
    await expect(
      evaluateRequest({
        kind: 'ph-solubility',
        drug: { kind: 'base', pKas: [8], log10IntrinsicM: -5 },
        phFrom: -2,
      }),
    ).rejects.toThrow(/pH|phFrom/);
  });
});
