import { parentPort, workerData } from 'node:worker_threads';
import type { CompoundSpec } from '../screen-input';
import {
  screenOne,
  withCheckedSettings,
  type BatchSettings,
  type ScreenOneResult,
} from './screen-one';

/**
 * Entry file of the worker threads of `saltsmith screen --batch` (an entry, like src/cli/entry.ts: it
 * starts when run, and nothing imports it): screens the compounds it is sent, a chunk per message, and
 * answers with one message per chunk carrying each compound's sequence number so the main thread can
 * write the results in input order. The settings come once, with the thread (workerData), not with
 * every compound.
 */
export type WorkerJob = { seq: number; id: string; spec: CompoundSpec };
export type WorkerRequest = WorkerJob[];
export type WorkerAnswer = { seq: number; result: ScreenOneResult }[];

export function startBatchWorker(): void {
  const port = parentPort;
  if (!port) throw new Error('batch-worker runs only as a worker thread');
  const settings = withCheckedSettings(workerData as BatchSettings);
  // The column names are the same for every compound: they travel once, with this thread's first
  // rows, and the pool gives them to the later results (worker-pool.ts).
  let columnsSent = false;
  const lean = (result: ScreenOneResult): ScreenOneResult => {
    if (!result.ok || result.rowCount === 0) return result;
    if (!columnsSent) {
      columnsSent = true;
      return result;
    }
    // screenOne's result is this thread's own fresh object: emptied in place, not copied
    result.columns = [];
    return result;
  };
  port.on('message', (jobs: WorkerRequest) => {
    void Promise.all(
      jobs.map(async (j) => ({ seq: j.seq, result: await screenOne(j.spec, settings, j.id) })),
    ).then((answer: WorkerAnswer) => {
      // in message order, so that the columns come with the first rows the pool reads
      // the rows' bytes are handed over, not copied (each is its own buffer: TextEncoder.encode)
      const transfer: ArrayBuffer[] = [];
      for (const a of answer) {
        a.result = lean(a.result);
        if (a.result.ok) transfer.push(a.result.bytes.buffer as ArrayBuffer);
      }
      port.postMessage(answer, transfer);
    });
  });
}

startBatchWorker();
