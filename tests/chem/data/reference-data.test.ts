import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The thermochemistry reference tables have one source of truth, the JSON data files in
 * fixtures/reference/; the TypeScript the core imports is generated from them. These tests check that
 * the committed TypeScript is exactly what the data gives, and that the check can fail.
 */
const ROOT = resolve(__dirname, '../../..');
const SCRIPT = join(ROOT, 'fixtures/reference/generate-thermo-data.mjs');
const FILES = [
  'fixtures/reference/thermo-reference.json',
  'fixtures/reference/thermo-ions.json',
  'fixtures/reference/thermo-elements.json',
  'src/chem/data/thermo-reference.data.ts',
  'src/chem/data/thermo-ions.data.ts',
  'src/chem/data/thermo-elements.data.ts',
];

function check(root: string): { ok: boolean; output: string } {
  try {
    execFileSync(process.execPath, [SCRIPT, '--check', '--root', root], {
      encoding: 'utf8',
      stdio: 'pipe',
    });
    return { ok: true, output: '' };
  } catch (err) {
    const e = err as { stdout?: string; stderr?: string };
    return { ok: false, output: String(e.stdout) + String(e.stderr) };
  }
}

function scratchCopy(): string {
  const dir = mkdtempSync(join(tmpdir(), 'saltsmith-ref-'));
  for (const f of FILES) {
    mkdirSync(join(dir, dirname(f)), { recursive: true });
    copyFileSync(join(ROOT, f), join(dir, f));
  }
  return dir;
}

describe('reference data: JSON is the truth, TypeScript is generated', () => {
  it('regenerating from the JSON gives the committed TypeScript byte for byte', () => {
    expect(check(ROOT)).toEqual({ ok: true, output: '' });
  });

  it('fails when the JSON changes and the TypeScript is not regenerated', () => {
    const dir = scratchCopy();
    try {
      const path = join(dir, 'fixtures/reference/thermo-reference.json');
      const data = JSON.parse(readFileSync(path, 'utf8')) as {
        tables: { name: string; value: Record<string, number> }[];
      };
      data.tables.find((t) => t.name === 'SOLID_FORMATION_KJ')!.value.NaCl = -400;
      writeFileSync(path, JSON.stringify(data, null, 2));
      const r = check(dir);
      expect(r.ok).toBe(false);
      expect(r.output).toMatch(/thermo-reference\.data\.ts is not what/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('fails when the generated TypeScript is edited by hand', () => {
    const dir = scratchCopy();
    try {
      const path = join(dir, 'src/chem/data/thermo-ions.data.ts');
      writeFileSync(path, readFileSync(path, 'utf8').replace('"value":1.02', '"value":1.03'));
      const r = check(dir);
      expect(r.ok).toBe(false);
      expect(r.output).toMatch(/thermo-ions\.data\.ts is not what/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('names a source for every bundled ion value and every reference salt volume', () => {
    const ions = JSON.parse(
      readFileSync(join(ROOT, 'fixtures/reference/thermo-ions.json'), 'utf8'),
    ) as {
      tables: { value: Record<string, unknown>[] }[];
    };
    for (const ion of ions.tables[0]!.value) {
      for (const v of Object.values(ion)) {
        if (v && typeof v === 'object' && 'value' in v) {
          const sourced = v as unknown as { source: string; fromMemory: boolean };
          expect(sourced.source.length).toBeGreaterThan(10);
          expect(typeof sourced.fromMemory).toBe('boolean');
        }
      }
    }
  });
});
