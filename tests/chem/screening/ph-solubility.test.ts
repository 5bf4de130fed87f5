import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  commonIonSaltIonM,
  freeBaseSolubilityM,
  log10FreeFormSolubilityM,
  log10KspFromSaltSolubility,
  numericalPhMax,
  phMaxAcid,
  phMaxBase,
  phSolubilityProfile,
  saltLimitedBaseSolubilityM,
  solveSaltSolubility,
  type Protolyte,
  type SaltEquilibriumInput,
} from '@/chem/screening';
import { ChemInputError } from '@/chem/result';

/** Hydrochloric acid as a protolyte: pKa ≈ −6 (order of magnitude as usually quoted; its exact value does not matter here). */
const STRONG_MONOPROTIC: Protolyte = { pKas: [-6], mostProtonatedCharge: 0 };
const base = (pKa: number): Protolyte => ({ pKas: [pKa], mostProtonatedCharge: 1 });

describe('closed-form 1:1 relations (Bogardus & Blackwood 1979; Serajuddin 2007)', () => {
  it('pH_max = pKa + log(S₀/√K_sp) is where the two branches meet, to 1e-9', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 11, noNaN: true }),
        fc.double({ min: -8, max: -1, noNaN: true }),
        fc.double({ min: -8, max: 0, noNaN: true }),
        (pKa, logS0, logKsp) => {
          const s0 = 10 ** logS0;
          const ksp = 10 ** logKsp;
          const pHmax = phMaxBase(pKa, s0, ksp);
          fc.pre(pHmax > 0 && pHmax < 14);
          const free = freeBaseSolubilityM(s0, pKa, pHmax);
          const salt = saltLimitedBaseSolubilityM(ksp, pKa, pHmax);
          expect(Math.abs(Math.log10(free) - Math.log10(salt))).toBeLessThan(1e-9);
        },
      ),
    );
  });
  it('the weak-acid pH_max is the mirror image: pKa − log(S₀/√K_sp) = 8.00, and the mass balance agrees', () => {
    // Hand computation: 4.42 − log₁₀(10^−5.58/√1e-4) = 4.42 − (−5.58 + 2) = 8.00.
    const pKa = 4.42;
    const s0 = 10 ** -5.58;
    const ksp = 1e-4;
    expect(phMaxAcid(pKa, s0, ksp)).toBeCloseTo(4.42 + 5.58 - 2, 12);
    // The production solver (mass balance, numericalPhMax) for the sodium salt: Na⁺ is +1 at every pH
    // of the scale (its pKa is set beyond the scale; the exact value does not matter). At pH 8 the
    // acid is ionised 10^3.6-fold, so the closed form's assumption holds to better than 1e-3.
    const drug = { kind: 'acid' as const, pKas: [pKa], ionCharge: -1 };
    const salt = {
      counterIon: { pKas: [20], mostProtonatedCharge: 1 },
      counterIonCharge: 1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -4,
    };
    expect(numericalPhMax(drug, Math.log10(s0), salt)).toBeCloseTo(8, 3);
  });
  it('common-ion concentration solves x(x + c) = K_sp (the quadratic) and is √K_sp without added ion', () => {
    for (const [ksp, c] of [
      [1e-4, 0.12],
      [1e-2, 0.12],
      [1e-8, 0.5],
      [1e-3, 0],
    ] as const) {
      const x = commonIonSaltIonM(ksp, c);
      const quadraticRoot = (-c + Math.sqrt(c * c + 4 * ksp)) / 2;
      expect(Math.abs((x * (x + c)) / ksp - 1)).toBeLessThan(1e-12);
      expect(Math.abs(x / quadraticRoot - 1)).toBeLessThan(1e-6);
    }
    expect(commonIonSaltIonM(1e-4, 0)).toBeCloseTo(1e-2, 15);
  });
  it('gastric chloride lowers a hydrochloride’s solubility below its solubility in chloride-free medium', () => {
    const inWater = saltLimitedBaseSolubilityM(1e-3, 8, 1.2, 0);
    const inGastric = saltLimitedBaseSolubilityM(1e-3, 8, 1.2, 0.12);
    expect(inGastric).toBeLessThan(inWater);
  });
  it('the profile takes the lower branch as the solid phase (salt below pH_max 4.5, free form above)', () => {
    const drug = { kind: 'base' as const, pKas: [8], ionCharge: 1 };
    const salt = {
      counterIon: STRONG_MONOPROTIC,
      counterIonCharge: -1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -3,
    };
    const p = phSolubilityProfile(drug, -5, salt);
    expect(p.points.find((q) => q.pH === 3)!.solid).toBe('salt');
    expect(p.points.find((q) => q.pH === 7.5)!.solid).toBe('free-form');
  });
});

