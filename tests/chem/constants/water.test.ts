import { describe, expect, it } from 'vitest';
import {
  WATER_MOLAR_MASS_G_PER_MOL,
  WATER_RELATIVE_PERMITTIVITY_298K,
  waterRelativePermittivity,
} from '@/chem/constants/water';
import { debyeHuckelA } from '@/chem/screening/activity';

describe('water: one definition of each property', () => {
  it('molar mass 18.015 g/mol (hand computation from CIAAW 2021: 2 × 1.008 + 15.999)', () => {
    expect(WATER_MOLAR_MASS_G_PER_MOL).toBeCloseTo(18.015, 6);
  });

  it('the temperature function gives the 298.15 K permittivity 78.36 (CRC fit, Archer & Wang 1990)', () => {
    // Hand computation: 249.21 − 0.79069·298.15 + 0.00072997·298.15² = 249.21 − 235.744 + 64.890 = 78.355.
    expect(waterRelativePermittivity(298.15)).toBeCloseTo(78.355, 2);
    expect(
      Math.abs(waterRelativePermittivity(298.15) - WATER_RELATIVE_PERMITTIVITY_298K),
    ).toBeLessThan(0.01);
    // CRC fit at 310.15 K: 249.21 − 245.232 + 70.218 = 74.196 (37 °C).
    expect(waterRelativePermittivity(310.15)).toBeCloseTo(74.196, 2);
  });

  it('the Debye–Hückel A at 25 °C is within 0.5 % of the tabulated 0.509 (Robinson & Stokes; from memory)', () => {
    // Hand computation: 1.8248e6 · (78.355 · 298.15)^(−3/2) = 1.8248e6 / 3.5707e6 = 0.5110.
    expect(debyeHuckelA(298.15)).toBeCloseTo(0.511, 3);
    expect(Math.abs(debyeHuckelA(298.15) / 0.509 - 1)).toBeLessThan(0.005);
  });
});
