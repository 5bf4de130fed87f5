import { randomBytes } from 'node:crypto';
import { open, rename, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { valueError } from '../args/cli-error';
import { resolveOutputTarget, type OutputTarget } from './output-target';
import { trackTempFile, untrackTempFile } from './temp-files';

/**
 * Write a file so that it is either the complete new content or left as it was: the text goes to a
 * temporary file in the target's own folder (same file system, so the rename is atomic), is flushed
 * to disk, and only then renamed over the target. The target is resolved first (output-target.ts):
 * a symbolic link is followed and stays a link, an existing file keeps its permission bits, anything
 * but a regular file is refused. A failure (full disk, no permission, Ctrl+C) removes the temporary
 * file, leaves the previous file intact, and is reported as one line naming the flag and the path
 * (exit status 1).
 *
 * Every command writes its files through these two functions, after `checkRunFiles` (output-target.ts)
 * has compared its outputs with its inputs and with each other.
 */

/** The temporary file beside the target (hidden, named after it, unique to this process). */
const tempPathFor = (target: string) =>
  join(
    dirname(target),
    `.${basename(target)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`,
  );

const writeFailure = (t: OutputTarget, err: unknown) =>
  valueError(
    t.flag,
    `cannot write ${t.given} (${(err as NodeJS.ErrnoException).code ?? ''}${
      err instanceof Error
        ? `: ${err.message.replace(/^[A-Z]+: /, '').replace(/, \w+ '.*'$/, '')}`
        : ''
    })`,
  );

type Target = OutputTarget | string;
const resolved = async (target: Target, flag: string) =>
  typeof target === 'string' ? resolveOutputTarget(flag, target) : target;

/** Open the temporary file for a target with the target's permission bits (0644 for a new file). */
async function openTemp(t: OutputTarget) {
  const tmp = tempPathFor(t.path);
  trackTempFile(tmp);
  try {
    // A new file is created as files usually are (0644, cut by the umask); an existing file's bits are
    // set after creation, because the umask would cut the mode given to open().
    const fh = await open(tmp, 'wx', t.mode === null ? 0o644 : 0o600);
    if (t.mode !== null) await fh.chmod(t.mode);
    return { tmp, fh };
  } catch (err) {
    untrackTempFile(tmp);
    await unlink(tmp).catch(() => undefined);
    throw writeFailure(t, err);
  }
}

/** Write `text` to `target` atomically (see above). `flag` names a string target in messages. */
export async function writeFileAtomic(target: Target, text: string, flag = '--out'): Promise<void> {
  const t = await resolved(target, flag);
  const { tmp, fh } = await openTemp(t);
  try {
    try {
      await fh.writeFile(text, 'utf8');
      await fh.sync();
    } finally {
      await fh.close();
    }
    await rename(tmp, t.path);
  } catch (err) {
    await unlink(tmp).catch(() => undefined);
    throw writeFailure(t, err);
  } finally {
    untrackTempFile(tmp);
  }
}

/** A streamed output file with the same guarantee. */
export interface AtomicOutput {
  write(data: string | Uint8Array): Promise<void>;
  /** Flush and rename over the target. */
  commit(): Promise<void>;
  /** Remove the temporary file (safe to call more than once, and after a failed commit). */
  abort(): Promise<void>;
}

/** Open a streamed output: lines go to a temporary file; `commit()` renames it over the target. */
export async function openAtomicOutput(target: Target, flag = '--out'): Promise<AtomicOutput> {
  const t = await resolved(target, flag);
  const { tmp, fh } = await openTemp(t);
  let closed = false;
  const remove = async () => {
    if (!closed) await fh.close().catch(() => undefined);
    closed = true;
    await unlink(tmp).catch(() => undefined);
    untrackTempFile(tmp);
  };
  return {
    write: async (data: string | Uint8Array) => {
      try {
        await (typeof data === 'string' ? fh.write(data, null, 'utf8') : fh.write(data));
      } catch (err) {
        throw writeFailure(t, err);
      }
    },
    commit: async () => {
      try {
        await fh.sync();
        await fh.close();
        closed = true;
        await rename(tmp, t.path);
        untrackTempFile(tmp);
      } catch (err) {
        await remove();
        throw writeFailure(t, err);
      }
    },
    abort: remove,
  };
}
