import { describe, expect, it } from 'vitest';
import { idealSolubility, moleFractionToMolPerL } from '@/chem/screening/salt-solubility/fusion';
import { ChemInputError } from '@/chem/result';

describe('Schröder–van Laar ideal solubility', () => {
  it('reproduces the published paracetamol worked example (x = 0.0248, 213.4 g/L)', () => {
    // Source: Wikipedia, "Enthalpy of fusion", section on solubility prediction: paracetamol,
    // ΔH_fus 28.1 kJ/mol, T_m 442 K, water at 298 K, R 8.314 J/(mol·K) → x₂ = 0.0248 and
    // 0.0248 × (1000/18.0153)/(1 − 0.0248) × 151.17 g/mol = 213.4 g/L (measured 240 g/L).
    const r = idealSolubility({
      meltingPointK: 442,
      fusionEnthalpyKJPerMol: 28.1,
      temperatureK: 298,
    });
    expect(Math.abs(r.moleFraction / 0.0248 - 1)).toBeLessThan(0.005); // the example prints 3 figures
    const gramsPerL = moleFractionToMolPerL(r.moleFraction) * 151.17;
    expect(Math.abs(gramsPerL - 213.4)).toBeLessThan(1.0); // the example rounds x to 3 figures
  });

  it('the ΔC_p = ΔS_m variant predicts a higher solubility than ΔC_p = 0 below T_m', () => {
    // Yalkowsky 1999, ch. 3: ln x = −(ΔS_m/R)·ln(T_m/T) ≥ −(ΔH_fus/R)(1/T − 1/T_m) for T < T_m,
    // since ln(T_m/T) ≤ T_m/T − 1.
    const a = idealSolubility({
      meltingPointK: 442,
      fusionEnthalpyKJPerMol: 28.1,
      temperatureK: 298,
    });
    const b = idealSolubility({
      meltingPointK: 442,
      fusionEnthalpyKJPerMol: 28.1,
      temperatureK: 298,
      heatCapacity: 'equal-to-entropy-of-melting',
    });
    expect(b.lnMoleFraction).toBeGreaterThan(a.lnMoleFraction);
    // Closed form of the second variant, computed by hand: ΔS_m = 28100/442 = 63.57 J/(mol K);
    // ln x = −63.57/8.3145 × ln(442/298) = −7.6460 × 0.39424 = −3.0143.
    expect(b.lnMoleFraction).toBeCloseTo(-3.0143, 3);
  });

  it('is 1 at and above the melting point, and refuses impossible inputs', () => {
    expect(
      idealSolubility({ meltingPointK: 300, fusionEnthalpyKJPerMol: 20, temperatureK: 310 })
        .lnMoleFraction,
    ).toBe(0);
    expect(() =>
      idealSolubility({ meltingPointK: Number.NaN, fusionEnthalpyKJPerMol: 20, temperatureK: 310 }),
    ).toThrow(ChemInputError);
    expect(() =>
      idealSolubility({ meltingPointK: 450, fusionEnthalpyKJPerMol: -3, temperatureK: 310 }),
    ).toThrow(ChemInputError);
  });
});
