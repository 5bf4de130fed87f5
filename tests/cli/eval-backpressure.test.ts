import { PassThrough, Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { main } from '@/cli/main';

describe('eval with a slow reader (issue 13)', () => {
  it('stops reading and answering while the output is not drained, instead of buffering without bound', async () => {
    const stdin = new PassThrough();
    const held: (() => void)[] = [];
    let written = 0;
    // A reader that takes nothing until released: every write waits for its callback.
    const stdout = new Writable({
      highWaterMark: 16 * 1024,
      write(chunk: Buffer, _enc, cb) {
        written += chunk.length;
        held.push(cb);
      },
    });
    const stderr = new PassThrough();
    const line =
      '{"kind":"ph-solubility","drug":{"kind":"base","pKas":[8],"log10IntrinsicM":-5},"phStep":1}\n';
    const total = 2000;
    for (let i = 0; i < total; i++) stdin.write(line);
    stdin.end();
    const run = main(['eval'], { stdin, stdout, stderr });
    await new Promise((r) => setTimeout(r, 1500));
    // Only the first answer reached the stream's sink; the rest of the answers wait in at most one
    // buffer's worth (16 KiB) — without backpressure all 2,000 answers (~3 MB) would queue in memory.
    expect(stdout.writableLength).toBeLessThan(64 * 1024);
    const queuedBefore = stdout.writableLength + written;
    await new Promise((r) => setTimeout(r, 300));
    expect(stdout.writableLength + written).toBe(queuedBefore); // nothing more is produced while blocked
    // Release the reader: everything is answered.
    let answered = 0;
    const release = setInterval(() => {
      while (held.length) {
        held.shift()!();
        answered++;
      }
    }, 1);
    const code = await run;
    clearInterval(release);
    while (held.length) held.shift()!();
    expect(code).toBe(0);
    expect(answered).toBeGreaterThan(0);
    expect(written).toBeGreaterThan(total * 100);
  });
});
