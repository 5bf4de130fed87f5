/* global document, MutationObserver, requestAnimationFrame, window -- these run inside the page */
// Benchmark (not part of `npm test`): time from a weight change to the re-ranked table painted, in
// Chromium on the production build, with 60 shortlisted candidates. Real input: the mouse drags the
// "Tablet mass" slider one step at a time, and the keyboard steps it (Arrow keys: `input` and
// `change` together, so the document order follows at once).
//
//   node tests/bench/rerank-browser.mjs            (builds into /tmp/saltsmith-bench-dist first)
//   SALTSMITH_SKIP_BUILD=1 SALTSMITH_OUT_DIR=… node tests/bench/rerank-browser.mjs
//   SALTSMITH_BENCH_JSON=out.json …      (also write the summary there; tests/bench/run-all.mjs does)
//
// Per weight change: the slider's `input` event (its timeStamp) → the first change of the ranked
// rows' body (a MutationObserver: the re-ranked rows committed) → the end of the next frame painted
// after it (requestAnimationFrame, then a task). It fails (exit 1) when a change never reaches the
// table, when fewer than 60 ranked rows are on screen, when the rows on screen are not in rank order,
// or when the document order has not caught up after a movement ends.
import {
  RANKED_BODY,
  benchOutDir,
  buildApp,
  machineNow,
  openRanking,
  report,
  seedShortlist,
  stats,
  withBenchPage,
} from './support/browser-bench.mjs';

const IONS = [
  ...['fluoride', 'chloride', 'bromide', 'iodide', 'nitrate', 'sulfate', 'hydrogen-sulfate'],
  ...['phosphate', 'mesylate', 'esylate', 'besylate', 'tosylate', 'napsylate', 'edisylate'],
  ...['isethionate', 'camsylate', 'acetate', 'lactate', 'succinate', 'fumarate', 'maleate'],
  ...['tartrate', 'citrate', 'malate', 'oxalate', 'benzoate', 'salicylate', 'gluconate'],
  ...['glycolate', 'hippurate', 'adipate', 'aspartate', 'glutamate', 'perchlorate', 'carbonate'],
];
const ROWS = 60;
const DRAG_STEPS = 60;
const KEY_STEPS = 30;
const SLOW_KEY_STEPS = 20;
const BARE_STEPS = 30;
const SLIDER = 'Tablet mass';

/**
 * Installed in the page: one record per `input` of a range, completed when the frame after its
 * effect is painted. The app's sliders complete when the ranked rows' body has changed (the
 * re-ranked table committed) and the next frame is painted; the bare slider the benchmark adds
 * (outside React, no handler) completes at the next painted frame — the browser's own input → paint
 * time under the same load, the baseline.
 */
function instrument({ sel }) {
  const body = document.querySelector(sel);
  const rec = (window.__rr = { inputs: [], waiting: [], bare: [] });
  const afterPaint = (f) => requestAnimationFrame(() => setTimeout(f, 0));
  const bare = document.createElement('input');
  Object.assign(bare, { type: 'range', id: 'bench-bare', min: '0', max: '3', step: '0.1' });
  bare.value = '1';
  bare.setAttribute('aria-label', 'Bench baseline');
  bare.style.cssText = 'position:fixed;right:12px;bottom:12px;width:220px;z-index:9999;margin:0';
  document.body.append(bare);
  document.addEventListener(
    'input',
    (e) => {
      if (e.target?.type !== 'range') return;
      const r = { inputAt: e.timeStamp, tableAt: null, paintedAt: null };
      if (e.target === bare) {
        rec.bare.push(r);
        afterPaint(() => (r.paintedAt = performance.now()));
        return;
      }
      rec.inputs.push(r);
      rec.waiting.push(r);
    },
    true,
  );
  new MutationObserver(() => {
    if (!rec.waiting.length) return;
    const now = performance.now();
    const done = rec.waiting.splice(0);
    for (const r of done) r.tableAt = now;
    afterPaint(() => {
      const t = performance.now();
      for (const r of done) r.paintedAt = t;
    });
  }).observe(body, { subtree: true, childList: true, characterData: true, attributes: true });
}

