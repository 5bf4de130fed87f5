import { parseStrictJson, type IntrinsicSolubilityOrigin } from '@/chem';
import { valueError } from '../../../args/cli-error';
import { MAX_JSON_DEPTH, MAX_LINE_BYTES } from '../../eval/bounded-lines';
import { describeFailure } from '../../../define-command';
import type { CompoundSpec } from '../screen-input';
import { csvCells, rowFromJson, specFromRow, type BatchColumn, type RawRow } from './batch-row';

/**
 * One data line of a batch file read into a compound, or the reason it cannot be: a CSV record with
 * as many cells as the header, or a JSON object no deeper than the JSON limit; the id must be new.
 */
export type ReadLine =
  { ok: true; id: string; spec: CompoundSpec } | { ok: false; id: string; error: string };

function rawRowOf(text: string, format: 'csv' | 'jsonl', header: readonly BatchColumn[]): RawRow {
  if (format === 'csv') {
    const cells = csvCells(text);
    if (cells.length !== header.length)
      throw valueError('line', `has ${cells.length} cells, the header ${header.length}`);
    return Object.fromEntries(header.map((c, i) => [c, cells[i]]));
  }
  // The one JSON reader: a key twice, invalid nesting depth and __proto__ are refused.
  const value = parseStrictJson(text, {
    maxBytes: MAX_LINE_BYTES,
    maxDepth: MAX_JSON_DEPTH,
    field: 'line',
  });
  return rowFromJson(value);
}

export function readCompoundLine(
  text: string,
  lineNo: number,
  format: 'csv' | 'jsonl',
  header: readonly BatchColumn[],
  origins: {
    pka: 'measured' | 'literature' | 'predicted' | 'not-stated';
    s0: IntrinsicSolubilityOrigin | null;
  },
  seenIds: Map<string, number>,
): ReadLine {
  let raw: RawRow | undefined;
  let id = '';
  try {
    raw = rawRowOf(text, format, header);
    const r = specFromRow(raw, origins.pka, origins.s0);
    id = r.id;
    const earlier = seenIds.get(id);
    if (earlier !== undefined)
      throw valueError(
        'id',
        `"${id}" was already used on line ${earlier}`,
        'a unique id per compound',
      );
    seenIds.set(id, lineNo);
    return { ok: true, id, spec: r.spec };
  } catch (err) {
    if (id === '' && typeof raw?.id === 'string') id = raw.id.trim().slice(0, 120);
    return { ok: false, id, error: describeFailure(err).message };
  }
}
