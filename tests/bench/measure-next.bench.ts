/**
 * Benchmark (not part of `npm test`): the "Measure next" computation alone (core measureNext, what
 * the worker runs) for a shortlist of 12, in one Node process, beside rankRobustness on the same rows.
 * The browser figure — table on screen → list on screen, worker start included — is
 * tests/bench/measure-next-browser.mjs.
 *
 *   npx tsx --tsconfig tsconfig.json tests/bench/measure-next.bench.ts [--json out.json]
 *
 * Input: the fictional demo compound (invented numbers, a workload here) given by formula against 12
 * library counter-ions, 1000 kept draws × 12 outcome strata (the app's setting), seed 20261201.
 */
import { writeFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import {
  candidatesFromLibrary,
  parseScreeningSettings,
  drugIon,
  getCounterIon,
  measureNext,
  measureNextStatusOf,
  rankRobustness,
  screenCompound,
} from '@/chem';
import { DEMO_COMPOUND } from '@/persistence/demo-project';

const IONS = [
  'chloride',
  'bromide',
  'sulfate',
  'phosphate',
  'mesylate',
  'esylate',
  'besylate',
  'tosylate',
  'napsylate',
  'maleate',
  'fumarate',
  'citrate',
];
const RUNS = 15;
const WARM = 2;

const q = (s: number[], f: number) => s[Math.min(s.length - 1, Math.floor(f * s.length))]!;
function time(f: () => unknown) {
  const ms: number[] = [];
  for (let i = 0; i < RUNS + WARM; i++) {
    const t0 = performance.now();
    f();
    if (i >= WARM) ms.push(performance.now() - t0);
  }
  ms.sort((a, b) => a - b);
  const r = (x: number) => +x.toFixed(1);
  return {
    runs: RUNS,
    medianMs: r(q(ms, 0.5)),
    p95Ms: r(q(ms, 0.95)),
    minMs: r(ms[0]!),
    maxMs: r(ms.at(-1)!),
  };
}

const di = drugIon(DEMO_COMPOUND);
const candidates = candidatesFromLibrary(
  IONS.map((id) => getCounterIon(id)!),
  { kind: 'base', ionCharge: 1 },
  { firstStoichiometryOnly: true },
);
const res = screenCompound({ compound: DEMO_COMPOUND, drugIon: di, candidates, profiles: 'none' });
const rows = res.rows.map((r) => r.robustness);
const status = res.rows.map(measureNextStatusOf);
const weights = parseScreeningSettings({}).weights;
const opts = { iterations: 1000, outcomes: 12, seed: 20261201 };
let last = measureNext(rows, status, weights, res.robustnessShared, opts);
const result = {
  shortlist: rows.filter((r) => !r.error).length,
  setting: '1000 draws × 12 outcomes, seed 20261201, one thread (as in the worker)',
  cores: availableParallelism(),
  loadAverage1mAtStart: +loadavg()[0]!.toFixed(2),
  measureNext: time(() => (last = measureNext(rows, status, weights, res.robustnessShared, opts))),
  rankRobustness2000: time(() =>
    rankRobustness(rows, weights, res.robustnessShared, { iterations: 2000, seed: 1 }),
  ),
  measurementsValued: last.items.filter((x) => x.gain > 0).length,
  top: last.items.slice(0, 3).map((x) => ({
    id: x.id,
    measurement: x.measurement,
    value: +x.value.toFixed(3),
    share: +x.share.toFixed(2),
  })),
  loadAverage1mAtEnd: +loadavg()[0]!.toFixed(2),
};
console.log(JSON.stringify(result, null, 2));
const jsonAt = process.argv.indexOf('--json');
if (jsonAt > 0 && process.argv[jsonAt + 1])
  writeFileSync(process.argv[jsonAt + 1]!, JSON.stringify(result, null, 2));
