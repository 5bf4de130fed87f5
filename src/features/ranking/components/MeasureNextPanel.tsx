import { memo, useMemo } from 'react';
import { measureNextStatusOf, type ScreeningWeights } from '@/chem';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import {
  MEASURE_NEXT_ITERATIONS,
  MEASURE_NEXT_OUTCOMES,
  useMeasureNext,
} from '@/screening-data/use-measure-next';
import { MeasureNextList } from './MeasureNextList';

/** The list itself, drawn again only when a new result arrives (not on each progress step). */
const List = memo(MeasureNextList);

/**
 * "Measure next": which bench measurement would most reduce the doubt about first place (the
 * expected value of sample information over the rank-robustness Monte Carlo, core measure-next/),
 * computed in a worker after the table is on screen; it follows the bench data and the weights.
 */
export const MeasureNextPanel = memo(function MeasureNextPanelView({
  data,
  weights,
  labels,
}: {
  data: ProjectScreening;
  weights: ScreeningWeights;
  labels: Record<string, string>;
}) {
  const rows = useMemo(() => data.screen.rows.map((r) => r.robustness), [data]);
  const status = useMemo(() => data.screen.rows.map(measureNextStatusOf), [data]);
  const state = useMeasureNext(rows, status, weights, data.screen.robustnessShared);
  const r = state.result;
  const pct = (x: number) => `${Math.round(x * 100)} %`;
  return (
    <section className="panel measure-next" aria-labelledby="measure-next-title">
      <header className="panel-head">
        <h2 id="measure-next-title">Measure next</h2>
        {state.status === 'running' ? (
          <span className="progress-wrap">
            <label htmlFor="measure-next-progress">Weighing each measurement</label>{' '}
            <progress id="measure-next-progress" max={1} value={state.progress} />
          </span>
        ) : null}
      </header>
      <p className="muted">
        Which bench measurement would most reduce the doubt about first place: for each one, its
        possible outcomes are drawn from what the screen now expects, the candidate is updated, the
        order is drawn again, and the chance that the pick is not the best is averaged (expected
        value of sample information; Raiffa &amp; Schlaifer 1961).
      </p>
      {state.status === 'error' ? (
        <p role="alert">The list could not be computed: {state.error}</p>
      ) : null}
      {r ? (
        <div
          className={state.status === 'running' ? 'stale' : undefined}
          aria-busy={state.status === 'running'}
        >
          {r.leaderId ? (
            <p>
              Now <strong>{labels[r.leaderId] ?? r.leaderId}</strong> is first in {pct(1 - r.doubt)}{' '}
              of the draws: the doubt about first place is {pct(r.doubt)}.
            </p>
          ) : null}
          <List result={r} labels={labels} />
          <p className="muted">
            {r.iterations} draws × {r.outcomes} outcomes per measurement, fixed seed; ± is the Monte
            Carlo error{state.ms !== undefined ? `; computed in ${Math.round(state.ms)} ms` : ''}.
          </p>
        </div>
      ) : state.status === 'running' ? (
        <p className="loading">
          Weighing {MEASURE_NEXT_ITERATIONS} draws × {MEASURE_NEXT_OUTCOMES} outcomes…
        </p>
      ) : null}
    </section>
  );
});
