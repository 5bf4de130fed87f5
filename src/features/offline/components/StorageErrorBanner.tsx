import { useEffect } from 'react';
import { watchDatabase } from '@/persistence/storage-status';
import { reportStorageError, useStorageProblemStore } from '@/stores/storage-problem-store';
import '../offline.css';

/**
 * A plain, persistent banner for storage failures (quota reached, database blocked or closed), so
 * that an edit that could not be saved is never lost silently. It listens to the database's
 * blocked/versionchange events and to storage errors nobody caught.
 */
export function StorageErrorBanner() {
  const problem = useStorageProblemStore((s) => s.problem);
  const count = useStorageProblemStore((s) => s.count);
  const show = useStorageProblemStore((s) => s.show);
  const dismiss = useStorageProblemStore((s) => s.dismiss);

  useEffect(() => {
    const unwatch = watchDatabase(show);
    const onRejection = (e: PromiseRejectionEvent) => {
      if (reportStorageError(e.reason)) e.preventDefault();
    };
    window.addEventListener('unhandledrejection', onRejection);
    return () => {
      unwatch();
      window.removeEventListener('unhandledrejection', onRejection);
    };
  }, [show]);

  if (!problem) return null;
  return (
    <div className={`storage-banner storage-${problem.kind}`} role="alert">
      <p>
        <strong>Storage problem{count > 1 ? ` (${count} times)` : ''}:</strong> {problem.message}
      </p>
      <details>
        <summary>Technical detail</summary>
        <code>{problem.technical}</code>
      </details>
      <button type="button" onClick={dismiss}>
        Dismiss
      </button>
    </div>
  );
}
