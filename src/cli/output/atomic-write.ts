import { randomBytes } from 'node:crypto';
import { open, rename, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

/**
 * Write a file so that it is either the complete new content or left as it was: the text goes to a
 * temporary file in the same directory (same file system, so the rename is atomic), is flushed to disk,
 * and only then renamed over the target. A failure (full disk, no permission) removes the temporary
 * file and leaves the previous file intact.
 */
export async function writeFileAtomic(path: string, text: string): Promise<void> {
  const tmp = join(
    dirname(path),
    `.${basename(path)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`,
  );
  try {
    const fh = await open(tmp, 'wx', 0o644);
    try {
      await fh.writeFile(text, 'utf8');
      await fh.sync();
    } finally {
      await fh.close();
    }
    await rename(tmp, path);
  } catch (err) {
    await unlink(tmp).catch(() => undefined);
    throw err;
  }
}

/**
 * A streamed output file with the same guarantee: lines are written to a temporary file; `commit()`
 * flushes and renames it over the target, `abort()` removes it.
 */
export async function openAtomicOutput(path: string) {
  const tmp = join(
    dirname(path),
    `.${basename(path)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`,
  );
  const fh = await open(tmp, 'wx', 0o644);
  let closed = false;
  return {
    write: async (text: string) => {
      await fh.write(text, null, 'utf8');
    },
    commit: async () => {
      await fh.sync();
      await fh.close();
      closed = true;
      await rename(tmp, path);
    },
    abort: async () => {
      if (!closed) await fh.close().catch(() => undefined);
      closed = true;
      await unlink(tmp).catch(() => undefined);
    },
  };
}
