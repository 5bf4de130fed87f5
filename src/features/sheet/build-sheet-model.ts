import {
  SALT_WATER_ORIGIN_LABELS,
  CELSIUS_ZERO_K,
  CRITERIA,
  ICH_M9_VOLUME_ML,
  rankCandidates,
  type Estimate,
  type ModelValidation,
  type ScreenRow,
} from '@/chem';
import type { EnergyCycle } from '@/components/charts/EnergyLevelDiagram';
import type { SolubilitySeries } from '@/components/charts/PhSolubilityChart';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { uncertaintiesOf } from '@/screening-data/uncertainty';
import { CRITERION_TEXT } from '@/screening-data/criteria';
import { energyCycleOf } from '@/screening-data/energy-cycle';
import type { ProjectRecord } from '@/persistence/records';
import type {
  SheetCell,
  SheetColumn,
  SheetModel,
  SheetRow,
  SheetSetting,
  ValueOrigin,
} from './sheet.types';

/** The charts' palette has eight distinguishable series; more salts would be unreadable on paper. */
const MAX_CHART_SALTS = 7;

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
    key: 'saltProbability',
    label: 'P(salt)',
    unit: '0–1',
    kind: 'number',
    hint: 'probability of proton transfer, Cruz-Cabeza 2012 trend',
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
  },
  {
    key: 'saltWaterFreeFormMgPerMl',
    label: 'Salt in water, as free form',
    unit: 'mg/mL free form',
    kind: 'number',
    group: 'solubility',
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
    hint: 'model, model + fusion data (your DSC), measured, or the 10² × S₀ anchor',
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
  },
  { key: 'worstPh', label: 'at pH', unit: null, kind: 'number', group: 'solubility' },
  {
    key: 'gastricDoseNumber',
    label: 'Gastric D₀',
    unit: null,
    kind: 'number',
    hint: 'dose number in the gastric medium with its chloride',
    group: 'solubility',
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
    unit: 'kJ/mol',
    kind: 'number',
    hint: 'lattice dissociation enthalpy, > 0',
    group: 'energetics',
  },
  {
    key: 'solutionEnthalpy',
    label: 'ΔH_sol',
    unit: 'kJ/mol',
    kind: 'number',
    hint: 'enthalpy of solution, estimate or calorimetric',
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

const REASON_WORD: Record<string, string> = {
  keeps: 'for',
  drops: 'against',
  watch: 'watch',
  measured: 'measured',
  note: 'note',
};

function rowCells(
  row: ScreenRow,
  score: number | null,
  screening: ProjectScreening,
  pTop3: number | null,
): Record<string, SheetCell> {
  const kspOrigin: ValueOrigin | null = row.kspOrigin ?? null;
  const thermo = screening.energetics[row.id]?.thermo ?? null;
  const measuredSol = row.measured?.solutionEnthalpyKJ ?? null;
  const sw = row.saltWaterSolubility;
  const swOrigin: ValueOrigin | null = sw
    ? sw.origin === 'measured'
      ? 'measured'
      : 'estimated'
    : null;
  return {
    score: num(score, null),
    pTop3: num(pTop3 === null ? null : pTop3 * 100, 'estimated'),
    deltaPka: num(row.deltaPka, 'input'),
    saltProbability: num(row.saltFormation?.saltProbability ?? null, 'estimated'),
    activeFraction: num(row.activeFraction * 100, 'input'),
    saltMassPerDose: num(row.saltMassPerDoseMg, 'input'),
    saltWaterMgPerMl: num(sw?.mgPerMlAsSalt ?? null, swOrigin),
    saltWaterFreeFormMgPerMl: num(sw?.mgPerMlAsFreeForm ?? null, swOrigin),
    saltWaterLog10M: sw ? est(sw.log10DrugM, swOrigin ?? 'estimated') : { value: null },
    saltWaterOrigin: { value: sw ? SALT_WATER_ORIGIN_LABELS[sw.origin] : null },
    log10Ksp: est(row.log10Ksp, kspOrigin ?? 'estimated'),
    // The same 1σ the Ranking area shows (linearised as the rank-robustness draw perturbs pH_max).
    phMax: num(
      row.phMax,
      kspOrigin,
      uncertaintiesOf(row, screening.screen.robustnessShared).phMaxSigma,
    ),
    worstDoseNumber: num(row.worst?.doseNumber ?? null, kspOrigin),
    worstPh: num(row.worst?.pH ?? null, null),
    gastricDoseNumber: num(row.gastric?.doseNumber ?? null, kspOrigin),
    solubilityClass: { value: row.solubilityClass },
    phMaxMargin: num(row.disproportionation?.marginPh ?? null, kspOrigin),
    latticeEnthalpy: est(thermo?.latticeEnthalpyKJ),
    solutionEnthalpy:
      measuredSol !== null ? num(measuredSol, 'measured') : est(thermo?.solutionEnthalpyKJ),
    hygroscopicity: {
      value: row.measured?.hygroscopicity ?? null,
      origin: row.measured?.hygroscopicity ? 'measured' : null,
    },
  };
}

function compoundFacts(project: ProjectRecord, screening: ProjectScreening): SheetSetting[] {
  const c = project.compound;
  const facts: SheetSetting[] = [
    { label: 'Ionisable as', value: c.kind === 'base' ? 'weak base' : 'weak acid' },
    {
      label: c.kind === 'base' ? 'pKa (conjugate acid)' : 'pKa',
      value: c.pKas.map((p) => `${p.value} (${p.origin})`).join(', '),
    },
    {
      label: 'Drug ion',
      value: `${screening.drugIon.formula}, charge ${c.ionCharge > 0 ? '+' : '−'}${Math.abs(c.ionCharge)}`,
    },
    {
      label: 'Free form molar mass',
      value: screening.drugIon.freeFormMolarMassGPerMol,
      unit: 'g/mol',
    },
  ];
  if (c.smiles) facts.push({ label: 'SMILES', value: c.smiles });
  if (c.formula) facts.push({ label: 'Formula', value: c.formula });
  const s0 = screening.screen.freeForm;
  facts.push({
    label: 'Intrinsic solubility S₀',
    value:
      c.intrinsicSolubilityMgPerMl ??
      `log₁₀ S₀ = ${s0.log10IntrinsicM.value.toFixed(2)} ± ${s0.log10IntrinsicM.uncertainty.toFixed(2)} (mol/L, estimate)`,
    unit: c.intrinsicSolubilityMgPerMl !== null ? 'mg/mL (measured)' : undefined,
  });
  if (c.meltingPointC !== null)
    facts.push({ label: 'Melting point', value: c.meltingPointC, unit: '°C' });
  if (c.logP !== null)
    facts.push({ label: 'log P', value: c.logP, unit: c.logPOrigin ?? undefined });
  facts.push({
    label: 'Highest single dose',
    value: c.doseMg ?? 'not given',
    unit: c.doseMg !== null ? 'mg' : undefined,
  });
  return facts;
}

function settingsList(screening: ProjectScreening): SheetSetting[] {
  const s = screening.settings;
  const list: SheetSetting[] = [
    {
      label: 'Temperature',
      value: Number((s.temperatureK - CELSIUS_ZERO_K).toFixed(2)),
      unit: '°C',
    },
    { label: 'Gastric medium', value: `pH ${s.gastricPh}, chloride ${s.gastricChlorideM} mol/L` },
    { label: 'Microenvironment pH', value: s.microenvironmentPh },
    { label: 'ΔpKa: cocrystal below', value: s.deltaPkaBands.cocrystalBelow },
    { label: 'ΔpKa: salt above', value: s.deltaPkaBands.saltAbove },
    { label: 'ΔpKa: stable-salt minimum', value: s.deltaPkaBands.stableSaltMin },
    {
      label: 'Activities',
      value:
        s.activityModel === 'ideal'
          ? 'ideal (activity = concentration)'
          : `Davies, I = ${s.backgroundIonicStrengthM} mol/L`,
    },
    { label: 'pH grid', value: `${s.phGrid.from}–${s.phGrid.to} in steps of ${s.phGrid.step}` },
    { label: 'Estimated salt solubility anchor', value: `${s.saltAnchorLog10} decades above S₀` },
    {
      label: 'pKa σ (measured / literature / predicted)',
      value: `${s.pkaSigmaByOrigin.measured} / ${s.pkaSigmaByOrigin.literature} / ${s.pkaSigmaByOrigin.predicted}`,
    },
  ];
  for (const m of s.media) {
    const ions = Object.entries(m.ions)
      .map(([id, c]) => `${id} ${c} mol/L`)
      .join(', ');
    list.push({ label: `Medium: ${m.label}`, value: `pH ${m.pH}${ions ? `, ${ions}` : ''}` });
  }
  return list;
}

function energyCycle(
  row: ScreenRow,
  label: string,
  screening: ProjectScreening,
): EnergyCycle | null {
  const e = screening.energetics[row.id];
  return e?.thermo ? energyCycleOf({ ...e, thermo: e.thermo }, label) : null;
}

export interface BuildSheetInput {
  project: ProjectRecord;
  screening: ProjectScreening;
  /** THERMO's validationReport(), or [] when it could not be computed. */
  validation: readonly ModelValidation[];
  generatedAt: string;
  appVersion: string;
  /** Rank robustness from the workbench's Monte Carlo (same seed and draws as the Ranking area), or null. */
  robustness?: {
    results: readonly { id: string; pTop3: number }[];
    iterations: number;
    seed: number;
  } | null;
}

/**
 * Turn a project's screening into the sheet model: rank with the project's weights (the same
 * `rankCandidates` the Ranking area uses), one row per shortlisted candidate — unscreenable ones
 * listed last with the reason — and the pictures and model check beside it.
 */
export function buildSheetModel({
  project,
  screening,
  validation,
  generatedAt,
  appVersion,
  robustness = null,
}: BuildSheetInput): SheetModel {
  const pTop3Of = new Map((robustness?.results ?? []).map((r) => [r.id, r.pTop3]));
  const { screen } = screening;
  const weights = screening.settings.weights;
  const ranked = rankCandidates(
    screen.rows.map((r) => ({ id: r.id, criteria: r.criteria, error: r.error })),
    weights,
  );
  const byId = new Map(screen.rows.map((r) => [r.id, r]));
  const drugName = project.compound.name;
  const labelOf = (row: ScreenRow) =>
    `${drugName} ${screening.ionNames[row.id] ?? row.counterIonName} (${row.drugPerSalt}:${row.counterIonPerSalt})`;

  const rows: SheetRow[] = [];
  for (const rr of ranked) {
    const row = byId.get(rr.id);
    if (!row) continue;
    const reasons = row.reasons.map(
      (r) =>
        `${REASON_WORD[r.kind] ?? r.kind}: ${r.text.replace(/^(keeps|drops|watch|note|measured):\s*/, '')}`,
    );
    if (row.error) reasons.unshift(`not screened: ${row.error}`);
    const energetics = screening.energetics[row.id];
    if (energetics && !energetics.thermo && energetics.reason)
      reasons.push(`no enthalpy estimate: ${energetics.reason}`);
    rows.push({
      id: row.id,
      rank: rr.rank,
      label: labelOf(row),
      cells: rowCells(row, rr.score, screening, row.error ? null : (pTop3Of.get(row.id) ?? null)),
      flags: row.flags.map((f) => f.text),
      reasons,
    });
  }
  for (const m of screening.missing) {
    rows.push({
      id: m.candidateId,
      rank: null,
      label: `${drugName} ${screening.ionNames[m.candidateId] ?? m.ionId}`,
      cells: {},
      flags: ['not screened'],
      reasons: [m.reason],
    });
  }

  const chartRows = ranked
    .map((r) => byId.get(r.id))
    .filter((r): r is ScreenRow => !!r && !r.error && r.profile.length > 0)
    .slice(0, MAX_CHART_SALTS);
  const series: SolubilitySeries[] = [];
  if (screen.freeForm.profile.length) {
    series.push({
      id: 'free-form',
      label: `${drugName} free ${project.compound.kind}`,
      kind: 'free-form',
      points: screen.freeForm.profile,
    });
  }
  for (const r of chartRows) {
    series.push({
      id: r.id,
      label: labelOf(r),
      kind: 'salt',
      points: r.profile.map((p) => ({ pH: p.pH, solubilityMgPerMl: p.solubilityMgPerMl })),
      phMax: r.phMax,
      estimated: r.kspOrigin !== 'measured',
    });
  }
  const dose = project.compound.doseMg;

  const energyCycles = ranked
    .map((r) => byId.get(r.id))
    .filter((r): r is ScreenRow => !!r)
    .map((r) => energyCycle(r, labelOf(r), screening))
    .filter((c): c is EnergyCycle => c !== null);

  const notes = [...screen.assumptions, ...screening.notes];
  notes.push(
    robustness
      ? `P(top 3): share of ${robustness.iterations} Monte Carlo draws (seed ${robustness.seed}) in which the candidate ranks in the top three when pKa, S₀ and each K_sp move within their stated 1σ, with the weights above.`
      : 'P(top 3) was not computed for this sheet (rank robustness unavailable).',
  );
  if (chartRows.length < screen.rows.filter((r) => !r.error).length) {
    notes.push(
      `The solubility picture shows the ${MAX_CHART_SALTS} best-ranked salts; the table lists all.`,
    );
  }

  return {
    projectName: project.name,
    compound: { name: drugName, facts: compoundFacts(project, screening) },
    generatedAt,
    appVersion,
    settings: settingsList(screening),
    weights: CRITERIA.map((k) => ({ label: CRITERION_TEXT[k].label, value: weights[k] })),
    columns: [...SHEET_COLUMNS],
    rows,
    confidence: validation.map((m) => ({
      label: `${m.label}${m.group ? ` — ${m.group}` : ''}`,
      n: m.n,
      meanAbsPercentError: m.meanAbsPercentError,
      maxAbsPercentError: m.maxAbsPercentError,
      signedBiasPercent: m.signedBiasPercent,
    })),
    notes,
    solubility: series.length
      ? { series, doseLineMgPerMl: dose !== null ? dose / ICH_M9_VOLUME_ML : null }
      : null,
    energyCycles,
  };
}
