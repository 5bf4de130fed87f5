import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { CompoundSpec } from '../screen-input';
import type { WorkerRequest } from './batch-worker-entry';
import { screenOne, type BatchSettings, type ScreenOneResult } from './screen-one';

/**
 * Screens compounds on worker threads (node:worker_threads), or in this thread when one job is asked
 * for or the compiled worker file is not there (running from the TypeScript sources). Results come
 * back by sequence number; the caller restores the order.
 */
export interface Screener {
  /** How many threads screen at once. */
  readonly threads: number;
  submit(seq: number, spec: CompoundSpec, id: string): void;
  /** Resolves with the next finished compound (any order). */
  next(): Promise<{ seq: number; result: ScreenOneResult }>;
  close(): Promise<void>;
}

/** The compiled worker, next to the compiled CLI (dist-cli/batch-worker.js). Built by name so bundlers leave it alone. */
const WORKER_FILE = ['batch-worker', 'js'].join('.');

export function workerFileUrl(): URL | null {
  const url = new URL(`./${WORKER_FILE}`, import.meta.url);
  return url.protocol === 'file:' && existsSync(fileURLToPath(url)) ? url : null;
}

function queue<T>() {
  const items: T[] = [];
  const waiting: ((t: T) => void)[] = [];
  return {
    push(t: T) {
      const w = waiting.shift();
      if (w) w(t);
      else items.push(t);
    },
    pop(): Promise<T> {
      const t = items.shift();
      return t !== undefined ? Promise.resolve(t) : new Promise((r) => waiting.push(r));
    },
  };
}

export function createScreener(jobs: number, settings: BatchSettings): Screener {
  const done = queue<{ seq: number; result: ScreenOneResult } | { failure: Error }>();
  const next = async () => {
    const m = await done.pop();
    if ('failure' in m) throw m.failure;
    return m;
  };
  const url = jobs > 1 ? workerFileUrl() : null;
  if (!url) {
    return {
      threads: 1,
      submit: (seq, spec, id) =>
        void screenOne(spec, settings, id).then((result) => done.push({ seq, result })),
      next,
      close: async () => undefined,
    };
  }
  // A screening thread holds little (one compound at a time, memoised ion data): a modest old-space
  // limit makes V8 collect early instead of growing each thread's heap towards the default size.
  const workers = Array.from(
    { length: jobs },
    () => new Worker(url, { resourceLimits: { maxOldGenerationSizeMb: 128 } }),
  );
  const load = workers.map(() => 0);
  for (const [i, w] of workers.entries()) {
    w.on('message', (m: { seq: number; result: ScreenOneResult }) => {
      load[i]!--;
      done.push(m);
    });
    w.on('error', (err) =>
      done.push({ failure: new Error(`a screening thread failed: ${err.message}`) }),
    );
  }
  return {
    threads: jobs,
    submit: (seq, spec, id) => {
      let best = 0;
      for (let i = 1; i < load.length; i++) if (load[i]! < load[best]!) best = i;
      load[best]!++;
      const msg: WorkerRequest = { seq, id, spec, settings };
      workers[best]!.postMessage(msg);
    },
    next,
    close: async () => {
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
