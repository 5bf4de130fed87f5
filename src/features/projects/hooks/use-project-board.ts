import { useEffect, useRef, useState } from 'react';
import { projectsRepo, type ProjectBundle } from '@/persistence/projects-repo';
import type { ProjectCardActions } from '../components/ProjectCard';

/** How long the "Undo" offer stays after a delete, ms. */
const UNDO_WINDOW_MS = 12_000;

/** The deleted project's bundle while its undo is on offer (cleared after UNDO_WINDOW_MS). */
function useUndoWindow() {
  const [deleted, setDeleted] = useState<ProjectBundle | null>(null);
  const undoTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(
    () => () => {
      if (undoTimer.current) clearTimeout(undoTimer.current);
    },
    [],
  );
  const offer = (bundle: ProjectBundle) => {
    setDeleted(bundle);
    if (undoTimer.current) clearTimeout(undoTimer.current);
    undoTimer.current = setTimeout(() => setDeleted(null), UNDO_WINDOW_MS);
  };
  return { deleted, offer, clear: () => setDeleted(null) };
}

/**
 * What the board's cards and controls do, and the one line of news they leave: rename, duplicate,
 * archive, delete with undo, and the reset of the fictional demo.
 */
export function useProjectBoard(
  open: (id: string) => void,
  openProject: (id: string) => void,
  setShowArchived: (update: (shown: boolean) => boolean) => void,
) {
  const [message, setMessage] = useState<string>('');
  const undoWindow = useUndoWindow();
  const { deleted } = undoWindow;

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
        undoWindow.offer(bundle);
        setMessage('');
      });
    },
  };

  const undo = async () => {
    if (!deleted) return;
    await projectsRepo.restore(deleted);
    setMessage(`Restored ${deleted.project.name}.`);
    undoWindow.clear();
  };

  const resetDemo = async () => {
    const id = await projectsRepo.resetDemo();
    setMessage('The demo project is back as it first was.');
    openProject(id);
  };

  return { actions, message, deleted, undo, resetDemo };
}