/** Rows read top to bottom on screen (transforms included): ranks ascending, no overlap. */
function shownOrder(sel) {
  const rows = [...document.querySelector(sel).rows].map((tr) => {
    const b = tr.getBoundingClientRect();
    return { rank: tr.cells[0].textContent.trim(), top: b.top, bottom: b.bottom };
  });
  const onScreen = [...rows].sort((a, b) => a.top - b.top);
  return {
    onScreen: onScreen.map((r) => r.rank),
    inDocument: rows.map((r) => r.rank),
    overlaps: onScreen.slice(1).filter((r, i) => r.top < onScreen[i].bottom - 1).length,
  };
}
const ranksInOrder = (ranks) =>
  ranks.filter((r) => r !== '—').every((r, i, a) => i === 0 || Number(a[i - 1]) <= Number(r));

/** Wait until every `input` so far has its painted table (or `ms` pass); how many inputs there are. */
async function settled(page, ms = 5000) {
  await page
    .waitForFunction(
      () => [...window.__rr.inputs, ...window.__rr.bare].every((r) => r.paintedAt !== null),
      null,
      {
        timeout: ms,
        polling: 25,
      },
    )
    .catch(() => {});
  return page.evaluate(() => window.__rr.inputs.length);
}

/** Drag the slider's thumb across its track one step (0.1) at a time, back and forth. */
async function drag(page, slider, steps, list = 'inputs') {
  const box = await slider.boundingBox();
  const y = box.y + box.height / 2;
  const thumb = 16; // Chromium's range thumb, px (where a value lands along the track)
  const xFor = (v) => box.x + thumb / 2 + (v / 3) * (box.width - thumb);
  const valueNow = Number(await slider.inputValue());
  await page.mouse.move(xFor(valueNow), y);
  await page.mouse.down();
  let v = valueNow;
  let dir = 1;
  for (let i = 0; i < steps; i++) {
    if (v + dir * 0.1 > 3 || v + dir * 0.1 < 0) dir = -dir;
    v = Math.round((v + dir * 0.1) * 10) / 10;
    const before = await page.evaluate((l) => window.__rr[l].length, list);
    await page.mouse.move(xFor(v), y);
    await page
      .waitForFunction(
        ({ l, n }) => window.__rr[l].length > n,
        { l: list, n: before },
        {
          timeout: 500,
          polling: 10,
        },
      )
      .catch(() => {});
    await settled(page);
    if (list === 'inputs' && i === Math.floor(steps / 2)) {
      const during = await page.evaluate(shownOrder, RANKED_BODY);
      if (!ranksInOrder(during.onScreen) || during.overlaps > 0)
        throw new Error(`rows on screen out of rank order mid-drag: ${JSON.stringify(during)}`);
    }
  }
  await page.mouse.up();
}

/**
 * Press the arrow keys on the focused slider (each press is `input` and `change` at once), `gapMs`
 * apart: 300 ms is a run of presses (the area settles after the last), 900 ms lets the panels below the
 * table and the document order follow between two presses (their work can delay the next press).
 */
async function keySteps(page, slider, steps, gapMs) {
  await slider.focus();
  for (let i = 0; i < steps; i++) {
    await page.keyboard.press(i % 10 < 5 ? 'ArrowRight' : 'ArrowLeft');
    await settled(page);
    await page.waitForTimeout(gapMs);
  }
}

