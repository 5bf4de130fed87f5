import type { SheetExcipientMatrix } from '../sheet.types';

/**
 * The sheet's section on the excipients' microenvironment: each salt (rank order) against each chosen
 * excipient, P(conversion) in per cent with its band in words, the excipients' pH and sources, and
 * what the matrix does not model.
 */
export function SheetExcipients({ matrix }: { matrix: SheetExcipientMatrix }) {
  return (
    <section className="sheet-block" aria-labelledby="sheet-excipients">
      <h2 id="sheet-excipients">Excipients’ microenvironment</h2>
      <p>
        Probability that each excipient’s published slurry pH lies beyond the salt’s pH_max (±1σ),
        where the salt would convert to the free form; the excipient most likely to convert a salt
        decides its disproportionation criterion.
      </p>
      <table className="sheet-confidence sheet-excipients">
        <thead>
          <tr>
            <th scope="col">Salt (pH_max)</th>
            {matrix.excipients.map((e) => (
              <th scope="col" key={e.id}>
                {e.name} (pH {e.phText})
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {matrix.rows.map((r) => (
            <tr key={r.id}>
              <th scope="row">
                {r.label} ({r.phMax === null ? 'no pH_max' : r.phMax.toFixed(1)})
              </th>
              {r.cells.map((c, k) => (
                <td key={matrix.excipients[k]!.id}>
                  {c.percent ?? '—'} — {c.words}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <ul>
        {matrix.excipients.map((e) => (
          <li key={e.id}>
            {e.name}: pH {e.phText}, {e.measuredAs}. Source: {e.source}.
          </li>
        ))}
      </ul>
      <p>{matrix.limits}</p>
    </section>
  );
}
