import { useState } from 'react';
import { exportProjectText } from '@/persistence/import-project';
import { projectFileName } from '@/persistence/project-file/file-name';
import { downloadText } from '@/components/download-text';
import '../project-files.css';

/**
 * Save one project (compound, shortlist, measurements, custom ions, settings) as a Saltsmith project
 * file. The file is validated as it is written, so every exported file can be imported again.
 */
export function ExportProjectButton({
  projectId,
  projectName,
}: {
  projectId: string;
  projectName: string;
}) {
  const [state, setState] = useState<{ kind: 'idle' | 'busy' | 'done' | 'error'; text?: string }>({
    kind: 'idle',
  });
  const run = async () => {
    setState({ kind: 'busy' });
    try {
      const text = await exportProjectText(projectId);
      const name = projectFileName(projectName, new Date().toISOString());
      downloadText(name, text, 'application/json');
      setState({ kind: 'done', text: `Saved as ${name}` });
    } catch (err) {
      setState({
        kind: 'error',
        text: `Could not export: ${err instanceof Error ? err.message : String(err)}`,
      });
    }
  };
  return (
    <span className="project-file-action">
      <button type="button" onClick={() => void run()} disabled={state.kind === 'busy'}>
        Export to file
      </button>
      {state.kind === 'done' ? (
        <span className="muted" role="status">
          {state.text}
        </span>
      ) : null}
      {state.kind === 'error' ? (
        <span className="project-file-error" role="alert">
          {state.text}
        </span>
      ) : null}
    </span>
  );
}
