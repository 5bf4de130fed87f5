import {
  CONVERSION_BAND_WORDS,
  EXCIPIENTS,
  excipientById,
  excipientPhEstimate,
  probabilityPercentText,
  worstExcipient,
  type ExcipientRecord,
  type ExcipientRisk,
} from '@/chem';
import type { DisplayRow } from './ranking-rows';

export interface MatrixCell {
  excipientId: string;
  /** P(conversion) in per cent as shown ("<1 %", "37 %", ">99 %"); null when not judged. */
  percent: string | null;
  band: ExcipientRisk['band'];
  words: string;
}

export interface MatrixRow {
  id: string;
  label: string;
  phMax: number | null;
  cells: MatrixCell[];
  worst: { name: string; percent: string; band: ExcipientRisk['band'] } | null;
}

/** The chosen excipients the table knows, in table order (stable columns whatever the click order). */
export function chosenInTableOrder(ids: readonly string[]): ExcipientRecord[] {
  const chosen = new Set(ids);
  return EXCIPIENTS.filter((e) => chosen.has(e.id));
}

/** A pH range as the matrix heads it: "8.0–10.0", or "8.3 (±0.5)" for a single published value. */
export function phRangeText(e: ExcipientRecord): string {
  if (e.phHigh - e.phLow < 1e-9)
    return `${e.phLow.toFixed(1)} (±${(excipientPhEstimate(e).phHigh - e.phHigh).toFixed(1)})`;
  return `${e.phLow.toFixed(1)}–${e.phHigh.toFixed(1)}`;
}

/** The salt × excipient matrix from the screened rows (which carry their risks in chosen order). */
export function matrixRows(
  rows: readonly DisplayRow[],
  columns: readonly ExcipientRecord[],
): MatrixRow[] {
  return rows
    .filter((r) => !r.row.error)
    .map((r) => {
      const byId = new Map(r.row.excipientRisks.map((x) => [x.excipientId, x]));
      const cells = columns.map((e): MatrixCell => {
        const risk = byId.get(e.id);
        // No risk yet for a just-chosen excipient: the screen is being recomputed.
        if (!risk)
          return { excipientId: e.id, percent: null, band: 'unknown', words: 'recomputing…' };
        const p = risk.probability;
        const band = risk.band;
        return {
          excipientId: e.id,
          percent: p === null ? null : probabilityPercentText(p),
          band,
          words: CONVERSION_BAND_WORDS[band],
        };
      });
      const w = worstExcipient(r.row.excipientRisks);
      return {
        id: r.id,
        label: r.label,
        phMax: r.row.phMax,
        cells,
        worst:
          w && w.probability !== null
            ? {
                name: w.excipientName,
                percent: probabilityPercentText(w.probability),
                band: w.band,
              }
            : null,
      };
    });
}

/** The matrix in one sentence per band (the text alternative of the grid). */
export function matrixSummary(
  rows: readonly MatrixRow[],
  columns: readonly ExcipientRecord[],
): string {
  const name = (id: string) => excipientById(id)?.name ?? id;
  const pairs = (band: 'likely' | 'possible') =>
    rows.flatMap((r) =>
      r.cells.filter((c) => c.band === band).map((c) => `${r.label} with ${name(c.excipientId)}`),
    );
  const likely = pairs('likely');
  const possible = pairs('possible');
  const parts = [
    likely.length ? `Conversion likely: ${likely.join('; ')}.` : 'No pairing is likely to convert.',
    possible.length ? `Conversion possible: ${possible.join('; ')}.` : '',
  ];
  return `${rows.length} salts against ${columns.length} excipients. ${parts.join(' ')}`.trim();
}
