import type { Stats } from 'node:fs';
import { lstat, realpath, stat } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { CliError, usageError, valueError } from '../args/cli-error';

/**
 * Where an output really goes, decided before anything is written: a symbolic link is followed to the
 * file it names (the link stays a link), an existing file must be a regular file (never a device, a
 * directory, a pipe or a socket) and keeps its permission bits, a new file goes into a folder that
 * exists. Every refusal is one line naming the flag and the path.
 */
export interface OutputTarget {
  /** The flag that named it (`--out`), for messages. */
  flag: string;
  /** The path as the user wrote it. */
  given: string;
  /** The real path written (symbolic links resolved). */
  path: string;
  /** Permission bits of the existing file, kept on the new content; null for a new file. */
  mode: number | null;
  /** Device and inode of the existing file (two names of one file compare equal); null for a new file. */
  id: { dev: number; ino: number } | null;
}

const code = (err: unknown) => (err as NodeJS.ErrnoException).code ?? String(err);

async function statOrNull(path: string, follow: boolean): Promise<Stats | null> {
  try {
    return follow ? await stat(path) : await lstat(path);
  } catch (err) {
    if (code(err) === 'ENOENT') return null;
    throw err;
  }
}

/** Resolve an output path (see {@link OutputTarget}); throws a CliError (exit 1) naming `flag`. */
export async function resolveOutputTarget(flag: string, given: string): Promise<OutputTarget> {
  const abs = resolve(given);
  try {
    const link = await statOrNull(abs, false);
    if (link?.isSymbolicLink() && (await statOrNull(abs, true)) === null)
      throw valueError(flag, `${given} is a symbolic link to a file that does not exist`);
    const st = await statOrNull(abs, true);
    if (st) {
      if (!st.isFile())
        throw valueError(
          flag,
          `${given} is not a regular file (${st.isDirectory() ? 'a folder' : 'a device, pipe or socket'})`,
          'a regular file or a new file name',
        );
      return {
        flag,
        given,
        path: await realpath(abs),
        mode: st.mode & 0o7777,
        id: { dev: st.dev, ino: st.ino },
      };
    }
    const dir = await statOrNull(dirname(abs), true);
    if (!dir?.isDirectory())
      throw valueError(flag, `cannot write ${given}: the folder ${dirname(given)} does not exist`);
    return {
      flag,
      given,
      path: join(await realpath(dirname(abs)), basename(abs)),
      mode: null,
      id: null,
    };
  } catch (err) {
    if (err instanceof CliError) throw err;
    throw valueError(flag, `cannot write ${given} (${code(err)})`);
  }
}

/** An input file of a run, resolved the same way (for the comparison with the outputs). */
async function inputIdentity(path: string) {
  try {
    const st = await stat(path);
    return { path: await realpath(path), id: { dev: st.dev, ino: st.ino } };
  } catch {
    return { path: resolve(path), id: null };
  }
}

const same = (
  a: { path: string; id: { dev: number; ino: number } | null },
  b: { path: string; id: { dev: number; ino: number } | null },
) =>
  a.path === b.path ||
  (a.id !== null && b.id !== null && a.id.dev === b.id.dev && a.id.ino === b.id.ino);

/**
 * Check a run's files before it starts: every output is resolved (see {@link resolveOutputTarget}),
 * and none may be one of the run's inputs or another of its outputs — compared by real path and by
 * device and inode, so a symbolic link, `./x` or a hard link to the input is caught too. Refused with
 * exit status 2 (the command line contradicts itself) naming both flags.
 * @returns the resolved targets, in the order given.
 */
export async function checkRunFiles(run: {
  inputs: { flag: string; path: string | undefined }[];
  outputs: { flag: string; path: string | undefined }[];
}): Promise<OutputTarget[]> {
  const targets: OutputTarget[] = [];
  const inputs = await Promise.all(
    run.inputs
      .filter((i): i is { flag: string; path: string } => i.path !== undefined)
      .map(async (i) => ({ ...i, ...(await inputIdentity(i.path)) })),
  );
  for (const o of run.outputs) {
    if (o.path === undefined) continue;
    const t = await resolveOutputTarget(o.flag, o.path);
    for (const i of inputs) {
      if (same(t, i)) throw clash(t, `${i.flag} ${i.path}: writing it would replace the input`);
    }
    for (const other of targets) {
      if (same(t, other))
        throw clash(t, `${other.flag} ${other.given}: one file cannot hold both outputs`);
    }
    targets.push(t);
  }
  return targets;
}

const clash = (t: OutputTarget, what: string) =>
  usageError(t.flag, `${t.given} is the same file as ${what}`, 'an output path of its own');
