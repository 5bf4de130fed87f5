import { ORIGIN_MARK, cellNumber, cellText, formatValue } from '../sheet-format';
import type { SheetColumnGroup, SheetModel, SheetSetting } from '../sheet.types';

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
              {c.label}
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
            {columns.map((c) => {
              const cell = r.cells[c.key];
              const origin = cell?.origin ? ORIGIN_MARK[cell.origin] : null;
              return (
                <td
                  key={c.key}
                  className={c.kind === 'number' ? 'num' : undefined}
                  data-col={c.key}
                  data-value={
                    typeof cell?.value === 'number' ? String(cellNumber(cell)) : undefined
                  }
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
            })}
            {withFlags ? (
              <td className="sheet-flags">{r.flags.length ? r.flags.join('; ') : '—'}</td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
