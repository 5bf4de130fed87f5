import { useLiveQuery } from 'dexie-react-hooks';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import type { CandidateRecord, MeasurementRecord } from '@/persistence/records';

/** The project's shortlist and measurements, live (another tab's entries appear as they are saved). */
export function useBenchData(
  projectId: string,
): { candidates: CandidateRecord[]; measurements: MeasurementRecord[] } | undefined {
  return useLiveQuery(async () => {
    const [candidates, measurements] = await Promise.all([
      candidatesRepo.listForProject(projectId),
      measurementsRepo.listForProject(projectId),
    ]);
    measurements.sort((a, b) => a.recordedAt.localeCompare(b.recordedAt));
    return { candidates, measurements };
  }, [projectId]);
}
