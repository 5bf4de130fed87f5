import { kjWithUncertainty } from './chart-format';
import { niceTicks } from './WhiskerBars';
import './charts.css';

export interface EnergyValue {
  value: number;
  uncertainty: number;
}

export interface EnergyCycle {
  /** Salt as named on screen, e.g. "Demorazine mesylate (1:1)". */
  saltLabel: string;
  cationLabel: string;
  anionLabel: string;
  cationsPerFormula: number;
  anionsPerFormula: number;
  /** Lattice dissociation enthalpy ΔH_L (> 0), kJ/mol. */
  lattice: EnergyValue;
  /** Hydration enthalpy of ALL cations of one formula unit (ν₊·ΔH_hyd,+ < 0), kJ/mol. */
  cationHydration: EnergyValue;
  /** Hydration enthalpy of ALL anions of one formula unit (ν₋·ΔH_hyd,− < 0), kJ/mol. */
  anionHydration: EnergyValue;
  /** ΔH_sol = ΔH_L + ν₊ΔH_hyd,+ + ν₋ΔH_hyd,−, kJ/mol, with its uncertainty carried through. */
  solution: EnergyValue;
}

/**
 * The enthalpy cycle of dissolving one formula unit, as an energy-level diagram drawn to scale (one
 * kJ/mol is the same height everywhere): solid → gaseous ions (lattice, up), → cations hydrated (down),
 * → all ions hydrated (down); the net step solid → solution is ΔH_sol. Shaded bands show ±1σ on the
 * levels that carry an estimate's uncertainty. Plain SVG; the caption is its text alternative.
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
  const { lattice, cationHydration, anionHydration, solution } = cycle;
  const levels = {
    solid: 0,
    gas: lattice.value,
    half: lattice.value + cationHydration.value,
    solution: lattice.value + cationHydration.value + anionHydration.value,
  };
  const values = [
    0,
    levels.gas + lattice.uncertainty,
    levels.half,
    levels.solution - solution.uncertainty,
    levels.solution + solution.uncertainty,
  ];
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = (hi - lo) * 0.08 || 10;
  const top = 16;
  const bottom = height - 20;
  const axisX = 64;
  const y = (v: number) => bottom - ((v - (lo - pad)) / (hi - lo + 2 * pad)) * (bottom - top);
  const col = (i: number) => axisX + 30 + i * ((width - axisX - 60) / 4);
  const levelW = (width - axisX - 60) / 4 - 14;
  const ticks = niceTicks(lo - pad, hi + pad, 6);
  const ν = (n: number, label: string) => (n === 1 ? label : `${n} ${label}`);

  const Level = ({ i, v, label, band }: { i: number; v: number; label: string; band?: number }) => (
    <g>
      {band ? (
        <rect
          x={col(i)}
          width={levelW}
          y={y(v + band)}
          height={Math.max(1, y(v - band) - y(v + band))}
          fill="#f3dcc2"
          opacity="0.75"
        />
      ) : null}
      <line
        x1={col(i)}
        x2={col(i) + levelW}
        y1={y(v)}
        y2={y(v)}
        stroke="#1d3a4a"
        strokeWidth="2.5"
      />
      <text x={col(i) + levelW / 2} y={y(v) - 5} fontSize="11" textAnchor="middle" fill="#1d3a4a">
        {label}
      </text>
    </g>
  );
  const Arrow = ({
    x,
    from,
    to,
    colour,
    label,
  }: {
    x: number;
    from: number;
    to: number;
    colour: string;
    label: string;
  }) => {
    const y1 = y(from);
    const y2 = y(to);
    const dir = y2 > y1 ? 1 : -1;
    const head = Math.min(8, Math.abs(y2 - y1) / 2);
    return (
      <g>
        <line x1={x} x2={x} y1={y1} y2={y2 - dir * head} stroke={colour} strokeWidth="2.2" />
        <path
          d={`M ${x - 5} ${y2 - dir * head} L ${x + 5} ${y2 - dir * head} L ${x} ${y2} z`}
          fill={colour}
        />
        <text x={x + 7} y={(y1 + y2) / 2} fontSize="11" fill={colour}>
          {label}
        </text>
      </g>
    );
  };

  const caption =
    `${cycle.saltLabel}: lattice dissociation ΔH_L = ${kjWithUncertainty(lattice.value, lattice.uncertainty)} (up, endothermic); ` +
    `hydration of ${ν(cycle.cationsPerFormula, cycle.cationLabel)} ${kjWithUncertainty(cationHydration.value, cationHydration.uncertainty)} and of ` +
    `${ν(cycle.anionsPerFormula, cycle.anionLabel)} ${kjWithUncertainty(anionHydration.value, anionHydration.uncertainty)} (down, exothermic); ` +
    `net ΔH_sol = ${kjWithUncertainty(solution.value, solution.uncertainty)}.`;

  return (
    <figure className="chart energy-levels">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        width="100%"
        style={{ maxWidth: width }}
        role="img"
        aria-label={caption}
      >
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
        <Level i={0} v={levels.solid} label="salt (s)" />
        <Level i={1} v={levels.gas} label="ions (g)" band={lattice.uncertainty} />
        <Level
          i={2}
          v={levels.half}
          label={`${cycle.cationLabel} (aq) + ${cycle.anionLabel} (g)`}
        />
        <Level i={3} v={levels.solution} label="ions (aq)" band={solution.uncertainty} />
        <Arrow
          x={col(1) - 8}
          from={levels.solid}
          to={levels.gas}
          colour="#b4621b"
          label={`ΔH_L ${lattice.value.toFixed(0)}`}
        />
        <Arrow
          x={col(2) - 8}
          from={levels.gas}
          to={levels.half}
          colour="#1f6f6b"
          label={`ΔH_hyd,+ ${cationHydration.value.toFixed(0).replace('-', '−')}`}
        />
        <Arrow
          x={col(3) - 8}
          from={levels.half}
          to={levels.solution}
          colour="#1f6f6b"
          label={`ΔH_hyd,− ${anionHydration.value.toFixed(0).replace('-', '−')}`}
        />
        <Arrow
          x={col(3) + levelW + 6}
          from={levels.solid}
          to={levels.solution}
          colour="#5b4a9e"
          label=""
        />
        <text
          x={col(3) + levelW + 2}
          y={y(levels.solution) + (levels.solution > 0 ? -14 : 16)}
          fontSize="11"
          fill="#5b4a9e"
          textAnchor="end"
        >
          ΔH_sol {solution.value.toFixed(0).replace('-', '−')} ± {solution.uncertainty.toFixed(0)}
        </text>
      </svg>
      <figcaption>{caption}</figcaption>
    </figure>
  );
}
