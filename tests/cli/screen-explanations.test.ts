import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { screenCommand } from '@/cli/commands/screen/screen-command';
import { captureIo } from './support/capture-io';

// The CLI's CSV says what the app and the sheet say: what separates the candidates, the assumptions
// written from the basis each row used, and ΔH_sol per drug ion. A made-up test base; the assertions
// check wording against the screen's own choices, not its numbers.
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-explain-'));
function input(extra: Record<string, unknown> = {}): string {
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
      ions: ['chloride', 'mesylate', 'tosylate'],
      ...extra,
    }),
  );
  return p;
}

describe('saltsmith screen: the CSV notes explain the screen it ran', () => {
  it('closes with the separation line and assumptions naming the fitted model, not the anchor', async () => {
    const c = captureIo();
    expect(await screenCommand.run(['--input', input(), '--iterations', '100'], c.io)).toBe(0);
    const notes = c
      .out()
      .split('\n')
      .filter((l) => l.startsWith('#'));
    expect(
      notes.some((l) =>
        /^# What separates the candidates: (The order rests on|No criterion)/.test(l),
      ),
    ).toBe(true);
    const assumptions = notes.filter((l) => l.startsWith('# Assumption:')).join('\n');
    expect(assumptions).toMatch(/ridge regression/);
    expect(assumptions).not.toMatch(/anchor|10² × S₀|thermochemical shift/);
  });

  it('gives ΔH_sol per drug ion, or says why it is not informative', async () => {
    const c = captureIo();
    expect(await screenCommand.run(['--input', input(), '--iterations', '100'], c.io)).toBe(0);
    const rows = Papa.parse<Record<string, string>>(
      c
        .out()
        .split('\n')
        .filter((l) => !l.startsWith('#'))
        .join('\n'),
      { header: true, skipEmptyLines: true },
    ).data;
    expect(Object.keys(rows[0]!)).toEqual(
      expect.arrayContaining([
        'solution_enthalpy_kj_per_mol_drug_ion',
        'solution_enthalpy_kj_per_mol_drug_ion_sd',
        'solution_enthalpy_not_informative',
      ]),
    );
    for (const r of rows) {
      // Either a number or a reason, never both.
      expect(
        r.solution_enthalpy_kj_per_mol_drug_ion === '' ||
          r.solution_enthalpy_not_informative === '',
      ).toBe(true);
    }
  });
});
