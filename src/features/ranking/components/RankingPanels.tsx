import { memo, useMemo } from 'react';
import type { ScreeningWeights } from '@/chem';
import { CAUTION_LINES } from '@/components/Cautions';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import type { ProjectRecord } from '@/persistence/records';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import {
  useRobustness,
  ROBUSTNESS_ITERATIONS,
  type RobustnessState,
} from '@/screening-data/use-robustness';
import type { DisplayRow } from '../ranking-rows';
import { BufferMedia } from './BufferMedia';
import { ExcipientMatrix } from './ExcipientMatrix';
import { MeasureNextPanel } from './MeasureNextPanel';
import { ScreeningConditions } from './ScreeningConditions';
import { SolubilityPanel } from './SolubilityPanel';

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

/** The Monte Carlo's probabilities as bars: drawn again only when a new run's results arrive. */
const RobustnessBars = memo(function RobustnessBarsView({
  results: unordered,
  labels,
}: {
  results: NonNullable<RobustnessState['results']>;
  labels: Record<string, string>;
}) {
  // Ordered by the probability itself, so the bars change only when a new Monte Carlo run arrives.
  const results = [...unordered].sort((a, b) => b.pTop3 - a.pTop3 || b.pFirst - a.pFirst);
  return (
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
  );
});

/** Rank robustness: the Monte Carlo's probabilities as bars, with its progress while it runs. */
export const RobustnessPanel = memo(function RobustnessPanelView({
  robustness,
  labels,
}: {
  robustness: RobustnessState;
  labels: Record<string, string>;
}) {
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
        <div
          className={robustness.status === 'running' ? 'stale' : undefined}
          aria-busy={robustness.status === 'running'}
        >
          <RobustnessBars results={robustness.results} labels={labels} />
        </div>
      ) : robustness.status === 'running' ? (
        <p className="loading">Drawing…</p>
      ) : null}
    </section>
  );
});

/** What the screen assumed, in words; re-rendered only when the screen changes. */
export const ScreenAssumptions = memo(function ScreenAssumptionsView({
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

/** The ranking as it stood when the last weight movement ended (or the screen changed). */
export interface SettledRanking {
  rows: DisplayRow[];
  weights: ScreeningWeights;
  media: ProjectScreening['settings']['media'];
}

/** The three best candidates of the settled ranking, as one key (the chart's ticked salts follow it). */
const topThreeKey = (rows: readonly DisplayRow[]) =>
  rows
    .filter((r) => r.rank !== null && r.rank <= 3)
    .sort((a, b) => a.rank! - b.rank!)
    .map((r) => r.id)
    .join('|');

/**
 * Everything below the table: settings, media, excipients, robustness, "Measure next", the chart and
 * the assumptions. It follows the settled ranking (the end of a weight movement), never a single
 * slider step, so a movement re-renders the table alone.
 */
export const RankingPanels = memo(function RankingPanelsView({
  project,
  data,
  settled,
  labels,
}: {
  project: ProjectRecord;
  data: ProjectScreening;
  settled: SettledRanking;
  labels: Record<string, string>;
}) {
  const robustRows = useMemo(() => data.screen.rows.map((r) => r.robustness), [data]);
  const robustness = useRobustness(robustRows, settled.weights, data.screen.robustnessShared);
  return (
    <>
      <ScreeningConditions project={project} settings={data.settings} />
      <BufferMedia project={project} media={settled.media} rows={settled.rows} />
      <ExcipientMatrix project={project} chosen={data.settings.excipients} rows={settled.rows} />
      <RobustnessPanel robustness={robustness} labels={labels} />
      <MeasureNextPanel data={data} weights={settled.weights} labels={labels} />
      <SolubilityPanel
        data={data}
        labels={labels}
        topKey={topThreeKey(settled.rows)}
        doseMg={project.compound.doseMg}
      />
      <ScreenAssumptions data={data} />
    </>
  );
});
