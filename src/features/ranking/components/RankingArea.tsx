import { memo, useCallback, useDeferredValue, useEffect, useMemo, useRef, useState } from 'react';
import {
  rankCandidates,
  screeningWeightsSchema,
  separationSummary,
  type ScreeningWeights,
} from '@/chem';
import { ScreenOutcomesPanel } from '@/components/ScreenOutcomesPanel';
import type { ProjectRecord } from '@/persistence/records';
import { prewarmMeasureNextWorker } from '@/screening-data/use-measure-next';
import { useProjectScreening, type ScreeningState } from '@/screening-data/use-screening';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { useNavigationStore } from '@/stores/navigation-store';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import { useWeights } from '../hooks/use-weights';
import { displayRows, freeFormShown } from '../ranking-rows';
import { SeparationLine } from './SeparationLine';
import { RankingTable } from './RankingTable';
import { RankingCautions, RankingPanels, type SettledRanking } from './RankingPanels';
import { WeightSliders } from './WeightSliders';
import '../ranking.css';

/** The salt screen's outcomes so far; it reads its own records, so a weight step leaves it alone. */
const Outcomes = memo(ScreenOutcomesPanel);

/** A weight movement has ended when the weights stood still this long (ms) or the slider sent `change`. */
const SETTLE_MS = 400;
/**
 * …and it has ended this long after the slider's `change` with no other `change` (ms): key presses a
 * person makes in a row (two or three a second) settle once, after the last, so the panels below and
 * the document order do not take the main thread between two presses.
 */
const CHANGE_SETTLE_MS = 400;

type GoTo = ReturnType<typeof useNavigationStore.getState>['goTo'];

/**
 * The ranking under the weights of this instant (the table follows every slider step) and as it
 * stood when the last movement ended (`settled`, deferred: the separation line and every panel below
 * the table follow it). A movement ends on the slider's `change` or when the weights stand still for
 * a moment (a reset, another tab, no `change`).
 */
function useRankingView(data: ProjectScreening | undefined, weights: ScreeningWeights) {
  const ranked = useMemo(
    () => (data ? rankCandidates(data.screen.rows, weights) : []),
    [data, weights],
  );
  const rows = useMemo(() => (data ? displayRows(data, ranked) : []), [data, ranked]);
  const [settleTick, setSettleTick] = useState(0);
  const bump = useCallback(() => setSettleTick((t) => t + 1), []);
  // The slider's `change` settles a moment later, so that a run of key presses settles once, after
  // the frames of its re-ranked tables.
  const pending = useRef<ReturnType<typeof setTimeout>>(undefined);
  const onSettle = useCallback(() => {
    clearTimeout(pending.current);
    pending.current = setTimeout(bump, CHANGE_SETTLE_MS);
  }, [bump]);
  useEffect(() => () => clearTimeout(pending.current), []);
  useEffect(() => {
    const t = setTimeout(bump, SETTLE_MS);
    return () => clearTimeout(t);
  }, [weights, bump]);
  const settledNow = useMemo<SettledRanking>(
    () => ({ rows, weights, media: data?.settings.media ?? [] }),
    [data, settleTick], // eslint-disable-line react-hooks/exhaustive-deps
  );
  const settled = useDeferredValue(settledNow);
  const labels = useMemo(() => Object.fromEntries(rows.map((r) => [r.id, r.label])), [data]); // eslint-disable-line react-hooks/exhaustive-deps
  return { rows, settleTick, onSettle, settled, labels };
}

