import { memo } from 'react';
import { sig } from '@/components/charts/chart-format';
import { formatWithUncertainty } from '@/chem';
import type { DisplayRow } from '../ranking-rows';
import { SolutionEnthalpyCell } from './SolutionEnthalpyCell';
import { DoseCell, Origin, ScoreBar } from './RankingCells';
import { SaltWaterCell } from './SaltWaterCell';

const minus = (s: string) => s.replace(/^-/, '−');

/** Cells that depend on the screen only, not on the weights: re-rendered only when the screen changes. */
const sameScreenRow = (a: { r: DisplayRow }, b: { r: DisplayRow }) =>
  a.r.row === b.r.row && a.r.label === b.r.label;

const CandidateCell = memo(
  function CandidateCellView({ r, onFocus }: { r: DisplayRow; onFocus?: (id: string) => void }) {
    return (
      <th scope="row" className="cand-cell">
        {onFocus ? (
          <button
            type="button"
            className="link-button"
            onClick={() => onFocus(r.id)}
            title="Open its energy picture"
          >
            {r.label}
          </button>
        ) : (
          r.label
        )}
        <span className="muted small-note">
          {r.acceptabilityClass ? `class ${r.acceptabilityClass}` : 'no class'}
          {r.row.hydrateWater ? ` · ${r.row.hydrateWater} H₂O` : ''}
        </span>
      </th>
    );
  },
  (a, b) => sameScreenRow(a, b) && a.onFocus === b.onFocus,
);

interface FixedCellsProps {
  r: DisplayRow;
  /** The reasons are shown (folded until asked, so a row stays light while the order moves). */
  open: boolean;
  onToggle: (id: string) => void;
}

const FixedCells = memo(
  function FixedCellsView({ r, open, onToggle }: FixedCellsProps) {
    const row = r.row;
    const reasonsId = `why-${r.id}`;
    return (
      <>
        <td>
          {r.deltaPka === null ? '—' : minus(r.deltaPka.toFixed(r.deltaPkaDecimals ?? 1))}
          {row.saltFormation ? (
            <span className="muted small-note">{row.saltFormation.band}</span>
          ) : null}
        </td>
        <SaltWaterCell
          s={r.saltWater}
          poorlySoluble={row.flags.some((f) => f.id === 'likely-poorly-soluble')}
        />
        {r.phMax ? (
          <td>
            {r.phMax.sigma !== undefined
              ? formatWithUncertainty(r.phMax.value, r.phMax.sigma)
              : r.phMax.value.toFixed(1)}{' '}
            <Origin n={r.phMax} />
          </td>
        ) : (
          <td className="muted">none in 0–14</td>
        )}
        <DoseCell d={r.worstDose} />
        <DoseCell d={r.gastricDose} />
        <SolutionEnthalpyCell h={r.solutionEnthalpy} />
        <td>
          {(r.activeFraction * 100).toFixed(0)} %
          {r.saltMassPerDoseMg !== null ? (
            <span className="muted small-note">{sig(r.saltMassPerDoseMg)} mg salt/dose</span>
          ) : null}
        </td>
        <td className="reasons-cell">
          {row.error ? <p className="field-error">Not screened: {row.error}</p> : null}
          {row.flags
            .filter((f) => f.id !== 'estimated-ksp')
            .map((f) => (
              <span key={f.id} className={`flag flag-${f.id}`} title={f.rule}>
                {f.text}
              </span>
            ))}
          {row.reasons.length ? (
            <button
              type="button"
              className="why-button"
              aria-expanded={open}
              aria-controls={open ? reasonsId : undefined}
              onClick={() => onToggle(r.id)}
            >
              Why ({row.reasons.length})
            </button>
          ) : null}
          {open && row.reasons.length ? (
            <ul className="reasons" id={reasonsId}>
              {row.reasons.map((x, i) => (
                <li key={i} className={`reason-${x.kind}`}>
                  {x.text}
                </li>
              ))}
              {row.flags.map((f) => (
                <li key={`rule-${f.id}`} className="reason-note">
                  Rule behind “{f.text}”: {f.rule}
                </li>
              ))}
            </ul>
          ) : null}
        </td>
      </>
    );
  },
  (a, b) => sameScreenRow(a, b) && a.open === b.open && a.onToggle === b.onToggle,
);

interface RankingRowProps extends FixedCellsProps {
  onFocus?: ((id: string) => void) | undefined;
}

const sameParts = (a: DisplayRow['contributions'], b: DisplayRow['contributions']) => {
  if (a === b) return true;
  const ka = Object.keys(a) as (keyof typeof a)[];
  return ka.length === Object.keys(b).length && ka.every((k) => a[k] === b[k]);
};

/**
 * One candidate's row, keyed by its id so it stays mounted while the order moves. A weight change
 * builds new row objects (ranking-rows.ts) but re-renders only the rows whose rank, score or score
 * parts changed; the screen-only cells below are memoised on the screen row itself.
 */
export const RankingRow = memo(
  function RankingRowView({ r, open, onToggle, onFocus }: RankingRowProps) {
    return (
      <tr className={r.row.error ? 'row-error' : undefined}>
        <td className="rank-cell">
          <span className="fixed-box rank-box">{r.rank ?? '—'}</span>
        </td>
        <CandidateCell r={r} onFocus={onFocus} />
        <td className="score-cell">
          <span className="fixed-box score-box">
            <ScoreBar row={r} />
          </span>
        </td>
        <FixedCells r={r} open={open} onToggle={onToggle} />
      </tr>
    );
  },
  (a, b) =>
    sameScreenRow(a, b) &&
    a.r.rank === b.r.rank &&
    a.r.score === b.r.score &&
    sameParts(a.r.contributions, b.r.contributions) &&
    a.open === b.open &&
    a.onToggle === b.onToggle &&
    a.onFocus === b.onFocus,
);
