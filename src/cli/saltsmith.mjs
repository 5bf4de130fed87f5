#!/usr/bin/env node
// The `saltsmith` command (package.json "bin"): runs the compiled CLI in dist-cli/, built from
// src/cli/ by `npm run build:cli` (run by `prepare` after `npm ci`). See README "Command line".
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const compiled = new URL('../../dist-cli/saltsmith.js', import.meta.url);
if (!existsSync(fileURLToPath(compiled))) {
  process.stderr.write(
    `saltsmith: the compiled command is missing (${fileURLToPath(compiled)}).\n` +
      `Build it once in ${fileURLToPath(new URL('../..', import.meta.url))} with: npm run build:cli  (npm ci does this too)\n`,
  );
  process.exit(2);
}
const { run } = await import(compiled.href);
await run(process.argv.slice(2));
