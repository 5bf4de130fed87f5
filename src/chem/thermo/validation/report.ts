import { SOLUTION_REFERENCE_SALTS } from '../../data/thermo-reference';
import { getThermoIon } from '../ions';
import { estimateSaltThermo } from '../estimate-salt';
import type { ModelValidation, ValidationRow } from '../thermo.types';
import { referenceSolutionEnthalpyKJ, SOLUTION_REFERENCE_SOURCE } from './reference';
import { relativeSolutionEnthalpyKJ } from '../models/solution/relative';
import { hydrationValidation, latticeValidation, summarise, type LatticeVariant } from './validation';

export interface SolutionValidation extends ModelValidation {
  /** Mean |ΔH_sol error|, kJ/mol (percent fields are relative to the reference ΔH_L, as ΔH_sol itself is near zero). */
  meanAbsErrorKJ: number;
  maxAbsErrorKJ: number;
  signedBiasKJ: number;
  /** Fraction of salts whose reference ΔH_sol lies within the stated ±2σ band. */
  coverage2Sigma: number;
}

let solutionCache: SolutionValidation | undefined;

/** The whole engine (auto method, bundled ions only) against ΔH_sol from the NBS tables. */
export function solutionValidation(): SolutionValidation {
  if (solutionCache) return solutionCache;
  let covered = 0;
  const rows: (ValidationRow & { errKJ: number })[] = SOLUTION_REFERENCE_SALTS.map((s) => {
    const r = estimateSaltThermo({ cation: getThermoIon(s.cation)!, anion: getThermoIon(s.anion)!, cationsPerFormula: s.p, anionsPerFormula: s.q });
    const ref = referenceSolutionEnthalpyKJ(s);
    const err = r.solutionEnthalpyKJ.value - ref;
    if (Math.abs(err) <= 2 * r.solutionEnthalpyKJ.uncertainty) covered++;
    return {
      id: s.formula, label: s.formula, group: 'solution', referenceKJ: ref, estimateKJ: r.solutionEnthalpyKJ.value,
      errorPercent: (err / r.latticeEnthalpyKJ.value) * 100, source: SOLUTION_REFERENCE_SOURCE, errKJ: err,
    };
  });
  const base = summarise('solution-hess', 'ΔH_sol = ΔH_L(auto) + Σν·ΔH_hyd (published); % of ΔH_L', 'solution', rows.map(({ errKJ: _e, ...r }) => r));
  const abs = rows.map((r) => Math.abs(r.errKJ));
  solutionCache = {
    ...base,
    meanAbsErrorKJ: abs.reduce((a, b) => a + b, 0) / rows.length,
    maxAbsErrorKJ: Math.max(...abs),
    signedBiasKJ: rows.reduce((a, r) => a + r.errKJ, 0) / rows.length,
    coverage2Sigma: covered / rows.length,
  };
  return solutionCache;
}

let pairCache: { factor: number; pairs: number } | undefined;

/**
 * Measured pair factor for {@link relativeSolutionEnthalpyKJ}: over all pairs of NBS reference salts that
 * share their cation (the stand-in for a drug ion), the RMS of the error of the per-cation ΔH_sol difference
 * divided by the RMS of its quadrature uncertainty (shared-ion hydration removed). Below 1 means errors
 * partly cancel between counter-ions of one ion.
 */
export function relativePairFactor(): { factor: number; pairs: number } {
  if (pairCache) return pairCache;
  const rows = SOLUTION_REFERENCE_SALTS.map((s) => {
    const result = estimateSaltThermo({ cation: getThermoIon(s.cation)!, anion: getThermoIon(s.anion)!, cationsPerFormula: s.p, anionsPerFormula: s.q });
    return { s, result, ref: referenceSolutionEnthalpyKJ(s) / s.p };
  });
  let sumErr2 = 0;
  let sumU2 = 0;
  let pairs = 0;
  for (let i = 0; i < rows.length; i++) {
    for (let j = i + 1; j < rows.length; j++) {
      const a = rows[i]!;
      const b = rows[j]!;
      if (a.s.cation !== b.s.cation) continue;
      const d = relativeSolutionEnthalpyKJ({ result: a.result, drugPerFormula: a.s.p, counterPerFormula: a.s.q, drugIs: 'cation' }, { result: b.result, drugPerFormula: b.s.p, counterPerFormula: b.s.q, drugIs: 'cation' }, 1);
      sumErr2 += (d.value - (a.ref - b.ref)) ** 2;
      sumU2 += d.uncertainty ** 2;
      pairs++;
    }
  }
  pairCache = { factor: Math.sqrt(sumErr2 / sumU2), pairs };
  return pairCache;
}

/** The four Kapustinskii radius/constant pairings on the halides (and polyatomic salts), for the cited choice. */
export function kapustinskiiVariants(): ModelValidation[] {
  const v = latticeValidation();
  const names: LatticeVariant[] = ['kapustinskii-goldschmidt', 'kapustinskii-goldschmidt-1202', 'kapustinskii-shannon', 'kapustinskii-shannon-1202'];
  return names.flatMap((n) => ['halides', 'polyatomic'].map((g) => v.get(`${n}/${g}`)!).filter(Boolean));
}

/**
 * Every model against the bundled published reference data: lattice models per group (alkali halides,
 * alkaline-earth halides, both, salts of polyatomic ions, all), the fitted Born hydration model (fit set per
 * sign, organic check set), and the full ΔH_sol pipeline. Used by the tests (which bound it) and the UI.
 */
export function validationReport(): ModelValidation[] {
  const lattice = [...latticeValidation().values()];
  return [...lattice, ...hydrationValidation(), solutionValidation()];
}
