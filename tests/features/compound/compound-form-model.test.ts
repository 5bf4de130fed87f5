import { describe, expect, it } from 'vitest';
import { compoundFromDraft, draftFromCompound } from '@/features/compound/compound-form-model';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { EMPTY_NEW_PROJECT, newProjectFromDraft } from '@/features/projects/new-project-model';

describe('compound form model', () => {
  const draft = draftFromCompound(DEMO_COMPOUND);

  it('round-trips the stored compound', () => {
    const r = compoundFromDraft(draft, DEMO_COMPOUND);
    expect(r.ok && r.compound.formula).toBe(DEMO_COMPOUND.formula);
  });

  it('refuses a formula with an unknown element, a charged formula, and no structure at all', () => {
    const bad = compoundFromDraft({ ...draft, formula: 'C18H20Xy' }, DEMO_COMPOUND);
    expect(!bad.ok && bad.errors.formula).toMatch(/unknown element 'Xy'/);
    const charged = compoundFromDraft({ ...draft, formula: 'C18H21ClN3O+' }, DEMO_COMPOUND);
    expect(!charged.ok && charged.errors.formula).toMatch(/neutral/);
    const none = compoundFromDraft({ ...draft, formula: '', smiles: '' }, DEMO_COMPOUND);
    expect(!none.ok && none.errors.formula).toMatch(/SMILES or a molecular formula/);
  });

  it('asks for the cell volume and Z together, and refuses negative volumes', () => {
    const half = compoundFromDraft({ ...draft, cellVolumeA3: '1500' }, DEMO_COMPOUND);
    expect(!half.ok && half.errors.formulaUnitsPerCell).toMatch(/both/);
    const neg = compoundFromDraft(
      { ...draft, cellVolumeA3: '-5', formulaUnitsPerCell: '4' },
      DEMO_COMPOUND,
    );
    expect(!neg.ok && neg.errors.cellVolumeA3).toMatch(/greater than zero/);
    const ok = compoundFromDraft(
      { ...draft, cellVolumeA3: '1500', formulaUnitsPerCell: '4' },
      DEMO_COMPOUND,
    );
    expect(ok.ok && ok.compound.formulaUnitsPerCell).toBe(4);
  });

  it('refuses a drug-ion charge larger than the number of ionisable groups', () => {
    const r = compoundFromDraft({ ...draft, ionCharge: '2', pKas: '7.8' }, DEMO_COMPOUND);
    expect(!r.ok && r.errors.ionCharge).toMatch(/needs 2 pKa values/);
    const ok = compoundFromDraft({ ...draft, ionCharge: '2', pKas: '7.8, 3.1' }, DEMO_COMPOUND);
    expect(ok.ok).toBe(true);
  });

  it('S₀ origin: absent reads "not stated" and is stored as null; a stated origin is kept', () => {
    const { intrinsicSolubilityOrigin: _o, ...noOrigin } = DEMO_COMPOUND;
    const d = draftFromCompound(noOrigin);
    expect(d.intrinsicSolubilityOrigin).toBe('');
    const r = compoundFromDraft(d, noOrigin);
    expect(r.ok && r.compound.intrinsicSolubilityOrigin).toBeNull();
    const lit = compoundFromDraft({ ...d, intrinsicSolubilityOrigin: 'literature' }, noOrigin);
    expect(lit.ok && lit.compound.intrinsicSolubilityOrigin).toBe('literature');
  });

  it('a new project’s pKa origin is "not stated", not "measured"', () => {
    const r = newProjectFromDraft({
      ...EMPTY_NEW_PROJECT,
      name: 'New',
      formula: 'C10H15N',
      pKa: '9.1',
    });
    expect(r.ok && r.compound.pKas[0]!.origin).toBe('not-stated');
    expect(r.ok && draftFromCompound(r.compound).pKaOrigin).toBe('not-stated');
  });
});
