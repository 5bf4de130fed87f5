import { SOLUTION_REFERENCE_SALTS } from '../../data/thermo-reference';
import { getThermoIon } from '../ions';
import { estimateSaltThermo } from '../estimate-salt';
import type { ModelValidation, ValidationRow } from '../thermo.types';
import { referenceSolutionEnthalpyKJ, SOLUTION_REFERENCE_SOURCE } from './reference';
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
