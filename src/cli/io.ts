import type { Readable, Writable } from 'node:stream';

/** The streams a command reads and writes; tests pass their own. */
export interface CliIo {
  stdin: Readable;
  stdout: Writable;
  stderr: Writable;
}

/** A command: takes its arguments (after the command name) and returns the exit status. */
export type CliCommand = {
  summary: string;
  usage: string;
  run: (args: string[], io: CliIo) => Promise<number>;
};

/** Parse `--flag value` and `--switch` arguments; values are strings, switches are `true`. */
export function parseFlags(
  args: string[],
  switches: readonly string[] = [],
): { flags: Record<string, string | true>; positional: string[] } {
  const flags: Record<string, string | true> = {};
  const positional: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      if (eq > 0) {
        flags[a.slice(2, eq)] = a.slice(eq + 1);
      } else if (switches.includes(a.slice(2))) {
        flags[a.slice(2)] = true;
      } else {
        const v = args[i + 1];
        if (v === undefined || v.startsWith('--')) throw new Error(`${a} needs a value`);
        flags[a.slice(2)] = v;
        i++;
      }
    } else positional.push(a);
  }
  return { flags, positional };
}

export const writeLine = (w: Writable, line: string) => w.write(line + '\n');
