import type { Readable } from 'node:stream';
import { decodeUtf8Strict, StrictJsonError } from '@/chem';

/** Longest request line `eval` reads, bytes (1 MiB): a longer line gets an error and is skipped. */
export const MAX_LINE_BYTES = 1024 * 1024;
/** Deepest nesting of arrays and objects in one request line (common practice). */
export const MAX_JSON_DEPTH = 64;

/**
 * One input line: its text; or its length when it was longer than the limit (its text is dropped); or
 * the refusal of its bytes when they are not valid UTF-8 (never replaced by U+FFFD).
 */
export type InputLine =
  | { lineNo: number; text: string }
  | { lineNo: number; tooLongBytes: number }
  | { lineNo: number; invalid: StrictJsonError };

/**
 * Split a byte stream into lines (LF or CRLF) without ever holding more than `maxBytes` of one line:
 * the rest of an over-long line is counted and discarded. Reading pauses while the consumer works on a
 * line, so a slow consumer slows the reader instead of buffering the input.
 */
export async function* boundedLines(
  input: Readable,
  maxBytes = MAX_LINE_BYTES,
  onBytes?: (n: number) => void,
): AsyncGenerator<InputLine> {
  let parts: Buffer[] = [];
  let size = 0;
  let overflow = false;
  let lineNo = 0;
  const finish = (): InputLine => {
    lineNo++;
    if (overflow) return { lineNo, tooLongBytes: size };
    let text: string;
    try {
      text = decodeUtf8Strict(parts.length === 1 ? parts[0]! : Buffer.concat(parts), 'line');
    } catch (err) {
      if (err instanceof StrictJsonError) return { lineNo, invalid: err };
      throw err;
    }
    if (text.endsWith('\r')) text = text.slice(0, -1);
    return { lineNo, text };
  };
  for await (const chunk of input) {
    const buf: Buffer = typeof chunk === 'string' ? Buffer.from(chunk, 'utf8') : (chunk as Buffer);
    onBytes?.(buf.length);
    let start = 0;
    for (;;) {
      const nl = buf.indexOf(10, start);
      const piece = buf.subarray(start, nl === -1 ? buf.length : nl);
      if (!overflow && size + piece.length > maxBytes) {
        overflow = true;
        parts = [];
      }
      if (!overflow && piece.length > 0) parts.push(Buffer.from(piece));
      size += piece.length;
      if (nl === -1) break;
      yield finish();
      parts = [];
      size = 0;
      overflow = false;
      start = nl + 1;
    }
  }
  if (size > 0) yield finish();
}
