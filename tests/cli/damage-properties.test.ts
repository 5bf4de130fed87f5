import {
  linkSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  statSync,
  realpathSync,
  rmSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { runCli } from './support/run-cli';

// Property tests for issue 18's classes on the command line. Fixed seed, so a failure reproduces.
// 1. Random byte-level damage to JSON Lines (bytes flipped, inserted, deleted; bad UTF-8; new lines;
//    keys doubled) for `eval` and `screen --batch`: never a crash or a stack trace — every line is
//    answered with a result or a one-line error.
// 2. Random output paths among a run's own files (the input, the other output, links to them, `./`
//    and `..` spellings): an input is never changed, two outputs never share a file, no temporary file
//    is left. Compounds and values are made up.
const SEED = 18_007;

const EVAL_LINES = [
  '{"kind":"salt","id":"a","cation":"Na+","anion":"Cl-"}',
  '{"kind":"salt","cation":{"smiles":"CN1CCN(C)CC1","charge":1},"anion":"mesylate"}',
  '{"kind":"salt","cation":"K+","anion":{"formula":"SO4","charge":-2},"method":"kapustinskii"}',
  '{"kind":"ph-solubility","drug":{"kind":"base","pKas":[8],"log10IntrinsicM":-5},"salt":{"counterIon":"chloride","log10Ksp":-3}}',
];

const BATCH_LINES = [
  '{"id":"J1","formula":"C10H15N","kind":"base","pkas":"9","s0_mg_per_ml":1,"dose_mg":100}',
  '{"id":"J2","smiles":"CCN(CC)CC","kind":"base","pkas":"10.7","s0_mg_per_ml":5}',
  '{"id":"J3","formula":"C9H8O4","kind":"acid","pkas":"3.5","mp_c":135,"logp":1.2}',
];

/** One random change to the bytes of a JSON Lines text. */
const damage = fc.oneof(
  fc.record({
    op: fc.constant('flip' as const),
    at: fc.nat(),
    byte: fc.integer({ min: 0, max: 255 }),
  }),
  fc.record({
    op: fc.constant('insert' as const),
    at: fc.nat(),
    bytes: fc.uint8Array({ minLength: 1, maxLength: 4 }),
  }),
  fc.record({
    op: fc.constant('delete' as const),
    at: fc.nat(),
    n: fc.integer({ min: 1, max: 8 }),
  }),
  fc.record({ op: fc.constant('newline' as const), at: fc.nat() }),
  fc.record({ op: fc.constant('double-key' as const), at: fc.nat() }),
);
type Damage = typeof damage extends fc.Arbitrary<infer T> ? T : never;

function applyDamage(buf: Buffer, d: Damage): Buffer {
  const at = buf.length === 0 ? 0 : d.at % buf.length;
  switch (d.op) {
    case 'flip':
      return Buffer.concat([buf.subarray(0, at), Buffer.from([d.byte]), buf.subarray(at + 1)]);
    case 'insert':
      return Buffer.concat([buf.subarray(0, at), Buffer.from(d.bytes), buf.subarray(at)]);
    case 'delete':
      return Buffer.concat([buf.subarray(0, at), buf.subarray(at + d.n)]);
    case 'newline':
      return Buffer.concat([buf.subarray(0, at), Buffer.from('\n'), buf.subarray(at)]);
    case 'double-key': {
      // Repeat the first "key": of the line that holds `at`, right after its '{'.
      const text = buf.toString('latin1');
      const start = text.lastIndexOf('\n', at) + 1;
      const m = /\{("[a-z_A-Z]+":)("[^"]*"|[0-9.]+)/.exec(text.slice(start));
      if (!m) return buf;
      const i = start + m.index + 1;
      return Buffer.concat([
        buf.subarray(0, i),
        Buffer.from(`${m[1]}${m[2]},`, 'latin1'),
        buf.subarray(i),
      ]);
    }
  }
}

const damaged = (lines: string[]) =>
  fc
    .tuple(fc.subarray(lines, { minLength: 1 }), fc.array(damage, { minLength: 1, maxLength: 4 }))
    .map(([picked, ds]) => ds.reduce(applyDamage, Buffer.from(picked.join('\n') + '\n')));

/** Lines as `eval` and the batch reader count them: split on LF, a last line without LF counts. */
const nonBlankLines = (buf: Buffer) => {
  const parts = buf.toString('latin1').split('\n');
  if (parts.at(-1) === '') parts.pop();
  return parts.map((p, i) => ({ lineNo: i + 1, blank: p.replace(/\r$/, '').trim() === '' }));
};

const noStackTrace = (text: string) => expect(text).not.toMatch(/\n\s+at [\w.<]+ \(|node:internal/);

describe('random byte damage to JSON Lines', () => {
  it('eval answers every non-blank line with a result or a one-line error, in order, never internal', async () => {
    let runs = 0;
    let failedLines = 0;
    await fc.assert(
      fc.asyncProperty(damaged(EVAL_LINES), async (input) => {
        runs++;
        const r = await runCli(['eval'], input);
        expect([0, 1]).toContain(r.code);
        noStackTrace(r.err);
        // A line with only white space may be turned into a blank line by the damage: skipped, as documented.
        const expected = nonBlankLines(input);
        const out = r.out.trim() === '' ? [] : r.out.trim().split('\n');
        const answers = out.map((l) => JSON.parse(l) as Record<string, unknown>);
        const answeredLines = answers.map((a) => a.line);
        // Every line the reader saw as non-blank is answered once, in order (blank ones by whitespace only).
        expect(answeredLines).toEqual([...answeredLines].sort((a, b) => Number(a) - Number(b)));
        expect(new Set(answeredLines).size).toBe(answers.length);
        expect(answers.length).toBeLessThanOrEqual(expected.length);
        for (const a of answers) {
          expect(typeof a.ok).toBe('boolean');
          if (!a.ok) {
            failedLines++;
            const e = a.error as { type: string; field: string; message: string };
            expect(['json', 'schema', 'input']).toContain(e.type);
            expect(e.message).not.toContain('\n');
          }
        }
        expect(r.out).not.toContain('\uFFFD');
        expect(r.code).toBe(answers.some((a) => !a.ok) ? 1 : 0);
      }),
      { seed: SEED, numRuns: 300 },
    );
    expect(runs).toBe(300);
    expect(failedLines).toBeGreaterThan(100); // the damage does reach the reader
  }, 120_000);

  it('screen --batch (JSON Lines) screens or reports every non-blank line, one line each, never a trace', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'saltsmith-damage-'));
    let runs = 0;
    await fc.assert(
      fc.asyncProperty(damaged(BATCH_LINES), async (input) => {
        runs++;
        const file = join(dir, `b${runs}.jsonl`);
        writeFileSync(file, input);
        const r = await runCli(['screen', '--batch', file, '--jobs', '1', '--ions', 'chloride']);
        expect([0, 1]).toContain(r.code);
        noStackTrace(r.err);
        const errors = r.err
          .split('\n')
          .filter((l) => /^saltsmith screen --batch: line \d+/.test(l));
        const summary = /(\d+) of (\d+) compound\(s\) screened/.exec(r.err);
        expect(summary).not.toBeNull();
        // Each non-blank line is one compound: screened (its rows out) or one error line.
        const lines = nonBlankLines(input).filter((l) => !l.blank).length;
        expect(Number(summary![2])).toBe(lines);
        expect(Number(summary![1]) + errors.length).toBe(lines);
        expect(r.code).toBe(errors.length > 0 ? 1 : 0);
      }),
      { seed: SEED, numRuns: 120 },
    );
    expect(runs).toBe(120);
  }, 300_000);
});

