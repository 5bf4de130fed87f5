import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  candidatesFromLibrary,
  COUNTER_IONS,
  drugIon,
  drugProtolyte,
  numericalPhMax,
  phMaxBase,
  phSolubilityProfile,
  screenCompound,
  type DrugAcidBase,
  type ProfileSalt,
  type ScreeningCompound,
} from '@/chem';
import { drugGrids, gridPhMax, saltOnGrid } from '@/chem/screening/ph-grid-solubility';

const GRID = { phFrom: 1, phTo: 8, phStep: 0.1 };
/** The profile's pH step: the resolution the screen's pH_max had to stay within. */
const PROFILE_STEP = 0.1;

/** A drug (base or acid, one or two pKa values) with a salt of it: stoichiometry balanced by charge. */
const drugAndSalt = fc
  .record({
    kind: fc.constantFrom<'base' | 'acid'>('base', 'acid'),
    pKa1: fc.double({ min: 1, max: 11, noNaN: true }),
    gap: fc.double({ min: 0.4, max: 5, noNaN: true }),
    twoPkas: fc.boolean(),
    dibasic: fc.boolean(),
    ionPka1: fc.double({ min: -8, max: 9, noNaN: true }),
    ionGap: fc.double({ min: 0.4, max: 6, noNaN: true }),
    ionTwoPkas: fc.boolean(),
    ionCharge2: fc.boolean(),
    log10Ksp: fc.double({ min: -14, max: 1, noNaN: true }),
    log10S0: fc.double({ min: -7, max: -0.5, noNaN: true }),
  })
  .map((r) => {
    const pKas = r.twoPkas ? [r.pKa1, r.pKa1 + r.gap] : [r.pKa1];
    const sign = r.kind === 'base' ? 1 : -1;
    const zD = sign * (r.twoPkas && r.dibasic ? 2 : 1);
    const ionPkas = r.ionTwoPkas ? [r.ionPka1, r.ionPka1 + r.ionGap] : [r.ionPka1];
    const zXabs = r.ionTwoPkas && r.ionCharge2 ? 2 : 1;
    // a counter-acid (base drug) is neutral fully protonated; a counter-base (acid drug) carries +n
    const counterIon = {
      pKas: ionPkas,
      mostProtonatedCharge: r.kind === 'base' ? 0 : ionPkas.length,
    };
    const zX =
      r.kind === 'base' ? -zXabs : counterIon.mostProtonatedCharge - (ionPkas.length - zXabs);
    const a = Math.abs(zD);
    const b = Math.abs(zX);
    const g = a === b ? a : 1;
    const drug: DrugAcidBase = { kind: r.kind, pKas, ionCharge: zD };
    const salt: ProfileSalt = {
      counterIon,
      counterIonCharge: zX,
      drugPerSalt: b / g,
      counterIonPerSalt: a / g,
      log10Ksp: r.log10Ksp,
    };
    return { drug, salt, log10S0: r.log10S0 };
  })
  .filter(
    ({ salt }) =>
      salt.counterIonCharge !== 0 && salt.drugPerSalt <= 4 && salt.counterIonPerSalt <= 4,
  );

