import { createReadStream } from 'node:fs';
import type { Writable } from 'node:stream';
import { stat } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import Papa from 'papaparse';
import { CliError, usageError, valueError } from '../../../args/cli-error';
import { parseStrictJson } from '@/chem';
import { openAtomicOutput } from '../../../output/atomic-write';
import { checkRunFiles, type OutputTarget } from '../../../output/output-target';
import { SCREENING_CAUTIONS } from '../../../output/cautions';
import { writeLine, writeText, type CliIo } from '../../../io';
import { boundedLines, MAX_JSON_DEPTH, MAX_LINE_BYTES } from '../../eval/bounded-lines';
import { settingsFromBatchFlags } from './batch-settings';
import type { ScreenFlags } from '../screen-flags';
import { KSP_NOTE } from '../screen-writers';
import {
  checkHeader,
  csvCells,
  rowFromJson,
  specFromRow,
  type BatchColumn,
  type RawRow,
} from './batch-row';
import { createProgressBar } from './progress-bar';
import { createScreener } from './worker-pool';
import { describeFailure } from '../../../define-command';
import type { ScreenOneResult } from './screen-one';

/**
 * `saltsmith screen --batch file`: one compound per line (CSV with a header, or JSON Lines), screened
 * with the same core and settings as a single `screen`, written as one long table — a row per compound
 * and candidate, with the compound id and rank — in input order. Streamed: lines are read as the
 * screening keeps up, at most a few compounds per thread are in flight, and output waits for a slow
 * reader. Bad rows are reported by line number (stderr or --errors) and the rest go on; exit 1 if any
 * row failed.
 */

type Sink = {
  write: (text: string) => Promise<void>;
  commit: () => Promise<void>;
  abort: () => Promise<void>;
};

async function openSink(target: OutputTarget | undefined, stream: Writable): Promise<Sink> {
  if (target === undefined) {
    return {
      write: (t) => writeText(stream, t),
      commit: async () => undefined,
      abort: async () => undefined,
    };
  }
  return openAtomicOutput(target);
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
    const errors: Sink | null = errorsTarget ? await openAtomicOutput(errorsTarget) : null;
    return { out, errors };
  } catch (err) {
    await out.abort();
    throw err;
  }
}

