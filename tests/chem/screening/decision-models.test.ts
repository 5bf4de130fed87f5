import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  activeFraction,
  deltaPka,
  disproportionationRisk,
  doseNumber,
  gseLog10IntrinsicSolubilityM,
  hygroscopicityClass,
  saltDeltaPka,
  saltFormationVerdict,
  saltMassPerDoseMg,
  solubilityClass,
  vantHoffFit,
  debyeHuckelA,
  daviesLog10Gamma,
  phMax,
  phMaxBase,
  phMaxAcid,
} from '@/chem/screening';
import { candidatesFromLibrary, getCounterIon } from '@/chem';
import { ChemInputError } from '@/chem/result';
import { GAS_CONSTANT_KJ_PER_MOL_K } from '@/chem/constants/physical';
import { WATER_MOLAR_MASS_G_PER_MOL } from '@/chem/constants/water';
import { schroderVanLaarLnMoleFraction } from '@/chem/thermo';

describe('ΔpKa rule', () => {
  it('ΔpKa = pKa(BH⁺) − pKa(acid)', () => {
    expect(deltaPka(9.5, 4.76)).toBeCloseTo(4.74, 12);
  });
  it('bands of Cruz-Cabeza 2012 (CrystEngComm 14, 6362): < −1 cocrystal, > 4 salt, between uncertain', () => {
    expect(saltFormationVerdict(-1.01).band).toBe('cocrystal');
    expect(saltFormationVerdict(-1).band).toBe('uncertain');
    expect(saltFormationVerdict(4).band).toBe('uncertain');
    expect(saltFormationVerdict(4.01).band).toBe('salt');
    expect(saltFormationVerdict(4.5).saltProbability).toBeGreaterThanOrEqual(0.95);
    expect(saltFormationVerdict(-2).saltProbability).toBeLessThanOrEqual(0.05);
  });
  it('probability rises with ΔpKa inside the uncertain band (Cruz-Cabeza 2012: roughly linear)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1, max: 3.9, noNaN: true }), (d) => {
        expect(saltFormationVerdict(d + 0.1).saltProbability).toBeGreaterThanOrEqual(
          saltFormationVerdict(d).saltProbability,
        );
      }),
    );
  });
  it('common-practice minimum (≥ 2 by default, Stahl & Wermuth 2002) is a setting', () => {
    expect(saltFormationVerdict(2.5).meetsStableSaltRule).toBe(true);
    expect(
      saltFormationVerdict(2.5, { cocrystalBelow: -1, saltAbove: 4, stableSaltMin: 3 })
        .meetsStableSaltRule,
    ).toBe(false);
  });
  it('uses the proton that makes the salt: sulfate (2−) takes sulfuric acid’s second pKa, hydrogen sulfate its first', () => {
    const drug = { pKas: [8], mostProtonatedCharge: 1 };
    const sulfuric = { pKas: [-3, 1.99], mostProtonatedCharge: 0 };
    expect(saltDeltaPka(drug, 1, sulfuric, -2)).toBeCloseTo(8 - 1.99, 12);
    expect(saltDeltaPka(drug, 1, sulfuric, -1)).toBeCloseTo(11, 12);
  });
  it('a dibasic drug forming a 2+ salt is limited by its lower pKa', () => {
    const drug = { pKas: [3.5, 8.5], mostProtonatedCharge: 2 };
    const hcl = { pKas: [-6], mostProtonatedCharge: 0 };
    expect(saltDeltaPka(drug, 2, hcl, -1)).toBeCloseTo(9.5, 12);
    expect(saltDeltaPka(drug, 1, hcl, -1)).toBeCloseTo(14.5, 12);
  });
  it('the screen leaves out a stoichiometry in the cocrystal band (ΔpKa < −1, Cruz-Cabeza 2012) and lists it as skipped', () => {
    // Acetic acid pKa 4.76 (the library's value). Hand computation: a base with pKa(BH⁺) 3.0 gives
    // ΔpKa = 3.0 − 4.76 = −1.76 < −1: skipped; with pKa 6.0, ΔpKa = 1.24: kept.
    const acetate = getCounterIon('acetate')!;
    const skipped: { id: string; label: string; deltaPka: number }[] = [];
    const weak = candidatesFromLibrary(
      [acetate],
      { kind: 'base', ionCharge: 1, pKas: [3] },
      { skipped },
    );
    expect(weak).toHaveLength(0);
    expect(skipped).toHaveLength(1);
    expect(skipped[0]!.deltaPka).toBeCloseTo(-1.76, 12);
    const kept = candidatesFromLibrary([acetate], { kind: 'base', ionCharge: 1, pKas: [6] });
    expect(kept.map((c) => c.stoichiometry.drugPerSalt)).toEqual([1]);
  });
});

