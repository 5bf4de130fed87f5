import { getCounterIon, WELL_OUTCOME_LABELS, type CounterIonOutcomeSummary } from '@/chem';
import type { ProjectRecord } from '@/persistence/records';
import { ionIdAsWords } from '@/screening-data/candidate-label';
import { useScreenOutcomeSummary } from '@/screening-data/use-screen-outcomes';

const ionName = (id: string) => getCounterIon(id)?.name ?? ionIdAsWords(id);

function bestText(s: CounterIonOutcomeSummary): string {
  if (!s.best) return '—';
  const mp = s.best.meltingPointC === null ? '' : `, m.p. ${s.best.meltingPointC} °C`;
  return `${WELL_OUTCOME_LABELS[s.best.outcome]} (${s.best.well}${mp})`;
}

/** The summary table alone (the sheet prints it too). */
export function ScreenOutcomesTable({ summary }: { summary: CounterIonOutcomeSummary[] }) {
  return (
    <table className="screen-outcomes-table">
      <caption>Salt screen: what the wells gave, per counter-ion</caption>
      <thead>
        <tr>
          <th scope="col">Counter-ion</th>
          <th scope="col">Wells recorded</th>
          <th scope="col">Crystalline hits</th>
          <th scope="col">Best form so far</th>
        </tr>
      </thead>
      <tbody>
        {summary.map((s) => (
          <tr key={s.counterIonId}>
            <th scope="row">{ionName(s.counterIonId)}</th>
            <td>
              {s.recorded} of {s.wells}
            </td>
            <td>{s.crystallineHits}</td>
            <td>
              {bestText(s)}
              {s.noCrystallineSaltYet ? (
                <strong className="screen-outcomes-flag"> no crystalline salt yet</strong>
              ) : null}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/**
 * What the project's salt screen gave so far, per counter-ion, beside the ranking. Shows nothing until
 * an outcome is recorded. A hit is a crystalline solid or a new crystalline form (XRPD).
 */
export function ScreenOutcomesPanel({ project }: { project: ProjectRecord }) {
  const summary = useScreenOutcomeSummary(project);
  if (!summary.some((s) => s.recorded > 0)) return null;
  return (
    <section className="panel screen-outcomes" aria-labelledby="screen-outcomes-title">
      <h2 id="screen-outcomes-title">Salt screen outcomes</h2>
      <ScreenOutcomesTable summary={summary} />
      <p className="muted">
        The ranking’s estimates do not know these outcomes; a counter-ion with no crystalline salt
        after all its wells is a reason to look again at its rank.
      </p>
    </section>
  );
}
