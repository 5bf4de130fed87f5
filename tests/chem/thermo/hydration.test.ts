import { describe, expect, it } from 'vitest';
import {
  bornEnthalpyFactor,
  bornHydrationEnthalpyKJ,
  ChemInputError,
  fitBornOffsets,
  getThermoIon,
  hydrationEnthalpyKJ,
  organicIonFromFormula,
} from '@/chem';

describe('Born hydration enthalpy', () => {
  it('water’s bracket [1 − 1/ε − (T/ε²)dε/dT] is about 1.005 at 298.15 K', () => {
    // ε_r = 78.36, dε_r/dT = −0.361 K⁻¹ (Archer & Wang 1990, from memory); the bracket is then ≈ 1.005.
    expect(bornEnthalpyFactor()).toBeCloseTo(1.005, 3);
  });
  it('scales with z² and 1/r', () => {
    expect(bornHydrationEnthalpyKJ(2, 2) / bornHydrationEnthalpyKJ(1, 2)).toBeCloseTo(4, 12);
    expect(bornHydrationEnthalpyKJ(-1, 4) / bornHydrationEnthalpyKJ(-1, 2)).toBeCloseTo(0.5, 12);
    expect(bornHydrationEnthalpyKJ(1, 1.5)).toBeLessThan(0);
  });
  it('rejects zero charge and absurd radii', () => {
    expect(() => bornHydrationEnthalpyKJ(0, 2)).toThrow(ChemInputError);
    expect(() => bornHydrationEnthalpyKJ(1, -1)).toThrow(/effectiveRadiusA/);
    expect(() => bornHydrationEnthalpyKJ(1, 1e6)).toThrow(ChemInputError);
  });
});

describe('hydrationEnthalpyKJ', () => {
  it('returns the published value with its source for a bundled ion (Marcus 1987: Na⁺ −416 kJ/mol)', () => {
    const h = hydrationEnthalpyKJ(getThermoIon('sodium')!);
    expect(h.method).toBe('published');
    expect(h.value).toBe(-416);
    expect(h.sources.join(' ')).toMatch(/Marcus/);
  });
  it('in-sample (Cl⁻ is one of the ions the Born offsets are fitted to): the fitted Born value for Cl⁻ is within 10 % of Marcus 1987 (−367 kJ/mol)', () => {
    const h = hydrationEnthalpyKJ(getThermoIon('chloride')!, { forceBorn: true });
    expect(h.method).toBe('born-fitted');
    expect(Math.abs(h.value / -367 - 1)).toBeLessThan(0.1);
  });
  it('an organic ion gets a wider uncertainty that covers the published tetraethylammonium value within 2σ', () => {
    // Marcus 1994 (Biophys. Chem. 51, 111): ΔH_hyd(N(C₂H₅)₄⁺) ≈ −190 kJ/mol — from memory.
    const ion = organicIonFromFormula('C8H20N', 1, { aromatic: 0, nonAromatic: 0 });
    const h = hydrationEnthalpyKJ(ion);
    const chloride = hydrationEnthalpyKJ(getThermoIon('chloride')!, { forceBorn: true });
    expect(h.uncertainty / Math.abs(h.value)).toBeGreaterThan(
      chloride.uncertainty / Math.abs(chloride.value),
    );
    expect(Math.abs(h.value - -190)).toBeLessThanOrEqual(2 * h.uncertainty);
    expect(h.notes?.join(' ')).toMatch(/organic/);
  });
  it('reports the fit: two offsets and residuals for every fitted ion', () => {
    const f = fitBornOffsets();
    expect(f.rows.length).toBeGreaterThanOrEqual(20);
    for (const r of f.rows) expect(Number.isFinite(r.errorPercent)).toBe(true);
  });
});
