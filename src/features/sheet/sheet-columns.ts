import {
  monteCarloProportionSigma,
  roundScore,
  SALT_WATER_ORIGIN_LABELS,
  type Estimate,
  type ScreenRow,
} from '@/chem';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { uncertaintiesOf } from '@/screening-data/uncertainty';
import type { SheetCell, SheetColumn, ValueOrigin } from './sheet.types';

/** The ranked table's columns, in the order of the sheet and the CSV. */
export const SHEET_COLUMNS: readonly SheetColumn[] = [
  {
    key: 'score',
    label: 'Score',
    unit: '0–1',
    kind: 'number',
    hint: 'weighted mean of the criterion scores (ranking weights above)',
    group: 'formation',
  },
  {
    key: 'pTop3',
    label: 'P(top 3)',
    unit: '%',
    kind: 'number',
    hint: 'share of Monte Carlo draws in which the candidate ranks in the top three',
    group: 'formation',
  },
  {
    key: 'deltaPka',
    label: 'ΔpKa',
    unit: null,
    kind: 'number',
    hint: 'pKa(protonated base) − pKa(acid)',
    group: 'formation',
  },
  {
    key: 'saltFormation',
    label: 'Salt formation',
    unit: null,
    kind: 'text',
    hint: 'the ΔpKa band: salt above the salt band, cocrystal below the cocrystal band, uncertain between (Cruz-Cabeza 2012), as the Ranking and the command line word it',
    group: 'formation',
  },
  {
    key: 'activeFraction',
    label: 'Active fraction',
    unit: '%',
    kind: 'number',
    hint: 'drug mass / salt mass',
    group: 'formation',
  },
  {
    key: 'saltMassPerDose',
    label: 'Salt per dose',
    unit: 'mg',
    kind: 'number',
    group: 'formation',
  },
  {
    key: 'saltWaterMgPerMl',
    label: 'Salt in water',
    unit: 'mg/mL as salt',
    kind: 'number',
    hint: "the salt's own solubility in pure water (±1σ in the log₁₀ column)",
    group: 'solubility',
    range: true,
  },
  {
    key: 'saltWaterFreeFormMgPerMl',
    label: 'Salt in water, as free form',
    unit: 'mg/mL free form',
    kind: 'number',
    group: 'solubility',
    range: true,
  },
  {
    key: 'saltWaterLog10M',
    label: 'log₁₀ S(salt, water)',
    unit: 'mol/L of drug',
    kind: 'number',
    hint: '±1σ: the model’s leave-one-drug-out error, or the measurement’s',
    group: 'solubility',
  },
  {
    key: 'saltWaterOrigin',
    label: 'Salt solubility from',
    unit: null,
    kind: 'text',
    hint: 'model, model + fusion data (your DSC), measured, or the anchor on S₀ (each basis in words: see the notes)',
    group: 'solubility',
  },
  {
    key: 'log10Ksp',
    label: 'log₁₀ K_sp',
    unit: 'K_sp in (mol/L)^ν',
    kind: 'number',
    group: 'solubility',
  },
  { key: 'phMax', label: 'pH_max', unit: null, kind: 'number', group: 'solubility' },
  {
    key: 'worstDoseNumber',
    label: 'Worst D₀ in pH 1.2–6.8',
    unit: null,
    kind: 'number',
    hint: 'ICH M9 dose number at the least favourable pH',
    group: 'solubility',
    range: true,
  },
  { key: 'worstPh', label: 'at pH', unit: null, kind: 'number', group: 'solubility' },
  {
    key: 'gastricDoseNumber',
    label: 'Gastric D₀',
    unit: null,
    kind: 'number',
    hint: 'dose number in the gastric medium with its chloride',
    group: 'solubility',
    range: true,
  },
  {
    key: 'solubilityClass',
    label: 'ICH M9 solubility',
    unit: null,
    kind: 'text',
    group: 'solubility',
  },
  {
    key: 'phMaxMargin',
    label: 'pH_max − microenvironment pH',
    unit: 'pH units',
    kind: 'number',
    group: 'solubility',
  },
  {
    key: 'latticeEnthalpy',
    label: 'ΔH_L',
    unit: 'kJ/mol per formula unit',
    kind: 'number',
    hint: 'lattice dissociation enthalpy, > 0',
    group: 'energetics',
  },
  {
    key: 'solutionEnthalpy',
    label: 'ΔH_sol',
    unit: 'kJ/mol per drug ion',
    kind: 'number',
    hint: 'enthalpy of solution per mole of drug ion (formula unit ÷ drug ions), estimate or calorimetric; "not informative" when its 1σ exceeds it or an estimate lies outside ±70 kJ/mol (a threefold solubility change from 25 to 37 °C)',
    group: 'energetics',
  },
  {
    key: 'hygroscopicity',
    label: 'Moisture uptake',
    unit: null,
    kind: 'text',
    hint: 'Ph. Eur. 5.11 class from a measured mass gain',
    group: 'formation',
  },
];
const num = (
  value: number | null | undefined,
  origin: ValueOrigin | null,
  uncertainty?: number | null,
): SheetCell =>
  value === null || value === undefined || !Number.isFinite(value)
    ? { value: null }
    : {
        value,
        origin,
        uncertainty: uncertainty != null && Number.isFinite(uncertainty) ? uncertainty : null,
      };
