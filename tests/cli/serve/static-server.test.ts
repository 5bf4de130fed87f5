import { mkdtempSync, mkdirSync, readFileSync, utimesSync, writeFileSync } from 'node:fs';
import { request, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '@/cli/serve/content-security-policy';
import { fileFor, startStaticServer } from '@/cli/serve/static-server';
import { buildNeeded, findPackageRoot } from '@/cli/serve/app-build';

function get(
  port: number,
  path: string,
  method = 'GET',
): Promise<{
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
}> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port, path, method }, (res) => {
      let body = '';
      res.on('data', (d) => (body += d));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('saltsmith serve: the static server', () => {
  const root = mkdtempSync(join(tmpdir(), 'saltsmith-serve-'));
  let server: Server;
  let port = 0;
  beforeAll(async () => {
    writeFileSync(join(root, 'index.html'), '<!doctype html><title>app</title>');
    mkdirSync(join(root, 'assets'));
    writeFileSync(join(root, 'assets', 'app.js'), 'console.log(1)');
    writeFileSync(join(root, 'manifest.webmanifest'), '{}');
    server = await startStaticServer(root, 0);
    const a = server.address();
    port = typeof a === 'object' && a ? a.port : 0;
  });
  afterAll(() => new Promise<void>((r) => server.close(() => r())));

  it('sends the Content-Security-Policy (no inline script, no remote origin) and nosniff with every answer', async () => {
    for (const path of ['/', '/assets/app.js', '/missing.js', '/projects/42']) {
      const r = await get(port, path);
      expect(r.headers['content-security-policy']).toBe(CONTENT_SECURITY_POLICY);
      expect(r.headers['x-content-type-options']).toBe('nosniff');
    }
    expect(CONTENT_SECURITY_POLICY).toMatch(/script-src 'self';/);
    expect(CONTENT_SECURITY_POLICY).not.toMatch(/unsafe-eval|https?:|\*/);
  });

  it('serves files with their type, falls back to index.html for app routes, 404 for a missing asset', async () => {
    const js = await get(port, '/assets/app.js');
    expect(js.status).toBe(200);
    expect(js.headers['content-type']).toMatch(/text\/javascript/);
    expect(js.headers['cache-control']).toMatch(/immutable/);
    const route = await get(port, '/projects/42');
    expect(route.status).toBe(200);
    expect(route.body).toMatch(/<title>app<\/title>/);
    expect(route.headers['cache-control']).toBe('no-cache');
    expect((await get(port, '/assets/gone.js')).status).toBe(404);
    expect((await get(port, '/manifest.webmanifest')).headers['content-type']).toMatch(
      /manifest\+json/,
    );
  });

  it('answers GET and HEAD only, and never leaves its folder', async () => {
    expect((await get(port, '/', 'POST')).status).toBe(405);
    const head = await get(port, '/assets/app.js', 'HEAD');
    expect(head.status).toBe(200);
    expect(head.body).toBe('');
    expect(fileFor(root, '/../../etc/passwd')).toBe(join(root, 'etc', 'passwd'));
    expect(fileFor(root, '/..%2f..%2fetc%2fpasswd')!.startsWith(root)).toBe(true);
    expect(fileFor(root, '/%E0%A4%A')).toBeNull();
    const traversal = await get(port, '/..%2f..%2f..%2fetc%2fpasswd.txt');
    expect(traversal.status).toBe(404);
  });
});

describe('saltsmith serve: build when needed', () => {
  it('finds the repository from its own files, wherever it is run from', () => {
    const root = findPackageRoot();
    expect(JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')).name).toBe('saltsmith');
  });

  it('builds when the build is missing or older than a source file, not otherwise', () => {
    const repo = mkdtempSync(join(tmpdir(), 'saltsmith-repo-'));
    mkdirSync(join(repo, 'src'));
    writeFileSync(join(repo, 'src', 'main.tsx'), 'x');
    const out = join(repo, 'dist');
    expect(buildNeeded(repo, out)).toMatch(/no build/);
    mkdirSync(out);
    writeFileSync(join(out, 'index.html'), 'x');
    const t = Date.now() / 1000;
    utimesSync(join(repo, 'src', 'main.tsx'), t - 100, t - 100);
    utimesSync(join(repo, 'src'), t - 100, t - 100);
    utimesSync(join(out, 'index.html'), t - 50, t - 50);
    expect(buildNeeded(repo, out)).toBeNull();
    utimesSync(join(repo, 'src', 'main.tsx'), t, t);
    expect(buildNeeded(repo, out)).toMatch(/sources changed/);
  });
});
