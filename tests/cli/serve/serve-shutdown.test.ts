import { spawn } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { connect, type Socket } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildCompiledCli } from '../support/compiled-cli';

// Issue 18: `saltsmith serve` ignored SIGINT/SIGTERM while a client held a connection open without
// sending a full request. The client here is a raw socket on 127.0.0.1 that sends half a request line
// (and one that sends nothing), then waits; the server must still exit promptly on the signal.
let cli: { launcher: string; root: string };
beforeAll(() => {
  cli = buildCompiledCli();
}, 120_000);

async function startServe() {
  const dir = mkdtempSync(join(tmpdir(), 'saltsmith-serve-'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>t</title>');
  const child = spawn(
    process.execPath,
    [cli.launcher, 'serve', '--dir', dir, '--no-build', '--port', '0'],
    { stdio: ['ignore', 'pipe', 'pipe'] },
  );
  const port = await new Promise<number>((resolve, reject) => {
    let out = '';
    child.stdout.on('data', (d) => {
      out += String(d);
      const m = /127\.0\.0\.1:(\d+)\//.exec(out);
      if (m) resolve(Number(m[1]));
    });
    child.on('exit', (c) => reject(new Error(`serve exited early (${c})`)));
  });
  return { child, port };
}

const open = (port: number, send: string) =>
  new Promise<Socket>((resolve) => {
    const s = connect(port, '127.0.0.1', () => {
      if (send) s.write(send);
      resolve(s);
    });
    s.on('error', () => undefined);
  });

describe('saltsmith serve: shutdown with half-open connections', () => {
  it.each(['SIGINT', 'SIGTERM'] as const)(
    '%s exits within 3 s while clients hold unfinished requests',
    async (signal) => {
      const { child, port } = await startServe();
      const sockets = [
        await open(port, 'GET / HTTP/1.1\r\nHost: 127.0.0.1\r\n'), // headers never finished
        await open(port, 'GET /ind'), // half a request line
        await open(port, ''), // nothing at all
      ];
      await new Promise((r) => setTimeout(r, 200));
      const t0 = Date.now();
      const exited = new Promise<number | null>((r) => child.on('exit', (c) => r(c)));
      child.kill(signal);
      const code = await Promise.race([
        exited,
        new Promise<'hung'>((r) => setTimeout(() => r('hung'), 3000)),
      ]);
      if (code === 'hung') child.kill('SIGKILL');
      for (const s of sockets) s.destroy();
      expect(code).toBe(0);
      expect(Date.now() - t0).toBeLessThan(3000);
    },
    30_000,
  );
});
