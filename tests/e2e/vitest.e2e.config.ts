import { defineConfig } from 'vitest/config';
import { fileURLToPath, URL } from 'node:url';

/** Browser journeys: node environment, one file at a time (one Chromium at a time on 2 cores). */
export default defineConfig({
  root: fileURLToPath(new URL('../..', import.meta.url)),
  resolve: { alias: { '@': fileURLToPath(new URL('../../src', import.meta.url)) } },
  test: {
    name: 'browser',
    include: ['tests/e2e/**/*.e2e.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
