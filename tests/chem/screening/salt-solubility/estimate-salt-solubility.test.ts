import { describe, expect, it } from 'vitest';
import {
  estimateSaltWaterSolubility,
  LIBRARY_COUNTER_ION_DESCRIPTORS,
  SALT_SOLUBILITY_CV_RMSE_LOG10,
  SALT_SOLUBILITY_MODEL,
  type SaltSolubilityInput,
} from '@/chem';
import { idealSolubility } from '@/chem/screening/salt-solubility/fusion';

// A drug of the kind the model meets: a weak base with S₀ 10 µM (log₁₀ S₀ = −5) and log P 3. These
// are inputs, not expected values; the assertions are about how the estimate behaves.
const base = (
  ionId: string,
  charge = -1,
  extra: Partial<SaltSolubilityInput> = {},
): SaltSolubilityInput => ({
  drug: { kind: 'base', log10IntrinsicM: -5, logP: 3 },
  counterIon: { ...LIBRARY_COUNTER_ION_DESCRIPTORS[ionId]!, charge },
  drugPerSalt: 1,
  counterIonPerSalt: 1,
  ...extra,
});

describe('the salt’s own water solubility estimate', () => {
  it('carries the cross-validated error as its 1σ, widened by an uncertain S₀', () => {
    const e = estimateSaltWaterSolubility(base('mesylate'));
    expect(e.origin).toBe('model');
    expect(e.log10DrugM.uncertainty).toBeCloseTo(SALT_SOLUBILITY_CV_RMSE_LOG10, 12);
    const wide = estimateSaltWaterSolubility(base('mesylate'), { log10IntrinsicSigma: 0.6 });
    expect(wide.log10DrugM.uncertainty).toBeGreaterThan(e.log10DrugM.uncertainty);
  });

  it('tells counter-ions apart: different bundled ions give different estimates for one drug', () => {
    const ids = ['chloride', 'mesylate', 'tosylate', 'napsylate', 'maleate', 'citrate'];
    const values = ids.map((id) => estimateSaltWaterSolubility(base(id)).log10DrugM.value);
    expect(Math.max(...values) - Math.min(...values)).toBeGreaterThan(0.3);
  });

  it('names as drivers exactly the counter-ion terms that move the estimate by ≥ 0.15 decades', () => {
    for (const id of Object.keys(LIBRARY_COUNTER_ION_DESCRIPTORS)) {
      const e = estimateSaltWaterSolubility(base(id));
      for (const d of e.drivers) expect(Math.abs(d.decades)).toBeGreaterThanOrEqual(0.15);
      const sorted = [...e.drivers].sort((a, b) => Math.abs(b.decades) - Math.abs(a.decades));
      expect(e.drivers).toEqual(sorted);
    }
  });

  it('is never NaN over the whole bundled library, acids and bases alike', () => {
    for (const [id, d] of Object.entries(LIBRARY_COUNTER_ION_DESCRIPTORS)) {
      for (const kind of ['base', 'acid'] as const) {
        const e = estimateSaltWaterSolubility({
          ...base(id),
          drug: { kind, log10IntrinsicM: -4, logP: 2 },
          counterIon: { ...d, charge: kind === 'base' ? -1 : 1 },
        });
        expect(Number.isFinite(e.log10DrugM.value), `${id} ${kind}`).toBe(true);
      }
    }
  });
});

describe('bench fusion data sharpen the estimate (Schröder–van Laar crystal term)', () => {
  it('a higher-melting salt is estimated less soluble by the ideal-solubility difference, slope 1', () => {
    const low = estimateSaltWaterSolubility(
      base('mesylate', -1, { meltingPointK: 420, fusionEnthalpyKJPerMol: 30 }),
    );
    const high = estimateSaltWaterSolubility(
      base('mesylate', -1, { meltingPointK: 500, fusionEnthalpyKJPerMol: 30 }),
    );
    expect(low.origin).toBe('model+fusion');
    const xLow = idealSolubility({
      meltingPointK: 420,
      fusionEnthalpyKJPerMol: 30,
      temperatureK: 298.15,
    });
    const xHigh = idealSolubility({
      meltingPointK: 500,
      fusionEnthalpyKJPerMol: 30,
      temperatureK: 298.15,
    });
    const expected = (xHigh.lnMoleFraction - xLow.lnMoleFraction) / Math.LN10;
    expect(high.log10DrugM.value - low.log10DrugM.value).toBeCloseTo(expected, 9);
    expect(high.drivers.some((d) => d.id === 'high-melting-salt')).toBe(true);
  });

  it('says which path it took: measured ΔH_fus, or Walden’s rule when only the melting point is known', () => {
    const dsc = estimateSaltWaterSolubility(
      base('mesylate', -1, { meltingPointK: 470, fusionEnthalpyKJPerMol: 35 }),
    );
    expect(dsc.log10DrugM.notes!.join(' ')).toMatch(/ΔH_fus 35 kJ\/mol \(measured\)/);
    const mpOnly = estimateSaltWaterSolubility(base('mesylate', -1, { meltingPointK: 470 }));
    expect(mpOnly.log10DrugM.notes!.join(' ')).toMatch(/Walden/);
  });

  it('the shipped model is the one the declared rule chose', () => {
    expect(['pooled', 'pooled+thermo', 'within-series', 'within-series+thermo']).toContain(
      SALT_SOLUBILITY_MODEL.id,
    );
  });
});
