import {
  measureNext,
  type MeasureNextResult,
  type MeasureNextStatus,
  type RobustnessRow,
  type RobustnessShared,
  type ScreeningWeights,
} from '@/chem';

/** A request to the measure-next worker (the value of each bench measurement for first place). */
export interface MeasureNextRequest {
  runId: number;
  rows: RobustnessRow[];
  status: MeasureNextStatus[];
  weights: ScreeningWeights;
  shared: RobustnessShared;
  iterations: number;
  outcomes: number;
  seed: number;
}

export type MeasureNextMessage =
  | { runId: number; type: 'progress'; done: number; total: number }
  | { runId: number; type: 'result'; result: MeasureNextResult; ms: number }
  | { runId: number; type: 'error'; message: string };

/** Run one request, reporting progress after each candidate; `now` times it (ms). */
export function runMeasureNext(
  req: MeasureNextRequest,
  onProgress: (done: number, total: number) => void = () => {},
  now: () => number = () => 0,
): { result: MeasureNextResult; ms: number } {
  const t0 = now();
  const result = measureNext(req.rows, req.status, req.weights, req.shared, {
    iterations: req.iterations,
    outcomes: req.outcomes,
    seed: req.seed,
    onProgress,
  });
  return { result, ms: now() - t0 };
}
