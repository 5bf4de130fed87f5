import { main } from './main';

/**
 * The program `saltsmith` runs (compiled to dist-cli/saltsmith.js; src/cli/saltsmith.mjs launches it).
 * A reader that goes away early (`saltsmith ions | head -1`) closes the pipe: that ends the program
 * quietly with status 0 instead of an EPIPE stack trace.
 */
function endQuietlyOnClosedPipe(stream: NodeJS.WriteStream) {
  stream.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EPIPE' || err.code === 'ERR_STREAM_DESTROYED') process.exit(0);
    throw err;
  });
}

export async function run(argv: string[]): Promise<void> {
  endQuietlyOnClosedPipe(process.stdout);
  endQuietlyOnClosedPipe(process.stderr);
  const code = await main(argv, {
    stdin: process.stdin,
    stdout: process.stdout,
    stderr: process.stderr,
    stderrIsTty: process.stderr.isTTY === true,
  });
  process.exitCode = code;
}
