import Papa from 'papaparse';
import { CliError, valueError } from '../../../args/cli-error';
import { readNumber } from '../../../args/parse-flags';
import { SCREEN_FLAGS } from '../screen-flags';
import type { CompoundSpec, FieldNames } from '../screen-input';
import type { IntrinsicSolubilityOrigin } from '@/chem';

/**
 * One compound of a batch file, read from a CSV record or a JSON Lines object into the same
 * {@link CompoundSpec} a single `screen` builds from its flags, with the same ranges. Lists (pKa values,
 * counter-ions) are separated by ';' so they fit in one CSV cell.
 */

/** The columns of a batch file; `id`, `kind`, `pkas` and `smiles` or `formula` are required. */
export const BATCH_COLUMNS = [
  'id',
  'name',
  'smiles',
  'formula',
  'kind',
  'pkas',
  'charge',
  's0_mg_per_ml',
  'mp_c',
  'logp',
  'dose_mg',
  'ions',
] as const;
export type BatchColumn = (typeof BATCH_COLUMNS)[number];

/** Column names of the compound fields, for messages. */
export const COLUMN_NAMES: FieldNames = {
  name: 'name',
  smiles: 'smiles',
  formula: 'formula',
  kind: 'kind',
  pKas: 'pkas',
  ionCharge: 'charge',
  intrinsicSolubilityMgPerMl: 's0_mg_per_ml',
  meltingPointC: 'mp_c',
  logP: 'logp',
  doseMg: 'dose_mg',
  ions: 'ions',
};

/** A row's values as text (CSV) or JSON values (JSON Lines). */
export type RawRow = Partial<Record<BatchColumn, unknown>>;

/** Check a CSV header: known columns only, each once, the required ones present. */
export function checkHeader(columns: readonly string[]): BatchColumn[] {
  const seen = new Set<string>();
  for (const c of columns) {
    if (!(BATCH_COLUMNS as readonly string[]).includes(c))
      throw valueError(
        `column "${c.slice(0, 40)}"`,
        'is not a batch column',
        BATCH_COLUMNS.join(', '),
      );
    if (seen.has(c)) throw valueError(`column "${c}"`, 'appears twice');
    seen.add(c);
  }
  for (const c of ['id', 'kind', 'pkas'] as const)
    if (!seen.has(c)) throw valueError(`column "${c}"`, 'is missing', BATCH_COLUMNS.join(', '));
  if (!seen.has('smiles') && !seen.has('formula'))
    throw valueError('column "smiles"', 'is missing (give smiles or formula)');
  return columns as BatchColumn[];
}

/** Split one CSV line into cells (RFC 4180 quoting; a record must fit on one line). */
export function csvCells(line: string): string[] {
  const r = Papa.parse<string[]>(line, { header: false, delimiter: ',', newline: '\n' });
  if (r.errors.length > 0)
    throw valueError('line', `cannot read the CSV record (${r.errors[0]!.message})`);
  return r.data[0] ?? [];
}

const text = (col: string, v: unknown, max: number): string => {
  if (v === undefined || v === null) return '';
  if (typeof v !== 'string') throw valueError(col, 'must be text');
  if (v.length > max) throw valueError(col, `is longer than ${max} characters`);
  return v.trim();
};

const number = (
  col: string,
  v: unknown,
  spec: { min: number; max: number; integer?: boolean; unit?: string },
): number | null => {
  if (v === undefined || v === null || v === '') return null;
  if (typeof v === 'number') return readNumber(col, Number.isFinite(v) ? String(v) : 'NaN', spec);
  if (typeof v !== 'string') throw valueError(col, 'must be a number');
  return readNumber(col, v, spec);
};

const list = (col: string, v: unknown, min: number, max: number): string[] | null => {
  if (v === undefined || v === null || v === '') return null;
  const items = Array.isArray(v) ? v : typeof v === 'string' ? v.split(';') : null;
  if (items === null) throw valueError(col, "must be a list separated by ';'");
  const out = items.map((s) =>
    typeof s === 'number' ? String(s) : typeof s === 'string' ? s.trim() : '\u0000',
  );
  if (out.some((s) => s === '' || s === '\u0000'))
    throw valueError(col, 'has an empty or non-text entry');
  if (out.length < min || out.length > max)
    throw valueError(col, `${out.length} value(s)`, `${min} to ${max} values separated by ';'`);
  return out;
};

/** The compound of one row; throws CliError (or ChemInputError) naming the column. */
export function specFromRow(
  row: RawRow,
  pkaOrigin: 'measured' | 'literature' | 'predicted' | 'not-stated',
  s0Origin: IntrinsicSolubilityOrigin | null = null,
): { id: string; spec: CompoundSpec } {
  const id = text('id', row.id, 120);
  if (id === '') throw valueError('id', 'is empty', 'a compound id');
  const kind = text('kind', row.kind, 10);
  if (kind !== 'base' && kind !== 'acid')
    throw valueError('kind', `"${kind}" is not base or acid`, 'base or acid');
  const pkaTexts = list('pkas', row.pkas, 1, 4);
  if (!pkaTexts) throw valueError('pkas', 'is empty', "one to four pKa values separated by ';'");
  const pKas = pkaTexts.map((t, i) => ({
    value: readNumber(`pkas[${i + 1}]`, t, SCREEN_FLAGS.pka),
    origin: pkaOrigin,
  }));
  const charge = number('charge', row.charge, SCREEN_FLAGS.charge);
  return {
    id,
    spec: {
      name: text('name', row.name, 120) || id,
      smiles: text('smiles', row.smiles, 2000),
      formula: text('formula', row.formula, 200),
      kind,
      pKas,
      ionCharge: charge,
      intrinsicSolubilityMgPerMl: number('s0_mg_per_ml', row.s0_mg_per_ml, SCREEN_FLAGS.s0),
      intrinsicSolubilityOrigin: s0Origin,
      meltingPointC: number('mp_c', row.mp_c, SCREEN_FLAGS.mp),
      logP: number('logp', row.logp, SCREEN_FLAGS.logp),
      doseMg: number('dose_mg', row.dose_mg, SCREEN_FLAGS.dose),
      ions: list('ions', row.ions, 1, 200),
    },
  };
}

/** A JSON Lines record as a raw row: an object with batch columns only. */
export function rowFromJson(value: unknown): RawRow {
  if (!value || typeof value !== 'object' || Array.isArray(value))
    throw valueError('line', 'must be a JSON object');
  for (const k of Object.keys(value)) {
    if (!(BATCH_COLUMNS as readonly string[]).includes(k))
      throw valueError(`"${k.slice(0, 40)}"`, 'is not a batch field', BATCH_COLUMNS.join(', '));
  }
  return value as RawRow;
}

export { CliError };
