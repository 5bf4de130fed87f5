import { sig } from './chart-format';
import './charts.css';

export interface ParityPoint {
  id: string;
  label: string;
  measured: number;
  predicted: number;
  /** A second prediction of the same value drawn beside it (e.g. a baseline method). */
  other?: number;
}

/**
 * Predicted against measured on equal axes with the line of perfect agreement, in plain SVG: filled
 * circles for the model, hollow squares for the comparison method. The caption is its text alternative.
 */
export function ParityPlot({
  points,
  title,
  unit,
  modelName,
  otherName,
  size = 220,
}: {
  points: ParityPoint[];
  title: string;
  unit: string;
  modelName: string;
  otherName?: string;
  size?: number;
}) {
  const pad = 34;
  const { s, y, ticks, lo, hi } = parityScale(points, size, pad);
  const words = points
    .map(
      (p) =>
        `${p.label}: measured ${sig(p.measured)}, ${modelName} ${sig(p.predicted)}${p.other === undefined || !otherName ? '' : `, ${otherName} ${sig(p.other)}`}`,
    )
    .join('; ');
  return (
    <figure className="chart parity">
      <svg width={size} height={size} role="img" aria-label={`${title}. ${words}`}>
        <title>{title}</title>
        <line x1={s(lo)} y1={y(lo)} x2={s(hi)} y2={y(hi)} stroke="#b9ad95" strokeDasharray="4 3" />
        <line x1={pad} y1={size - pad} x2={size - pad} y2={size - pad} stroke="#6b6355" />
        <line x1={pad} y1={pad} x2={pad} y2={size - pad} stroke="#6b6355" />
        {ticks.map((t) => (
          <g key={t} fontSize="10" fill="#4a443a">
            <text x={s(t)} y={size - pad + 13} textAnchor="middle">
              {t}
            </text>
            <text x={pad - 5} y={y(t) + 3} textAnchor="end">
              {t}
            </text>
          </g>
        ))}
        <text x={size / 2} y={size - 4} textAnchor="middle" fontSize="10">
          measured, {unit}
        </text>
        <text
          x={10}
          y={size / 2}
          textAnchor="middle"
          fontSize="10"
          transform={`rotate(-90 10 ${size / 2})`}
        >
          predicted
        </text>
        <ParityMarks points={points} s={s} y={y} />
      </svg>
      <figcaption className="muted small-note">
        {title}: filled circles {modelName}
        {otherName ? `, hollow squares ${otherName}` : ''}; dashed line = perfect agreement.
      </figcaption>
    </figure>
  );
}

/** Equal axes over every value shown, widened to whole units, with about four whole-number ticks. */
function parityScale(points: ParityPoint[], size: number, pad: number) {
  const all = points
    .flatMap((p) => [p.measured, p.predicted, ...(p.other === undefined ? [] : [p.other])])
    .filter(Number.isFinite);
  const lo = Math.floor(Math.min(...all) - 0.25);
  const hi = Math.ceil(Math.max(...all) + 0.25);
  const s = (v: number) => pad + ((v - lo) / (hi - lo)) * (size - 2 * pad);
  const y = (v: number) => size - s(v);
  const ticks: number[] = [];
  for (let t = lo; t <= hi; t += Math.max(1, Math.round((hi - lo) / 4))) ticks.push(t);
  return { s, y, ticks, lo, hi };
}

/** The points: hollow squares for the comparison method, filled circles for the model. */
function ParityMarks({
  points,
  s,
  y,
}: {
  points: ParityPoint[];
  s: (v: number) => number;
  y: (v: number) => number;
}) {
  return (
    <>
      {points.map((p) =>
        p.other === undefined ? null : (
          <rect
            key={`${p.id}-o`}
            x={s(p.measured) - 3.5}
            y={y(p.other) - 3.5}
            width={7}
            height={7}
            fill="none"
            stroke="#b4621b"
            strokeWidth={1.4}
          />
        ),
      )}
      {points.map((p) => (
        <circle key={p.id} cx={s(p.measured)} cy={y(p.predicted)} r={4} fill="#1f6f6b" />
      ))}
    </>
  );
}