describe('random output paths among a run’s own files', () => {
  it('never changes the input, never lets two outputs share a file, never leaves a temporary file', async () => {
    const root = mkdtempSync(join(tmpdir(), 'saltsmith-paths-'));
    const LIST = 'id,formula,kind,pkas,s0_mg_per_ml\nP1,C10H15N,base,9,1\nP2,C10H15N,base,,1\n';
    let runs = 0;
    let refused = 0;
    let written = 0;
    const names = [
      'list.csv',
      './list.csv',
      'sub/../list.csv',
      'link-list.csv',
      'hard-list.csv',
      'out.csv',
      './out.csv',
      'link-out.csv',
      'err.txt',
      'sub/../err.txt',
      'new.csv',
      'sub/new.csv',
      'missing/x.csv',
      'sub',
    ];
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...names),
        fc.option(fc.constantFrom(...names), { nil: undefined }),
        async (out, errors) => {
          runs++;
          const d = join(root, String(runs));
          mkdirSync(join(d, 'sub'), { recursive: true });
          writeFileSync(join(d, 'list.csv'), LIST);
          writeFileSync(join(d, 'out.csv'), 'previous results\n');
          writeFileSync(join(d, 'err.txt'), 'previous errors\n');
          symlinkSync('list.csv', join(d, 'link-list.csv'));
          symlinkSync('out.csv', join(d, 'link-out.csv'));
          linkSync(join(d, 'list.csv'), join(d, 'hard-list.csv'));
          const at = (p: string) => join(d, p);
          const r = await runCli([
            'screen',
            ...['--batch', at('list.csv'), '--jobs', '1', '--ions', 'chloride'],
            ...['--out', at(out)],
            ...(errors !== undefined ? ['--errors', at(errors)] : []),
          ]);
          expect(readFileSync(join(d, 'list.csv'), 'utf8')).toBe(LIST);
          expect(lstatSync(join(d, 'link-out.csv')).isSymbolicLink()).toBe(true);
          const real = (p: string) => {
            try {
              return realpathSync(at(p));
            } catch {
              return at(p);
            }
          };
          // One file: the same real path, or the same device and inode (a hard link).
          const same = (p: string, q: string) => {
            const a = statSync(at(p), { throwIfNoEntry: false });
            const b = statSync(at(q), { throwIfNoEntry: false });
            return real(p) === real(q) || (!!a && !!b && a.dev === b.dev && a.ino === b.ino);
          };
          const clash =
            same(out, 'list.csv') ||
            (errors !== undefined && (same(errors, 'list.csv') || same(errors, out)));
          const unwritable = [out, errors].some((p) => p === 'sub' || p === 'missing/x.csv');
          if (unwritable || clash) {
            // Refused before any work: 1 for a path that cannot be written, 2 for a clash (whichever
            // the outputs, checked in order, meet first).
            expect(r.code).toBe(unwritable && !clash ? 1 : clash && !unwritable ? 2 : r.code);
            expect([1, 2]).toContain(r.code);
            expect(r.out).toBe('');
            refused++;
          } else {
            expect(r.code).toBe(1); // P2 has no pKa: one bad row
            expect(readFileSync(real(out), 'utf8')).toMatch(/^[a-z_]+,/);
            if (errors !== undefined) expect(readFileSync(real(errors), 'utf8')).toMatch(/line 3/);
            written++;
          }
          const leftovers = [d, join(d, 'sub')].flatMap((x) =>
            readdirSync(x).filter((f) => f.endsWith('.tmp')),
          );
          expect(leftovers).toEqual([]);
          rmSync(d, { recursive: true, force: true });
        },
      ),
      { seed: SEED, numRuns: 150 },
    );
    expect(runs).toBe(150);
    expect(refused).toBeGreaterThan(20);
    expect(written).toBeGreaterThan(20);
  }, 300_000);
});
