import { COUNTER_IONS } from '@/chem';
import { getDb } from './db';
import { newId, nowIso } from './ids';
import { nextStamp } from './field-stamps';
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
  screenPlanRecordSchema,
} from './records';
import { renameScreenPlanIons } from './screen-plan-record';
import { buildProjectFile, serializeProjectFile, type ProjectBundle } from './project-file/build';
import { parseProjectFileText } from './project-file/restore';
import { checkFileStructures } from './project-file/file-rules';
import type { ProjectFile } from './project-file/schema';
import { importedProjectName } from './imported-name';

/** Read everything a project file holds for one project. */
export async function loadProjectBundle(projectId: string): Promise<ProjectBundle> {
  const db = getDb();
  return db.transaction(
    'r',
    [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
    async () => {
      const project = await db.projects.get(projectId);
      if (!project) throw new Error(`No project with id ${projectId}`);
      const candidates = await db.candidates.where('projectId').equals(projectId).toArray();
      const measurements = await db.measurements.where('projectId').equals(projectId).toArray();
      const usedIonIds = new Set(candidates.map((c) => c.ionId));
      const customIons = (await db.customIons.toArray()).filter(
        (ion) =>
          ion.projectId === projectId ||
          (ion.projectId === null &&
            (usedIonIds.has(ion.id) ||
              (ion.overridesIonId !== null && usedIonIds.has(ion.overridesIonId)))),
      );
      const screenPlans = await db.screenPlans.where('projectId').equals(projectId).toArray();
      return { project, candidates, measurements, customIons, screenPlans };
    },
  );
}

/** Export a project as the text of a project file (see project-file/). */
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

/** Library ids of the bundled counter-ions: no imported record may take one. */
const BUNDLED_IDS = new Set(COUNTER_IONS.map((i) => i.id));

/**
 * Decide where each custom ion of a file goes (inside the import's transaction). An imported ion can
 * never shadow a bundled ion or another project's ion:
 * - an edit (`overridesIonId`) of a bundled ion becomes an edit of the imported project only, under a
 *   fresh record id (a shared edit, which applies to no project, is kept as it was when its id is
 *   free or holds the same edit); an edit of anything that is not a bundled ion is dropped;
 * - a shared in-house ion keeps its id only when that id is not a bundled id and is free, or already
 *   holds the very same shared ion (then it is not duplicated);
 * - every other in-house ion (project-scoped, or whose id is taken or bundled) becomes an ion of the
 *   imported project under a fresh id, its library id (`ion.id`) rewritten to match.
 * `ionIdMap` maps the file's ion ids to the ids they got, for the candidates that use them.
 */
async function placeImportedIons(
  fileIons: ProjectFile['customIons'],
  projectId: string,
): Promise<{ ions: CustomIonRecord[]; ionIdMap: Map<string, string> }> {
  const db = getDb();
  const ionIdMap = new Map<string, string>();
  const ions: CustomIonRecord[] = [];
  for (const ion of fileIons) {
    if (ion.overridesIonId !== null) {
      if (!BUNDLED_IDS.has(ion.overridesIonId)) continue;
      let editId = newId('ionedit');
      let editScope: string | null = projectId;
      if (ion.scope === 'shared') {
        // A shared edit applies to no project (only per-project edits do); keep it as it was.
        const existing = await db.customIons.get(ion.id);
        if (
          existing &&
          existing.projectId === null &&
          existing.overridesIonId === ion.overridesIonId &&
          sameJson(existing.ion, ion.ion)
        ) {
          continue;
        }
        if (!existing && !BUNDLED_IDS.has(ion.id)) {
          editId = ion.id;
          editScope = null;
        }
      }
      ions.push(
        customIonRecordSchema.parse({
          id: editId,
          schemaVersion: RECORD_SCHEMA_VERSION,
          projectId: editScope,
          overridesIonId: ion.overridesIonId,
          ion: ion.ion,
          updatedAt: ion.updatedAt,
        }),
      );
      continue;
    }
    let id = ion.id;
    let projectScope: string | null = projectId;
    if (ion.scope === 'shared' && !BUNDLED_IDS.has(ion.id)) {
      const existing = await db.customIons.get(ion.id);
      if (
        existing &&
        existing.projectId === null &&
        existing.overridesIonId === null &&
        sameJson(existing.ion, ion.ion)
      ) {
        ionIdMap.set(ion.id, ion.id);
        continue; // the same shared ion is already here
      }
      if (!existing) projectScope = null;
      else id = newId('inhouse');
    } else {
      id = newId('inhouse');
    }
    ionIdMap.set(ion.id, id);
    ions.push(
      customIonRecordSchema.parse({
        id,
        schemaVersion: RECORD_SCHEMA_VERSION,
        projectId: projectScope,
        overridesIonId: null,
        ion: { ...ion.ion, id },
        updatedAt: ion.updatedAt,
      }),
    );
  }
  return { ions, ionIdMap };
}

/** One plan per project: the file's first plan, its in-house ions renamed like the shortlist's. */
async function addImportedPlan(
  file: ProjectFile,
  projectId: string,
  ionIdMap: ReadonlyMap<string, string>,
): Promise<void> {
  const plan = file.screenPlans[0];
  if (!plan) return;
  await getDb().screenPlans.add(
    screenPlanRecordSchema.parse({
      ...renameScreenPlanIons(
        { ...plan, projectId, schemaVersion: RECORD_SCHEMA_VERSION },
        (ionId) => ionIdMap.get(ionId) ?? ionId,
      ),
      id: newId('plan'),
    }),
  );
}

/**
 * Where the file lands: a fresh project id, or — replacing — the existing project's id and creation
 * date, with everything it held removed (inside the caller's transaction, so a failure undoes it).
 */
async function clearTarget(
  file: ProjectFile,
  target: ImportMode,
): Promise<{ projectId: string; createdAt: string }> {
  if (target.mode === 'new') return { projectId: newId('prj'), createdAt: file.project.createdAt };
  const db = getDb();
  const existing = await db.projects.get(target.projectId);
  if (!existing) throw new Error('The project to replace no longer exists; nothing was imported.');
  const projectId = existing.id;
  await db.measurements.where('projectId').equals(projectId).delete();
  await db.candidates.where('projectId').equals(projectId).delete();
  await db.customIons.where('projectId').equals(projectId).delete();
  await db.screenPlans.where('projectId').equals(projectId).delete();
  return { projectId, createdAt: existing.createdAt };
}

/** The file's shortlist and bench data under fresh ids, each measurement kept with its candidate. */
function renumberedRecords(
  file: ProjectFile,
  projectId: string,
  ionIdMap: ReadonlyMap<string, string>,
): { candidates: CandidateRecord[]; measurements: MeasurementRecord[] } {
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
  return { candidates, measurements };
}

/** The project record: a name no other project has ("… (imported)"), stamped as written now. */
async function importedProjectRecord(
  file: ProjectFile,
  projectId: string,
  createdAt: string,
): Promise<ProjectRecord> {
  const otherNames = (await getDb().projects.toArray())
    .filter((p) => p.id !== projectId)
    .map((p) => p.name);
  return projectRecordSchema.parse({
    id: projectId,
    schemaVersion: RECORD_SCHEMA_VERSION,
    name: importedProjectName(file.project.name, otherNames),
    createdAt,
    updatedAt: nowIso(),
    archived: false,
    isDemo: false,
    compound: file.project.compound,
    settings: file.project.settings,
    // Imported now: a write kept aside from before (a replay) is older than every field.
    stampFloor: nextStamp(),
  });
}

/**
 * Write a validated project file into the database in ONE transaction: either every record lands or
 * none does. Candidate, measurement and project-scoped ion ids are fresh, so a file can be imported
 * beside the project it came from; custom ions are placed by {@link placeImportedIons}.
 */
export async function writeProjectFile(
  file: ProjectFile,
  target: ImportMode,
): Promise<ImportOutcome> {
  const db = getDb();
  return db.transaction(
    'rw',
    [db.projects, db.candidates, db.measurements, db.customIons, db.screenPlans],
    async () => {
      const { projectId, createdAt } = await clearTarget(file, target);
      const { ions, ionIdMap } = await placeImportedIons(file.customIons, projectId);
      const { candidates, measurements } = renumberedRecords(file, projectId, ionIdMap);
      const project = await importedProjectRecord(file, projectId, createdAt);
      await db.projects.put(project);
      if (ions.length) await db.customIons.bulkAdd(ions);
      if (candidates.length) await db.candidates.bulkAdd(candidates);
      if (measurements.length) await db.measurements.bulkAdd(measurements);
      await addImportedPlan(file, projectId, ionIdMap);
      return {
        projectId,
        name: project.name,
        candidates: candidates.length,
        measurements: measurements.length,
        customIons: ions.length,
      };
    },
  );
}

/**
 * Import the text of a project file. The text is checked completely (size, JSON, format, version,
 * every field) before the database is opened for writing; a refused file throws
 * `ProjectFileError` and leaves the database as it was.
 */
export async function importProjectText(text: string, target: ImportMode): Promise<ImportOutcome> {
  const file = parseProjectFileText(text);
  await checkFileStructures(file);
  return writeProjectFile(file, target);
}
