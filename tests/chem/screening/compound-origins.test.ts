import { describe, expect, it } from 'vitest';
import {
  drugIon,
  getCounterIon,
  GSE_UNCERTAINTY_LOG10,
  screenCompound,
  type ScreeningCompound,
} from '@/chem';

// Issue 16, item 5: pKa and S₀ carry an origin and an honest default. The σ values checked here are
// the documented ones: S₀ measured 0.1 decades (our assumption, shake-flask repeatability), literature
// 0.3, predicted or not stated the General Solubility Equation's σ (Jain & Yalkowsky 2001, carried as
// 0.6 in intrinsic-solubility.ts); pKa measured 0.1, predicted or not stated 0.7 (settings.ts).
const base: ScreeningCompound = {
  name: 'test base',
  kind: 'base',
  pKas: [{ value: 7.8, origin: 'measured' }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: 0.015,
  meltingPointC: null,
  logP: null,
  doseMg: 100,
};
const di = drugIon({ kind: 'base', ionCharge: 1, formula: 'C18H20ClN3O' });
const ion = getCounterIon('mesylate')!;
const screen = (compound: ScreeningCompound) =>
  screenCompound({
    compound,
    drugIon: di,
    candidates: [{ id: 'm', counterIon: ion, stoichiometry: ion.stoichiometries[0]! }],
  });

describe('origins of S₀ and pKa', () => {
  it('an S₀ without an origin is "not stated" with the predicted σ — never measured', () => {
    const r = screen(base);
    expect(r.freeForm.intrinsicOrigin).toBe('not-stated');
    expect(r.freeForm.log10IntrinsicM.uncertainty).toBe(GSE_UNCERTAINTY_LOG10);
    expect(r.freeForm.log10IntrinsicM.method).not.toBe('measured');
  });

  it('a stated origin sets the σ: measured 0.1, literature 0.3 decades', () => {
    const m = screen({ ...base, intrinsicSolubilityOrigin: 'measured' });
    expect(m.freeForm.intrinsicOrigin).toBe('measured');
    expect(m.freeForm.log10IntrinsicM.uncertainty).toBe(0.1);
    const l = screen({ ...base, intrinsicSolubilityOrigin: 'literature' });
    expect(l.freeForm.log10IntrinsicM.uncertainty).toBe(0.3);
  });

  it('a pKa whose origin is not stated is screened with the predicted σ (0.7), not the measured 0.1', () => {
    expect(screen(base).robustnessShared.drugPkaSigma).toBe(0.1);
    const r = screen({ ...base, pKas: [{ value: 7.8, origin: 'not-stated' }] });
    expect(r.robustnessShared.drugPkaSigma).toBe(0.7);
  });
});
