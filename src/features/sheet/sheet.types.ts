import type { EnergyCycle } from '@/components/charts/EnergyLevelDiagram';
import type { SolubilitySeries } from '@/components/charts/PhSolubilityChart';

/**
 * The comparison sheet's data, built once from a screening result and rendered two ways: the
 * printable sheet and the CSV. Keeping one model guarantees the two carry the same numbers.
 */

/** Where a number came from: a model estimate, a bench measurement, or the user's own input. */
export type ValueOrigin = 'estimated' | 'measured' | 'input';

/** The sheet splits the wide table into three narrower ones that fit a portrait page. */
export type SheetColumnGroup = 'formation' | 'solubility' | 'energetics';

export interface SheetColumn {
  key: string;
  /** Column heading without unit, e.g. "pH_max". */
  label: string;
  /** Unit shown in the heading, or null for dimensionless numbers and text. */
  unit: string | null;
  /** Numeric columns get an uncertainty column and an origin column in the CSV. */
  kind: 'number' | 'text';
  /** One-line explanation for the sheet's legend. */
  hint?: string;
  /** Which of the sheet's tables shows the column (the CSV shows all in one table). */
  group: SheetColumnGroup;
  /**
   * The column's 1σ is multiplicative (dose numbers, solubilities: a ±1σ range, as the Ranking shows
   * it): the CSV gives its low and high ends instead of a symmetric 1σ.
   */
  range?: boolean;
}

export interface SheetCell {
  /** A finite number, a text, or null when not available. */
  value: number | string | null;
  /** Standard uncertainty (1σ) in the column's unit, when known. */
  uncertainty?: number | null;
  /** The ±1σ range, for a column whose uncertainty is multiplicative (SheetColumn.range). */
  range?: [number, number] | null;
  origin?: ValueOrigin | null;
}

export interface SheetRow {
  id: string;
  /** 1 for the best; null for a candidate that could not be screened (listed last, with the reason). */
  rank: number | null;
  /** The candidate's name, e.g. "Demorazine mesylate (1:1)" — user-controlled text, never markup. */
  label: string;
  cells: Record<string, SheetCell>;
  /** Short warnings (e.g. "disproportionation risk"). */
  flags: string[];
  /** Why the candidate sits where it does, in words. */
  reasons: string[];
  /** With excipients chosen: the one most likely to convert this salt (CSV's last columns). */
  worstExcipient?: SheetWorstExcipient | null;
}

export interface SheetWorstExcipient {
  name: string;
  /** P(conversion), 0–1. */
  probability: number;
  /** The band in words, e.g. "conversion likely". */
  words: string;
}

/** The salt × excipient matrix on the sheet (present only when excipients were chosen). */
export interface SheetExcipientMatrix {
  excipients: { id: string; name: string; phText: string; measuredAs: string; source: string }[];
  rows: {
    id: string;
    label: string;
    phMax: number | null;
    cells: { percent: string | null; words: string }[];
  }[];
  limits: string;
}

export interface SheetSetting {
  label: string;
  value: string | number;
  unit?: string;
}

export interface SheetConfidenceRow {
  label: string;
  n: number;
  meanAbsPercentError: number;
  maxAbsPercentError: number;
  signedBiasPercent: number;
}

export interface SheetModel {
  projectName: string;
  compound: { name: string; facts: SheetSetting[] };
  /** ISO date-time the sheet was made. */
  generatedAt: string;
  appVersion: string;
  settings: SheetSetting[];
  weights: SheetSetting[];
  columns: SheetColumn[];
  rows: SheetRow[];
  /** The free form in the same columns, read against the salts (not ranked), when screened. */
  freeForm?: SheetRow | null;
  /** What separates the shortlist (the core's separationSummary), in one line and its details. */
  separation?: { headline: string; details: string[] } | null;
  confidence: SheetConfidenceRow[];
  /** Extra remarks (assumptions, model limits). */
  notes: string[];
  /** The pH–solubility picture, when the screening produced profiles. */
  solubility: { series: SolubilitySeries[]; doseLineMgPerMl: number | null } | null;
  /** One enthalpy cycle per candidate that has a thermochemical estimate, in rank order. */
  energyCycles: EnergyCycle[];
  /** The excipients' microenvironment, when the formulation's excipients were chosen. */
  excipientMatrix?: SheetExcipientMatrix | null;
}
