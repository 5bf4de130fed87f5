import { readFileSync } from 'node:fs';
import * as OCL from 'openchemlib';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { readSmilesStrictly } from '@/chem';

// Issue 16 item 7: example and demo structures must be invented. Two "fictional" batch compounds were
// the structures of marketed drugs (ibuprofen and procainamide, structures from memory, listed below so
// they can never come back). Each example structure must parse completely, be none of those drugs nor
// any drug of the published reference data, and have the acidic or basic group its row claims.
const KNOWN_DRUGS: Record<string, string> = {
  ibuprofen: 'CC(C)Cc1ccc(cc1)C(C)C(=O)O',
  procainamide: 'CCN(CC)CCNC(=O)c1ccc(N)cc1',
};

const csvRows = (path: string) =>
  Papa.parse<Record<string, string>>(
    readFileSync(path, 'utf8')
      .split('\n')
      .filter((l) => !l.startsWith('#'))
      .join('\n'),
    { header: true, skipEmptyLines: true },
  ).data;

const idCode = (smiles: string) => OCL.Molecule.fromSmiles(smiles).getIDCode();

type Mol = InstanceType<typeof OCL.Molecule>;
/** A carboxylic acid: an O–H on a carbon that also carries a C=O. */
const hasCarboxylicAcid = (m: Mol) =>
  Array.from({ length: m.getAllAtoms() }, (_, a) => a).some((o) => {
    if (m.getAtomicNo(o) !== 8 || m.getAllHydrogens(o) !== 1 || m.getConnAtoms(o) !== 1)
      return false;
    const c = m.getConnAtom(o, 0);
    return Array.from({ length: m.getConnAtoms(c) }, (_, k) => k).some(
      (k) => m.getAtomicNo(m.getConnAtom(c, k)) === 8 && m.getConnBondOrder(c, k) === 2,
    );
  });
/** An aliphatic amine: a non-aromatic N with single bonds only, none to a carbonyl or an aromatic atom. */
const hasAliphaticAmine = (m: Mol) =>
  Array.from({ length: m.getAllAtoms() }, (_, a) => a).some((n) => {
    if (m.getAtomicNo(n) !== 7 || m.isAromaticAtom(n)) return false;
    return Array.from({ length: m.getConnAtoms(n) }, (_, k) => k).every((k) => {
      const c = m.getConnAtom(n, k);
      if (m.getConnBondOrder(n, k) !== 1 || m.isAromaticAtom(c)) return false;
      return Array.from({ length: m.getConnAtoms(c) }, (_, j) => j).every(
        (j) => !(m.getConnBondOrder(c, j) === 2 && m.getAtomicNo(m.getConnAtom(c, j)) === 8),
      );
    });
  });

describe('the invented example structures', () => {
  const references = new Set([
    ...Object.values(KNOWN_DRUGS).map(idCode),
    ...csvRows('fixtures/reference/salt-solubility-drugs.csv')
      .map((r) => r.drug_smiles ?? '')
      .filter((s) => s.trim() !== '')
      .map(idCode),
  ]);
  const batch = csvRows('fixtures/batch/fictional-compounds.csv').filter((r) => r.smiles);
  const demo = JSON.parse(readFileSync('fixtures/demo/demorazine.json', 'utf8')) as {
    smiles: string;
  };

  it('the batch example says it is invented', () => {
    expect(readFileSync('fixtures/batch/fictional-compounds.csv', 'utf8')).toMatch(
      /every structure[\s\S]*is invented/,
    );
    expect(batch.length).toBeGreaterThanOrEqual(3);
    expect(batch.every((r) => /\(fictional\)$/.test(r.name!))).toBe(true);
  });

  it.each([
    ...batch.map((r) => [r.id!, r.smiles!, r.kind!] as const),
    ['demo', demo.smiles, 'base'] as const,
  ])(
    '%s (%s, a weak %s): parses completely, is no known drug, has the acid or base group',
    (_id, smiles, kind) => {
      const mol = readSmilesStrictly(OCL, smiles, 'smiles');
      expect(references.has(mol.getIDCode())).toBe(false);
      if (kind === 'acid') expect(hasCarboxylicAcid(mol)).toBe(true);
      else expect(hasAliphaticAmine(mol)).toBe(true);
    },
  );

  it('the check itself recognises the drugs that used to be there', () => {
    expect(references.has(idCode('CC(C)Cc1ccc(cc1)C(C)C(=O)O'))).toBe(true);
    expect(hasCarboxylicAcid(OCL.Molecule.fromSmiles(KNOWN_DRUGS.ibuprofen!))).toBe(true);
    expect(hasAliphaticAmine(OCL.Molecule.fromSmiles(KNOWN_DRUGS.procainamide!))).toBe(true);
    expect(hasAliphaticAmine(OCL.Molecule.fromSmiles('c1ccccc1NC(C)=O'))).toBe(false);
  });
});
