import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import fc from 'fast-check';
import { inHouseIonPayload } from '../../support/in-house-ion';
import {
  PROJECT_FILE_FORMAT,
  PROJECT_FILE_MAX_BYTES,
  PROJECT_FILE_VERSION,
} from '@/persistence/project-file/format';
import { ProjectFileError } from '@/persistence/project-file/errors';
import {
  buildProjectFile,
  serializeProjectFile,
  type ProjectBundle,
} from '@/persistence/project-file/build';
import { looksTruncated } from '@/persistence/project-file/truncation';
import { parseProjectFileText, restoreProjectFile } from '@/persistence/project-file/restore';
import { projectFileName } from '@/persistence/project-file/file-name';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { projectSettingsSchema } from '@/persistence/records';

/** Fixtures under fixtures/files (vitest runs from the repository root). */
const fixture = (name: string) =>
  readFileSync(resolve(process.cwd(), 'fixtures/files', name), 'utf8');

function refusal(text: string): ProjectFileError {
  try {
    parseProjectFileText(text);
  } catch (err) {
    if (err instanceof ProjectFileError) return err;
    throw err;
  }
  throw new Error('expected the file to be refused');
}

/** A bundle shaped like the database's records (the demo compound is fictional; numbers invented). */
function bundle(): ProjectBundle {
  return {
    project: {
      id: 'prj_1',
      schemaVersion: 1,
      name: 'Screen A',
      createdAt: '2026-11-01T10:00:00.000Z',
      updatedAt: '2026-11-02T10:00:00.000Z',
      archived: false,
      isDemo: false,
      compound: DEMO_COMPOUND,
      settings: projectSettingsSchema.parse({ extra: { weights: { solubility: 2 } } }),
    },
    candidates: [
      {
        id: 'cand_b',
        schemaVersion: 1,
        projectId: 'prj_1',
        ionId: 'sulfate',
        drugPerSalt: 2,
        counterIonPerSalt: 1,
        hydrateWater: 0,
        addedAt: '2026-11-01T10:01:00.000Z',
        order: 1,
      },
      {
        id: 'cand_a',
        schemaVersion: 1,
        projectId: 'prj_1',
        ionId: 'ion_x',
        drugPerSalt: 1,
        counterIonPerSalt: 1,
        hydrateWater: 2,
        addedAt: '2026-11-01T10:00:30.000Z',
        order: 0,
      },
    ],
    measurements: [
      {
        id: 'meas_1',
        schemaVersion: 1,
        projectId: 'prj_1',
        candidateId: 'cand_a',
        kind: 'solubility',
        value: 1.2,
        unit: 'mg/mL',
        ph: 1.2,
        temperatureK: 310.15,
        medium: 'SGF',
        text: '',
        recordedAt: '2026-11-03T00:00:00.000Z',
      },
    ],
    customIons: [
      {
        id: 'ion_x',
        schemaVersion: 1,
        projectId: 'prj_1',
        overridesIonId: null,
        ion: inHouseIonPayload('ion_x'),
        updatedAt: '2026-11-01T00:00:00.000Z',
      },
    ],
  };
}

