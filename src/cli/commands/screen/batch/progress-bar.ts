import type { Writable } from 'node:stream';

/**
 * A one-line progress bar on stderr (only when stderr is a terminal): share of the input read, compounds
 * per second and the time left, estimated from the bytes still to read at the rate so far.
 */
export function createProgressBar(
  stderr: Writable,
  totalBytes: number,
  now: () => number = Date.now,
) {
  const start = now();
  let last = 0;
  let shown = false;
  const fmtTime = (s: number) =>
    Number.isFinite(s)
      ? `${Math.floor(s / 60)}:${String(Math.round(s % 60)).padStart(2, '0')}`
      : '–:––';
  const render = (bytes: number, compounds: number) => {
    const seconds = Math.max((now() - start) / 1000, 1e-3);
    const share = totalBytes > 0 ? Math.min(bytes / totalBytes, 1) : 0;
    const width = 24;
    const filled = Math.round(share * width);
    const rate = compounds / seconds;
    const left = share > 0 ? (seconds * (1 - share)) / share : Infinity;
    return `\r[${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${(share * 100).toFixed(0).padStart(3)} %  ${compounds} compounds  ${rate.toFixed(0)}/s  ${fmtTime(left)} left `;
  };
  return {
    update(bytes: number, compounds: number) {
      const t = now();
      if (t - last < 100) return;
      last = t;
      shown = true;
      stderr.write(render(bytes, compounds));
    },
    finish(bytes: number, compounds: number) {
      if (shown) stderr.write(`${render(bytes, compounds)}\n`);
    },
    render,
  };
}
