import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drugProtolyte, type DrugAcidBase } from '@/chem';
import { drugGrids, drugOnGrid, profilePhs } from '@/chem/screening/ph-grid-solubility';
import { ichM9Plan } from '@/chem/screening/screen/ich-m9-plan';
import { screenContext } from '@/chem/screening/screen/screen-context';

/**
 * drugGrids shares work across points and compounds (drug-grid.ts): the profile pH list is built once
 * per grid setting, and the pH_max scan takes the points it shares with the profile grid from it. The
 * reference here is the unshared computation (profilePhs, drugOnGrid on each list alone): every value
 * must be the same double (Object.is), since a screen's output bytes are written from them.
 */

const drug = fc
  .record({
    kind: fc.constantFrom<'base' | 'acid'>('base', 'acid'),
    pKa1: fc.double({ min: -2, max: 13, noNaN: true }),
    gap: fc.double({ min: 0.1, max: 5, noNaN: true }),
    twoPkas: fc.boolean(),
    log10S0: fc.double({ min: -9, max: 0, noNaN: true }),
  })
  .map((r) => ({
    d: {
      kind: r.kind,
      pKas: r.twoPkas ? [r.pKa1, r.pKa1 + r.gap] : [r.pKa1],
      ionCharge: r.kind === 'base' ? 1 : -1,
    } satisfies DrugAcidBase,
    log10S0: r.log10S0,
  }));

const grid = fc.oneof(
  fc.constant({ phFrom: 1, phTo: 8, phStep: 0.1 }), // the default grid
  fc.record({
    phFrom: fc.constantFrom(0, 0.5, 1, 1.2, 2),
    phTo: fc.constantFrom(6.8, 8, 10, 14),
    phStep: fc.constantFrom(0.01, 0.05, 0.1, 0.25, 0.3, 0.5, 1),
  }),
);

const sameDoubles = (a: ArrayLike<number>, b: ArrayLike<number>) =>
  a.length === b.length && Array.from(a).every((x, i) => Object.is(x, b[i]));

describe('drugGrids (shared pH lists and scan points)', () => {
  it('gives the same doubles as each list computed alone', () => {
    fc.assert(
      fc.property(drug, grid, ({ d, log10S0 }, g) => {
        const p = drugProtolyte(d);
        const got = drugGrids(p, d.ionCharge, log10S0, g);
        const phs = profilePhs(g.phFrom, g.phTo, g.phStep);
        const profile = drugOnGrid(p, d.ionCharge, log10S0, phs);
        const scan = drugOnGrid(p, d.ionCharge, log10S0, got.scan.phs);
        expect(sameDoubles(got.profile.phs, phs)).toBe(true);
        expect(got.scan.phs.length).toBe(57); // pH 0 to 14 in steps of 0.25
        for (const k of ['laD', 'log10FreeM', 'freeM'] as const) {
          expect(sameDoubles(got.profile[k], profile[k])).toBe(true);
          expect(sameDoubles(got.scan[k], scan[k])).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('hands every screen on one grid setting the same frozen pH list and ICH M9 series', () => {
    const input = (pKa: number) =>
      ({
        compound: {
          name: 'Fictional test base',
          kind: 'base',
          pKas: [{ value: pKa, origin: 'measured' }],
          ionCharge: 1,
          intrinsicSolubilityMgPerMl: 0.01,
          meltingPointC: null,
          logP: null,
          doseMg: 10,
        },
        drugIon: { freeFormMolarMassGPerMol: 250, molarMassGPerMol: 251 },
        candidates: [],
        settings: {},
      }) as unknown as Parameters<typeof screenContext>[0];
    const a = screenContext(input(6));
    const b = screenContext(input(8));
    expect(b.grids.profile.phs).toBe(a.grids.profile.phs);
    expect(Object.isFrozen(a.grids.profile.phs)).toBe(true);
    expect(b.ichM9Plan).toBe(a.ichM9Plan);
    // the series is ichM9Plan's: ICH M9 (2019) pH 1.2, 4.5, 6.8 and the grid points between them
    expect(a.ichM9Plan).toEqual(ichM9Plan(profilePhs(1, 8, 0.1)));
    expect(a.ichM9Plan.map((p) => p.pH).slice(0, 3)).toEqual([1.2, 1.3, 1.4]);
  });
});
