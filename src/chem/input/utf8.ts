import { StrictJsonError } from './strict-json-error';

/** UTF-8 length of a string without allocating (lone surrogates count as the 3 bytes of U+FFFD). */
export function utf8ByteLength(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) n += 1;
    else if (c < 0x800) n += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        n += 4;
        i++;
      } else n += 3;
    } else n += 3;
  }
  return n;
}

/**
 * Decode bytes as UTF-8, refusing any invalid sequence (WHATWG Encoding, `fatal: true`). A leading
 * byte-order mark is dropped, as the WHATWG decoder does.
 */
export function decodeUtf8Strict(bytes: Uint8Array, field = 'input'): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    const at = firstInvalidUtf8Offset(bytes);
    throw new StrictJsonError(
      'utf8',
      field,
      '',
      `is not valid UTF-8 (a bad byte sequence at byte ${at})`,
      'text encoded as UTF-8',
    );
  }
}

/** Offset of the first byte that breaks UTF-8 (for the message only). */
function firstInvalidUtf8Offset(bytes: Uint8Array): number {
  const d = new TextDecoder('utf-8', { fatal: true });
  let lo = 0;
  let hi = bytes.length;
  // The longest valid prefix, by bisection (a prefix cut inside a character is treated as invalid).
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    try {
      d.decode(bytes.subarray(0, mid));
      lo = mid;
    } catch {
      hi = mid - 1;
    }
  }
  return lo;
}
