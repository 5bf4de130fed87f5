import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { safeCsvCell } from '@/chem';
import { SCREENING_CAUTIONS } from '@/cli/output/cautions';
import { KSP_NOTE } from '@/cli/commands/screen/screen-writers';
import { runCli } from '../support/run-cli';
import { buildCompiledCli } from '../support/compiled-cli';
import { GOLDEN_FLAGS, GOLDEN_INPUTS, generatedFile } from './make-batch-golden.mjs';
import { BATCH_HEADER } from './generated-compounds.mjs';

// Issue 20: the faster batch must not change one byte of its output. Two independent references:
// (1) the single-compound `screen` command, run once per compound with the same settings, its table
// re-assembled into the batch's long table here (papaparse writes the CSV, JSON.stringify the JSON
// Lines) — so any divergence of the batch path (threads, chunks, ordering, buffered writes, its own
// CSV writer) fails, whatever columns the screen has; (2) the golden files in fixtures/batch/golden/,
// written by tests/cli/batch/make-batch-golden.mjs from the CLI before the speed work (regenerate them
// with that script when the output is meant to change).
const dir = mkdtempSync(join(tmpdir(), 'saltsmith-batch-diff-'));
const inputs: Record<string, string> = Object.fromEntries(
  Object.entries(GOLDEN_INPUTS).map(([name, path]) => [name, path ?? generatedFile(dir)]),
);
const SETTINGS = GOLDEN_FLAGS.filter((_, i, a) => a[i] !== '--jobs' && a[i - 1] !== '--jobs');

type Row = Record<string, string>;

/** The compounds of a batch file as the flags of a single `screen` (the columns of batch-row.ts). */
function compoundsOf(file: string): { id: string; name: string; flags: string[] }[] {
  const text = readFileSync(file, 'utf8')
    .split('\n')
    .filter((l) => l.trim() !== '' && !l.startsWith('#'))
    .join('\n');
  const rows = Papa.parse<Row>(text, { header: true }).data;
  const flag = (name: string, v: string | undefined, list = false) =>
    v ? [`--${name}`, list ? v.split(';').join(',') : v] : [];
  return rows.map((r) => ({
    id: r.id!,
    name: r.name || r.id!,
    flags: [
      ...flag('name', r.name || r.id),
      ...flag('smiles', r.smiles),
      ...flag('formula', r.formula),
      ...flag('kind', r.kind),
      ...flag('pka', r.pkas, true),
      ...flag('charge', r.charge),
      ...flag('s0', r.s0_mg_per_ml),
      ...flag('mp', r.mp_c),
      ...flag('logp', r.logp),
      ...flag('dose', r.dose_mg),
      ...flag('ions', r.ions, true),
    ],
  }));
}

/** The batch output the single `screen` command implies for the same compounds and settings. */
async function reference(file: string, format: 'csv' | 'jsonl'): Promise<string> {
  let header: string | null = null;
  const body: string[] = [];
  for (const c of compoundsOf(file)) {
    const single = await runCli([
      'screen',
      ...c.flags,
      ...SETTINGS,
      '--format',
      format === 'csv' ? 'csv' : 'json',
    ]);
    expect(single.code, `${c.id}: ${single.err}`).toBe(0);
    if (format === 'jsonl') {
      const rows = (JSON.parse(single.out) as { rows: Record<string, unknown>[] }).rows;
      for (const row of rows)
        body.push(JSON.stringify({ compound_id: c.id, compound_name: c.name, ...row }) + '\n');
      continue;
    }
    const lines = single.out.split('\n').filter((l) => l !== '' && !l.startsWith('#'));
    const lead = Papa.unparse([[safeCsvCell(c.id), safeCsvCell(c.name)]], { newline: '\n' });
    header ??= `compound_id,compound_name,${lines[0]}\n`;
    // a record of the single screen's CSV may span lines (a quoted line break): re-read it whole
    const records = Papa.parse<string[]>(lines.slice(1).join('\n'), { header: false }).data;
    for (const rec of records) body.push(`${lead},${Papa.unparse([rec], { newline: '\n' })}\n`);
  }
  const notes = [...SCREENING_CAUTIONS, KSP_NOTE];
  const closing =
    format === 'jsonl'
      ? JSON.stringify({ cautions: notes }) + '\n'
      : notes.map((n) => `# ${n}`).join('\n') + '\n';
  return (header ?? '') + body.join('') + closing;
}

let launcher = '';
beforeAll(() => {
  launcher = buildCompiledCli().launcher;
}, 300_000);

/** The compiled CLI on two threads: the worker path with its chunks and buffered output. */
function compiledBatch(file: string, format: 'csv' | 'jsonl'): string {
  const r = spawnSync(
    process.execPath,
    [launcher, 'screen', '--batch', file, ...GOLDEN_FLAGS, '--format', format],
    { encoding: 'utf8', maxBuffer: 64 * 2 ** 20 },
  );
  expect(r.status, r.stderr).toBe(0);
  return r.stdout;
}

describe.each(Object.keys(inputs))('batch output of %s, byte for byte', (name) => {
  it.each(['csv', 'jsonl'] as const)(
    '%s: the threaded batch equals the single screen per compound, the in-thread batch and the golden file',
    async (format) => {
      const file = inputs[name]!;
      const threaded = compiledBatch(file, format);
      const inThread = await runCli([
        'screen',
        '--batch',
        file,
        ...SETTINGS,
        '--jobs',
        '1',
        '--format',
        format,
      ]);
      expect(inThread.code, inThread.err).toBe(0);
      expect(threaded.split('\n').length).toBeGreaterThan(10);
      expect(threaded).toBe(await reference(file, format));
      expect(inThread.out).toBe(threaded);
      expect(threaded).toBe(readFileSync(`fixtures/batch/golden/${name}.top3.${format}`, 'utf8'));
    },
    240_000,
  );
});

describe('batch output of random compounds', () => {
  // Fictional formula-only compounds drawn by fast-check (a workload, not chemistry): a batch of
  // several screened in one thread equals the single screen of each, byte for byte (CSV).
  const compound = fc.record({
    c: fc.integer({ min: 8, max: 30 }),
    n: fc.integer({ min: 1, max: 4 }),
    o: fc.integer({ min: 0, max: 5 }),
    acid: fc.boolean(),
    pka: fc.integer({ min: 20, max: 110 }),
    s0: fc.option(fc.integer({ min: 1, max: 5000 }), { nil: null }),
    dose: fc.integer({ min: 1, max: 800 }),
  });
  it('equals the single screen of each compound (fixed seed)', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(compound, { minLength: 1, maxLength: 4 }), async (list) => {
        const lines = list.map((x, i) => {
          const h = 2 * x.c - 4 + (i % 3);
          const s0 = x.s0 === null ? ',150,2.5' : `${(x.s0 / 10000).toFixed(4)},,`;
          return `R-${i},,,C${x.c}H${h}N${x.n}O${x.o},${x.acid ? 'acid' : 'base'},${(x.pka / 10).toFixed(1)},,${s0},${x.dose},`;
        });
        const file = join(dir, 'random.csv');
        writeFileSync(file, [BATCH_HEADER, ...lines].join('\n') + '\n');
        const batch = await runCli(['screen', '--batch', file, ...SETTINGS, '--jobs', '1']);
        expect(batch.code, batch.err).toBe(0);
        expect(batch.out).toBe(await reference(file, 'csv'));
      }),
      { numRuns: 6, seed: 20 },
    );
  }, 240_000);
});
