import { builtinModules } from 'node:module';
import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vite';

/**
 * Build of the `saltsmith` command: the CLI and the core it calls, compiled once to plain JavaScript for
 * Node (a Vite library build, Rollup-compatible output) so that a start does not transpile TypeScript.
 * Output: dist-cli/ (git-ignored), written by `npm run build:cli`, which `prepare` runs after `npm ci`.
 * Dependencies (zod, papaparse, openchemlib) stay in node_modules and are imported from there;
 * openchemlib is imported only when a SMILES is parsed.
 *
 * For profiling: SALTSMITH_CLI_PLAIN=1 keeps function names (no minifying) and SALTSMITH_CLI_OUT=<dir>
 * writes the build elsewhere (see DEVELOPERS.md, "Profiling the batch").
 */
const plain = process.env['SALTSMITH_CLI_PLAIN'] === '1';
const root = fileURLToPath(new URL('../../..', import.meta.url));

export default defineConfig({
  root,
  publicDir: false,
  logLevel: 'warn',
  // Bundle zod and papaparse into the build: loading zod's hundreds of small module files cost more
  // start-up time than the whole command (measured: ~150 ms of module resolution).
  ssr: { noExternal: true, external: ['openchemlib'] },
  resolve: { alias: { '@': fileURLToPath(new URL('../..', import.meta.url)) } },
  build: {
    outDir: process.env['SALTSMITH_CLI_OUT'] ?? 'dist-cli',
    emptyOutDir: true,
    target: 'node20',
    minify: !plain,
    sourcemap: false,
    copyPublicDir: false,
    reportCompressedSize: false,
    ssr: true,
    rollupOptions: {
      input: {
        saltsmith: 'src/cli/entry.ts',
        'batch-worker': 'src/cli/commands/screen/batch/batch-worker-entry.ts',
      },
      external: [/^node:/, ...builtinModules, 'openchemlib', /^openchemlib\//],
      output: { format: 'es', entryFileNames: '[name].js', chunkFileNames: '[name]-[hash].js' },
    },
  },
});
