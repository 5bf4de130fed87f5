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
import {
  ICH_M9_BAND,
  curveSummary,
  logTick,
  solubilityAxis,
  type SolubilitySeries,
} from './ph-solubility-scale';
import { useContainerWidth } from './use-container-width';
import './charts.css';

export { logTick, solubilityAxis, type SolubilitySeries } from './ph-solubility-scale';

/** Width where the container cannot be measured (no layout, e.g. jsdom), px. */
const FALLBACK_WIDTH_PX = 680;

/**
 * Solubility against pH on a log axis: the free form and each chosen salt, pH_max marked, the
 * dose-number line (dose / 250 mL, ICH M9 2019) and the pH 1.2–6.8 band shaded. Recharts; the list
 * under the chart is its text alternative. Without a `width` it fills its container's width.
 */
export function PhSolubilityChart({
  series,
  doseLineMgPerMl,
  width,
  height = 360,
  title = 'Solubility against pH',
}: {
  series: SolubilitySeries[];
  doseLineMgPerMl: number | null;
  /** Fixed width, px (the printed sheet); by default the container's width. */
  width?: number;
  height?: number;
  title?: string;
}) {
  const container = useContainerWidth<HTMLDivElement>(width ?? FALLBACK_WIDTH_PX);
  const { lo, hi, ticks } = solubilityAxis(series, doseLineMgPerMl);
  const summary = series.map(curveSummary);
  return (
    <figure className="chart ph-solubility">
      <div ref={container.ref} role="img" aria-label={`${title}. ${summary.join('; ')}`}>
        <LineChart
          width={width ?? container.width}
          height={height}
          margin={{ top: 10, right: 20, bottom: 26, left: 16 }}
        >
          <CartesianGrid stroke="#eee6d6" />
          <ReferenceArea
            x1={ICH_M9_BAND[0]}
            x2={ICH_M9_BAND[1]}
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
          {doseLineMgPerMl ? doseLine(doseLineMgPerMl) : null}
          {series.map(phMaxLine)}
          {series.map(curve)}
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

/** The highest dose dissolved in 250 mL, as a dashed line. */
function doseLine(mgPerMl: number) {
  return (
    <ReferenceLine
      y={mgPerMl}
      stroke="#a3202a"
      strokeDasharray="5 4"
      label={{
        value: `dose in 250 mL: ${sig(mgPerMl)} mg/mL`,
        position: 'insideTopRight',
        fill: '#a3202a',
        fontSize: 11,
      }}
    />
  );
}

/** A salt's pH_max as a dotted vertical line in its curve's colour, when it lies on the chart. */
function phMaxLine(s: SolubilitySeries, i: number) {
  if (s.phMax == null || s.phMax < 1 || s.phMax > 8) return null;
  return (
    <ReferenceLine
      key={`${s.id}-phmax`}
      x={s.phMax}
      stroke={SERIES_COLOURS[i % SERIES_COLOURS.length]}
      strokeDasharray="2 3"
    />
  );
}

/** One curve: the free form thick and dashed in ink, each salt in its own colour and dash. */
function curve(s: SolubilitySeries, i: number) {
  const free = s.kind === 'free-form';
  return (
    <Line
      key={s.id}
      data={s.points.filter((p) => p.solubilityMgPerMl > 0)}
      dataKey="solubilityMgPerMl"
      name={`${s.label}${s.estimated ? ' (est.)' : ''}`}
      stroke={free ? '#1d3a4a' : SERIES_COLOURS[i % SERIES_COLOURS.length]}
      strokeDasharray={free ? '7 4' : SERIES_DASHES[i % SERIES_DASHES.length]}
      strokeWidth={free ? 2.5 : 2}
      dot={false}
      isAnimationActive={false}
    />
  );
}
