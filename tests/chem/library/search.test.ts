import { describe, expect, it } from 'vitest';
import {
  COUNTER_IONS,
  applyCounterIonEdit,
  bestDeltaPka,
  buildCustomCounterIon,
  counterIonDeltaPka,
  getCounterIon,
  mergeLibrary,
  searchCounterIons,
} from '@/chem/library';

/** A weak base with pKa(BH⁺) 9.0 and one with 4.0 (input values for the arithmetic, not expected values). */
const base9 = { kind: 'base' as const, pKas: [{ value: 9.0 }], ionCharge: 1 };
const acid4 = { kind: 'acid' as const, pKas: [{ value: 4.0 }], ionCharge: -1 };

describe('search', () => {
  it('finds by name, synonym and formula, exact matches first', () => {
    expect(searchCounterIons(COUNTER_IONS, 'mesylate')[0]!.id).toBe('mesylate');
    expect(searchCounterIons(COUNTER_IONS, 'methanesulfonic acid')[0]!.id).toBe('mesylate');
    expect(searchCounterIons(COUNTER_IONS, 'hydrochloride')[0]!.id).toBe('chloride');
    expect(searchCounterIons(COUNTER_IONS, 'CH3O3S').map((i) => i.id)).toEqual(['mesylate']);
    expect(searchCounterIons(COUNTER_IONS, 'trometamol').map((i) => i.id)).toEqual([
      'tromethamine',
    ]);
    expect(searchCounterIons(COUNTER_IONS, 'no-such-ion-xyz')).toEqual([]);
  });

  it('filters by kind, class, charge and stoichiometry', () => {
    const cations = searchCounterIons(COUNTER_IONS, '', { kind: 'cation' });
    expect(cations.length).toBeGreaterThan(10);
    expect(cations.every((i) => i.kind === 'cation')).toBe(true);
    const class1 = searchCounterIons(COUNTER_IONS, '', { classes: [1] });
    expect(class1.every((i) => i.acceptabilityClass === 1)).toBe(true);
    const dianions = searchCounterIons(COUNTER_IONS, '', { charge: -2 }).map((i) => i.id);
    expect(dianions).toEqual(
      expect.arrayContaining(['sulfate', 'maleate', 'fumarate', 'hydrogen-phosphate']),
    );
    expect(dianions).not.toContain('chloride');
    const hemi = searchCounterIons(COUNTER_IONS, '', { stoichiometry: '2:1', kind: 'anion' }).map(
      (i) => i.id,
    );
    expect(hemi).toContain('sulfate');
    expect(hemi).not.toContain('mesylate');
  });

  it('filters by ΔpKa against the compound and drops ions of the wrong kind', () => {
    const hits = searchCounterIons(COUNTER_IONS, '', {
      partner: base9,
      minDeltaPka: 5,
      pairedOnly: true,
    });
    expect(hits.every((i) => i.kind === 'anion')).toBe(true);
    expect(hits.map((i) => i.id)).toContain('chloride');
    expect(hits.map((i) => i.id)).not.toContain('acetate'); // 9.0 − 4.76 < 5
  });
});

describe('ΔpKa = pKa(protonated base) − pKa(acid) (Stahl & Wermuth 2002)', () => {
  it('uses the limiting proton of each stoichiometry', () => {
    const maleate = getCounterIon('maleate')!;
    // hydrogen maleate 1:1 uses maleic acid pKa1 1.93, the 2:1 salt its pKa2 6.58 (aqion table).
    expect(counterIonDeltaPka(base9, maleate, maleate.stoichiometries[0])!.deltaPka).toBeCloseTo(
      9.0 - 1.93,
      6,
    );
    expect(counterIonDeltaPka(base9, maleate, maleate.stoichiometries[1])!.deltaPka).toBeCloseTo(
      9.0 - 6.58,
      6,
    );
    expect(bestDeltaPka(base9, maleate)!.stoichiometry.label).toMatch(/1:1/);
  });

  it('for an acidic drug uses the conjugate acid of the counter-base', () => {
    const tris = getCounterIon('tromethamine')!;
    expect(counterIonDeltaPka(acid4, tris)!.deltaPka).toBeCloseTo(8.07 - 4.0, 6);
    expect(counterIonDeltaPka(acid4, getCounterIon('chloride')!)).toBeNull();
    expect(counterIonDeltaPka(base9, tris)).toBeNull();
  });

  it('for a dibasic drug (charge +2) uses the weaker basic site', () => {
    const dibasic = { kind: 'base' as const, pKas: [{ value: 9.0 }, { value: 5.0 }], ionCharge: 2 };
    const sulfate = getCounterIon('sulfate')!;
    expect(counterIonDeltaPka(dibasic, sulfate, sulfate.stoichiometries[1])!.drugPka).toBe(5.0);
  });

  it('returns null where no pKa is sourced rather than inventing one', () => {
    expect(counterIonDeltaPka(acid4, getCounterIon('benzathine')!)).toBeNull();
  });
});