describe('published worked example: Avdeef, "Absorption and Drug Development" (Wiley 2003), §6.1, Figs. 6.1–6.3', () => {
  // Values quoted there: miconazole pKa 6.07, log S₀ −5.85; indomethacin pKa 4.42, log S₀ −5.58;
  // ciprofloxacin pKa 6.16 and 8.62, log S₀ −3.72 (mol/L). The text's reading of the curves: log S = log S₀
  // far on the neutral side, slope ∓1 on the ionised side, and log S = log S₀ + log 2 at pH = pKa.
  it('miconazole (base): log S at pH = pKa is log S₀ + log 2; slope −1 below the pKa', () => {
    const mic = base(6.07);
    expect(log10FreeFormSolubilityM(mic, -5.85, 6.07)).toBeCloseTo(-5.85 + Math.log10(2), 12);
    const slope =
      log10FreeFormSolubilityM(mic, -5.85, 2.0) - log10FreeFormSolubilityM(mic, -5.85, 3.0);
    expect(slope).toBeCloseTo(1, 3);
    expect(log10FreeFormSolubilityM(mic, -5.85, 10)).toBeCloseTo(-5.85, 3);
  });
  it('indomethacin (acid): slope +1 above the pKa, flat at log S₀ below', () => {
    const ind: Protolyte = { pKas: [4.42], mostProtonatedCharge: 0 };
    expect(log10FreeFormSolubilityM(ind, -5.58, 4.42)).toBeCloseTo(-5.58 + Math.log10(2), 12);
    expect(
      log10FreeFormSolubilityM(ind, -5.58, 9) - log10FreeFormSolubilityM(ind, -5.58, 8),
    ).toBeCloseTo(1, 3);
    expect(log10FreeFormSolubilityM(ind, -5.58, 1)).toBeCloseTo(-5.58, 3);
  });
  it('ciprofloxacin (ampholyte): S = S₀(1 + 10^(pH − pKa2) + 10^(pKa1 − pH)), Avdeef eq. 6.7', () => {
    const cip: Protolyte = { pKas: [6.16, 8.62], mostProtonatedCharge: 1 };
    for (const pH of [3, 6.16, 7.39, 8.62, 11]) {
      const expected = -3.72 + Math.log10(1 + 10 ** (pH - 8.62) + 10 ** (6.16 - pH));
      expect(log10FreeFormSolubilityM(cip, -3.72, pH)).toBeCloseTo(expected, 10);
    }
  });
});

const hclSaltOf = (
  pKa: number,
  log10Ksp: number,
  pH: number,
  commonIonM = 0,
): SaltEquilibriumInput => ({
  drug: base(pKa),
  drugIonCharge: 1,
  drugPerSalt: 1,
  counterIon: STRONG_MONOPROTIC,
  counterIonCharge: -1,
  counterIonPerSalt: 1,
  log10Ksp,
  pH,
  commonIonM,
});

