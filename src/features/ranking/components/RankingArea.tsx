import { memo, useCallback, useDeferredValue, useEffect, useMemo } from 'react';
import { rankCandidates, screeningWeightsSchema } from '@/chem';
import { CAUTION_LINES } from '@/components/Cautions';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import type { ProjectRecord } from '@/persistence/records';
import { useProjectScreening } from '@/features/screening-data/use-screening';
import { useNavigationStore } from '@/stores/navigation-store';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import { useRobustness, ROBUSTNESS_ITERATIONS, type RobustnessState } from '../hooks/use-robustness';
import { useWeights } from '../hooks/use-weights';
import { displayRows, type DisplayRow } from '../ranking-rows';
import { RankingTable } from './RankingTable';
import { ScreeningConditions } from './ScreeningConditions';
import { SolubilityPanel } from './SolubilityPanel';
import { WeightSliders } from './WeightSliders';
import '../ranking.css';

/** The cautions, in full, beside the ranking (not behind a button). */
export function RankingCautions() {
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
}

/** Rank robustness: the Monte Carlo's probabilities as bars, with its progress while it runs. */
const RobustnessPanel = memo(function RobustnessPanelView({ robustness, rows }: { robustness: RobustnessState; rows: DisplayRow[] }) {
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
          Probability that each candidate stays in the top three when the estimates move within their stated uncertainties (pKa, S₀,
          each salt’s K_sp), {ROBUSTNESS_ITERATIONS} draws with a fixed seed, computed in the background with the current weights.
        </p>
        {robustness.status === 'error' ? <p role="alert">Robustness could not be computed: {robustness.error}</p> : null}
        {robustness.results ? (
          <div className={robustness.status === 'running' ? 'stale' : undefined}>
            <WhiskerBars
              title="Probability of staying in the top three"
              caption={rows
                .filter((r) => r.rank !== null)
                .map((r) => {
                  const x = robustness.results!.find((q) => q.id === r.id);
                  return x ? `${r.label}: ${(x.pTop3 * 100).toFixed(0)} % top three, ${(x.pFirst * 100).toFixed(0)} % first` : '';
                })
                .filter(Boolean)
                .join('; ')}
              unit="% of draws in the top three"
              domain={[0, 100]}
              format={(x) => `${x.toFixed(0)}`}
              rows={rows
                .filter((r) => r.rank !== null)
                .map((r) => {
                  const x = robustness.results!.find((q) => q.id === r.id);
                  return { id: r.id, label: `${r.rank}. ${r.label}`, value: (x?.pTop3 ?? 0) * 100, note: x ? `(first ${(x.pFirst * 100).toFixed(0)} %)` : '' };
                })}
            />
          </div>
        ) : robustness.status === 'running' ? (
          <p className="loading">Drawing…</p>
        ) : null}
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
  const ranked = useMemo(() => (data ? rankCandidates(data.screen.rows, weights) : []), [data, weights]);
  const rows = useMemo(() => (data ? displayRows(data, ranked) : []), [data, ranked]);
  const robustRows = useMemo(() => data?.screen.rows.map((r) => r.robustness), [data]);
  // The table follows the slider at once; the pictures below follow at lower priority.
  const deferredWeights = useDeferredValue(weights);
  const deferredRows = useDeferredValue(rows);
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
          <a href="#/library" onClick={(e) => (e.preventDefault(), goTo('library'))}>
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
              <span className="origin origin-measured">meas.</span> rests on your bench data. Dose number D₀ = (dose / 250 mL) / solubility;
              above 1 the dose does not dissolve (ICH M9). ±1σ ranges come from each estimate’s stated uncertainty.
            </p>
            <div className="ranking-grid">
              <WeightSliders
                weights={weights}
                onChange={setWeights}
                onReset={() => setWeights(screeningWeightsSchema.parse({}))}
              />
              <RankingTable rows={rows} onFocus={onFocus} />
            </div>
          </>
        ) : null}
      </section>
      {data ? (
        <>
          <ScreeningConditions project={project} settings={data.settings} />
          <RobustnessPanel robustness={robustness} rows={deferredRows} />
          <SolubilityPanel data={data} rows={deferredRows} doseMg={project.compound.doseMg} />
          <section className="panel" aria-labelledby="assumptions-title">
            <h2 id="assumptions-title">Assumptions of this screen</h2>
            <ul>
              {[...data.notes, ...data.screen.assumptions].map((a) => (
                <li key={a}>{a}</li>
              ))}
            </ul>
          </section>
        </>
      ) : null}
    </div>
  );
}
