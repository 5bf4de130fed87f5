import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, rmSync, mkdirSync, copyFileSync, symlinkSync } from 'node:fs';
import { dirname, join } from 'node:path';

/**
 * The architecture check must be able to fail: deliberate violations in a scratch tree are caught by
 * the project's own rule file. (A check that passes everything is a defect; DEVELOPERS.md records one
 * way that happens.)
 */
function cruise(files: Record<string, string>): { failed: boolean; output: string } {
  const dir = mkdtempSync(join(process.cwd(), '.tmp-arch-'));
  try {
    copyFileSync(join(process.cwd(), 'tsconfig.json'), join(dir, 'tsconfig.json'));
    symlinkSync(join(process.cwd(), 'node_modules'), join(dir, 'node_modules'));
    for (const [path, text] of Object.entries(files)) {
      mkdirSync(join(dir, dirname(path)), { recursive: true });
      writeFileSync(join(dir, path), text);
    }
    try {
      execFileSync(
        process.execPath,
        [
          join(process.cwd(), 'node_modules/dependency-cruiser/bin/dependency-cruise.mjs'),
          'src',
          '--config',
          join(process.cwd(), '.dependency-cruiser.cjs'),
        ],
        { cwd: dir, encoding: 'utf8', stdio: 'pipe' },
      );
      return { failed: false, output: '' };
    } catch (err) {
      const e = err as { stdout?: string; stderr?: string };
      return { failed: true, output: String(e.stdout) + String(e.stderr) };
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('architecture rule (dependency-cruiser)', () => {
  it('flags src/chem importing a store or React', () => {
    const r = cruise({
      'src/stores/x-store.ts': 'export const x = 1;\n',
      'src/chem/bad.ts':
        "import { x } from '../stores/x-store';\nimport { useState } from 'react';\nexport const y = x + String(useState).length;\n",
    });
    expect(r.failed).toBe(true);
    expect(r.output).toMatch(/chem-is-pure/);
  }, 60000);

  it('flags one feature importing another, but lets every feature read the shared screening data', () => {
    const shared = cruise({
      'src/screening-data/data.ts': 'export const d = 1;\n',
      'src/features/alpha/a.ts':
        "import { d } from '../../screening-data/data';\nexport const a = d;\n",
    });
    expect(shared.failed).toBe(false);
    const crossed = cruise({
      'src/features/beta/b.ts': 'export const b = 1;\n',
      'src/features/alpha/a.ts': "import { b } from '../beta/b';\nexport const a = b;\n",
    });
    expect(crossed.failed).toBe(true);
    expect(crossed.output).toMatch(/features-stay-apart/);
  }, 60000);

  it('flags the shared screening layer importing a feature', () => {
    const upward = cruise({
      'src/features/alpha/a.ts': 'export const a = 1;\n',
      'src/screening-data/data.ts':
        "import { a } from '../features/alpha/a';\nexport const d = a;\n",
    });
    expect(upward.failed).toBe(true);
    expect(upward.output).toMatch(/screening-data-below-features/);
  }, 60000);

  it('flags a layer outside the core importing a core file by its deep path, but not through @/chem', () => {
    const core = {
      'src/chem/compound/mass.ts': 'export const massGPerMol = 1;\n',
      'src/chem/index.ts': "export * from './compound/mass';\n",
    };
    const throughIndex = cruise({
      ...core,
      'src/features/alpha/a.ts':
        "import { massGPerMol } from '@/chem';\nexport const a = massGPerMol;\n",
    });
    expect(throughIndex.failed).toBe(false);
    const deep = cruise({
      ...core,
      'src/features/alpha/a.ts':
        "import { massGPerMol } from '@/chem/compound/mass';\nexport const a = massGPerMol;\n",
    });
    expect(deep.failed).toBe(true);
    expect(deep.output).toMatch(/core-through-index/);
    const relative = cruise({
      ...core,
      'src/persistence/p.ts':
        "import { massGPerMol } from '../chem/compound/mass';\nexport const p = massGPerMol;\n",
    });
    expect(relative.failed).toBe(true);
    expect(relative.output).toMatch(/core-through-index/);
  }, 60000);
});
