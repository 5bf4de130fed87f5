import { useState } from 'react';
import type { ProjectBundle } from '@/persistence/projects-repo';

/** "Reset the demo…", then a confirmation before the demo project is replaced. */
export function DemoReset({ onReset }: { onReset: () => Promise<void> }) {
  const [confirmReset, setConfirmReset] = useState(false);
  if (!confirmReset)
    return (
      <button type="button" onClick={() => setConfirmReset(true)}>
        Reset the demo…
      </button>
    );
  return (
    <span className="confirm" role="group" aria-label="Confirm demo reset">
      Replace the demo project and its shortlist?{' '}
      <button
        type="button"
        className="danger"
        onClick={() =>
          void onReset().then(() => {
            setConfirmReset(false);
          })
        }
      >
        Reset demo
      </button>{' '}
      <button type="button" onClick={() => setConfirmReset(false)}>
        Keep it
      </button>
    </span>
  );
}

/** The board's live line: the undo offer after a delete, else the last action's news. */
export function BoardStatus({
  deleted,
  message,
  onUndo,
}: {
  deleted: ProjectBundle | null;
  message: string;
  onUndo: () => void;
}) {
  return (
    <div role="status" aria-live="polite" className="projects-status">
      {deleted ? (
        <span className="undo-bar">
          Deleted <strong>{deleted.project.name}</strong> with {deleted.candidates.length} candidate
          {deleted.candidates.length === 1 ? '' : 's'} and {deleted.measurements.length} measurement
          {deleted.measurements.length === 1 ? '' : 's'}.{' '}
          <button type="button" className="primary" onClick={onUndo}>
            Undo delete
          </button>
        </span>
      ) : (
        message
      )}
    </div>
  );
}
