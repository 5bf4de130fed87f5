import { open } from 'node:fs/promises';
import { parseStrictJson } from '@/chem';
import { valueError } from '../args/cli-error';

/**
 * Read a JSON file a command was given (`--input`), size-capped before it is read: a regular file
 * larger than the cap is refused from its size alone, and any file (a pipe too) is read only up to
 * the cap plus one byte, so a 300 MB file is never held in memory. The bytes then go through the
 * core's one strict JSON reader (UTF-8, each key once, bounded nesting, no __proto__), whose messages
 * name the flag and the key path (`--input customIons.0.id`).
 */

/** Largest --input file, bytes (1 MiB, common practice: a compound with 50 in-house ions is a few kB). */
export const MAX_INPUT_FILE_BYTES = 1024 * 1024;

export async function readJsonFile(
  path: string,
  opts: { flag: string; maxBytes?: number },
): Promise<unknown> {
  const maxBytes = opts.maxBytes ?? MAX_INPUT_FILE_BYTES;
  const flag = opts.flag;
  const tooLarge = (size: number | null) =>
    valueError(
      flag,
      `${path} is ${size === null ? '' : `${size} bytes, `}larger than ${maxBytes} bytes`,
      `a file of at most ${maxBytes} bytes`,
    );
  const code = (err: unknown) => (err as NodeJS.ErrnoException).code ?? String(err);
  let fh;
  try {
    fh = await open(path, 'r');
  } catch (err) {
    throw valueError(flag, `cannot read ${path} (${code(err)})`, 'a readable JSON file');
  }
  try {
    const st = await fh.stat();
    if (st.isDirectory()) throw valueError(flag, `${path} is a folder`, 'a JSON file');
    if (st.isFile() && st.size > maxBytes) throw tooLarge(st.size);
    const buf = Buffer.alloc(Math.min(maxBytes + 1, st.isFile() ? st.size + 1 : maxBytes + 1));
    let got = 0;
    for (;;) {
      const { bytesRead } = await fh.read(buf, got, buf.length - got, null);
      if (bytesRead === 0) break;
      got += bytesRead;
      if (got === buf.length) break;
    }
    // A file that grew after its size was read, or a pipe, is cut at the cap + 1 and refused here.
    if (got > maxBytes) throw tooLarge(null);
    return parseStrictJson(buf.subarray(0, got), { maxBytes, field: flag, pathPrefix: `${flag} ` });
  } catch (err) {
    if (err instanceof Error && 'code' in err && typeof err.code === 'string')
      throw valueError(flag, `cannot read ${path} (${err.code})`, 'a readable JSON file');
    throw err;
  } finally {
    await fh.close();
  }
}
