// `npm run bench`: every benchmark, one JSON summary (not part of `npm test`; nothing here is a
// timed test, and no figure makes it fail — only a benchmark that cannot run does).
//
//   node tests/bench/run-all.mjs [--out file] [--skip core,cli,batch,browser,measure-next] [--batch-sizes 1000,10000]
//                                [--batch-max-s 300]
//
// Runs, in order:
//   core     tests/bench/core.bench.ts (through tsx): models per salt, a full screen of one compound
//            against the library (Monte Carlo excluded), and the bare closed-form baseline in the same
//            process, with the screen's overhead over it as a ratio
//   cli      `saltsmith lattice --cation Na+ --anion Cl-` wall time, 12 runs (2 warm-up), beside a bare
//            `node -e 0` start on the same machine
//   batch    `saltsmith screen --batch … --top 3` on generated fictional compounds (formula only, whole
//            library), CSV and JSON Lines: compounds per second, peak resident memory (GNU time), the
//            load average before each run, and the ratio to the core benchmark's bare closed-form loop
//            (run `core` too for it); a run the previous rate says would take longer than
//            --batch-max-s is left out, with its estimated time written down
//   browser  tests/bench/rerank-browser.mjs: weight slider (real mouse drag and arrow keys) → re-ranked
//            table painted in Chromium, beside a bare slider's input → paint in the same page, and the
//            first screen's gzipped JavaScript of the same build (tests/bench/check-budget.mjs)
//   measure-next  tests/bench/measure-next.bench.ts (the value-of-information computation for 12
//            candidates, one thread) and tests/bench/measure-next-browser.mjs (table on screen → the
//            "Measure next" list on screen in Chromium, worker included; goal < 1 s on 2 cores)
// The summary (default tests/bench/out/summary.json, git-ignored) carries medians, p95 and the
// machine's core count and load, so figures from different machines can be read side by side; its
// `headline` block puts the figures of issue 20 together, each with its ratio to a same-run baseline.
// The browser benches share tests/bench/support/browser-bench.mjs (build, preview, Chromium, seeding).
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus, loadavg, tmpdir, totalmem } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { measureFirstScreen } from './check-budget.mjs';

const args = process.argv.slice(2);
const opt = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
};
const outPath = resolve(opt('--out', 'tests/bench/out/summary.json'));
const skip = new Set(opt('--skip', '').split(',').filter(Boolean));
const batchSizes = opt('--batch-sizes', '1000,10000')
  .split(',')
  .map(Number)
  .filter((n) => n > 0);
const batchMaxS = Number(opt('--batch-max-s', '300'));
const work = mkdtempSync(join(tmpdir(), 'saltsmith-bench-'));

const q = (sorted, f) => sorted[Math.min(sorted.length - 1, Math.floor(f * sorted.length))];
const stats = (ms) => {
  const s = [...ms].sort((a, b) => a - b);
  const r = (x) => +x.toFixed(1);
  return {
    runs: s.length,
    medianMs: r(q(s, 0.5)),
    p95Ms: r(q(s, 0.95)),
    minMs: r(s[0]),
    maxMs: r(s.at(-1)),
  };
};
const log = (m) => process.stderr.write(`bench: ${m}\n`);

const summary = {
  startedAt: new Date().toISOString(),
  machine: {
    cores: availableParallelism(),
    cpu: cpus()[0]?.model ?? 'unknown',
    memoryGB: +(totalmem() / 2 ** 30).toFixed(1),
    loadAverage1mAtStart: +loadavg()[0].toFixed(2),
    node: process.version,
  },
  results: {},
  skipped: {},
};

// ---- core ---------------------------------------------------------------------------------------
if (!skip.has('core')) {
  log('core models, full screen and closed-form baseline (tsx)…');
  const json = join(work, 'core.json');
  const r = spawnSync(
    process.execPath,
    [
      'node_modules/tsx/dist/cli.mjs',
      '--tsconfig',
      'tsconfig.json',
      'tests/bench/core.bench.ts',
      '--json',
      json,
    ],
    {
      encoding: 'utf8',
      stdio: ['ignore', 'ignore', 'inherit'],
    },
  );
  if (r.status !== 0 || !existsSync(json))
    throw new Error(`core benchmark failed (exit ${r.status})`);
  summary.results.core = JSON.parse(readFileSync(json, 'utf8'));
} else summary.skipped.core = 'skipped by --skip';

