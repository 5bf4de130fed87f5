import {
  rankRobustness,
  type RobustnessRow,
  type RobustnessShared,
  type ScreeningWeights,
} from '@/chem';

/** A request to the rank-robustness worker. */
export interface RobustnessRequest {
  runId: number;
  rows: RobustnessRow[];
  weights: ScreeningWeights;
  shared: RobustnessShared;
  iterations: number;
  seed: number;
  /** Number of batches the iterations are split into (one progress message per batch). */
  batches: number;
}

export interface RobustnessOutcome {
  id: string;
  /** Probability of ranking in the top three, 0–1. */
  pTop3: number;
  /** Probability of ranking first, 0–1. */
  pFirst: number;
}

export type RobustnessMessage =
  | { runId: number; type: 'progress'; done: number; total: number }
  | { runId: number; type: 'result'; results: RobustnessOutcome[]; iterations: number }
  | { runId: number; type: 'error'; message: string };

/**
 * Run the Monte Carlo in equal batches with seeds seed, seed+1, …; the probabilities of the whole run
 * are the means of the batches' (equal batch sizes make this exact). Reproducible for a given seed
 * and batch count. `onBatch` reports progress after each batch.
 */
export function runRobustnessBatches(
  req: RobustnessRequest,
  onBatch: (done: number, total: number) => void = () => {},
): RobustnessOutcome[] {
  const per = Math.max(1, Math.round(req.iterations / req.batches));
  const sums = new Map<string, { pTop3: number; pFirst: number }>();
  for (let b = 0; b < req.batches; b++) {
    const part = rankRobustness(req.rows, req.weights, req.shared, {
      iterations: per,
      seed: req.seed + b,
    });
    for (const r of part) {
      const s = sums.get(r.id) ?? { pTop3: 0, pFirst: 0 };
      s.pTop3 += r.pTop3;
      s.pFirst += r.pFirst;
      sums.set(r.id, s);
    }
    onBatch(b + 1, req.batches);
  }
  return [...sums].map(([id, s]) => ({
    id,
    pTop3: s.pTop3 / req.batches,
    pFirst: s.pFirst / req.batches,
  }));
}
