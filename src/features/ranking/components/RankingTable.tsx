import { memo, useCallback, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import { sortRows, type DisplayRow, type FreeFormShown } from '../ranking-rows';
import { FreeFormRow } from './FreeFormRow';
import { Sortable } from './RankingCells';
import { RankingRow } from './RankingRow';

const sameOrder = (a: readonly string[], b: readonly string[]) =>
  a.length === b.length && a.every((x, i) => x === b[i]);

/**
 * The ranked shortlist: sortable, each number with unit, uncertainty and origin, reasons in words
 * (folded until asked).
 *
 * Re-ordering while a weight slider is dragged is transform-based (FLIP): the rows keep their place in
 * the document and each is shifted with `translateY` to its new position, which costs neither a
 * rebuild of the rows' boxes nor a new layout of the table. The document order — what a screen
 * reader or a copy reads — follows when the movement ends, which the area signals by changing
 * `settleTick` (the slider's `change` event: pointer released, key pressed, value typed; or the
 * weights standing still for a moment). Without `settleTick`, on a new sort column, a different set
 * of candidates, or in a browser that does no layout (jsdom), the document is re-ordered at once.
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
  const sorted = useMemo(() => sortRows(rows, sortKey, dir), [rows, sortKey, dir]);
  const shownIds = useMemo(() => sorted.map((r) => r.id), [sorted]);
  const basis = `${sortKey}|${dir}|${[...shownIds].sort().join('|')}|${settleTick ?? ''}`;

  // The document order of the rows, and what it was last decided on.
  const [docIds, setDocIds] = useState<readonly string[]>(shownIds);
  const [docBasis, setDocBasis] = useState(basis);
  const [measurable, setMeasurable] = useState(false);
  let order = docIds;
  if (basis !== docBasis || !measurable || settleTick === undefined) {
    order = shownIds;
    if (!sameOrder(docIds, shownIds)) setDocIds(shownIds);
    if (basis !== docBasis) setDocBasis(basis);
  }
  const byId = new Map(sorted.map((r) => [r.id, r]));
  const docRows = order.map((id) => byId.get(id)!);

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

  // FLIP: shift each row from its place in the document to its place in the shown order. The rows'
  // heights are measured when the document order, the folded reasons or the screen change (a layout
  // read), not on every weight movement: a movement changes only the rank and the score, whose boxes
  // have a fixed size (ranking.css), so no height moves.
  const body = useRef<HTMLTableSectionElement>(null);
  const measured = useRef<{
    key: readonly unknown[];
    tops: number[];
    pitch: Map<string, number>;
  } | null>(null);
  const measureKey = [order, openIds, ...docRows.map((r) => r.row)];
  const rowCount = docRows.length;
  useLayoutEffect(() => {
    if (!measurable && (body.current?.rows[0]?.offsetHeight ?? 0) > 0) setMeasurable(true);
  }, [measurable, rowCount]);
  useLayoutEffect(() => {
    const trs = body.current ? [...body.current.rows] : [];
    if (trs.length === 0 || !measurable) return;
    const prev = measured.current;
    let m = prev;
    if (
      !prev ||
      prev.key.length !== measureKey.length ||
      prev.key.some((x, i) => x !== measureKey[i])
    ) {
      for (const tr of trs) tr.style.transform = '';
      const tops = trs.map((tr) => tr.offsetTop);
      const pitch = new Map(
        order.map((id, i) => [
          id,
          i + 1 < trs.length ? tops[i + 1]! - tops[i]! : trs[i]!.offsetHeight,
        ]),
      );
      m = measured.current = { key: measureKey, tops, pitch };
    }
    const { tops, pitch } = m!;
    let y = tops[0]!;
    const target = new Map<string, number>();
    for (const id of shownIds) {
      target.set(id, y);
      y += pitch.get(id) ?? 0;
    }
    trs.forEach((tr, i) => {
      const t = `translateY(${(target.get(order[i]!) ?? tops[i]!) - tops[i]!}px)`;
      if (tr.style.transform !== t) tr.style.transform = t;
    });
  });

  return (
    <div className="table-scroll">
      <table className="data-table ranking-table">
        <caption className="sr-only">
          Ranked candidates, read against the free form (not ranked): rank, score, ΔpKa, salt in
          water, pH_max, dose numbers, ΔH_sol per drug ion, active fraction, flags and reasons.
        </caption>
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
            <Sortable
              k="gastricDoseNumber"
              title="Dose number in the gastric medium with its chloride"
            >
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
        {freeForm ? <FreeFormRow f={freeForm} /> : null}
        <tbody ref={body}>
          {docRows.map((r) => (
            <RankingRow
              key={r.id}
              r={r}
              open={openIds.has(r.id)}
              onToggle={onToggle}
              onFocus={onFocus}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
});
