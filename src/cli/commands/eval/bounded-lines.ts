import type { Readable } from 'node:stream';

/** Longest request line `eval` reads, bytes (1 MiB): a longer line gets an error and is skipped. */
export const MAX_LINE_BYTES = 1024 * 1024;
/** Deepest nesting of arrays and objects in one request line. */
export const MAX_JSON_DEPTH = 64;

/** One input line: its text, or its length when it was longer than the limit (its text is dropped). */
export type InputLine = { lineNo: number; text: string } | { lineNo: number; tooLongBytes: number };

const decoder = new TextDecoder('utf-8');

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
    let text = decoder.decode(parts.length === 1 ? parts[0]! : Buffer.concat(parts));
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

/**
 * Nesting depth of arrays and objects in JSON text (strings skipped), counted without parsing; stops
 * counting once `limit` is passed and returns limit + 1.
 */
export function jsonNestingDepth(text: string, limit = MAX_JSON_DEPTH): number {
  let depth = 0;
  let max = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92)
        i++; // backslash: skip the escaped character
      else if (c === 34) inString = false;
    } else if (c === 34) inString = true;
    else if (c === 123 || c === 91) {
      depth++;
      if (depth > max) {
        max = depth;
        if (max > limit) return limit + 1;
      }
    } else if (c === 125 || c === 93) depth--;
  }
  return max;
}
