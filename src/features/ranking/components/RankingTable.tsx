import { memo } from 'react';
import { CRITERIA } from '@/chem';
import { sig } from '@/components/charts/chart-format';
import { useRankingViewStore, type RankingSortKey } from '@/stores/ranking-view-store';
import { CRITERION_TEXT } from '@/features/screening-data/criteria';
import { sortRows, type DisplayRow, type ShownNumber } from '../ranking-rows';

const minus = (s: string) => s.replace(/^-/, '−');

function Origin({ n }: { n: Pick<ShownNumber, 'origin' | 'basis'> }) {
  return (
    <span className={`origin origin-${n.origin}`} title={n.basis}>
      {n.origin === 'measured' ? 'meas.' : 'est.'}
      <span className="sr-only"> ({n.basis})</span>
    </span>
  );
}

function Sortable({ k, children, title }: { k: RankingSortKey; children: React.ReactNode; title?: string }) {
  const sortKey = useRankingViewStore((s) => s.sortKey);
  const dir = useRankingViewStore((s) => s.sortDir);
  const sortBy = useRankingViewStore((s) => s.sortBy);
  const active = sortKey === k;
  return (
    <th scope="col" aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : 'none'} title={title}>
      <button type="button" className="sort-button" onClick={() => sortBy(k)}>
        {children}
        <span aria-hidden="true" className="sort-mark">
          {active ? (dir === 'asc' ? '▲' : '▼') : '↕'}
        </span>
      </button>
    </th>
  );
}

function ScoreBar({ row }: { row: DisplayRow }) {
  if (row.score === null) return <span className="muted">—</span>;
  const parts = CRITERIA.map((k, i) => ({ k, v: row.contributions[k] ?? 0, i }));
  const text = parts
    .filter((p) => p.v > 0.0005)
    .map((p) => `${CRITERION_TEXT[p.k].label} ${(p.v * 100).toFixed(0)}`)
    .join(', ');
  return (
    <span className="score">
      <strong>{row.score.toFixed(2)}</strong>
      <span className="score-bar" role="img" aria-label={`score parts: ${text}`}>
        {parts.map((p) => (
          <span key={p.k} className={`score-part part-${p.i}`} style={{ width: `${p.v * 100}%` }} />
        ))}
      </span>
    </span>
  );
}

function Dose({ d }: { d: (ShownNumber & { pH?: number }) | null }) {
  if (!d) return <span className="muted">—</span>;
  const bad = d.value > 1;
  return (
    <span className={bad ? 'dose-bad' : 'dose-ok'}>
      {sig(d.value, 2)}
      {d.pH !== undefined ? <span className="unit"> at pH {d.pH}</span> : null}{' '}
      <Origin n={d} />
      {d.range ? (
        <span className="range">
          {' '}
          ±1σ {sig(d.range[0], 2)}–{sig(d.range[1], 2)}
        </span>
      ) : null}
    </span>
  );
}

/** Cells that depend on the screen only, not on the weights: re-rendered only when the screen changes. */
const sameScreenRow = (a: { r: DisplayRow }, b: { r: DisplayRow }) => a.r.row === b.r.row && a.r.label === b.r.label;

const CandidateCell = memo(function CandidateCellView({ r, onFocus }: { r: DisplayRow; onFocus?: (id: string) => void }) {
  return (
    <th scope="row" className="cand-cell">
      {onFocus ? (
        <button type="button" className="link-button" onClick={() => onFocus(r.id)} title="Open its energy picture">
          {r.label}
        </button>
      ) : (
        r.label
      )}
      <div className="muted small-note">
        {r.acceptabilityClass ? `class ${r.acceptabilityClass}` : 'no class'}
        {r.row.hydrateWater ? ` · ${r.row.hydrateWater} H₂O` : ''}
      </div>
    </th>
  );
}, (a, b) => sameScreenRow(a, b) && a.onFocus === b.onFocus);

