import { beforeEach, describe, expect, it } from 'vitest';
import { COUNTER_IONS, utf8ByteLength } from '@/chem';
import { getDb } from '@/persistence/db';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { exportProjectText, writeProjectFile } from '@/persistence/import-project';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { PROJECT_FILE_MAX_BYTES, PROJECT_LIMITS } from '@/persistence/project-file/format';
import { parseProjectFile } from '@/persistence/project-file/restore';
import { projectsRepo } from '@/persistence/projects-repo';
import { RECORD_SCHEMA_VERSION } from '@/persistence/records';
import { resetDbForTests } from '../support/db';

beforeEach(async () => {
  await resetDbForTests();
});

/** Fill a project to the count limits: in-house ions, a candidate for each, measurements with `note`. */
async function fillProject(projectId: string, note: string): Promise<void> {
  const db = getDb();
  const model = COUNTER_IONS.find((i) => i.id === 'mesylate')!;
  const ions = Array.from({ length: PROJECT_LIMITS.customIons }, (_, i) => ({
    id: `inhouse_${i}`,
    schemaVersion: RECORD_SCHEMA_VERSION,
    projectId,
    overridesIonId: null,
    ion: { ...model, id: `inhouse_${i}`, name: `In-house ${i}` } as Record<string, unknown>,
    updatedAt: '2026-12-03T07:00:00.000Z',
  }));
  const candidates = Array.from({ length: PROJECT_LIMITS.candidates }, (_, i) => ({
    id: `cand_${i}`,
    schemaVersion: RECORD_SCHEMA_VERSION,
    projectId,
    ionId: `inhouse_${i}`,
    drugPerSalt: 1,
    counterIonPerSalt: 1,
    hydrateWater: 0,
    addedAt: '2026-12-03T07:00:00.000Z',
    order: i,
  }));
  const measurements = Array.from({ length: PROJECT_LIMITS.measurements }, (_, i) => ({
    id: `meas_${i}`,
    schemaVersion: RECORD_SCHEMA_VERSION,
    projectId,
    candidateId: `cand_${i % PROJECT_LIMITS.candidates}`,
    kind: 'note' as const,
    value: null,
    unit: '',
    ph: null,
    temperatureK: null,
    medium: '',
    text: note,
    recordedAt: '2026-12-03T07:00:00.000Z',
  }));
  await db.customIons.bulkPut(ions);
  await db.candidates.bulkPut(candidates);
  await db.measurements.bulkPut(measurements);
}

describe('the largest project Saltsmith holds exports to a file it imports back (issue 18)', () => {
  it('at every count limit and the export-size limit: the file is within the import cap and comes back whole', async () => {
    const p = await projectsRepo.create('Largest', DEMO_COMPOUND);
    await fillProject(p.id, 'x');
    // Notes as long as the size limit allows, less 64 KiB of slack for the envelope.
    const base = utf8ByteLength(await exportProjectText(p.id));
    const perNote = Math.floor((PROJECT_LIMITS.exportBytes - base) / PROJECT_LIMITS.measurements);
    await fillProject(p.id, 'ü'.repeat(Math.floor(perNote / 2))); // 2 UTF-8 bytes each
    const text = await exportProjectText(p.id);
    const bytes = new TextEncoder().encode(text);
    expect(bytes.length).toBeLessThanOrEqual(PROJECT_LIMITS.exportBytes);
    expect(bytes.length).toBeLessThanOrEqual(PROJECT_FILE_MAX_BYTES);
    expect(bytes.length).toBeGreaterThan(
      PROJECT_LIMITS.exportBytes - 2 * PROJECT_LIMITS.measurements,
    );

    const file = parseProjectFile(bytes);
    const outcome = await writeProjectFile(file, { mode: 'new' });
    expect(outcome).toMatchObject({
      candidates: PROJECT_LIMITS.candidates,
      measurements: PROJECT_LIMITS.measurements,
      customIons: PROJECT_LIMITS.customIons,
    });

    // One more measurement is refused where it is made, with the limit named.
    await expect(
      measurementsRepo.add({
        projectId: p.id,
        candidateId: 'cand_0',
        kind: 'note',
        value: null,
        unit: '',
        ph: null,
        temperatureK: null,
        medium: '',
        text: 'one too many',
      }),
    ).rejects.toThrow(/20,000 measurements, the most one project can hold/);
  }, 240_000);

  it('refuses a measurement that would make the export larger than the limit', async () => {
    const p = await projectsRepo.create('Near the limit', DEMO_COMPOUND);
    // Under the count limit by one, over the size limit: notes of 1,700 bytes × 19,999 ≈ 34 MB.
    await fillProject(p.id, 'y'.repeat(1700));
    await getDb().measurements.delete('meas_0');
    await expect(
      measurementsRepo.add({
        projectId: p.id,
        candidateId: 'cand_0',
        kind: 'note',
        value: null,
        unit: '',
        ph: null,
        temperatureK: null,
        medium: '',
        text: 'z',
      }),
    ).rejects.toThrow(/would grow past 31 MB, the most one project can hold/);
  }, 240_000);
});
