// `npm run test:browser`: build the production bundle, serve it on 127.0.0.1, and run the browser
// journeys in tests/e2e with playwright-core driving the system Chromium.
import { spawnSync } from 'node:child_process';
import { findChromium, CHROMIUM_MISSING_MESSAGE } from './chromium.mjs';
import { freePort, startPreview } from './server.mjs';

const chromium = findChromium();
if (!chromium) {
  console.error(CHROMIUM_MISSING_MESSAGE);
  process.exit(1);
}

// SALTSMITH_OUT_DIR builds and serves somewhere other than dist/ (parallel runs on one checkout).
const outDir = process.env.SALTSMITH_OUT_DIR;
const outArgs = outDir ? ['--outDir', outDir] : [];
if (!process.env.SALTSMITH_SKIP_BUILD) {
  const build = spawnSync(
    process.execPath,
    ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn', '--bypass-lock', ...outArgs],
    {
      stdio: 'inherit',
    },
  );
  if (build.status !== 0) process.exit(build.status ?? 1);
}

const port = await freePort();
const server = await startPreview(port, outArgs);
let status = 1;
try {
  const run = spawnSync(
    process.execPath,
    [
      'node_modules/vitest/vitest.mjs',
      'run',
      '--config',
      'tests/e2e/vitest.e2e.config.ts',
      ...process.argv.slice(2),
    ],
    { stdio: 'inherit', env: { ...process.env, SALTSMITH_URL: server.url, CHROME_PATH: chromium } },
  );
  status = run.status ?? 1;
} finally {
  server.stop();
}
process.exit(status);
