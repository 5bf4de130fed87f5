// Regenerates the batch golden files (fixtures/batch/golden/) from the compiled CLI — never typed by
// hand. Run after `npm run build:cli`, whenever the batch output is meant to change (a new column, a
// model change), and after a rebase onto such a change:
//
//   npm run build:cli && node tests/cli/batch/make-batch-golden.mjs
//
// tests/cli/batch/batch-differential.test.ts compares today's batch output with these files byte for
// byte (and, independently of them, with the single-compound `screen` for the same compounds).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BATCH_HEADER, generatedCompoundLines } from './generated-compounds.mjs';

export const GOLDEN_FLAGS = ['--top', '3', '--iterations', '20', '--seed', '3', '--jobs', '2'];
export const GOLDEN_INPUTS = {
  'fictional-compounds': 'fixtures/batch/fictional-compounds.csv',
  generated: null,
};

export function generatedFile(dir) {
  const file = join(dir, 'generated.csv');
  writeFileSync(file, [BATCH_HEADER, ...generatedCompoundLines(30)].join('\n') + '\n');
  return file;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const dir = mkdtempSync(join(tmpdir(), 'saltsmith-golden-'));
  for (const [name, path] of Object.entries(GOLDEN_INPUTS)) {
    for (const format of ['csv', 'jsonl']) {
      const out = `fixtures/batch/golden/${name}.top3.${format}`;
      const r = spawnSync(
        process.execPath,
        [
          'src/cli/saltsmith.mjs',
          'screen',
          '--batch',
          path ?? generatedFile(dir),
          ...GOLDEN_FLAGS,
          '--format',
          format,
          '--out',
          out,
        ],
        { encoding: 'utf8' },
      );
      if (r.status !== 0) throw new Error(`${out}: exit ${r.status}\n${r.stderr}`);
      process.stderr.write(`wrote ${out}\n`);
    }
  }
}
