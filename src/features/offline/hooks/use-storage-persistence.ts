import { useEffect, useState } from 'react';
import {
  estimateStorage,
  requestPersistence,
  type PersistenceAnswer,
  type StorageUsage,
} from '@/persistence/storage-status';

/**
 * Ask once per page load for persistent storage and read the usage estimate. `answer` is null while
 * the browser has not answered yet.
 */
export function useStoragePersistence(): {
  answer: PersistenceAnswer | null;
  usage: StorageUsage | null;
} {
  const [answer, setAnswer] = useState<PersistenceAnswer | null>(null);
  const [usage, setUsage] = useState<StorageUsage | null>(null);
  useEffect(() => {
    let cancelled = false;
    void requestPersistence().then((a) => {
      if (!cancelled) setAnswer(a);
    });
    void estimateStorage().then((u) => {
      if (!cancelled) setUsage(u);
    });
    return () => {
      cancelled = true;
    };
  }, []);
  return { answer, usage };
}
