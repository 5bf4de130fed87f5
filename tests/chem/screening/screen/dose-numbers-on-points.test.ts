import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drugIon, log10ChargeFraction, log10SpeciesFractions, type ProfileSalt } from '@/chem';
import {
  SaltGridPoints,
  saltOnGrid,
  saltOnGridWhenRead,
} from '@/chem/screening/ph-grid-solubility';
import {
  ichM9WorstAndNamed,
  ichM9WorstAndNamedOnPoints,
} from '@/chem/screening/screen/dose-numbers';
import { screenContext } from '@/chem/screening/screen/screen-context';

/**
 * The screen without profiles reduces a salt's grid to its worst and named ICH M9 points from the
 * exponents alone (SaltGridPoints), taking exact values only for the points it keeps and near ties.
 * The reference is the same reduction over the full arrays (ichM9WorstAndNamed on saltOnGrid, which
 * tests/chem/screening/ph-max-without-profile.test.ts checks against the profile number for number):
 * the result must be the same objects, bit for bit. Inputs are fictional test values.
 */
const di = drugIon({ kind: 'base', ionCharge: 1, formula: 'C18H22N2O2' });

/** The default grid (1–8, step 0.1: the ICH M9 pH values are grid points) or one through none of them. */
const GRIDS = [{}, { phGrid: { from: 1.05, to: 8, step: 0.1 } }];

function contextFor(pKa: number, s0MgPerMl: number, doseMg: number, settings: object = {}) {
  return screenContext({
    compound: {
      name: 'test base',
      kind: 'base',
      pKas: [{ value: pKa, origin: 'measured' }],
      ionCharge: 1,
      intrinsicSolubilityMgPerMl: s0MgPerMl,
      meltingPointC: null,
      logP: null,
      doseMg,
    },
    drugIon: di,
    candidates: [],
    settings,
    profiles: 'none',
  });
}

/** A 1:1 salt of a monoprotic base with a monoprotic counter-acid. */
const saltOf = (ionPka: number, log10Ksp: number): ProfileSalt => ({
  counterIon: { pKas: [ionPka], mostProtonatedCharge: 0 },
  counterIonCharge: -1,
  drugPerSalt: 1,
  counterIonPerSalt: 1,
  log10Ksp,
});

function expectSameReduction(
  pKa: number,
  ionPka: number,
  log10Ksp: number,
  s0: number,
  settings: object = {},
) {
  const ctx = contextFor(pKa, s0, 100, settings);
  const salt = saltOf(ionPka, log10Ksp);
  const arrays = saltOnGrid(ctx.grids.profile, salt);
  const reference = ichM9WorstAndNamed(ctx, salt, arrays, ctx.ichM9Plan);
  const points = new SaltGridPoints(ctx.grids.profile, salt);
  expect(ichM9WorstAndNamedOnPoints(ctx, salt, points, ctx.ichM9Plan)).toEqual(reference);
  // the arrays made when read are saltOnGrid's
  const whenRead = saltOnGridWhenRead(ctx.grids.profile, salt);
  expect([...whenRead.solubilityM]).toEqual([...arrays.solubilityM]);
  expect([...whenRead.saltSolid]).toEqual([...arrays.saltSolid]);
}

describe('the worst and named ICH M9 points without the grid arrays (SaltGridPoints)', () => {
  it('are the points the full arrays give, over random salts (fixed seed)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 11, noNaN: true }),
        fc.double({ min: -8, max: 9, noNaN: true }),
        fc.double({ min: -12, max: 1, noNaN: true }),
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        fc.constantFrom(...GRIDS),
        expectSameReduction,
      ),
      { numRuns: 400, seed: 20 },
    );
  });

  it('choose the same point where two points tie: drug and counter-ion pKa symmetric about the midpoint of two grid points (the salt branch has its minimum there, equal in exact arithmetic at both)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 50 }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: -14, max: -4, noNaN: true }),
        (j, half, log10Ksp) => {
          const mid = 1.25 + 0.1 * j; // halfway between two points of the 0.1 grid
          expectSameReduction(mid + half, mid - half, log10Ksp, 50);
        },
      ),
      { numRuns: 300, seed: 21 },
    );
  });

  it('choose the same point on a flat salt branch (a strong counter-acid, a strong base: values a hair apart)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 9, max: 11, noNaN: true }),
        fc.double({ min: -9, max: -4, noNaN: true }),
        (pKa, log10Ksp) => expectSameReduction(pKa, -7, log10Ksp, 50),
      ),
      { numRuns: 200, seed: 22 },
    );
  });
});

describe('log10ChargeFraction (speciation.ts), taken as term minus species sum', () => {
  it('is log10SpeciesFractions’ entry bit for bit (the fast form must not move a last bit)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -5, max: 15, noNaN: true }), { minLength: 0, maxLength: 3 }),
        fc.double({ min: 0, max: 14, noNaN: true }),
        (raw, pH) => {
          const pKas = [...raw].sort((a, b) => a - b);
          fc.pre(pKas.every((p, i) => i === 0 || p > pKas[i - 1]!));
          const p = { pKas, mostProtonatedCharge: pKas.length };
          const all = log10SpeciesFractions(p, pH);
          all.forEach((v, i) =>
            expect(Object.is(log10ChargeFraction(p, pH, pKas.length - i), v)).toBe(true),
          );
        },
      ),
      { numRuns: 1000, seed: 23 },
    );
  });
});
