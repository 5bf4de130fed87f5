import type { Writable } from 'node:stream';
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { CliError, usageError, valueError } from '../../../args/cli-error';
import { openAtomicOutput } from '../../../output/atomic-write';
import { checkRunFiles } from '../../../output/output-target';
import { writeLine, type CliIo } from '../../../io';
import { boundedLines } from '../../eval/bounded-lines';
import { settingsFromBatchFlags } from './batch-settings';
import type { ScreenFlags } from '../screen-flags';
import { checkHeader, csvCells, type BatchColumn } from './batch-row';
import { readCompoundLine } from './batch-input';
import { openSink, orderedWriter } from './batch-output';
import { createProgressBar } from './progress-bar';
import { createScreener, type Screener } from './worker-pool';

/**
 * `saltsmith screen --batch file`: one compound per line (CSV with a header, or JSON Lines), screened
 * with the same core and settings as a single `screen`, written as one long table — a row per compound
 * and candidate, with the compound id and rank — in input order. Streamed: lines are read as the
 * screening keeps up, at most a few chunks of compounds per thread are in flight, and output waits for
 * a slow reader. Bad rows are reported by line number (stderr or --errors) and the rest go on; exit 1
 * if any row failed. The steps: the input lines (batch-input.ts), the threads (worker-pool.ts), the
 * ordered output (batch-output.ts).
 */

async function batchFormat(path: string): Promise<{ format: 'csv' | 'jsonl'; size: number }> {
  const format = /\.csv$/i.test(path) ? 'csv' : /\.(jsonl|ndjson)$/i.test(path) ? 'jsonl' : null;
  if (!format)
    throw usageError(
      '--batch',
      `cannot tell the format of "${path}" from its name`,
      'a .csv or .jsonl file',
    );
  try {
    const st = await stat(path);
    if (st.isDirectory())
      throw valueError('--batch', `${path} is a folder`, 'a .csv or .jsonl file');
    return { format, size: st.size };
  } catch (err) {
    if (err instanceof CliError) throw err;
    throw valueError(
      '--batch',
      `cannot read ${path} (${(err as NodeJS.ErrnoException).code ?? String(err)})`,
    );
  }
}

type Writer = ReturnType<typeof orderedWriter>;

/** Reads the file line by line, hands compounds to the screener and keeps the in-flight work bounded. */
async function feedLines(
  path: string,
  format: 'csv' | 'jsonl',
  flags: ScreenFlags,
  screener: Screener,
  writer: Writer,
  bar: ReturnType<typeof createProgressBar> | null,
) {
  let header: BatchColumn[] | null = format === 'jsonl' ? [] : null;
  const seenIds = new Map<string, number>();
  const st = { bytes: 0, compounds: 0, seq: 0, inFlight: 0 };
  // Bounded memory: at most four chunks per thread in flight, and results held for ordering bounded too.
  const window = Math.max(4, screener.threads * screener.chunkSize * 4);
  const collectOne = async () => {
    const { seq: s, result } = await screener.next();
    st.inFlight--;
    st.compounds++;
    writer.pending.get(s)!.result = result;
    await writer.flush();
  };
  for await (const line of boundedLines(
    createReadStream(path),
    undefined,
    (n) => (st.bytes += n),
  )) {
    bar?.update(st.bytes, st.compounds);
    if ('invalid' in line || 'tooLongBytes' in line) {
      const error =
        'invalid' in line
          ? line.invalid.message
          : `line: ${line.tooLongBytes} bytes is longer than 1 MiB`;
      writer.pending.set(st.seq++, { lineNo: line.lineNo, id: '', result: null, error });
      await writer.flush();
      continue;
    }
    const text = line.text;
    if (text.trim() === '' || (format === 'csv' && text.startsWith('#'))) continue;
    if (header === null) {
      header = checkHeader(csvCells(text).map((c) => c.trim()));
      continue;
    }
    const origins = { pka: flags['pka-origin'] ?? 'not-stated', s0: flags['s0-origin'] ?? null };
    const r = readCompoundLine(text, line.lineNo, format, header, origins, seenIds);
    if (!r.ok) {
      writer.pending.set(st.seq++, { lineNo: line.lineNo, id: r.id, result: null, error: r.error });
      await writer.flush();
      continue;
    }
    writer.pending.set(st.seq, { lineNo: line.lineNo, id: r.id, result: null });
    screener.submit(st.seq++, r.spec, r.id);
    st.inFlight++;
    while (st.inFlight > 0 && (st.inFlight >= window || writer.pending.size > 4 * window))
      await collectOne();
  }
  if (header === null)
    throw valueError(
      '--batch',
      `${path} has no header line`,
      `a CSV header with the columns id, kind, pkas, smiles or formula, …`,
    );
  while (st.inFlight > 0) await collectOne();
  await writer.flush();
  return st;
}

/**
 * The batch's outputs, checked before anything is read or written (never the batch file, never each
 * other: output-target.ts) and opened; if the second cannot be opened the first is removed.
 */
async function openBatchOutputs(path: string, flags: ScreenFlags, stdout: Writable) {
  const targets = await checkRunFiles({
    inputs: [{ flag: '--batch', path }],
    outputs: [
      { flag: '--out', path: flags.out },
      { flag: '--errors', path: flags.errors },
    ],
  });
  const errorsTarget = targets.find((x) => x.flag === '--errors');
  const out = await openSink(
    targets.find((x) => x.flag === '--out'),
    stdout,
  );
  try {
    const errors = errorsTarget ? await openAtomicOutput(errorsTarget) : null;
    return { out, errors };
  } catch (err) {
    await out.abort();
    throw err;
  }
}

export async function runBatch(flags: ScreenFlags, io: CliIo): Promise<number> {
  const path = flags.batch!;
  const { format, size } = await batchFormat(path);
  const settings = settingsFromBatchFlags(flags);
  const { out, errors } = await openBatchOutputs(path, flags, io.stdout);
  // The worker threads start only once every output is open, and are stopped on every way out (below).
  const screener = createScreener(flags.jobs ?? availableParallelism(), settings);
  const bar = io.stderrIsTty ? createProgressBar(io.stderr, size) : null;
  const writer = orderedWriter(out, settings.outFormat, errors, io);
  let st;
  try {
    st = await feedLines(path, format, flags, screener, writer, bar);
    await writer.closing();
    await out.commit();
    await errors?.commit();
  } catch (err) {
    await out.abort();
    await errors?.abort();
    throw err;
  } finally {
    await screener.close();
  }
  bar?.finish(st.bytes, st.compounds);
  const { failed, rowsOut } = writer.counts;
  writeLine(
    io.stderr,
    `saltsmith screen --batch: ${st.seq - failed} of ${st.seq} compound(s) screened on ${screener.threads} thread(s), ${rowsOut} row(s)${failed ? `, ${failed} failed${flags.errors ? ` (see ${flags.errors})` : ''}` : ''}`,
  );
  return failed > 0 ? 1 : 0;
}
