import { describe, expect, it } from 'vitest';
import { ChemInputError, saltStoichiometryFromCharges, stoichiometryFromCharges } from '@/chem';

describe('saltStoichiometryFromCharges (electroneutrality in lowest terms)', () => {
  it('gives the usual salt formulas', () => {
    // Salt names and ratios as in P. H. Stahl & C. G. Wermuth (eds.), Handbook of Pharmaceutical
    // Salts (2002), ch. 12 (from memory): a monobasic drug with sulfate is the hemisulfate (2:1),
    // a dibasic drug with chloride the dihydrochloride (1:2), a dibasic drug with sulfate 1:1.
    expect(saltStoichiometryFromCharges(1, -2)).toEqual({ drugPerSalt: 2, counterIonPerSalt: 1 });
    expect(saltStoichiometryFromCharges(2, -1)).toEqual({ drugPerSalt: 1, counterIonPerSalt: 2 });
    expect(saltStoichiometryFromCharges(2, -2)).toEqual({ drugPerSalt: 1, counterIonPerSalt: 1 });
    // An acid drug (−1) with calcium (+2): 2:1, the hemicalcium salt.
    expect(saltStoichiometryFromCharges(-1, 2)).toEqual({ drugPerSalt: 2, counterIonPerSalt: 1 });
    // CaF2 and Al2O3 as cation–anion pairs (Kapustinskii's p and q).
    expect(stoichiometryFromCharges(2, -1)).toEqual({ cations: 1, anions: 2 });
    expect(stoichiometryFromCharges(3, -2)).toEqual({ cations: 2, anions: 3 });
  });

  it('balances charge for every pair of charges up to 4', () => {
    for (let zd = 1; zd <= 4; zd++) {
      for (let zx = 1; zx <= 4; zx++) {
        const s = saltStoichiometryFromCharges(zd, -zx);
        expect(s.drugPerSalt * zd).toBe(s.counterIonPerSalt * zx);
        expect(Math.min(s.drugPerSalt, s.counterIonPerSalt)).toBeGreaterThanOrEqual(1);
      }
    }
  });

  it('refuses a neutral ion', () => {
    expect(() => saltStoichiometryFromCharges(0, -1)).toThrow(ChemInputError);
    expect(() => saltStoichiometryFromCharges(1, Number.NaN)).toThrow(ChemInputError);
  });
});