describe('project file format (our own versioned JSON)', () => {
  it('writes the format tag, version, app and date, and reads its own output back unchanged', () => {
    const file = buildProjectFile(bundle(), '2026-12-01T12:00:00.000Z');
    expect(file.format).toBe(PROJECT_FILE_FORMAT);
    expect(file.version).toBe(PROJECT_FILE_VERSION);
    expect(file.app.name).toBe('Saltsmith');
    expect(file.createdAt).toBe('2026-12-01T12:00:00.000Z');
    // Candidates are written in shortlist order, whatever order the database returned.
    expect(file.candidates.map((c) => c.id)).toEqual(['cand_a', 'cand_b']);
    expect(file.customIons[0]?.scope).toBe('project');
    const back = parseProjectFileText(serializeProjectFile(file));
    expect(back).toStrictEqual(file);
  });

  it('reads a version-1 file through the upgrade path', () => {
    const file = parseProjectFileText(fixture('project-v1.saltsmith.json'));
    expect(file.version).toBe(PROJECT_FILE_VERSION);
    expect(file.project.name).toBe('Demorazine screen (version-1 file)');
    expect(file.createdAt).toBe('2026-11-20T09:30:00.000Z');
    expect(file.project.settings).toEqual({
      gastricChlorideM: 0.12,
      microenvironmentPh: 6.5,
      temperatureC: 37,
      extra: {},
    });
    expect(
      file.candidates.map((c) => [
        c.ionId,
        c.drugPerSalt,
        c.counterIonPerSalt,
        c.hydrateWater,
        c.order,
      ]),
    ).toEqual([
      ['chloride', 1, 1, 0, 0],
      ['sulfate', 2, 1, 1, 1],
      ['mesylate', 1, 1, 0, 2],
    ]);
    expect(file.measurements[0]).toMatchObject({
      candidateId: 'c-1',
      kind: 'solubility',
      value: 1.8,
      ph: null,
      medium: '',
    });
    expect(file.customIons).toEqual([]);
  });

  it('refuses a newer version and says to update', () => {
    const e = refusal(fixture('project-newer-version.saltsmith.json'));
    expect(e.code).toBe('newer-version');
    expect(e.message).toMatch(/version 99/);
    expect(e.message).toMatch(/newer Saltsmith/);
  });

  it('refuses a truncated file as truncated, not merely "not JSON"', () => {
    const e = refusal(fixture('project-truncated.saltsmith.json'));
    expect(e.code).toBe('truncated');
    expect(e.message).toMatch(/cut off/);
  });

  it('refuses failed validation and names the fields', () => {
    const e = refusal(fixture('project-invalid.saltsmith.json'));
    expect(e.code).toBe('invalid');
    expect(e.details.some((d) => d.startsWith('project.compound.pKas.0.value'))).toBe(true);
    expect(
      e.details.some((d) => d.startsWith('measurements.0.candidateId') && d.includes('c-404')),
    ).toBe(true);
  });

  it('refuses text that is not JSON, JSON of another format, an empty file and a huge file', () => {
    expect(refusal(fixture('not-a-project.txt')).code).toBe('not-json');
    expect(refusal(fixture('other-format.json')).code).toBe('not-a-project-file');
    expect(refusal('[1,2,3]').code).toBe('not-a-project-file');
    expect(refusal('   ').code).toBe('empty');
    const huge = `{"format":"saltsmith-project","pad":"${'x'.repeat(PROJECT_FILE_MAX_BYTES)}"}`;
    expect(refusal(huge).code).toBe('too-large');
  });

  it('refuses a version that is not a positive integer', () => {
    expect(() => restoreProjectFile({ format: PROJECT_FILE_FORMAT, version: '2' })).toThrow(
      /no valid "version"/,
    );
    expect(() => restoreProjectFile({ format: PROJECT_FILE_FORMAT, version: 1.5 })).toThrow(
      ProjectFileError,
    );
  });

  it('refuses duplicate candidate ids', () => {
    const file = buildProjectFile(bundle(), '2026-12-01T12:00:00.000Z');
    const dup = { ...file, candidates: [file.candidates[0], file.candidates[0]] };
    expect(() => restoreProjectFile(dup)).toThrow(/duplicate candidate id/);
  });

  it('tells truncated JSON from complete JSON for any JSON value cut anywhere (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.nat(), (value, cut) => {
        const text = JSON.stringify({ v: value });
        expect(looksTruncated(text)).toBe(false);
        const at = 1 + (cut % (text.length - 1)); // a strict prefix, at least "{"
        const prefix = text.slice(0, at);
        // A strict prefix of an object is never complete JSON: either it is unbalanced (truncated)
        // or JSON.parse rejects it.
        let parses = true;
        try {
          JSON.parse(prefix);
        } catch {
          parses = false;
        }
        expect(parses).toBe(false);
        expect(looksTruncated(prefix)).toBe(true);
      }),
    );
  });

  it('makes a safe download name', () => {
    expect(projectFileName('Demorazine / HCl: "trial" 3', '2026-12-01T12:00:00Z')).toBe(
      'Demorazine-HCl-trial-3-2026-12-01.saltsmith.json',
    );
    expect(projectFileName('…', '2026-12-01T12:00:00Z')).toBe('project-2026-12-01.saltsmith.json');
  });
});
