import { defineCommand } from '../../define-command';
import { HELP_FLAG_SPEC, helpRequested } from '../../args/help';
import { COMMAND_USAGE } from '../../command-usage';
import { parseFlags } from '../../args/parse-flags';
import { writeLine, writeText, type CliCommand } from '../../io';
import { boundedLines, jsonNestingDepth, MAX_JSON_DEPTH, MAX_LINE_BYTES } from './bounded-lines';
import { describeError, evalRegistry, evaluateRequest, type LineError } from './registry';

/**
 * `saltsmith eval`: JSON Lines in, one JSON line out per request, in order.
 *
 * Every request has a `"kind"` (see registry.ts and built-in-kinds.ts). A line that fails gets
 * `{"line": n, "ok": false, "error": {...}}` and the run goes on; the exit status is 1 if any line
 * failed. Lines longer than 1 MiB or nested deeper than 64 levels are refused line by line. Output waits
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

const failure = (line: number, error: LineError, id?: string | number) =>
  JSON.stringify({ line, ...(id !== undefined ? { id } : {}), ok: false, error });

/** Answer one line of text: the JSON line to write and whether it failed. */
export async function answerLine(
  lineNo: number,
  text: string,
): Promise<{ json: string; ok: boolean }> {
  if (jsonNestingDepth(text) > MAX_JSON_DEPTH) {
    return {
      ok: false,
      json: failure(lineNo, {
        type: 'json',
        field: 'line',
        message: `nested deeper than ${MAX_JSON_DEPTH} levels`,
        accepted: `JSON nested at most ${MAX_JSON_DEPTH} levels deep`,
      }),
    };
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    return {
      ok: false,
      json: failure(lineNo, {
        type: 'json',
        field: 'line',
        message: `not valid JSON: ${err instanceof Error ? err.message : String(err)}`,
      }),
    };
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
      if ('tooLongBytes' in line) {
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
