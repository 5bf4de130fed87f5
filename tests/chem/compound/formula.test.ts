import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import * as OCL from 'openchemlib';
import { ChemInputError } from '@/chem/result';
import {
  ATOMIC_WEIGHTS_G_PER_MOL,
  drugIon,
  formatIonFormula,
  formulaMolarMassGPerMol,
  hillFormula,
  parseFormula,
  parseStructure,
} from '@/chem/compound';

describe('molecular formulas', () => {
  it('reads the usual ways of writing a formula', () => {
    expect(parseFormula('C18H20ClN3O').hill).toBe('C18H20ClN3O');
    expect(parseFormula('Ca(OH)2').elements).toEqual({ Ca: 1, O: 2, H: 2 });
    expect(parseFormula('CuSO4·5H2O').elements).toEqual({ Cu: 1, S: 1, O: 9, H: 10 });
    expect(parseFormula('CH3SO3-')).toMatchObject({ charge: -1, hill: 'CH3O3S' });
    expect(parseFormula('SO4^2-')).toMatchObject({ charge: -2, hill: 'O4S' });
    expect(parseFormula('C4H12N2(2+)')).toMatchObject({ charge: 2 });
  });

  it('reads a charge written after a space, as superscripts, as repeated signs or with a true minus', () => {
    // Sulfate is SO4 with charge 2− (IUPAC Red Book 2005, IR-4.4) however the charge is typed.
    for (const written of ['SO4 2-', 'SO4²⁻', 'SO4--', 'SO4^2−', 'SO4 2−']) {
      expect(parseFormula(written), written).toMatchObject({ charge: -2, hill: 'O4S' });
    }
    expect(parseFormula('NH4⁺')).toMatchObject({ charge: 1, hill: 'H4N' });
    // Digits run straight into a bare sign belong to the formula: SO42- is 42 oxygens with charge −1.
    expect(parseFormula('SO42-').elements).toEqual({ S: 1, O: 42 });
  });

  it('refuses unknown elements and unreadable text with the field named', () => {
    expect(() => parseFormula('C6H6Xx')).toThrow(ChemInputError);
    expect(() => parseFormula('C6H6Xx')).toThrow(/unknown element 'Xx'/);
    expect(() => parseFormula('C6H6Tc')).toThrow(/no bundled standard atomic weight/);
    expect(() => parseFormula('C6(H6')).toThrow(/unmatched/);
    expect(() => parseFormula('')).toThrow(/empty/);
    expect(() => parseFormula('C6 H6 !')).toThrow(/unexpected '!'/);
  });

  it('molar masses agree with openchemlib for drug-like formulas (IUPAC standard atomic weights)', () => {
    // Reference: openchemlib's relativeWeight for the same molecule; tolerance 0.02 g/mol.
    for (const smiles of [
      'CN1CCN(CC1)c1ccc(cc1)C(=O)Nc1ccc(Cl)cc1',
      'CC(=O)Oc1ccccc1C(=O)O',
      'OC(=O)CC(O)(CC(=O)O)C(=O)O',
      'FC(F)(F)c1ccc(Br)cc1I',
      'CP(=O)(O)O',
    ]) {
      const f = OCL.Molecule.fromSmiles(smiles).getMolecularFormula();
      expect(Math.abs(formulaMolarMassGPerMol(f.formula) - f.relativeWeight)).toBeLessThan(0.02);
    }
  });

  it('Hill order round-trips for any atom counts (property)', () => {
    const syms = Object.keys(ATOMIC_WEIGHTS_G_PER_MOL);
    fc.assert(
      fc.property(
        fc.dictionary(fc.constantFrom(...syms), fc.integer({ min: 1, max: 60 }), {
          minKeys: 1,
          maxKeys: 6,
        }),
        (counts) => {
          expect(parseFormula(hillFormula(counts)).elements).toEqual(counts);
        },
      ),
    );
  });

  it('writes charges as superscripts', () => {
    expect(formatIonFormula('O4S', -2)).toBe('SO4²⁻');
    expect(formatIonFormula('Na', 1)).toBe('Na⁺');
  });

  it('shows small inorganic ions in the usual order (IUPAC Red Book 2005, IR-4.4) and organic ones in Hill order', () => {
    expect(formatIonFormula('HO4S', -1)).toBe('HSO4⁻');
    expect(formatIonFormula('H2O4P', -1)).toBe('H2PO4⁻');
    expect(formatIonFormula('NO3', -1)).toBe('NO3⁻');
    expect(formatIonFormula('ClO4', -1)).toBe('ClO4⁻');
    expect(formatIonFormula('HO', -1)).toBe('OH⁻');
    expect(formatIonFormula('H4N', 1)).toBe('NH4⁺');
    expect(formatIonFormula('CO3', -2)).toBe('CO3²⁻');
    expect(formatIonFormula('CH3O3S', -1)).toBe('CH3O3S⁻');
  });
});

