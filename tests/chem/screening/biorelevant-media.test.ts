import { describe, expect, it } from 'vitest';
import {
  BIORELEVANT_MEDIA,
  biorelevantMedium,
  drugIon,
  getCounterIon,
  mediumSchema,
  screenCompound,
  type ScreeningCandidate,
  type ScreeningCompound,
} from '@/chem';

const preset = (id: string) => BIORELEVANT_MEDIA.find((m) => m.id === id)!;

describe('biorelevant media presets', () => {
  it('carry the published pH of each medium', () => {
    // Galia et al. 1998 (FaSSIF 6.5, FeSSIF 5.0); Jantratid et al. 2008 (FaSSIF-V2 6.5, FeSSIF-V2 5.8);
    // Vertzoni et al. 2005 (FaSSGF 1.6).
    expect(Object.fromEntries(BIORELEVANT_MEDIA.map((m) => [m.id, m.pH]))).toEqual({
      fassgf: 1.6,
      'fassif-v1': 6.5,
      'fessif-v1': 5.0,
      'fassif-v2': 6.5,
      'fessif-v2': 5.8,
    });
    for (const m of BIORELEVANT_MEDIA) expect(m.source, m.id).toMatch(/\d{4}/);
  });

  it('turn into a valid screening medium with the ions the workbench models (hand sums)', () => {
    const fassif = biorelevantMedium(preset('fassif-v1'));
    expect(mediumSchema.parse(fassif)).toEqual(fassif);
    expect(fassif.ions.chloride).toBeCloseTo(0.10585, 8); // NaCl 105.85 mM
    // Every phosphate form of the library sees the 28.65 mM buffer.
    for (const id of ['phosphate', 'hydrogen-phosphate', 'dihydrogen-phosphate'])
      expect(fassif.ions[id]).toBeCloseTo(0.02865, 8);
    // Sodium: NaCl 105.85 + NaOH 8.7 + NaH₂PO₄ 28.65 + taurocholate 3 = 146.2 mM.
    expect(fassif.ions.sodium).toBeCloseTo(0.1462, 8);
    // FaSSGF: chloride = NaCl 34.2 + HCl 10^−1.6 M (25.12 mM) = 59.32 mM.
    const fassgf = biorelevantMedium(preset('fassgf'));
    expect(fassgf.ions.chloride).toBeCloseTo(0.0593189, 6);
    expect(fassgf.ions.sodium).toBeCloseTo(0.03428, 8); // NaCl 34.2 + taurocholate 0.08 mM
    // FeSSIF-V2: maleate 55.02 mM; sodium 125.5 + 81.65 + 10 + 0.8 = 217.95 mM.
    const fessif2 = biorelevantMedium(preset('fessif-v2'));
    expect(fessif2.ions.maleate).toBeCloseTo(0.05502, 8);
    expect(fessif2.ions.sodium).toBeCloseTo(0.21795, 8);
  });

  it('apply the buffer anion as a common ion to salts of that counter-ion only', () => {
    const compound: ScreeningCompound = {
      name: 'test base',
      kind: 'base',
      pKas: [{ value: 8.0, origin: 'measured' }],
      ionCharge: 1,
      intrinsicSolubilityMgPerMl: 0.02,
      meltingPointC: null,
      logP: null,
      doseMg: 100,
    };
    const cand = (id: string): ScreeningCandidate => {
      const ion = getCounterIon(id)!;
      const st = ion.stoichiometries[0]!;
      return { id, counterIon: ion, stoichiometry: st, hydrateWater: 0, measurements: [] };
    };
    const r = screenCompound({
      compound,
      drugIon: drugIon({ kind: 'base', ionCharge: 1, formula: 'C17H20N2O2' }),
      candidates: [cand('maleate'), cand('mesylate')],
      settings: { media: [biorelevantMedium(preset('fassif-v2'))] },
    });
    const inV2 = (id: string) =>
      r.rows.find((x) => x.id === id)!.media.find((m) => m.id === 'preset-fassif-v2')!;
    expect(inV2('maleate').commonIonM).toBeCloseTo(0.01912, 8);
    expect(inV2('mesylate').commonIonM).toBe(0);
  });
});
