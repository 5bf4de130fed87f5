import { SOLUTION_REFERENCE_SALTS } from '../../data/thermo-reference';
import { getThermoIon } from '../ions';
import { estimateSaltThermo } from '../estimate-salt';
import type { ModelValidation, ValidationRow } from '../thermo.types';
import { SOLUTION_REFERENCE_SOURCE } from './reference';
import {
  hydrationValidation,
  latticeValidation,
  summarise,
  type LatticeVariant,
} from './validation';
import { chargeClassOf } from '../calibration/calibration';
import { solutionCrossValidation } from '../calibration/fit-calibration';

export interface SolutionValidation extends ModelValidation {
  /** Mean |ΔH_sol error|, kJ/mol (percent fields are relative to the reference ΔH_L, as ΔH_sol itself is near zero). */
  meanAbsErrorKJ: number;
  maxAbsErrorKJ: number;
  signedBiasKJ: number;
  /** Root-mean-square ΔH_sol error, kJ/mol. */
  rmsErrorKJ: number;
  /** Fraction of salts with |ΔH_sol error| ≤ 20 kJ/mol. */
  shareWithin20KJ: number;
  /** Fraction of salts whose reference ΔH_sol lies within the stated ±2σ band. */
  coverage2Sigma: number;
  /** Whether the lattice enthalpy was calibrated, and whether each salt was predicted by a fit that never saw it. */
  calibrated: boolean;
  crossValidated: boolean;
}

type SolutionRow = ValidationRow & { errKJ: number; uKJ: number; singly: boolean };

function summariseSolution(
  model: string,
  label: string,
  group: string,
  rows: SolutionRow[],
  calibrated: boolean,
): SolutionValidation {
  const base = summarise(
    model,
    label,
    group,
    rows.map(({ errKJ: _e, uKJ: _u, singly: _s, ...r }) => r),
  );
  const n = rows.length;
  const abs = rows.map((r) => Math.abs(r.errKJ));
  return {
    ...base,
    meanAbsErrorKJ: abs.reduce((a, b) => a + b, 0) / n,
    maxAbsErrorKJ: Math.max(...abs),
    signedBiasKJ: rows.reduce((a, r) => a + r.errKJ, 0) / n,
    rmsErrorKJ: Math.sqrt(rows.reduce((a, r) => a + r.errKJ ** 2, 0) / n),
    shareWithin20KJ: abs.filter((e) => e <= 20).length / n,
    coverage2Sigma: rows.filter((r) => Math.abs(r.errKJ) <= 2 * r.uKJ).length / n,
    calibrated,
    crossValidated: calibrated,
  };
}

/** The whole solution cycle over the NBS reference salts, split also by charge class. */
function solutionSections(
  model: string,
  label: string,
  rows: SolutionRow[],
  calibrated: boolean,
): SolutionValidation[] {
  return [
    summariseSolution(model, label, 'solution', rows, calibrated),
    summariseSolution(
      model,
      `${label}; salts of singly charged ions`,
      'solution-singly-charged',
      rows.filter((r) => r.singly),
      calibrated,
    ),
    summariseSolution(
      model,
      `${label}; salts with an ion of |z| ≥ 2`,
      'solution-multiply-charged',
      rows.filter((r) => !r.singly),
      calibrated,
    ),
  ];
}

let solutionCache: { raw: SolutionValidation[]; calibrated: SolutionValidation[] } | undefined;

function computeSolutionSections(): {
  raw: SolutionValidation[];
  calibrated: SolutionValidation[];
} {
  const cv = solutionCrossValidation();
  const raw: SolutionRow[] = [];
  const cal: SolutionRow[] = [];
  SOLUTION_REFERENCE_SALTS.forEach((s, i) => {
    const r = cv.rows[i]!;
    const singly =
      chargeClassOf(getThermoIon(s.cation)!.charge, getThermoIon(s.anion)!.charge) ===
      'singly-charged';
    const lat = referenceLatticeScale(s);
    const row = (valueKJ: number, uKJ: number): SolutionRow => ({
      id: s.formula,
      label: s.formula,
      group: 'solution',
      referenceKJ: r.referenceKJ,
      estimateKJ: valueKJ,
      errorPercent: ((valueKJ - r.referenceKJ) / lat) * 100,
      source: SOLUTION_REFERENCE_SOURCE,
      errKJ: valueKJ - r.referenceKJ,
      uKJ,
      singly,
    });
    raw.push(row(r.raw.valueKJ, r.raw.uncertaintyKJ));
    cal.push(row(r.calibrated.valueKJ, r.calibrated.uncertaintyKJ));
  });
  return {
    raw: solutionSections(
      'solution-hess',
      'ΔH_sol = ΔH_L(auto, uncalibrated) + Σν·ΔH_hyd (published); % of ΔH_L',
      raw,
      false,
    ),
    calibrated: solutionSections(
      'solution-hess-calibrated',
      'ΔH_sol = ΔH_L(auto, calibrated, refitted without the salt) + Σν·ΔH_hyd (published), leave-one-salt-out; % of ΔH_L',
      cal,
      true,
    ),
  };
}

/** The uncalibrated lattice enthalpy of a reference salt, the scale for the percent errors of ΔH_sol. */
function referenceLatticeScale(s: (typeof SOLUTION_REFERENCE_SALTS)[number]): number {
  return estimateSaltThermo({
    cation: getThermoIon(s.cation)!,
    anion: getThermoIon(s.anion)!,
    cationsPerFormula: s.p,
    anionsPerFormula: s.q,
    calibrate: false,
  }).latticeEnthalpyKJ.value;
}

/**
 * Every ΔH_sol section: the uncalibrated engine (auto method, bundled ions only, 'solution-hess')
 * against ΔH_sol from the NBS tables (Wagman et al. 1982), and the calibrated engine against the same
 * values leave-one-salt-out ('solution-hess-calibrated': each salt predicted with a lattice
 * calibration refitted without it, calibration/fit-calibration.ts), all salts and per charge class.
 */
export function solutionValidationSections(): SolutionValidation[] {
  solutionCache ??= computeSolutionSections();
  return [...solutionCache.raw, ...solutionCache.calibrated];
}

/** The four Kapustinskii radius/constant pairings on the halides (and polyatomic salts), for the cited choice. */
export function kapustinskiiVariants(): ModelValidation[] {
  const v = latticeValidation();
  const names: LatticeVariant[] = [
    'kapustinskii-goldschmidt',
    'kapustinskii-goldschmidt-1202',
    'kapustinskii-shannon',
    'kapustinskii-shannon-1202',
  ];
  return names.flatMap((n) =>
    ['halides', 'polyatomic'].map((g) => v.get(`${n}/${g}`)!).filter(Boolean),
  );
}

/**
 * Every model against the bundled published reference data: lattice models per group (alkali halides,
 * alkaline-earth halides, both, salts of polyatomic ions, all), the fitted Born hydration model (fit set per
 * sign, organic check set), and the full ΔH_sol pipeline — uncalibrated ('solution-hess') and calibrated,
 * leave-one-salt-out ('solution-hess-calibrated'), each for all salts ('solution') and per charge class
 * ('solution-singly-charged', 'solution-multiply-charged'). Used by the tests (which bound it) and the UI.
 */
export function validationReport(): ModelValidation[] {
  const lattice = [...latticeValidation().values()];
  return [...lattice, ...hydrationValidation(), ...solutionValidationSections()];
}
