import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  estimateSaltWaterSolubility,
  LIBRARY_COUNTER_ION_DESCRIPTORS,
  SALT_SOLUBILITY_FEATURES,
  type SaltSolubilityInput,
} from '@/chem';
import {
  featureRow,
  fixedCounterIon,
  IDEAL_SOLUBILITY_FEATURE,
  THERMO_SHIFT_FEATURE,
} from '@/chem/screening/salt-solubility/salt-solubility-features';

// Issue 20: for a library counter-ion (fixedCounterIon) featureRow computes the columns that read the
// counter-ion alone once and reuses them. The reference is featureRow on a plain copy of the same
// counter-ion, which computes every column afresh: both must agree bit for bit (Object.is), whatever
// the drug, the stoichiometry and the order of calls. The inputs are drawn at random (a workload,
// not expected values).

const ionIds = Object.keys(LIBRARY_COUNTER_ION_DESCRIPTORS);
const inputArb = fc.record({
  ion: fc.constantFrom(...ionIds),
  charge: fc.constantFrom(-2, -1, 1, 2),
  kind: fc.constantFrom('base' as const, 'acid' as const),
  log10IntrinsicM: fc.double({ min: -9, max: 0, noNaN: true }),
  logP: fc.option(fc.double({ min: -2, max: 7, noNaN: true }), { nil: null }),
  m: fc.integer({ min: 1, max: 2 }),
  n: fc.integer({ min: 1, max: 2 }),
  meltingPointK: fc.option(fc.double({ min: 350, max: 600, noNaN: true }), { nil: null }),
  thermoShiftDecades: fc.option(fc.double({ min: -3, max: 3, noNaN: true }), { nil: null }),
});
type Drawn = typeof inputArb extends fc.Arbitrary<infer T> ? T : never;

function inputOf(d: Drawn, counterIon: SaltSolubilityInput['counterIon']): SaltSolubilityInput {
  return {
    drug: { kind: d.kind, log10IntrinsicM: d.log10IntrinsicM, logP: d.logP },
    counterIon,
    drugPerSalt: d.m,
    counterIonPerSalt: d.n,
    meltingPointK: d.meltingPointK,
    thermoShiftDecades: d.thermoShiftDecades,
  };
}

const LISTS = [
  SALT_SOLUBILITY_FEATURES,
  [...SALT_SOLUBILITY_FEATURES, THERMO_SHIFT_FEATURE, IDEAL_SOLUBILITY_FEATURE],
];

describe('featureRow for a fixed library counter-ion', () => {
  it('a column marked counterIonOnly does not move when anything but the counter-ion does', () => {
    const marked = SALT_SOLUBILITY_FEATURES.filter((f) => f.counterIonOnly);
    // the six counter-ion predictors (descriptors and charge) and no drug predictor
    expect(marked.map((f) => f.name)).toEqual([
      'counterIonLogPParent',
      'counterIonAromaticRings',
      'counterIonHBondDonorsAcceptors',
      'counterIonHeavyAtoms',
      'counterIonInorganic',
      'multivalentSalt',
    ]);
    fc.assert(
      fc.property(inputArb, inputArb, (a, b) => {
        const ion = { ...LIBRARY_COUNTER_ION_DESCRIPTORS[a.ion]!, charge: a.charge };
        for (const f of marked)
          expect(Object.is(f.value(inputOf(a, ion)), f.value(inputOf(b, ion)))).toBe(true);
      }),
      { seed: 20261203, numRuns: 200 },
    );
  });

  it('gives every column bit for bit as computed afresh, over many drugs and both feature lists', () => {
    fc.assert(
      fc.property(fc.array(inputArb, { minLength: 1, maxLength: 30 }), (drawn) => {
        for (const d of drawn) {
          const record = LIBRARY_COUNTER_ION_DESCRIPTORS[d.ion]!;
          const fixed = inputOf(d, fixedCounterIon(record, d.charge));
          const plain = inputOf(d, { ...record, charge: d.charge });
          for (const list of LISTS) {
            const got = featureRow(fixed, list);
            const want = featureRow(plain, list);
            expect(got).toHaveLength(want.length);
            want.forEach((x, j) => expect(Object.is(got[j], x)).toBe(true));
          }
          expect(estimateSaltWaterSolubility(fixed)).toStrictEqual(
            estimateSaltWaterSolubility(plain),
          );
        }
      }),
      { seed: 20261203, numRuns: 100 },
    );
  });

  it('is one object per record and charge', () => {
    const r = LIBRARY_COUNTER_ION_DESCRIPTORS[ionIds[0]!]!;
    expect(fixedCounterIon(r, -1)).toBe(fixedCounterIon(r, -1));
    expect(fixedCounterIon(r, -1)).not.toBe(fixedCounterIon(r, -2));
    expect(fixedCounterIon(r, -2)).toEqual({ ...r, charge: -2 });
  });
});
