import { useRef, useState } from 'react';
import { ProjectFileError } from '@/persistence/project-file/errors';
import { PROJECT_FILE_MAX_BYTES } from '@/persistence/project-file/format';
import { parseProjectFile } from '@/persistence/project-file/restore';
import { checkFileStructures } from '@/persistence/project-file/file-rules';
import type { ProjectFile } from '@/persistence/project-file/schema';
import { writeProjectFile, type ImportOutcome } from '@/persistence/import-project';

/** Where an import stands: from choosing a file, through the whole-file check, to the write. */
export type ImportStep =
  | { kind: 'idle' }
  | { kind: 'reading' }
  | { kind: 'refused'; fileName: string; message: string; details: string[] }
  | { kind: 'ready'; fileName: string; file: ProjectFile; confirmReplace: boolean }
  | { kind: 'writing' }
  | { kind: 'done'; outcome: ImportOutcome; replaced: boolean }
  | { kind: 'failed'; message: string };

export type ImportTarget = { mode: 'new' } | { mode: 'replace'; projectId: string };

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

/** The refusal for a file larger than any project's export, before a byte is read. */
function tooLargeStep(f: File): ImportStep {
  return {
    kind: 'refused',
    fileName: f.name,
    message: `This file is ${(f.size / 1024 / 1024).toFixed(1)} MB; the export of the largest project Saltsmith holds is at most ${PROJECT_FILE_MAX_BYTES / 1024 / 1024} MB.`,
    details: [],
  };
}

/** The refusal for a file the reader or the structure check turned down, saying what is wrong. */
function refusedStep(fileName: string, err: unknown): ImportStep {
  if (err instanceof ProjectFileError)
    return { kind: 'refused', fileName, message: err.message, details: err.details };
  return {
    kind: 'refused',
    fileName,
    message: `Could not read the file: ${String(err)}`,
    details: [],
  };
}

/**
 * The import's steps: `check` reads and checks the whole file (nothing is written), `write` writes
 * it as a new project or in place of one; a failed write leaves the database unchanged.
 */
export function useProjectImport(onImported?: (outcome: ImportOutcome) => void) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [step, setStep] = useState<ImportStep>({ kind: 'idle' });

  const check = async (f: File | undefined) => {
    if (!f) return;
    if (f.size > PROJECT_FILE_MAX_BYTES) {
      setStep(tooLargeStep(f));
      return;
    }
    setStep({ kind: 'reading' });
    try {
      const file = parseProjectFile(await readFileBytes(f));
      await checkFileStructures(file);
      setStep({ kind: 'ready', fileName: f.name, file, confirmReplace: false });
    } catch (err) {
      setStep(refusedStep(f.name, err));
    } finally {
      if (inputRef.current) inputRef.current.value = '';
    }
  };

  const write = async (file: ProjectFile, target: ImportTarget) => {
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

  return { inputRef, step, setStep, check, write };
}
