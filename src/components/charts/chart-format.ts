/** Number formatting shared by the charts and their text alternatives. */

/** A value with 2–3 significant figures, no exponent below 1e-3…1e5. */
export function sig(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return '—';
  const a = Math.abs(x);
  if (a !== 0 && (a < 1e-3 || a >= 1e5)) return x.toExponential(digits - 1).replace('e', '×10^');
  if (a >= 100) return x.toFixed(0);
  return Number(x.toPrecision(digits)).toString();
}

/** kJ/mol value with its standard uncertainty: "−12 ± 30 kJ/mol". */
export function kjWithUncertainty(value: number, uncertainty: number): string {
  const minus = (s: string) => s.replace('-', '−');
  return `${minus(value.toFixed(0))} ± ${uncertainty.toFixed(0)} kJ/mol`;
}

/** Series colours of the workbench's charts (own palette, distinguishable in greyscale by dash too). */
export const SERIES_COLOURS = [
  '#1f6f6b',
  '#b4621b',
  '#5b4a9e',
  '#a3202a',
  '#3d7a2a',
  '#8a6d00',
  '#2f5d8a',
  '#7a3b69',
];
export const SERIES_DASHES = ['', '6 3', '2 3', '8 3 2 3', '4 4', '1 3', '10 4', '3 2 1 2'];
