import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildCompiledCli } from './support/compiled-cli';

// The installed command end to end: the compiled build, launched as `saltsmith` is (issues 12 and 13).
let cli: { launcher: string; root: string };
beforeAll(() => {
  cli = buildCompiledCli();
}, 120_000);

const saltsmith = (args: string[], opts: { cwd?: string; input?: string } = {}) =>
  spawnSync(process.execPath, [cli.launcher, ...args], {
    cwd: opts.cwd ?? '/',
    input: opts.input,
    encoding: 'utf8',
  });

describe('the compiled saltsmith command', () => {
  it('runs from any directory, including a SMILES that needs openchemlib', () => {
    const a = saltsmith(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--json'], { cwd: '/' });
    expect(a.status).toBe(0);
    expect(JSON.parse(a.stdout).methodChosen).toBeTruthy();
    const b = saltsmith(['eval'], {
      cwd: '/tmp',
      input: '{"kind":"salt","cation":{"smiles":"CN1CCN(C)CC1","charge":1},"anion":"mesylate"}\n',
    });
    expect(b.status).toBe(0);
    expect(JSON.parse(b.stdout).ok).toBe(true);
  });

  it.each([['ions'], ['ions', '--json']])(
    'ends quietly when the reader closes the pipe early (saltsmith %s | head -1)',
    (...args) => {
      // ions --json is ~180 kB, more than a pipe holds, so the write after head exits meets EPIPE.
      const r = spawnSync(
        'bash',
        [
          '-c',
          `"${process.execPath}" "${cli.launcher}" ${args.join(' ')} | head -1; echo "status=\${PIPESTATUS[0]}" >&2`,
        ],
        { encoding: 'utf8' },
      );
      expect(r.stdout.trim().split('\n')).toHaveLength(1);
      expect(r.stderr.trim()).toBe('status=0');
    },
  );

  it('usage errors exit 2, refused values exit 1', () => {
    expect(saltsmith(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--dosee', '1']).status).toBe(
      2,
    );
    expect(
      saltsmith(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--volume', '0']).status,
    ).toBe(1);
  });

  it('loads openchemlib only when a SMILES needs it (no static import in the build)', () => {
    const dist = join(cli.root, 'dist-cli');
    const code = readdirSync(dist)
      .map((f) => readFileSync(join(dist, f), 'utf8'))
      .join('\n');
    expect(/import\(["'`]openchemlib["'`]\)/.test(code)).toBe(true);
    expect(/from\s*["'`]openchemlib["'`]/.test(code)).toBe(false);
  });

  it('screens a batch on worker threads with the same rows, in input order, as on one thread', () => {
    // Made-up compounds by formula, with different ion lists so the threads finish out of order.
    const ions = ['chloride;mesylate', 'sulfate', '', 'tosylate;besylate;maleate', 'chloride'];
    const lines = Array.from(
      { length: 24 },
      (_, i) =>
        `C${i},,,C${14 + (i % 7)}H${18 + (i % 5)}N2O2,base,${(5 + (i % 6) * 0.7).toFixed(1)},,${(0.01 * (1 + (i % 4))).toFixed(2)},,,100,${ions[i % ions.length]}`,
    );
    const file = join(cli.root, 'many.csv');
    writeFileSync(
      file,
      [
        'id,name,smiles,formula,kind,pkas,charge,s0_mg_per_ml,mp_c,logp,dose_mg,ions',
        ...lines,
      ].join('\n') + '\n',
    );
    const one = saltsmith(['screen', '--batch', file, '--jobs', '1', '--iterations', '30']);
    const two = saltsmith(['screen', '--batch', file, '--jobs', '2', '--iterations', '30']);
    expect(one.status).toBe(0);
    expect(two.status).toBe(0);
    expect(two.stderr).toMatch(/24 of 24 compound\(s\) screened on 2 thread\(s\)/);
    expect(one.stderr).toMatch(/on 1 thread\(s\)/);
    expect(two.stdout).toBe(one.stdout);
    const ids = two.stdout
      .split('\n')
      .filter((l) => /^C\d+,/.test(l))
      .map((l) => l.split(',')[0]);
    expect([...new Set(ids)]).toEqual(lines.map((l) => l.split(',')[0]));
  }, 60_000);

  it('serve prints the URL and serves a built app with the Content-Security-Policy header until stopped', async () => {
    const site = mkdtempSync(join(tmpdir(), 'saltsmith-site-'));
    writeFileSync(join(site, 'index.html'), '<!doctype html><title>built</title>');
    const child = spawn(
      process.execPath,
      [cli.launcher, 'serve', '--port', '0', '--dir', site, '--no-build'],
      { cwd: '/' },
    );
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    let err = '';
    child.stderr.on('data', (d) => (err += d));
    const deadline = Date.now() + 20_000;
    while (!/http:\/\/127\.0\.0\.1:\d+\//.test(out) && Date.now() < deadline)
      await new Promise((r) => setTimeout(r, 50));
    const url = /http:\/\/127\.0\.0\.1:\d+\//.exec(out)?.[0];
    expect(url, err).toBeTruthy();
    const res = await fetch(`${url}projects/1`);
    expect(res.status).toBe(200);
    expect(await res.text()).toMatch(/<title>built<\/title>/);
    expect(res.headers.get('content-security-policy')).toMatch(
      /^default-src 'self'; script-src 'self';/,
    );
    const exited = new Promise<number | null>((r) => child.on('exit', (code) => r(code)));
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
  }, 30_000);

  it('says how to build it when the compiled file is missing', () => {
    rmSync(join(cli.root, 'dist-cli', 'saltsmith.js'));
    const r = saltsmith(['ions']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/compiled command is missing[\s\S]*npm run build:cli/);
    cli = buildCompiledCli();
  }, 120_000);
});
