import { useMemo } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { COUNTER_IONS, mergeLibrary, type LibraryIon } from '@/chem';
import { customIonsRepo } from '@/persistence/custom-ions-repo';

/**
 * The counter-ion library as one project sees it: bundled ions with this project's edits, then the
 * in-house ions. Live: an ion added in another tab shows up here.
 */
export function useProjectLibrary(projectId: string | null): {
  ions: LibraryIon[];
  loading: boolean;
  rejectedCount: number;
} {
  const records = useLiveQuery(() => customIonsRepo.listAll(), [], null);
  return useMemo(() => {
    const merged = mergeLibrary(COUNTER_IONS, records ?? [], projectId);
    return { ions: merged.ions, loading: records === null, rejectedCount: merged.rejected.length };
  }, [records, projectId]);
}
