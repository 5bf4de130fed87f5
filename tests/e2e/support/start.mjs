// `npm start`: build the workbench and serve it on 127.0.0.1 (PORT, default 4173). The demo project
// (a fictional compound) is created in the browser on first open.
import { spawnSync, spawn } from 'node:child_process';

const port = process.env.PORT ?? '4173';
const build = spawnSync(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn'], {
  stdio: 'inherit',
});
if (build.status !== 0) process.exit(build.status ?? 1);
console.log(`\nSaltsmith is running at http://127.0.0.1:${port}/  (Ctrl+C to stop)\n`);
const child = spawn(
  process.execPath,
  ['node_modules/vite/bin/vite.js', 'preview', '--host', '127.0.0.1', '--port', port, '--strictPort'],
  { stdio: 'inherit' },
);
const stop = () => child.kill('SIGTERM');
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
child.on('exit', (code) => process.exit(code ?? 0));
