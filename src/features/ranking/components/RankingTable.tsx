import { memo, useCallback, useRef, useState } from 'react';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import { sortRows, type DisplayRow, type FreeFormShown } from '../ranking-rows';
import { useDocumentOrder, useRowShifts } from '../hooks/use-row-shifts';
import { FreeFormRow } from './FreeFormRow';
import { Sortable } from './RankingCells';
import { RankingRow } from './RankingRow';

/** The column heads; each but the score and the reasons sorts the table. */
const RankingTableHead = memo(function RankingTableHeadView() {
  return (
    <thead>
      <tr>
        <Sortable k="rank">#</Sortable>
        <Sortable k="name">Candidate</Sortable>
        <th scope="col">Score (0–1)</th>
        <Sortable k="deltaPka" title="pKa(protonated base) − pKa(acid)">
          ΔpKa
        </Sortable>
        <Sortable
          k="saltWaterSolubility"
          title="The salt's own solubility in pure water (mg/mL as salt), ±1σ"
        >
          Salt in water
        </Sortable>
        <Sortable k="phMax" title="pH where salt and free form are both saturated">
          pH_max ± 1σ
        </Sortable>
        <Sortable
          k="worstDoseNumber"
          title="Dose number at the worst pH in 1.2–6.8 (250 mL, ICH M9)"
        >
          Worst D₀, pH 1.2–6.8
        </Sortable>
        <Sortable k="gastricDoseNumber" title="Dose number in the gastric medium with its chloride">
          Gastric D₀
        </Sortable>
        <Sortable
          k="solutionEnthalpy"
          title="ΔH_sol per mole of drug ion (formula unit ÷ drug ions), infinite dilution"
        >
          ΔH_sol (kJ/mol per drug ion)
        </Sortable>
        <Sortable k="activeFraction" title="Mass fraction of free form in the salt">
          Active fraction
        </Sortable>
        <th scope="col">Flags and reasons</th>
      </tr>
    </thead>
  );
});

/** Which rows show their reasons (folded until asked, so a row stays light while the order moves). */
function useOpenRows() {
  const [openIds, setOpenIds] = useState<ReadonlySet<string>>(() => new Set());
  const onToggle = useCallback(
    (id: string) =>
      setOpenIds((s) => {
        const next = new Set(s);
        if (!next.delete(id)) next.add(id);
        return next;
      }),
    [],
  );
  return { openIds, onToggle };
}

/**
 * The ranked shortlist: sortable, each number with unit, uncertainty and origin, reasons in words
 * (folded until asked).
 *
 * Re-ordering while a weight slider moves is transform-based: the rows keep their place in the
 * document and each is shifted with `translateY` to its new position (hooks/use-row-shifts.ts), which
 * costs neither a rebuild of the rows' boxes nor a new layout of the table. The document order —
 * what a screen reader or a copy reads — follows shortly after the movement ends, which the area
 * signals by changing `settleTick` (the slider's `change` event: pointer released, key pressed, value
 * typed; or the weights standing still for a moment). Without `settleTick`, on a new sort column, a
 * different set of candidates, or in a browser that does no layout (jsdom), the document is
 * re-ordered at once.
 */
export const RankingTable = memo(function RankingTableView({
  rows,
  onFocus,
  settleTick,
  freeForm,
}: {
  rows: DisplayRow[];
  /** The free form as a row of the same columns, not ranked (read against). */
  freeForm?: FreeFormShown | null;
  onFocus?: (id: string) => void;
  /** Changes when a weight movement ends: the document order catches up with the shown order. */
  settleTick?: number;
}) {
  const sortKey = useRankingViewStore((s) => s.sortKey);
  const dir = useRankingViewStore((s) => s.sortDir);
  const sorted = sortRows(rows, sortKey, dir);
  const shownIds = sorted.map((r) => r.id);
  const rowsKey = [...shownIds].sort().join('|');
  const [canShift, setCanShift] = useState(false);
  const order = useDocumentOrder(shownIds, `${sortKey}|${dir}|${rowsKey}`, settleTick, canShift);
  const body = useRef<HTMLTableSectionElement>(null);
  useRowShifts(body, order, shownIds, rowsKey, setCanShift);
  const byId = new Map(sorted.map((r) => [r.id, r]));
  const { openIds, onToggle } = useOpenRows();

  return (
    <div className="table-scroll">
      <table className="data-table ranking-table">
        <caption className="sr-only">
          Ranked candidates, read against the free form (not ranked): rank, score, ΔpKa, salt in
          water, pH_max, dose numbers, ΔH_sol per drug ion, active fraction, flags and reasons.
        </caption>
        <RankingTableHead />
        {freeForm ? <FreeFormRow f={freeForm} /> : null}
        <tbody ref={body} className="ranked-rows">
          {order.map((id) => (
            <RankingRow
              key={id}
              r={byId.get(id)!}
              open={openIds.has(id)}
              onToggle={onToggle}
              onFocus={onFocus}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
});