const outDir = benchOutDir();
buildApp(outDir);
const summary = await withBenchPage(outDir, async (page, url) => {
  await seedShortlist(page, url, IONS, ROWS, 'bench_');
  const ranked = await openRanking(page, url, ROWS);
  if (ranked !== ROWS) throw new Error(`${ranked} ranked rows on screen, expected ${ROWS}`);
  const slider = page.getByRole('slider', { name: SLIDER, exact: true });
  await page.evaluate(instrument, { sel: RANKED_BODY });

  const bare = page.getByRole('slider', { name: 'Bench baseline' });
  const loadBefore = machineNow();
  await drag(page, bare, BARE_STEPS, 'bare');
  await drag(page, slider, DRAG_STEPS);
  const dragged = await page.evaluate(() => window.__rr.inputs.splice(0));
  await drag(page, bare, BARE_STEPS, 'bare');
  // The movement has ended (pointer released → `change`): the document order catches up.
  await page.waitForTimeout(600);
  const after = await page.evaluate(shownOrder, RANKED_BODY);
  if (!ranksInOrder(after.inDocument) || !ranksInOrder(after.onScreen))
    throw new Error(`document order is not the ranking after the drag: ${JSON.stringify(after)}`);

  await keySteps(page, slider, KEY_STEPS, 300);
  const keyed = await page.evaluate(() => window.__rr.inputs.splice(0));
  await keySteps(page, slider, SLOW_KEY_STEPS, 900);
  const keyedSlow = await page.evaluate(() => window.__rr.inputs.splice(0));
  const afterKeys = await page.evaluate(shownOrder, RANKED_BODY);
  if (!ranksInOrder(afterKeys.inDocument) || !ranksInOrder(afterKeys.onScreen))
    throw new Error(
      `document order is not the ranking after the keys: ${JSON.stringify(afterKeys)}`,
    );

  const part = (rs) => ({
    inputToTablePaintedMs: stats(rs.map((r) => (r.paintedAt ?? NaN) - r.inputAt)),
    inputToTableCommittedMs: stats(rs.map((r) => (r.tableAt ?? NaN) - r.inputAt)),
    neverReachedTable: rs.filter((r) => r.paintedAt === null).length,
  });
  const drags = part(dragged);
  const keys = part(keyed);
  const keysSlow = part(keyedSlow);
  const bareRecs = await page.evaluate(() => window.__rr.bare);
  const baseline = stats(bareRecs.map((r) => (r.paintedAt ?? NaN) - r.inputAt));
  const ratio = (x) => (baseline.medianMs ? +(x / baseline.medianMs).toFixed(2) : null);
  if (
    dragged.length < DRAG_STEPS / 2 ||
    drags.neverReachedTable + keys.neverReachedTable + keysSlow.neverReachedTable > 0
  )
    throw new Error(
      `the table did not follow the slider: ${dragged.length} drag inputs (${drags.neverReachedTable} never painted), ${keys.neverReachedTable} key steps never painted`,
    );
  return {
    rankedRows: ranked,
    ...loadBefore,
    loadAverage1mAtEnd: machineNow().loadAverage1m,
    drag: {
      inputs: dragged.length,
      ...drags,
      medianOverBaseline: ratio(drags.inputToTablePaintedMs.medianMs),
    },
    keyboardStep: {
      inputs: keyed.length,
      gapMs: 300,
      ...keys,
      medianOverBaseline: ratio(keys.inputToTablePaintedMs.medianMs),
    },
    keyboardStepSettling: {
      inputs: keyedSlow.length,
      gapMs: 900,
      ...keysSlow,
      medianOverBaseline: ratio(keysSlow.inputToTablePaintedMs.medianMs),
    },
    baselineBareSlider: {
      inputToNextPaintMs: baseline,
      note: 'a range input outside the app (no handler), dragged the same way before and after: the browser’s own input → paint under this load',
    },
    goal: 'input → re-ranked table painted: median < 16 ms, p95 < 33 ms (issue 20)',
    shownOrderChecked: true,
    setting:
      'Chromium headless, 1280×800, production build; real mouse and keyboard input (playwright)',
  };
});
report(summary);