const est = (e: Estimate | null | undefined, origin: ValueOrigin = 'estimated'): SheetCell =>
  e ? num(e.value, origin, e.uncertainty) : { value: null };
/** A cell with the ±1σ range of a log-normal quantity (value ÷ 10^σ to value × 10^σ). */
const ranged = (cell: SheetCell, log10Sigma: number | undefined): SheetCell =>
  typeof cell.value === 'number' && log10Sigma !== undefined && log10Sigma > 0
    ? { ...cell, range: [cell.value / 10 ** log10Sigma, cell.value * 10 ** log10Sigma] }
    : cell;
/** One screened candidate's cells, keyed by the `SHEET_COLUMNS` keys, each with its origin and 1σ. */
export function rowCells(
  row: ScreenRow,
  score: number | null,
  screening: ProjectScreening,
  pTop3: { p: number; draws: number } | null,
): Record<string, SheetCell> {
  const kspOrigin: ValueOrigin | null = row.kspOrigin ?? null;
  const thermo = screening.energetics[row.id]?.thermo ?? null;
  const dh = row.solutionEnthalpyPerDrugIon;
  const sw = row.saltWaterSolubility;
  const u = uncertaintiesOf(row, screening.screen.robustnessShared);
  // The same ±1σ ranges the Ranking shows: the limiting solid's log σ (salt or free form).
  const logSigmaOf = (solid: string | undefined) =>
    solid === 'salt' ? u.saltLogSigma : solid ? u.freeLogSigma : undefined;
  // A dose number's mark follows the solid that limits it: the salt's K_sp, or the free form's S₀.
  const freeOrigin: ValueOrigin =
    screening.screen.freeForm.intrinsicOrigin === 'measured' ? 'input' : 'estimated';
  const originOf = (solid: string | undefined) => (solid === 'salt' ? kspOrigin : freeOrigin);
  const swOrigin: ValueOrigin | null = sw
    ? sw.origin === 'measured'
      ? 'measured'
      : 'estimated'
    : null;
  return {
    score: num(score === null ? null : roundScore(score), null),
    // With its Monte Carlo 1σ, so it is printed to the digits its draws support (37.3 ± 1.1, not a bare 37.25).
    pTop3: pTop3
      ? num(pTop3.p * 100, 'estimated', 100 * monteCarloProportionSigma(pTop3.p, pTop3.draws))
      : { value: null },
    // ΔpKa to the precision of the drug's pKa σ, as the command line writes it.
    deltaPka: num(row.deltaPka, 'input', screening.screen.robustnessShared.drugPkaSigma),
    saltFormation: { value: row.saltFormation?.band ?? null },
    activeFraction: num(row.activeFraction * 100, 'input'),
    saltMassPerDose: num(row.saltMassPerDoseMg, 'input'),
    saltWaterMgPerMl: ranged(num(sw?.mgPerMlAsSalt ?? null, swOrigin), sw?.log10DrugM.uncertainty),
    saltWaterFreeFormMgPerMl: ranged(
      num(sw?.mgPerMlAsFreeForm ?? null, swOrigin),
      sw?.log10DrugM.uncertainty,
    ),
    saltWaterLog10M: sw ? est(sw.log10DrugM, swOrigin ?? 'estimated') : { value: null },
    saltWaterOrigin: { value: sw ? SALT_WATER_ORIGIN_LABELS[sw.origin] : null },
    log10Ksp: est(row.log10Ksp, kspOrigin ?? 'estimated'),
    // The same 1σ the Ranking area shows (linearised as the rank-robustness draw perturbs pH_max).
    phMax: num(row.phMax, kspOrigin, u.phMaxSigma),
    worstDoseNumber: ranged(
      num(row.worst?.doseNumber ?? null, originOf(row.worst?.solid)),
      logSigmaOf(row.worst?.solid),
    ),
    worstPh: num(row.worst?.pH ?? null, null),
    gastricDoseNumber: ranged(
      num(row.gastric?.doseNumber ?? null, originOf(row.gastric?.solid)),
      logSigmaOf(row.gastric?.solid),
    ),
    solubilityClass: { value: row.solubilityClass },
    phMaxMargin: num(row.disproportionation?.marginPh ?? null, kspOrigin),
    latticeEnthalpy: est(thermo?.latticeEnthalpyKJ),
    solutionEnthalpy: !dh
      ? { value: null }
      : dh.notInformative
        ? { value: 'not informative', origin: dh.origin }
        : num(dh.valueKJPerMolDrugIon, dh.origin, dh.sigmaKJPerMolDrugIon),
    hygroscopicity: {
      value: row.measured?.hygroscopicity ?? null,
      origin: row.measured?.hygroscopicity ? 'measured' : null,
    },
  };
}

