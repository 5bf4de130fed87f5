import { parentPort } from 'node:worker_threads';
import type { CompoundSpec } from '../screen-input';
import { screenOne, type BatchSettings } from './screen-one';

/**
 * Entry file of the worker threads of `saltsmith screen --batch` (an entry, like src/cli/entry.ts: it
 * starts when run, and nothing imports it): screens the compounds it is sent, one message each, and
 * answers with the sequence number so the main thread can write the results in input order.
 */
export type WorkerRequest = {
  seq: number;
  id: string;
  spec: CompoundSpec;
  settings: BatchSettings;
};

export function startBatchWorker(): void {
  const port = parentPort;
  if (!port) throw new Error('batch-worker runs only as a worker thread');
  port.on('message', (m: WorkerRequest) => {
    void screenOne(m.spec, m.settings, m.id).then((result) =>
      port.postMessage({ seq: m.seq, result }),
    );
  });
}

startBatchWorker();