describe('structures (openchemlib, loaded lazily)', () => {
  it('reads formula, mass, rings and a picture; computed logP is labelled', async () => {
    // Aspirin, C9H8O4, 180.16 g/mol (molar mass in pharmacopoeial monographs, e.g. Ph. Eur. "Acetylsalicylic acid").
    const s = await parseStructure('CC(=O)Oc1ccccc1C(=O)O');
    expect(s.formula).toBe('C9H8O4');
    expect(s.molarMassGPerMol).toBeCloseTo(180.16, 2);
    expect(s.rings).toEqual({ aromatic: 1, nonAromatic: 0 });
    expect(s.svg).toMatch(/^<svg/);
    expect(s.logP?.method).toMatch(/computed/);
    expect(s.netCharge).toBe(0);
  });

  it('counts fused and bridged rings as the smallest set of smallest rings', async () => {
    // Camphor: bicyclo[2.2.1] skeleton, two rings in the SSSR (cyclomatic number).
    expect((await parseStructure('CC1(C)C2CCC1(C)C(=O)C2')).rings).toEqual({
      aromatic: 0,
      nonAromatic: 2,
    });
    expect((await parseStructure('c1ccc2ccccc2c1')).rings).toEqual({ aromatic: 2, nonAromatic: 0 });
  });

  it('turns a bad SMILES into a field message', async () => {
    await expect(parseStructure('C1CC(')).rejects.toThrow(
      /smiles: "C1CC\(" is not a complete SMILES/,
    );
    await expect(parseStructure('   ')).rejects.toThrow(/empty/);
  });
});

describe('drug ion', () => {
  it('protonates a base and deprotonates an acid', async () => {
    const s = await parseStructure('CC(=O)Oc1ccccc1C(=O)O');
    const anion = drugIon({ kind: 'acid', ionCharge: -1, formula: '' }, s);
    expect(anion).toMatchObject({ formula: 'C9H7O4', charge: -1, ringsKnown: true });
    // Molar mass difference = one hydrogen, IUPAC 2021 abridged H = 1.008.
    expect(anion.freeFormMolarMassGPerMol - anion.molarMassGPerMol).toBeCloseTo(1.008, 6);
    const cation = drugIon({ kind: 'base', ionCharge: 2, formula: 'C4H10N2' });
    expect(cation).toMatchObject({
      formula: 'C4H12N2',
      charge: 2,
      ringsKnown: false,
      formulaFrom: 'formula',
    });
  });

  it('notes a typed formula that disagrees with the structure', async () => {
    const s = await parseStructure('CCO');
    expect(drugIon({ kind: 'base', ionCharge: 1, formula: 'C2H7N' }, s).notes[0]).toMatch(
      /differs/,
    );
  });

  it('refuses impossible input', () => {
    expect(() => drugIon({ kind: 'base', ionCharge: 1, formula: '' })).toThrow(
      /formula: give a SMILES or a molecular formula/,
    );
    expect(() => drugIon({ kind: 'acid', ionCharge: -2, formula: 'CO' })).toThrow(
      /cannot remove 2 hydrogen/,
    );
    expect(() => drugIon({ kind: 'acid', ionCharge: 0, formula: 'CH4' })).toThrow(/ionCharge/);
  });
});
