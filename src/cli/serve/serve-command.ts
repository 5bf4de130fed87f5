import { existsSync } from 'node:fs';
import { isAbsolute, join, resolve } from 'node:path';
import { defineCommand } from '../define-command';
import { usageError, valueError } from '../args/cli-error';
import { helpRequested } from '../args/help';
import { COMMAND_USAGE } from '../command-usage';
import { parseFlags, readNumber } from '../args/parse-flags';
import { writeLine, type CliCommand } from '../io';
import { buildApp, buildNeeded, findPackageRoot } from './app-build';
import { startStaticServer } from './static-server';

const { summary: SUMMARY, usage: USAGE } = COMMAND_USAGE.serve;

/** How long answers already being sent may take after Ctrl+C before every connection is closed (common practice). */
const SHUTDOWN_GRACE_MS = 500;

export const SERVE_FLAGS = {
  help: { type: 'switch' },
  port: { type: 'number', min: 0, max: 65535, integer: true, unit: '(0 picks a free port)' },
  dir: { type: 'string', maxLength: 4096 },
  'no-build': { type: 'switch' },
} as const;

/**
 * `saltsmith serve`: build the workbench if dist/ is missing or older than its sources, serve it on
 * http://127.0.0.1:PORT/ (default 4173) with the Content-Security-Policy header, print the URL, and run
 * until Ctrl+C. `npm start` runs this.
 */
export const serveCommand: CliCommand = defineCommand('serve', {
  summary: SUMMARY,
  usage: USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, SERVE_FLAGS);
    if (helpRequested(flags, io, USAGE)) return 0;
    const envPort = process.env.PORT;
    const port =
      flags.port ??
      (envPort !== undefined && envPort !== ''
        ? readNumber('PORT', envPort, SERVE_FLAGS.port)
        : 4173);
    const root = flags.dir !== undefined && flags['no-build'] ? null : findPackageRoot();
    const dir =
      flags.dir !== undefined
        ? isAbsolute(flags.dir)
          ? flags.dir
          : resolve(flags.dir)
        : join(root!, 'dist');
    const why = root
      ? buildNeeded(root, dir)
      : existsSync(join(dir, 'index.html'))
        ? null
        : `no index.html in ${dir}`;
    if (why) {
      if (flags['no-build'] || !root)
        throw valueError('--no-build', `${why}; cannot serve without building`);
      writeLine(io.stderr, `saltsmith serve: building the workbench (${why})…`);
      const code = await buildApp(root, dir, (l) => writeLine(io.stderr, l));
      if (code !== 0) {
        writeLine(io.stderr, 'saltsmith serve: the build failed');
        return 1;
      }
    }
    let server;
    try {
      server = await startStaticServer(dir, port);
    } catch (err) {
      const code = (err as NodeJS.ErrnoException).code;
      if (code === 'EADDRINUSE')
        throw usageError('--port', `port ${port} is in use`, 'a free port (--port or PORT)');
      throw err;
    }
    const address = server.address();
    const actual = typeof address === 'object' && address ? address.port : port;
    writeLine(io.stdout, `Saltsmith is running at http://127.0.0.1:${actual}/  (Ctrl+C to stop)`);
    await new Promise<void>((done) => {
      // close() stops accepting and waits for open connections; a client that holds one open without
      // finishing its request would keep the process alive, so idle ones are closed at once and the
      // rest after a short grace for answers already on their way.
      const stop = () => {
        server.close(() => done());
        server.closeIdleConnections();
        setTimeout(() => server.closeAllConnections(), SHUTDOWN_GRACE_MS).unref();
      };
      process.once('SIGINT', stop);
      process.once('SIGTERM', stop);
      server.on('close', () => done());
    });
    return 0;
  },
});
