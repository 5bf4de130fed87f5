import { useId, useRef, useState } from 'react';
import { ProjectFileError } from '@/persistence/project-file/errors';
import { PROJECT_FILE_MAX_BYTES } from '@/persistence/project-file/format';
import { parseProjectFile } from '@/persistence/project-file/restore';
import { checkFileStructures } from '@/persistence/project-file/file-rules';
import type { ProjectFile } from '@/persistence/project-file/schema';
import { writeProjectFile, type ImportOutcome } from '@/persistence/import-project';
import '../project-files.css';

type Step =
  | { kind: 'idle' }
  | { kind: 'reading' }
  | { kind: 'refused'; fileName: string; message: string; details: string[] }
  | { kind: 'ready'; fileName: string; file: ProjectFile; confirmReplace: boolean }
  | { kind: 'writing' }
  | { kind: 'done'; outcome: ImportOutcome; replaced: boolean }
  | { kind: 'failed'; message: string };

export interface ImportProjectButtonProps {
  /** The project that may be replaced by the file (usually the one open), or null for "new only". */
  replaceable?: { id: string; name: string } | null;
  /** Called after a successful import (for example to open the project). */
  onImported?: (outcome: ImportOutcome) => void;
}

/** The file's bytes (the strict reader checks the UTF-8 itself: damaged bytes are refused, not replaced). */
async function readFileBytes(f: File): Promise<Uint8Array> {
  if (typeof f.arrayBuffer === 'function') return new Uint8Array(await f.arrayBuffer());
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(new Uint8Array(r.result as ArrayBuffer));
    r.onerror = () => reject(r.error ?? new Error('could not read the file'));
    r.readAsArrayBuffer(f);
  });
}

/**
 * Read a Saltsmith project file and bring it in as a new project, or — after an explicit
 * confirmation — in place of an existing one. The whole file is checked before anything is
 * written; a refused file leaves the database untouched and says what is wrong.
 */
export function ImportProjectButton({ replaceable = null, onImported }: ImportProjectButtonProps) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [step, setStep] = useState<Step>({ kind: 'idle' });

  const onFile = async (f: File | undefined) => {
    if (!f) return;
    if (f.size > PROJECT_FILE_MAX_BYTES) {
      setStep({
        kind: 'refused',
        fileName: f.name,
        message: `This file is ${(f.size / 1024 / 1024).toFixed(1)} MB; the export of the largest project Saltsmith holds is at most ${PROJECT_FILE_MAX_BYTES / 1024 / 1024} MB.`,
        details: [],
      });
      return;
    }
    setStep({ kind: 'reading' });
    try {
      const file = parseProjectFile(await readFileBytes(f));
      await checkFileStructures(file);
      setStep({ kind: 'ready', fileName: f.name, file, confirmReplace: false });
    } catch (err) {
      if (err instanceof ProjectFileError) {
        setStep({ kind: 'refused', fileName: f.name, message: err.message, details: err.details });
      } else {
        setStep({
          kind: 'refused',
          fileName: f.name,
          message: `Could not read the file: ${String(err)}`,
          details: [],
        });
      }
    } finally {
      if (inputRef.current) inputRef.current.value = '';
    }
  };

  const write = async (
    file: ProjectFile,
    target: { mode: 'new' } | { mode: 'replace'; projectId: string },
  ) => {
    setStep({ kind: 'writing' });
    try {
      const outcome = await writeProjectFile(file, target);
      setStep({ kind: 'done', outcome, replaced: target.mode === 'replace' });
      onImported?.(outcome);
    } catch (err) {
      setStep({
        kind: 'failed',
        message: `Nothing was imported — the database is unchanged. (${err instanceof Error ? err.message : String(err)})`,
      });
    }
  };

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
        onChange={(e) => void onFile(e.currentTarget.files?.[0])}
      />
      {step.kind === 'reading' || step.kind === 'writing' ? (
        <p role="status">{step.kind === 'reading' ? 'Checking the file…' : 'Importing…'}</p>
      ) : null}
      {step.kind === 'refused' ? (
        <div className="project-file-error" role="alert">
          <p>
            <strong>“{step.fileName}” was not imported.</strong> {step.message} Your projects are
            unchanged.
          </p>
          {step.details.length > 3 ? (
            <details>
              <summary>All problems found ({step.details.length})</summary>
              <ul>
                {step.details.map((d) => (
                  <li key={d}>{d}</li>
                ))}
              </ul>
            </details>
          ) : null}
        </div>
      ) : null}
      {step.kind === 'failed' ? (
        <p className="project-file-error" role="alert">
          {step.message}
        </p>
      ) : null}
      {step.kind === 'ready' ? (
        <div className="project-import-review" role="region" aria-label="File to import">
          <p>
            <strong>{step.file.project.name}</strong> — compound “{step.file.project.compound.name}
            ”, {step.file.candidates.length} shortlisted, {step.file.measurements.length}{' '}
            measurements, {step.file.customIons.length} custom ions. Written by {step.file.app.name}{' '}
            {step.file.app.version} on {step.file.createdAt.slice(0, 10)}.
          </p>
          <div className="project-import-actions">
            <button type="button" onClick={() => void write(step.file, { mode: 'new' })}>
              Import as a new project
            </button>
            {replaceable && !step.confirmReplace ? (
              <button type="button" onClick={() => setStep({ ...step, confirmReplace: true })}>
                Replace “{replaceable.name}”…
              </button>
            ) : null}
            <button type="button" onClick={() => setStep({ kind: 'idle' })}>
              Cancel
            </button>
          </div>
          {replaceable && step.confirmReplace ? (
            <div
              className="project-import-confirm"
              role="alertdialog"
              aria-label="Confirm replacement"
            >
              <p>
                Replace everything in “{replaceable.name}” — compound, shortlist, measurements, its
                custom ions and settings — with the file’s contents? This cannot be undone; export
                the project first if you may need it.
              </p>
              <button
                type="button"
                onClick={() =>
                  void write(step.file, { mode: 'replace', projectId: replaceable.id })
                }
              >
                Yes, replace “{replaceable.name}”
              </button>
              <button type="button" onClick={() => setStep({ ...step, confirmReplace: false })}>
                No, keep it
              </button>
            </div>
          ) : null}
        </div>
      ) : null}
      {step.kind === 'done' ? (
        <p role="status">
          {step.replaced ? 'Replaced' : 'Imported'} “{step.outcome.name}”: {step.outcome.candidates}{' '}
          candidates, {step.outcome.measurements} measurements, {step.outcome.customIons} custom
          ions.
        </p>
      ) : null}
    </div>
  );
}
