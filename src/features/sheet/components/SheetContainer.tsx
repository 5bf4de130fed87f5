import type { ProjectRecord } from '@/persistence/records';
import { ScreenOutcomesPanel } from '@/components/ScreenOutcomesPanel';
import { useSheetModel } from '../hooks/use-sheet-model';
import { useSheetStore } from '../sheet-store';
import { SheetView } from './SheetView';

/** The open sheet: screening, model and view (loaded on demand by SheetOverlay). */
export function SheetContainer({ project }: { project: ProjectRecord }) {
  const close = useSheetStore((s) => s.close);
  const state = useSheetModel(project);
  const status =
    state.status === 'error'
      ? `The comparison could not be made: ${state.error ?? 'unknown error'}. Check the compound and the shortlist.`
      : 'Screening the shortlist…';
  return (
    <SheetView
      model={state.status === 'ready' ? (state.model ?? null) : null}
      status={status}
      onClose={close}
      extra={<ScreenOutcomesPanel project={project} />}
    />
  );
}