/**
 * The free form's cells in the same columns, read against the salts (not ranked): S₀ in the
 * salt-in-water columns, its own dose numbers, 100 % active, the dose itself per dose.
 */
export function freeFormCells(
  screening: ProjectScreening,
  doseMg: number | null,
): Record<string, SheetCell> {
  const ff = screening.screen.freeForm;
  const origin: ValueOrigin = ff.intrinsicOrigin === 'measured' ? 'input' : 'estimated';
  const mg = 10 ** ff.log10IntrinsicM.value * screening.drugIon.freeFormMolarMassGPerMol;
  return {
    activeFraction: num(100, 'input'),
    saltMassPerDose: num(doseMg, 'input'),
    saltWaterMgPerMl: ranged(num(mg, origin), ff.log10IntrinsicM.uncertainty),
    saltWaterFreeFormMgPerMl: ranged(num(mg, origin), ff.log10IntrinsicM.uncertainty),
    saltWaterLog10M: est(ff.log10IntrinsicM, origin),
    saltWaterOrigin: {
      value: ff.intrinsicOrigin === 'measured' ? 'free form: S₀ entered' : 'free form: S₀ from GSE',
    },
    worstDoseNumber: ranged(
      num(ff.worst?.doseNumber ?? null, origin),
      ff.log10IntrinsicM.uncertainty,
    ),
    worstPh: num(ff.worst?.pH ?? null, null),
    gastricDoseNumber: ranged(
      num(ff.gastric?.doseNumber ?? null, origin),
      ff.log10IntrinsicM.uncertainty,
    ),
    solubilityClass: { value: ff.solubilityClass },
  };
}
