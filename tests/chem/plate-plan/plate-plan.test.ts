import { describe, expect, it } from 'vitest';
import {
  buildPlatePlan,
  ChemInputError,
  formulaMolarMassGPerMol,
  getCounterIon,
  pickListRows,
  wellNames,
  wellPosition,
  type PlatePlanInput,
} from '@/chem';

/**
 * Plan arithmetic against hand computations. The drug is chlorpromazine base, C17H19ClN2S, whose molar
 * mass from the IUPAC 2021 standard atomic weights the project uses (C 12.011, H 1.008, Cl 35.45,
 * N 14.007, S 32.06) is by hand 17 × 12.011 + 19 × 1.008 + 35.45 + 2 × 14.007 + 32.06 = 318.863 g/mol
 * (the Merck Index gives 318.86). 10 mg of it is 10 / 318.863 = 0.0313614 mmol; 1.05 eq is 0.0329295 mmol.
 */
const M_DRUG = 318.863;
const ctx = {
  freeFormMolarMassGPerMol: formulaMolarMassGPerMol('C17H19ClN2S'),
  drugCharge: 1,
  lookupIon: getCounterIon,
};
const base: PlatePlanInput = {
  counterIons: ['mesylate'],
  solvents: ['ethanol'],
  apiMgPerWell: 10,
  solventUlPerWell: 200,
  plate: 24,
};
const one = (plan: Partial<PlatePlanInput>) => buildPlatePlan({ ...base, ...plan }, ctx).wells[0]!;

describe('plan arithmetic (hand-computed)', () => {
  it('takes the drug molar mass from its formula and the moles of drug per well', () => {
    expect(ctx.freeFormMolarMassGPerMol).toBeCloseTo(M_DRUG, 3); // hand sum above
    const w = one({});
    expect(w.apiMmol).toBeCloseTo(0.0313614, 6); // 10 / 318.863
  });

  it('a liquid acid by density: methanesulfonic acid, 1.05 eq of a 1:1 salt', () => {
    const w = one({ counterIons: ['mesylate'] });
    expect(w.equivalents).toBe(1.05); // 1:1 default, 5 % excess (common practice)
    expect(w.counterIon.mmol).toBeCloseTo(0.0329295, 6); // 1.05 × 0.0313614
    // M(CH4O3S) = 12.011 + 4 × 1.008 + 3 × 15.999 + 32.06 = 96.100 g/mol; 0.0329295 × 96.100 = 3.16452 mg
    expect(w.counterIon.mg).toBeCloseTo(3.16452, 4);
    // density 1.481 g/mL at 25 °C (CRC Handbook, from memory): 3.16452 / 1.481 = 2.13675 µL
    expect(w.counterIon.ul).toBeCloseTo(2.13675, 4);
    expect(w.counterIon.dosing).toBe('liquid');
  });

  it('a solid acid weighed in: fumaric acid, 1.05 eq of the 1:1 hydrogen fumarate, with the water warning', () => {
    const w = one({ counterIons: ['fumarate'], solvents: ['water'] });
    // M(C4H4O4) = 4 × 12.011 + 4 × 1.008 + 4 × 15.999 = 116.072 g/mol; 0.0329295 × 116.072 = 3.82219 mg
    expect(w.counterIon.mg).toBeCloseTo(3.82219, 4);
    expect(w.counterIon.ul).toBeNull();
    expect(w.counterIon.dosing).toBe('solid');
    // 3.822 mg in 0.200 mL = 19.1 g/L, above fumaric acid's ≈ 6.3 g/L in water at 25 °C (CRC, from memory)
    expect(w.warnings.join(' ')).toMatch(/19\.1 g\/L.*6\.3 g\/L in water/);
    // in ethanol the table knows nothing against it: no warning
    expect(one({ counterIons: ['fumarate'], solvents: ['ethanol'] }).warnings).toEqual([]);
  });

  it('a stock solution: hydrochloric acid 1.0 M in water, V = n / c', () => {
    const w = one({
      counterIons: ['chloride'],
      stock: { chloride: { solvent: 'water', molar: 1.0 } },
    });
    // 1000 × 0.0329295 mmol / 1.0 mol/L = 32.9295 µL; M(HCl) = 1.008 + 35.45 = 36.458 → 1.20054 mg
    expect(w.counterIon.ul).toBeCloseTo(32.9295, 3);
    expect(w.counterIon.mg).toBeCloseTo(1.20054, 4);
    expect(w.counterIon.dosing).toBe('stock');
    expect(w.stock).toEqual({ solventId: 'water', molar: 1.0 });
  });

  it('a 2:1 salt: the hemisulfate takes 0.5 eq of sulfuric acid, measured by density', () => {
    const w = one({ counterIons: ['sulfate'] });
    expect(w.equivalents).toBe(0.5); // library stoichiometry hemisulfate (2:1): 1 / 2
    expect(w.counterIon.mmol).toBeCloseTo(0.0156807, 6); // 0.5 × 0.0313614
    // M(H2SO4) = 2 × 1.008 + 32.06 + 4 × 15.999 = 98.072; 0.0156807 × 98.072 = 1.53784 mg; / 1.83 g/mL = 0.840349 µL
    expect(w.counterIon.mg).toBeCloseTo(1.53784, 4);
    expect(w.counterIon.ul).toBeCloseTo(0.84035, 4);
  });

  it('honours equivalents given per ion and as levels', () => {
    const plan = buildPlatePlan(
      { ...base, counterIons: ['mesylate', 'fumarate'], equivalents: { fumarate: [0.5, 1.0] } },
      ctx,
    );
    expect(plan.wells.map((w) => [w.well, w.counterIonId, w.equivalents])).toEqual([
      ['A1', 'mesylate', 1.05],
      ['A2', 'fumarate', 0.5],
      ['A3', 'fumarate', 1.0],
    ]);
  });

  it('rounds the pick list to 4 significant digits and keeps the field names', () => {
    const [row] = pickListRows(buildPlatePlan(base, ctx));
    expect(row).toMatchObject({
      well: 'A1',
      counter_ion: 'mesylate',
      solvent: 'ethanol',
      api_mg: 10,
      api_mmol: 0.03136,
      counter_ion_equivalents: 1.05,
      counter_ion_mmol: 0.03293,
      counter_ion_mg: 3.165,
      counter_ion_ul: 2.137,
      solvent_ul: 200,
      solvent_ich_q3c_class: 3,
    });
  });
});

