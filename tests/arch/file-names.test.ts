import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The file-name convention the codebase follows (DEVELOPERS.md, "Layout"): folders and files in
 * kebab-case, with dotted role suffixes (`counter-ions.data.ts`, `screen.types.ts`,
 * `robustness.worker.ts`, `journey.e2e.ts`); React components in PascalCase `.tsx`; a README.md may
 * explain a folder, and dotfiles (.gitignore) configure tools. A name outside the convention fails here, in CI.
 */
const ROOT = join(import.meta.dirname, '..', '..');
const KEBAB = /^[a-z0-9]+(-[a-z0-9]+)*$/;
const FILE =
  /^[a-z0-9]+(-[a-z0-9]+)*(\.[a-z0-9]+(-[a-z0-9]+)*)*\.(ts|tsx|mts|mjs|cjs|js|css|json|csv|jsonl|md|html|txt|svg|png|webmanifest)$/;
const COMPONENT = /^[A-Z][A-Za-z0-9]*\.tsx$/;

export function nameProblems(paths: readonly string[]): string[] {
  const problems: string[] = [];
  for (const p of paths) {
    const parts = p.split('/');
    const file = parts.pop()!;
    for (const dir of parts)
      if (!KEBAB.test(dir)) problems.push(`${p}: folder '${dir}' is not kebab-case`);
    if (file.startsWith('.')) continue; // dotfiles (.gitignore) configure tools, not code
    if (!(FILE.test(file) || COMPONENT.test(file) || file === 'README.md'))
      problems.push(`${p}: '${file}' is neither kebab-case nor a PascalCase component`);
  }
  return problems;
}

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [relative(ROOT, full)];
  });
}

describe('file names follow one convention', () => {
  it('every file under src/, tests/, fixtures/ and public/', () => {
    const files = ['src', 'tests', 'fixtures', 'public']
      .flatMap((d) => walk(join(ROOT, d)))
      .map((p) => p.split('\\').join('/'));
    expect(files.length).toBeGreaterThan(100);
    expect(nameProblems(files)).toEqual([]);
  });

  it('the check can fail (camelCase module, snake_case folder, lower-case component)', () => {
    expect(nameProblems(['src/chem/screening/saltSolubility.ts'])).toHaveLength(1);
    expect(nameProblems(['src/features/bench_data/x.ts'])).toHaveLength(1);
    expect(nameProblems(['src/features/bench/components/measurementForm.tsx'])).toHaveLength(1);
    expect(
      nameProblems([
        'src/features/bench/components/MeasurementForm.tsx',
        'src/chem/screening/screen/screen.types.ts',
      ]),
    ).toEqual([]);
  });
});
