import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type * as FsPromises from 'node:fs/promises';
import { describe, expect, it, vi } from 'vitest';

// A disk that fills up half-way through any write: both ways of writing a file (fs.writeFile on the
// target, and a file handle's writeFile) write half the text and then fail with ENOSPC.
const state = vi.hoisted(() => ({ full: false }));
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof FsPromises>();
  const enospc = () =>
    Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
  const half = (data: unknown) => String(data).slice(0, Math.floor(String(data).length / 2));
  const mocked = {
    ...real,
    writeFile: async (
      path: Parameters<typeof real.writeFile>[0],
      data: unknown,
      opts?: unknown,
    ) => {
      if (!state.full) return real.writeFile(path, data as string, opts as never);
      await real.writeFile(path, half(data));
      throw enospc();
    },
    open: async (...args: Parameters<typeof real.open>) => {
      const fh = await real.open(...args);
      if (!state.full) return fh;
      return new Proxy(fh, {
        get(target, prop) {
          if (prop === 'writeFile' || prop === 'write') {
            return async (data: unknown) => {
              await target.writeFile(half(data));
              throw enospc();
            };
          }
          const v = Reflect.get(target, prop, target);
          return typeof v === 'function' ? v.bind(target) : v;
        },
      });
    },
  };
  return { ...mocked, default: mocked };
});

const { runCli } = await import('./support/run-cli');

describe('--out on a full disk (issue 13)', () => {
  it('leaves the previous good file in place, removes its temporary file and exits non-zero', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'saltsmith-full-'));
    const out = join(dir, 'screen.csv');
    writeFileSync(out, 'previous good file\n');
    state.full = true;
    try {
      const r = await runCli([
        'screen',
        '--formula',
        'C17H20N2O2',
        '--pka',
        '8',
        '--s0',
        '0.02',
        '--iterations',
        '20',
        '--ions',
        'chloride',
        '--out',
        out,
      ]);
      expect(r.code).not.toBe(0);
      expect(r.err).toMatch(/ENOSPC/);
    } finally {
      state.full = false;
    }
    expect(readFileSync(out, 'utf8')).toBe('previous good file\n');
    expect(readdirSync(dir)).toEqual(['screen.csv']);
  });
});
