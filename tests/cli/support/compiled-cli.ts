import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const repo = resolve(import.meta.dirname, '../../..');

/**
 * Build the CLI as `npm ci` does (vite build with src/cli/build/vite.cli.config.ts) into a scratch
 * install: <tmp>/src/cli/saltsmith.mjs (the real launcher), <tmp>/dist-cli (the build) and
 * <tmp>/node_modules (a link to the repository's). Returns the launcher's path.
 */
export function buildCompiledCli(): { launcher: string; root: string } {
  const root = mkdtempSync(join(tmpdir(), 'saltsmith-cli-'));
  mkdirSync(join(root, 'src', 'cli'), { recursive: true });
  copyFileSync(
    join(repo, 'src', 'cli', 'saltsmith.mjs'),
    join(root, 'src', 'cli', 'saltsmith.mjs'),
  );
  symlinkSync(join(repo, 'node_modules'), join(root, 'node_modules'), 'dir');
  const r = spawnSync(
    process.execPath,
    [
      join(repo, 'node_modules/vite/bin/vite.js'),
      'build',
      '--config',
      'src/cli/build/vite.cli.config.ts',
      '--outDir',
      join(root, 'dist-cli'),
      '--logLevel',
      'error',
    ],
    {
      cwd: repo,
      encoding: 'utf8',
    },
  );
  if (r.status !== 0) throw new Error(`CLI build failed:\n${r.stdout}\n${r.stderr}`);
  return { launcher: join(root, 'src', 'cli', 'saltsmith.mjs'), root };
}
