import { WELL_OUTCOME_LABELS, type PlatePlan } from '@/chem';
import type { ScreenPlanRecord } from '@/persistence/records';
import { figures } from '../screen-plan-model';

const DOSING: Record<string, string> = {
  solid: 'weigh',
  liquid: 'pipette neat',
  stock: 'pipette stock',
  'stock-only': 'stock needed',
};

/** One row per well: what goes in and how much, and what came out. */
export function WellTable({
  plan,
  outcomes,
  ionNames,
}: {
  plan: PlatePlan;
  outcomes: ScreenPlanRecord['outcomes'];
  ionNames: Record<string, string>;
}) {
  return (
    <div className="table-scroll">
      <table className="well-table">
        <caption>Per well (amounts to 4 significant digits)</caption>
        <thead>
          <tr>
            <th scope="col">Well</th>
            <th scope="col">Counter-ion</th>
            <th scope="col">Solvent (ICH Q3C class)</th>
            <th scope="col">Method</th>
            <th scope="col">Drug mg</th>
            <th scope="col">Drug mmol</th>
            <th scope="col">Eq.</th>
            <th scope="col">Parent mmol</th>
            <th scope="col">Parent mg</th>
            <th scope="col">Parent µL</th>
            <th scope="col">Solvent µL</th>
            <th scope="col">Outcome</th>
          </tr>
        </thead>
        <tbody>
          {plan.wells.map((w) => {
            const o = outcomes[w.well];
            return (
              <tr key={w.well}>
                <th scope="row">{w.well}</th>
                <td>
                  {ionNames[w.counterIonId] ?? w.counterIonId}
                  <span className="muted"> ({w.parentName})</span>
                </td>
                <td>
                  {w.solventName} ({w.ichQ3cClass ?? '—'})
                </td>
                <td>{w.method}</td>
                <td>{figures(w.apiMg)}</td>
                <td>{figures(w.apiMmol)}</td>
                <td>{w.equivalents}</td>
                <td>{figures(w.counterIon.mmol)}</td>
                <td>{figures(w.counterIon.mg)}</td>
                <td>
                  {figures(w.counterIon.ul)}{' '}
                  <span className="muted">
                    {DOSING[w.counterIon.dosing]}
                    {w.stock ? ` ${w.stock.molar} M in ${w.stock.solventId}` : ''}
                  </span>
                  {w.warnings.map((x) => (
                    <span key={x} className="well-warning" title={x}>
                      {' '}
                      ⚠ {x}
                    </span>
                  ))}
                </td>
                <td>{figures(w.solventUl)}</td>
                <td>
                  {o
                    ? `${WELL_OUTCOME_LABELS[o.outcome]}${o.meltingPointC === null ? '' : `, m.p. ${o.meltingPointC} °C`}`
                    : '—'}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
