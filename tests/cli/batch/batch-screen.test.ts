import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { runCli } from '../support/run-cli';
import { captureIo } from '../support/capture-io';
import { main } from '@/cli/main';
import { createProgressBar } from '@/cli/commands/screen/batch/progress-bar';

// Batch screening (issue 12) checked against the single-compound `screen` for the same compounds, bad
// rows included. Compounds and values are made up; the checks are identities between the two routes.
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-batch-'));
const ITER = ['--iterations', '40', '--seed', '3'];

type Row = Record<string, string>;
const parseCsv = (text: string) =>
  Papa.parse<Row>(
    text
      .split('\n')
      .filter((l) => !l.startsWith('#'))
      .join('\n'),
    { header: true, skipEmptyLines: true },
  ).data;

/** Each batch row, with the flags a single `screen` takes for the same compound. */
const COMPOUNDS: { line: string; flags: string[] | null }[] = [
  {
    line: 'A1,Alpha,CN1CCN(CC1)c1ccc(cc1)C(=O)Nc1ccc(Cl)cc1,,base,7.8,,0.015,,,200,chloride;mesylate;sulfate',
    flags: [
      '--smiles',
      'CN1CCN(CC1)c1ccc(cc1)C(=O)Nc1ccc(Cl)cc1',
      '--pka',
      '7.8',
      '--s0',
      '0.015',
      '--dose',
      '200',
      '--ions',
      'chloride,mesylate,sulfate',
    ],
  },
  {
    line: 'A2,Beta,,C16H19N3O2,base,6.4,,,172,2.6,100,',
    flags: [
      '--formula',
      'C16H19N3O2',
      '--pka',
      '6.4',
      '--mp',
      '172',
      '--logp',
      '2.6',
      '--dose',
      '100',
    ],
  },
  {
    line: 'A3,Gamma,CC(C(=O)O)c1ccc(OCC2CC2)c(F)c1,,acid,4.6,,0.03,,,400,sodium;calcium;meglumine',
    flags: [
      '--smiles',
      'CC(C(=O)O)c1ccc(OCC2CC2)c(F)c1',
      '--kind',
      'acid',
      '--pka',
      '4.6',
      '--s0',
      '0.03',
      '--dose',
      '400',
      '--ions',
      'sodium,calcium,meglumine',
    ],
  },
  // bad rows: each is refused by the single screen too
  {
    line: 'B1,Salted,CCN.Cl,,base,10.6,,1,,,100,chloride',
    flags: [
      '--smiles',
      'CCN.Cl',
      '--pka',
      '10.6',
      '--s0',
      '1',
      '--dose',
      '100',
      '--ions',
      'chloride',
    ],
  },
  {
    line: 'B2,Wrong ion,,C16H19N3O2,base,6.4,,0.1,,,100,sodium',
    flags: [
      '--formula',
      'C16H19N3O2',
      '--pka',
      '6.4',
      '--s0',
      '0.1',
      '--dose',
      '100',
      '--ions',
      'sodium',
    ],
  },
  {
    line: 'B3,Huge dose,,C16H19N3O2,base,6.4,,0.1,,,1.7e308,chloride',
    flags: [
      '--formula',
      'C16H19N3O2',
      '--pka',
      '6.4',
      '--s0',
      '0.1',
      '--dose',
      '1.7e308',
      '--ions',
      'chloride',
    ],
  },
  {
    line: 'B4,No S0,,C16H19N3O2,base,6.4,,,,,100,chloride',
    flags: ['--formula', 'C16H19N3O2', '--pka', '6.4', '--dose', '100', '--ions', 'chloride'],
  },
  { line: 'B5,Empty pKa,,C16H19N3O2,base,;6.4,,0.1,,,100,chloride', flags: null },
  { line: 'B6,Cells,,C16H19N3O2,base', flags: null },
];
const HEADER = 'id,name,smiles,formula,kind,pkas,charge,s0_mg_per_ml,mp_c,logp,dose_mg,ions';

function batchFile(name: string, lines: string[]) {
  const p = join(dir, name);
  writeFileSync(p, [HEADER, ...lines].join('\n') + '\n');
  return p;
}

