import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { CompoundSpec } from '../screen-input';
import type { WorkerAnswer, WorkerJob } from './batch-worker-entry';
import {
  screenOne,
  withCheckedSettings,
  type BatchSettings,
  type ScreenOneResult,
} from './screen-one';

/**
 * Screens compounds on worker threads (node:worker_threads), or in this thread when one job is asked
 * for or the compiled worker file is not there (running from the TypeScript sources). Results come
 * back by sequence number; the caller restores the order. Compounds travel in chunks of
 * {@link CHUNK_SIZE} (one message each way per chunk, not per compound), and the settings go once, with
 * the thread.
 */
export interface Screener {
  /** How many threads screen at once. */
  readonly threads: number;
  /** How many compounds travel in one message. */
  readonly chunkSize: number;
  submit(seq: number, spec: CompoundSpec, id: string): void;
  /** Resolves with the next finished compound (any order); sends a partly filled chunk first. */
  next(): Promise<{ seq: number; result: ScreenOneResult }>;
  close(): Promise<void>;
}

/**
 * Compounds per message between threads. Each message costs a structured clone and a wake-up of the
 * other thread; a chunk of 8 compounds makes that cost small beside the work,
 * while keeping both threads busy at the end of a file. Chosen by measurement (npm run bench), not sourced.
 */
export const CHUNK_SIZE = 8;

/** The compiled worker, next to the compiled CLI (dist-cli/batch-worker.js). Built by name so bundlers leave it alone. */
const WORKER_FILE = ['batch-worker', 'js'].join('.');

export function workerFileUrl(): URL | null {
  const url = new URL(`./${WORKER_FILE}`, import.meta.url);
  return url.protocol === 'file:' && existsSync(fileURLToPath(url)) ? url : null;
}

type Done = { seq: number; result: ScreenOneResult } | { failure: Error };

function queue<T>() {
  const items: T[] = [];
  let head = 0;
  const waiting: ((t: T) => void)[] = [];
  return {
    get size() {
      return items.length - head;
    },
    push(t: T) {
      const w = waiting.shift();
      if (w) w(t);
      else items.push(t);
    },
    pop(): Promise<T> {
      if (head < items.length) {
        const t = items[head++]!;
        if (head > 1024 && head * 2 > items.length) {
          items.splice(0, head);
          head = 0;
        }
        return Promise.resolve(t);
      }
      return new Promise((r) => waiting.push(r));
    },
  };
}

function inThreadScreener(batch: BatchSettings): Screener {
  const settings = withCheckedSettings(batch);
  const done = queue<Done>();
  return {
    threads: 1,
    chunkSize: 1,
    submit: (seq, spec, id) =>
      void screenOne(spec, settings, id).then((result) => done.push({ seq, result })),
    next: async () => {
      const m = await done.pop();
      if ('failure' in m) throw m.failure;
      return m;
    },
    close: async () => undefined,
  };
}

function threadScreener(url: URL, jobs: number, settings: BatchSettings): Screener {
  const done = queue<Done>();
  // A screening thread holds little (one chunk at a time, memoised ion data): modest heap limits make
  // V8 collect early instead of growing each thread's heap towards the default size. Measured on
  // 10,000 generated compounds, JSON Lines, 2 cores, load ~2: old 128 MB / default young 337–339 MB
  // peak, 24.3 s CPU; old 64 MB / young 16 MB 270–291 MB, 25.7–27.5 s CPU (the < 300 MB goal
  // of the batch costs about 5 % CPU). Output is the same bytes. Measured again (2 cores, load ~9,
  // --trace-gc on 2,000 compounds): young 24 MB scavenges as often as 16 MB (336 times each; V8
  // sizes its semi-spaces in steps); 32 MB halves the scavenges but peaked at 298–302 MB on 10,000
  // compounds as JSON Lines, over the goal; 32 MB young with 48 MB old stayed at 248–249 MB but its
  // CPU per compound was within the noise of this setting, and a lower old-space ceiling risks a
  // thread running out of memory on heavier input. So these limits stay.
  const workers = Array.from(
    { length: jobs },
    () =>
      new Worker(url, {
        workerData: settings,
        resourceLimits: { maxOldGenerationSizeMb: 64, maxYoungGenerationSizeMb: 16 },
      }),
  );
  const load = workers.map(() => 0);
  // each thread sends the column names with its first rows only (batch-worker-entry.ts)
  const columns: string[][] = workers.map(() => []);
  for (const [i, w] of workers.entries()) {
    w.on('message', (answer: WorkerAnswer) => {
      load[i]! -= answer.length;
      for (const a of answer) {
        const r = a.result;
        if (r.ok && r.rowCount > 0) {
          if (r.columns.length > 0) columns[i] = r.columns;
          else r.columns = columns[i]!;
        }
        done.push(a);
      }
    });
    w.on('error', (err) =>
      done.push({ failure: new Error(`a screening thread failed: ${err.message}`) }),
    );
  }
  let chunk: WorkerJob[] = [];
  const send = () => {
    if (chunk.length === 0) return;
    let best = 0;
    for (let i = 1; i < load.length; i++) if (load[i]! < load[best]!) best = i;
    load[best]! += chunk.length;
    workers[best]!.postMessage(chunk);
    chunk = [];
  };
  return {
    threads: jobs,
    chunkSize: CHUNK_SIZE,
    submit: (seq, spec, id) => {
      chunk.push({ seq, id, spec });
      if (chunk.length >= CHUNK_SIZE) send();
    },
    next: async () => {
      if (done.size === 0) send();
      const m = await done.pop();
      if ('failure' in m) throw m.failure;
      return m;
    },
    close: async () => {
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}

export function createScreener(jobs: number, settings: BatchSettings): Screener {
  const url = jobs > 1 ? workerFileUrl() : null;
  return url ? threadScreener(url, jobs, settings) : inThreadScreener(settings);
}