describe('mass cost', () => {
  it('water molar mass from IUPAC standard atomic weights is 18.015 g/mol', () => {
    expect(WATER_MOLAR_MASS_G_PER_MOL).toBeCloseTo(18.015, 3);
  });
  it('active fraction of a hydrochloride monohydrate: M(base)/(M(BH⁺) + M(Cl⁻) + M(H₂O))', () => {
    // Cl 35.45 (IUPAC conventional atomic weight), H 1.008.
    const f = activeFraction({
      freeFormMolarMassGPerMol: 300,
      drugIonMolarMassGPerMol: 301.008,
      counterIonMolarMassGPerMol: 35.45,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      hydrateWater: 1,
    });
    expect(f).toBeCloseTo(300 / (301.008 + 35.45 + 18.015), 9);
    expect(saltMassPerDoseMg(200, f)).toBeCloseTo(200 / f, 9);
  });
  it('2:1 salt counts both drug ions', () => {
    const f = activeFraction({
      freeFormMolarMassGPerMol: 300,
      drugIonMolarMassGPerMol: 301,
      counterIonMolarMassGPerMol: 96,
      drugPerSalt: 2,
      counterIonPerSalt: 1,
    });
    expect(f).toBeCloseTo(600 / 698, 12);
  });
  it('rejects a zero dose', () => {
    expect(() => saltMassPerDoseMg(0, 0.8)).toThrow(ChemInputError);
  });
});

describe('dose number and ICH M9 (2019) solubility class', () => {
  it('D₀ = (dose/250 mL)/S', () => {
    expect(doseNumber(250, 1)).toBeCloseTo(1, 15);
    expect(doseNumber(100, 0.1)).toBeCloseTo(4, 12);
  });
  it('exactly at the limit — the dose dissolves in exactly 250 mL — is highly soluble (ICH M9 §2.1.1: "250 mL or less")', () => {
    const at = solubilityClass(250, [
      { pH: 1.2, solubilityMgPerMl: 5 },
      { pH: 4.5, solubilityMgPerMl: 1 },
      { pH: 6.8, solubilityMgPerMl: 2 },
    ]);
    expect(at.solubilityClass).toBe('high');
    expect(at.worstPh).toBe(4.5);
    expect(at.volumeNeededMl).toBeCloseTo(250, 9);
    const above = solubilityClass(250, [{ pH: 6.8, solubilityMgPerMl: 0.999 }]);
    expect(above.solubilityClass).toBe('low');
  });
  it('only pH 1.2–6.8 counts (ICH M9 §2.1.1)', () => {
    const r = solubilityClass(100, [
      { pH: 1.0, solubilityMgPerMl: 1e-6 },
      { pH: 1.2, solubilityMgPerMl: 10 },
      { pH: 7.5, solubilityMgPerMl: 1e-6 },
    ]);
    expect(r.solubilityClass).toBe('high');
  });
  it('rejects zero dose and zero solubility', () => {
    expect(() => doseNumber(0, 1)).toThrow(ChemInputError);
    expect(() => doseNumber(1, 0)).toThrow(ChemInputError);
  });
});

describe('Ph. Eur. 5.11 hygroscopicity classes at their published limits', () => {
  it.each([
    [0.19, 'non-hygroscopic'],
    [0.2, 'slightly hygroscopic'],
    [1.99, 'slightly hygroscopic'],
    [2, 'hygroscopic'],
    [14.99, 'hygroscopic'],
    [15, 'very hygroscopic'],
  ] as const)('%s %% → %s', (gain, cls) => {
    expect(hygroscopicityClass(gain)).toBe(cls);
  });
  it('deliquescence is reported when the sample liquefied', () => {
    expect(hygroscopicityClass(40, true)).toBe('deliquescent');
  });
});

describe('disproportionation (Serajuddin 2007)', () => {
  it('a base salt with pH_max below the microenvironment pH is at risk', () => {
    expect(disproportionationRisk(5, 7, 'base').risk).toBe('high');
    expect(disproportionationRisk(7.5, 7, 'base').risk).toBe('watch');
    expect(disproportionationRisk(9, 7, 'base').risk).toBe('low');
    expect(disproportionationRisk(9, 7, 'acid').risk).toBe('high');
    expect(disproportionationRisk(null, 7, 'base').risk).toBe('unknown');
  });
});

