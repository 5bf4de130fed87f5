// @vitest-environment node
/**
 * The first-screen budget check (tests/bench/check-budget.mjs) run as CI runs it, on small fake
 * build directories: it must fail above budget, pass within it, follow static imports and leave
 * lazy `import()` chunks out. The sizes are gzip sizes of pseudo-random text (it barely compresses),
 * so each file's gzipped size is known to within a few per cent.
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';

const SCRIPT = join(process.cwd(), 'tests/bench/check-budget.mjs');
const dirs: string[] = [];

/** `kib` KiB of text from a fixed-seed generator (base-64 alphabet: gzip keeps ~75 % of it). */
function noise(kib: number, seed: number): string {
  const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';
  let x = seed >>> 0 || 1;
  let s = '';
  for (let i = 0; i < kib * 1024; i++) {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    s += alphabet[x & 63];
  }
  return s;
}

/** A fake build: index.html loading `assets/entry.js`, plus the given asset files. */
function fakeDist(files: Record<string, string>, html?: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'saltsmith-budget-'));
  dirs.push(dir);
  mkdirSync(join(dir, 'assets'));
  writeFileSync(
    join(dir, 'index.html'),
    html ??
      '<!doctype html><html><head><script type="module" crossorigin src="/assets/entry.js"></script></head></html>',
  );
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, 'assets', name), text);
  return dir;
}

function check(dir: string, ...args: string[]) {
  const r = spawnSync(process.execPath, [SCRIPT, dir, '--json', ...args], { encoding: 'utf8' });
  const summary = r.stdout
    ? (JSON.parse(r.stdout) as { firstScreenGzipKiB: number; files: { file: string }[] })
    : null;
  return { status: r.status, summary, stderr: r.stderr };
}

afterEach(() => {
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

describe('first-screen budget check', () => {
  it('fails with exit status 1 when the entry alone is over the 250 KiB default budget', () => {
    // ~400 KiB of base-64 noise gzips to ~300 KiB.
    const dir = fakeDist({ 'entry.js': `const blob="${noise(400, 1)}";export{blob};` });
    const r = check(dir);
    expect(r.status).toBe(1);
    expect(r.summary!.firstScreenGzipKiB).toBeGreaterThan(250);
    expect(r.stderr).toMatch(/over the 250 KiB budget/);
  });

  it('passes with exit status 0 when within budget', () => {
    const dir = fakeDist({ 'entry.js': `const blob="${noise(100, 2)}";export{blob};` });
    const r = check(dir);
    expect(r.status).toBe(0);
    expect(r.summary!.firstScreenGzipKiB).toBeLessThan(100);
  });

  it('counts chunks reached through static imports (minified form), so a split entry cannot hide size', () => {
    const dir = fakeDist({
      'entry.js': `import{a as e,t}from"./shared-1.js";import"./side.js";console.log(e,t,"${noise(100, 3)}");`,
      'shared-1.js': `export{b as a,c as t}from"./deep.js";export const x="${noise(100, 4)}";`,
      'deep.js': `export const b=1,c="${noise(150, 5)}";`,
      'side.js': `globalThis.s="${noise(20, 6)}";`,
    });
    const r = check(dir);
    expect(r.summary!.files.map((f) => f.file).sort()).toEqual([
      '/assets/deep.js',
      '/assets/entry.js',
      '/assets/shared-1.js',
      '/assets/side.js',
    ]);
    expect(r.status).toBe(1); // ~370 KiB raw noise ⇒ ~280 KiB gzipped over the four files
  });

  it('leaves lazy import() chunks out of the first screen', () => {
    const dir = fakeDist({
      'entry.js': `const load=()=>import("./lazy.js");const m=import ("./lazy2.js");export{load,m};`,
      'lazy.js': `export const big="${noise(400, 7)}";`,
      'lazy2.js': `export const big="${noise(400, 8)}";`,
    });
    const r = check(dir);
    expect(r.summary!.files.map((f) => f.file)).toEqual(['/assets/entry.js']);
    expect(r.status).toBe(0);
  });

  it('counts modulepreload links in index.html and honours --budget-kib', () => {
    const html =
      '<script type="module" src="/assets/entry.js"></script><link rel="modulepreload" crossorigin href="/assets/pre.js">';
    const dir = fakeDist(
      { 'entry.js': 'export{};', 'pre.js': `export const p="${noise(60, 9)}";` },
      html,
    );
    expect(check(dir).status).toBe(0);
    const tight = check(dir, '--budget-kib', '20');
    expect(tight.summary!.files.map((f) => f.file)).toContain('/assets/pre.js');
    expect(tight.status).toBe(1);
  });

  it('exits 2 when the build output is missing or names a file that is not there', () => {
    expect(check(join(tmpdir(), 'saltsmith-no-such-build')).status).toBe(2);
    const dir = fakeDist({ 'entry.js': 'import"./gone.js";' });
    expect(check(dir).status).toBe(2);
  });
});
