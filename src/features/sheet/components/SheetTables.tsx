import type { ReactNode } from 'react';
import { ORIGIN_MARK, cellNumber, cellText, formatValue } from '../sheet-format';
import type {
  SheetCell,
  SheetColumn,
  SheetColumnGroup,
  SheetModel,
  SheetSetting,
} from '../sheet.types';

/** The sheet's tables: one setting per row, and the ranked candidates by column group. */

export function SettingsTable({ caption, items }: { caption: string; items: SheetSetting[] }) {
  return (
    <table className="sheet-settings">
      <caption>{caption}</caption>
      <tbody>
        {items.length === 0 ? (
          <tr>
            <td colSpan={2}>none recorded</td>
          </tr>
        ) : (
          items.map((s) => (
            <tr key={s.label}>
              <th scope="row">{s.label}</th>
              <td>
                {typeof s.value === 'number' ? formatValue(s.value) : s.value}
                {s.unit ? ` ${s.unit}` : ''}
              </td>
            </tr>
          ))
        )}
      </tbody>
    </table>
  );
}

export const GROUPS: { id: SheetColumnGroup; caption: string }[] = [
  { id: 'formation', caption: 'Salt formation, tablet mass and moisture' },
  {
    id: 'solubility',
    caption: 'Solubility across pH 1.2–6.8 and in gastric fluid (ICH M9 dose numbers)',
  },
  { id: 'energetics', caption: 'Enthalpies of the dissolution cycle (compare between candidates)' },
];

/**
 * Break points for the few heading words too long for a narrow column: a `<wbr>` (no text, so the
 * heading's text stays the CSV's heading, word for word).
 */
const HEADING_BREAKS: [string, string][] = [['microenvironment', 'micro']];
function breakable(label: string): ReactNode {
  for (const [word, head] of HEADING_BREAKS) {
    const at = label.indexOf(word);
    if (at >= 0)
      return (
        <>
          {label.slice(0, at + head.length)}
          <wbr />
          {label.slice(at + head.length)}
        </>
      );
  }
  return label;
}

export function RankedTable({
  model,
  group,
  caption,
  withFlags,
}: {
  model: SheetModel;
  group: SheetColumnGroup;
  caption: string;
  withFlags: boolean;
}) {
  const columns = model.columns.filter((c) => c.group === group);
  if (columns.length === 0 && !withFlags) return null;
  return (
    <table className={`sheet-ranking sheet-ranking-${group}`}>
      <caption>{caption}</caption>
      <thead>
        <tr>
          <th scope="col">Rank</th>
          <th scope="col">Candidate</th>
          {columns.map((c) => (
            <th scope="col" key={c.key} title={c.hint}>
              {breakable(c.label)}
              {c.unit ? <span className="sheet-unit">{` (${c.unit})`}</span> : null}
            </th>
          ))}
          {withFlags ? <th scope="col">Flags</th> : null}
        </tr>
      </thead>
      <tbody>
        {[...(model.freeForm ? [model.freeForm] : []), ...model.rows].map((r) => (
          <tr
            key={r.id}
            data-candidate-id={r.id}
            className={r === model.freeForm ? 'sheet-free-form' : undefined}
          >
            <td className="num">{r.rank ?? '—'}</td>
            <th scope="row" className="sheet-candidate">
              {r.label}
            </th>
            {columns.map((c) => (
              <RankedCell key={c.key} column={c} cell={r.cells[c.key]} />
            ))}
            {withFlags ? (
              <td className="sheet-flags">{r.flags.length ? r.flags.join('; ') : '—'}</td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** One cell of a ranked table: its text and origin mark; numbers also carry their value as data. */
function RankedCell({ column: c, cell }: { column: SheetColumn; cell: SheetCell | undefined }) {
  const origin = cell?.origin ? ORIGIN_MARK[cell.origin] : null;
  return (
    <td
      className={c.kind === 'number' ? 'num' : undefined}
      data-col={c.key}
      data-value={typeof cell?.value === 'number' ? String(cellNumber(cell)) : undefined}
    >
      {cellText(cell)}
      {origin && cell?.value !== null ? (
        <>
          {' '}
          <abbr className={`sheet-origin origin-${cell?.origin}`} title={origin.words}>
            {origin.mark}
          </abbr>
        </>
      ) : null}
    </td>
  );
}
