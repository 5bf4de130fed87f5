import { writeLine, type CliIo } from '../io';

/** The `--help` switch every command takes. */
export const HELP_FLAG_SPEC = { help: { type: 'switch' } } as const;

/** Print `usage` and return true when `--help` (or `-h`) was given. */
export function helpRequested(flags: { help?: boolean }, io: CliIo, usage: string): boolean {
  if (!flags.help) return false;
  writeLine(io.stdout, usage);
  return true;
}
