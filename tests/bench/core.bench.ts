/**
 * Benchmark (not part of `npm test`): the core's models per salt, a full screen of one compound
 * against the bundled library (Monte Carlo excluded), and — in the same process, on the same number of
 * salts — a baseline of the bare closed-form equations in a plain loop, so the screen's cost can be
 * stated as a ratio that travels between machines better than milliseconds do.
 *
 *   npx tsx --tsconfig tsconfig.json tests/bench/core.bench.ts [--json out.json]
 *
 * Run by tests/bench/run-all.mjs (`npm run bench`). Input: the fictional demo compound (invented
 * numbers, a workload here, never an expected value) given by formula, so no structure parser is timed.
 */
import { writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import {
  bornEnthalpyFactor,
  candidatesFromLibrary,
  COULOMB_KJ_A_PER_MOL,
  COUNTER_IONS,
  doseNumber,
  drugIon,
  estimateSaltThermo,
  getThermoIon,
  hydrationEnthalpyKJ,
  ICH_M9_VOLUME_ML,
  KAPUSTINSKII_K_KJ_A_PER_MOL,
  KAPUSTINSKII_RHO_A,
  LATTICE_REFERENCE_SALTS,
  saltLimitedBaseSolubilityM,
  screenCompound,
  type ThermoIon,
} from '@/chem';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { rawLattice } from '@/chem/thermo/lattice';

export interface Stat {
  runs: number;
  medianMs: number;
  p95Ms: number;
  minMs: number;
  /** CPU time of this process per call (user + system): less moved by other load than wall time. */
  cpuMedianMs: number;
}

const quantile = (sorted: number[], f: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor(f * sorted.length))]!;

/** Time `f` `runs` times after `warm` warm-up calls; milliseconds per call. */
export function timeIt(runs: number, f: () => unknown, warm = 3): Stat {
  let sink = 0;
  for (let i = 0; i < warm; i++) sink += f() ? 1 : 0;
  const ms: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    sink += f() ? 1 : 0;
    ms.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  ms.sort((a, b) => a - b);
  cpu.sort((a, b) => a - b);
  if (sink < 0) console.log(sink); // keeps the calls observable
  const r = (x: number) => Number(x.toFixed(4));
  return {
    runs,
    medianMs: r(quantile(ms, 0.5)),
    p95Ms: r(quantile(ms, 0.95)),
    minMs: r(ms[0]!),
    cpuMedianMs: r(quantile(cpu, 0.5)),
  };
}

/** Per-salt figures: one timed run is a loop over all salts; reported per salt in microseconds. */
function perSalt(label: string, salts: number, runs: number, loop: () => unknown) {
  const s = timeIt(runs, loop);
  const us = (ms: number) => Number(((ms * 1000) / salts).toFixed(2));
  return { label, salts, runs, medianUsPerSalt: us(s.medianMs), p95UsPerSalt: us(s.p95Ms) };
}

// ---- core models per salt -------------------------------------------------------------------------
const pairs = LATTICE_REFERENCE_SALTS.map((s) => ({
  s,
  cation: getThermoIon(s.cation),
  anion: getThermoIon(s.anion),
})).filter(
  (x): x is { s: (typeof LATTICE_REFERENCE_SALTS)[number]; cation: ThermoIon; anion: ThermoIon } =>
    !!x.cation && !!x.anion,
);
const withRadii = pairs.filter((x) => x.cation.radiusA && x.anion.radiusA);
const models = [
  perSalt('estimateSaltThermo (auto method, calibrated, Hess cycle)', pairs.length, 50, () =>
    pairs.map((x) =>
      estimateSaltThermo({
        cation: x.cation,
        anion: x.anion,
        cationsPerFormula: x.s.p,
        anionsPerFormula: x.s.q,
      }),
    ),
  ),
  perSalt(
    'rawLattice kapustinskii (the request checked once, then the model)',
    withRadii.length,
    200,
    () =>
      withRadii.map((x) =>
        rawLattice(
          {
            cation: x.cation,
            anion: x.anion,
            cationsPerFormula: x.s.p,
            anionsPerFormula: x.s.q,
          },
          'kapustinskii',
        ),
      ),
  ),
  perSalt('hydrationEnthalpyKJ (cation + anion)', pairs.length, 200, () =>
    pairs.map((x) => hydrationEnthalpyKJ(x.cation).value + hydrationEnthalpyKJ(x.anion).value),
  ),
];

// ---- full screen of one compound against the library ----------------------------------------------
const di = drugIon(DEMO_COMPOUND);
const thermo = { formula: di.formula, charge: di.charge, rings: { aromatic: 2, nonAromatic: 1 } };
const library = () => candidatesFromLibrary(COUNTER_IONS, { kind: 'base', ionCharge: 1, thermo });
const cands = library();
const screenOnly = () =>
  screenCompound({ compound: DEMO_COMPOUND, drugIon: di, candidates: cands });
