import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, rmSync, mkdirSync, copyFileSync, symlinkSync } from 'node:fs';
import { join } from 'node:path';

/**
 * The architecture check must be able to fail: a deliberate violation in a scratch copy of the rule
 * is caught. (A check that passes everything is a defect; TOOLCHAIN.md records one way that happens.)
 */
describe('architecture rule (dependency-cruiser)', () => {
  it('flags src/chem importing a store or React', () => {
    const dir = mkdtempSync(join(process.cwd(), '.tmp-arch-'));
    try {
      mkdirSync(join(dir, 'src/chem'), { recursive: true });
      mkdirSync(join(dir, 'src/stores'), { recursive: true });
      copyFileSync(join(process.cwd(), 'tsconfig.json'), join(dir, 'tsconfig.json'));
      symlinkSync(join(process.cwd(), 'node_modules'), join(dir, 'node_modules'));
      writeFileSync(join(dir, 'src/stores/x-store.ts'), 'export const x = 1;\n');
      writeFileSync(
        join(dir, 'src/chem/bad.ts'),
        "import { x } from '../stores/x-store';\nimport { useState } from 'react';\nexport const y = x + String(useState).length;\n",
      );
      let output = '';
      let failed = false;
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
      } catch (err) {
        failed = true;
        output = String((err as { stdout?: string }).stdout) + String((err as { stderr?: string }).stderr);
      }
      expect(failed).toBe(true);
      expect(output).toMatch(/chem-is-pure/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60000);
});
