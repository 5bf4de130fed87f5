// Budget check for the first screen's JavaScript (part of CI, after the production build):
// the gzipped size of every script the first screen loads — the entry script(s) of index.html, the
// modules it preloads, and everything those reach through static `import … from` / `export … from`
// — must stay at or under the budget. Lazy chunks (reached only through `import()`: areas opened
// later, openchemlib, the workers) do not count. Gzip at level 9, as a static server sends them.
//
//   node tests/bench/check-budget.mjs [distDir] [--budget-kib 250] [--json]
//   npm run budget                    (checks dist/ after `npm run build`)
//
// Exit status: 0 within budget, 1 over budget, 2 when the build output cannot be read.
import { existsSync, readFileSync } from 'node:fs';
import { join, posix, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

export const DEFAULT_BUDGET_KIB = 250;

/** Scripts named by index.html: module entry scripts and modulepreload links (site-absolute paths). */
export function entryScripts(html) {
  const out = [];
  for (const m of html.matchAll(/<script\b[^>]*\bsrc="([^"]+\.m?js)"/g)) out.push(m[1]);
  for (const m of html.matchAll(/<link\b[^>]*\brel="modulepreload"[^>]*\bhref="([^"]+\.m?js)"/g)) {
    out.push(m[1]);
  }
  for (const m of html.matchAll(/<link\b[^>]*\bhref="([^"]+\.m?js)"[^>]*\brel="modulepreload"/g)) {
    out.push(m[1]);
  }
  return [...new Set(out.map((p) => posix.join('/', p)))];
}

/**
 * Relative specifiers a module loads statically. Matches `import x from"./a.js"`, `import"./a.js"`
 * and `export{…}from"./a.js"` (minified or not); `import("./a.js")` (lazy) has a parenthesis
 * between `import` and the string and is not matched.
 */
export function staticImports(code) {
  const re =
    /(?:^|[;}\s])(?:import|export)\s*(?:[\w$*{}\s,]*?\s*from\s*)?["'](\.{1,2}\/[^"']+)["']/g;
  return [...code.matchAll(re)].map((m) => m[1]);
}

/** Walks the first screen's module graph in `distDir`; throws when a named file is missing. */
export function measureFirstScreen(distDir) {
  const indexPath = join(distDir, 'index.html');
  if (!existsSync(indexPath))
    throw new Error(`${indexPath} not found: run the production build first`);
  const html = readFileSync(indexPath, 'utf8');
  const queue = entryScripts(html);
  if (queue.length === 0) throw new Error(`${indexPath} names no script`);
  const seen = new Set();
  const files = [];
  while (queue.length > 0) {
    const url = queue.shift();
    if (seen.has(url)) continue;
    seen.add(url);
    const path = join(distDir, url.replace(/^\//, ''));
    if (!existsSync(path))
      throw new Error(`${url} is loaded by the first screen but missing from ${distDir}`);
    const buf = readFileSync(path);
    files.push({ file: url, rawBytes: buf.length, gzipBytes: gzipSync(buf, { level: 9 }).length });
    for (const spec of staticImports(buf.toString('utf8')))
      queue.push(posix.join(posix.dirname(url), spec));
  }
  const gzipBytes = files.reduce((a, f) => a + f.gzipBytes, 0);
  const rawBytes = files.reduce((a, f) => a + f.rawBytes, 0);
  return { files, rawBytes, gzipBytes };
}

function parseArgs(argv) {
  let distDir = 'dist';
  let budgetKiB = DEFAULT_BUDGET_KIB;
  let json = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--budget-kib') {
      budgetKiB = Number(argv[++i]);
      if (!Number.isFinite(budgetKiB) || budgetKiB <= 0)
        throw new Error('--budget-kib needs a positive number');
    } else if (a === '--json') json = true;
    else if (a.startsWith('--')) throw new Error(`unknown option ${a}`);
    else distDir = a;
  }
  return { distDir, budgetKiB, json };
}

export function main(argv) {
  let args;
  let m;
  try {
    args = parseArgs(argv);
    m = measureFirstScreen(args.distDir);
  } catch (e) {
    console.error(`budget check: ${e instanceof Error ? e.message : String(e)}`);
    return 2;
  }
  const kib = (b) => +(b / 1024).toFixed(1);
  const over = m.gzipBytes > args.budgetKiB * 1024;
  const summary = {
    firstScreenGzipKiB: kib(m.gzipBytes),
    firstScreenRawKiB: kib(m.rawBytes),
    budgetGzipKiB: args.budgetKiB,
    withinBudget: !over,
    files: m.files.map((f) => ({
      file: f.file,
      rawKiB: kib(f.rawBytes),
      gzipKiB: kib(f.gzipBytes),
    })),
  };
  if (args.json) console.log(JSON.stringify(summary, null, 2));
  else {
    for (const f of summary.files)
      console.log(`  ${f.file}  ${f.gzipKiB} KiB gzipped (${f.rawKiB} KiB raw)`);
    console.log(
      `first screen JavaScript: ${summary.firstScreenGzipKiB} KiB gzipped, budget ${args.budgetKiB} KiB: ` +
        (over ? 'OVER BUDGET' : 'within budget'),
    );
  }
  if (over) {
    console.error(
      `budget check: the first screen loads ${summary.firstScreenGzipKiB} KiB of gzipped JavaScript, ` +
        `over the ${args.budgetKiB} KiB budget; move code behind a lazy import() or trim it`,
    );
    return 1;
  }
  return 0;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === resolve(process.argv[1])) {
  process.exitCode = main(process.argv.slice(2));
}
