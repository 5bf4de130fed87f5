import {
  startTransition,
  useEffect,
  useLayoutEffect,
  useRef,
  useState,
  type RefObject,
} from 'react';

/** After a movement ends, the document order catches up this long after the next frame (ms). */
const CATCH_UP_MS = 120;

/**
 * Each row's shift (px) from its place in the document to its place in the shown order. `heights`
 * are the rows' border-box heights in document order; the table's separate borders with no spacing
 * make a row's pitch its height. Null when a height is not known yet.
 */
export function rowShifts(
  docIds: readonly string[],
  shownIds: readonly string[],
  heights: readonly (number | undefined)[],
): number[] | null {
  const height = new Map<string, number>();
  for (let i = 0; i < docIds.length; i++) {
    const h = heights[i];
    if (h === undefined) return null;
    height.set(docIds[i]!, h);
  }
  const target = new Map<string, number>();
  let y = 0;
  for (const id of shownIds) {
    target.set(id, y);
    y += height.get(id) ?? 0;
  }
  y = 0;
  return docIds.map((id) => {
    const shift = (target.get(id) ?? y) - y;
    y += height.get(id)!;
    return shift;
  });
}

const sameOrder = (a: readonly string[], b: readonly string[]) =>
  a.length === b.length && a.every((x, i) => x === b[i]);

/**
 * The rows' document order. While the weights move it stays put and the rows are shifted on screen
 * (useRowShifts): moving a table row in the document makes the browser rebuild and lay out its
 * cells, a transform does not. It catches up with the shown order shortly after a movement ends
 * (`settleTick` changes; the frame with the re-ranked table is painted first), and at once on a new
 * sort, another set of rows, or when the rows cannot be shifted (no layout, as in jsdom).
 */
export function useDocumentOrder(
  shownIds: readonly string[],
  basis: string,
  settleTick: number | undefined,
  canShift: boolean,
): readonly string[] {
  const [docIds, setDocIds] = useState<readonly string[]>(shownIds);
  const [docBasis, setDocBasis] = useState(basis);
  const latest = useRef(shownIds);
  latest.current = shownIds;
  let order = docIds;
  if (basis !== docBasis || !canShift || settleTick === undefined) {
    order = shownIds;
    if (!sameOrder(docIds, shownIds)) setDocIds(shownIds);
    if (basis !== docBasis) setDocBasis(basis);
  }
  useEffect(() => {
    if (settleTick === undefined) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    // A transition: a slider step arriving meanwhile is handled first.
    const catchUp = () =>
      startTransition(() => setDocIds((d) => (sameOrder(d, latest.current) ? d : latest.current)));
    const frame =
      typeof requestAnimationFrame === 'function'
        ? requestAnimationFrame(() => (timer = setTimeout(catchUp, CATCH_UP_MS)))
        : undefined;
    if (frame === undefined) timer = setTimeout(catchUp, CATCH_UP_MS);
    return () => {
      if (frame !== undefined) cancelAnimationFrame(frame);
      clearTimeout(timer);
    };
  }, [settleTick]);
  return order;
}

/**
 * Shift the body's rows (translateY) from their document order to the shown order, with no layout
 * read: the rows' heights come from a ResizeObserver (called after the browser's own layout, before
 * its paint), so a weight change costs a style write per row that moved, never a forced layout.
 * `onKnown` says whether every row's height is known (never true without ResizeObserver, e.g. jsdom).
 * `rowsKey` changes when the set of rows does (new rows are observed).
 */
export function useRowShifts(
  body: RefObject<HTMLTableSectionElement | null>,
  docIds: readonly string[],
  shownIds: readonly string[],
  rowsKey: string,
  onKnown: (known: boolean) => void,
): void {
  const heights = useRef(new WeakMap<Element, number>());
  const known = useRef(false);
  const apply = useRef<() => void>(() => {});
  apply.current = () => {
    const trs = body.current ? [...body.current.rows] : [];
    const shifts =
      trs.length === docIds.length
        ? rowShifts(
            docIds,
            shownIds,
            trs.map((tr) => heights.current.get(tr)),
          )
        : null;
    trs.forEach((tr, i) => {
      const t = shifts?.[i] ? `translateY(${shifts[i]}px)` : '';
      if (tr.style.transform !== t) tr.style.transform = t;
    });
    // Said only when it changes: a state update from every layout effect would loop.
    if (known.current !== (shifts !== null)) onKnown((known.current = shifts !== null));
  };
  useLayoutEffect(() => {
    if (typeof ResizeObserver === 'undefined' || !body.current) return;
    const ro = new ResizeObserver((entries) => {
      for (const e of entries) {
        const box = e.borderBoxSize?.[0];
        heights.current.set(e.target, box ? box.blockSize : e.contentRect.height);
      }
      apply.current();
    });
    for (const tr of body.current.rows) ro.observe(tr);
    return () => ro.disconnect();
  }, [body, rowsKey]);
  useLayoutEffect(() => apply.current());
}
