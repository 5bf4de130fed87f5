import { sig } from './chart-format';
import './charts.css';

export interface WhiskerRow {
  id: string;
  label: string;
  value: number;
  /** Standard uncertainty (1σ) drawn as a whisker ±u; omit for exact values. */
  uncertainty?: number;
  /** A second marker on the same row (e.g. a measured value, or a maximum error). */
  marker?: { value: number; label: string };
  /** Extra text shown at the end of the row. */
  note?: string;
}

/**
 * Horizontal bars from zero with ±1σ whiskers, drawn in plain SVG. Used for enthalpy comparisons,
 * rank robustness and model errors. The caption and the list under the chart are its text alternative.
 */
export function WhiskerBars({
  rows,
  unit,
  title,
  caption,
  domain,
  format = (x: number) => sig(x),
  width = 640,
  labelWidth = 190,
}: {
  rows: WhiskerRow[];
  unit: string;
  title: string;
  caption: string;
  domain?: [number, number];
  format?: (x: number) => string;
  width?: number;
  /** Width of the label column, px (labels longer than fits are shortened with an ellipsis). */
  labelWidth?: number;
}) {
  const scale = whiskerScale(rows, domain, width, labelWidth);
  const { x, ticks, labelW, plotW, top, height } = scale;
  return (
    <figure className="chart whisker-bars">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        width="100%"
        style={{ maxWidth: width }}
        role="img"
        aria-label={`${title}. ${caption}`}
      >
        {ticks.map((t) => (
          <g key={t}>
            <line x1={x(t)} x2={x(t)} y1={top - 4} y2={height - 20} stroke="#e3dccd" />
            <text x={x(t)} y={height - 6} fontSize="11" textAnchor="middle" fill="#41596a">
              {format(t)}
            </text>
          </g>
        ))}
        <line
          x1={x(0)}
          x2={x(0)}
          y1={top - 6}
          y2={height - 20}
          stroke="#1d3a4a"
          strokeWidth="1.5"
        />
        <text x={labelW + plotW} y={12} fontSize="11" textAnchor="end" fill="#41596a">
          {unit}
        </text>
        {rows.map((r, i) => (
          <WhiskerRowShape key={r.id} row={r} y={top + i * ROW_H} scale={scale} format={format} />
        ))}
      </svg>
      <figcaption>{caption}</figcaption>
    </figure>
  );
}

const ROW_H = 26;
type WhiskerScale = ReturnType<typeof whiskerScale>;

/** Columns (label, plot, value), the value axis over the rows' values ± 1σ and markers, and ticks. */
function whiskerScale(
  rows: WhiskerRow[],
  domain: [number, number] | undefined,
  width: number,
  labelW: number,
) {
  const valueW = 130;
  const plotW = Math.max(120, width - labelW - valueW - 16);
  const top = 22;
  const height = top + rows.length * ROW_H + 24;
  const lo =
    domain?.[0] ??
    Math.min(0, ...rows.map((r) => Math.min(r.value - (r.uncertainty ?? 0), r.marker?.value ?? 0)));
  const hi =
    domain?.[1] ??
    Math.max(0, ...rows.map((r) => Math.max(r.value + (r.uncertainty ?? 0), r.marker?.value ?? 0)));
  const span = hi - lo || 1;
  const x = (v: number) => labelW + ((Math.min(hi, Math.max(lo, v)) - lo) / span) * plotW;
  return { x, ticks: niceTicks(lo, hi, 5), labelW, plotW, top, height };
}

/** One row: its label (shortened to fit), the bar from zero, the ±1σ whisker, a marker, the value. */
function WhiskerRowShape({
  row: r,
  y,
  scale: { x, labelW, plotW },
  format,
}: {
  row: WhiskerRow;
  y: number;
  scale: WhiskerScale;
  format: (x: number) => string;
}) {
  const rowH = ROW_H;
  const maxChars = Math.floor(labelW / 6.6);
  const x0 = x(Math.min(0, r.value));
  const x1 = x(Math.max(0, r.value));
  const u = r.uncertainty ?? 0;
  return (
    <g>
      <text x={labelW - 8} y={y + rowH / 2 + 4} fontSize="12" textAnchor="end" fill="#1d3a4a">
        {r.label.length > maxChars ? `${r.label.slice(0, maxChars - 1)}…` : r.label}
        <title>{r.label}</title>
      </text>
      <rect
        x={x0}
        y={y + 6}
        width={Math.max(1, x1 - x0)}
        height={rowH - 12}
        fill={r.value < 0 ? '#7fb3ae' : '#e0a46b'}
      />
      {u > 0 ? (
        <g stroke="#1d3a4a" strokeWidth="1.4">
          <line x1={x(r.value - u)} x2={x(r.value + u)} y1={y + rowH / 2} y2={y + rowH / 2} />
          <line x1={x(r.value - u)} x2={x(r.value - u)} y1={y + 7} y2={y + rowH - 7} />
          <line x1={x(r.value + u)} x2={x(r.value + u)} y1={y + 7} y2={y + rowH - 7} />
        </g>
      ) : null}
      {r.marker ? (
        <path
          d={`M ${x(r.marker.value)} ${y + 5} l 6 ${rowH / 2 - 5} l -6 ${rowH / 2 - 5} l -6 ${-(rowH / 2 - 5)} z`}
          fill="#5b4a9e"
          stroke="#fff"
        >
          <title>{r.marker.label}</title>
        </path>
      ) : null}
      <text x={labelW + plotW + 8} y={y + rowH / 2 + 4} fontSize="11" fill="#1d3a4a">
        {format(r.value)}
        {u > 0 ? ` ± ${format(u)}` : ''}
        {r.note ? ` ${r.note}` : ''}
      </text>
    </g>
  );
}

/** About `count` round tick values covering [lo, hi]. */
export function niceTicks(lo: number, hi: number, count: number): number[] {
  const span = hi - lo;
  if (!(span > 0)) return [lo];
  const raw = span / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step =
    [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => span / s <= count + 0.5) ?? 10 * mag;
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi + step * 1e-9; t += step)
    ticks.push(Number(t.toPrecision(12)));
  return ticks;
}