describe('numerical mass/charge-balance solver', () => {
  it('agrees with the 1:1 closed form where the dissolved drug is fully ionised (pH ≤ pKa − 6)', () => {
    for (const c of [0, 0.12]) {
      const r = solveSaltSolubility(hclSaltOf(9, -3, 1.2, c));
      const closed = saltLimitedBaseSolubilityM(1e-3, 9, 1.2, c);
      expect(Math.abs(r.drugTotalM / closed - 1)).toBeLessThan(1e-6);
    }
  });
  it('keeps the full mass balance elsewhere: α·s·(s + c) = K_sp exactly', () => {
    const pKa = 7;
    const pH = 6.5;
    const alpha = 1 / (1 + 10 ** (pH - pKa));
    const c = 0.05;
    const r = solveSaltSolubility(hclSaltOf(pKa, -4, pH, c));
    const s = r.formulaUnitsM;
    expect(Math.abs((alpha * s * (s + c)) / 1e-4 - 1)).toBeLessThan(1e-9);
  });
  it('numerical pH_max matches the closed form within 0.001 when pH_max ≤ pKa − 2', () => {
    const drug = { kind: 'base' as const, pKas: [8], ionCharge: 1 };
    const salt = {
      counterIon: STRONG_MONOPROTIC,
      counterIonCharge: -1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -3,
    };
    const num = numericalPhMax(drug, -5, salt);
    const closed = phMaxBase(8, 1e-5, 1e-3);
    expect(num).not.toBeNull();
    expect(Math.abs(num! - closed)).toBeLessThan(1e-3);
  });
  it('pH_max is 4.5 for pKa 8, S₀ 1e-5 M, K_sp 1e-3 (closed form and mass balance)', () => {
    // Hand computation (Bogardus & Blackwood 1979 closed form): 8 + log₁₀(1e-5/√1e-3)
    //   = 8 + log₁₀(1e-5/0.0316228) = 8 − 3.5 = 4.500.
    expect(phMaxBase(8, 1e-5, 1e-3)).toBeCloseTo(4.5, 3);
    const drug = { kind: 'base' as const, pKas: [8], ionCharge: 1 };
    const salt = {
      counterIon: STRONG_MONOPROTIC,
      counterIonCharge: -1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -3,
    };
    expect(numericalPhMax(drug, -5, salt)).toBeCloseTo(4.5, 3);
  });
  it('with 0.1 M chloride pH_max is 5.038: the closed form with the common ion and the mass balance agree', () => {
    // Hand computation: [BH⁺] = (−c + √(c² + 4K_sp))/2 with c = 0.1, K_sp = 1e-3:
    //   √(0.01 + 0.004) = √0.014 = 0.1183216; (0.1183216 − 0.1)/2 = 0.0091608 M;
    //   pH_max = 8 + log₁₀(1e-5/0.0091608) = 8 + log₁₀(1.09161e-3) = 8 − 2.96194 = 5.038.
    expect(commonIonSaltIonM(1e-3, 0.1)).toBeCloseTo(0.0091608, 7);
    expect(phMaxBase(8, 1e-5, 1e-3, 0.1)).toBeCloseTo(5.038, 3);
    // The acid mirror: pKa − log₁₀(S₀/[A⁻]) = 4 − (−2.96194) = 6.962.
    expect(phMaxAcid(4, 1e-5, 1e-3, 0.1)).toBeCloseTo(6.962, 3);
    const drug = { kind: 'base' as const, pKas: [8], ionCharge: 1 };
    const salt = {
      counterIon: STRONG_MONOPROTIC,
      counterIonCharge: -1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -3,
    };
    expect(numericalPhMax(drug, -5, salt, { commonIonM: 0.1 })).toBeCloseTo(5.038, 3);
  });
  it('2:1 salt (hemisulfate): K_sp = (2s·α_D)²·(s·α_X) at the solution', () => {
    // Sulfuric acid pKa₂ = 1.99 (CRC Handbook, "Dissociation constants of inorganic acids and bases"; from memory).
    const sulfuric: Protolyte = { pKas: [-3, 1.99], mostProtonatedCharge: 0 };
    const pH = 2.5;
    const input: SaltEquilibriumInput = {
      drug: base(9),
      drugIonCharge: 1,
      drugPerSalt: 2,
      counterIon: sulfuric,
      counterIonCharge: -2,
      counterIonPerSalt: 1,
      log10Ksp: -6,
      pH,
    };
    const r = solveSaltSolubility(input);
    const aD = 1 / (1 + 10 ** (pH - 9));
    const f = [0, pH + 3, pH + 3 + pH - 1.99].map((l) => 10 ** l);
    const aX = f[2]! / (f[0]! + f[1]! + f[2]!);
    const s = r.formulaUnitsM;
    expect(Math.abs(Math.log10((2 * s * aD) ** 2 * (s * aX)) + 6)).toBeLessThan(1e-9);
    expect(r.drugTotalM).toBeCloseTo(2 * s, 15);
  });
  it('log10KspFromSaltSolubility inverts the solver', () => {
    const input = hclSaltOf(7.5, -2.7, 5, 0.03);
    const r = solveSaltSolubility(input);
    const back = log10KspFromSaltSolubility({ ...input, formulaUnitsM: r.formulaUnitsM });
    expect(back).toBeCloseTo(-2.7, 9);
  });
  it('Davies activity raises the salt’s solubility (γ < 1) and reports the ionic strength', () => {
    const ideal = solveSaltSolubility(hclSaltOf(9, -2, 2));
    const davies = solveSaltSolubility({
      ...hclSaltOf(9, -2, 2),
      activity: { model: 'davies', backgroundIonicStrengthM: 0.1, temperatureK: 310.15 },
    });
    expect(davies.drugTotalM).toBeGreaterThan(ideal.drugTotalM);
    expect(davies.ionicStrengthM).toBeGreaterThan(0.1);
  });
});

