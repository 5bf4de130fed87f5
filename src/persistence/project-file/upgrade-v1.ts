import { z } from 'zod';
import { invalidFileError } from './errors';
import { PROJECT_FILE_FORMAT } from './format';
import { isoDate } from './schema';

/**
 * Version 1, the first layout (written by development builds before custom ions were exported):
 * `exportedAt` instead of `createdAt`, no `app` block, the compound and settings beside the project
 * name at the top level, settings without `extra`, candidates with a single `ratio` string such as
 * "2:1" (drug:counter-ion) and measurements without pH/temperature/medium.
 */
const v1Schema = z.object({
  format: z.literal(PROJECT_FILE_FORMAT),
  version: z.literal(1),
  exportedAt: isoDate,
  name: z.string(),
  compound: z.unknown(),
  settings: z.object({
    gastricChlorideM: z.number(),
    microenvironmentPh: z.number(),
    temperatureC: z.number(),
  }),
  candidates: z.array(
    z.object({
      id: z.string(),
      ionId: z.string(),
      ratio: z.string().regex(/^\d+:\d+$/, 'a ratio such as "1:1" or "2:1"'),
      hydrateWater: z.number().optional(),
    }),
  ),
  measurements: z.array(
    z.object({
      id: z.string(),
      candidateId: z.string(),
      kind: z.string(),
      value: z.number().nullable(),
      unit: z.string(),
      text: z.string().optional(),
    }),
  ),
});

/** Upgrade a version-1 object to the version-2 shape (then upgraded to version 3 like any version-2 file). */
export function upgradeV1(raw: unknown): unknown {
  const parsed = v1Schema.safeParse(raw);
  if (!parsed.success) throw invalidFileError(parsed.error, 'This version-1 project file');
  const v1 = parsed.data;
  return {
    format: PROJECT_FILE_FORMAT,
    version: 2,
    app: { name: 'Saltsmith (format-1 file)', version: 'version not recorded' },
    createdAt: v1.exportedAt,
    project: {
      name: v1.name,
      createdAt: v1.exportedAt,
      updatedAt: v1.exportedAt,
      archived: false,
      isDemo: false,
      compound: v1.compound,
      settings: { ...v1.settings, extra: {} },
    },
    candidates: v1.candidates.map((c, order) => {
      const [drug, counter] = c.ratio.split(':').map(Number);
      return {
        id: c.id,
        ionId: c.ionId,
        drugPerSalt: drug,
        counterIonPerSalt: counter,
        hydrateWater: c.hydrateWater ?? 0,
        addedAt: v1.exportedAt,
        order,
      };
    }),
    measurements: v1.measurements.map((m) => ({
      id: m.id,
      candidateId: m.candidateId,
      kind: m.kind,
      value: m.value,
      unit: m.unit,
      ph: null,
      temperatureK: null,
      medium: '',
      text: m.text ?? '',
      recordedAt: v1.exportedAt,
    })),
    customIons: [],
  };
}
