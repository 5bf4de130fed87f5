import { describe, expect, it } from 'vitest';
import { captureIo } from './support/capture-io';
import { readFileSync } from 'node:fs';
import { ionsCommand, ionsJsonDocument } from '@/cli/commands/ions';
import { COUNTER_IONS } from '@/chem/library';

async function run(args: string[]) {
  const c = captureIo();
  const code = await ionsCommand.run(args, c.io);
  return { code, out: c.out(), err: c.err() };
}

describe('saltsmith ions', () => {
  it('lists every bundled ion with formula, charge, pKa values and class', async () => {
    const { code, out } = await run([]);
    expect(code).toBe(0);
    expect(out).toMatch(/^name\s+formula\s+charge\s+pKa/);
    expect(out.trim().split('\n').length).toBe(COUNTER_IONS.length + 3);
    // Sulfuric acid pK2 1.99 (Fromm table, read 2026-12-01) shows in the sulfate row.
    expect(out).toMatch(/Sulfate\s+SO4²⁻\s+-2\s+-3\.00, 1\.99\s+1/);
  });

  it('finds entries by name or formula with --search', async () => {
    expect((await run(['--search', 'tosyl'])).out).toMatch(/Tosylate\s+C7H7O3S⁻/);
    expect((await run(['--search', 'C4H3O4'])).out).toMatch(/Fumarate[\s\S]*Maleate/);
    const none = await run(['--search', 'zzz-not-an-ion']);
    expect(none.code).toBe(1);
    expect(none.err).toMatch(/no counter-ion matches/);
  });

  it('prints every field with its source as JSON', async () => {
    const { code, out } = await run(['--json', '--search', 'mesylate']);
    expect(code).toBe(0);
    const doc = JSON.parse(out);
    expect(doc.format).toBe('saltsmith-counter-ion-library');
    const mesylate = doc.ions[0];
    expect(mesylate.id).toBe('mesylate');
    expect(mesylate.pKas[0].source).toMatch(/from memory/);
    expect(Object.keys(mesylate.sources)).toEqual(
      expect.arrayContaining([
        'formula',
        'molarMassGPerMol',
        'pKas',
        'acceptabilityClass',
        'tradeNote',
      ]),
    );
  });

  it('rejects a bad --kind', async () => {
    expect((await run(['--kind', 'neutral'])).code).toBe(2);
  });

  it('fixtures/library/counter-ions.json is the current library (regenerate with `npx saltsmith ions --json`)', () => {
    const fixture = JSON.parse(readFileSync('fixtures/library/counter-ions.json', 'utf8'));
    expect(fixture).toEqual(JSON.parse(JSON.stringify(ionsJsonDocument(COUNTER_IONS))));
  });
});