describe('profiles and bad input', () => {
  const drug = { kind: 'base' as const, pKas: [7.8], ionCharge: 1 };
  const salt = {
    counterIon: STRONG_MONOPROTIC,
    counterIonCharge: -1,
    drugPerSalt: 1,
    counterIonPerSalt: 1,
    log10Ksp: -3,
  };
  it('covers pH 1.0–8.0 in 0.1 steps with finite values and a pH_max', () => {
    const p = phSolubilityProfile(drug, -5, salt);
    expect(p.points).toHaveLength(71);
    expect(p.points[0]!.pH).toBe(1);
    expect(p.points.at(-1)!.pH).toBe(8);
    expect(p.points.every((q) => Number.isFinite(q.solubilityM) && q.solubilityM > 0)).toBe(true);
    expect(p.phMax).not.toBeNull();
  });
  it('property: the free-form branch of a base never rises with pH and nothing is NaN', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 12, noNaN: true }),
        fc.double({ min: -9, max: 0, noNaN: true }),
        fc.double({ min: -10, max: 0, noNaN: true }),
        (pKa, logS0, logKsp) => {
          const p = phSolubilityProfile(
            { kind: 'base', pKas: [pKa], ionCharge: 1 },
            logS0,
            { ...salt, log10Ksp: logKsp },
            { phStep: 0.5 },
          );
          for (let i = 1; i < p.points.length; i++) {
            expect(p.points[i]!.freeFormLimitedM).toBeLessThanOrEqual(
              p.points[i - 1]!.freeFormLimitedM * (1 + 1e-12),
            );
            expect(Number.isNaN(p.points[i]!.solubilityM)).toBe(false);
          }
        },
      ),
      { numRuns: 50 },
    );
  });
  it('rejects pKa values out of order, pH outside 0–14 and S₀ ≤ 0', () => {
    expect(() =>
      phSolubilityProfile({ kind: 'base', pKas: [8, 4], ionCharge: 1 }, -5, null),
    ).toThrow(ChemInputError);
    expect(() => phSolubilityProfile(drug, -5, null, { phFrom: -1 })).toThrow(ChemInputError);
    expect(() => phSolubilityProfile(drug, -5, null, { phTo: 15 })).toThrow(ChemInputError);
    expect(() => freeBaseSolubilityM(0, 8, 3)).toThrow(ChemInputError);
    expect(() => freeBaseSolubilityM(-1, 8, 3)).toThrow(ChemInputError);
  });
});
