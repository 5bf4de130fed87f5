import { PassThrough } from 'node:stream';
import type { CliIo } from '@/cli/io';

/** In-memory streams for running a CLI command in-process; `input` is what stdin delivers. */
export function captureIo(input?: string | Uint8Array): {
  io: CliIo;
  out: () => string;
  err: () => string;
} {
  const stdin = new PassThrough();
  const stdout = new PassThrough();
  const stderr = new PassThrough();
  let out = '';
  let err = '';
  stdout.on('data', (d) => (out += String(d)));
  stderr.on('data', (d) => (err += String(d)));
  if (input !== undefined) stdin.end(input);
  return { io: { stdin, stdout, stderr }, out: () => out, err: () => err };
}
