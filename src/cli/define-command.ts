import { z } from 'zod';
import { ChemInputError } from '@/chem';
import { CliError } from './args/cli-error';
import { writeLine, type CliCommand, type CliIo } from './io';

/**
 * Wrap a command so every refusal ends the same way: one line on stderr naming the flag or field, and
 * the exit status — 2 for a command line that cannot be read, 1 for a value refused (range, chemistry),
 * 2 for anything unexpected.
 */
export function defineCommand(name: string, c: CliCommand): CliCommand {
  return {
    summary: c.summary,
    usage: c.usage,
    run: async (args: string[], io: CliIo) => {
      try {
        return await c.run(args, io);
      } catch (err) {
        const { message, code } = describeFailure(err);
        writeLine(io.stderr, `saltsmith ${name}: ${message}`);
        if (code === 2 && err instanceof CliError) writeLine(io.stderr, `usage: ${c.usage}`);
        return code;
      }
    },
  };
}

/** The message and exit status for an error thrown by a command. */
export function describeFailure(err: unknown): { message: string; code: 1 | 2 } {
  if (err instanceof CliError) return { message: err.message, code: err.exitCode };
  if (err instanceof ChemInputError) return { message: err.message, code: 1 };
  if (err instanceof z.ZodError) {
    return {
      message: err.issues.map((i) => `${i.path.join('.') || 'input'}: ${i.message}`).join('; '),
      code: 1,
    };
  }
  return { message: err instanceof Error ? err.message : String(err), code: 2 };
}
