import type { ProjectRecord } from '@/persistence/records';
import { BenchArea } from './BenchArea';

/** The Bench data area wired to the project's screening (predictions beside measurements). */
export function BenchWorkspace({ project }: { project: ProjectRecord }) {
  return <BenchArea project={project} extras={{ predictionFor: () => <span className="muted">—</span> }} />;
}
