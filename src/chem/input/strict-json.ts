import { StrictJsonError } from './strict-json-error';
import { decodeUtf8Strict, utf8ByteLength } from './utf8';
import { scanJson } from './json-scanner';

/**
 * The one JSON reader for everything Saltsmith takes in (command-line files, JSON Lines, project files
 * imported in the app). Standard JSON (RFC 8259) with the rules the standard leaves open decided in
 * the safe direction:
 * - the input must not be larger than the caller's cap (bytes of UTF-8), checked before anything else;
 * - bytes must be valid UTF-8 (RFC 8259 §8.1): a bad byte is refused, never turned into U+FFFD;
 * - an object must not name a key twice (RFC 8259 §4 leaves the result undefined; common JSON parsers
 *   keep the last one without a word) — refused at any depth, naming the key's path;
 * - arrays and objects nest at most `maxDepth` levels (default 64, common practice);
 * - a key `__proto__` is refused (it would be an object's prototype once copied by spread or assign).
 *
 * The text is first checked by a small iterative scanner that follows the JSON grammar (no recursion,
 * so hostile nesting cannot overflow the stack), then read by the platform's JSON.parse: the values are
 * exactly JSON.parse's. Pure: no I/O; file readers check the size before reading (see the CLI).
 */

/** Deepest nesting of arrays and objects accepted unless the caller says otherwise (common practice). */
export const DEFAULT_MAX_JSON_DEPTH = 64;

export interface StrictJsonOptions {
  /** Largest input accepted, in bytes of UTF-8 (required: every entrance states its own cap). */
  maxBytes: number;
  /** Deepest nesting of arrays and objects (default 64). */
  maxDepth?: number;
  /** How the whole input is named in messages (`--input`, `line`, `file`); default `input`. */
  field?: string;
  /** Put before a key path in messages (`--input ` gives `--input customIons.0.id`); default none. */
  pathPrefix?: string;
}

function tooLarge(field: string, size: number, maxBytes: number): StrictJsonError {
  return new StrictJsonError(
    'too-large',
    field,
    '',
    `is ${size} bytes, larger than ${maxBytes} bytes`,
    `at most ${maxBytes} bytes`,
  );
}

/** Refuse a size above the cap before anything is read (file readers call it with the file's size). */
export function requireSizeWithin(field: string, size: number, maxBytes: number): void {
  if (size > maxBytes) throw tooLarge(field, size, maxBytes);
}

/**
 * Read JSON text or UTF-8 bytes under the rules above; returns exactly what JSON.parse returns.
 * @throws StrictJsonError naming the field (or the key path) and what is accepted.
 */
export function parseStrictJson(input: string | Uint8Array, opts: StrictJsonOptions): unknown {
  const field = opts.field ?? 'input';
  let text: string;
  if (typeof input === 'string') {
    const size = utf8ByteLength(input);
    if (size > opts.maxBytes) throw tooLarge(field, size, opts.maxBytes);
    text = input;
  } else {
    if (input.length > opts.maxBytes) throw tooLarge(field, input.length, opts.maxBytes);
    text = decodeUtf8Strict(input, field);
  }
  scanJson(text, opts.maxDepth ?? DEFAULT_MAX_JSON_DEPTH, field, opts.pathPrefix ?? '');
  return JSON.parse(text) as unknown;
}
