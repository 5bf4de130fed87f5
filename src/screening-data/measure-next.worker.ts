/// <reference lib="webworker" />
import '@/persistence/zod-without-eval';
import {
  runMeasureNext,
  type MeasureNextMessage,
  type MeasureNextRequest,
} from './measure-next-protocol';

/** The value-of-information Monte Carlo ("Measure next"), off the main thread so the table never waits. */
const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (e: MessageEvent<MeasureNextRequest>) => {
  const req = e.data;
  const post = (m: MeasureNextMessage) => scope.postMessage(m);
  try {
    const { result, ms } = runMeasureNext(
      req,
      (done, total) => post({ runId: req.runId, type: 'progress', done, total }),
      () => performance.now(),
    );
    post({ runId: req.runId, type: 'result', result, ms });
  } catch (err) {
    post({
      runId: req.runId,
      type: 'error',
      message: err instanceof Error ? err.message : String(err),
    });
  }
};
