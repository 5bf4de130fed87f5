import type { ProjectRecord } from '@/persistence/records';
import { useSheetModel } from '../hooks/use-sheet-model';
import { useSheetStore } from '../sheet-store';
import { SheetView } from './SheetView';

function OpenSheet({ project }: { project: ProjectRecord }) {
  const close = useSheetStore((s) => s.close);
  const state = useSheetModel(project);
  const status =
    state.status === 'error'
      ? `The comparison could not be made: ${state.error ?? 'unknown error'}. Check the compound and the shortlist.`
      : 'Screening the shortlist…';
  return <SheetView model={state.status === 'ready' ? (state.model ?? null) : null} status={status} onClose={close} />;
}

/** The comparison sheet of the open project, while the sheet is open. */
export function SheetOverlay({ project }: { project: ProjectRecord | undefined }) {
  const open = useSheetStore((s) => s.open);
  if (!open || !project) return null;
  return <OpenSheet project={project} />;
}
