import { unlinkSync } from 'node:fs';

/**
 * The temporary files of atomic writes that are still open. They are removed on every way out of the
 * process: a normal end, an error, Ctrl+C (SIGINT) or SIGTERM — so no hidden `.tmp` file is left beside
 * an output. The signal handlers are installed when the first temporary file is opened (never on
 * import), and they end the process with the usual status for a signal (128 + its number).
 */

const live = new Set<string>();
let installed = false;

/** Exit status after a signal: 128 + the signal's number (POSIX shells' convention). */
const SIGNAL_STATUS = { SIGINT: 130, SIGTERM: 143, SIGHUP: 129 } as const;

/** Remove every temporary file still open (synchronous: it runs in 'exit' and signal handlers). */
export function removeTempFilesSync(): void {
  for (const path of live) {
    try {
      unlinkSync(path);
    } catch {
      // already gone
    }
    live.delete(path);
  }
}

function installCleanup() {
  if (installed) return;
  installed = true;
  process.on('exit', removeTempFilesSync);
  for (const [signal, status] of Object.entries(SIGNAL_STATUS)) {
    process.on(signal, () => {
      removeTempFilesSync();
      process.exit(status);
    });
  }
}

/** Note a temporary file that must not outlive the process. */
export function trackTempFile(path: string): void {
  installCleanup();
  live.add(path);
}

/** The temporary file was renamed into place or removed. */
export function untrackTempFile(path: string): void {
  live.delete(path);
}

/** Temporary files still open (tests). */
export function liveTempFiles(): string[] {
  return [...live];
}
