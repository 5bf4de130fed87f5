import { useLiveQuery } from 'dexie-react-hooks';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import type { ProjectRecord } from '@/persistence/records';

export interface ProjectSummary {
  project: ProjectRecord;
  candidateCount: number;
  measurementCount: number;
}

/**
 * Every project (archived too) with its shortlist and measurement counts, newest edit first. Live: a
 * change in another tab shows up here. `undefined` while the first read is in flight.
 */
export function useProjectList(): ProjectSummary[] | undefined {
  return useLiveQuery(async () => {
    const [projects, candidates, measurements] = await Promise.all([
      projectsRepo.list(true),
      candidatesRepo.countByProject(),
      measurementsRepo.countByProject(),
    ]);
    return projects.map((project) => ({
      project,
      candidateCount: candidates.get(project.id) ?? 0,
      measurementCount: measurements.get(project.id) ?? 0,
    }));
  }, []);
}
