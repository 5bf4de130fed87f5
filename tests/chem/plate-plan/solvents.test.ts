import { describe, expect, it } from 'vitest';
import { getSolvent, PARENT_HANDLING, PARENT_SOLUBILITIES, getCounterIon, SOLVENTS } from '@/chem';

/**
 * The solvent table against the ICH Q3C(R8) guideline (Step 4, 22 April 2021) and its Option 1
 * equation: concentration limit (ppm) = 1000 × PDE (mg/day) / 10 g/day.
 */
describe('solvent table: ICH Q3C(R8) classes and limits', () => {
  it('gives a Class 2 solvent its PDE and limit from Table 2', () => {
    // ICH Q3C(R8) Table 2: acetonitrile 4.1 mg/day, 410 ppm; THF 7.2, 720; toluene 8.9, 890; methanol 30.0, 3000
    expect(getSolvent('acetonitrile')).toMatchObject({
      ichQ3cClass: 2,
      ichPdeMgPerDay: 4.1,
      ichConcentrationLimitPpm: 410,
    });
    expect(getSolvent('tetrahydrofuran')).toMatchObject({
      ichQ3cClass: 2,
      ichPdeMgPerDay: 7.2,
      ichConcentrationLimitPpm: 720,
    });
    expect(getSolvent('toluene')).toMatchObject({
      ichQ3cClass: 2,
      ichPdeMgPerDay: 8.9,
      ichConcentrationLimitPpm: 890,
    });
    expect(getSolvent('methanol')).toMatchObject({
      ichQ3cClass: 2,
      ichPdeMgPerDay: 30,
      ichConcentrationLimitPpm: 3000,
    });
    // Table 2: dichloromethane 6.0 / 600, 1,4-dioxane 3.8 / 380
    expect(getSolvent('dichloromethane')).toMatchObject({
      ichPdeMgPerDay: 6,
      ichConcentrationLimitPpm: 600,
    });
    expect(getSolvent('1-4-dioxane')).toMatchObject({
      ichPdeMgPerDay: 3.8,
      ichConcentrationLimitPpm: 380,
    });
  });

  it('every Class 2 limit follows Option 1: ppm = 1000 × PDE / 10 g', () => {
    for (const s of SOLVENTS.filter((x) => x.ichQ3cClass === 2)) {
      expect(s.ichConcentrationLimitPpm, s.id).toBeCloseTo((1000 * s.ichPdeMgPerDay!) / 10, 6);
    }
  });

  it('Class 3 at 50 mg/day and 5000 ppm; 2-MeTHF in Class 3 since R8; water unclassed', () => {
    for (const id of [
      'ethanol',
      'acetone',
      'ethyl-acetate',
      'heptane',
      'dimethyl-sulfoxide',
      '2-propanol',
    ]) {
      expect(getSolvent(id), id).toMatchObject({
        ichQ3cClass: 3,
        ichPdeMgPerDay: 50,
        ichConcentrationLimitPpm: 5000,
      });
    }
    expect(getSolvent('2-methyltetrahydrofuran')!.ichQ3cClass).toBe(3); // Q3C(R8): PDE 50 mg/day
    expect(getSolvent('water')!.ichQ3cClass).toBeNull();
  });

  it('keeps the five Class 1 solvents of Table 1 with their limits, for refusal', () => {
    // ICH Q3C(R8) Table 1: benzene 2, carbon tetrachloride 4, 1,2-dichloroethane 5, 1,1-dichloroethene 8,
    // 1,1,1-trichloroethane 1500 ppm
    const class1 = Object.fromEntries(
      SOLVENTS.filter((s) => s.ichQ3cClass === 1).map((s) => [s.id, s.ichConcentrationLimitPpm]),
    );
    expect(class1).toEqual({
      benzene: 2,
      'carbon-tetrachloride': 4,
      '1-2-dichloroethane': 5,
      '1-1-dichloroethene': 8,
      '1-1-1-trichloroethane': 1500,
    });
  });

  it('physical data within handbook ranges; every row names its sources', () => {
    // CRC Handbook: water boils at 100.0 °C, ε_r 78.4 at 25 °C, density 0.997 g/mL at 25 °C
    expect(getSolvent('water')).toMatchObject({
      boilingPointC: 100,
      dielectricConstant: 78.4,
      densityGPerMl: 0.997,
    });
    // CRC Handbook: dichloromethane is denser than water (1.326 g/mL at 20 °C)
    expect(getSolvent('dichloromethane')!.densityGPerMl).toBeGreaterThan(1.3);
    const ids = SOLVENTS.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids.length).toBeGreaterThanOrEqual(20);
    for (const s of SOLVENTS) {
      expect(s.id).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(s.sources.physical).toMatch(/CRC Handbook/);
      expect(s.sources.ich).toMatch(/ICH Q3C\(R8\)/);
    }
  });
});

describe('counter-ion handling data', () => {
  it('refers only to library ions and bundled solvents, each with a source', () => {
    for (const h of PARENT_HANDLING) {
      expect(getCounterIon(h.ionId), h.ionId).toBeDefined();
      expect(h.source).toMatch(/CRC Handbook/);
      if (h.form === 'liquid') expect(h.densityGPerMl).toBeGreaterThan(0.5);
    }
    for (const s of PARENT_SOLUBILITIES) {
      expect(getCounterIon(s.ionId), s.ionId).toBeDefined();
      expect(getSolvent(s.solventId), s.solventId).toBeDefined();
      expect(s.source).toMatch(/from memory/);
    }
  });
});
