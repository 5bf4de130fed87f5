import { useMemo } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { COUNTER_IONS, mergeLibrary, type LibraryIon } from '@/chem';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import { settingsRepo } from '@/persistence/settings-repo';

/** Settings key: ids of unreadable in-house records the user has already been told about. */
export const ACKNOWLEDGED_REJECTS_KEY = 'acknowledgedIonRecords';

export interface RejectedRecord {
  recordId: string;
  reason: string;
}

/**
 * The counter-ion library as one project sees it: bundled ions with this project's edits, then the
 * in-house ions. Live: an ion added in another tab shows up here. A stored record that cannot be
 * read (invalid, or claiming another ion's id) is left out; `rejected` lists those the user has not
 * yet acknowledged, so each is reported once, not in every project for ever.
 */
export function useProjectLibrary(projectId: string | null): {
  ions: LibraryIon[];
  loading: boolean;
  rejected: RejectedRecord[];
  rejectedCount: number;
} {
  const records = useLiveQuery(() => customIonsRepo.listAll(), [], null);
  const acknowledged = useLiveQuery(
    async () => (await settingsRepo.get<string[]>(ACKNOWLEDGED_REJECTS_KEY)) ?? [],
    [],
    null,
  );
  return useMemo(() => {
    const merged = mergeLibrary(COUNTER_IONS, records ?? [], projectId);
    // Nothing is reported before the acknowledged list is read (no flash of an old report).
    const seen = new Set(Array.isArray(acknowledged) ? acknowledged : []);
    const rejected =
      acknowledged === null ? [] : merged.rejected.filter((r) => !seen.has(r.recordId));
    return {
      ions: merged.ions,
      loading: records === null,
      rejected,
      rejectedCount: rejected.length,
    };
  }, [records, projectId, acknowledged]);
}

/** Mark the given unreadable records as reported (they stay left out of the library). */
export async function acknowledgeRejected(recordIds: readonly string[]): Promise<void> {
  const before = (await settingsRepo.get<string[]>(ACKNOWLEDGED_REJECTS_KEY)) ?? [];
  await settingsRepo.set(ACKNOWLEDGED_REJECTS_KEY, [...new Set([...before, ...recordIds])]);
}
