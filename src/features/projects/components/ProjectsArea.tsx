import { useState, type ReactNode } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { useNavigationStore } from '@/stores/navigation-store';
import { useProjectList, type ProjectSummary } from '../hooks/use-project-list';
import { useProjectBoard } from '../hooks/use-project-board';
import { NewProjectForm } from './NewProjectForm';
import { ProjectCard, type ProjectCardActions } from './ProjectCard';
import { BoardStatus, DemoReset } from './BoardControls';
import '../projects.css';

/** What the app shell may place under the board (the project-files panel), given the board's state. */
export interface ProjectsAreaSlotContext {
  projects: ProjectRecord[];
  currentProjectId: string | null;
  open: (id: string) => void;
}

/**
 * The Projects board: every compound side by side, with create, rename, duplicate, archive, delete
 * (with undo) and a reset of the fictional demo project.
 */
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
  const open = (id: string) => {
    openProject(id);
    goTo('compound');
  };
  const board = useProjectBoard(open, openProject, setShowArchived);
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
            <DemoReset onReset={board.resetDemo} />
          </div>
        </header>
        <p className="muted">
          Every edit is saved in this browser as you make it. Projects open in any tab of this
          browser; a second tab sees changes as they happen.
        </p>
        <BoardStatus
          deleted={board.deleted}
          message={board.message}
          onUndo={() => void board.undo()}
        />
        <ProjectBoard
          list={list}
          visible={visible}
          currentProjectId={currentProjectId}
          actions={board.actions}
        />
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

/** The cards, or what stands in their place while reading or when there are none. */
function ProjectBoard({
  list,
  visible,
  currentProjectId,
  actions,
}: {
  list: ProjectSummary[] | undefined;
  visible: ProjectSummary[];
  currentProjectId: string | null;
  actions: ProjectCardActions;
}) {
  if (list === undefined)
    return (
      <p className="loading" role="status">
        Reading your projects…
      </p>
    );
  if (visible.length === 0) return <p>No projects yet. Start one below, or reset the demo.</p>;
  return (
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
  );
}
