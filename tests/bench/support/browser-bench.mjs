/* global indexedDB, document -- the seeding and the look-ups below run inside the page */
// What the browser benchmarks share (tests/bench/rerank-browser.mjs, measure-next-browser.mjs): the
// production build, `vite preview` on 127.0.0.1, the system Chromium with the test flags
// (tests/e2e/support/chromium.mjs, server.mjs), a shortlist written into the fictional demo project,
// the Ranking table's selectors, and the statistics every summary carries (median, p95, cores, load).
// Benchmarks, not timed tests: no figure fails them; a page that never shows what is timed does.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import {
  CHROMIUM_ARGS,
  CHROMIUM_MISSING_MESSAGE,
  findChromium,
} from '../../e2e/support/chromium.mjs';
import { freePort, startPreview } from '../../e2e/support/server.mjs';

/** The ranked rows' own body (the free form sits in a body of its own before it). */
export const RANKED_BODY = 'table.ranking-table > tbody:not(.free-form-body)';
/** The "Measure next" panel. */
export const MEASURE_NEXT_PANEL = 'section[aria-labelledby="measure-next-title"]';

/** Build the app into `outDir` unless SALTSMITH_SKIP_BUILD is set (then `outDir` must hold a build). */
export function buildApp(outDir) {
  if (process.env.SALTSMITH_SKIP_BUILD) return;
  const b = spawnSync(
    process.execPath,
    [
      'node_modules/vite/bin/vite.js',
      'build',
      '--logLevel',
      'warn',
      '--bypass-lock',
      '--outDir',
      outDir,
      '--emptyOutDir',
    ],
    { stdio: 'inherit' },
  );
  if (b.status !== 0) process.exit(b.status ?? 1);
}

/** The build's folder: SALTSMITH_OUT_DIR, else a fixed folder under /tmp. */
export const benchOutDir = () => process.env.SALTSMITH_OUT_DIR ?? '/tmp/saltsmith-bench-dist';

/**
 * Serve the build and open one page of a fresh persistent profile (IndexedDB survives reloads);
 * `run(page, url)` does the measuring; everything is closed and removed afterwards.
 */
export async function withBenchPage(outDir, run) {
  const executablePath = findChromium();
  if (!executablePath) throw new Error(CHROMIUM_MISSING_MESSAGE);
  const server = await startPreview(await freePort(), ['--outDir', outDir]);
  const profile = mkdtempSync(join(tmpdir(), 'saltsmith-bench-'));
  let ctx;
  try {
    ctx = await chromium.launchPersistentContext(profile, {
      executablePath,
      headless: true,
      args: CHROMIUM_ARGS,
      viewport: { width: 1280, height: 800 },
    });
    const page = ctx.pages()[0] ?? (await ctx.newPage());
    const errors = [];
    page.on('pageerror', (e) => errors.push(String(e)));
    const out = await run(page, server.url);
    if (errors.length) throw new Error(`the page threw:\n${errors.join('\n')}`);
    return out;
  } finally {
    await ctx?.close();
    rmSync(profile, { recursive: true, force: true });
    server.stop();
  }
}

/**
 * Open the app once (it creates the fictional demo project) and replace the demo's shortlist with
 * `count` candidates cycling through `ionIds` (a repeated ion gets one more hydrate water, so each
 * candidate is distinct). Records are shaped as src/persistence/records.ts describes; the demo's
 * invented numbers are a workload here, not data.
 */
export async function seedShortlist(page, url, ionIds, count, idPrefix) {
  await page.goto(url);
  await page.getByText('Demorazine is fictional').waitFor({ timeout: 60_000 });
  await page.evaluate(
    async ({ ionIds, count, idPrefix }) => {
      const db = await new Promise((res, rej) => {
        const r = indexedDB.open('saltsmith');
        r.onsuccess = () => res(r.result);
        r.onerror = () => rej(r.error);
      });
      const tx = db.transaction(['projects', 'candidates'], 'readwrite');
      const projects = await new Promise((res) => {
        const r = tx.objectStore('projects').getAll();
        r.onsuccess = () => res(r.result);
      });
      const demo = projects.find((p) => p.isDemo);
      const store = tx.objectStore('candidates');
      await new Promise((res) => {
        const r = store.clear();
        r.onsuccess = res;
      });
      for (let i = 0; i < count; i++) {
        store.put({
          id: `${idPrefix}${i}`,
          schemaVersion: 1,
          projectId: demo.id,
          ionId: ionIds[i % ionIds.length],
          drugPerSalt: 1,
          counterIonPerSalt: 1,
          hydrateWater: Math.floor(i / ionIds.length),
          addedAt: new Date().toISOString(),
          order: i,
        });
      }
      await new Promise((res) => {
        tx.oncomplete = res;
      });
      db.close();
    },
    { ionIds, count, idPrefix },
  );
}

/** Go to the Ranking area (fresh load) and wait until the ranked body holds `n` rows. */
export async function openRanking(page, url, n) {
  await page.goto(`${url}#/ranking`);
  await page.reload();
  await page.waitForFunction(
    ({ sel, n }) => (document.querySelector(sel)?.rows.length ?? 0) >= n,
    { sel: RANKED_BODY, n },
    { timeout: 60_000 },
  );
  return page.evaluate((sel) => document.querySelector(sel).rows.length, RANKED_BODY);
}

/** Resolves after the next frame has been painted (rAF runs before the paint, a task after it). */
export const AFTER_NEXT_PAINT = `() => new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)))`;

const q = (sorted, f) => sorted[Math.min(sorted.length - 1, Math.floor(f * sorted.length))];

/** Median, p95, min and max of a list of milliseconds (nulls left out and counted). */
export function stats(xs) {
  const s = xs.filter((x) => typeof x === 'number' && Number.isFinite(x)).sort((a, b) => a - b);
  const r = (x) => (x === undefined ? null : +x.toFixed(1));
  return {
    runs: s.length,
    medianMs: r(q(s, 0.5)),
    p95Ms: r(q(s, 0.95)),
    minMs: r(s[0]),
    maxMs: r(s.at(-1)),
    ...(s.length < xs.length ? { missing: xs.length - s.length } : {}),
  };
}

/** Cores and 1-minute load average now (every summary carries them). */
export const machineNow = () => ({
  cores: availableParallelism(),
  loadAverage1m: +loadavg()[0].toFixed(2),
});

/** Print the summary and, when SALTSMITH_BENCH_JSON names a file (run-all.mjs), write it there. */
export function report(summary) {
  console.log(JSON.stringify(summary, null, 2));
  if (process.env.SALTSMITH_BENCH_JSON)
    writeFileSync(process.env.SALTSMITH_BENCH_JSON, JSON.stringify(summary));
}