// ---- CLI start ------------------------------------------------------------------------------------
const CLI = 'src/cli/saltsmith.mjs';
// The command runs from dist-cli/, which `npm ci` builds once: build it from this checkout's source
// first, or the CLI and batch figures would time whatever build was left there.
if (!skip.has('cli') || !skip.has('batch')) {
  log('building the command (npm run build:cli)…');
  const b = spawnSync('npm', ['run', '-s', 'build:cli'], { stdio: 'inherit' });
  if (b.status !== 0) throw new Error(`npm run build:cli failed (exit ${b.status})`);
}
function wallMs(cmd, argv, runs, warm = 2) {
  const ms = [];
  for (let i = 0; i < runs + warm; i++) {
    const t0 = process.hrtime.bigint();
    const r = spawnSync(cmd, argv, { stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
    const t = Number(process.hrtime.bigint() - t0) / 1e6;
    if (r.status !== 0)
      throw new Error(`${[cmd, ...argv].join(' ')} exited ${r.status}: ${r.stderr}`);
    if (i >= warm) ms.push(t);
  }
  return stats(ms);
}
if (!skip.has('cli')) {
  log('CLI start…');
  const lattice = wallMs(
    process.execPath,
    [CLI, 'lattice', '--cation', 'Na+', '--anion', 'Cl-'],
    12,
  );
  const bareNode = wallMs(process.execPath, ['-e', '0'], 12);
  summary.results.cliStart = {
    command: 'saltsmith lattice --cation Na+ --anion Cl-',
    ...lattice,
    bareNodeStart: bareNode,
    overBareNode: +(lattice.medianMs / bareNode.medianMs).toFixed(2),
    note: 'wall time of the whole process, 2 warm-up runs left out',
  };
} else summary.skipped.cliStart = 'skipped by --skip';

// ---- batch ----------------------------------------------------------------------------------------
/** `n` fictional compounds (invented numbers, a workload only), formula only, whole library. */
function fictionalCompounds(n) {
  const lines = ['id,name,smiles,formula,kind,pkas,charge,s0_mg_per_ml,mp_c,logp,dose_mg,ions'];
  for (let i = 0; i < n; i++) {
    const acid = i % 5 === 4;
    const c = 14 + (i % 11);
    const h = 2 * c - 6 + (i % 5);
    const nN = acid ? i % 2 : 1 + (i % 3);
    const o = 1 + (i % 3);
    const pka = acid ? (3.2 + (i % 17) / 10).toFixed(1) : (6 + (i % 31) / 10).toFixed(1);
    const s0 = i % 3 === 0 ? '' : (0.001 * (1 + (i % 50))).toFixed(3);
    const mp = s0 ? '' : String(120 + (i % 90));
    const logp = s0 ? '' : (1 + (i % 30) / 10).toFixed(1);
    lines.push(
      `FB-${i},Batch compound ${i} (fictional),,C${c}H${h}N${nN}O${o},${acid ? 'acid' : 'base'},${pka},,${s0},${mp},${logp},${10 + (i % 40) * 10},`,
    );
  }
  return lines.join('\n') + '\n';
}
const hasBatch = () => {
  const r = spawnSync(process.execPath, [CLI, 'screen', '--help'], { encoding: 'utf8' });
  return /--batch/.test(`${r.stdout}${r.stderr}`);
};
function runTimed(argv) {
  // GNU time (when present) reports the peak resident set of the whole process tree's leader,
  // worker threads included (they share the process).
  const gnuTime = existsSync('/usr/bin/time');
  const memFile = join(work, 'mem.txt');
  const cmd = gnuTime ? '/usr/bin/time' : process.execPath;
  // and the CPU seconds (user, system) of all its threads: a figure other load moves less than wall time
  const full = gnuTime ? ['-f', '%M %U %S', '-o', memFile, process.execPath, ...argv] : argv;
  const loadBefore = +loadavg()[0].toFixed(2);
  return new Promise((done, fail) => {
    const t0 = process.hrtime.bigint();
    const child = spawn(cmd, full, { stdio: ['ignore', 'ignore', 'pipe'] });
    let err = '';
    child.stderr.on('data', (d) => (err += d));
    child.on('error', fail);
    child.on('close', (code) => {
      const ms = Number(process.hrtime.bigint() - t0) / 1e6;
      const timed =
        gnuTime && existsSync(memFile)
          ? readFileSync(memFile, 'utf8').trim().split('\n').at(-1).split(' ').map(Number)
          : null;
      const peakKB = timed ? timed[0] : null;
      const cpuS = timed && timed.length === 3 ? timed[1] + timed[2] : null;
      done({
        code,
        ms,
        loadBefore,
        peakMB: peakKB ? +(peakKB / 1024).toFixed(0) : null,
        cpuS,
        stderr: err.slice(-2000),
      });
    });
  });
}
/**
 * The batch's rate beside the bare closed-form loop of the core benchmark (the same equations on plain
 * numbers, one loop = one compound's salts, on one core): compounds per second of each, and their ratio.
 */
function batchOverBaseline(batchPerS) {
  const perLoopMs = summary.results.core?.baseline?.medianMsPerLoop;
  if (!perLoopMs) return { bareLoopOverBatch: null };
  const bare = 1000 / perLoopMs;
  return {
    bareClosedFormLoopCompoundsPerSecond: +bare.toFixed(0),
    bareLoopOverBatch: +(bare / batchPerS).toFixed(0),
  };
}
if (!skip.has('batch')) {
  if (!hasBatch()) {
    summary.skipped.batch = '`saltsmith screen --batch` is not available in this checkout';
  } else {
    summary.results.batch = [];
    let rate = null;
    for (const n of batchSizes) {
      for (const format of ['csv', 'jsonl']) {
        if (rate && n / rate > batchMaxS) {
          summary.results.batch.push({
            compounds: n,
            format,
            notRun: `estimated ${Math.round(n / rate)} s at the previous run's ${rate.toFixed(1)} compounds/s, over --batch-max-s ${batchMaxS}`,
          });
          continue;
        }
        log(`batch of ${n} generated compounds, --top 3, ${format}…`);
        const file = join(work, `compounds-${n}.csv`);
        if (!existsSync(file)) writeFileSync(file, fictionalCompounds(n));
        const out = join(work, `batch-${n}.${format}`);
        const r = await runTimed([
          CLI,
          'screen',
          '--batch',
          file,
          '--top',
          '3',
          '--format',
          format,
          '--out',
          out,
          '--errors',
          join(work, `errors-${n}.txt`),
        ]);
        if (r.code === 0) rate = (n * 1000) / r.ms;
        summary.results.batch.push({
          compounds: n,
          format,
          top: 3,
          jobs: `default (${availableParallelism()} cores)`,
          loadAverage1mBefore: r.loadBefore,
          exitCode: r.code,
          wallMs: +r.ms.toFixed(0),
          compoundsPerSecond: +((n * 1000) / r.ms).toFixed(1),
          peakResidentMB: r.peakMB,
          // CPU time of the whole process (main and screening threads); n ÷ (CPU s ÷ cores) is the rate
          // the cores would give with nothing else running and perfect sharing (an estimate, not measured)
          cpuSeconds: r.cpuS,
          cpuMsPerCompound: r.cpuS === null ? null : +((r.cpuS * 1000) / n).toFixed(2),
          compoundsPerSecondIfCoresWereFree:
            r.cpuS === null ? null : +(n / (r.cpuS / availableParallelism())).toFixed(0),
          ...batchOverBaseline((n * 1000) / r.ms),
          note: 'formula-only fictional compounds against the whole library, --top 3, default settings (no rank-robustness Monte Carlo: a batch runs it only with --iterations), written to a file',
          ...(r.code !== 0 ? { stderrTail: r.stderr } : {}),
        });
      }
    }
  }
} else summary.skipped.batch = 'skipped by --skip';

// ---- browser re-rank and first-screen size ----------------------------------------------------------
if (!skip.has('browser')) {
  log('re-rank in Chromium (builds the app first)…');
  const json = join(work, 'rerank.json');
  const distDir = process.env.SALTSMITH_OUT_DIR ?? join(work, 'dist');
  const r = spawnSync(process.execPath, ['tests/bench/rerank-browser.mjs'], {
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, SALTSMITH_OUT_DIR: distDir, SALTSMITH_BENCH_JSON: json },
  });
  if (r.status === 0 && existsSync(json)) {
    summary.results.rerankBrowser = JSON.parse(readFileSync(json, 'utf8'));
    const m = measureFirstScreen(distDir);
    summary.results.firstScreen = {
      gzipKiB: +(m.gzipBytes / 1024).toFixed(1),
      rawKiB: +(m.rawBytes / 1024).toFixed(1),
      budgetGzipKiB: 250,
    };
  } else {
    summary.skipped.rerankBrowser = `tests/bench/rerank-browser.mjs exited ${r.status} (Chromium missing or the page failed; see its output)`;
  }
} else summary.skipped.rerankBrowser = 'skipped by --skip';

// ---- measure next (value of information) ----------------------------------------------------------
if (!skip.has('measure-next')) {
  log('measure next: core computation for 12 candidates (tsx)…');
  const coreJson = join(work, 'measure-next.json');
  const c = spawnSync(
    process.execPath,
    [
      'node_modules/tsx/dist/cli.mjs',
      '--tsconfig',
      'tsconfig.json',
      'tests/bench/measure-next.bench.ts',
      '--json',
      coreJson,
    ],
    { stdio: ['ignore', 'ignore', 'inherit'] },
  );
  if (c.status === 0 && existsSync(coreJson))
    summary.results.measureNextCore = JSON.parse(readFileSync(coreJson, 'utf8'));
  else summary.skipped.measureNextCore = `tests/bench/measure-next.bench.ts exited ${c.status}`;
  log('measure next in Chromium (table → list)…');
  const json = join(work, 'measure-next-browser.json');
  const distDir = process.env.SALTSMITH_OUT_DIR ?? join(work, 'dist');
  const built = existsSync(join(distDir, 'index.html'));
  const r = spawnSync(process.execPath, ['tests/bench/measure-next-browser.mjs'], {
    stdio: ['ignore', 'ignore', 'inherit'],
    env: {
      ...process.env,
      SALTSMITH_OUT_DIR: distDir,
      SALTSMITH_BENCH_JSON: json,
      ...(built ? { SALTSMITH_SKIP_BUILD: '1' } : {}),
    },
  });
  if (r.status === 0 && existsSync(json))
    summary.results.measureNextBrowser = JSON.parse(readFileSync(json, 'utf8'));
  else
    summary.skipped.measureNextBrowser = `tests/bench/measure-next-browser.mjs exited ${r.status} (Chromium missing, the page failed, or the list came before the table; see its output)`;
} else summary.skipped.measureNext = 'skipped by --skip';

// ---- headline: the figures of issue 20 side by side, beside the bare closed-form loop -------------
summary.headline = headline(summary.results);

summary.machine.loadAverage1mAtEnd = +loadavg()[0].toFixed(2);
summary.finishedAt = new Date().toISOString();

/**
 * One block with each figure's median and p95 (ms), the load it was measured under, and its ratio to
 * the baseline of the same run: the bare closed-form loop (core) for the computations, the bare
 * slider's input → paint (same page) for the re-rank. Null where a part was skipped.
 */
function headline(r) {
  const bare = r.core?.baseline;
  const pick = (x) => (x ? { medianMs: x.medianMs, p95Ms: x.p95Ms } : null);
  const rerank = r.rerankBrowser;
  const mn = r.measureNextBrowser;
  return {
    cores: availableParallelism(),
    bareClosedFormLoop: bare
      ? { medianMsPerLoop: bare.medianMsPerLoop, p95MsPerLoop: bare.p95MsPerLoop }
      : null,
    rerankDrag: rerank
      ? {
          ...pick(rerank.drag.inputToTablePaintedMs),
          overBareSlider: rerank.drag.medianOverBaseline,
          loadAverage1m: rerank.loadAverage1m,
          goal: 'median < 16 ms, p95 < 33 ms',
        }
      : null,
    rerankKeyboardStep: rerank
      ? {
          ...pick(rerank.keyboardStep.inputToTablePaintedMs),
          overBareSlider: rerank.keyboardStep.medianOverBaseline,
          loadAverage1m: rerank.loadAverage1m,
        }
      : null,
    rerankKeyboardStepSettling: rerank?.keyboardStepSettling
      ? {
          ...pick(rerank.keyboardStepSettling.inputToTablePaintedMs),
          overBareSlider: rerank.keyboardStepSettling.medianOverBaseline,
          loadAverage1m: rerank.loadAverage1m,
        }
      : null,
    bareSliderInputToPaint: rerank ? pick(rerank.baselineBareSlider.inputToNextPaintMs) : null,
    measureNextCore12: r.measureNextCore
      ? {
          ...pick(r.measureNextCore.measureNext),
          overBareLoop: bare
            ? +(r.measureNextCore.measureNext.medianMs / bare.medianMsPerLoop).toFixed(0)
            : null,
          loadAverage1m: r.measureNextCore.loadAverage1mAtStart,
        }
      : null,
    measureNextTableToList12: mn
      ? { ...pick(mn.tableToList), loadAverage1m: mn.loadAverage1m, goal: '< 1000 ms' }
      : null,
    firstScreenGzipKiB: r.firstScreen?.gzipKiB ?? null,
  };
}
mkdirSync(dirname(outPath), { recursive: true });
writeFileSync(outPath, JSON.stringify(summary, null, 2) + '\n');
rmSync(work, { recursive: true, force: true });
console.log(JSON.stringify(summary, null, 2));
log(`summary written to ${outPath}`);
