// Size of the JavaScript the first screen loads (not part of `npm test`): the entry script of the
// production build's index.html and every module it preloads, raw and gzipped (zlib level 9, as a
// static server would send them). Lazy chunks (areas opened later, openchemlib, the worker) are
// listed separately.
//
//   node tests/bench/first-screen-size.mjs [distDir]     (default dist/; run `vite build` first)
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

const dist = process.argv[2] ?? 'dist';
const html = readFileSync(join(dist, 'index.html'), 'utf8');
const first = new Set();
for (const m of html.matchAll(/<script[^>]+src="([^"]+\.js)"/g)) first.add(m[1]);
for (const m of html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g))
  first.add(m[1]);
const size = (file) => {
  const buf = readFileSync(join(dist, file.replace(/^\//, '')));
  return {
    file,
    rawKB: +(buf.length / 1024).toFixed(1),
    gzipKB: +(gzipSync(buf, { level: 9 }).length / 1024).toFixed(1),
  };
};
const firstScreen = [...first].map(size);
const lazy = readdirSync(join(dist, 'assets'))
  .filter((f) => f.endsWith('.js') && ![...first].some((x) => x.endsWith(f)))
  .map((f) => size(`assets/${f}`))
  .sort((a, b) => b.gzipKB - a.gzipKB);
const sum = (xs, k) => +xs.reduce((a, x) => a + x[k], 0).toFixed(1);
console.log(
  JSON.stringify(
    {
      firstScreen,
      firstScreenTotal: { rawKB: sum(firstScreen, 'rawKB'), gzipKB: sum(firstScreen, 'gzipKB') },
      lazy,
    },
    null,
    2,
  ),
);
