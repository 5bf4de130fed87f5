import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { SALT_SOLUBILITY_FUSION_CHECK } from '@/chem';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { captureIo } from './support/capture-io';
import { TEST_COMPOUND_ARGS } from './support/test-compound';

// `screen --format json` gains `measure_next`. The compound is the made-up test base; assertions check
// structure, order, reproducibility and the rules (a measurement already taken is not proposed
// again), not its numbers — the values themselves are checked against hand computations in
// tests/chem/screening/measure-next.
async function run(args: string[]) {
  const c = captureIo();
  const code = await screenCommand.run(args, c.io);
  return { code, out: c.out(), err: c.err() };
}
const IONS = ['--ions', 'chloride,mesylate,tosylate,besylate,sulfate'];
const BASE = [...TEST_COMPOUND_ARGS, ...IONS, '--iterations', '300', '--format', 'json'];

interface Entry {
  counter_ion: string;
  measurement: string;
  value: number;
}

describe('saltsmith screen --format json: measure_next', () => {
  it('lists {counter_ion, measurement, value}, highest value first, for screened counter-ions', async () => {
    const { code, out } = await run(BASE);
    expect(code).toBe(0);
    const doc = JSON.parse(out) as { measure_next: Entry[]; rows: { counter_ion: string }[] };
    const list = doc.measure_next;
    expect(list.length).toBeGreaterThan(0);
    const ions = new Set(doc.rows.map((r) => r.counter_ion));
    for (const e of list) {
      expect(Object.keys(e)).toStrictEqual(['counter_ion', 'measurement', 'value']);
      expect(['solubility', 'melting-point']).toContain(e.measurement);
      expect(ions.has(e.counter_ion)).toBe(true);
      expect(e.value).toBeGreaterThanOrEqual(0);
      expect(e.value).toBeLessThanOrEqual(1);
    }
    for (let i = 1; i < list.length; i++)
      expect(list[i]!.value).toBeLessThanOrEqual(list[i - 1]!.value);
  });

  it('leaves the rest of the document as it was: measure_next sits between rows and cautions', async () => {
    const doc = JSON.parse((await run(BASE)).out) as Record<string, unknown>;
    expect(Object.keys(doc)).toStrictEqual([
      'format',
      'version',
      'compound',
      'drugKind',
      'intrinsicSolubility',
      'freeForm',
      'robustness',
      'candidateForms',
      'skippedCocrystalBand',
      'units',
      'separation',
      'assumptions',
      'rows',
      'measure_next',
      'cautions',
    ]);
    const csv = await run([...TEST_COMPOUND_ARGS, ...IONS, '--iterations', '300']);
    expect(csv.out).not.toMatch(/measure_next/);
  });

  it('is reproducible with --seed and --iterations', async () => {
    const a = JSON.parse((await run([...BASE, '--seed', '9'])).out).measure_next;
    const b = JSON.parse((await run([...BASE, '--seed', '9'])).out).measure_next;
    expect(a).toStrictEqual(b);
  });

  it('values a melting point at 0 while no cross-validated fusion path is shipped', async () => {
    const list = JSON.parse((await run(BASE)).out).measure_next as Entry[];
    const mp = list.filter((e) => e.measurement === 'melting-point');
    expect(mp.length).toBeGreaterThan(0);
    if (!SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies)
      for (const e of mp) expect(e.value).toBe(0);
  });

  it('does not propose again a solubility already measured (its σ is narrow)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'saltsmith-mn-'));
    const file = join(dir, 'in.json');
    writeFileSync(
      file,
      JSON.stringify({
        name: 'test base',
        formula: 'C17H20N2O2',
        kind: 'base',
        pKas: [8],
        intrinsicSolubilityMgPerMl: 0.02,
        doseMg: 100,
        ions: ['chloride', 'mesylate', 'tosylate'],
        // measured at the screening temperature with the salt left (stated), so its σ is narrow
        bench: {
          mesylate: {
            solubilityMgPerMl: 30,
            solubilityPh: 4,
            solubilityTemperatureC: 37,
            solidForm: 'salt',
          },
        },
      }),
    );
    const { code, out } = await run(['--input', file, '--iterations', '300', '--format', 'json']);
    expect(code).toBe(0);
    const list = JSON.parse(out).measure_next as Entry[];
    const pairs = list.map((e) => `${e.counter_ion} ${e.measurement}`);
    expect(pairs).not.toContain('mesylate solubility');
    expect(pairs).not.toContain('mesylate melting-point'); // a measured solubility overrides it
    expect(pairs).toContain('chloride solubility');
  });

  it("README's quoted demo entry is what the command prints for the demo input (default flags)", async () => {
    const readme = readFileSync('README.md', 'utf8');
    const quoted = /For the fictional demo\s+input[\s\S]*?`(\{"counter_ion"[^`]*\})`/.exec(readme);
    expect(quoted).not.toBeNull();
    const { code, out } = await run([
      '--input',
      'fixtures/screening/demorazine-screen-input.json',
      '--format',
      'json',
    ]);
    expect(code).toBe(0);
    const first = (JSON.parse(out) as { measure_next: Entry[] }).measure_next[0]!;
    expect(first).toStrictEqual(JSON.parse(quoted![1]!));
  });
});
