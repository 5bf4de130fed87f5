import { memo } from 'react';
import type { ScreeningMedium } from '@/chem';
import type { DisplayRow } from '../ranking-rows';

const fmt = (x: number) => (x >= 100 ? x.toFixed(0) : x >= 1 ? x.toFixed(2) : x.toPrecision(2));

/** Every candidate's solubility (mg/mL, free-form equivalents) and dose number in each of the user's media. */
export const MediaTable = memo(function MediaTableView({
  media,
  rows,
}: {
  media: readonly ScreeningMedium[];
  rows: readonly DisplayRow[];
}) {
  return (
    <div className="table-scroll">
      <table className="data-table" aria-label="Solubility in your media">
        <thead>
          <tr>
            <th scope="col">Candidate</th>
            {media.map((m) => (
              <th scope="col" key={m.id}>
                {m.label}
                <br />
                <span className="unit">
                  pH {m.pH};{' '}
                  {m.id.startsWith('preset-')
                    ? 'biorelevant, micelles not modelled'
                    : Object.entries(m.ions)
                        .map(([ion, c]) => `${ion} ${c} M`)
                        .join(', ')}{' '}
                  — mg/mL (D₀)
                </span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id}>
              <th scope="row">{r.label}</th>
              {media.map((m) => {
                const res = r.row.media.find((x) => x.id === m.id);
                return (
                  <td key={m.id}>
                    {res ? (
                      <>
                        {fmt(res.solubilityMgPerMl)}
                        {res.doseNumber !== null ? ` (${fmt(res.doseNumber)})` : ''}
                        {res.convertsTo ? <span className="muted"> → {res.convertsTo}</span> : null}
                      </>
                    ) : (
                      '—'
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
});
