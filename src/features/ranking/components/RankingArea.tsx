import { memo, useCallback, useDeferredValue, useEffect, useMemo, useState } from 'react';
import { rankCandidates, screeningWeightsSchema, separationSummary } from '@/chem';
import { CAUTION_LINES } from '@/components/Cautions';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import { ScreenOutcomesPanel } from '@/components/ScreenOutcomesPanel';
import type { ProjectRecord } from '@/persistence/records';
import { useProjectScreening } from '@/screening-data/use-screening';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { useNavigationStore } from '@/stores/navigation-store';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import {
  useRobustness,
  ROBUSTNESS_ITERATIONS,
  type RobustnessState,
} from '@/screening-data/use-robustness';
import { useWeights } from '../hooks/use-weights';
import { BufferMedia } from './BufferMedia';
import { ExcipientMatrix } from './ExcipientMatrix';
import { displayRows, freeFormShown } from '../ranking-rows';
import { SeparationLine } from './SeparationLine';
import { RankingTable } from './RankingTable';
import { ScreeningConditions } from './ScreeningConditions';
import { SolubilityPanel } from './SolubilityPanel';
import { MeasureNextPanel } from './MeasureNextPanel';
import { WeightSliders } from './WeightSliders';
import '../ranking.css';

/** A weight movement has ended when the weights stood still this long (ms) or the slider sent `change`. */
const SETTLE_MS = 400;

