import { getDb } from './db';
import { newId, nowIso } from './ids';
import {
  RECORD_SCHEMA_VERSION,
  candidateRecordSchema,
  customIonRecordSchema,
  measurementRecordSchema,
  projectRecordSchema,
  type CandidateRecord,
  type CustomIonRecord,
  type MeasurementRecord,
  type ProjectRecord,
} from './records';
import {
  buildProjectFile,
  parseProjectFileText,
  serializeProjectFile,
  type ProjectBundle,
  type ProjectFile,
} from './export-format';

/** Read everything a project file holds for one project. */
export async function loadProjectBundle(projectId: string): Promise<ProjectBundle> {
  const db = getDb();
  return db.transaction('r', [db.projects, db.candidates, db.measurements, db.customIons], async () => {
    const project = await db.projects.get(projectId);
    if (!project) throw new Error(`No project with id ${projectId}`);
    const candidates = await db.candidates.where('projectId').equals(projectId).toArray();
    const measurements = await db.measurements.where('projectId').equals(projectId).toArray();
    const usedIonIds = new Set(candidates.map((c) => c.ionId));
    const customIons = (await db.customIons.toArray()).filter(
      (ion) =>
        ion.projectId === projectId ||
        (ion.projectId === null && (usedIonIds.has(ion.id) || (ion.overridesIonId !== null && usedIonIds.has(ion.overridesIonId)))),
    );
    return { project, candidates, measurements, customIons };
  });
}

/** Export a project as the text of a project file (see export-format.ts). */
export async function exportProjectText(projectId: string): Promise<string> {
  return serializeProjectFile(buildProjectFile(await loadProjectBundle(projectId), nowIso()));
}

export type ImportMode = { mode: 'new' } | { mode: 'replace'; projectId: string };

export interface ImportOutcome {
  projectId: string;
  name: string;
  candidates: number;
  measurements: number;
  customIons: number;
}

const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * Write a validated project file into the database in ONE transaction: either every record lands or
 * none does. Candidate, measurement and project-scoped ion ids are fresh, so a file can be imported
 * beside the project it came from. A shared custom ion keeps its id when that id is free or already
 * holds the same ion; otherwise it comes in as an ion of the imported project under a new id.
 */
export async function writeProjectFile(file: ProjectFile, target: ImportMode): Promise<ImportOutcome> {
  const db = getDb();
  return db.transaction('rw', [db.projects, db.candidates, db.measurements, db.customIons], async () => {
    const now = nowIso();
    let projectId: string;
    let createdAt = file.project.createdAt;
    if (target.mode === 'replace') {
      const existing = await db.projects.get(target.projectId);
      if (!existing) throw new Error('The project to replace no longer exists; nothing was imported.');
      projectId = existing.id;
      createdAt = existing.createdAt;
      await db.measurements.where('projectId').equals(projectId).delete();
      await db.candidates.where('projectId').equals(projectId).delete();
      await db.customIons.where('projectId').equals(projectId).delete();
    } else {
      projectId = newId('prj');
    }

    const ionIdMap = new Map<string, string>();
    const ions: CustomIonRecord[] = [];
    for (const ion of file.customIons) {
      let id = ion.id;
      let projectScope: string | null = ion.scope === 'project' ? projectId : null;
      if (ion.scope === 'shared') {
        const existing = await db.customIons.get(ion.id);
        if (existing && existing.projectId === null && sameJson(existing.ion, ion.ion) && existing.overridesIonId === ion.overridesIonId) {
          continue; // the same shared ion is already here
        }
        if (existing) {
          id = newId('ion');
          projectScope = projectId;
        }
      } else {
        id = newId('ion');
      }
      ionIdMap.set(ion.id, id);
      ions.push(
        customIonRecordSchema.parse({
          id,
          schemaVersion: RECORD_SCHEMA_VERSION,
          projectId: projectScope,
          overridesIonId: ion.overridesIonId,
          ion: ion.ion,
          updatedAt: ion.updatedAt,
        }),
      );
    }

    const candidateIdMap = new Map<string, string>();
    const candidates: CandidateRecord[] = file.candidates.map((c) => {
      const id = newId('cand');
      candidateIdMap.set(c.id, id);
      return candidateRecordSchema.parse({
        ...c,
        id,
        schemaVersion: RECORD_SCHEMA_VERSION,
        projectId,
        ionId: ionIdMap.get(c.ionId) ?? c.ionId,
      });
    });
    const measurements: MeasurementRecord[] = file.measurements.map((m) =>
      measurementRecordSchema.parse({
        ...m,
        id: newId('meas'),
        schemaVersion: RECORD_SCHEMA_VERSION,
        projectId,
        candidateId: candidateIdMap.get(m.candidateId),
      }),
    );
    const project: ProjectRecord = projectRecordSchema.parse({
      id: projectId,
      schemaVersion: RECORD_SCHEMA_VERSION,
      name: file.project.name,
      createdAt,
      updatedAt: now,
      archived: false,
      isDemo: false,
      compound: file.project.compound,
      settings: file.project.settings,
    });

    await db.projects.put(project);
    if (ions.length) await db.customIons.bulkAdd(ions);
    if (candidates.length) await db.candidates.bulkAdd(candidates);
    if (measurements.length) await db.measurements.bulkAdd(measurements);
    return {
      projectId,
      name: project.name,
      candidates: candidates.length,
      measurements: measurements.length,
      customIons: ions.length,
    };
  });
}

/**
 * Import the text of a project file. The text is checked completely (size, JSON, format, version,
 * every field) before the database is opened for writing; a refused file throws
 * `ProjectFileError` and leaves the database as it was.
 */
export async function importProjectText(text: string, target: ImportMode): Promise<ImportOutcome> {
  const file = parseProjectFileText(text);
  return writeProjectFile(file, target);
}
