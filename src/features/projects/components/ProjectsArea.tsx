import { useEffect, useRef, useState, type ReactNode } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { projectsRepo, type ProjectBundle } from '@/persistence/projects-repo';
import { useNavigationStore } from '@/stores/navigation-store';
import { useProjectList } from '../hooks/use-project-list';
import { NewProjectForm } from './NewProjectForm';
import { ProjectCard, type ProjectCardActions } from './ProjectCard';
import '../projects.css';

/** How long the "Undo" offer stays after a delete, ms. */
const UNDO_WINDOW_MS = 12_000;

/**
 * The Projects board: every compound side by side, with create, rename, duplicate, archive, delete
 * (with undo) and a reset of the fictional demo project.
 */
/** What the app shell may place under the board (the project-files panel), given the board's state. */
export interface ProjectsAreaSlotContext {
  projects: ProjectRecord[];
  currentProjectId: string | null;
  open: (id: string) => void;
}

export function ProjectsArea({
  currentProjectId,
  footer,
}: {
  currentProjectId: string | null;
  /** Composed by the app shell, so that this feature does not import another feature. */
  footer?: (ctx: ProjectsAreaSlotContext) => ReactNode;
}) {
  const list = useProjectList();
  const openProject = useNavigationStore((s) => s.openProject);
  const goTo = useNavigationStore((s) => s.goTo);
  const [showArchived, setShowArchived] = useState(false);
  const [deleted, setDeleted] = useState<ProjectBundle | null>(null);
  const [message, setMessage] = useState<string>('');
  const [confirmReset, setConfirmReset] = useState(false);
  const undoTimer = useRef<ReturnType<typeof setTimeout> | null>(null);

  useEffect(
    () => () => {
      if (undoTimer.current) clearTimeout(undoTimer.current);
    },
    [],
  );

  const open = (id: string) => {
    openProject(id);
    goTo('compound');
  };

  const actions: ProjectCardActions = {
    open,
    rename: async (id, name) => {
      await projectsRepo.rename(id, name);
      setMessage(`Renamed to ${name}.`);
    },
    duplicate: (id) => {
      void projectsRepo.duplicate(id).then((copy) => setMessage(`Created ${copy.name}.`));
    },
    setArchived: (id, archived) => {
      void projectsRepo.setArchived(id, archived).then(() => {
        if (archived) setShowArchived((s) => s);
        setMessage(
          archived
            ? 'Project archived: find it under “Show archived”.'
            : 'Project back on the board.',
        );
      });
    },
    remove: (id) => {
      void projectsRepo.removeWithUndo(id).then((bundle) => {
        if (!bundle) return;
        setDeleted(bundle);
        setMessage('');
        if (undoTimer.current) clearTimeout(undoTimer.current);
        undoTimer.current = setTimeout(() => setDeleted(null), UNDO_WINDOW_MS);
      });
    },
  };

  const undo = async () => {
    if (!deleted) return;
    await projectsRepo.restore(deleted);
    setMessage(`Restored ${deleted.project.name}.`);
    setDeleted(null);
  };

  const resetDemo = async () => {
    const id = await projectsRepo.resetDemo();
    setConfirmReset(false);
    setMessage('The demo project is back as it first was.');
    openProject(id);
  };

  const visible = (list ?? []).filter((s) => showArchived || !s.project.archived);
  const archivedCount = (list ?? []).filter((s) => s.project.archived).length;

  return (
    <div className="projects-area">
      <section className="panel" aria-labelledby="projects-title">
        <header className="panel-head">
          <h2 id="projects-title">Projects</h2>
          <div className="button-row">
            <label className="inline-check">
              <input
                type="checkbox"
                checked={showArchived}
                onChange={(e) => setShowArchived(e.target.checked)}
              />
              Show archived ({archivedCount})
            </label>
            {confirmReset ? (
              <span className="confirm" role="group" aria-label="Confirm demo reset">
                Replace the demo project and its shortlist?{' '}
                <button type="button" className="danger" onClick={() => void resetDemo()}>
                  Reset demo
                </button>{' '}
                <button type="button" onClick={() => setConfirmReset(false)}>
                  Keep it
                </button>
              </span>
            ) : (
              <button type="button" onClick={() => setConfirmReset(true)}>
                Reset the demo…
              </button>
            )}
          </div>
        </header>
        <p className="muted">
          Every edit is saved in this browser as you make it. Projects open in any tab of this
          browser; a second tab sees changes as they happen.
        </p>
        <div role="status" aria-live="polite" className="projects-status">
          {deleted ? (
            <span className="undo-bar">
              Deleted <strong>{deleted.project.name}</strong> with {deleted.candidates.length}{' '}
              candidate
              {deleted.candidates.length === 1 ? '' : 's'} and {deleted.measurements.length}{' '}
              measurement
              {deleted.measurements.length === 1 ? '' : 's'}.{' '}
              <button type="button" className="primary" onClick={() => void undo()}>
                Undo delete
              </button>
            </span>
          ) : (
            message
          )}
        </div>
        {list === undefined ? (
          <p className="loading" role="status">
            Reading your projects…
          </p>
        ) : visible.length === 0 ? (
          <p>No projects yet. Start one below, or reset the demo.</p>
        ) : (
          <div className="project-board">
            {visible.map((s) => (
              <ProjectCard
                key={s.project.id}
                summary={s}
                isOpen={s.project.id === currentProjectId}
                actions={actions}
              />
            ))}
          </div>
        )}
      </section>
      <NewProjectForm
        onCreated={(id) => {
          open(id);
        }}
      />
      {footer?.({ projects: (list ?? []).map((s) => s.project), currentProjectId, open })}
    </div>
  );
}
