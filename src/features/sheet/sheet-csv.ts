import Papa from 'papaparse';
import { CAUTION_LINES } from '@/components/Cautions';
import { neutralizeCsvText, roundToUncertainty } from '@/chem';
import { cellNumber } from './sheet-format';
import type { SheetColumn, SheetModel } from './sheet.types';

/** Rounds to 6 significant digits so float noise (0.30000000000000004) never reaches a file. */
export function csvNumber(x: number): number {
  if (!Number.isFinite(x)) throw new RangeError(`not a finite number: ${x}`);
  return x === 0 ? 0 : Number(x.toPrecision(6));
}

const withUnit = (label: string, unit: string | null) => (unit ? `${label} (${unit})` : label);

/** The CSV header row: every heading carries its unit; numeric columns add uncertainty and origin. */
export function csvHeader(columns: readonly SheetColumn[]): string[] {
  const head = ['Rank', 'Candidate'];
  for (const c of columns) {
    head.push(withUnit(c.label, c.unit));
    if (c.kind === 'number' && c.range)
      head.push(
        withUnit(`${c.label} low (-1 sigma)`, c.unit),
        withUnit(`${c.label} high (+1 sigma)`, c.unit),
        `${c.label} origin`,
      );
    else if (c.kind === 'number')
      head.push(withUnit(`${c.label} uncertainty (1 sigma)`, c.unit), `${c.label} origin`);
  }
  head.push('Flags', 'Reasons');
  // Added last so every earlier column keeps its place: the excipient most likely to convert the salt.
  head.push('Worst excipient', 'Worst excipient P(conversion) (0-1)', 'Worst excipient risk');
  return head;
}

type CsvValue = string | number | null;

/** The table as rows of typed values (numbers as numbers, text neutralised), header first. */
export function sheetCsvRows(model: SheetModel): CsvValue[][] {
  const rows: CsvValue[][] = [csvHeader(model.columns).map(neutralizeCsvText)];
  for (const r of [...(model.freeForm ? [model.freeForm] : []), ...model.rows]) {
    const line: CsvValue[] = [r.rank, neutralizeCsvText(r.label)];
    for (const c of model.columns) {
      const cell = r.cells[c.key];
      const v = cell?.value ?? null;
      const u = cell?.uncertainty;
      const hasU = typeof u === 'number' && Number.isFinite(u) && u > 0;
      // Precision that follows the uncertainty (roundToUncertainty), else 6 significant digits.
      const rounded = typeof v === 'number' && hasU ? roundToUncertainty(v, u) : null;
      const shown = typeof v === 'number' ? cellNumber(cell) : null;
      line.push(
        shown !== null ? csvNumber(shown) : typeof v === 'string' ? neutralizeCsvText(v) : null,
      );
      if (c.kind === 'number' && c.range) {
        const range = cell?.range;
        line.push(range ? csvNumber(Number(range[0].toPrecision(2))) : null);
        line.push(range ? csvNumber(Number(range[1].toPrecision(2))) : null);
        line.push(cell?.origin ?? null);
      } else if (c.kind === 'number') {
        line.push(
          rounded
            ? csvNumber(rounded.sigma)
            : typeof u === 'number' && Number.isFinite(u)
              ? csvNumber(u)
              : null,
        );
        line.push(cell?.origin ?? null);
      }
    }
    line.push(neutralizeCsvText(r.flags.join('; ')), neutralizeCsvText(r.reasons.join('; ')));
    const w = r.worstExcipient ?? null;
    line.push(
      w ? neutralizeCsvText(w.name) : null,
      w ? csvNumber(w.probability) : null,
      w ? neutralizeCsvText(w.words) : null,
    );
    rows.push(line);
  }
  return rows;
}

/**
 * The lines after the table, separated from it by one empty line: where the numbers come from and the
 * cautions (src/chem/report) — an exported ranking always travels with them.
 */
export function csvFooter(model: SheetModel): string[] {
  return [
    `Comparison of ${model.compound.name} (project ${model.projectName}), made ${model.generatedAt} with Saltsmith ${model.appVersion}. Origin: estimated = model estimate, measured = bench data, input = entered by the user.`,
    ...(model.freeForm
      ? ['The first row is the free form itself (not ranked): read each salt against it.']
      : []),
    ...(model.separation
      ? [`What separates the candidates: ${model.separation.headline}`, ...model.separation.details]
      : []),
    ...model.notes.map((n) => `Note: ${n}`),
    ...CAUTION_LINES.map((l) => `Caution: ${l}`),
  ].map(neutralizeCsvText);
}

/**
 * The comparison as CSV (RFC 4180: comma separated, CRLF line ends, fields holding quotes, commas
 * or line breaks quoted, quotes doubled). The first line is the header (units in every heading), then
 * one line per candidate, then an empty line and the footer ({@link csvFooter}). Every text field is
 * quoted and formula-like text neutralised (OWASP CSV Injection); numbers are written bare so a
 * spreadsheet reads them as numbers; missing values are empty.
 */
export function sheetToCsv(model: SheetModel): string {
  const data: CsvValue[][] = [...sheetCsvRows(model), [''], ...csvFooter(model).map((l) => [l])];
  return Papa.unparse(
    data.map((row) => row.map((v) => (v === null ? '' : v))),
    {
      newline: '\r\n',
      quotes: (value: unknown) => typeof value === 'string' && value !== '',
      escapeFormulae: false,
    },
  );
}

/** A file name for the CSV download. */
export function sheetCsvFileName(projectName: string, isoDateTime: string): string {
  const safe =
    projectName
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/^[-.]+|[-.]+$/g, '')
      .slice(0, 60) || 'comparison';
  return `${safe}-comparison-${isoDateTime.slice(0, 10)}.csv`;
}
