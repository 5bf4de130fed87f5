import { useId, useState, type FormEvent } from 'react';
import type { ProjectSummary } from '../hooks/use-project-list';

export interface ProjectCardActions {
  open: (id: string) => void;
  rename: (id: string, name: string) => Promise<void>;
  duplicate: (id: string) => void;
  setArchived: (id: string, archived: boolean) => void;
  remove: (id: string) => void;
}

// As the comparison sheet writes dates ("3 December 2026 at 09:45"), whatever the browser's locale.
const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeStyle: 'short' });

/** One project on the Projects board: what it holds, and what can be done with it. */
export function ProjectCard({
  summary,
  isOpen,
  actions,
}: {
  summary: ProjectSummary;
  isOpen: boolean;
  actions: ProjectCardActions;
}) {
  const { project } = summary;
  const [renaming, setRenaming] = useState(false);
  const uid = useId();
  return (
    <article
      className={`project-card${isOpen ? ' is-open' : ''}${project.archived ? ' is-archived' : ''}`}
      aria-labelledby={`${uid}-name`}
    >
      <header className="project-card-head">
        <h3 id={`${uid}-name`}>{project.name}</h3>
        <div className="project-tags">
          {isOpen ? <span className="tag tag-open">open</span> : null}
          {project.isDemo ? <span className="tag tag-demo">fictional demo</span> : null}
          {project.archived ? <span className="tag tag-archived">archived</span> : null}
        </div>
      </header>
      {renaming ? (
        <RenameForm
          uid={uid}
          currentName={project.name}
          onRename={(name) => actions.rename(project.id, name)}
          onClose={() => setRenaming(false)}
        />
      ) : null}
      <ProjectFacts summary={summary} />
      <ProjectActions
        project={project}
        isOpen={isOpen}
        actions={actions}
        onRename={() => setRenaming(true)}
      />
    </article>
  );
}

/** The rename form: a name of 1–120 characters (trimmed), or a cancel that keeps the old one. */
function RenameForm({
  uid,
  currentName,
  onRename,
  onClose,
}: {
  uid: string;
  currentName: string;
  onRename: (name: string) => Promise<void>;
  onClose: () => void;
}) {
  const [name, setName] = useState(currentName);
  const [error, setError] = useState<string | null>(null);
  const submitRename = async (e: FormEvent) => {
    e.preventDefault();
    const trimmed = name.trim();
    if (!trimmed) {
      setError('A project needs a name');
      return;
    }
    if (trimmed.length > 120) {
      setError('At most 120 characters');
      return;
    }
    await onRename(trimmed);
    onClose();
  };
  return (
    <form className="rename-form" onSubmit={submitRename} noValidate>
      <label htmlFor={`${uid}-rename`}>New name</label>
      <input
        id={`${uid}-rename`}
        value={name}
        autoFocus
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${uid}-rename-error` : undefined}
        onChange={(e) => setName(e.target.value)}
      />
      {error ? (
        <p className="field-error" id={`${uid}-rename-error`}>
          {error}
        </p>
      ) : null}
      <div className="button-row">
        <button type="submit" className="primary">
          Save name
        </button>
        <button type="button" onClick={onClose}>
          Cancel
        </button>
      </div>
    </form>
  );
}

/** What the project holds: compound, structure, pKa, shortlist and the last edit. */
function ProjectFacts({ summary }: { summary: ProjectSummary }) {
  const { project, candidateCount, measurementCount } = summary;
  const c = project.compound;
  const pKas = c.pKas.map((p) => p.value).join(', ');
  return (
    <dl className="project-facts">
      <div>
        <dt>Compound</dt>
        <dd>
          {c.name} — weak {c.kind}, ion charge{' '}
          {c.ionCharge > 0 ? `+${c.ionCharge}` : `−${-c.ionCharge}`}
        </dd>
      </div>
      <div>
        <dt>Structure</dt>
        <dd className="structure-text">{c.formula || c.smiles || '—'}</dd>
      </div>
      <div>
        <dt>pKa</dt>
        <dd>{pKas}</dd>
      </div>
      <div>
        <dt>Shortlist</dt>
        <dd>
          {candidateCount} counter-ion{candidateCount === 1 ? '' : 's'}, {measurementCount}{' '}
          measurement
          {measurementCount === 1 ? '' : 's'}
        </dd>
      </div>
      <div>
        <dt>Last edit</dt>
        <dd>
          <time dateTime={project.updatedAt}>{dateFormat.format(new Date(project.updatedAt))}</time>
        </dd>
      </div>
    </dl>
  );
}

/** Open, rename, duplicate, archive or delete the project. */
function ProjectActions({
  project,
  isOpen,
  actions,
  onRename,
}: {
  project: ProjectSummary['project'];
  isOpen: boolean;
  actions: ProjectCardActions;
  onRename: () => void;
}) {
  return (
    <div className="button-row project-actions">
      <button
        type="button"
        className="primary"
        onClick={() => actions.open(project.id)}
        aria-label={isOpen ? `Go to compound: ${project.name}` : `Open ${project.name}`}
      >
        {isOpen ? 'Go to compound' : 'Open'}
      </button>
      <button type="button" onClick={onRename} aria-label={`Rename ${project.name}`}>
        Rename
      </button>
      <button
        type="button"
        onClick={() => actions.duplicate(project.id)}
        aria-label={`Duplicate ${project.name}`}
      >
        Duplicate
      </button>
      <button
        type="button"
        onClick={() => actions.setArchived(project.id, !project.archived)}
        aria-label={`${project.archived ? 'Unarchive' : 'Archive'} ${project.name}`}
      >
        {project.archived ? 'Unarchive' : 'Archive'}
      </button>
      <button
        type="button"
        className="danger"
        onClick={() => actions.remove(project.id)}
        aria-label={`Delete ${project.name}`}
      >
        Delete
      </button>
    </div>
  );
}
