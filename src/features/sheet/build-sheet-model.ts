import {
  ICH_M9_VOLUME_ML,
  rankCandidates,
  separationSummary,
  type ModelValidation,
  type ScreenRow,
} from '@/chem';
import type { EnergyCycle } from '@/components/charts/EnergyLevelDiagram';
import type { SolubilitySeries } from '@/components/charts/PhSolubilityChart';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { energyCycleOf } from '@/screening-data/energy-cycle';
import type { ProjectRecord } from '@/persistence/records';
import { SHEET_COLUMNS, freeFormCells, rowCells } from './sheet-columns';
import { compoundFacts, settingsList, weightsList } from './sheet-facts';
import { sheetExcipientMatrix, sheetWorstExcipient } from './sheet-excipients';
import type { SheetModel, SheetRow } from './sheet.types';

export { SHEET_COLUMNS } from './sheet-columns';

/** The charts' palette has eight distinguishable series; more salts would be unreadable on paper. */
const MAX_CHART_SALTS = 7;

const REASON_WORD: Record<string, string> = {
  keeps: 'for',
  drops: 'against',
  watch: 'watch',
  measured: 'measured',
  note: 'note',
};
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
  // The core's salt name (saltLabel, e.g. "hydrochloride (1:1)"), as the Ranking and the CLI write it.
  const labelOf = (row: ScreenRow) => `${drugName} ${row.label}`;

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
      worstExcipient: sheetWorstExcipient(row),
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
    weights: weightsList(screening),
    columns: [...SHEET_COLUMNS],
    rows,
    freeForm: {
      id: 'free-form',
      rank: null,
      label: `${drugName} free ${project.compound.kind} (no salt; read against, not ranked)`,
      cells: freeFormCells(screening, project.compound.doseMg),
      flags: screen.freeForm.flags.map((f) => f.text),
      reasons: [],
    },
    separation: separationSummary(screen, weights),
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
    excipientMatrix: sheetExcipientMatrix(
      screening.settings.excipients,
      ranked.map((r) => byId.get(r.id)).filter((r): r is ScreenRow => !!r),
      labelOf,
    ),
  };
}