/** The shortlist is empty: where to fill it. */
function EmptyShortlist({ goTo }: { goTo: GoTo }) {
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

/** The area's title with what the screen is doing now. */
function RankingHeader(props: { screening: ScreeningState; count: number; saving: boolean }) {
  const { status, result } = props.screening;
  const text =
    status === 'loading'
      ? result
        ? 'Recomputing…'
        : 'Screening the shortlist (loading the structure tools)…'
      : status === 'error'
        ? 'Screen failed'
        : `${props.count} candidates ranked${props.saving ? ' · saving weights…' : ''}`;
  return (
    <header className="panel-head">
      <h2 id="ranking-title">Ranking</h2>
      <span role="status" aria-live="polite" className="muted">
        {text}
      </span>
    </header>
  );
}

/** Why the shortlist cannot be screened, and where to fix it. */
function ScreenErrorNote({ error, goTo }: { error: string | undefined; goTo: GoTo }) {
  return (
    <div role="alert" className="screen-error">
      <p>
        <strong>The shortlist cannot be screened yet:</strong> {error}
      </p>
      <p>
        Fix it in the{' '}
        <a href="#/compound" onClick={(e) => (e.preventDefault(), goTo('compound'))}>
          Compound
        </a>{' '}
        area (an intrinsic solubility, or a melting point with log P, and a dose are needed).
      </p>
    </div>
  );
}

/** Candidates the screen left out, and how to read the table's marks. */
function TableNotes({ missing }: { missing: ProjectScreening['missing'] }) {
  return (
    <>
      {missing.length ? (
        <ul className="missing">
          {missing.map((m) => (
            <li key={m.candidateId}>
              {m.ionId}: not screened — {m.reason}
            </li>
          ))}
        </ul>
      ) : null}
      <p className="legend muted">
        <span className="origin origin-estimated">est.</span> estimate from the models;{' '}
        <span className="origin origin-measured">meas.</span> rests on your bench data. Dose number
        D₀ = (dose / 250 mL) / solubility; above 1 the dose does not dissolve (ICH M9). ±1σ ranges
        come from each estimate’s stated uncertainty.
      </p>
    </>
  );
}

/** The Ranking area: the weighted, explained shortlist with its robustness and pH–solubility picture. */
export function RankingArea({ project }: { project: ProjectRecord }) {
  const screening = useProjectScreening(project);
  const { weights, setWeights, saving } = useWeights(project);
  const goTo = useNavigationStore((s) => s.goTo);
  const focus = useRankingViewStore((s) => s.focus);
  const resetView = useRankingViewStore((s) => s.resetForProject);
  useEffect(() => resetView(), [project.id, resetView]);
  // The worker of "Measure next" loads while the screen computes, not after the table is drawn.
  useEffect(() => prewarmMeasureNextWorker(), []);
  const data = screening.result;
  const { rows, settleTick, onSettle, settled, labels } = useRankingView(data, weights);
  const separation = useMemo(
    () => (data ? separationSummary(data.screen, settled.weights) : null),
    [data, settled.weights],
  );
  const { name, doseMg } = project.compound;
  const freeForm = useMemo(
    () => (data ? freeFormShown(data, name, doseMg) : null),
    [data, name, doseMg],
  );
  const onFocus = useCallback((id: string) => (focus(id), goTo('energetics')), [focus, goTo]);
  const onReset = useCallback(
    () => (setWeights(screeningWeightsSchema.parse({})), onSettle()),
    [setWeights, onSettle],
  );

  if (screening.candidates?.length === 0) return <EmptyShortlist goTo={goTo} />;
  return (
    <div className="ranking-area">
      <section className="panel" aria-labelledby="ranking-title">
        <RankingHeader screening={screening} count={rows.length} saving={saving} />
        <RankingCautions />
        <Outcomes project={project} />
        {screening.status === 'error' ? (
          <ScreenErrorNote error={screening.error} goTo={goTo} />
        ) : null}
        {!data && screening.status === 'loading' ? (
          <p className="loading" role="status">
            Computing pH–solubility profiles, dose numbers and enthalpies…
          </p>
        ) : null}
        {data ? (
          <>
            <TableNotes missing={data.missing} />
            <SeparationLine summary={separation} />
            <div className="ranking-grid">
              <WeightSliders
                weights={weights}
                onChange={setWeights}
                onReset={onReset}
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
        <RankingPanels project={project} data={data} settled={settled} labels={labels} />
      ) : null}
    </div>
  );
}
