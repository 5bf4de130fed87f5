// `node tests/e2e/support/area-screenshots.mjs [--out <folder>]`: one full-page PNG of every area of the
// workbench with the demo project, for reading the screens as a formulator would (not part of npm test).
// Builds the production bundle like run-browser-tests.mjs (SALTSMITH_SKIP_BUILD=1 reuses dist/, or
// SALTSMITH_OUT_DIR), serves it on 127.0.0.1 and drives the system Chromium at 1280×800.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium } from 'playwright-core';
import { CHROMIUM_ARGS, CHROMIUM_MISSING_MESSAGE, findChromium } from './chromium.mjs';
import { freePort, startPreview } from './server.mjs';

function outFolder(argv) {
  const i = argv.indexOf('--out');
  if (i < 0) return 'tests/e2e/out/screenshots';
  const value = argv[i + 1];
  if (!value || value.startsWith('--')) {
    console.error('--out needs a folder');
    process.exit(2);
  }
  return value;
}

const out = resolve(outFolder(process.argv.slice(2)));
const chromiumPath = findChromium();
if (!chromiumPath) {
  console.error(CHROMIUM_MISSING_MESSAGE);
  process.exit(1);
}

const outDir = process.env.SALTSMITH_OUT_DIR;
const outArgs = outDir ? ['--outDir', outDir] : [];
if (!process.env.SALTSMITH_SKIP_BUILD) {
  const build = spawnSync(
    process.execPath,
    ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn', '--bypass-lock', ...outArgs],
    { stdio: 'inherit' },
  );
  if (build.status !== 0) process.exit(build.status ?? 1);
}

/** What each area shows once it has finished loading (its first heading, table or figure). */
const READY = {
  Compound: (p) => p.getByRole('heading', { name: 'Compound', exact: true }),
  'Counter-ions': (p) => p.getByRole('table').first(),
  Ranking: (p) => p.getByRole('table', { name: /Ranked candidates/ }),
  Energetics: (p) => p.locator('main svg').first(),
  'Salt screen': (p) => p.getByRole('table').first(),
  'Bench data': (p) => p.getByRole('navigation', { name: 'Shortlisted candidates' }),
  'Model check': (p) => p.locator('main table').first(),
  Projects: (p) => p.getByRole('article').first(),
};

const fileName = (label) => `${label.toLowerCase().replace(/[^a-z0-9]+/g, '-')}.png`;

/** Wait for an area's content, then let charts and workers settle before the picture. */
async function settle(page, ready) {
  if (ready) await ready(page).waitFor({ timeout: 60_000 });
  await page
    .locator('main [role="status"]', { hasText: /…$/ })
    .first()
    .waitFor({ state: 'detached', timeout: 30_000 })
    .catch(() => {});
  await page.waitForTimeout(1500);
}

async function shoot(page) {
  const nav = page.getByRole('navigation', { name: 'Workbench areas' });
  await nav.waitFor({ timeout: 60_000 });
  const labels = await nav.getByRole('link').allTextContents();
  const saved = [];
  for (const label of labels) {
    await nav.getByRole('link', { name: label, exact: true }).click();
    await settle(page, READY[label]);
    const path = join(out, fileName(label));
    await page.screenshot({ path, fullPage: true });
    saved.push(path);
  }
  // The comparison sheet opens over the areas (from the header), not from the area bar.
  await nav.getByRole('link', { name: 'Ranking', exact: true }).click();
  await page.getByRole('button', { name: 'Comparison sheet' }).click();
  await page.locator('.comparison-sheet h1').waitFor({ timeout: 60_000 });
  await settle(page, (p) => p.getByRole('table', { name: /^Salt formation/ }));
  // The sheet scrolls inside a fixed overlay: grow the window to its height for one whole picture.
  const height = await page.locator('.sheet-overlay').evaluate((el) => el.scrollHeight);
  await page.setViewportSize({ width: 1280, height: Math.max(800, Math.ceil(height)) });
  await page.waitForTimeout(500);
  const sheet = join(out, 'comparison-sheet.png');
  await page.screenshot({ path: sheet });
  await page.setViewportSize({ width: 1280, height: 800 });
  saved.push(sheet);
  return saved;
}

mkdirSync(out, { recursive: true });
const port = await freePort();
const server = await startPreview(port, outArgs);
const profile = mkdtempSync(join(tmpdir(), 'saltsmith-shots-'));
let status = 1;
try {
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath,
    headless: true,
    args: [...CHROMIUM_ARGS],
    viewport: { width: 1280, height: 800 },
  });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(server.url);
    for (const path of await shoot(page)) console.log(path);
    status = 0;
  } finally {
    await context.close();
  }
} catch (e) {
  console.error(e instanceof Error ? e.stack : String(e));
} finally {
  server.stop();
  rmSync(profile, { recursive: true, force: true });
}
process.exit(status);
