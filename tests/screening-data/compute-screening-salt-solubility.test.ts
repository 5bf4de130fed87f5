import { describe, expect, it } from 'vitest';
import { buildCustomCounterIon } from '@/chem';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import {
  projectSettingsSchema,
  type CandidateRecord,
  type CustomIonRecord,
  type ProjectRecord,
} from '@/persistence/records';

// The fictional demo compound (invented numbers) only drives the pipeline: the assertions are about
// where each salt's water solubility comes from, never its value.
const project: ProjectRecord = {
  id: 'prj_ssol',
  schemaVersion: 1,
  name: 'Salt solubility origins',
  createdAt: '2026-12-01T00:00:00.000Z',
  updatedAt: '2026-12-01T00:00:00.000Z',
  archived: false,
  isDemo: false,
  compound: DEMO_COMPOUND,
  settings: projectSettingsSchema.parse({}),
};
const inHouse = (id: string, ionSmiles: string): CustomIonRecord => ({
  id,
  schemaVersion: 1,
  projectId: null,
  overridesIonId: null,
  updatedAt: '2026-12-01T00:00:00.000Z',
  ion: {
    ...buildCustomCounterIon(
      {
        name: id,
        kind: 'anion',
        formula: 'C8H17O3S',
        charge: -1,
        ionSmiles,
        pKas: [-1.9],
        acceptabilityClass: null,
      },
      id,
    ),
  },
});
const cand = (ionId: string, order: number): CandidateRecord => ({
  id: `cand_${order}`,
  schemaVersion: 1,
  projectId: project.id,
  ionId,
  drugPerSalt: 1,
  counterIonPerSalt: 1,
  hydrateWater: 0,
  addedAt: '2026-12-01T00:00:00.000Z',
  order,
});

describe('the workbench screen gives every shortlisted salt its own water solubility', () => {
  it('bundled ions and in-house ions with a SMILES use the model; an in-house ion without one keeps the anchor and says so', async () => {
    const customIons = [
      inHouse('ion_octylsulfonate', 'CCCCCCCCS(=O)(=O)[O-]'),
      inHouse('ion_nosmiles', ''),
    ];
    const candidates = [
      cand('mesylate', 0),
      cand('ion_octylsulfonate', 1),
      cand('ion_nosmiles', 2),
    ];
    const r = await computeProjectScreening({ project, candidates, measurements: [], customIons });
    const origin = (id: string) =>
      r.screen.rows.find((x) => x.id === id)!.saltWaterSolubility!.origin;
    expect(origin('cand_0')).toBe('model');
    expect(origin('cand_1')).toBe('model');
    expect(origin('cand_2')).toBe('anchor');
    expect(r.notes.join(' ')).toMatch(/no SMILES.*anchor/);
  });
});
