import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './support/run-cli';
import { TEST_COMPOUND_ARGS } from './support/test-compound';

// Each case below is one of the command-line failures reported in issue 13; before the fix each was
// accepted (exit 0) or ended the run. Compound values are made up (structure checks only).
const BASE = ['screen', ...TEST_COMPOUND_ARGS, '--iterations', '50', '--ions', 'chloride,mesylate'];

async function evalLines(...lines: string[]) {
  const r = await runCli(['eval'], lines.join('\n') + '\n');
  return {
    ...r,
    lines: r.out
      .trim()
      .split('\n')
      // eslint-disable-next-line @typescript-eslint/no-explicit-any
      .map((l) => JSON.parse(l) as Record<string, any>),
  };
}

describe('flags: empty, extra, unknown, repeated and contradictory input is refused with the flag named (exit 2)', () => {
  it.each([
    [['--pka', ',7.8'], '--pka'],
    [['--pka=7.8,'], '--pka'],
    [['--mp=', '--logp='], '--mp'],
    [['--dosee', '200'], '--dosee'],
    [['stray'], 'stray'],
    [['--dose', '100'], '--dose'], // given twice (BASE has --dose)
    [['--smiles', 'CCN'], '--smiles'], // with --formula
    [['--kind', 'acid', '--charge', '1'], '--charge'],
    [['--jobs', '2'], '--jobs'], // only with --batch
    [['--ions', 'chloride'], '--ions'], // twice
    [['--keep-cocrystal-band=yes'], '--keep-cocrystal-band'],
    [['--format', 'xml'], '--format'],
  ])('screen %j', async (extra, flag) => {
    const r = await runCli([...BASE, ...extra]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(flag);
  });

  it('lattice and ions refuse unknown flags and stray values too', async () => {
    const a = await runCli(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--metod', 'vbt']);
    expect(a.code).toBe(2);
    expect(a.err).toContain('--metod');
    expect(a.err).toContain('did you mean --method');
    const b = await runCli(['ions', 'sulfate']);
    expect(b.code).toBe(2);
    expect(b.err).toContain('sulfate');
    const c = await runCli([
      'lattice',
      '--cation',
      'Na+',
      '--anion',
      'Cl-',
      '--volume',
      '0.04',
      '--density',
      '2',
    ]);
    expect(c.code).toBe(2);
    expect(c.err).toContain('--volume');
    const d = await runCli([
      'lattice',
      '--cation',
      'Na+',
      '--anion',
      'Cl-',
      '--method',
      'kapustinskii',
      '--volume',
      '0.04',
    ]);
    expect(d.code).toBe(2);
    expect(d.err).toMatch(/--volume.*not used by --method kapustinskii/);
  });
});

describe('values: every number finite and in range (exit 1, field named)', () => {
  it('refuses --dose 1.7e308 instead of writing Infinity', async () => {
    const r = await runCli([...BASE.slice(0, 7), '--dose', '1.7e308', '--ions', 'chloride']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--dose: 1\.7e\+308 is out of range/);
  });

  it('refuses five pKa values (one to four are accepted)', async () => {
    const r = await runCli([
      'screen',
      '--formula',
      'C17H20N2O2',
      '--pka',
      '3,4,5,6,7',
      '--s0',
      '0.02',
    ]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--pka: 5 value\(s\).*1 to 4/);
  });

  it('refuses lattice --volume 0 instead of falling back to another method', async () => {
    const r = await runCli(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--volume', '0']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--volume: 0 is out of range/);
  });

  it('refuses an out-of-range formulaUnitVolumeNm3 or densityGPerCm3 under the default method (auto)', async () => {
    const { code, lines } = await evalLines(
      '{"kind":"salt","cation":"Na+","anion":"Cl-","formulaUnitVolumeNm3":50}',
      '{"kind":"salt","cation":"Na+","anion":"Cl-","densityGPerCm3":0.01,"molarMassGPerMol":58.44}',
      '{"kind":"salt","cation":"Na+","anion":"Cl-","formulaUnitVolumeNm3":0}',
      '{"kind":"salt","cation":"Na+","anion":"Cl-","densityGPerCm3":2.16}',
      '{"kind":"salt","cation":"Na+","anion":"Cl-","formulaUnitVolumeNm3":0.0449}',
    );
    expect(code).toBe(1);
    expect(lines.map((l) => l.ok)).toEqual([false, false, false, false, true]);
    expect(lines[0]!.error.field).toBe('formulaUnitVolumeNm3');
    expect(lines[1]!.error.field).toBe('densityGPerCm3');
    expect(lines[2]!.error.field).toBe('formulaUnitVolumeNm3');
    expect(lines[3]!.error.field).toBe('molarMassGPerMol'); // a density without the molar mass it needs
  });
});

describe('ions whose formula, SMILES and charge disagree are refused', () => {
  it('refuses a written charge that disagrees with "charge", SO4 as a +2 cation, benzene with charge 4', async () => {
    const { lines } = await evalLines(
      '{"kind":"salt","cation":"Na+","anion":{"formula":"SO4 2-","charge":-1}}',
      '{"kind":"salt","cation":{"formula":"SO4","charge":2},"anion":"Cl-"}',
      '{"kind":"salt","cation":{"smiles":"c1ccccc1","charge":4},"anion":"Cl-"}',
      '{"kind":"salt","cation":{"formula":"C6H6","charge":1},"anion":"Cl-"}',
      '{"kind":"salt","cation":"Na+","anion":{"formula":"SO4 2-","charge":-2}}',
      '{"kind":"salt","cation":{"formula":"C4H12N","charge":1},"anion":"Cl-"}',
    );
    expect(lines.map((l) => l.ok)).toEqual([false, false, false, false, true, true]);
    expect(lines[0]!.error.field).toBe('anion.formula');
    expect(lines[1]!.error.message).toMatch(/SO4 is the bundled ion .*charge -2, not 2/);
    expect(lines[2]!.error.field).toBe('cation.charge');
    expect(lines[2]!.error.message).toMatch(/cannot carry charge \+4/);
    expect(lines[3]!.error.message).toMatch(/cannot carry charge \+1/);
  });

  it('refuses a multi-component SMILES with the same message in screen and eval', async () => {
    const s = await runCli([
      'screen',
      '--smiles',
      'CCN.Cl',
      '--pka',
      '10.6',
      '--s0',
      '1',
      '--ions',
      'chloride',
      '--iterations',
      '10',
    ]);
    expect(s.code).toBe(1);
    expect(s.err).toMatch(/--smiles: "CCN\.Cl" has several components/);
    const { lines } = await evalLines(
      '{"kind":"salt","cation":{"smiles":"CCN.Cl","charge":1},"anion":"Cl-"}',
    );
    expect(lines[0]!.error.message).toMatch(/"CCN\.Cl" has several components/);
  });

  it('refuses --ions sodium for a base, naming the mismatch (exit 1, not an empty table)', async () => {
    const r = await runCli([...BASE.slice(0, 9), '--ions', 'sodium']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(
      /--ions: Sodium is a counter-cation; a base forms salts with counter-anions/i,
    );
    expect(r.out).toBe('');
  });

  it('refuses the same ion twice instead of writing duplicate rows', async () => {
    const r = await runCli([...BASE.slice(0, 9), '--ions', 'chloride,mesylate,Chloride']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--ions: "chloride" is given twice/);
  });
});

describe('eval: bounded lines and nesting, the run goes on', () => {
  it('answers an id nested 5,000 deep with a per-line error and goes on', async () => {
    const deep =
      '{"kind":"salt","cation":"Na+","anion":"Cl-","id":' +
      '['.repeat(5000) +
      ']'.repeat(5000) +
      '}';
    const { code, lines } = await evalLines(deep, '{"kind":"salt","cation":"K+","anion":"Br-"}');
    expect(code).toBe(1);
    expect(lines).toHaveLength(2);
    expect(lines[0]!.error.message).toMatch(/nested deeper than 64/);
    expect(lines[1]!.ok).toBe(true);
  });

  it('answers a line over 1 MiB with a per-line error (no stack trace) and goes on', async () => {
    const huge = '{"kind":"salt","id":"' + 'x'.repeat(2 * 1024 * 1024) + '"}';
    const { code, lines, err } = await evalLines(
      huge,
      '{"kind":"salt","cation":"K+","anion":"Br-"}',
    );
    expect(code).toBe(1);
    expect(lines[0]!.error.message).toMatch(/bytes long/);
    expect(lines[0]!.line).toBe(1);
    expect(lines[1]!.ok).toBe(true);
    expect(err).not.toMatch(/at .*\(.*:\d+:\d+\)/);
  });
});

describe('--out is written atomically', () => {
  it('a successful run replaces the file; the temporary file is gone', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'saltsmith-out-'));
    const out = join(dir, 'screen.csv');
    writeFileSync(out, 'previous\n');
    const r = await runCli([...BASE, '--out', out]);
    expect(r.code).toBe(0);
    expect(readFileSync(out, 'utf8')).toMatch(/^rank,candidate/);
    const { readdirSync } = await import('node:fs');
    expect(readdirSync(dir)).toEqual(['screen.csv']);
  });
});
