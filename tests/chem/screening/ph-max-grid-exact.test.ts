import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drugProtolyte, log10ChargeFraction, type ProfileSalt } from '@/chem';
import { brentRoot } from '@/chem/numerics/root-finding';
import { drugGrids, gridPhMax, type DrugGrids } from '@/chem/screening/ph-grid-solubility';
import {
  log10FreeFormSolubilityM,
  SALT_LOG10_S_LIMITS,
  saltLog10FormulaUnitsRaw,
} from '@/chem/screening/salt-equilibrium';

/**
 * The screen's pH_max must be the same number, to the last bit, as the algorithm it was before the
 * speed work of issue 20 (written out below as it stood: every fraction through log10ChargeFraction,
 * every sign change refined by brentRoot from both ends, the nearest crossing picked by reduce).
 * Fictional drugs and salts, one or two pKa values each.
 */
function phMaxAsBefore(g: DrugGrids, salt: ProfileSalt): number | null {
  const m = salt.drugPerSalt;
  const n = salt.counterIonPerSalt;
  const { min, max } = SALT_LOG10_S_LIMITS;
  const log10M = Math.log10(m);
  const logSaltOf = (laD: number, laX: number) =>
    log10M + Math.min(max, Math.max(min, saltLog10FormulaUnitsRaw(m, n, laD, laX, salt.log10Ksp)));
  const h = (pH: number) =>
    logSaltOf(
      log10ChargeFraction(g.drug, pH, g.ionCharge),
      log10ChargeFraction(salt.counterIon, pH, salt.counterIonCharge),
    ) - log10FreeFormSolubilityM(g.drug, g.log10IntrinsicM, pH);
  const phs = g.scan.phs;
  const crossings: number[] = [];
  let prev = h(phs[0]!);
  for (let k = 1; k < phs.length; k++) {
    const cur = h(phs[k]!);
    if (prev === 0) crossings.push(phs[k - 1]!);
    else if (prev * cur < 0) crossings.push(brentRoot(h, phs[k - 1]!, phs[k]!, 1e-12).root);
    prev = cur;
  }
  if (crossings.length === 0) return null;
  const p = g.drug;
  const ref = p.pKas[p.mostProtonatedCharge - g.ionCharge] ?? p.pKas[0]!;
  return crossings.reduce((best, x) => (Math.abs(x - ref) < Math.abs(best - ref) ? x : best));
}

const case_ = fc.record({
  base: fc.boolean(),
  pKa1: fc.double({ min: 1, max: 11, noNaN: true }),
  gap: fc.double({ min: 0.4, max: 5, noNaN: true }),
  twoPkas: fc.boolean(),
  ionPka1: fc.double({ min: -8, max: 11, noNaN: true }),
  ionGap: fc.double({ min: 0.4, max: 6, noNaN: true }),
  ionTwoPkas: fc.boolean(),
  twoToOne: fc.boolean(),
  log10Ksp: fc.double({ min: -14, max: 1, noNaN: true }),
  log10S0: fc.double({ min: -7, max: -0.5, noNaN: true }),
});

describe('gridPhMax (ph-grid-solubility.ts) is the algorithm as it stood, bit for bit', () => {
  it('over random drugs and 1:1 or 2:1 salts with one or two pKa values each (fixed seed)', () => {
    fc.assert(
      fc.property(case_, (r) => {
        const pKas = r.twoPkas ? [r.pKa1, r.pKa1 + r.gap] : [r.pKa1];
        const ionPkas = r.ionTwoPkas ? [r.ionPka1, r.ionPka1 + r.ionGap] : [r.ionPka1];
        const zD = r.base ? 1 : -1;
        const drug = { kind: r.base ? ('base' as const) : ('acid' as const), pKas, ionCharge: zD };
        // a counter-acid (base drug) loses its first proton; a counter-base (acid drug) keeps its last
        const counterIon = { pKas: ionPkas, mostProtonatedCharge: r.base ? 0 : ionPkas.length };
        // with two pKa values the counter-ion may carry charge 2, in a 2:1 salt
        const z2 = r.ionTwoPkas && r.twoToOne;
        const salt: ProfileSalt = {
          counterIon,
          counterIonCharge: (r.base ? -1 : 1) * (z2 ? 2 : 1),
          drugPerSalt: z2 ? 2 : 1,
          counterIonPerSalt: 1,
          log10Ksp: r.log10Ksp,
        };
        const g = drugGrids(drugProtolyte(drug), zD, r.log10S0, {
          phFrom: 1,
          phTo: 8,
          phStep: 0.1,
        });
        const before = phMaxAsBefore(g, salt);
        const now = gridPhMax(g, salt);
        expect(Object.is(now, before)).toBe(true);
      }),
      { numRuns: 3000, seed: 2020 },
    );
  });
});
