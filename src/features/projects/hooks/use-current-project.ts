import { useEffect, useState } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { projectsRepo } from '@/persistence/projects-repo';
import { settingsRepo } from '@/persistence/settings-repo';
import { useNavigationStore } from '@/stores/navigation-store';
import type { ProjectRecord } from '@/persistence/records';

const LAST_PROJECT_KEY = 'lastProjectId';

/**
 * Open the project the user had open last time (or the demo on first start), and keep the
 * on-screen record live: edits from another tab show up here too. When the open project disappears
 * (deleted here or in another tab) the most recently edited remaining project opens; `project` is
 * undefined with `loading` false only when there is no project at all.
 */
export function useCurrentProject(): { project: ProjectRecord | undefined; loading: boolean } {
  const projectId = useNavigationStore((s) => s.projectId);
  const openProject = useNavigationStore((s) => s.openProject);
  const [resolving, setResolving] = useState(projectId === null);

  useEffect(() => {
    if (projectId) return;
    let cancelled = false;
    setResolving(true);
    void (async () => {
      // First put back the edits a reloaded or closed page could not confirm (unsaved-edits.ts).
      await projectsRepo.replayUnsavedEdits().catch(() => 0);
      const demoId = await projectsRepo.ensureDemo();
      const last = await settingsRepo.get<string>(LAST_PROJECT_KEY);
      const lastExists = last ? await projectsRepo.get(last) : undefined;
      const fallback =
        (await projectsRepo.list())[0]?.id ?? (await projectsRepo.list(true))[0]?.id ?? null;
      const id = lastExists?.id ?? demoId ?? fallback;
      if (cancelled) return;
      openProject(id);
      setResolving(false);
    })();
    return () => {
      cancelled = true;
    };
  }, [projectId, openProject]);

  useEffect(() => {
    if (projectId) void settingsRepo.set(LAST_PROJECT_KEY, projectId);
  }, [projectId]);

  // The query answers with the id it was asked about, so a stale answer is never taken for this id's.
  const answer = useLiveQuery(
    async () => ({
      id: projectId,
      project: projectId ? await projectsRepo.get(projectId) : undefined,
    }),
    [projectId],
  );
  const current = answer && answer.id === projectId ? answer : undefined;
  const project = current?.project;

  // The open project was deleted (here or in another tab): fall back to another one.
  useEffect(() => {
    if (projectId && current && current.project === undefined) openProject(null);
  }, [projectId, current, openProject]);

  return {
    project,
    loading: projectId === null ? resolving : current === undefined || project === undefined,
  };
}
