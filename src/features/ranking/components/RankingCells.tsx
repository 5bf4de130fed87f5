import { CRITERIA } from '@/chem';
import { sig } from '@/components/charts/chart-format';
import { useRankingViewStore, type RankingSortKey } from '@/stores/ranking-view-store';
import { CRITERION_TEXT } from '@/screening-data/criteria';
import type { DisplayRow, ShownNumber } from '../ranking-rows';

/** The small cells of the ranking table: origin mark, sortable heading, score bar, dose number. */

export function Origin({ n }: { n: Pick<ShownNumber, 'origin' | 'basis'> }) {
  return (
    <span className={`origin origin-${n.origin}`} title={n.basis}>
      {n.origin === 'measured' ? 'meas.' : 'est.'}
      <span className="sr-only"> ({n.basis})</span>
    </span>
  );
}

export function Sortable({
  k,
  children,
  title,
}: {
  k: RankingSortKey;
  children: React.ReactNode;
  title?: string;
}) {
  const sortKey = useRankingViewStore((s) => s.sortKey);
  const dir = useRankingViewStore((s) => s.sortDir);
  const sortBy = useRankingViewStore((s) => s.sortBy);
  const active = sortKey === k;
  return (
    <th
      scope="col"
      aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : 'none'}
      title={title}
    >
      <button type="button" className="sort-button" onClick={() => sortBy(k)}>
        {children}
        <span aria-hidden="true" className="sort-mark">
          {active ? (dir === 'asc' ? '▲' : '▼') : '↕'}
        </span>
      </button>
    </th>
  );
}

/**
 * The score and its parts as one element: the parts are colour stops of a gradient, so a weight
 * movement changes one style value (repaint only) instead of the widths of seven boxes (layout).
 */
export function ScoreBar({ row }: { row: DisplayRow }) {
  if (row.score === null) return <span className="muted">—</span>;
  let at = 0;
  const stops: string[] = [];
  const said: string[] = [];
  CRITERIA.forEach((k, i) => {
    const v = row.contributions[k] ?? 0;
    if (v > 0.0005) said.push(`${CRITERION_TEXT[k].label} ${(v * 100).toFixed(0)}`);
    if (v <= 0) return;
    const to = at + v * 100;
    stops.push(`var(--part-${i}) ${at.toFixed(1)}% ${to.toFixed(1)}%`); // colours: ranking.css
    at = to;
  });
  stops.push(`transparent ${at.toFixed(1)}%`);
  return (
    <>
      <strong>{row.score.toFixed(2)}</strong>
      <span
        className="score-bar"
        role="img"
        aria-label={`score parts: ${said.join(', ')}`}
        style={{ backgroundImage: `linear-gradient(to right, ${stops.join(', ')})` }}
      />
    </>
  );
}

/** A dose number cell: value, the pH it applies at, origin and ±1σ range (colour on the cell itself). */
export function DoseCell({ d }: { d: (ShownNumber & { pH?: number }) | null }) {
  if (!d) return <td className="muted">—</td>;
  return (
    <td className={d.value > 1 ? 'dose-bad' : 'dose-ok'}>
      {sig(d.value, 2)}
      {d.pH !== undefined ? <span className="unit"> at pH {d.pH}</span> : null} <Origin n={d} />
      {d.range ? (
        <span className="range">
          {' '}
          ±1σ {sig(d.range[0], 2)}–{sig(d.range[1], 2)}
        </span>
      ) : null}
    </td>
  );
}
