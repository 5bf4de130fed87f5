import type * as OpenChemLib from 'openchemlib';

/** The drugs of the published salt-solubility set (salt-solubility-drugs.csv) read for the fit. */

/** One CSV record as plain strings (parsed by the caller). */
export type CsvRecord = Record<string, string | undefined>;

type Ocl = typeof OpenChemLib;

/** A number from a CSV cell; empty or unreadable: null. */
export function num(s: string | undefined): number | null {
  if (s === undefined) return null;
  const t = s.trim();
  if (t === '') return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : null;
}

export interface DrugInfo {
  id: string;
  name: string;
  kind: 'base' | 'acid';
  molarMassGPerMol: number;
  formula: string;
  rings: { aromatic: number; nonAromatic: number };
  log10IntrinsicM: number;
  logP: number;
  pKa: number;
  source: string;
}

function ringsOf(mol: InstanceType<Ocl['Molecule']>): { aromatic: number; nonAromatic: number } {
  const total = mol.getRingSet().getSize();
  const aromatic = mol.getAromaticRingCount();
  return { aromatic, nonAromatic: Math.max(0, total - aromatic) };
}

export function parseDrug(ocl: Ocl, r: CsvRecord): DrugInfo | string {
  const id = (r.drug_id ?? '').trim();
  const kind = (r.drug_kind ?? '').trim();
  if (!id) return 'no drug_id';
  if (kind !== 'base' && kind !== 'acid') return `drug ${id}: kind must be base or acid`;
  let mol: InstanceType<Ocl['Molecule']>;
  try {
    mol = ocl.Molecule.fromSmiles((r.drug_smiles ?? '').trim());
  } catch {
    return `drug ${id}: unreadable SMILES`;
  }
  const mf = mol.getMolecularFormula();
  const s0 = num(r.intrinsic_solubility_mg_per_ml);
  const pKa = num(r.pka);
  if (s0 !== null && s0 <= 0) return `drug ${id}: intrinsic solubility must be > 0`;
  if (pKa === null) return `drug ${id}: no pKa`;
  const props = new ocl.MoleculeProperties(mol);
  const logPIn = num(r.log_p);
  const logP = logPIn ?? props.logP;
  // Without a read S₀ the free form's solubility is openchemlib's own log S estimate (mol/L), labelled
  // so in the report: the drug's series still informs the within-series ranking.
  const log10IntrinsicM = s0 !== null ? Math.log10(s0 / mf.relativeWeight) : props.logS;
  return {
    id,
    name: (r.drug_name ?? id).trim(),
    kind,
    molarMassGPerMol: mf.relativeWeight,
    formula: mf.formula,
    rings: ringsOf(mol),
    log10IntrinsicM,
    logP,
    pKa,
    source:
      s0 !== null ? (r.s0_source ?? '').trim() : 'S₀ not read: openchemlib log S estimate used',
  };
}