describe('in-house ions and per-project edits', () => {
  it('builds an in-house ion, computing the molar mass from the formula', () => {
    const ion = buildCustomCounterIon(
      {
        name: 'Lab sulfonate',
        kind: 'anion',
        formula: 'C7H7O3S',
        charge: -1,
        pKas: [-1.3],
        acceptabilityClass: null,
      },
      'inhouse-1',
    );
    // Same formula as tosylate: same mass (IUPAC 2021 weights), parent acid gains one H.
    expect(ion.molarMassGPerMol).toBeCloseTo(getCounterIon('tosylate')!.molarMassGPerMol, 6);
    expect(ion.parent.formula).toBe('C7H8O3S');
    expect(ion.stoichiometries[0]).toMatchObject({
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      ionCharge: -1,
      pKaIndex: 0,
    });
  });

  it('rejects impossible input with the field named', () => {
    expect(() =>
      buildCustomCounterIon(
        {
          name: 'X',
          kind: 'anion',
          formula: 'C2H3O2',
          charge: 1,
          pKas: [],
          acceptabilityClass: null,
        },
        'x',
      ),
    ).toThrow(/charge/);
    expect(() =>
      buildCustomCounterIon(
        {
          name: 'X',
          kind: 'anion',
          formula: 'C2Xq3',
          charge: -1,
          pKas: [],
          acceptabilityClass: null,
        },
        'x',
      ),
    ).toThrow(/formula: unknown element 'Xq'/);
    expect(() =>
      buildCustomCounterIon(
        {
          name: 'X',
          kind: 'anion',
          formula: 'C2H3O2',
          charge: -1,
          pKas: [25],
          acceptabilityClass: null,
        },
        'x',
      ),
    ).toThrow(/pKas/);
  });

  it('applies a per-project edit, marks it and keeps the original', () => {
    const chloride = getCounterIon('chloride')!;
    const edited = applyCounterIonEdit(chloride, { pKas: [-7], tradeNote: 'our note' }, 'rec-1');
    expect(edited.origin).toBe('edited');
    expect(edited.editedFields).toEqual(['pKas', 'tradeNote']);
    expect(edited.pKas[0]!.source).toMatch(/edited/);
    expect(edited.original!.pKas[0]!.value).toBe(chloride.pKas[0]!.value);
  });

  it('merges records: project edits only for their project, invalid records rejected, not shown', () => {
    const custom = buildCustomCounterIon(
      {
        name: 'Lab acid',
        kind: 'anion',
        formula: 'C3H5O2',
        charge: -1,
        pKas: [4.9],
        acceptabilityClass: 2,
      },
      'inhouse-2',
    );
    const records = [
      {
        id: 'r1',
        projectId: null,
        overridesIonId: null,
        ion: custom as unknown as Record<string, unknown>,
      },
      { id: 'r2', projectId: 'p1', overridesIonId: 'acetate', ion: { acceptabilityClass: 3 } },
      { id: 'r3', projectId: null, overridesIonId: null, ion: { name: 'broken' } },
    ];
    const p1 = mergeLibrary(COUNTER_IONS, records, 'p1');
    expect(p1.ions.find((i) => i.id === 'acetate')!.acceptabilityClass).toBe(3);
    expect(p1.ions.find((i) => i.id === 'inhouse-2')!.origin).toBe('in-house');
    expect(p1.rejected.map((r) => r.recordId)).toEqual(['r3']);
    const p2 = mergeLibrary(COUNTER_IONS, records, 'p2');
    expect(p2.ions.find((i) => i.id === 'acetate')!.origin).toBe('bundled');
  });
});

describe('counter-ion schema refuses impossible values', () => {
  it('rejects a negative mass, a pKa outside −10…20 and a neutral ion', async () => {
    const { counterIonSchema } = await import('@/chem/library');
    const good = getCounterIon('tosylate')!;
    expect(counterIonSchema.safeParse(good).success).toBe(true);
    expect(counterIonSchema.safeParse({ ...good, molarMassGPerMol: -171 }).success).toBe(false);
    expect(
      counterIonSchema.safeParse({ ...good, pKas: [{ value: 25, source: 'typo' }] }).success,
    ).toBe(false);
    expect(counterIonSchema.safeParse({ ...good, charge: 0 }).success).toBe(false);
  });
});

describe('reference ions', () => {
  it('are listed by default and hidden on request', () => {
    expect(searchCounterIons(COUNTER_IONS, 'perchlorate').map((i) => i.id)).toEqual([
      'perchlorate',
    ]);
    expect(searchCounterIons(COUNTER_IONS, 'perchlorate', { includeReferenceIons: false })).toEqual(
      [],
    );
    expect(
      searchCounterIons(COUNTER_IONS, '', { includeReferenceIons: false }).some(
        (i) => i.id === 'chloride',
      ),
    ).toBe(true);
  });
});
