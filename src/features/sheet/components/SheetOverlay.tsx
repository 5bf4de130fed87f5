import { lazy, Suspense } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { useSheetStore } from '../sheet-store';
import '../sheet.css';

// The sheet brings charts and the screening with it: load it when it is first opened, not with the
// first screen (the service worker precaches the chunk, so it opens offline too).
const SheetContainer = lazy(() =>
  import('./SheetContainer').then((m) => ({ default: m.SheetContainer })),
);

/** The comparison sheet of the open project, while the sheet is open. */
export function SheetOverlay({ project }: { project: ProjectRecord | undefined }) {
  const open = useSheetStore((s) => s.open);
  if (!open || !project) return null;
  return (
    <Suspense
      fallback={
        <div className="sheet-overlay" role="status">
          Opening the comparison sheet…
        </div>
      }
    >
      <SheetContainer project={project} />
    </Suspense>
  );
}