export async function runBatch(flags: ScreenFlags, io: CliIo): Promise<number> {
  const path = flags.batch!;
  const format = /\.csv$/i.test(path) ? 'csv' : /\.(jsonl|ndjson)$/i.test(path) ? 'jsonl' : null;
  if (!format)
    throw usageError(
      '--batch',
      `cannot tell the format of "${path}" from its name`,
      'a .csv or .jsonl file',
    );
  let size: number;
  try {
    const st = await stat(path);
    if (st.isDirectory())
      throw valueError('--batch', `${path} is a folder`, 'a .csv or .jsonl file');
    size = st.size;
  } catch (err) {
    if (err instanceof CliError) throw err;
    throw valueError(
      '--batch',
      `cannot read ${path} (${(err as NodeJS.ErrnoException).code ?? String(err)})`,
    );
  }
  const outFormat = flags.format ?? 'csv';
  const settings = settingsFromBatchFlags(flags);
  const jobs = flags.jobs ?? availableParallelism();
  const { out, errors } = await openBatchOutputs(path, flags, io.stdout);
  // The worker threads start only once every output is open, and are stopped on every way out (below).
  const screener = createScreener(jobs, settings);
  const bar = io.stderrIsTty ? createProgressBar(io.stderr, size) : null;

  let header: BatchColumn[] | null = format === 'jsonl' ? [] : null;
  let columns: string[] | null = null;
  let bytes = 0;
  let compounds = 0;
  let failed = 0;
  let rowsOut = 0;
  const seenIds = new Map<string, number>();
  const pending = new Map<
    number,
    { lineNo: number; id: string; name: string; result: ScreenOneResult | null; error?: string }
  >();
  let nextToWrite = 0;
  let seq = 0;
  let inFlight = 0;
  const window = Math.max(4, screener.threads * 4);

  const reportError = async (lineNo: number, id: string, message: string) => {
    failed++;
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
      await out.write(Papa.unparse({ fields: columns, data: [] }, { newline: '\n' }) + r.text);
    } else await out.write(r.text);
    rowsOut += r.rowCount;
  };
  const flush = async () => {
    for (
      let p = pending.get(nextToWrite);
      p && (p.result !== null || p.error !== undefined);
      p = pending.get(nextToWrite)
    ) {
      pending.delete(nextToWrite);
      nextToWrite++;
      if (p.error !== undefined) await reportError(p.lineNo, p.id, p.error);
      else if (p.result && !p.result.ok) await reportError(p.lineNo, p.id, p.result.error);
      else if (p.result && p.result.ok) await writeRows(p.result);
    }
  };
  const collectOne = async () => {
    const { seq: s, result } = await screener.next();
    inFlight--;
    compounds++;
    pending.get(s)!.result = result;
    await flush();
  };

  try {
    for await (const line of boundedLines(createReadStream(path), undefined, (n) => (bytes += n))) {
      bar?.update(bytes, compounds);
      if ('invalid' in line || 'tooLongBytes' in line) {
        pending.set(seq++, {
          lineNo: line.lineNo,
          id: '',
          name: '',
          result: null,
          error:
            'invalid' in line
              ? line.invalid.message
              : `line: ${line.tooLongBytes} bytes is longer than 1 MiB`,
        });
        await flush();
        continue;
      }
      const text = line.text;
      if (text.trim() === '' || (format === 'csv' && text.startsWith('#'))) continue;
      if (header === null) {
        header = checkHeader(csvCells(text).map((c) => c.trim()));
        continue;
      }
      let raw: RawRow | undefined;
      let id = '';
      let spec;
      try {
        if (format === 'csv') {
          const cells = csvCells(text);
          if (cells.length !== header.length)
            throw valueError('line', `has ${cells.length} cells, the header ${header.length}`);
          raw = Object.fromEntries(header.map((c, i) => [c, cells[i]]));
        } else {
          // The one JSON reader: a key twice, too deep nesting and __proto__ are refused.
          raw = rowFromJson(
            parseStrictJson(text, {
              maxBytes: MAX_LINE_BYTES,
              maxDepth: MAX_JSON_DEPTH,
              field: 'line',
            }),
          );
        }
        const r = specFromRow(raw, flags['pka-origin'] ?? 'not-stated', flags['s0-origin'] ?? null);
        id = r.id;
        spec = r.spec;
        const earlier = seenIds.get(id);
        if (earlier !== undefined)
          throw valueError(
            'id',
            `"${id}" was already used on line ${earlier}`,
            'a unique id per compound',
          );
        seenIds.set(id, line.lineNo);
      } catch (err) {
        if (id === '' && typeof raw?.id === 'string') id = raw.id.trim().slice(0, 120);
        pending.set(seq++, {
          lineNo: line.lineNo,
          id,
          name: '',
          result: null,
          error: describeFailure(err).message,
        });
        await flush();
        continue;
      }
      pending.set(seq, { lineNo: line.lineNo, id, name: spec.name, result: null });
      screener.submit(seq++, spec, id);
      inFlight++;
      // Bounded memory: at most `window` compounds in flight, and results held for ordering are bounded too.
      while (inFlight > 0 && (inFlight >= window || pending.size > 4 * window)) await collectOne();
    }
    if (header === null)
      throw valueError(
        '--batch',
        `${path} has no header line`,
        `a CSV header with the columns id, kind, pkas, smiles or formula, …`,
      );
    while (inFlight > 0) await collectOne();
    await flush();
    const closing = [...SCREENING_CAUTIONS, KSP_NOTE];
    if (outFormat === 'jsonl') await out.write(JSON.stringify({ cautions: closing }) + '\n');
    else await out.write(closing.map((c) => `# ${c}`).join('\n') + '\n');
    await out.commit();
    await errors?.commit();
  } catch (err) {
    await out.abort();
    await errors?.abort();
    // A read error of the batch file (a disk error, a file removed under us) is one line naming it.
    const e = err as NodeJS.ErrnoException;
    if (!(err instanceof CliError) && e.syscall === 'read')
      throw valueError('--batch', `cannot read ${path} (${e.code ?? e.message})`);
    throw err;
  } finally {
    await screener.close();
  }
  bar?.finish(bytes, compounds);
  writeLine(
    io.stderr,
    `saltsmith screen --batch: ${seq - failed} of ${seq} compound(s) screened on ${screener.threads} thread(s), ${rowsOut} row(s)${failed ? `, ${failed} failed${flags.errors ? ` (see ${flags.errors})` : ''}` : ''}`,
  );
  return failed > 0 ? 1 : 0;
}
