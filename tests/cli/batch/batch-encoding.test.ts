import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvField } from '@/cli/commands/screen/batch/screen-one';
import { runCli } from '../support/run-cli';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// The batch writes CSV fields itself (screen-one.ts); papaparse, the general-purpose CSV library the
// single `screen` writes with, is the reference they must match character for character.
describe('batch CSV fields', () => {
  it('quote and escape as papaparse does, for any text or number (fixed seed)', () => {
    const text = fc.string({
      unit: fc.constantFrom('a', ' ', ',', '"', '\n', '\r', '\uFEFF', '=', 'é', '1'),
    });
    fc.assert(
      fc.property(fc.oneof(text, fc.double(), fc.integer(), fc.constant(null)), (v) => {
        expect(csvField(v)).toBe(Papa.unparse([[v]], { newline: '\n' }));
      }),
      { numRuns: 2000, seed: 21 },
    );
  });
});

describe('batch Monte Carlo', () => {
  // A made-up compound: the check is on which columns are filled, not on chemistry.
  const dir = mkdtempSync(join(tmpdir(), 'saltsmith-batch-mc-'));
  const file = join(dir, 'one.csv');
  writeFileSync(
    file,
    'id,name,smiles,formula,kind,pkas,charge,s0_mg_per_ml,mp_c,logp,dose_mg,ions\nA2,Beta,,C16H19N3O2,base,6.4,,,172,2.6,100,chloride;mesylate;sulfate\n',
  );
  const pTop3 = (out: string) =>
    Papa.parse<Record<string, string>>(
      out
        .split('\n')
        .filter((l) => !l.startsWith('#'))
        .join('\n'),
      {
        header: true,
        skipEmptyLines: true,
      },
    ).data.map((r) => r.p_top3);

  it('runs only when --iterations asks: P(top 3) is empty by default and filled with it', async () => {
    const plain = await runCli(['screen', '--batch', file, '--jobs', '1']);
    expect(plain.code).toBe(0);
    expect(pTop3(plain.out).every((p) => p === '')).toBe(true);
    const asked = await runCli(['screen', '--batch', file, '--jobs', '1', '--iterations', '50']);
    expect(asked.code).toBe(0);
    const ps = pTop3(asked.out).map(Number);
    expect(ps.length).toBe(3);
    expect(ps.every((p) => p >= 0 && p <= 1)).toBe(true);
  });
});
