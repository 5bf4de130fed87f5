import {
  CONVERSION_BAND_WORDS,
  EXCIPIENT_MATRIX_LIMITS,
  EXCIPIENTS,
  SINGLE_VALUE_HALF_WIDTH_PH,
  probabilityPercentText,
  worstExcipient,
  type ScreenRow,
} from '@/chem';
import type { SheetExcipientMatrix, SheetWorstExcipient } from './sheet.types';

/** The excipient most likely to convert the salt, for the sheet row and the CSV's last columns. */
export function sheetWorstExcipient(row: ScreenRow): SheetWorstExcipient | null {
  const w = worstExcipient(row.excipientRisks);
  if (!w || w.probability === null) return null;
  return {
    name: w.excipientName,
    probability: w.probability,
    words: CONVERSION_BAND_WORDS[w.band],
  };
}

/**
 * The salt × excipient matrix for the sheet, rows in rank order; null when no excipient was chosen
 * (the sheet then shows the microenvironment pH among the settings).
 */
export function sheetExcipientMatrix(
  chosenIds: readonly string[],
  rankedRows: readonly ScreenRow[],
  labelOf: (row: ScreenRow) => string,
): SheetExcipientMatrix | null {
  const chosen = new Set(chosenIds);
  const columns = EXCIPIENTS.filter((e) => chosen.has(e.id));
  if (columns.length === 0) return null;
  return {
    excipients: columns.map((e) => ({
      id: e.id,
      name: e.name,
      phText:
        e.phHigh - e.phLow < 1e-9
          ? `${e.phLow.toFixed(1)} (±${SINGLE_VALUE_HALF_WIDTH_PH})`
          : `${e.phLow.toFixed(1)}–${e.phHigh.toFixed(1)}`,
      measuredAs: e.measuredAs,
      source: e.source,
    })),
    rows: rankedRows
      .filter((r) => !r.error)
      .map((r) => {
        const byId = new Map(r.excipientRisks.map((x) => [x.excipientId, x]));
        return {
          id: r.id,
          label: labelOf(r),
          phMax: r.phMax,
          cells: columns.map((e) => {
            const x = byId.get(e.id);
            const p = x?.probability ?? null;
            return {
              percent: p === null ? null : probabilityPercentText(p),
              words: CONVERSION_BAND_WORDS[x?.band ?? 'unknown'],
            };
          }),
        };
      }),
    limits: EXCIPIENT_MATRIX_LIMITS,
  };
}
