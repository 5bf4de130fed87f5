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

/** What every step of the sheet reads: the screening ranked with the project's weights. */
interface RankedScreening {
  project: ProjectRecord;
  screening: ProjectScreening;
  ranked: ReturnType<typeof rankCandidates>;
  byId: Map<string, ScreenRow>;
  labelOf: (row: ScreenRow) => string;
}

function rankScreening(project: ProjectRecord, screening: ProjectScreening): RankedScreening {
  const { screen } = screening;
  const ranked = rankCandidates(
    screen.rows.map((r) => ({ id: r.id, criteria: r.criteria, error: r.error })),
    screening.settings.weights,
  );
  const byId = new Map(screen.rows.map((r) => [r.id, r]));
  // The core's salt name (saltLabel, e.g. "hydrochloride (1:1)"), as the Ranking and the CLI write it.
  const labelOf = (row: ScreenRow) => `${project.compound.name} ${row.label}`;
  return { project, screening, ranked, byId, labelOf };
}

/** The screened rows in ranked order (ids without a screen row skipped). */
function rankedRows({ ranked, byId }: RankedScreening): ScreenRow[] {
  return ranked.map((r) => byId.get(r.id)).filter((r): r is ScreenRow => !!r);
}

/** A row's reasons in the sheet's words, with why it was not screened or has no enthalpy. */
function sheetReasons(row: ScreenRow, screening: ProjectScreening): string[] {
  const reasons = row.reasons.map(
    (r) =>
      `${REASON_WORD[r.kind] ?? r.kind}: ${r.text.replace(/^(keeps|drops|watch|note|measured):\s*/, '')}`,
  );
  if (row.error) reasons.unshift(`not screened: ${row.error}`);
  const energetics = screening.energetics[row.id];
  if (energetics && !energetics.thermo && energetics.reason)
    reasons.push(`no enthalpy estimate: ${energetics.reason}`);
  return reasons;
}

/** One row per shortlisted candidate in rank order; the unscreenable ones last, with the reason. */
function sheetRows(
  rs: RankedScreening,
  pTop3Of: Map<string, { p: number; draws: number }>,
): SheetRow[] {
  const { project, screening, ranked, byId, labelOf } = rs;
  const rows: SheetRow[] = [];
  for (const rr of ranked) {
    const row = byId.get(rr.id);
    if (!row) continue;
    rows.push({
      id: row.id,
      rank: rr.rank,
      label: labelOf(row),
      cells: rowCells(row, rr.score, screening, row.error ? null : (pTop3Of.get(row.id) ?? null)),
      flags: row.flags.map((f) => f.text),
      reasons: sheetReasons(row, screening),
      worstExcipient: sheetWorstExcipient(row),
    });
  }
  for (const m of screening.missing) {
    rows.push({
      id: m.candidateId,
      rank: null,
      label: `${project.compound.name} ${screening.ionNames[m.candidateId] ?? m.ionId}`,
      cells: {},
      flags: ['not screened'],
      reasons: [m.reason],
    });
  }
  return rows;
}

/** The pH–solubility picture: the free form and the best-ranked salts (at most MAX_CHART_SALTS). */
function solubilityPicture(rs: RankedScreening) {
  const { project, screening, labelOf } = rs;
  const { freeForm } = screening.screen;
  const chartRows = rankedRows(rs)
    .filter((r) => !r.error && r.profile.length > 0)
    .slice(0, MAX_CHART_SALTS);
  const series: SolubilitySeries[] = [];
  if (freeForm.profile.length) {
    series.push({
      id: 'free-form',
      label: `${project.compound.name} free ${project.compound.kind}`,
      kind: 'free-form',
      points: freeForm.profile,
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
  const picture = series.length
    ? { series, doseLineMgPerMl: dose !== null ? dose / ICH_M9_VOLUME_ML : null }
    : null;
  return { picture, chartedSalts: chartRows.length };
}

/** The screen's assumptions and the sheet's own notes (how P(top 3) was drawn, what the chart omits). */
function sheetNotes(
  screening: ProjectScreening,
  robustness: BuildSheetInput['robustness'],
  chartedSalts: number,
): string[] {
  const { screen } = screening;
  const notes = [...screen.assumptions, ...screening.notes];
  notes.push(
    robustness
      ? `P(top 3): share of ${robustness.iterations} Monte Carlo draws (seed ${robustness.seed}) in which the candidate ranks in the top three when pKa, S₀ and each K_sp move within their stated 1σ, with the weights above.`
      : 'P(top 3) was not computed for this sheet (rank robustness unavailable).',
  );
  if (chartedSalts < screen.rows.filter((r) => !r.error).length) {
    notes.push(
      `The solubility picture shows the ${MAX_CHART_SALTS} best-ranked salts; the table lists all.`,
    );
  }
  return notes;
}

/** The free form's row: read against, never ranked. */
function freeFormRow(project: ProjectRecord, screening: ProjectScreening): SheetRow {
  return {
    id: 'free-form',
    rank: null,
    label: `${project.compound.name} free ${project.compound.kind} (no salt; read against, not ranked)`,
    cells: freeFormCells(screening, project.compound.doseMg),
    flags: screening.screen.freeForm.flags.map((f) => f.text),
    reasons: [],
  };
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
  const pTop3Of = new Map(
    (robustness?.results ?? []).map((r) => [r.id, { p: r.pTop3, draws: robustness!.iterations }]),
  );
  const rs = rankScreening(project, screening);
  const { picture, chartedSalts } = solubilityPicture(rs);
  const inOrder = rankedRows(rs);
  return {
    projectName: project.name,
    compound: { name: project.compound.name, facts: compoundFacts(project, screening) },
    generatedAt,
    appVersion,
    settings: settingsList(screening),
    weights: weightsList(screening),
    columns: [...SHEET_COLUMNS],
    rows: sheetRows(rs, pTop3Of),
    freeForm: freeFormRow(project, screening),
    separation: separationSummary(screening.screen, screening.settings.weights),
    confidence: validation.map((m) => ({
      label: `${m.label}${m.group ? ` — ${m.group}` : ''}`,
      n: m.n,
      meanAbsPercentError: m.meanAbsPercentError,
      maxAbsPercentError: m.maxAbsPercentError,
      signedBiasPercent: m.signedBiasPercent,
    })),
    notes: sheetNotes(screening, robustness, chartedSalts),
    solubility: picture,
    energyCycles: inOrder
      .map((r) => energyCycle(r, rs.labelOf(r), screening))
      .filter((c): c is EnergyCycle => c !== null),
    excipientMatrix: sheetExcipientMatrix(screening.settings.excipients, inOrder, rs.labelOf),
  };
}
