import Papa from 'papaparse';
import { describeFailure } from '../../../define-command';
import { prepareScreen, type CompoundSpec } from '../screen-input';
import { runScreen, type ScreenTableRow } from '../screen-table';
import { safeRow } from '../screen-writers';
import { COLUMN_NAMES } from './batch-row';

/** The settings shared by every compound of a batch (the same as one `screen` takes from its flags). */
export interface BatchSettings {
  settings: Record<string, unknown>;
  keepCocrystalBand: boolean;
  iterations: number;
  seed: number;
  top?: number | undefined;
  /** --ions, used for rows without their own list. */
  ions: string[] | null;
  /** The output format the rows are written in. */
  outFormat: 'csv' | 'jsonl';
}

/**
 * A screened compound, its rows already written out as text (CSV without the header line, or JSON
 * Lines) where it was screened: on a worker thread, so that the main thread only copies text out.
 */
export type ScreenOneResult =
  | { ok: true; rowCount: number; columns: string[]; text: string; skipped: number }
  | { ok: false; error: string };

/** The rows of one compound as output text, each with the compound's id and name first. */
export function encodeRows(
  id: string,
  name: string,
  table: readonly ScreenTableRow[],
  format: 'csv' | 'jsonl',
): { rowCount: number; columns: string[]; text: string } {
  const rows = table.map((row) => ({ compound_id: id, compound_name: name, ...row }));
  if (rows.length === 0) return { rowCount: 0, columns: [], text: '' };
  const columns = Object.keys(rows[0]!);
  const text =
    format === 'jsonl'
      ? rows.map((row) => JSON.stringify(row)).join('\n') + '\n'
      : Papa.unparse(rows.map(safeRow), { header: false, columns, newline: '\n' }) + '\n';
  return { rowCount: rows.length, columns, text };
}

/** Screen one compound of a batch with the same core and settings as a single `screen`. */
export async function screenOne(spec: CompoundSpec, s: BatchSettings, id: string): Promise<ScreenOneResult> {
  try {
    const prepared = await prepareScreen(
      { ...spec, ions: spec.ions ?? s.ions },
      { settings: s.settings, keepCocrystalBand: s.keepCocrystalBand, names: COLUMN_NAMES },
    );
    const { table } = runScreen(prepared, { iterations: s.iterations, seed: s.seed, top: s.top });
    return { ok: true, skipped: prepared.skipped.length, ...encodeRows(id, spec.name, table, s.outFormat) };
  } catch (err) {
    return { ok: false, error: describeFailure(err).message };
  }
}
