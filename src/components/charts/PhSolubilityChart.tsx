import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceLine,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { SERIES_COLOURS, SERIES_DASHES, sig } from './chart-format';
import './charts.css';

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

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** Tick label of a log axis: plain numbers from 0.001 to 1000, powers of ten beyond. */
export function logTick(v: number): string {
  const k = Math.round(Math.log10(v));
  if (k >= -3 && k <= 3) return String(Number(v.toPrecision(2)));
  return `10${String(k)
    .split('')
    .map((c) => SUPERSCRIPT[c] ?? c)
    .join('')}`;
}

/** ICH M9 (2019) pH range for the solubility class: 1.2–6.8. */
const BAND: [number, number] = [1.2, 6.8];

/**
 * The y-axis of the pH chart, sized to its data: from the decade at or below the lowest value to the
 * decade at or above the highest salt value or dose line (the free form's curve climbs without bound at low pH for a
 * base, so it alone does not set the top).
 */
export function solubilityAxis(
  series: SolubilitySeries[],
  doseLineMgPerMl: number | null,
): { lo: number; hi: number; ticks: number[] } {
  const positive = (xs: number[]) => xs.filter((x) => x > 0 && Number.isFinite(x));
  const all = positive(series.flatMap((s) => s.points.map((p) => p.solubilityMgPerMl)));
  if (doseLineMgPerMl && doseLineMgPerMl > 0) all.push(doseLineMgPerMl);
  const salts = positive(
    series
      .filter((s) => s.kind === 'salt')
      .flatMap((s) => s.points.map((p) => p.solubilityMgPerMl)),
  );
  const lo = all.length ? 10 ** Math.floor(Math.log10(Math.min(...all))) : 1e-3;
  const top = Math.max(...(salts.length ? salts : all), doseLineMgPerMl ?? 0);
  const hi = all.length
    ? Math.max(lo * 10, 10 ** Math.ceil(Math.log10(Math.min(Math.max(...all), top))))
    : 1e3;
  const ticks: number[] = [];
  for (let t = lo; t <= hi * 1.0001; t *= 10) ticks.push(t);
  return { lo, hi, ticks };
}

/**
 * Solubility against pH on a log axis: the free form and each chosen salt, pH_max marked, the
 * dose-number line (dose / 250 mL, ICH M9 2019) and the pH 1.2–6.8 band shaded. Recharts; the list
 * under the chart is its text alternative.
 */
export function PhSolubilityChart({
  series,
  doseLineMgPerMl,
  width = 680,
  height = 360,
  title = 'Solubility against pH',
}: {
  series: SolubilitySeries[];
  doseLineMgPerMl: number | null;
  width?: number;
  height?: number;
  title?: string;
}) {
  const { lo, hi, ticks } = solubilityAxis(series, doseLineMgPerMl);
  const summary = series.map((s) => {
    const inBand = s.points.filter((p) => p.pH >= BAND[0] - 1e-9 && p.pH <= BAND[1] + 1e-9);
    const worst = inBand.reduce(
      (a, b) => (b.solubilityMgPerMl < a.solubilityMgPerMl ? b : a),
      inBand[0] ?? s.points[0]!,
    );
    // For a salt, the highest point of the band is its plateau below pH_max (the salt's own solubility).
    const best = inBand.reduce(
      (a, b) => (b.solubilityMgPerMl > a.solubilityMgPerMl ? b : a),
      inBand[0] ?? s.points[0]!,
    );
    const plateau =
      s.kind === 'salt'
        ? `, highest ${sig(best?.solubilityMgPerMl ?? Number.NaN)} mg/mL at pH ${best?.pH.toFixed(1)}`
        : '';
    return `${s.label}${s.estimated ? ' (estimated)' : ''}: ${s.phMax != null ? `pH_max ${s.phMax.toFixed(2)}, ` : ''}lowest in pH 1.2–6.8 ${sig(worst?.solubilityMgPerMl ?? Number.NaN)} mg/mL at pH ${worst?.pH.toFixed(1)}${plateau}`;
  });
  return (
    <figure className="chart ph-solubility">
      <div role="img" aria-label={`${title}. ${summary.join('; ')}`}>
        <LineChart
          width={width}
          height={height}
          margin={{ top: 10, right: 20, bottom: 26, left: 16 }}
        >
          <CartesianGrid stroke="#eee6d6" />
          <ReferenceArea
            x1={BAND[0]}
            x2={BAND[1]}
            fill="#e7f0ee"
            fillOpacity={0.7}
            ifOverflow="hidden"
          />
          <XAxis
            dataKey="pH"
            type="number"
            domain={[1, 8]}
            ticks={[1, 2, 3, 4, 5, 6, 7, 8]}
            label={{ value: 'pH', position: 'insideBottom', offset: -14 }}
            allowDuplicatedCategory={false}
          />
          <YAxis
            scale="log"
            type="number"
            domain={[lo, hi]}
            ticks={ticks}
            allowDataOverflow
            tickFormatter={logTick}
            label={{
              value: 'solubility, mg/mL (log)',
              angle: -90,
              position: 'insideLeft',
              offset: 2,
              dy: 70,
            }}
            width={70}
          />
          <Tooltip
            formatter={(v) => `${sig(Number(v))} mg/mL`}
            labelFormatter={(l) => `pH ${Number(l).toFixed(1)}`}
          />
          <Legend verticalAlign="top" height={28} />
          {doseLineMgPerMl ? (
            <ReferenceLine
              y={doseLineMgPerMl}
              stroke="#a3202a"
              strokeDasharray="5 4"
              label={{
                value: `dose in 250 mL: ${sig(doseLineMgPerMl)} mg/mL`,
                position: 'insideTopRight',
                fill: '#a3202a',
                fontSize: 11,
              }}
            />
          ) : null}
          {series.map((s, i) =>
            s.phMax != null && s.phMax >= 1 && s.phMax <= 8 ? (
              <ReferenceLine
                key={`${s.id}-phmax`}
                x={s.phMax}
                stroke={SERIES_COLOURS[i % SERIES_COLOURS.length]}
                strokeDasharray="2 3"
              />
            ) : null,
          )}
          {series.map((s, i) => (
            <Line
              key={s.id}
              data={s.points.filter((p) => p.solubilityMgPerMl > 0)}
              dataKey="solubilityMgPerMl"
              name={`${s.label}${s.estimated ? ' (est.)' : ''}`}
              stroke={
                s.kind === 'free-form' ? '#1d3a4a' : SERIES_COLOURS[i % SERIES_COLOURS.length]
              }
              strokeDasharray={
                s.kind === 'free-form' ? '7 4' : SERIES_DASHES[i % SERIES_DASHES.length]
              }
              strokeWidth={s.kind === 'free-form' ? 2.5 : 2}
              dot={false}
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </div>
      <figcaption>
        {title}. Shaded: pH 1.2–6.8 (ICH M9); red dashed line: highest dose dissolved in 250 mL — a
        curve below it means dose number above 1 at that pH; thin dotted vertical lines: each salt’s
        pH_max, in its curve’s colour.
        <ul className="chart-summary">
          {summary.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
