import { useEffect } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { projectsRepo } from '@/persistence/projects-repo';
import { settingsRepo } from '@/persistence/settings-repo';
import { useNavigationStore } from '@/stores/navigation-store';
import type { ProjectRecord } from '@/persistence/records';

const LAST_PROJECT_KEY = 'lastProjectId';

/**
 * Open the project the user had open last time (or the demo on first start), and keep the
 * on-screen record live: edits from another tab show up here too.
 */
export function useCurrentProject(): { project: ProjectRecord | undefined; loading: boolean } {
  const projectId = useNavigationStore((s) => s.projectId);
  const openProject = useNavigationStore((s) => s.openProject);

  useEffect(() => {
    if (projectId) return;
    let cancelled = false;
    void (async () => {
      const demoId = await projectsRepo.ensureDemo();
      const last = await settingsRepo.get<string>(LAST_PROJECT_KEY);
      const lastExists = last ? await projectsRepo.get(last) : undefined;
      const fallback = (await projectsRepo.list())[0]?.id ?? null;
      const id = lastExists?.id ?? demoId ?? fallback;
      if (!cancelled) openProject(id);
    })();
    return () => {
      cancelled = true;
    };
  }, [projectId, openProject]);

  useEffect(() => {
    if (projectId) void settingsRepo.set(LAST_PROJECT_KEY, projectId);
  }, [projectId]);

  const project = useLiveQuery(
    () => (projectId ? projectsRepo.get(projectId) : Promise.resolve(undefined)),
    [projectId],
    null,
  );
  return { project: project ?? undefined, loading: project === null };
}