describe('van ’t Hoff fit', () => {
  it('recovers a known ΔH from exact synthetic data (ln S = −ΔH/RT + c)', () => {
    const dH = 25;
    const pts = [288.15, 298.15, 310.15, 318.15].map((T) => ({
      temperatureK: T,
      solubility: Math.exp(-dH / (GAS_CONSTANT_KJ_PER_MOL_K * T) + 8),
    }));
    const f = vantHoffFit(pts);
    expect(f.solutionEnthalpyKJ.value).toBeCloseTo(25, 9);
    expect(f.standardErrorKJ).toBeLessThan(1e-9);
  });
  it('gives a positive standard error from noisy data that brackets the true value', () => {
    const dH = 25;
    const noise = [0.03, -0.02, 0.01, -0.03, 0.02];
    const pts = [283.15, 293.15, 303.15, 313.15, 323.15].map((T, i) => ({
      temperatureK: T,
      solubility: Math.exp(-dH / (GAS_CONSTANT_KJ_PER_MOL_K * T) + 8 + noise[i]!),
    }));
    const f = vantHoffFit(pts);
    expect(f.standardErrorKJ).toBeGreaterThan(0.05);
    expect(Math.abs(f.solutionEnthalpyKJ.value - dH)).toBeLessThan(3 * f.standardErrorKJ);
  });
  it('rejects fewer than three points and a single temperature', () => {
    expect(() =>
      vantHoffFit([
        { temperatureK: 298, solubility: 1 },
        { temperatureK: 310, solubility: 2 },
      ]),
    ).toThrow(ChemInputError);
    expect(() =>
      vantHoffFit([298, 298, 298].map((t) => ({ temperatureK: t, solubility: 1 }))),
    ).toThrow(/one temperature/);
    expect(() =>
      vantHoffFit([
        { temperatureK: -1, solubility: 1 },
        { temperatureK: 298, solubility: 1 },
        { temperatureK: 310, solubility: 1 },
      ]),
    ).toThrow(ChemInputError);
  });
});

describe('intrinsic solubility', () => {
  it('General Solubility Equation, Jain & Yalkowsky 2001 eq. 1: log S₀ = 0.5 − 0.01(MP − 25) − log P', () => {
    expect(gseLog10IntrinsicSolubilityM(125, 2).value).toBeCloseTo(0.5 - 1 - 2, 12);
    // liquids: the melting term vanishes
    expect(gseLog10IntrinsicSolubilityM(-10, 1).value).toBeCloseTo(-0.5, 12);
  });
  it('Schröder–van Laar: ln x = 0 at the melting point; −2.5056 for ΔH_fus 25 kJ/mol, T_m 400 K, T 300 K', () => {
    expect(schroderVanLaarLnMoleFraction(25000, 400, 400)).toBe(0);
    // Hand computation (ΔC_p = 0): −(25000/8.314462618)·(1/300 − 1/400) = −3006.81 · 8.33333e-4 = −2.50567.
    expect(schroderVanLaarLnMoleFraction(25000, 400, 300)).toBeCloseTo(-2.50567, 4);
    // ΔC_p = ΔS_m: −(25000/400/8.314462618)·ln(400/300) = −7.51702 · 0.287682 = −2.16251.
    expect(
      schroderVanLaarLnMoleFraction(25000, 400, 300, 'equal-to-entropy-of-melting'),
    ).toBeCloseTo(-2.16251, 4);
  });
});

describe('activity and dispatch helpers', () => {
  it('Debye–Hückel A at 25 °C is 0.509 within 1 % (Robinson & Stokes, "Electrolyte Solutions", from memory)', () => {
    expect(Math.abs(debyeHuckelA(298.15) / 0.509 - 1)).toBeLessThan(0.01);
  });
  it('Davies: log γ = −A z² (√I/(1+√I) − 0.3 I), and γ → 1 as I → 0', () => {
    const A = debyeHuckelA(298.15);
    expect(daviesLog10Gamma(2, 0.1)).toBeCloseTo(
      -A * 4 * (Math.sqrt(0.1) / (1 + Math.sqrt(0.1)) - 0.03),
      12,
    );
    expect(Math.abs(daviesLog10Gamma(1, 0))).toBe(0);
  });
  it('phMax dispatches to the base and acid forms', () => {
    expect(phMax('base', 8, 1e-5, 1e-4)).toBe(phMaxBase(8, 1e-5, 1e-4));
    expect(phMax('acid', 4, 1e-5, 1e-4)).toBe(phMaxAcid(4, 1e-5, 1e-4));
  });
});
