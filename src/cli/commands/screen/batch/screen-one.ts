import { describeFailure } from '../../../define-command';
import { prepareScreen, type CompoundSpec } from '../screen-input';
import { runScreen, runScreenTop, type ScreenTableRow } from '../screen-table';
import { checkScreeningSettings, safeCsvCell } from '@/chem';
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
 * A screened compound, its rows already written out (CSV without the header line, or JSON Lines) as
 * UTF-8 bytes where it was screened: on a worker thread, so that the main thread only writes the
 * bytes out. Bytes rather than text: the worker hands their memory over to the main thread instead
 * of copying a string (postMessage's transfer list), and the text built from many small pieces dies
 * young instead of being kept (and moved by each collection) until its chunk is answered.
 */
export type ScreenOneResult =
  | { ok: true; rowCount: number; columns: string[]; bytes: Uint8Array; skipped: number }
  | { ok: false; error: string };

const UTF8 = new TextEncoder();

/**
 * The batch's settings checked once per thread instead of once per compound (prepareScreen passes
 * checked settings through). Settings that fail the check are left as they are, so that every compound
 * reports the failure as a single screen would.
 */
export function withCheckedSettings(s: BatchSettings): BatchSettings {
  try {
    return { ...s, settings: checkScreeningSettings(s.settings) };
  } catch {
    return s;
  }
}

/** The output columns for a table's keys, built once while the keys stay the same. */
let columnsMemo: { keys: readonly string[]; columns: string[] } | null = null;

function columnsFor(keys: readonly string[]): string[] {
  const m = columnsMemo;
  if (m && m.keys.length === keys.length && m.keys.every((k, i) => k === keys[i])) return m.columns;
  const columns = ['compound_id', 'compound_name', ...keys];
  columnsMemo = { keys, columns };
  return columns;
}

/**
 * One cell as csvField(safeCsvCell(v)) writes it, the common cells first: a number's text never
 * needs quotes or the formula guard (papaparse writes String(v) too), an empty text stays empty.
 */
export function csvCell(v: unknown): string {
  if (typeof v === 'number') return String(v);
  if (v === '') return '';
  if (typeof v === 'string' && plainStart(v.charCodeAt(0))) return csvField(v);
  return csvField(safeCsvCell(v));
}

/**
 * A first character after which the formula guard never changes a text: printable ASCII other than
 * the triggers = + - @ (neither white space nor a format character, so the guard has nothing to look
 * through either). Most cells start so; the guard's look-through expression is skipped for them.
 */
function plainStart(c: number): boolean {
  return c > 0x20 && c < 0x7f && c !== 0x3d && c !== 0x2b && c !== 0x2d && c !== 0x40;
}

/** The rows of one compound as output text, each with the compound's id and name first. */
export function encodeRows(
  id: string,
  name: string,
  table: readonly ScreenTableRow[],
  format: 'csv' | 'jsonl',
): { rowCount: number; columns: string[]; text: string } {
  if (table.length === 0) return { rowCount: 0, columns: [], text: '' };
  const columns = columnsFor(Object.keys(table[0]!));
  let text = '';
  if (format === 'jsonl') {
    // The bytes of JSON.stringify({ compound_id, compound_name, ...row }) without building that
    // object: the two leading members, then the row's own members (no row key is one of theirs).
    const lead = `{"compound_id":${JSON.stringify(id)},"compound_name":${JSON.stringify(name)},`;
    for (const row of table) text += lead + JSON.stringify(row).slice(1) + '\n';
    return { rowCount: table.length, columns, text };
  }
  // CSV as Papa.unparse writes it (the header line comes from the caller), each cell through the
  // spreadsheet-formula guard, without building an object per row.
  const lead = `${csvCell(id)},${csvCell(name)}`;
  for (const row of table) {
    text += lead;
    // for…in visits a plain object's (non-numeric) keys in Object.values' order, without its array
    for (const k in row) text += ',' + csvCell(row[k as keyof ScreenTableRow]);
    text += '\n';
  }
  return { rowCount: table.length, columns, text };
}

/** Quoting as papaparse's unparse does it: around text with a quote, comma, line break, BOM or edge space. */
const NEEDS_QUOTES = /[\r\n",\uFEFF]|^ | $/;

/** One CSV field (null and undefined empty, quotes doubled, quoted when needed). */
export function csvField(v: unknown): string {
  if (v === undefined || v === null) return '';
  const s = String(v);
  const e = s.includes('"') ? s.replace(/"/g, '""') : s;
  return NEEDS_QUOTES.test(e) ? `"${e}"` : e;
}

/** Screen one compound of a batch with the same core and settings as a single `screen`. */
export async function screenOne(
  spec: CompoundSpec,
  s: BatchSettings,
  id: string,
): Promise<ScreenOneResult> {
  try {
    // With --top N and no Monte Carlo (which needs every row), only the N written rows get their
    // words and ΔH_sol (screenCompoundTop); the lines are the same either way.
    const topOnly = s.top !== undefined && s.iterations === 0;
    const prepared = await prepareScreen(
      { ...spec, ions: spec.ions ?? s.ions },
      {
        settings: s.settings,
        keepCocrystalBand: s.keepCocrystalBand,
        names: COLUMN_NAMES,
        deferSolutionEnthalpy: topOnly,
      },
    );
    const table =
      topOnly && s.top !== undefined
        ? runScreenTop(prepared, s.top)
        : runScreen(prepared, { iterations: s.iterations, seed: s.seed, top: s.top }).table;
    const rows = encodeRows(id, spec.name, table, s.outFormat);
    return {
      ok: true,
      skipped: prepared.skipped.length,
      rowCount: rows.rowCount,
      columns: rows.columns,
      bytes: UTF8.encode(rows.text),
    };
  } catch (err) {
    return { ok: false, error: describeFailure(err).message };
  }
}
