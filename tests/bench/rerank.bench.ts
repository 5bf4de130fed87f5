/**
 * Benchmark (not part of `npm test`): how long the Ranking area's re-weighting takes for 60
 * candidates — the work done on every movement of a weight slider (rankCandidates + the table's
 * display rows + sorting) — against the one-off screen that computes the physics.
 *
 *   npx tsx --tsconfig tsconfig.json tests/bench/rerank.bench.ts
 *
 * Input: the fictional demo compound (invented numbers, used here only as a workload) and 60
 * candidates built from the bundled counter-ion library (anions, each with hydrate variants until
 * 60 are reached).
 */
import { COUNTER_IONS, rankCandidates, screeningWeightsSchema, CRITERIA } from '@/chem';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { displayRows, sortRows } from '@/features/ranking/ranking-rows';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import {
  projectSettingsSchema,
  type CandidateRecord,
  type ProjectRecord,
} from '@/persistence/records';

const N = 60;
const anions = COUNTER_IONS.filter((i) => i.kind === 'anion');
const candidates: CandidateRecord[] = [];
for (let k = 0; candidates.length < N; k++) {
  for (const ion of anions) {
    if (candidates.length >= N) break;
    const st = ion.stoichiometries[0]!;
    candidates.push({
      id: `c${candidates.length}`,
      schemaVersion: 1,
      projectId: 'bench',
      ionId: ion.id,
      drugPerSalt: Math.abs(st.ionCharge) === 2 ? 2 : Math.abs(st.ionCharge) === 3 ? 3 : 1,
      counterIonPerSalt: 1,
      hydrateWater: k,
      addedAt: '2026-12-01T00:00:00.000Z',
      order: candidates.length,
    });
  }
}
const project: ProjectRecord = {
  id: 'bench',
  schemaVersion: 1,
  name: 'benchmark',
  createdAt: '',
  updatedAt: '',
  archived: false,
  isDemo: true,
  compound: { ...DEMO_COMPOUND, smiles: '' }, // formula only: no structure parser in the timing
  settings: projectSettingsSchema.parse({}),
};

const t0 = performance.now();
const data = await computeProjectScreening({
  project,
  candidates,
  measurements: [],
  customIons: [],
});
const screenMs = performance.now() - t0;
const ok = data.screen.rows.filter((r) => !r.error).length;

// One slider movement: new weights → rank → display rows → sort.
const base = screeningWeightsSchema.parse({});
const times: number[] = [];
let checksum = 0;
for (let i = 0; i < 2000; i++) {
  const k = CRITERIA[i % CRITERIA.length]!;
  const w = { ...base, [k]: (i % 30) / 10 };
  const s = performance.now();
  const ranked = rankCandidates(data.screen.rows, w);
  const rows = sortRows(displayRows(data, ranked), 'rank', 'asc');
  times.push(performance.now() - s);
  checksum += rows.length;
}
times.sort((a, b) => a - b);
const q = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))]!;
console.log(
  JSON.stringify(
    {
      candidates: candidates.length,
      screened: ok,
      screenOnceMs: Number(screenMs.toFixed(1)),
      rerank: {
        iterations: times.length,
        medianMs: Number(q(0.5).toFixed(3)),
        p95Ms: Number(q(0.95).toFixed(3)),
        maxMs: Number(q(1 - 1e-9).toFixed(3)),
      },
      frameBudgetMs: 16.7,
      checksum,
      node: process.version,
    },
    null,
    2,
  ),
);
