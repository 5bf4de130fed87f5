import { useId, useState } from 'react';
import type { ImportOutcome } from '@/persistence/import-project';
import { PROJECT_FILE_MAX_BYTES, PROJECT_LIMITS } from '@/persistence/project-file/format';
import { ExportProjectButton } from './ExportProjectButton';
import { ImportProjectButton } from './ImportProjectButton';
import '../project-files.css';

export interface ProjectFilesPanelProps {
  /** Projects that can be exported or replaced. */
  projects: readonly { id: string; name: string }[];
  /** The open project, chosen by default. */
  currentProjectId: string | null;
  onImported?: (outcome: ImportOutcome) => void;
}

/**
 * Hand a project to a colleague, or take one in: export to a Saltsmith project file, import one as a
 * new project or in place of the chosen project.
 */
export function ProjectFilesPanel({
  projects,
  currentProjectId,
  onImported,
}: ProjectFilesPanelProps) {
  const selectId = useId();
  const [chosen, setChosen] = useState<string | null>(null);
  const selected =
    projects.find((p) => p.id === chosen) ??
    projects.find((p) => p.id === currentProjectId) ??
    projects[0] ??
    null;
  return (
    <section className="panel project-files" aria-labelledby={`${selectId}-title`}>
      <h2 id={`${selectId}-title`}>Project files</h2>
      <p className="muted">
        A project file holds the compound, shortlist, bench measurements, custom counter-ions and
        settings of one project (Saltsmith project format, JSON). Use it to hand a project to a
        colleague or keep a copy outside this browser.
      </p>
      <p className="muted" data-testid="project-limits">
        One project holds at most {PROJECT_LIMITS.candidates.toLocaleString('en')} shortlisted
        counter-ions, {PROJECT_LIMITS.measurements.toLocaleString('en')} measurements and{' '}
        {PROJECT_LIMITS.customIons.toLocaleString('en')} in-house ions, so that its file (at most{' '}
        {PROJECT_FILE_MAX_BYTES / 1024 / 1024} MB) can always be imported back.
      </p>
      {selected ? (
        <div className="project-file-export">
          <label htmlFor={selectId}>Project</label>{' '}
          <select id={selectId} value={selected.id} onChange={(e) => setChosen(e.target.value)}>
            {projects.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>{' '}
          <ExportProjectButton projectId={selected.id} projectName={selected.name} />
        </div>
      ) : null}
      <ImportProjectButton replaceable={selected} onImported={onImported} />
    </section>
  );
}
