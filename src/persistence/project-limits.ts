import { utf8ByteLength } from '@/chem';
import { getDb } from './db';
import { exportProjectText } from './import-project';
import { PROJECT_LIMITS } from './project-file/format';

/**
 * The largest project Saltsmith holds (project-file/format.ts, PROJECT_LIMITS), enforced where data
 * are created, so that every project's export can be imported back. The message says what the limit
 * is and what to do.
 */
export async function requireRoomInProject(
  projectId: string,
  kind: 'measurements' | 'candidates' | 'customIons',
  added: unknown,
): Promise<void> {
  const db = getDb();
  const count =
    kind === 'customIons'
      ? await db.customIons.where('projectId').equals(projectId).count()
      : await db[kind].where('projectId').equals(projectId).count();
  const words = {
    measurements: 'measurements',
    candidates: 'candidates',
    customIons: 'in-house ions',
  };
  if (count >= PROJECT_LIMITS[kind]) {
    throw new Error(
      `This project already holds ${count.toLocaleString('en')} ${words[kind]}, the most one project can hold (${PROJECT_LIMITS[kind].toLocaleString('en')}). Start another project for more.`,
    );
  }
  if (!(await db.projects.get(projectId))) return; // no project, no file to keep importable
  const bytes =
    utf8ByteLength(await exportProjectText(projectId)) + utf8ByteLength(JSON.stringify(added)) + 1;
  if (bytes > PROJECT_LIMITS.exportBytes) {
    throw new Error(
      `This project's file would grow past ${Math.floor(PROJECT_LIMITS.exportBytes / 1024 / 1024)} MB, the most one project can hold so that its export can be imported back. Start another project for more.`,
    );
  }
}
