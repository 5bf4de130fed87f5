import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import { extname, join, normalize, resolve, sep } from 'node:path';
import { CONTENT_SECURITY_POLICY } from './content-security-policy';

/**
 * A small static file server for the built app (node:http, no dependency): GET and HEAD only, files
 * under `root` only, index.html for any path without a file extension (the app routes in the browser),
 * 404 for a missing asset. Every response carries the Content-Security-Policy and nosniff headers.
 */

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.webmanifest': 'application/manifest+json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.wasm': 'application/wasm',
  '.txt': 'text/plain; charset=utf-8',
  '.woff2': 'font/woff2',
};

export const SECURITY_HEADERS: Readonly<Record<string, string>> = {
  'Content-Security-Policy': CONTENT_SECURITY_POLICY,
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
};

/** The file a URL path names under `root`, or null when the path leaves `root` or cannot be decoded. */
export function fileFor(root: string, urlPath: string): string | null {
  let path: string;
  try {
    path = decodeURIComponent(urlPath.split('?')[0]!.split('#')[0]!);
  } catch {
    return null;
  }
  if (path.includes('\0')) return null;
  const full = resolve(root, '.' + normalize('/' + path));
  const base = resolve(root);
  return full === base || full.startsWith(base + sep) ? full : null;
}

async function isFile(p: string): Promise<boolean> {
  try {
    return (await stat(p)).isFile();
  } catch {
    return false;
  }
}

function send(
  res: ServerResponse,
  status: number,
  body: string,
  type = 'text/plain; charset=utf-8',
) {
  res.writeHead(status, {
    ...SECURITY_HEADERS,
    'Content-Type': type,
    'Content-Length': Buffer.byteLength(body),
  });
  res.end(body);
}

async function handle(root: string, req: IncomingMessage, res: ServerResponse) {
  if (req.method !== 'GET' && req.method !== 'HEAD') {
    res.setHeader('Allow', 'GET, HEAD');
    return send(res, 405, 'method not allowed\n');
  }
  const urlPath = new URL(req.url ?? '/', 'http://localhost').pathname;
  let file = fileFor(root, urlPath);
  if (file === null) return send(res, 400, 'bad path\n');
  if (urlPath.endsWith('/')) file = join(file, 'index.html');
  if (!(await isFile(file))) {
    if (extname(urlPath) !== '') return send(res, 404, 'not found\n');
    file = join(root, 'index.html');
    if (!(await isFile(file)))
      return send(res, 404, 'not found (no index.html: build the app first)\n');
  }
  const ext = extname(file).toLowerCase();
  const size = (await stat(file)).size;
  const name = file
    .slice(resolve(root).length + 1)
    .split(sep)
    .join('/');
  const cache = name.startsWith('assets/') ? 'public, max-age=31536000, immutable' : 'no-cache';
  res.writeHead(200, {
    ...SECURITY_HEADERS,
    'Content-Type': TYPES[ext] ?? 'application/octet-stream',
    'Content-Length': size,
    'Cache-Control': cache,
  });
  if (req.method === 'HEAD') return res.end();
  createReadStream(file)
    .on('error', () => res.destroy())
    .pipe(res);
}

/** Start serving `root` on host:port; resolves once listening. */
export function startStaticServer(root: string, port: number, host = '127.0.0.1'): Promise<Server> {
  const server = createServer((req, res) => {
    handle(root, req, res).catch(() => {
      if (!res.headersSent) send(res, 500, 'server error\n');
      else res.destroy();
    });
  });
  return new Promise((resolveListen, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolveListen(server);
    });
  });
}