/** The cautions, in full, beside the ranking (not behind a button). */
export const RankingCautions = memo(function RankingCautionsView() {
  return (
    <aside className="ranking-cautions" aria-label="Cautions for reading this ranking">
      <strong>Read with care.</strong>
      <ul>
        {CAUTION_LINES.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
    </aside>
  );
});

/** Rank robustness: the Monte Carlo's probabilities as bars, with its progress while it runs. */
const RobustnessPanel = memo(function RobustnessPanelView({
  robustness,
  labels,
}: {
  robustness: RobustnessState;
  labels: Record<string, string>;
}) {
  // Ordered by the probability itself, so the bars change only when a new Monte Carlo run arrives.
  const results = [...(robustness.results ?? [])].sort(
    (a, b) => b.pTop3 - a.pTop3 || b.pFirst - a.pFirst,
  );
  return (
    <section className="panel" aria-labelledby="robustness-title">
      <header className="panel-head">
        <h2 id="robustness-title">How firm is the order?</h2>
        {robustness.status === 'running' ? (
          <span className="progress-wrap">
            <label htmlFor="robustness-progress">Monte Carlo</label>{' '}
            <progress id="robustness-progress" max={1} value={robustness.progress} />
          </span>
        ) : null}
      </header>
      <p className="muted">
        Probability that each candidate stays in the top three when the estimates move within their
        stated uncertainties (pKa, S₀, each salt’s K_sp), {ROBUSTNESS_ITERATIONS} draws with a fixed
        seed, computed in the background with the current weights.
      </p>
      {robustness.status === 'error' ? (
        <p role="alert">Robustness could not be computed: {robustness.error}</p>
      ) : null}
      {robustness.results ? (
        <div className={robustness.status === 'running' ? 'stale' : undefined}>
          <WhiskerBars
            title="Probability of staying in the top three"
            caption={results
              .map(
                (x) =>
                  `${labels[x.id] ?? x.id}: ${(x.pTop3 * 100).toFixed(0)} % top three, ${(x.pFirst * 100).toFixed(0)} % first`,
              )
              .join('; ')}
            unit="% of draws in the top three"
            domain={[0, 100]}
            format={(x) => `${x.toFixed(0)}`}
            rows={results.map((x) => ({
              id: x.id,
              label: labels[x.id] ?? x.id,
              value: x.pTop3 * 100,
              note: `(first ${(x.pFirst * 100).toFixed(0)} %)`,
            }))}
          />
        </div>
      ) : robustness.status === 'running' ? (
        <p className="loading">Drawing…</p>
      ) : null}
    </section>
  );
});

/** What the screen assumed, in words; re-rendered only when the screen changes. */
const ScreenAssumptions = memo(function ScreenAssumptionsView({
  data,
}: {
  data: ProjectScreening;
}) {
  return (
    <section className="panel" aria-labelledby="assumptions-title">
      <h2 id="assumptions-title">Assumptions of this screen</h2>
      <ul>
        {[...data.notes, ...data.screen.assumptions].map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </section>
  );
});

/** The Ranking area: the weighted, explained shortlist with its robustness and pH–solubility picture. */
export function RankingArea({ project }: { project: ProjectRecord }) {
  const screening = useProjectScreening(project);
  const { weights, setWeights, saving } = useWeights(project);
  const goTo = useNavigationStore((s) => s.goTo);
  const focus = useRankingViewStore((s) => s.focus);
  const resetView = useRankingViewStore((s) => s.resetForProject);
  useEffect(() => resetView(), [project.id, resetView]);

  const data = screening.result;
  // The table re-ranks in the same frame as the slider (its re-ordering is transform-based while the
  // slider moves, see RankingTable). What is slower to follow — the media table and the chart's top
  // three — follows when the movement ends (`settleTick`), the Monte Carlo after the weights settle.
  const ranked = useMemo(
    () => (data ? rankCandidates(data.screen.rows, weights) : []),
    [data, weights],
  );
  const rows = useMemo(() => (data ? displayRows(data, ranked) : []), [data, ranked]);
  const deferredWeights = useDeferredValue(weights);
  const separation = useMemo(
    () => (data ? separationSummary(data.screen, deferredWeights) : null),
    [data, deferredWeights],
  );
  const freeForm = useMemo(
    () => (data ? freeFormShown(data, project.compound.name, project.compound.doseMg) : null),
    [data, project.compound.name, project.compound.doseMg],
  );
  const [settleTick, setSettleTick] = useState(0);
  const onSettle = useCallback(() => setSettleTick((t) => t + 1), []);
  // A movement also ends when the weights stand still for a moment (a reset, another tab, no `change`).
  useEffect(() => {
    const t = setTimeout(onSettle, SETTLE_MS);
    return () => clearTimeout(t);
  }, [weights, onSettle]);
  // The ranking as it stood when the last movement ended (or the screen changed).
  const settledRows = useMemo(() => rows, [data, settleTick]); // eslint-disable-line react-hooks/exhaustive-deps
  const mediaView = useDeferredValue(
    useMemo(() => ({ rows: settledRows, media: data?.settings.media ?? [] }), [settledRows, data]),
  );
  const robustRows = useMemo(() => data?.screen.rows.map((r) => r.robustness), [data]);
  const labels = useMemo(() => Object.fromEntries(rows.map((r) => [r.id, r.label])), [data]); // eslint-disable-line react-hooks/exhaustive-deps
  const topKey = useDeferredValue(
    settledRows
      .filter((r) => r.rank !== null && r.rank <= 3)
      .sort((a, b) => a.rank! - b.rank!)
      .map((r) => r.id)
      .join('|'),
  );
  const robustness = useRobustness(robustRows, deferredWeights, data?.screen.robustnessShared);
  const onFocus = useCallback(
    (id: string) => {
      focus(id);
      goTo('energetics');
    },
    [focus, goTo],
  );

  const candidateCount = screening.candidates?.length;
  if (candidateCount === 0) {
    return (
      <section className="panel" aria-labelledby="ranking-title">
        <h2 id="ranking-title">Ranking</h2>
        <p>
          The shortlist is empty. Pick counter-ions in the{' '}
          <a href="#/counter-ions" onClick={(e) => (e.preventDefault(), goTo('counter-ions'))}>
            Counter-ions
          </a>{' '}
          area; they are ranked here.
        </p>
      </section>
    );
  }

  return (
    <div className="ranking-area">
      <section className="panel" aria-labelledby="ranking-title">
        <header className="panel-head">
          <h2 id="ranking-title">Ranking</h2>
          <span role="status" aria-live="polite" className="muted">
            {screening.status === 'loading'
              ? data
                ? 'Recomputing…'
                : 'Screening the shortlist (loading the structure tools)…'
              : screening.status === 'error'
                ? 'Screen failed'
                : `${rows.length} candidates ranked${saving ? ' · saving weights…' : ''}`}
          </span>
        </header>
        <RankingCautions />
        <ScreenOutcomesPanel project={project} />
        {screening.status === 'error' ? (
          <div role="alert" className="screen-error">
            <p>
              <strong>The shortlist cannot be screened yet:</strong> {screening.error}
            </p>
            <p>
              Fix it in the{' '}
              <a href="#/compound" onClick={(e) => (e.preventDefault(), goTo('compound'))}>
                Compound
              </a>{' '}
              area (an intrinsic solubility, or a melting point with log P, and a dose are needed).
            </p>
          </div>
        ) : null}
        {!data && screening.status === 'loading' ? (
          <p className="loading" role="status">
            Computing pH–solubility profiles, dose numbers and enthalpies…
          </p>
        ) : null}
        {data ? (
          <>
            {data.missing.length ? (
              <ul className="missing">
                {data.missing.map((m) => (
                  <li key={m.candidateId}>
                    {m.ionId}: not screened — {m.reason}
                  </li>
                ))}
              </ul>
            ) : null}
            <p className="legend muted">
              <span className="origin origin-estimated">est.</span> estimate from the models;{' '}
              <span className="origin origin-measured">meas.</span> rests on your bench data. Dose
              number D₀ = (dose / 250 mL) / solubility; above 1 the dose does not dissolve (ICH M9).
              ±1σ ranges come from each estimate’s stated uncertainty.
            </p>
            <SeparationLine summary={separation} />
            <div className="ranking-grid">
              <WeightSliders
                weights={weights}
                onChange={setWeights}
                onReset={() => (setWeights(screeningWeightsSchema.parse({})), onSettle())}
                onSettle={onSettle}
              />
              <RankingTable
                rows={rows}
                onFocus={onFocus}
                settleTick={settleTick}
                freeForm={freeForm}
              />
            </div>
          </>
        ) : null}
      </section>
      {data ? (
        <>
          <ScreeningConditions project={project} settings={data.settings} />
          <BufferMedia project={project} media={mediaView.media} rows={mediaView.rows} />
          <ExcipientMatrix
            project={project}
            chosen={data.settings.excipients}
            rows={mediaView.rows}
          />
          <RobustnessPanel robustness={robustness} labels={labels} />
          <MeasureNextPanel data={data} weights={deferredWeights} labels={labels} />
          <SolubilityPanel
            data={data}
            labels={labels}
            topKey={topKey}
            doseMg={project.compound.doseMg}
          />
          <ScreenAssumptions data={data} />
        </>
      ) : null}
    </div>
  );
}
