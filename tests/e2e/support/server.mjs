// Start and stop `vite preview` on 127.0.0.1 for the production build in dist/.
import { spawn } from 'node:child_process';
import { createServer } from 'node:net';

export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

/** Serve dist/ on 127.0.0.1:port; resolves once the server answers. */
export async function startPreview(port, extraArgs = []) {
  const child = spawn(
    process.execPath,
    [
      'node_modules/vite/bin/vite.js',
      'preview',
      '--host',
      '127.0.0.1',
      '--port',
      String(port),
      '--strictPort',
      '--bypass-lock',
      ...extraArgs,
    ],
    { stdio: ['ignore', 'pipe', 'pipe'], detached: false },
  );
  let log = '';
  child.stdout.on('data', (d) => (log += d));
  child.stderr.on('data', (d) => (log += d));
  const url = `http://127.0.0.1:${port}/`;
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`vite preview exited early:\n${log}`);
    try {
      const res = await fetch(url);
      if (res.ok) return { url, stop: () => child.kill('SIGTERM'), child };
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  child.kill('SIGTERM');
  throw new Error(`vite preview did not answer on ${url} within 30 s:\n${log}`);
}
