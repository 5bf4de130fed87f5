/* global indexedDB, document, HTMLInputElement, MutationObserver, requestAnimationFrame, window -- these run inside the page (page.evaluate) */
// Benchmark (not part of `npm test`): time from a weight-slider movement to the re-ranked table on
// screen, in Chromium on the production build, with 60 shortlisted candidates.
//
//   node tests/bench/rerank-browser.mjs            (builds into /tmp/saltsmith-bench-dist first)
//   SALTSMITH_SKIP_BUILD=1 SALTSMITH_OUT_DIR=… node tests/bench/rerank-browser.mjs
//   SALTSMITH_BENCH_JSON=out.json …      (also write the summary there; tests/bench/run-all.mjs does)
//
// It fails (exit 1) when the rows on screen are not in rank order during a movement or the document
// order has not caught up after it ends.
//
// The 60 candidates are written straight into the browser's IndexedDB (records shaped as
// src/persistence/records.ts describes) for the fictional demo project; the demo's numbers are a
// workload here, not data.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { CHROMIUM_ARGS, findChromium } from '../e2e/support/chromium.mjs';
import { freePort, startPreview } from '../e2e/support/server.mjs';

const outDir = process.env.SALTSMITH_OUT_DIR ?? '/tmp/saltsmith-bench-dist';
if (!process.env.SALTSMITH_SKIP_BUILD) {
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
const server = await startPreview(await freePort(), ['--outDir', outDir]);
const profile = mkdtempSync(join(tmpdir(), 'saltsmith-bench-'));
const ctx = await chromium.launchPersistentContext(profile, {
  executablePath: findChromium(),
  headless: true,
  args: CHROMIUM_ARGS,
  viewport: { width: 1280, height: 800 },
});
try {
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  await page.goto(server.url);
  await page.getByText('Demorazine is fictional').waitFor();
  const ions = [
    'fluoride',
    'chloride',
    'bromide',
    'iodide',
    'nitrate',
    'sulfate',
    'hydrogen-sulfate',
    'phosphate',
    'mesylate',
    'esylate',
    'besylate',
    'tosylate',
    'napsylate',
    'edisylate',
    'isethionate',
    'camsylate',
    'acetate',
    'lactate',
    'succinate',
    'fumarate',
    'maleate',
    'tartrate',
    'citrate',
    'malate',
    'oxalate',
    'benzoate',
    'salicylate',
    'gluconate',
    'glycolate',
    'hippurate',
    'adipate',
    'aspartate',
    'glutamate',
    'perchlorate',
    'carbonate',
  ];
  await page.evaluate(async (ionIds) => {
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
    for (let i = 0; i < 60; i++) {
      const ionId = ionIds[i % ionIds.length];
      store.put({
        id: `bench_${i}`,
        schemaVersion: 1,
        projectId: demo.id,
        ionId,
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
  }, ions);
  await page.goto(`${server.url}#/ranking`);
  await page.reload();
  await page.getByText(/\d+ candidates ranked/).waitFor({ timeout: 60_000 });
  const ranked = await page
    .getByRole('table', { name: /Ranked candidates/ })
    .locator('tbody tr')
    .count();
  // One slider movement = one input event; React commits synchronously for it, then the browser paints.
  const times = await page.evaluate(async () => {
    const slider = [...document.querySelectorAll('input[type=range]')].find(
      (e) => e.labels?.[0]?.textContent === 'Tablet mass',
    );
    const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value').set;
    const out = [];
    const commit = [];
    const tbody =
      document.querySelector('table[aria-label^="Ranked candidates"] tbody') ??
      document.querySelector('table tbody');
    const tableTimes = (window.__table = []);
    for (let i = 0; i < 60; i++) {
      // The table re-ranks in a deferred render: note when it next changes (any DOM mutation in its body).
      let tableChanged = null;
      const seen = new Promise((resolve) => {
        const mo = new MutationObserver(() => {
          mo.disconnect();
          tableChanged = performance.now();
          resolve();
        });
        mo.observe(tbody, {
          subtree: true,
          childList: true,
          characterData: true,
          attributes: true,
        });
        setTimeout(() => {
          mo.disconnect();
          resolve();
        }, 2000);
      });
      const t0 = performance.now();
      setter.call(slider, String((i % 30) / 10));
      slider.dispatchEvent(new Event('input', { bubbles: true }));
      commit.push(performance.now() - t0);
      const t1 = performance.now();
      void document.body.offsetHeight; // force style + layout now, to time it apart from paint
      (window.__layout ??= []).push(performance.now() - t1);
      await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
      out.push(performance.now() - t0);
      await seen;
      if (tableChanged !== null) {
        // …and until the frame after the table's change is painted.
        await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
        tableTimes.push(performance.now() - t0);
      }
    }
    commit.sort((a, b) => a - b);
    console.log('commit median', commit[30]);
    window.__commitMedian = commit[30];
    return out;
  });
  times.sort((a, b) => a - b);
  const commitMedianMs = await page.evaluate(() => window.__commitMedian);
  const layoutMedianMs = await page.evaluate(() => window.__layout.sort((a, b) => a - b)[30]);
  const table = (await page.evaluate(() => window.__table)).sort((a, b) => a - b);
  const q = (arr, f) =>
    arr.length ? +arr[Math.min(arr.length - 1, Math.floor(f * arr.length))].toFixed(1) : null;

  // The shown order must be the ranking: rows read top to bottom on screen (transforms included)
  // carry ranks 1, 2, 3… and do not overlap. Checked mid-movement and after the movement ends.
  const shownOrder = () =>
    page.evaluate(() => {
      const trs = [...document.querySelectorAll('table tbody')].find((b) =>
        b.closest('table')?.querySelector('caption')?.textContent?.startsWith('Ranked candidates'),
      );
      const rows = [...trs.rows].map((tr) => ({
        rank: tr.cells[0].textContent.trim(),
        top: tr.getBoundingClientRect().top,
        bottom: tr.getBoundingClientRect().bottom,
      }));
      const onScreen = [...rows].sort((a, b) => a.top - b.top);
      const overlaps = onScreen.slice(1).filter((r, i) => r.top < onScreen[i].bottom - 1).length;
      return {
        onScreen: onScreen.map((r) => r.rank),
        inDocument: rows.map((r) => r.rank),
        overlaps,
      };
    });
  const ranksInOrder = (ranks) =>
    ranks.filter((r) => r !== '—').every((r, i, a) => i === 0 || Number(a[i - 1]) <= Number(r));
  const during = await shownOrder();
  if (!ranksInOrder(during.onScreen) || during.overlaps > 0) {
    throw new Error(
      `rows on screen are not in rank order during the movement: ${JSON.stringify(during)}`,
    );
  }
  // End the movement (the slider's change event) and time until the document order has caught up.
  const settleMs = await page.evaluate(async () => {
    const slider = [...document.querySelectorAll('input[type=range]')].find(
      (e) => e.labels?.[0]?.textContent === 'Tablet mass',
    );
    const t0 = performance.now();
    slider.dispatchEvent(new Event('change', { bubbles: true }));
    await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
    return performance.now() - t0;
  });
  const after = await shownOrder();
  if (!ranksInOrder(after.inDocument) || !ranksInOrder(after.onScreen)) {
    throw new Error(
      `document order is not the ranking after the movement ended: ${JSON.stringify(after)}`,
    );
  }

  // A keyboard step: input and change together (the document order follows at once).
  const steps = await page.evaluate(async () => {
    const slider = [...document.querySelectorAll('input[type=range]')].find(
      (e) => e.labels?.[0]?.textContent === 'Tablet mass',
    );
    const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value').set;
    const out = [];
    for (let i = 0; i < 20; i++) {
      const t0 = performance.now();
      setter.call(slider, String(((i * 7) % 30) / 10));
      slider.dispatchEvent(new Event('input', { bubbles: true }));
      slider.dispatchEvent(new Event('change', { bubbles: true }));
      await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
      out.push(performance.now() - t0);
    }
    return out.sort((a, b) => a - b);
  });

  const summary = {
    candidatesOnScreen: ranked,
    movements: times.length,
    slider: {
      medianMs: q(times, 0.5),
      p95Ms: q(times, 0.95),
      maxMs: q(times, 1),
      note: 'input event → React commit → next frame',
    },
    table: {
      updates: table.length,
      medianMs: q(table, 0.5),
      p95Ms: q(table, 0.95),
      maxMs: q(table, 1),
      note: 'input event → re-ranked table painted',
    },
    commitMedianMs: +commitMedianMs.toFixed(1),
    layoutMedianMs: +layoutMedianMs.toFixed(1),
    movementEndMs: +settleMs.toFixed(1),
    keyboardStep: {
      steps: steps.length,
      medianMs: q(steps, 0.5),
      p95Ms: q(steps, 0.95),
      note: 'input + change (document order follows at once) → next frame',
    },
    shownOrderChecked: true,
    setting: 'Chromium headless, 1280×800, production build',
  };
  console.log(JSON.stringify(summary, null, 2));
  if (process.env.SALTSMITH_BENCH_JSON)
    writeFileSync(process.env.SALTSMITH_BENCH_JSON, JSON.stringify(summary));
} finally {
  await ctx.close();
  rmSync(profile, { recursive: true, force: true });
  server.stop();
}
