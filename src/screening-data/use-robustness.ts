import { useEffect, useRef, useState } from 'react';
import type { RobustnessRow, RobustnessShared, ScreeningWeights } from '@/chem';
import {
  runRobustnessBatches,
  type RobustnessMessage,
  type RobustnessOutcome,
  type RobustnessRequest,
} from './robustness-protocol';

export interface RobustnessState {
  status: 'idle' | 'running' | 'done' | 'error';
  /** 0–1 while running. */
  progress: number;
  results?: RobustnessOutcome[];
  iterations?: number;
  error?: string;
}

/** Monte Carlo iterations per run and the fixed seed (a run is reproducible). */
export const ROBUSTNESS_ITERATIONS = 2000;
export const ROBUSTNESS_SEED = 20261201;
const BATCHES = 10;
/** Wait this long after the last weight change before starting a new run, ms. */
const SETTLE_MS = 250;

type SetState = (update: RobustnessState | ((s: RobustnessState) => RobustnessState)) => void;

/** Post the run to the (lazily created) worker; only the latest run's messages reach the state. */
function runInWorker(
  workerRef: { current: Worker | null },
  latestRun: () => number,
  req: RobustnessRequest,
  setState: SetState,
): void {
  if (!workerRef.current) {
    workerRef.current = new Worker(new URL('./robustness.worker.ts', import.meta.url), {
      type: 'module',
    });
  }
  const worker = workerRef.current;
  worker.onmessage = (e: MessageEvent<RobustnessMessage>) => {
    const m = e.data;
    if (m.runId !== latestRun()) return;
    if (m.type === 'progress')
      setState((s) => ({ ...s, status: 'running', progress: m.done / m.total }));
    else if (m.type === 'result')
      setState({ status: 'done', progress: 1, results: m.results, iterations: m.iterations });
    else setState({ status: 'error', progress: 0, error: m.message });
  };
  worker.onerror = (e) =>
    setState({
      status: 'error',
      progress: 0,
      error: e.message || 'The robustness worker failed',
    });
  worker.postMessage(req);
}

/** No Worker: run the same batches on the main thread; a cancelled or stale run is dropped. */
function runOnMainThread(
  req: RobustnessRequest,
  isCurrent: () => boolean,
  isCancelled: () => boolean,
  setState: SetState,
): void {
  void (async () => {
    try {
      const results = runRobustnessBatches(req);
      if (!isCancelled() && isCurrent()) {
        setState({
          status: 'done',
          progress: 1,
          results,
          iterations: Math.round(req.iterations / BATCHES) * BATCHES,
        });
      }
    } catch (err) {
      if (!isCancelled()) setState({ status: 'error', progress: 0, error: String(err) });
    }
  })();
}

/**
 * Rank robustness in a Web Worker, restarted when the rows or weights change (after they settle).
 * Where no Worker exists (tests, very old browsers) the same batches run on the main thread between
 * frames. A stale run's messages are ignored.
 */
export function useRobustness(
  rows: RobustnessRow[] | undefined,
  weights: ScreeningWeights,
  shared: RobustnessShared | undefined,
): RobustnessState {
  const [state, setState] = useState<RobustnessState>({ status: 'idle', progress: 0 });
  const workerRef = useRef<Worker | null>(null);
  const runRef = useRef(0);

  useEffect(() => () => workerRef.current?.terminate(), []);

  useEffect(() => {
    if (!rows || !shared || rows.length === 0) {
      setState({ status: 'idle', progress: 0 });
      return;
    }
    const runId = ++runRef.current;
    const req: RobustnessRequest = {
      runId,
      rows,
      weights,
      shared,
      iterations: ROBUSTNESS_ITERATIONS,
      seed: ROBUSTNESS_SEED,
      batches: BATCHES,
    };
    setState((s) =>
      s.status === 'running' && s.progress === 0 ? s : { ...s, status: 'running', progress: 0 },
    );
    let cancelled = false;
    const timer = setTimeout(() => {
      if (typeof Worker !== 'undefined')
        runInWorker(workerRef, () => runRef.current, req, setState);
      else
        runOnMainThread(
          req,
          () => runId === runRef.current,
          () => cancelled,
          setState,
        );
    }, SETTLE_MS);
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [rows, weights, shared]);

  return state;
}
