/**
 * A refusal of the command line, naming the flag (or field) at fault.
 *
 * Exit status: 2 when the command line itself cannot be read (unknown flag, stray argument, empty or
 * missing value, a flag given twice, options that contradict each other, a choice that is not on the
 * list); 1 when it reads but a value is refused (not a number, out of range, chemistry that does not
 * add up).
 */
export class CliError extends Error {
  readonly flag: string;
  readonly exitCode: 1 | 2;
  readonly accepted: string | undefined;
  constructor(flag: string, message: string, exitCode: 1 | 2, accepted?: string) {
    super(`${flag}: ${message}${accepted ? ` (accepted: ${accepted})` : ''}`);
    this.name = 'CliError';
    this.flag = flag;
    this.exitCode = exitCode;
    this.accepted = accepted;
  }
}

/** A usage error (exit status 2). */
export const usageError = (flag: string, message: string, accepted?: string) =>
  new CliError(flag, message, 2, accepted);

/** A refused value (exit status 1). */
export const valueError = (flag: string, message: string, accepted?: string) =>
  new CliError(flag, message, 1, accepted);
