import { create } from 'zustand';
import { classifyStorageError, type StorageProblem } from '@/persistence/storage-status';

/** Problems after which this tab cannot save until it is reloaded. */
const CONNECTION_PROBLEMS: ReadonlySet<StorageProblem['kind']> = new Set([
  'closed',
  'blocked',
  'unavailable',
]);

interface StorageProblemState {
  /** The latest storage failure not yet dismissed, or null. */
  problem: StorageProblem | null;
  /** How many storage failures were seen since the last dismissal. */
  count: number;
  /**
   * The database connection was lost (another connection upgraded or deleted it, or storage is
   * unavailable). Unlike the banner this cannot be dismissed: every save state reads it, so no panel
   * says "saved" while the banner says edits are not kept. Only a reload clears it.
   */
  connectionLost: StorageProblem | null;
  show: (problem: StorageProblem) => void;
  dismiss: () => void;
  /** Start clean (a fresh page; tests). */
  reset: () => void;
}

/** Storage failures the user has to know about (quota, blocked or closed database). */
export const useStorageProblemStore = create<StorageProblemState>()((set) => ({
  problem: null,
  count: 0,
  connectionLost: null,
  show: (problem) =>
    set((s) => ({
      problem,
      count: s.count + 1,
      connectionLost: s.connectionLost ?? (CONNECTION_PROBLEMS.has(problem.kind) ? problem : null),
    })),
  dismiss: () => set({ problem: null, count: 0 }),
  reset: () => set({ problem: null, count: 0, connectionLost: null }),
}));

/**
 * Report an error from a save. A storage failure (quota, blocked database …) is shown in the banner
 * and `true` is returned; any other error is left to the caller (`false`).
 */
export function reportStorageError(err: unknown): boolean {
  const problem = classifyStorageError(err);
  if (!problem) return false;
  useStorageProblemStore.getState().show(problem);
  return true;
}
