import { spawn, spawnSync } from 'node:child_process';
import {
  chmodSync,
  copyFileSync,
  linkSync,
  lstatSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  statSync,
  symlinkSync,
  truncateSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildCompiledCli } from './support/compiled-cli';

// Issue 18, "Outputs that destroy other files" and "Hangs and crashes": each case below failed before
// the fix (the input replaced, the errors file overwriting the results, a symlink turned into a file,
// a 0600 file made 0644, a device accepted, a batch that never exits, a stack trace on a full disk,
// .tmp files left by Ctrl+C). Run on the compiled command, as a user runs it.
let cli: { launcher: string; root: string };
beforeAll(() => {
  cli = buildCompiledCli();
}, 120_000);

const FIXTURE = resolve('fixtures/batch/fictional-compounds.csv');
const ONE = [
  'screen',
  ...['--smiles', 'CCN(CC)CC', '--pka', '10.7', '--s0', '5', '--dose', '100'],
  ...['--ions', 'chloride,mesylate', '--iterations', '50'],
];

const saltsmith = (args: string[], opts: { cwd?: string; timeoutMs?: number } = {}) =>
  spawnSync(process.execPath, [cli.launcher, ...args], {
    cwd: opts.cwd ?? '/',
    encoding: 'utf8',
    timeout: opts.timeoutMs ?? 60_000,
  });

const scratch = () => mkdtempSync(join(tmpdir(), 'saltsmith-out-'));
const tmpFiles = (dir: string) => readdirSync(dir).filter((f) => f.endsWith('.tmp'));

describe('an output never destroys an input or another output (compared by real path)', () => {
  it.each([
    ['the batch file itself', (d: string) => join(d, 'list.csv')],
    ['the batch file through ./', (d: string) => join(d, '.', 'list.csv')],
    ['a symbolic link to the batch file', (d: string) => join(d, 'link.csv')],
    ['a hard link to the batch file', (d: string) => join(d, 'hard.csv')],
  ])('--out as %s is refused and the input stays', (_what, out) => {
    const d = scratch();
    copyFileSync(FIXTURE, join(d, 'list.csv'));
    symlinkSync(join(d, 'list.csv'), join(d, 'link.csv'));
    linkSync(join(d, 'list.csv'), join(d, 'hard.csv'));
    const r = saltsmith(['screen', '--batch', join(d, 'list.csv'), '--out', out(d), '--jobs', '1']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--out: .* is the same file as --batch/);
    expect(readFileSync(join(d, 'list.csv'), 'utf8')).toBe(readFileSync(FIXTURE, 'utf8'));
    expect(tmpFiles(d)).toEqual([]);
  });

  it('--out and --errors on one path are refused; --out equal to --input too', () => {
    const d = scratch();
    const r = saltsmith([
      'screen',
      ...['--batch', FIXTURE, '--out', join(d, 'r.csv'), '--errors', join(d, 'r.csv')],
    ]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--errors: .* is the same file as --out/);
    writeFileSync(join(d, 'c.json'), '{"name":"x"}');
    const s = saltsmith([...ONE, '--input', join(d, 'c.json'), '--out', join(d, 'c.json')]);
    expect(s.status).toBe(2);
    expect(readFileSync(join(d, 'c.json'), 'utf8')).toBe('{"name":"x"}');
  });
});

describe('the written file: links followed, mode kept, only regular files replaced', () => {
  it('writes through a symbolic link (the link stays) and keeps a 0600 file 0600', () => {
    const d = scratch();
    writeFileSync(join(d, 'real.csv'), 'old\n');
    chmodSync(join(d, 'real.csv'), 0o600);
    symlinkSync('real.csv', join(d, 'link.csv'));
    const r = saltsmith([...ONE, '--out', join(d, 'link.csv')]);
    expect(r.status).toBe(0);
    expect(lstatSync(join(d, 'link.csv')).isSymbolicLink()).toBe(true);
    expect(readFileSync(join(d, 'real.csv'), 'utf8')).toMatch(/^rank,candidate/);
    expect(statSync(join(d, 'real.csv')).mode & 0o777).toBe(0o600);
    expect(tmpFiles(d)).toEqual([]);
  });

  // Never a real device as the target here: the code before the fix renamed over it (it replaced
  // /dev/null once, as root). A FIFO, a folder and a link to /dev/null in a scratch folder are safe.
  it.each([
    ['a named pipe', (d: string) => (spawnSync('mkfifo', [join(d, 'pipe')]), join(d, 'pipe'))],
    ['a folder', (d: string) => d],
    [
      'a link to a device',
      (d: string) => (symlinkSync('/dev/null', join(d, 'dev')), join(d, 'dev')),
    ],
  ])('refuses %s (not a regular file) before any work', (_what, make) => {
    const d = scratch();
    const out = make(d);
    const r = saltsmith([...ONE, '--out', out]);
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toContain(`--out: ${out} is not a regular file`);
    expect(tmpFiles(d)).toEqual([]);
  });
});