describe('saltsmith screen --batch', () => {
  it('gives, for every compound, the rows of a single screen with the same settings; bad rows fail the same way, by line number', async () => {
    const file = batchFile(
      'mixed.csv',
      COMPOUNDS.map((c) => c.line),
    );
    const errors = join(dir, 'mixed-errors.txt');
    const batch = await runCli([
      'screen',
      '--batch',
      file,
      '--jobs',
      '1',
      '--errors',
      errors,
      ...ITER,
    ]);
    expect(batch.code).toBe(1);
    const rows = parseCsv(batch.out);
    const errorLines = readFileSync(errors, 'utf8').trim().split('\n');
    expect(errorLines).toHaveLength(6);
    for (const [i, c] of COMPOUNDS.entries()) {
      const id = c.line.split(',')[0]!;
      const lineNo = i + 2;
      const batchRows = rows
        .filter((r) => r.compound_id === id)
        .map(({ compound_id: _i, compound_name: _n, ...r }) => r);
      const batchError = errorLines.find((l) => new RegExp(`^line ${lineNo}[ :]`).test(l));
      if (c.flags === null) {
        expect(batchError).toBeTruthy();
        continue;
      }
      const single = await runCli(['screen', ...c.flags, ...ITER]);
      if (single.code === 0) {
        expect(batchError).toBeUndefined();
        expect(batchRows).toEqual(parseCsv(single.out));
        expect(batchRows.length).toBeGreaterThan(0);
      } else {
        expect(single.code).toBe(1);
        expect(batchRows).toEqual([]);
        expect(batchError).toMatch(new RegExp(`^line ${lineNo} \\(id ${id}\\): `));
        // the same refusal, named by column instead of flag
        const why = single.err
          .replace(/^saltsmith screen: \S+: /, '')
          .split(' (accepted')[0]!
          .trim();
        expect(batchError).toContain(why.replace(/--\w+/g, '').slice(0, 25));
      }
    }
    expect(batch.err).toMatch(/3 of 9 compound\(s\) screened on 1 thread\(s\), .* 6 failed/);
    expect(batch.out).toMatch(
      /# Estimates here screen candidates; they do not establish a salt form\./,
    );
  });

  it('--top N keeps the N best candidates of each compound, ranks 1..N, in input order', async () => {
    const file = batchFile(
      'top.csv',
      COMPOUNDS.slice(0, 3).map((c) => c.line),
    );
    const r = await runCli(['screen', '--batch', file, '--top', '2', '--jobs', '1', ...ITER]);
    expect(r.code).toBe(0);
    const rows = parseCsv(r.out);
    expect(rows.map((x) => `${x.compound_id}:${x.rank}`)).toEqual([
      'A1:1',
      'A1:2',
      'A2:1',
      'A2:2',
      'A3:1',
      'A3:2',
    ]);
  });

  it('reads JSON Lines and writes JSON Lines (a row per line, the cautions last)', async () => {
    const p = join(dir, 'in.jsonl');
    writeFileSync(
      p,
      [
        JSON.stringify({
          id: 'J1',
          formula: 'C16H19N3O2',
          kind: 'base',
          pkas: [6.4],
          s0_mg_per_ml: 0.1,
          dose_mg: 100,
          ions: ['chloride', 'mesylate'],
        }),
        JSON.stringify({
          id: 'J2',
          formula: 'C16H19N3O2',
          kind: 'base',
          pkas: '6.4',
          s0_mg_per_ml: 'lots',
        }),
        '{"id":' + '['.repeat(100) + ']'.repeat(100) + '}',
        JSON.stringify({
          id: 'J3',
          formula: 'C16H19N3O2',
          kind: 'base',
          pkas: [6.4],
          s0_mg_per_ml: 0.1,
          extra: 1,
        }),
      ].join('\n') + '\n',
    );
    const r = await runCli(['screen', '--batch', p, '--format', 'jsonl', '--jobs', '1', ...ITER]);
    expect(r.code).toBe(1);
    const out = r.out
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(out.slice(0, -1).map((x) => x.compound_id)).toEqual(['J1', 'J1']);
    expect(out.at(-1).cautions[0]).toMatch(/do not establish a salt form/);
    expect(r.err).toMatch(/line 2 \(id J2\): s0_mg_per_ml: "lots" is not a number/);
    expect(r.err).toMatch(/line 3: line: nested deeper than 64 levels/);
    expect(r.err).toMatch(/line 4: "extra": is not a batch field/);
  });

  it('refuses a file with an unknown column or the compound flags, writing nothing', async () => {
    const p = join(dir, 'badheader.csv');
    writeFileSync(p, 'id,kind,pkas,formula,colour\nX,base,7,C2H7N,red\n');
    const r = await runCli(['screen', '--batch', p, '--jobs', '1']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/column "colour": is not a batch column/);
    expect(r.out).toBe('');
    const both = await runCli(['screen', '--batch', p, '--pka', '7']);
    expect(both.code).toBe(2);
    expect(both.err).toMatch(/--pka: cannot be combined with --batch/);
    const unknownType = await runCli(['screen', '--batch', join(dir, 'list.txt')]);
    expect(unknownType.code).toBe(2);
  });

  it('draws a progress bar with rate and time left on a terminal only', async () => {
    const file = batchFile(
      'progress.csv',
      COMPOUNDS.slice(0, 2).map((c) => c.line),
    );
    const tty = captureIo();
    expect(
      await main(['screen', '--batch', file, '--jobs', '1', ...ITER], {
        ...tty.io,
        stderrIsTty: true,
      }),
    ).toBe(0);
    const piped = captureIo();
    expect(await main(['screen', '--batch', file, '--jobs', '1', ...ITER], piped.io)).toBe(0);
    expect(piped.err()).not.toMatch(/\r|\[#/);
    expect(tty.out()).toBe(piped.out());
    let t = 0;
    const bar = createProgressBar(captureIo().io.stderr, 1000, () => t);
    t = 2000;
    expect(bar.render(250, 50)).toMatch(
      /\[######\.{18}\]\s+25 %\s+50 compounds\s+25\/s\s+0:06 left/,
    );
  });

  it('neutralises formula-like text cells, Unicode look-alikes included (OWASP "CSV Injection")', async () => {
    const names = ['=HYPERLINK("x")', '\uFE66cmd', '\uFE62 1', '\u200B=1+1', '\uFF0B2'];
    const file = batchFile(
      'inject.csv',
      names.map(
        (n, i) => `I${i},"${n.replace(/"/g, '""')}",,C16H19N3O2,base,6.4,,0.1,,,100,chloride`,
      ),
    );
    const r = await runCli(['screen', '--batch', file, '--jobs', '1', ...ITER]);
    expect(r.code).toBe(0);
    expect(parseCsv(r.out).map((x) => x.compound_name)).toEqual(names.map((n) => `'${n}`));
  });

  it('runs the fictional example file in fixtures/batch', async () => {
    const r = await runCli([
      'screen',
      '--batch',
      'fixtures/batch/fictional-compounds.csv',
      '--top',
      '3',
      '--jobs',
      '1',
      ...ITER,
    ]);
    expect(r.code).toBe(0);
    const rows = parseCsv(r.out);
    expect(new Set(rows.map((x) => x.compound_id)).size).toBe(5);
    expect(rows.every((x) => /fictional/.test(x.compound_name!))).toBe(true);
  });
});
