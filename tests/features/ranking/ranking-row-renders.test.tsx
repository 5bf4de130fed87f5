import { beforeEach, describe, expect, it, vi } from 'vitest';
import { render, screen } from '@testing-library/react';
import type { ScreenRow } from '@/chem';
import type { DisplayRow } from '@/features/ranking/ranking-rows';
import { RankingTable } from '@/features/ranking/components/RankingTable';
import type * as RankingCells from '@/features/ranking/components/RankingCells';
import { useRankingViewStore } from '@/stores/ranking-view-store';

// Issue 20: a weight change must re-render only the rows whose rank or score moved. The score cell
// is counted per candidate (a wrapper around the real ScoreBar): a row that re-renders draws it again.
const scoreRenders = vi.hoisted(() => new Map<string, number>());
vi.mock('@/features/ranking/components/RankingCells', async (importOriginal) => {
  const real = await importOriginal<typeof RankingCells>();
  return {
    ...real,
    ScoreBar: (props: Parameters<typeof real.ScoreBar>[0]) => {
      scoreRenders.set(props.row.id, (scoreRenders.get(props.row.id) ?? 0) + 1);
      return real.ScoreBar(props);
    },
  };
});

// The rows' content is a render workload, not chemistry: only the fields the table reads are filled.
const screenRow = (id: string) =>
  ({
    id,
    error: null,
    hydrateWater: 0,
    saltFormation: null,
    flags: [],
    reasons: [],
  }) as unknown as ScreenRow;
const screenRows = Array.from({ length: 60 }, (_, i) => screenRow(`ion-${i}:1:1`));

/** The display rows a weighting gives: new objects every time, as displayRows builds them. */
function rowsFor(scores: readonly number[]): DisplayRow[] {
  const order = scores.map((s, i) => ({ s, i })).sort((a, b) => b.s - a.s);
  return order.map(({ s, i }, k) => ({
    id: screenRows[i]!.id,
    label: `salt ${i}`,
    ionName: `ion ${i}`,
    rank: k + 1,
    score: s,
    contributions: { saltFormation: s / 2, worstDose: s / 2 },
    row: screenRows[i]!,
    deltaPka: 3,
    saltWater: null,
    phMax: null,
    worstDose: null,
    gastricDose: null,
    solutionEnthalpy: null,
    activeFraction: 0.8,
    saltMassPerDoseMg: null,
    acceptabilityClass: 1,
  }));
}

describe('Ranking table: re-ranking re-renders only the rows that moved', () => {
  beforeEach(() => {
    scoreRenders.clear();
    useRankingViewStore.setState({ sortKey: 'rank', sortDir: 'asc' });
  });

  it('two candidates swap places: those two rows render again, the other 58 do not, none remounts', () => {
    const scores = Array.from({ length: 60 }, (_, i) => 1 - i / 100);
    const { rerender } = render(<RankingTable rows={rowsFor(scores)} />);
    expect(scoreRenders.size).toBe(60);
    const firstRowEl = screen.getByText('salt 0').closest('tr');
    scoreRenders.clear();

    // candidates 10 and 11 swap scores (so ranks); every row object is new, as after a weight change
    const moved = [...scores];
    [moved[10], moved[11]] = [moved[11]!, moved[10]!];
    rerender(<RankingTable rows={rowsFor(moved)} />);

    expect([...scoreRenders.keys()].sort()).toEqual(['ion-10:1:1', 'ion-11:1:1']);
    // the untouched row is the same element: kept mounted, keyed by candidate id
    expect(screen.getByText('salt 0').closest('tr')).toBe(firstRowEl);
    const ranks = screen
      .getAllByRole('row')
      .slice(1, 13)
      .map((tr) => tr.querySelector('.rank-box')?.textContent);
    expect(ranks).toEqual(['1', '2', '3', '4', '5', '6', '7', '8', '9', '10', '11', '12']);
  });

  it('a score change without a change of order re-renders only that row', () => {
    const scores = Array.from({ length: 60 }, (_, i) => 1 - i / 100);
    const { rerender } = render(<RankingTable rows={rowsFor(scores)} />);
    scoreRenders.clear();
    const changed = [...scores];
    changed[30] = changed[30]! + 0.001;
    rerender(<RankingTable rows={rowsFor(changed)} />);
    expect([...scoreRenders.keys()]).toEqual(['ion-30:1:1']);
  });
});
