import { main } from '@/cli/main';
import { captureIo } from './capture-io';

/** Run `saltsmith <argv>` in-process; stdin gets `input` when given. */
export async function runCli(argv: string[], input?: string | Uint8Array) {
  const c = captureIo(input);
  const code = await main(argv, c.io);
  return { code, out: c.out(), err: c.err() };
}
