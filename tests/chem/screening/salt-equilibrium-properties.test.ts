import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  log10ChargeFraction,
  solveSaltSolubility,
  phSolubilityProfile,
  type Protolyte,
} from '@/chem/screening';

const ascending = (xs: number[]) =>
  [...xs].sort((a, b) => a - b).filter((x, i, a) => i === 0 || x - a[i - 1]! > 0.3);

describe('mass/charge-balance solver: properties (fast-check)', () => {
  it('for any m:n salt, polyprotic counter-ion and dibasic drug, the result is finite and satisfies K_sp = (α_D·m·s)^m·(α_X·(n·s + c))^n', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 1, max: 11, noNaN: true }), { minLength: 2, maxLength: 2 }),
        fc.array(fc.double({ min: -3, max: 7, noNaN: true }), { minLength: 1, maxLength: 3 }),
        fc.integer({ min: 1, max: 2 }),
        fc.integer({ min: 1, max: 3 }),
        fc.double({ min: -12, max: -1, noNaN: true }),
        fc.double({ min: 0, max: 14, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        (drugPkas, ionPkas, zD, zXabs, logKsp, pH, c) => {
          const dp = ascending(drugPkas);
          const xp = ascending(ionPkas);
          fc.pre(dp.length === 2 && zXabs <= xp.length);
          const drug: Protolyte = { pKas: dp, mostProtonatedCharge: 2 };
          const ion: Protolyte = { pKas: xp, mostProtonatedCharge: 0 };
          const g = zD === zXabs ? zD : 1;
          const m = zXabs / g;
          const n = zD / g;
          const r = solveSaltSolubility({
            drug,
            drugIonCharge: zD,
            drugPerSalt: m,
            counterIon: ion,
            counterIonCharge: -zXabs,
            counterIonPerSalt: n,
            log10Ksp: logKsp,
            pH,
            commonIonM: c,
          });
          expect(Number.isFinite(r.drugTotalM)).toBe(true);
          expect(r.drugTotalM).toBeGreaterThan(0);
          if (!r.unbounded && r.formulaUnitsM > 1e-150) {
            const s = r.formulaUnitsM;
            const lhs =
              m * (log10ChargeFraction(drug, pH, zD) + Math.log10(m * s)) +
              n * (log10ChargeFraction(ion, pH, -zXabs) + Math.log10(n * s + c));
            expect(Math.abs(lhs - logKsp)).toBeLessThan(1e-7);
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  it('the salt-limited branch of a base’s 1:1 salt never falls as pH rises (α_D falls, more salt dissolves)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 11, noNaN: true }),
        fc.double({ min: -8, max: -1, noNaN: true }),
        (pKa, logKsp) => {
          const p = phSolubilityProfile(
            { kind: 'base', pKas: [pKa], ionCharge: 1 },
            -20,
            {
              counterIon: { pKas: [-10], mostProtonatedCharge: 0 },
              counterIonCharge: -1,
              drugPerSalt: 1,
              counterIonPerSalt: 1,
              log10Ksp: logKsp,
            }, // pKa −10: ionised to 1e-10 over pH 1–8 (a pKa −6 acid is 3e-7 protonated at pH 0.5 and the branch rises by that much)
            { phStep: 0.5 },
          );
          const branch = p.points.map((q) => q.saltLimitedM!);
          for (let i = 1; i < branch.length; i++)
            expect(branch[i]!).toBeGreaterThanOrEqual(branch[i - 1]! * (1 - 1e-9));
        },
      ),
      { numRuns: 60 },
    );
  });
});
