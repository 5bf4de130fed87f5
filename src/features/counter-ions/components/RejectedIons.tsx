import { customIonsRepo } from '@/persistence/custom-ions-repo';
import type { useProjectLibrary } from '../hooks/use-project-library';
import { acknowledgeRejected } from '../hooks/use-project-library';

type Rejected = ReturnType<typeof useProjectLibrary>['rejected'];

/** Stored in-house records that cannot be used: say so once, and offer to delete or keep them. */
export function RejectedIons({ rejected }: { rejected: Rejected }) {
  if (rejected.length === 0) return null;
  return (
    <div className="field-error ion-rejected" role="alert">
      <p>
        {rejected.length} stored in-house record(s) cannot be used and are left out of every
        project’s library:
      </p>
      <ul>
        {rejected.map((r) => (
          <li key={r.recordId}>
            <code>{r.recordId}</code>: {r.reason}
          </li>
        ))}
      </ul>
      <button
        type="button"
        onClick={() => void Promise.all(rejected.map((r) => customIonsRepo.remove(r.recordId)))}
      >
        Delete these records
      </button>{' '}
      <button
        type="button"
        onClick={() => void acknowledgeRejected(rejected.map((r) => r.recordId))}
      >
        Keep them, stop telling me
      </button>
    </div>
  );
}
