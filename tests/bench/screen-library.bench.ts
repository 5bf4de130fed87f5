/**
 * Benchmark (not part of `npm test`): how long a full screen of the bundled library takes, and how
 * long the cheap re-rank and the rank-robustness Monte Carlo take for 60 candidates.
 *
 *   npx tsx tests/bench/screen-library.bench.ts
 *
 * Uses the fictional demo compound "Demorazine" (invented numbers, demo scenario only) as input;
 * it measures time, not chemistry.
 */
import {
  candidatesFromLibrary,
  COUNTER_IONS,
  parseScreeningSettings,
  drugIon,
  rankCandidates,
  rankRobustness,
  screenCompound,
  type ScreenRow,
} from '@/chem';
import { DEMO_COMPOUND } from '@/persistence/demo-project';

function time<T>(label: string, runs: number, f: () => T): T {
  let out: T = f(); // warm-up
  const ms: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    out = f();
    ms.push(performance.now() - t0);
  }
  ms.sort((a, b) => a - b);
  const med = ms[Math.floor(ms.length / 2)]!;
  console.log(
    `${label.padEnd(58)} median ${med.toFixed(2)} ms  (min ${ms[0]!.toFixed(2)}, max ${ms.at(-1)!.toFixed(2)}, n=${runs})`,
  );
  return out;
}

const di = drugIon(DEMO_COMPOUND);
const thermo = { formula: di.formula, charge: di.charge, rings: { aromatic: 2, nonAromatic: 1 } };
const cands = time('library candidates incl. thermochemistry ΔH_sol', 10, () =>
  candidatesFromLibrary(COUNTER_IONS, { kind: 'base', ionCharge: 1, thermo }),
);
console.log(`  ${cands.length} candidate salts from ${COUNTER_IONS.length} library ions`);
const res = time('screenCompound, whole library (profiles pH 1–8, D₀, media)', 10, () =>
  screenCompound({ compound: DEMO_COMPOUND, drugIon: di, candidates: cands }),
);

// 60 candidates: the library's rows plus copies with hydrate water to reach 60.
const rows60: ScreenRow[] = [];
for (let i = 0; rows60.length < 60; i++) {
  const r = res.rows[i % res.rows.length]!;
  rows60.push({ ...r, id: `${r.id}#${i}`, robustness: { ...r.robustness, id: `${r.id}#${i}` } });
}
const w = parseScreeningSettings({}).weights;
time('rankCandidates, 60 candidates (one weight-slider move)', 200, () =>
  rankCandidates(rows60, { ...w, massCost: Math.random() }),
);
time('rankRobustness, 60 candidates × 1000 iterations', 10, () =>
  rankRobustness(
    rows60.map((r) => r.robustness),
    w,
    res.robustnessShared,
    { iterations: 1000, seed: 1 },
  ),
);
