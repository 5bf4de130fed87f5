import { main } from './main';

/**
 * The program `saltsmith` runs (compiled to dist-cli/saltsmith.js; src/cli/saltsmith.mjs launches it).
 * A reader that goes away early (`saltsmith ions | head -1`) closes the pipe: that ends the program
 * quietly with status 0 instead of an EPIPE stack trace. Any other write error on standard output
 * (a full disk: `saltsmith ions > /dev/full`) is one line on standard error and exit status 1; on
 * standard error itself, exit status 1 without a word (there is nowhere left to say it).
 */
export function describeStreamError(name: string, err: NodeJS.ErrnoException): string {
  const reason = err.message.replace(/^[A-Z]+: /, '').replace(/, write$/, '');
  return `saltsmith: cannot write to ${name} (${err.code ?? 'error'}: ${reason})`;
}

function endOnWriteError(stream: NodeJS.WriteStream, name: 'standard output' | 'standard error') {
  stream.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EPIPE' || err.code === 'ERR_STREAM_DESTROYED') process.exit(0);
    if (name === 'standard output') {
      try {
        process.stderr.write(describeStreamError(name, err) + '\n');
      } catch {
        // standard error failed too: the status says it
      }
    }
    process.exit(1);
  });
}

export async function run(argv: string[]): Promise<void> {
  endOnWriteError(process.stdout, 'standard output');
  endOnWriteError(process.stderr, 'standard error');
  const code = await main(argv, {
    stdin: process.stdin,
    stdout: process.stdout,
    stderr: process.stderr,
    stderrIsTty: process.stderr.isTTY === true,
  });
  process.exitCode = code;
}
