import type { ImportOutcome } from '@/persistence/import-project';
import type { ProjectFile } from '@/persistence/project-file/schema';
import type { ImportTarget } from '../hooks/use-project-import';

/** A refused file: what is wrong, and every problem found when there are more than three. */
export function RefusedFile({
  fileName,
  message,
  details,
}: {
  fileName: string;
  message: string;
  details: string[];
}) {
  return (
    <div className="project-file-error" role="alert">
      <p>
        <strong>“{fileName}” was not imported.</strong> {message} Your projects are unchanged.
      </p>
      {details.length > 3 ? (
        <details>
          <summary>All problems found ({details.length})</summary>
          <ul>
            {details.map((d) => (
              <li key={d}>{d}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

/** A checked file: what it holds, and the choice to import it as new or to replace a project. */
export function ImportReview({
  file,
  replaceable,
  confirmReplace,
  onConfirmReplace,
  onWrite,
  onCancel,
}: {
  file: ProjectFile;
  replaceable: { id: string; name: string } | null;
  confirmReplace: boolean;
  onConfirmReplace: (confirm: boolean) => void;
  onWrite: (target: ImportTarget) => void;
  onCancel: () => void;
}) {
  return (
    <div className="project-import-review" role="region" aria-label="File to import">
      <p>
        <strong>{file.project.name}</strong> — compound “{file.project.compound.name}
        ”, {file.candidates.length} shortlisted, {file.measurements.length} measurements,{' '}
        {file.customIons.length} custom ions. Written by {file.app.name} {file.app.version} on{' '}
        {file.createdAt.slice(0, 10)}.
      </p>
      <div className="project-import-actions">
        <button type="button" onClick={() => onWrite({ mode: 'new' })}>
          Import as a new project
        </button>
        {replaceable && !confirmReplace ? (
          <button type="button" onClick={() => onConfirmReplace(true)}>
            Replace “{replaceable.name}”…
          </button>
        ) : null}
        <button type="button" onClick={onCancel}>
          Cancel
        </button>
      </div>
      {replaceable && confirmReplace ? (
        <ConfirmReplace
          name={replaceable.name}
          onYes={() => onWrite({ mode: 'replace', projectId: replaceable.id })}
          onNo={() => onConfirmReplace(false)}
        />
      ) : null}
    </div>
  );
}

function ConfirmReplace({
  name,
  onYes,
  onNo,
}: {
  name: string;
  onYes: () => void;
  onNo: () => void;
}) {
  return (
    <div className="project-import-confirm" role="alertdialog" aria-label="Confirm replacement">
      <p>
        Replace everything in “{name}” — compound, shortlist, measurements, its custom ions and
        settings — with the file’s contents? This cannot be undone; export the project first if you
        may need it.
      </p>
      <button type="button" onClick={onYes}>
        Yes, replace “{name}”
      </button>
      <button type="button" onClick={onNo}>
        No, keep it
      </button>
    </div>
  );
}

/** What was written. */
export function ImportDone({ outcome, replaced }: { outcome: ImportOutcome; replaced: boolean }) {
  return (
    <p role="status">
      {replaced ? 'Replaced' : 'Imported'} “{outcome.name}”: {outcome.candidates} candidates,{' '}
      {outcome.measurements} measurements, {outcome.customIons} custom ions.
    </p>
  );
}
