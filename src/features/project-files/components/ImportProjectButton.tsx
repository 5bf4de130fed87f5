import { useId } from 'react';
import type { ImportOutcome } from '@/persistence/import-project';
import { useProjectImport } from '../hooks/use-project-import';
import { ImportDone, ImportReview, RefusedFile } from './ImportSteps';
import '../project-files.css';

export interface ImportProjectButtonProps {
  /** The project that may be replaced by the file (usually the one open), or null for "new only". */
  replaceable?: { id: string; name: string } | null;
  /** Called after a successful import (for example to open the project). */
  onImported?: (outcome: ImportOutcome) => void;
}

/**
 * Read a Saltsmith project file and bring it in as a new project, or — after an explicit
 * confirmation — in place of an existing one. The whole file is checked before anything is
 * written; a refused file leaves the database untouched and says what is wrong.
 */
export function ImportProjectButton({ replaceable = null, onImported }: ImportProjectButtonProps) {
  const inputId = useId();
  const { inputRef, step, setStep, check, write } = useProjectImport(onImported);
  return (
    <div className="project-import">
      <label htmlFor={inputId} className="project-import-label">
        Import a project file
      </label>
      <input
        id={inputId}
        ref={inputRef}
        type="file"
        accept=".json,application/json"
        onChange={(e) => void check(e.currentTarget.files?.[0])}
      />
      {step.kind === 'reading' || step.kind === 'writing' ? (
        <p role="status">{step.kind === 'reading' ? 'Checking the file…' : 'Importing…'}</p>
      ) : null}
      {step.kind === 'refused' ? (
        <RefusedFile fileName={step.fileName} message={step.message} details={step.details} />
      ) : null}
      {step.kind === 'failed' ? (
        <p className="project-file-error" role="alert">
          {step.message}
        </p>
      ) : null}
      {step.kind === 'ready' ? (
        <ImportReview
          file={step.file}
          replaceable={replaceable}
          confirmReplace={step.confirmReplace}
          onConfirmReplace={(confirmReplace) => setStep({ ...step, confirmReplace })}
          onWrite={(target) => void write(step.file, target)}
          onCancel={() => setStep({ kind: 'idle' })}
        />
      ) : null}
      {step.kind === 'done' ? <ImportDone outcome={step.outcome} replaced={step.replaced} /> : null}
    </div>
  );
}