describe('plate layout and fill order', () => {
  it('names wells A1…D6, A1…F8 and A1…H12', () => {
    expect(wellNames(24).slice(0, 7)).toEqual(['A1', 'A2', 'A3', 'A4', 'A5', 'A6', 'B1']);
    expect(wellNames(24).at(-1)).toBe('D6');
    expect(wellNames(48).at(-1)).toBe('F8');
    expect(wellNames(96).at(-1)).toBe('H12');
    expect(wellNames(96)).toHaveLength(96);
    expect(wellPosition(96, 'H12')).toEqual({ row: 7, column: 11 });
    expect(() => wellPosition(24, 'E1')).toThrow(/not a well of a 24-well plate/);
  });

  it('fills counter-ion × solvent × equivalents × method, row by row', () => {
    const plan = buildPlatePlan(
      {
        ...base,
        counterIons: ['mesylate', 'sulfate'],
        solvents: ['ethanol', 'acetone', 'water'],
        methods: ['slurry', 'cooling'],
      },
      ctx,
    );
    expect(plan.wells).toHaveLength(12); // 2 × 3 × 1 × 2
    expect(
      plan.wells.slice(0, 3).map((w) => `${w.well} ${w.counterIonId} ${w.solventId} ${w.method}`),
    ).toEqual([
      'A1 mesylate ethanol slurry',
      'A2 mesylate ethanol cooling',
      'A3 mesylate acetone slurry',
    ]);
    expect(plan.wells[6]!.well).toBe('B1');
    expect(plan.wells[6]!.counterIonId).toBe('sulfate');
    expect(plan.emptyWells).toHaveLength(12);
  });

  it('refuses a plan that does not fit the plate, naming the field', () => {
    const ions = ['mesylate', 'sulfate', 'fumarate', 'maleate', 'tosylate'];
    const solvents = ['ethanol', 'acetone', 'water', 'acetonitrile', 'ethyl-acetate'];
    expect(() => buildPlatePlan({ ...base, counterIons: ions, solvents }, ctx)).toThrow(
      /^plan\.plate: the plan needs 25 wells.*24-well plate.*accepted: plate 48/,
    );
    expect(
      buildPlatePlan({ ...base, counterIons: ions, solvents, plate: 48 }, ctx).wells,
    ).toHaveLength(25);
  });
});

describe('refusals name the field', () => {
  const refused = (plan: Partial<PlatePlanInput>, field: RegExp) => {
    let err: unknown;
    try {
      buildPlatePlan({ ...base, ...plan }, ctx);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ChemInputError);
    expect((err as ChemInputError).field).toMatch(field);
  };
  it('a Class 1 solvent unless allowClass1, then with a note', () => {
    refused({ solvents: ['ethanol', 'benzene'] }, /^plan\.solvents\.1$/);
    const plan = buildPlatePlan({ ...base, solvents: ['benzene'], allowClass1: true }, ctx);
    expect(plan.wells[0]!.ichQ3cClass).toBe(1);
    expect(plan.notes.join(' ')).toMatch(/Benzene: ICH Q3C Class 1 \(limit 2 ppm\)/);
  });
  it('unknown ids, a cation for a base, a twice-given id, a gas without stock, a stray stock', () => {
    refused({ solvents: ['ethanol', 'ethanoll'] }, /^plan\.solvents\.1$/);
    refused({ counterIons: ['mesylate', 'nope'] }, /^plan\.counterIons\.1$/);
    refused({ counterIons: ['sodium'] }, /^plan\.counterIons\.0$/);
    refused({ counterIons: ['mesylate', 'mesylate'] }, /^plan\.counterIons\.1$/);
    refused({ counterIons: ['chloride'] }, /^plan\.stock\.chloride$/);
    refused({ stock: { fumarate: { solvent: 'water', molar: 1 } } }, /^plan\.stock\.fumarate$/);
    refused(
      { stock: { mesylate: { solvent: 'benzene', molar: 1 } } },
      /^plan\.stock\.mesylate\.solvent$/,
    );
    refused({ equivalents: { tosylate: 1 } }, /^plan\.equivalents\.tosylate$/);
  });
  it('notes each Class 2 solvent with its PDE and limit', () => {
    const plan = buildPlatePlan({ ...base, solvents: ['acetonitrile'] }, ctx);
    expect(plan.notes[0]).toMatch(
      /^Acetonitrile: ICH Q3C Class 2 — PDE 4\.1 mg\/day, limit 410 ppm/,
    );
  });
});
