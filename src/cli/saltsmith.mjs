#!/usr/bin/env node
// Entry of the `saltsmith` command: registers tsx so the TypeScript core runs directly under Node,
// then hands over to main.ts. See README "Command line".
import { register } from 'tsx/esm/api';

register();
const { main } = await import('./main.ts');
process.exitCode = await main(process.argv.slice(2), {
  stdin: process.stdin,
  stdout: process.stdout,
  stderr: process.stderr,
});
