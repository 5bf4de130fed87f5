import { defineCommand } from '../../define-command';
import { HELP_FLAG_SPEC, helpRequested } from '../../args/help';
import { COMMAND_USAGE } from '../../command-usage';
import { parseFlags } from '../../args/parse-flags';
import { writeLine, writeText, type CliCommand } from '../../io';
import { parseStrictJson, StrictJsonError } from '@/chem';
import { boundedLines, MAX_JSON_DEPTH, MAX_LINE_BYTES } from './bounded-lines';
import { describeError, evalRegistry, evaluateRequest, type LineError } from './registry';

/**
 * `saltsmith eval`: JSON Lines in, one JSON line out per request, in order.
 *
 * Every request has a `"kind"` (see registry.ts and built-in-kinds.ts). A line that fails gets
 * `{"line": n, "ok": false, "error": {...}}` and the run goes on; the exit status is 1 if any line
 * failed. Every line is read by the core's strict JSON reader: lines longer than 1 MiB, not valid
 * UTF-8, nested deeper than 64 levels or naming a key twice are refused line by line. Output waits
 * for a slow reader.
 */

const { summary: SUMMARY, usage: USAGE } = COMMAND_USAGE.eval;

/** The `id` to echo: a string (≤ 200 characters) or a finite number; anything else is not echoed. */
function echoId(value: unknown): string | number | undefined {
  if (!value || typeof value !== 'object' || Array.isArray(value)) return undefined;
  const id = (value as { id?: unknown }).id;
  if (typeof id === 'string' && id.length <= 200) return id;
  if (typeof id === 'number' && Number.isFinite(id)) return id;
  return undefined;
}

/** A refusal by the JSON reader as an error object: the field is the key path where it happened. */
const jsonError = (err: StrictJsonError): LineError => ({
  type: 'json',
  field: err.field,
  message: err.message,
  accepted: err.accepted,
});

const failure = (line: number, error: LineError, id?: string | number) =>
  JSON.stringify({ line, ...(id !== undefined ? { id } : {}), ok: false, error });

/** Answer one line of text: the JSON line to write and whether it failed. */
export async function answerLine(
  lineNo: number,
  text: string,
): Promise<{ json: string; ok: boolean }> {
  let value: unknown;
  try {
    // The one JSON reader: a key twice, nesting deeper than 64, __proto__ are refused here.
    value = parseStrictJson(text, {
      maxBytes: MAX_LINE_BYTES,
      maxDepth: MAX_JSON_DEPTH,
      field: 'line',
    });
  } catch (err) {
    if (!(err instanceof StrictJsonError)) throw err;
    return { ok: false, json: failure(lineNo, jsonError(err)) };
  }
  const id = echoId(value);
  try {
    const answer = await evaluateRequest(value, evalRegistry);
    return {
      ok: true,
      json: JSON.stringify({
        line: lineNo,
        ...(id !== undefined ? { id } : {}),
        ok: true,
        ...answer,
      }),
    };
  } catch (err) {
    return { ok: false, json: failure(lineNo, describeError(err), id) };
  }
}

export const evalCommand: CliCommand = defineCommand('eval', {
  summary: SUMMARY,
  usage: USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, HELP_FLAG_SPEC);
    if (helpRequested(flags, io, `${USAGE}\nKinds: ${evalRegistry.list().join(', ')}`)) return 0;
    let failed = 0;
    for await (const line of boundedLines(io.stdin, MAX_LINE_BYTES)) {
      let json: string;
      if ('invalid' in line) {
        failed++;
        json = failure(line.lineNo, jsonError(line.invalid));
      } else if ('tooLongBytes' in line) {
        failed++;
        json = failure(line.lineNo, {
          type: 'json',
          field: 'line',
          message: `the line is ${line.tooLongBytes} bytes long`,
          accepted: `lines of at most ${MAX_LINE_BYTES} bytes (1 MiB)`,
        });
      } else {
        if (line.text.trim() === '') continue;
        const a = await answerLine(line.lineNo, line.text);
        if (!a.ok) failed++;
        json = a.json;
      }
      await writeText(io.stdout, json + '\n');
    }
    if (failed > 0) writeLine(io.stderr, `saltsmith eval: ${failed} line(s) failed`);
    return failed > 0 ? 1 : 0;
  },
});
