import { describe, expect, it } from 'vitest';
import { freeFormVolumeNm3, formulaMolarMassGPerMol } from '@/chem/compound';

describe('free-form volume per formula unit', () => {
  it('cell and density routes agree for rock salt', () => {
    // NaCl: cubic a = 5.6402 Å, Z = 4; density 2.165 g/cm³ (CRC Handbook, "Physical Constants of Inorganic
    // Compounds" and crystal-structure tables — from memory). Both routes must give ≈ 0.0449 nm³.
    const a = 5.6402;
    const cell = freeFormVolumeNm3({
      molarMassGPerMol: formulaMolarMassGPerMol('NaCl'),
      cellVolumeA3: a ** 3,
      formulaUnitsPerCell: 4,
    })!;
    const dens = freeFormVolumeNm3({
      molarMassGPerMol: formulaMolarMassGPerMol('NaCl'),
      densityGPerCm3: 2.165,
    })!;
    expect(cell.method).toBe('cell');
    expect(dens.method).toBe('density');
    expect(Math.abs(cell.value / dens.value - 1)).toBeLessThan(0.005);
    expect(cell.value).toBeCloseTo(0.04486, 4);
  });

  it('prefers the cell, needs both cell volume and Z, and returns null with neither', () => {
    expect(
      freeFormVolumeNm3({
        molarMassGPerMol: 100,
        densityGPerCm3: 1.2,
        cellVolumeA3: 1000,
        formulaUnitsPerCell: 4,
      })!.method,
    ).toBe('cell');
    expect(() => freeFormVolumeNm3({ molarMassGPerMol: 100, cellVolumeA3: 1000 })).toThrow(/both/);
    expect(freeFormVolumeNm3({ molarMassGPerMol: 100 })).toBeNull();
    expect(() => freeFormVolumeNm3({ molarMassGPerMol: 100, densityGPerCm3: -1 })).toThrow(
      /densityGPerCm3/,
    );
  });
});
