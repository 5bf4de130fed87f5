/// <reference lib="webworker" />
import '@/persistence/zod-without-eval';
import {
  runRobustnessBatches,
  type RobustnessMessage,
  type RobustnessRequest,
} from './robustness-protocol';

/** The rank-robustness Monte Carlo, off the main thread so the sliders stay smooth. */
const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (e: MessageEvent<RobustnessRequest>) => {
  const req = e.data;
  const post = (m: RobustnessMessage) => scope.postMessage(m);
  try {
    const results = runRobustnessBatches(req, (done, total) =>
      post({ runId: req.runId, type: 'progress', done, total }),
    );
    post({
      runId: req.runId,
      type: 'result',
      results,
      iterations: Math.max(1, Math.round(req.iterations / req.batches)) * req.batches,
    });
  } catch (err) {
    post({
      runId: req.runId,
      type: 'error',
      message: err instanceof Error ? err.message : String(err),
    });
  }
};
