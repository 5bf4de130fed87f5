import { sig } from './chart-format';
import { superscript } from '@/chem';

export interface SolubilitySeries {
  id: string;
  label: string;
  kind: 'free-form' | 'salt';
  points: { pH: number; solubilityMgPerMl: number }[];
  /** pH_max of the salt, when it falls in the plotted range. */
  phMax?: number | null;
  /** True when the curve rests on an estimated K_sp (not a measured salt solubility). */
  estimated?: boolean;
}

/** ICH M9 (2019) pH range for the solubility class: 1.2–6.8. */
export const ICH_M9_BAND: [number, number] = [1.2, 6.8];

/** Tick label of a log axis: plain numbers from 0.001 to 1000, powers of ten beyond ("2×10⁴"). */
export function logTick(v: number): string {
  const k = Math.floor(Math.log10(v) + 1e-9);
  if (k >= -3 && k <= 3) return String(Number(v.toPrecision(2)));
  const power = `10${superscript(String(k))}`;
  const mantissa = Number((v / 10 ** k).toPrecision(2));
  return mantissa === 1 ? power : `${mantissa}×${power}`;
}

/** The 1–2–5 steps of each decade: the axis ends on one of them. */
const STEPS = [1, 2, 5];

/** The largest 1–2–5 value at or below x. */
function stepAtOrBelow(x: number): number {
  const k = Math.floor(Math.log10(x));
  const candidates = [...STEPS, 10].map((m) => m * 10 ** k).filter((v) => v <= x * (1 + 1e-9));
  return Math.max(...candidates);
}

/** The smallest 1–2–5 value at or above x. */
function stepAtOrAbove(x: number): number {
  const k = Math.floor(Math.log10(x));
  const candidates = [...STEPS, 10].map((m) => m * 10 ** k).filter((v) => v >= x * (1 - 1e-9));
  return Math.min(...candidates);
}

/**
 * The y-axis of the pH chart, sized to its data: from the 1–2–5 value at or below the lowest value to
 * the 1–2–5 value at or above the highest salt value or dose line (the free form's curve climbs
 * without bound at low pH for a base, so it alone does not set the top); ticks at the decades
 * inside, and at both ends.
 */
export function solubilityAxis(
  series: SolubilitySeries[],
  doseLineMgPerMl: number | null,
): { lo: number; hi: number; ticks: number[] } {
  const positive = (xs: number[]) => xs.filter((x) => x > 0 && Number.isFinite(x));
  const all = positive(series.flatMap((s) => s.points.map((p) => p.solubilityMgPerMl)));
  if (doseLineMgPerMl && doseLineMgPerMl > 0) all.push(doseLineMgPerMl);
  if (!all.length) return { lo: 1e-3, hi: 1e3, ticks: [1e-3, 1e-2, 1e-1, 1, 10, 100, 1e3] };
  const salts = positive(
    series
      .filter((s) => s.kind === 'salt')
      .flatMap((s) => s.points.map((p) => p.solubilityMgPerMl)),
  );
  const lo = stepAtOrBelow(Math.min(...all));
  const top = Math.max(...(salts.length ? salts : all), doseLineMgPerMl ?? 0);
  const hi = Math.max(stepAtOrAbove(Math.min(Math.max(...all), top)), stepAtOrAbove(lo * 1.01));
  const ticks = [lo];
  for (let k = Math.ceil(Math.log10(lo) - 1e-9); 10 ** k < hi * (1 - 1e-9); k++)
    if (10 ** k > lo * (1 + 1e-9)) ticks.push(10 ** k);
  ticks.push(hi);
  return { lo, hi, ticks };
}

/**
 * One curve in words: pH_max, the lowest solubility in pH 1.2–6.8 and, for a salt, the highest (its
 * plateau below pH_max, the salt's own solubility).
 */
export function curveSummary(s: SolubilitySeries): string {
  const [from, to] = ICH_M9_BAND;
  const inBand = s.points.filter((p) => p.pH >= from - 1e-9 && p.pH <= to + 1e-9);
  const worst = inBand.reduce(
    (a, b) => (b.solubilityMgPerMl < a.solubilityMgPerMl ? b : a),
    inBand[0] ?? s.points[0]!,
  );
  const best = inBand.reduce(
    (a, b) => (b.solubilityMgPerMl > a.solubilityMgPerMl ? b : a),
    inBand[0] ?? s.points[0]!,
  );
  const plateau =
    s.kind === 'salt'
      ? `, highest ${sig(best?.solubilityMgPerMl ?? Number.NaN)} mg/mL at pH ${best?.pH.toFixed(1)}`
      : '';
  return `${s.label}${s.estimated ? ' (estimated)' : ''}: ${s.phMax != null ? `pH_max ${s.phMax.toFixed(2)}, ` : ''}lowest in pH 1.2–6.8 ${sig(worst?.solubilityMgPerMl ?? Number.NaN)} mg/mL at pH ${worst?.pH.toFixed(1)}${plateau}`;
}
