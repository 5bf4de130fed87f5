import type { Writable } from 'node:stream';
import Papa from 'papaparse';
import { openAtomicOutput } from '../../../output/atomic-write';
import type { OutputTarget } from '../../../output/output-target';
import { SCREENING_CAUTIONS } from '../../../output/cautions';
import { writeLine, writeText, type CliIo } from '../../../io';
import { KSP_NOTE } from '../screen-writers';
import type { ScreenOneResult } from './screen-one';

/**
 * The output side of `saltsmith screen --batch`: a sink that gathers the rows' UTF-8 bytes into blocks
 * of {@link BLOCK_BYTES} before each write (one system call per block, not per compound), and the writer
 * that puts the compounds' results out in input order, with the CSV header before the first rows and
 * the cautions last.
 */
export type Sink = {
  write: (data: string | Uint8Array) => Promise<void>;
  commit: () => Promise<void>;
  abort: () => Promise<void>;
};

/**
 * Bytes gathered before a write. 64 KiB keeps the sink's memory small and a write's fixed cost (a
 * system call, a promise) far below the cost of the bytes it carries — common practice for stream
 * buffers (Node's own default highWaterMark for file streams is 64 KiB).
 */
export const BLOCK_BYTES = 64 * 1024;

function blockSink(inner: Sink): Sink {
  let parts: Uint8Array[] = [];
  let size = 0;
  const flush = async () => {
    if (size === 0) return;
    const block = Buffer.concat(parts, size);
    parts = [];
    size = 0;
    await inner.write(block);
  };
  return {
    write: async (data) => {
      const bytes = typeof data === 'string' ? Buffer.from(data, 'utf8') : data;
      parts.push(bytes);
      size += bytes.length;
      if (size >= BLOCK_BYTES) await flush();
    },
    commit: async () => {
      await flush();
      await inner.commit();
    },
    abort: () => inner.abort(),
  };
}

/** stdout, or an atomically replaced file (`--out`), written in blocks. */
export async function openSink(target: OutputTarget | undefined, stream: Writable): Promise<Sink> {
  if (target === undefined)
    return blockSink({
      write: (t) => writeText(stream, t),
      commit: async () => undefined,
      abort: async () => undefined,
    });
  return blockSink(await openAtomicOutput(target));
}

/** One compound's place in the output: its line, id, and (once known) its result or input error. */
export type PendingCompound = {
  lineNo: number;
  id: string;
  result: ScreenOneResult | null;
  error?: string;
};

/**
 * Writes results in input order: a compound's rows go out once every earlier compound's have.
 * Errors go to stderr or `--errors`, counted.
 */
export function orderedWriter(
  out: Sink,
  outFormat: 'csv' | 'jsonl',
  errors: Sink | null,
  io: CliIo,
) {
  const pending = new Map<number, PendingCompound>();
  let nextToWrite = 0;
  let columns: string[] | null = null;
  const counts = { failed: 0, rowsOut: 0 };
  const reportError = async (lineNo: number, id: string, message: string) => {
    counts.failed++;
    const line = `line ${lineNo}${id ? ` (id ${id})` : ''}: ${message}`;
    if (errors) await errors.write(line + '\n');
    else writeLine(io.stderr, `saltsmith screen --batch: ${line}`);
  };
  // The rows arrive as text, written where they were screened (screen-one.ts); the CSV header goes
  // before the first compound's rows.
  const writeRows = async (r: Extract<ScreenOneResult, { ok: true }>) => {
    if (r.rowCount === 0) return;
    if (outFormat === 'csv' && columns === null) {
      columns = r.columns;
      await out.write(Papa.unparse({ fields: columns, data: [] }, { newline: '\n' }));
    }
    await out.write(r.bytes);
    counts.rowsOut += r.rowCount;
  };
  const flush = async () => {
    for (let p = pending.get(nextToWrite); p; p = pending.get(nextToWrite)) {
      if (p.result === null && p.error === undefined) return;
      pending.delete(nextToWrite);
      nextToWrite++;
      if (p.error !== undefined) await reportError(p.lineNo, p.id, p.error);
      else if (p.result && !p.result.ok) await reportError(p.lineNo, p.id, p.result.error);
      else if (p.result && p.result.ok) await writeRows(p.result);
    }
  };
  const closing = async () => {
    const notes = [...SCREENING_CAUTIONS, KSP_NOTE];
    if (outFormat === 'jsonl') await out.write(JSON.stringify({ cautions: notes }) + '\n');
    else await out.write(notes.map((c) => `# ${c}`).join('\n') + '\n');
  };
  return { pending, counts, flush, closing };
}
