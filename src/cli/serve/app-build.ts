import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Finding the repository the CLI runs from, and building the app when its build is missing or stale. */

/** The folder holding Saltsmith's package.json, searched upwards from `from` (this file by default). */
export function findPackageRoot(from: string = dirname(fileURLToPath(import.meta.url))): string {
  for (let dir = from; ; dir = dirname(dir)) {
    const pkg = join(dir, 'package.json');
    if (existsSync(pkg) && existsSync(join(dir, 'src', 'index.html'))) return dir;
    if (dirname(dir) === dir) throw new Error(`cannot find the Saltsmith folder above ${from}`);
  }
}

/** The inputs of the app build: a change to any of them makes dist/ stale. */
const SOURCES = [
  'src',
  'public',
  'vite.config.ts',
  'package.json',
  'package-lock.json',
  'tsconfig.json',
];

function newestMtimeMs(path: string): number {
  let st;
  try {
    st = statSync(path);
  } catch {
    return 0;
  }
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(path))
    newest = Math.max(newest, newestMtimeMs(join(path, entry)));
  return newest;
}

/** Why the app in `outDir` must be (re)built, or null when it is up to date. */
export function buildNeeded(root: string, outDir: string): string | null {
  const index = join(outDir, 'index.html');
  if (!existsSync(index)) return `no build in ${outDir}`;
  const built = statSync(index).mtimeMs;
  const newest = Math.max(...SOURCES.map((s) => newestMtimeMs(join(root, s))));
  return newest > built ? 'the sources changed since the last build' : null;
}

/** Run `vite build` in `root` (output in `outDir`); resolves with its exit status. */
export function buildApp(
  root: string,
  outDir: string,
  log: (line: string) => void,
): Promise<number> {
  const vite = join(root, 'node_modules', 'vite', 'bin', 'vite.js');
  if (!existsSync(vite)) {
    log(`cannot build: ${vite} is missing (run npm ci in ${root})`);
    return Promise.resolve(1);
  }
  return new Promise((resolveExit) => {
    const child = spawn(
      process.execPath,
      [vite, 'build', '--logLevel', 'warn', '--outDir', outDir, '--emptyOutDir'],
      { cwd: root, stdio: ['ignore', 'inherit', 'inherit'] },
    );
    child.on('exit', (code) => resolveExit(code ?? 1));
    child.on('error', (err) => {
      log(`cannot build: ${err.message}`);
      resolveExit(1);
    });
  });
}
