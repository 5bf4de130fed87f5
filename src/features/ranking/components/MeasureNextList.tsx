import type { MeasureNextItem, MeasureNextResult } from '@/chem';

/** Below this expected reduction of the doubt a measurement reads "≈ 0" (our choice: 1 point). */
const SHOWN_FROM = 0.01;
/** At most this many measurements are listed (the rest are worth less). */
const MAX_SHOWN = 5;

const pct = (x: number) => `${Math.round(x * 100)} %`;
const what = (x: MeasureNextItem) =>
  x.measurement === 'solubility' ? 'solubility' : 'melting point with ΔH_fus (DSC)';

/** The sentence and the figure of one proposed measurement. */
function Line({ item, label, doubt }: { item: MeasureNextItem; label: string; doubt: number }) {
  const again = item.retake
    ? ` (again: its solubility is still uncertain by ±${item.currentSigmaLog10.toFixed(1)} decades)`
    : '';
  return (
    <li>
      Measuring the {what(item)} of <strong>{label}</strong>
      {again} would settle <strong>{pct(item.share)}</strong> of the doubt about first place{' '}
      <span className="muted">
        (± {pct(doubt > 0 ? item.standardError / doubt : 0)}; the chance the pick is wrong falls by{' '}
        {(item.value * 100).toFixed(1)} points on average)
      </span>
    </li>
  );
}

/** The ranked list, and what is not worth measuring said in words. */
export function MeasureNextList({
  result,
  labels,
}: {
  result: MeasureNextResult;
  labels: Record<string, string>;
}) {
  const name = (id: string) => labels[id] ?? id;
  const worth = result.items.filter((x) => x.value >= SHOWN_FROM).slice(0, MAX_SHOWN);
  const melting = result.items.filter((x) => x.measurement === 'melting-point');
  const meltingIdle =
    melting.length > 0 && melting.every((x) => x.note === 'fusion-path-not-validated');
  const taken = result.leftOut.filter((x) => x.reason === 'already-taken');
  return (
    <>
      {result.doubt < SHOWN_FROM ? (
        <p>
          First place is not in doubt within the stated uncertainties: no measurement would change
          it.
        </p>
      ) : worth.length === 0 ? (
        <p>
          No single measurement settles a measurable share of the doubt: it comes from what all
          candidates share (the drug’s pKa and intrinsic solubility) or is spread thin.
        </p>
      ) : (
        <ol className="measure-next-list" aria-label="Measurements, most useful first">
          {worth.map((x) => (
            <Line
              key={`${x.id} ${x.measurement}`}
              item={x}
              label={name(x.id)}
              doubt={result.doubt}
            />
          ))}
        </ol>
      )}
      {meltingIdle ? (
        <p className="muted">
          A melting point with ΔH_fus would not change this list: the shipped salt-solubility model
          applies no cross-validated fusion correction, so a DSC result leaves each salt’s 1σ as it
          is (value 0 for the ranking).
        </p>
      ) : null}
      {taken.length ? (
        <p className="muted">
          Already measured (not proposed again while narrow):{' '}
          {taken.map((x) => `${name(x.id)} ${x.measurement.replace('-', ' ')}`).join('; ')}.
        </p>
      ) : null}
    </>
  );
}
