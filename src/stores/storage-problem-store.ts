import { create } from 'zustand';
import { classifyStorageError, type StorageProblem } from '@/persistence/storage-status';

interface StorageProblemState {
  /** The latest storage failure not yet dismissed, or null. */
  problem: StorageProblem | null;
  /** How many storage failures were seen since the last dismissal. */
  count: number;
  show: (problem: StorageProblem) => void;
  dismiss: () => void;
}

/** Storage failures the user has to know about (quota, blocked or closed database). */
export const useStorageProblemStore = create<StorageProblemState>()((set) => ({
  problem: null,
  count: 0,
  show: (problem) => set((s) => ({ problem, count: s.count + 1 })),
  dismiss: () => set({ problem: null, count: 0 }),
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
