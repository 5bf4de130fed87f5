import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './support/run-cli';

// Issue 18, "Silently accepted", at every command-line entrance: each case was accepted before (a key
// given twice: the last won; invalid UTF-8 became U+FFFD; a cut-off SMILES was screened as a smaller
// molecule). Compound values are made up; the checks are refusals and the field they name.
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-strict-'));
const SCREEN = ['screen', '--pka', '7.8', '--s0', '0.015', '--dose', '200', '--iterations', '20'];

// eslint-disable-next-line @typescript-eslint/no-explicit-any
const jsonLines = (out: string): any[] =>
  out
    .trim()
    .split('\n')
    .map((l) => JSON.parse(l) as unknown);

describe('a SMILES that is not read completely, or has several components, is refused everywhere', () => {
  it.each(['CN1CCN(CC1)c1ccc(cc1)C(', 'CCN(', 'CCN[', 'CCN%', 'CCN garbage', 'C1CC((((', 'CCN.Cl'])(
    '--smiles %j: exit 1, --smiles named',
    async (smiles) => {
      const r = await runCli([...SCREEN, '--smiles', smiles, '--ions', 'chloride']);
      expect(r.code).toBe(1);
      expect(r.out).toBe('');
      expect(r.err).toMatch(/^saltsmith screen: --smiles: /);
    },
  );

  it('in an --input file, a batch row and an eval request, with the field named', async () => {
    const input = join(dir, 'cut.json');
    writeFileSync(input, JSON.stringify({ smiles: 'CCN garbage', kind: 'base', pKas: [9] }));
    const a = await runCli(['screen', '--input', input, '--s0', '1', '--ions', 'chloride']);
    expect(a.code).toBe(1);
    expect(a.err).toMatch(/--smiles: "CCN garbage" is not a complete SMILES/);

    const batch = join(dir, 'cut.csv');
    writeFileSync(
      batch,
      'id,smiles,kind,pkas,s0_mg_per_ml\nB1,CCN(,base,9,1\nB2,CCN(CC)CC,base,10.7,1\n',
    );
    const b = await runCli(['screen', '--batch', batch, '--jobs', '1', '--ions', 'chloride']);
    expect(b.code).toBe(1);
    expect(b.err).toMatch(/line 2 \(id B1\): smiles: "CCN\(" is not a complete SMILES/);
    expect(b.out).toMatch(/B2/);

    const c = await runCli(
      ['eval'],
      '{"kind":"salt","cation":{"smiles":"C1CC((((","charge":1},"anion":"Cl-"}\n',
    );
    expect(c.code).toBe(1);
    expect(jsonLines(c.out)[0].error.field).toBe('cation.smiles');
  });
});

describe('a key given twice is refused at every entrance, naming the key', () => {
  it('eval: "cation" twice is an error line naming cation; the next line is answered', async () => {
    const r = await runCli(
      ['eval'],
      [
        '{"kind":"salt","cation":"Na+","cation":"K+","anion":"Cl-"}',
        '{"kind":"salt","cation":"K+","anion":"Br-","x":{"a":1,"a":2}}',
        '{"kind":"salt","cation":"K+","anion":"Br-"}',
      ].join('\n') + '\n',
    );
    expect(r.code).toBe(1);
    const [a, b, c] = jsonLines(r.out);
    expect(a.ok).toBe(false);
    expect(a.error).toMatchObject({ type: 'json', field: 'cation' });
    expect(b.error).toMatchObject({ type: 'json', field: 'x.a' });
    expect(c.ok).toBe(true);
  });

  it('a batch line with "kind" twice is a bad row naming kind; the others go on', async () => {
    const batch = join(dir, 'dup.jsonl');
    writeFileSync(
      batch,
      [
        '{"id":"J1","formula":"C10H15N","kind":"acid","pkas":"9","kind":"base","s0_mg_per_ml":1}',
        '{"id":"J2","formula":"C10H15N","kind":"base","pkas":"9","s0_mg_per_ml":1}',
      ].join('\n') + '\n',
    );
    const r = await runCli(['screen', '--batch', batch, '--jobs', '1', '--ions', 'chloride']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/line 1: kind: the key "kind" appears twice/);
    expect(r.out).toMatch(/J2/);
    expect(r.out).not.toMatch(/J1/);
  });

  it('an --input file with a key twice (at any depth) is refused, naming the path', async () => {
    const input = join(dir, 'dup.json');
    writeFileSync(
      input,
      '{"formula":"C10H15N","kind":"base","pKas":[9],"settings":{"temperatureC":37,"temperatureC":25}}',
    );
    const r = await runCli(['screen', '--input', input, '--s0', '1', '--ions', 'chloride']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--input settings\.temperatureC: the key "temperatureC" appears twice/);
  });
});

describe('invalid UTF-8 is refused, never read as U+FFFD', () => {
  const bytes = (...parts: (string | number[])[]) =>
    Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p) : Buffer.from(p))));

  it('eval: a line with a bad byte gets an error object; the other lines are answered', async () => {
    const r = await runCli(
      ['eval'],
      bytes(
        '{"kind":"salt","id":"',
        [0xff, 0xfe],
        '","cation":"Na+","anion":"Cl-"}\n',
        '{"kind":"salt","cation":"K+","anion":"Br-"}\n',
      ),
    );
    expect(r.code).toBe(1);
    const [a, b] = jsonLines(r.out);
    expect(a).toMatchObject({ line: 1, ok: false, error: { type: 'json', field: 'line' } });
    expect(a.error.message).toMatch(/not valid UTF-8/);
    expect(r.out).not.toContain('\uFFFD');
    expect(b.ok).toBe(true);
  });

  it('a batch row and an --input file with a bad byte are refused', async () => {
    const batch = join(dir, 'bad-utf8.csv');
    writeFileSync(
      batch,
      bytes('id,name,formula,kind,pkas,s0_mg_per_ml\nB1,na', [0xc3], 'me,C10H15N,base,9,1\n'),
    );
    const r = await runCli(['screen', '--batch', batch, '--jobs', '1', '--ions', 'chloride']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/line 2: line: is not valid UTF-8/);
    const input = join(dir, 'bad-utf8.json');
    writeFileSync(input, bytes('{"name":"', [0xed, 0xa0, 0x80], '"}'));
    const s = await runCli([
      ...SCREEN,
      '--formula',
      'C10H15N',
      '--input',
      input,
      '--ions',
      'chloride',
    ]);
    expect(s.code).toBe(1);
    expect(s.err).toMatch(/--input: is not valid UTF-8/);
  });
});

describe('files that are not what they should be (cases beyond the issue)', () => {
  it('--input a folder or an endless device, --batch a folder: one line naming the flag, exit 1', async () => {
    const a = await runCli([...SCREEN, '--formula', 'C10H15N', '--input', dir]);
    expect(a.code).toBe(1);
    expect(a.err.trim()).toBe(
      `saltsmith screen: --input: ${dir} is a folder (accepted: a JSON file)`,
    );
    // /dev/zero has no size to check: it is read only up to the cap plus one byte.
    const b = await runCli([...SCREEN, '--formula', 'C10H15N', '--input', '/dev/zero']);
    expect(b.code).toBe(1);
    expect(b.err).toMatch(/--input: \/dev\/zero is larger than 1048576 bytes/);
    const folder = join(dir, 'folder.csv');
    mkdirSync(folder);
    const c = await runCli(['screen', '--batch', folder, '--jobs', '1']);
    expect(c.code).toBe(1);
    expect(c.err.trim()).toMatch(/^saltsmith screen: --batch: .* is a folder/);
  });
});
