import { PLATE_LAYOUTS, WELL_OUTCOME_LABELS, wellPosition, type PlatePlan } from '@/chem';
import type { ScreenPlanRecord } from '@/persistence/records';
import { ionColour } from '../screen-plan-model';

const CELL = 44;
const PAD = 26;
const ROWS = 'ABCDEFGH';

/**
 * The plate drawn from above: one circle per well, filled with its counter-ion's colour, labelled with
 * the well name; a recorded crystalline outcome gets a star, any other recorded outcome a dot. Clicking
 * a well picks it for the outcome form. The legend names each colour; the table below holds the same
 * data as text.
 */
export function PlateMap({
  plan,
  outcomes,
  ionNames,
  selected,
  onSelect,
}: {
  plan: PlatePlan;
  outcomes: ScreenPlanRecord['outcomes'];
  ionNames: Record<string, string>;
  selected: string | null;
  onSelect: (well: string) => void;
}) {
  const { rows, columns } = PLATE_LAYOUTS[plan.plate];
  const ionOrder = [...new Set(plan.wells.map((w) => w.counterIonId))];
  const colourOf = (id: string) => ionColour(ionOrder.indexOf(id));
  const width = PAD + columns * CELL + 8;
  const height = PAD + rows * CELL + 8;
  return (
    <figure className="plate-map">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        role="group"
        aria-label={`Plate map, ${plan.plate} wells`}
      >
        {Array.from({ length: columns }, (_, c) => (
          <text key={`c${c}`} x={PAD + c * CELL + CELL / 2} y={16} className="plate-axis">
            {c + 1}
          </text>
        ))}
        {Array.from({ length: rows }, (_, r) => (
          <text key={`r${r}`} x={10} y={PAD + r * CELL + CELL / 2 + 4} className="plate-axis">
            {ROWS[r]}
          </text>
        ))}
        {plan.emptyWells.map((well) => {
          const { row, column } = wellPosition(plan.plate, well);
          return (
            <circle
              key={well}
              cx={PAD + column * CELL + CELL / 2}
              cy={PAD + row * CELL + CELL / 2}
              r={CELL / 2 - 4}
              className="plate-well-empty"
            />
          );
        })}
        {plan.wells.map((w) => {
          const { row, column } = wellPosition(plan.plate, w.well);
          const cx = PAD + column * CELL + CELL / 2;
          const cy = PAD + row * CELL + CELL / 2;
          const o = outcomes[w.well];
          const crystalline =
            o?.outcome === 'crystalline-solid' || o?.outcome === 'new-crystalline-form';
          const label = `${w.well}: ${ionNames[w.counterIonId] ?? w.counterIonId} in ${w.solventName}${o ? `, ${WELL_OUTCOME_LABELS[o.outcome]}` : ''}`;
          return (
            <g
              key={w.well}
              className={`plate-well${selected === w.well ? ' is-selected' : ''}`}
              role="button"
              tabIndex={0}
              aria-label={label}
              onClick={() => onSelect(w.well)}
              onKeyDown={(e) => {
                if (e.key === 'Enter' || e.key === ' ') {
                  e.preventDefault();
                  onSelect(w.well);
                }
              }}
            >
              <title>{label}</title>
              <circle
                cx={cx}
                cy={cy}
                r={CELL / 2 - 4}
                fill={colourOf(w.counterIonId)}
                strokeDasharray={ionOrder.indexOf(w.counterIonId) >= 8 ? '3 2' : undefined}
              />
              <text x={cx} y={cy + 4} className="plate-well-label">
                {w.well}
              </text>
              {o ? (
                <text x={cx + 12} y={cy - 9} className="plate-well-mark">
                  {crystalline ? '★' : '•'}
                </text>
              ) : null}
            </g>
          );
        })}
      </svg>
      <figcaption>
        <ul className="plate-legend">
          {ionOrder.map((id) => (
            <li key={id}>
              <span
                className="plate-swatch"
                style={{ background: colourOf(id) }}
                aria-hidden="true"
              />
              {ionNames[id] ?? id}
            </li>
          ))}
          <li>★ crystalline outcome recorded · • other outcome recorded</li>
        </ul>
      </figcaption>
    </figure>
  );
}