const full = () =>
  screenCompound({
    compound: DEMO_COMPOUND,
    drugIon: drugIon(DEMO_COMPOUND),
    candidates: library(),
  });
const screened = screenOnly().rows.length;
const fullScreen = {
  compound: 'fictional demo compound (formula only)',
  candidates: cands.length,
  rows: screened,
  candidatesWithThermo: timeIt(20, library),
  screenCompound: timeIt(20, screenOnly),
  total: timeIt(20, full),
  note: 'total = candidatesFromLibrary (with ΔH_sol) + screenCompound; rank-robustness Monte Carlo excluded',
};

// ---- baseline: the bare closed-form equations in a plain loop, same number of salts ---------------
// Kapustinskii lattice energy, Born hydration of both ions, pH_max = pKa + log10(S0/√Ksp) and the
// dose number, on plain numbers. The inputs are a generated workload (sizes 1–3 Å and 3–6 Å, pKa 6–9,
// log K_sp −8…−2); only the arithmetic is being timed. Constants are the core's own.
const n = cands.length;
const rc = new Float64Array(n);
const ra = new Float64Array(n);
const pKa = new Float64Array(n);
const ksp = new Float64Array(n);
for (let i = 0; i < n; i++) {
  rc[i] = 3 + ((i * 37) % 30) / 10;
  ra[i] = 1 + ((i * 53) % 20) / 10;
  pKa[i] = 6 + ((i * 11) % 30) / 10;
  ksp[i] = 10 ** (-8 + ((i * 7) % 60) / 10);
}
const born = (COULOMB_KJ_A_PER_MOL / 2) * bornEnthalpyFactor(); // kJ·Å/mol for z = 1, as the core's Born term
const s0M = 1e-4;
const doseMg = 100;
const molarMass = 300;
function baselineLoop(): number {
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const d = rc[i]! + ra[i]!;
    const latticeKJ = ((KAPUSTINSKII_K_KJ_A_PER_MOL * 2) / d) * (1 - KAPUSTINSKII_RHO_A / d);
    const hydKJ = -born / rc[i]! - born / ra[i]!;
    const phMax = pKa[i]! + Math.log10(s0M / Math.sqrt(ksp[i]!));
    const sMgPerMl = Math.sqrt(ksp[i]!) * molarMass;
    const d0 = doseMg / ICH_M9_VOLUME_ML / sMgPerMl;
    sum += latticeKJ + hydKJ + phMax + d0;
  }
  return sum;
}
// Many loops per timed run, so one run is long enough for the clock.
const REPS = 200;
const baselineStat = timeIt(200, () => {
  let s = 0;
  for (let k = 0; k < REPS; k++) s += baselineLoop();
  return s;
});
const baseline = {
  salts: n,
  equations:
    'Kapustinskii U_L, Born ΔH_hyd (cation + anion), pH_max = pKa + log10(S0/√Ksp), D0 = dose/250 mL/S',
  medianMsPerLoop: Number((baselineStat.medianMs / REPS).toFixed(6)),
  p95MsPerLoop: Number((baselineStat.p95Ms / REPS).toFixed(6)),
};
// The same arithmetic through the core's exported closed-form functions, for the cost of their checks.
const coreClosedForm = timeIt(200, () => {
  let s = 0;
  for (let i = 0; i < n; i++) {
    s +=
      saltLimitedBaseSolubilityM(ksp[i]!, pKa[i]!, 5) +
      doseNumber(doseMg, Math.sqrt(ksp[i]!) * molarMass);
  }
  return s;
});

const result = {
  node: process.version,
  cores: availableParallelism(),
  models,
  fullScreen,
  baseline,
  coreClosedFormLoop: {
    salts: n,
    ...coreClosedForm,
    note: 'saltLimitedBaseSolubilityM + doseNumber over the same salts',
  },
  screenOverBaseline: Number((fullScreen.total.medianMs / baseline.medianMsPerLoop).toFixed(0)),
  screenOverBaselineNote:
    'median full screen ÷ median bare closed-form loop over the same number of salts',
  runNote:
    'run through tsx, whose esbuild transform keeps function names (a __name() call per closure created): ' +
    'closure-heavy code such as the salt-equilibrium solver measures ~30 % slower here than in the compiled CLI',
};

const jsonAt = process.argv.indexOf('--json');
if (jsonAt > 0 && process.argv[jsonAt + 1])
  writeFileSync(process.argv[jsonAt + 1]!, JSON.stringify(result, null, 2));
console.log(JSON.stringify(result, null, 2));