const FixedCells = memo(function FixedCellsView({ r }: { r: DisplayRow }) {
  return (
    <>
      <td>
        {r.deltaPka === null ? '—' : minus(r.deltaPka.toFixed(1))}
        {r.row.saltFormation ? <div className="muted small-note">{r.row.saltFormation.band}</div> : null}
      </td>
      <td>
        {r.phMax ? (
          <>
            {r.phMax.value.toFixed(1)} <span className="range">± {r.phMax.sigma?.toFixed(1)}</span> <Origin n={r.phMax} />
          </>
        ) : (
          <span className="muted">none in 0–14</span>
        )}
      </td>
      <td>
        <Dose d={r.worstDose} />
      </td>
      <td>
        <Dose d={r.gastricDose} />
      </td>
      <td>
        {r.solutionEnthalpy ? (
          <>
            {minus(r.solutionEnthalpy.value.toFixed(0))}
            {r.solutionEnthalpy.sigma !== undefined ? <span className="range"> ± {r.solutionEnthalpy.sigma.toFixed(0)}</span> : null}{' '}
            <Origin n={r.solutionEnthalpy} />
          </>
        ) : (
          <span className="muted">—</span>
        )}
      </td>
      <td>
        {(r.activeFraction * 100).toFixed(0)} %
        {r.saltMassPerDoseMg !== null ? <div className="muted small-note">{sig(r.saltMassPerDoseMg)} mg salt/dose</div> : null}
      </td>
      <td className="reasons-cell">
        {r.row.error ? <p className="field-error">Not screened: {r.row.error}</p> : null}
        {r.row.flags.filter((f) => f.id !== 'estimated-ksp').map((f) => (
          <span key={f.id} className={`flag flag-${f.id}`} title={f.rule}>
            {f.text}
          </span>
        ))}
        {r.row.reasons.length ? (
          <details>
            <summary>Why ({r.row.reasons.length})</summary>
            <ul className="reasons">
              {r.row.reasons.map((x, i) => (
                <li key={i} className={`reason reason-${x.kind}`}>
                  {x.text}
                </li>
              ))}
              {r.row.flags.map((f) => (
                <li key={`rule-${f.id}`} className="reason reason-note">
                  Rule behind “{f.text}”: {f.rule}
                </li>
              ))}
            </ul>
          </details>
        ) : null}
      </td>
    </>
  );
}, sameScreenRow);

/** The ranked shortlist: sortable, each number with unit, uncertainty and origin, reasons in words. */
/** Memoised: a slider movement re-renders the area at once, the table only when the ranking changes. */
export const RankingTable = memo(function RankingTableView({ rows, onFocus }: { rows: DisplayRow[]; onFocus?: (id: string) => void }) {
  const sortKey = useRankingViewStore((s) => s.sortKey);
  const dir = useRankingViewStore((s) => s.sortDir);
  const sorted = sortRows(rows, sortKey, dir);
  return (
    <div className="table-scroll">
      <table className="data-table ranking-table">
        <caption className="sr-only">
          Ranked candidates. Columns: rank, candidate, score, ΔpKa, pH_max, dose numbers, enthalpy of solution, active fraction, flags and reasons.
        </caption>
        <thead>
          <tr>
            <Sortable k="rank">#</Sortable>
            <Sortable k="name">Candidate</Sortable>
            <th scope="col">Score (0–1)</th>
            <Sortable k="deltaPka" title="pKa(protonated base) − pKa(acid)">ΔpKa</Sortable>
            <Sortable k="phMax" title="pH where salt and free form are both saturated">pH_max ± 1σ</Sortable>
            <Sortable k="worstDoseNumber" title="Dose number at the worst pH in 1.2–6.8 (250 mL, ICH M9)">Worst D₀, pH 1.2–6.8</Sortable>
            <Sortable k="gastricDoseNumber" title="Dose number in the gastric medium with its chloride">Gastric D₀</Sortable>
            <Sortable k="solutionEnthalpy" title="ΔH_sol per formula unit, infinite dilution">ΔH_sol (kJ/mol)</Sortable>
            <Sortable k="activeFraction" title="Mass fraction of free form in the salt">Active fraction</Sortable>
            <th scope="col">Flags and reasons</th>
          </tr>
        </thead>
        <tbody>
          {sorted.map((r) => (
            <tr key={r.id} className={r.row.error ? 'row-error' : undefined}>
              <td className="rank-cell">{r.rank ?? '—'}</td>
              <CandidateCell r={r} onFocus={onFocus} />
              <td>
                <ScoreBar row={r} />
              </td>
              <FixedCells r={r} />
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
});
