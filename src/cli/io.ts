import type { Readable, Writable } from 'node:stream';

/** The streams a command reads and writes; tests pass their own. */
export interface CliIo {
  stdin: Readable;
  stdout: Writable;
  stderr: Writable;
  /** Whether stderr is a terminal (progress bars are drawn only then). Default: false. */
  stderrIsTty?: boolean;
}

/** A command: takes its arguments (after the command name) and returns the exit status. */
export type CliCommand = {
  summary: string;
  usage: string;
  run: (args: string[], io: CliIo) => Promise<number>;
};

/** Write one line without waiting (short messages: usage, errors, a single result). */
export const writeLine = (w: Writable, line: string): boolean => w.write(line + '\n');

/**
 * Write text and wait while the stream's buffer is full ('drain'), so a slow reader slows the writer
 * instead of the output piling up in memory. Resolves early if the stream closes or fails (a closed pipe
 * is handled where the process streams are set up).
 */
export function writeText(w: Writable, text: string | Uint8Array): Promise<void> {
  if (w.write(text)) return Promise.resolve();
  if (w.destroyed || w.writableEnded) return Promise.resolve();
  return new Promise((resolve) => {
    const done = () => {
      w.off('drain', done);
      w.off('close', done);
      w.off('error', done);
      resolve();
    };
    w.on('drain', done);
    w.on('close', done);
    w.on('error', done);
  });
}
