import { startTransition, useEffect, useRef, useState } from 'react';
import type {
  MeasureNextResult,
  MeasureNextStatus,
  RobustnessRow,
  RobustnessShared,
  ScreeningWeights,
} from '@/chem';
import {
  runMeasureNext,
  type MeasureNextMessage,
  type MeasureNextRequest,
} from './measure-next-protocol';
import { ROBUSTNESS_SEED } from './use-robustness';

export interface MeasureNextState {
  status: 'idle' | 'running' | 'done' | 'error';
  /** 0–1 while running. */
  progress: number;
  result?: MeasureNextResult;
  /** Time the worker took for the last result, ms. */
  ms?: number;
  error?: string;
}

/**
 * Kept Monte Carlo draws and outcome strata per run; the seed is the robustness run's. 12 strata:
 * on the 12-candidate benchmark the values move by about 0.02 from seed to seed with 12, 16 or 64
 * strata alike (the draws' own noise dominates), and 12 take a quarter less time than 16.
 */
export const MEASURE_NEXT_ITERATIONS = 1000;
export const MEASURE_NEXT_OUTCOMES = 12;
/** Wait this long after the last change before starting a run (not the first), ms. */
const SETTLE_MS = 120;

/**
 * "Measure next" in its own Web Worker, restarted when the screen rows, the bench status or the
 * weights change. A run still going when the inputs change is abandoned (the worker is ended and a
 * fresh one started), so a stale computation never delays the new one. Without Worker (tests) the
 * same function runs on the main thread after the settle delay.
 */
const newWorker = () =>
  new Worker(new URL('./measure-next.worker.ts', import.meta.url), { type: 'module' });

/** A worker started ahead of need (its module fetched and evaluated), taken by the next run. */
let spare: Worker | null = null;

/**
 * Start a worker now, so the first run does not wait for the worker's module to load: the Ranking
 * area calls it when it opens, while the screen is still being computed. Returns the clean-up
 * (ends the spare if nothing took it).
 */
export function prewarmMeasureNextWorker(): () => void {
  if (typeof Worker !== 'undefined' && !spare) spare = newWorker();
  return () => {
    spare?.terminate();
    spare = null;
  };
}

/** The spare worker if there is one, else a new one. */
function spawn(): Worker {
  const w = spare ?? newWorker();
  spare = null;
  return w;
}

type SetState = (next: MeasureNextState | ((s: MeasureNextState) => MeasureNextState)) => void;

/** Without a Worker (tests): the same function on the main thread. */
function runInline(req: MeasureNextRequest, set: (s: MeasureNextState) => void) {
  try {
    const { result, ms } = runMeasureNext(req, undefined, () => performance.now());
    set({ status: 'done', progress: 1, result, ms });
  } catch (err) {
    set({ status: 'error', progress: 0, error: String(err) });
  }
}

/** The worker's messages into state; a stale run's are ignored (but still free the worker). */
function handleMessages(currentRun: () => number, release: () => void, setState: SetState) {
  return (e: MessageEvent<MeasureNextMessage>) => {
    const m = e.data;
    if (m.type !== 'progress') release();
    // A run has ended: start a spare now, while nothing waits, for the next restart.
    if (m.type !== 'progress' && !spare) spare = newWorker();
    if (m.runId !== currentRun()) return;
    // A transition: a key press on a weight slider never waits for the list to be drawn again.
    startTransition(() => {
      if (m.type === 'progress')
        setState((s) => ({ ...s, status: 'running', progress: m.done / m.total }));
      else if (m.type === 'result')
        setState({ status: 'done', progress: 1, result: m.result, ms: m.ms });
      else setState({ status: 'error', progress: 0, error: m.message });
    });
  };
}

export function useMeasureNext(
  rows: RobustnessRow[] | undefined,
  status: MeasureNextStatus[] | undefined,
  weights: ScreeningWeights,
  shared: RobustnessShared | undefined,
): MeasureNextState {
  const [state, setState] = useState<MeasureNextState>({ status: 'idle', progress: 0 });
  const workerRef = useRef<Worker | null>(null);
  const busyRef = useRef(false);
  const runRef = useRef(0);

  // Start the worker at once (its module loads while the screen is still computing).
  useEffect(() => {
    if (typeof Worker !== 'undefined' && !workerRef.current) workerRef.current = spawn();
    return () => {
      workerRef.current?.terminate();
      workerRef.current = null;
    };
  }, []);

  useEffect(() => {
    if (!rows || !status || !shared || rows.length === 0) {
      setState({ status: 'idle', progress: 0 });
      return;
    }
    const runId = ++runRef.current;
    const first = runId === 1;
    const req: MeasureNextRequest = {
      runId,
      rows,
      status,
      weights,
      shared,
      iterations: MEASURE_NEXT_ITERATIONS,
      outcomes: MEASURE_NEXT_OUTCOMES,
      seed: ROBUSTNESS_SEED,
    };
    setState((s) => (s.status === 'running' ? s : { ...s, status: 'running', progress: 0 }));
    let cancelled = false;
    const timer = setTimeout(
      () => {
        if (typeof Worker === 'undefined') {
          runInline(req, (next) => !cancelled && setState(next));
          return;
        }
        if (workerRef.current && busyRef.current) {
          workerRef.current.terminate();
          workerRef.current = null;
        }
        const worker = (workerRef.current ??= spawn());
        const release = () => (busyRef.current = false);
        worker.onmessage = handleMessages(() => runRef.current, release, setState);
        worker.onerror = (e) => {
          release();
          setState({ status: 'error', progress: 0, error: e.message || 'The worker failed' });
        };
        busyRef.current = true;
        worker.postMessage(req);
      },
      first ? 0 : SETTLE_MS,
    );
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [rows, status, weights, shared]);

  return state;
}