describe('pH_max and the salt points without a profile (ph-grid-solubility.ts)', () => {
  it('pH_max agrees with the profile-based numerical pH_max within the profile step, over random drugs and salts (fixed seed)', () => {
    let compared = 0;
    fc.assert(
      fc.property(drugAndSalt, ({ drug, salt, log10S0 }) => {
        const g = drugGrids(drugProtolyte(drug), drug.ionCharge, log10S0, GRID);
        const direct = gridPhMax(g, salt);
        const numerical = numericalPhMax(drug, log10S0, salt);
        expect(direct === null).toBe(numerical === null);
        if (direct !== null && numerical !== null) {
          compared++;
          expect(Math.abs(direct - numerical)).toBeLessThanOrEqual(PROFILE_STEP);
          // same function, same bracket, same root search: in fact they agree to the root tolerance
          expect(Math.abs(direct - numerical)).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 2000, seed: 12 },
    );
    expect(compared).toBeGreaterThan(500);
  });

  it('a monoprotic base with a fully ionised counter-ion, pH_max well below the pKa (drug ionised, where the closed form holds): pH_max = pKa + log(S₀/√K_sp), Bogardus & Blackwood 1979 (J. Pharm. Sci. 68, 188), within the profile step', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 4, max: 10, noNaN: true }),
        fc.double({ min: -6, max: -1, noNaN: true }),
        fc.double({ min: -8, max: -1, noNaN: true }),
        (pKa, log10S0, log10Ksp) => {
          const drug: DrugAcidBase = { kind: 'base', pKas: [pKa], ionCharge: 1 };
          // a strong acid (pKa −7) stands for chloride: ionised over pH 0–14
          const salt: ProfileSalt = {
            counterIon: { pKas: [-7], mostProtonatedCharge: 0 },
            counterIonCharge: -1,
            drugPerSalt: 1,
            counterIonPerSalt: 1,
            log10Ksp,
          };
          const expected = phMaxBase(pKa, 10 ** log10S0, 10 ** log10Ksp);
          fc.pre(expected > 0.5 && expected < pKa - 1.5);
          const g = drugGrids(drugProtolyte(drug), 1, log10S0, GRID);
          expect(Math.abs(gridPhMax(g, salt)! - expected)).toBeLessThan(PROFILE_STEP);
        },
      ),
      { numRuns: 300, seed: 7 },
    );
  });

  it('the salt on the grid (what the screen reads) is the profile, number for number (fixed seed)', () => {
    fc.assert(
      fc.property(drugAndSalt, ({ drug, salt, log10S0 }) => {
        const g = drugGrids(drugProtolyte(drug), drug.ionCharge, log10S0, GRID);
        const points = phSolubilityProfile(drug, log10S0, salt, GRID).points;
        const arrays = saltOnGrid(g.profile, salt);
        expect([...arrays.solubilityM]).toEqual(points.map((p) => p.solubilityM));
        expect([...arrays.saltSolid]).toEqual(points.map((p) => (p.solid === 'salt' ? 1 : 0)));
      }),
      { numRuns: 300, seed: 5 },
    );
  });
});

describe("screenCompound with profiles: 'none'", () => {
  // Test inputs only (no expected value comes from them): the result must equal the full screen's.
  const compound: ScreeningCompound = {
    name: 'test base',
    kind: 'base',
    pKas: [{ value: 7.2, origin: 'measured' }],
    ionCharge: 1,
    intrinsicSolubilityMgPerMl: 0.01,
    meltingPointC: null,
    logP: null,
    doseMg: 150,
  };
  const di = drugIon({ kind: 'base', ionCharge: 1, formula: 'C18H22N2O2' });
  const thermo = { formula: di.formula, charge: di.charge, rings: { aromatic: 2, nonAromatic: 0 } };
  const candidates = candidatesFromLibrary(COUNTER_IONS, { kind: 'base', ionCharge: 1, thermo });

  for (const settings of [{}, { activityModel: 'davies' }]) {
    it(`leaves the profiles empty and every other number as the full screen has it (${JSON.stringify(settings)})`, () => {
      const full = screenCompound({ compound, drugIon: di, candidates, settings });
      const none = screenCompound({
        compound,
        drugIon: di,
        candidates,
        settings,
        profiles: 'none',
      });
      expect(full.rows.every((r) => r.error !== null || r.profile.length > 0)).toBe(true);
      expect(none.rows.every((r) => r.profile.length === 0)).toBe(true);
      expect(none.freeForm.profile).toEqual([]);
      // the dose-number series keeps the ICH M9 pH values (1.2, 4.5, 6.8) and the worst point
      const named = <T extends { doseNumbers: { pH: number }[]; worst: { pH: number } | null }>(
        r: T,
      ) => r.doseNumbers.filter((d) => [1.2, 4.5, 6.8, r.worst?.pH].includes(d.pH));
      const strip = (res: typeof full) => ({
        ...res,
        freeForm: { ...res.freeForm, profile: [], doseNumbers: named(res.freeForm) },
        rows: res.rows.map((r) => ({ ...r, profile: [], doseNumbers: named(r) })),
      });
      expect(none.rows.some((r) => r.doseNumbers.length === 3)).toBe(true);
      expect(strip(none)).toEqual(strip(full));
    });
  }
});
