import { roundToUncertainty, formatWithUncertainty } from '@/chem';
import type { SheetCell, ValueOrigin } from './sheet.types';

/** Short marks printed beside a number, explained in the sheet's legend (our own marks). */
export const ORIGIN_MARK: Record<ValueOrigin, { mark: string; words: string }> = {
  estimated: { mark: 'est.', words: 'model estimate' },
  measured: { mark: 'lab', words: 'measured on the bench' },
  input: { mark: 'in', words: 'entered by the user' },
};

/** Minus as the typographic minus sign, so negative numbers read well in print. */
const typographic = (s: string) => s.replace(/^-/, '\u2212');

/**
 * A number for print: to the decimal place of the uncertainty's second significant digit where an
 * uncertainty is known (GUM-style rounding, JCGM 100:2008 §7.2.6 asks for at most two significant
 * digits in the uncertainty), else 4 significant digits.
 */
export function formatValue(value: number, uncertainty?: number | null): string {
  if (!Number.isFinite(value)) return '—';
  if (uncertainty != null && Number.isFinite(uncertainty) && uncertainty > 0) {
    return formatWithUncertainty(value, uncertainty);
  }
  const a = Math.abs(value);
  if (a !== 0 && (a < 1e-3 || a >= 1e6)) return typographic(value.toExponential(3));
  return typographic(String(Number(value.toPrecision(4))));
}

/** A cell's printed text (without its origin mark). */
export function cellText(cell: SheetCell | undefined): string {
  if (!cell || cell.value === null || cell.value === undefined) return '—';
  if (typeof cell.value === 'number') {
    if (cell.range) {
      const [lo, hi] = cell.range.map((x) => formatValue(Number(x.toPrecision(2))));
      return `${formatValue(cellNumber(cell)!)} (±1σ ${lo}–${hi})`;
    }
    return formatValue(cell.value, cell.uncertainty);
  }
  return cell.value;
}

/** A numeric cell's value as printed and exported: at the precision of its 1σ when it has one. */
export function cellNumber(cell: SheetCell | undefined): number | null {
  if (!cell || typeof cell.value !== 'number') return null;
  // A ±1σ range of a factor of 1.2 or more supports two significant digits, as the Ranking shows.
  if (cell.range) return Number(cell.value.toPrecision(2));
  const u = cell.uncertainty;
  return u != null && Number.isFinite(u) && u > 0
    ? roundToUncertainty(cell.value, u).value
    : cell.value;
}
