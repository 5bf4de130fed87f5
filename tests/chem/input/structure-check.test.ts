import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import * as OCL from 'openchemlib';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import {
  ChemInputError,
  COUNTER_IONS,
  organicIonFromSmiles,
  parseStructure,
  readSmilesStrictly,
} from '@/chem';

// The one structure check. Each refused case below was accepted before (issue 18: openchemlib read
// `CN1CCN(CC1)c1ccc(cc1)C(` as a smaller molecule, `CCN garbage` as CCN, `CCN.Cl` was ranked in the app).
const SEED = 18_004;

const refusal = (smiles: string, field = '--smiles') => {
  try {
    readSmilesStrictly(OCL, smiles, field);
    return undefined;
  } catch (err) {
    expect(err).toBeInstanceOf(ChemInputError);
    expect((err as ChemInputError).field).toBe(field);
    return (err as ChemInputError).message;
  }
};

describe('readSmilesStrictly', () => {
  it.each([
    ['CN1CCN(CC1)c1ccc(cc1)C(', /not closed/],
    ['CCN(', /not closed/],
    ['CCN[', /"\[" at character 4 is not closed/],
    ['CCN%', /"%"/],
    ['CCN garbage', /space/],
    ['C1CC((((', /not closed/],
    ['CCN.Cl', /several components/],
    ['CCN)', /closes no branch/],
    ['C1CC', /dangling ring closure/],
    ['CC=', /dangling open bond/],
    ['C(C)(C)(C)(C)C', /valence/],
    ['CC[N+', /not closed/],
    ['CC[]', /names no atom/],
    ['.CCN', /several components/],
    ['', /empty/],
  ])('refuses %j, naming the field', (smiles, why) => {
    expect(refusal(smiles)).toMatch(why);
  });

  it('accepts complete structures, with explicit hydrogens, isotopes, charges and ring-bond numbers', () => {
    for (const s of [
      'CN1CCN(CC1)c1ccc(cc1)C(=O)N',
      '[H]C([H])([H])[H]',
      '[2H]C',
      'C%12CC%12',
      'C[C@@H](O)C(=O)O',
      '[O-][N+](=O)C',
      'C[N+](C)(C)C',
      'Brc1ccccc1Cl',
    ])
      expect(refusal(s)).toBeUndefined();
  });

  it('accepts every structure bundled in the counter-ion library and the published reference data', () => {
    const rows = (file: string) =>
      Papa.parse<Record<string, string>>(readFileSync(`fixtures/reference/${file}`, 'utf8'), {
        header: true,
        skipEmptyLines: true,
      }).data;
    const smiles = [
      ...COUNTER_IONS.flatMap((i) => [i.ionSmiles, i.parent.smiles]),
      ...rows('salt-solubility.csv').map((r) => r.counter_ion_parent_smiles),
      ...rows('salt-solubility-drugs.csv').map((r) => r.drug_smiles),
    ].filter((s): s is string => typeof s === 'string' && s.trim() !== '');
    expect(smiles.length).toBeGreaterThan(100);
    for (const s of smiles) {
      const ok = refusal(s, 'x');
      // A quaternary hydroxide is the one two-part structure the library writes.
      if (ok !== undefined) expect(s).toMatch(/\.\[OH-\]$/);
    }
  });

  it('never accepts a prefix of a bundled structure that is cut inside a branch or a bracket (random cuts)', () => {
    const whole = COUNTER_IONS.map((i) => i.parent.smiles).filter((s) => !s.includes('.'));
    fc.assert(
      fc.property(fc.nat(), fc.nat(), (pick, cut) => {
        const s = whole[pick % whole.length]!;
        const prefix = s.slice(0, 1 + (cut % s.length));
        const openBranches =
          [...prefix].filter((c) => c === '(').length - [...prefix].filter((c) => c === ')').length;
        const openBracket = prefix.lastIndexOf('[') > prefix.lastIndexOf(']');
        const msg = refusal(prefix);
        if (openBranches > 0 || openBracket) expect(msg).toBeDefined();
        // Whatever is accepted was read completely: its canonical form reads back to the same formula.
        if (msg === undefined) {
          const mol = readSmilesStrictly(OCL, prefix, 'x');
          const again = OCL.Molecule.fromSmiles(mol.toSmiles());
          expect(again.getMolecularFormula().formula).toBe(mol.getMolecularFormula().formula);
        }
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  it('is what parseStructure and organicIonFromSmiles use, with the caller’s field name', async () => {
    await expect(parseStructure('CN1CCN(CC1)c1ccc(cc1)C(', { field: '--smiles' })).rejects.toThrow(
      /^--smiles: .*not closed/,
    );
    await expect(parseStructure('C1CC((((')).rejects.toThrow(/^smiles: /);
    await expect(
      organicIonFromSmiles('CCN garbage', 1, { field: 'cation.smiles' }),
    ).rejects.toThrow(/^cation\.smiles: .*space/);
  });
});
