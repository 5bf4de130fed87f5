import { invalidFileError } from './errors';
import { projectFileV2Schema } from './schema';

/**
 * Version 2, the layout before the salt-screen plan: everything of version 3 but `screenPlans`. The
 * upgrade checks the file against the version-2 fields and adds an empty list of plans; the result is
 * validated as a version-3 file afterwards.
 */
export function upgradeV2(raw: unknown): unknown {
  const parsed = projectFileV2Schema.safeParse(raw);
  if (!parsed.success) throw invalidFileError(parsed.error, 'This version-2 project file');
  return { ...parsed.data, version: 3, screenPlans: [] };
}
