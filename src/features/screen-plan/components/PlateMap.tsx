import {
  PLATE_LAYOUTS,
  WELL_OUTCOME_LABELS,
  wellPosition,
  type PlannedWell,
  type PlatePlan,
} from '@/chem';
import type { ScreenPlanRecord, StoredWellOutcome } from '@/persistence/records';
import { ionColour } from '../screen-plan-model';

const CELL = 44;
const PAD = 26;
const ROWS = 'ABCDEFGH';

/** The centre of a well in the drawing. */
function wellCentre(plate: PlatePlan['plate'], well: string) {
  const { row, column } = wellPosition(plate, well);
  return { cx: PAD + column * CELL + CELL / 2, cy: PAD + row * CELL + CELL / 2 };
}

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
        <PlateAxes rows={rows} columns={columns} />
        {plan.emptyWells.map((well) => {
          const { cx, cy } = wellCentre(plan.plate, well);
          return (
            <circle key={well} cx={cx} cy={cy} r={CELL / 2 - 4} className="plate-well-empty" />
          );
        })}
        {plan.wells.map((w) => (
          <PlateWell
            key={w.well}
            plate={plan.plate}
            well={w}
            outcome={outcomes[w.well]}
            ionName={ionNames[w.counterIonId] ?? w.counterIonId}
            colour={colourOf(w.counterIonId)}
            dashed={ionOrder.indexOf(w.counterIonId) >= 8}
            selected={selected === w.well}
            onSelect={onSelect}
          />
        ))}
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

/** Column numbers along the top, row letters down the side. */
function PlateAxes({ rows, columns }: { rows: number; columns: number }) {
  return (
    <>
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
    </>
  );
}

/** One planned well: a button in the drawing, its colour, name and recorded-outcome mark. */
function PlateWell({
  plate,
  well: w,
  outcome: o,
  ionName,
  colour,
  dashed,
  selected,
  onSelect,
}: {
  plate: PlatePlan['plate'];
  well: PlannedWell;
  outcome: StoredWellOutcome | undefined;
  ionName: string;
  colour: string;
  dashed: boolean;
  selected: boolean;
  onSelect: (well: string) => void;
}) {
  const { cx, cy } = wellCentre(plate, w.well);
  const crystalline = o?.outcome === 'crystalline-solid' || o?.outcome === 'new-crystalline-form';
  const label = `${w.well}: ${ionName} in ${w.solventName}${o ? `, ${WELL_OUTCOME_LABELS[o.outcome]}` : ''}`;
  return (
    <g
      className={`plate-well${selected ? ' is-selected' : ''}`}
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
        fill={colour}
        strokeDasharray={dashed ? '3 2' : undefined}
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
}
