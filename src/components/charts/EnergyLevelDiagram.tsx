import { kjWithUncertainty } from './chart-format';
import {
  LABEL_FONT_PX,
  drawingSize,
  energyDiagramLayout,
  type DiagramArrow,
  type DiagramLabel,
  type DiagramLevel,
  type EnergyCycle,
  type EnergyDiagramLayout,
} from './energy-diagram-layout';
import './charts.css';

export type { EnergyCycle, EnergyValue } from './energy-diagram-layout';

const ν = (n: number, label: string) => (n === 1 ? label : `${n} ${label}`);

/** The diagram's text alternative: every step with its uncertainty. */
function cycleCaption(cycle: EnergyCycle): string {
  const { lattice, cationHydration, anionHydration, solution } = cycle;
  return (
    `${cycle.saltLabel}: lattice dissociation ΔH_L = ${kjWithUncertainty(lattice.value, lattice.uncertainty)} (up, endothermic); ` +
    `hydration of ${ν(cycle.cationsPerFormula, cycle.cationLabel)} ${kjWithUncertainty(cationHydration.value, cationHydration.uncertainty)} and of ` +
    `${ν(cycle.anionsPerFormula, cycle.anionLabel)} ${kjWithUncertainty(anionHydration.value, anionHydration.uncertainty)} (down, exothermic); ` +
    `net ΔH_sol = ${kjWithUncertainty(solution.value, solution.uncertainty)}.`
  );
}

/**
 * The enthalpy cycle of dissolving one formula unit, as an energy-level diagram drawn to scale (one
 * kJ/mol is the same height everywhere): solid → gaseous ions (lattice, up), → cations hydrated (down),
 * → all ions hydrated (down); the net step solid → solution is ΔH_sol. Shaded bands show ±1σ on the
 * levels that carry an estimate's uncertainty. Plain SVG (placed by energy-diagram-layout.ts); the
 * caption is its text alternative.
 */
export function EnergyLevelDiagram({
  cycle,
  width = 560,
  height = 360,
}: {
  cycle: EnergyCycle;
  width?: number;
  height?: number;
}) {
  // A figure narrower than the labels need is drawn wider and scaled down to its width.
  const drawing = drawingSize(width, height);
  const layout = energyDiagramLayout(cycle, drawing.width, drawing.height);
  const caption = cycleCaption(cycle);
  return (
    <figure className="chart energy-levels">
      <svg
        viewBox={`0 0 ${drawing.width} ${drawing.height}`}
        width="100%"
        style={{ maxWidth: width }}
        role="img"
        aria-label={caption}
      >
        <EnthalpyAxis layout={layout} width={drawing.width} />
        {layout.levels.map((level, i) => (
          <Level key={`level-${i}`} level={level} />
        ))}
        {layout.arrows.map((arrow, i) => (
          <Arrow key={`arrow-${i}`} arrow={arrow} />
        ))}
        {layout.labels.map((label, i) => (
          <Label key={`label-${i}`} label={label} />
        ))}
      </svg>
      <figcaption>{caption}</figcaption>
    </figure>
  );
}

/** Grid lines with their kJ/mol ticks (zero dashed), the axis line and its title. */
function EnthalpyAxis({ layout, width }: { layout: EnergyDiagramLayout; width: number }) {
  const { y, ticks, axisX, top, bottom } = layout;
  return (
    <g>
      {ticks.map((t) => (
        <g key={t}>
          <line
            x1={axisX}
            x2={width - 10}
            y1={y(t)}
            y2={y(t)}
            stroke={t === 0 ? '#a99f8c' : '#eee6d6'}
            strokeDasharray={t === 0 ? '4 3' : ''}
          />
          <text x={axisX - 6} y={y(t) + 4} fontSize="10" textAnchor="end" fill="#41596a">
            {t.toFixed(0).replace('-', '−')}
          </text>
        </g>
      ))}
      <line x1={axisX} x2={axisX} y1={top} y2={bottom} stroke="#41596a" />
      <text
        x={12}
        y={(top + bottom) / 2}
        fontSize="11"
        fill="#41596a"
        transform={`rotate(-90 12 ${(top + bottom) / 2})`}
        textAnchor="middle"
      >
        enthalpy relative to the solid salt, kJ/mol
      </text>
    </g>
  );
}

/** One level: its line, and its ±1σ band when it carries an estimate's uncertainty. */
function Level({ level }: { level: DiagramLevel }) {
  return (
    <g>
      {level.band ? (
        <rect
          x={level.x1}
          width={level.x2 - level.x1}
          y={level.band.top}
          height={Math.max(1, level.band.bottom - level.band.top)}
          fill="#f3dcc2"
          opacity="0.75"
        />
      ) : null}
      <line
        x1={level.x1}
        x2={level.x2}
        y1={level.y}
        y2={level.y}
        stroke="#1d3a4a"
        strokeWidth="2.5"
      />
    </g>
  );
}

/** A vertical arrow from one level's height to another's. */
function Arrow({ arrow }: { arrow: DiagramArrow }) {
  const { x, y1, y2, head, colour } = arrow;
  const dir = y2 > y1 ? 1 : -1;
  return (
    <g>
      <line x1={x} x2={x} y1={y1} y2={y2 - dir * head} stroke={colour} strokeWidth="2.2" />
      <path
        d={`M ${x - 5} ${y2 - dir * head} L ${x + 5} ${y2 - dir * head} L ${x} ${y2} z`}
        fill={colour}
      />
    </g>
  );
}

function Label({ label }: { label: DiagramLabel }) {
  return (
    <text
      x={label.x}
      y={label.y}
      fontSize={LABEL_FONT_PX}
      textAnchor={label.anchor}
      fill={label.fill}
    >
      {label.text}
    </text>
  );
}