describe('every way out ends the run: one line, the workers stopped, no temporary file left', () => {
  it('a batch whose --out folder does not exist exits 1 at once (it used to hang)', () => {
    const r = saltsmith(
      ['screen', '--batch', FIXTURE, '--out', '/missing-folder/x.csv', '--jobs', '2'],
      { timeoutMs: 20_000 },
    );
    expect(r.signal).toBeNull();
    expect(r.status).toBe(1);
    expect(r.stderr.trim()).toBe(
      'saltsmith screen: --out: cannot write /missing-folder/x.csv: the folder /missing-folder does not exist',
    );
  });

  it.each([
    [['ions']],
    [['ions', '--json']],
    [['lattice', '--cation', 'Na+', '--anion', 'Cl-']],
    [['screen', '--batch', FIXTURE, '--jobs', '1']],
  ])('saltsmith %j > /dev/full: one line naming standard output, exit 1', (args) => {
    const r = spawnSync(
      'bash',
      ['-c', `"${process.execPath}" "${cli.launcher}" "$@" > /dev/full`, 'x', ...args],
      { encoding: 'utf8', timeout: 60_000 },
    );
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('saltsmith: cannot write to standard output (ENOSPC');
    expect(r.stderr).not.toMatch(/\n\s+at /); // no stack trace
  });

  it.each([
    ['SIGINT', 130],
    ['SIGTERM', 143],
  ] as const)(
    '%s during a batch removes the temporary output and exits %i',
    async (signal, status) => {
      const d = scratch();
      // A long list, so the run is still going when the signal comes.
      const lines = readFileSync(FIXTURE, 'utf8').split('\n');
      const header = lines.find((l) => l.startsWith('id,'))!;
      const rows = lines.filter((l) => /^[A-Z]/.test(l) && !l.startsWith('id,'));
      const body = Array.from({ length: 4000 }, (_, i) =>
        rows[i % rows.length]!.replace(/^[^,]*/, `C${i}`),
      );
      writeFileSync(join(d, 'long.csv'), [header, ...body].join('\n') + '\n');
      const child = spawn(
        process.execPath,
        [
          cli.launcher,
          'screen',
          '--batch',
          join(d, 'long.csv'),
          '--out',
          join(d, 'o.csv'),
          '--jobs',
          '1',
        ],
        { stdio: 'ignore' },
      );
      for (let i = 0; i < 200 && tmpFiles(d).length === 0; i++)
        await new Promise((r) => setTimeout(r, 50));
      expect(tmpFiles(d)).toHaveLength(1);
      child.kill(signal);
      const code = await new Promise<number | null>((r) => child.on('exit', (c) => r(c)));
      expect(code).toBe(status);
      expect(tmpFiles(d)).toEqual([]);
      expect(readdirSync(d)).toEqual(['long.csv']);
    },
    60_000,
  );
});

describe('--input is size-capped before it is read', () => {
  it('refuses a 300 MB file from its size, without reading it', () => {
    const d = scratch();
    writeFileSync(join(d, 'big.json'), '');
    truncateSync(join(d, 'big.json'), 300 * 1024 * 1024); // sparse: no disk used
    const r = spawnSync(
      'bash',
      [
        '-c',
        `/usr/bin/time -f "%M" "${process.execPath}" "${cli.launcher}" "$@"`,
        'x',
        ...ONE,
        '--input',
        join(d, 'big.json'),
      ],
      { encoding: 'utf8', timeout: 60_000 },
    );
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('--input: ');
    expect(r.stderr).toContain('is 314572800 bytes, larger than 1048576 bytes');
    // Peak memory (kB, GNU time): far below the file's 300 MB (it was 939 MB before).
    const peakKb = Number(r.stderr.trim().split('\n').at(-1));
    expect(peakKb).toBeLessThan(200_000);
  });
});
