import type * as OpenChemLib from 'openchemlib';
import { hillFormula, parseFormula, withHydrogens } from '../../compound/formula';
import { ChemInputError } from '../../result';

/**
 * Computed descriptors of a counter-ion, read from the structure of its neutral parent acid or base
 * (what the salt is made from) by openchemlib's property calculators: the octanol/water log P
 * (openchemlib's atom-increment method), the topological polar surface area (Ertl, Rohde & Selzer
 * 2000, J. Med. Chem. 43, 3714), hydrogen-bond donor and acceptor counts, aromatic rings and heavy
 * atoms. They carry the counter-ion's hydrophobicity and hydrogen bonding into the salt-solubility
 * model. Where the parent has no carbon (HCl, H₂SO₄, NaOH) the organic descriptors are still computed
 * but the `inorganic` flag lets the model treat the small inorganic ions as their own group.
 */
export interface CounterIonDescriptors {
  /** log P of the parent's largest fragment, clipped to [−4, 6] (zwitterion drawings give extreme values). */
  logPParent: number;
  /** Topological polar surface area of the parent, Å². */
  polarSurfaceAreaA2: number;
  hBondDonors: number;
  hBondAcceptors: number;
  aromaticRings: number;
  /** Non-hydrogen atoms of the parent. */
  heavyAtoms: number;
  /** True when the parent contains no carbon (halides, sulfate, phosphate, nitrate, metal hydroxides). */
  inorganic: boolean;
}

/** Range the log P descriptor is clipped to, log units (our choice: the span of drug-salt counter-ions). */
export const LOGP_PARENT_CLIP: readonly [number, number] = [-4, 6];

type Ocl = typeof OpenChemLib;

/**
 * The parent with its hydroxide components removed: a metal or quaternary hydroxide (NaOH,
 * Ca(OH)₂, choline hydroxide) enters the salt as its cation only, the OH⁻ leaving as water, so
 * "[Na+].[OH-]" and "[Na+]" describe the same counter-ion.
 */
export function withoutHydroxide(parentSmiles: string): string {
  const parts = parentSmiles.trim().split('.');
  const kept = parts.filter((p) => p !== '[OH-]' && p !== '[O-][H]');
  return kept.length ? kept.join('.') : parentSmiles.trim();
}

/**
 * Descriptors of a parent acid or base from its SMILES. `ocl` is the openchemlib module, passed in so
 * that the core never loads it statically (the app and the CLI load it on demand).
 * @throws ChemInputError (field `smiles`) for an unparsable SMILES.
 */
export function counterIonDescriptorsFromSmiles(
  ocl: Ocl,
  parentSmiles: string,
): CounterIonDescriptors {
  let mol: InstanceType<Ocl['Molecule']>;
  try {
    mol = ocl.Molecule.fromSmiles(withoutHydroxide(parentSmiles));
  } catch (err) {
    throw new ChemInputError(
      'smiles',
      `cannot read the counter-ion's parent SMILES (${err instanceof Error ? err.message : String(err)})`,
      'an OpenSMILES string of the neutral parent acid or base',
    );
  }
  const formula = mol.getMolecularFormula().formula;
  const inorganic = !/C(?![a-z])/.test(formula);
  // Largest fragment by heavy atoms: the organic part of "C[N+](C)(C)C.[OH-]" style parents.
  const fragments = mol.getFragments();
  let largest = fragments[0] ?? mol;
  if (fragments.length <= 1) largest = mol;
  for (const f of fragments) if (f.getAllAtoms() > largest.getAllAtoms()) largest = f;
  const props = new ocl.MoleculeProperties(largest);
  const wholeProps = new ocl.MoleculeProperties(mol);
  const [lo, hi] = LOGP_PARENT_CLIP;
  return {
    logPParent: Math.min(hi, Math.max(lo, props.logP)),
    polarSurfaceAreaA2: wholeProps.polarSurfaceArea,
    hBondDonors: wholeProps.donorCount,
    hBondAcceptors: wholeProps.acceptorCount,
    aromaticRings: mol.getAromaticRingCount(),
    heavyAtoms: mol.getAtoms(),
    inorganic,
  };
}

/** A counter-ion read from its parent's SMILES: the ion as it sits in the salt, and its descriptors. */
export interface CounterIonFromParent {
  /** Hill formula of the counter-ion in the salt (charge given separately). */
  ionFormula: string;
  /** Hill formula of the parent as drawn. */
  parentFormula: string;
  rings: { aromatic: number; nonAromatic: number };
  descriptors: CounterIonDescriptors;
}

/**
 * The counter-ion a parent acid or base gives in a salt with charge `charge`: a hydroxide parent loses
 * its OH⁻ (NaOH → Na⁺, choline hydroxide → choline), a parent drawn already with that charge
 * ([Na+]) stays as drawn, a neutral acid gives up |z| protons and a neutral base takes up z.
 * @throws ChemInputError (field `smiles`) for an unreadable SMILES or a parent whose drawn charge is
 * neither 0 nor `charge`.
 */
export function counterIonFromParentSmiles(
  ocl: Ocl,
  parentSmiles: string,
  charge: number,
): CounterIonFromParent {
  const descriptors = counterIonDescriptorsFromSmiles(ocl, parentSmiles);
  const mol = ocl.Molecule.fromSmiles(parentSmiles);
  const parentFormula = mol.getMolecularFormula().formula;
  let net = 0;
  for (let a = 0; a < mol.getAllAtoms(); a++) net += mol.getAtomCharge(a);
  const total = mol.getRingSet().getSize();
  const aromatic = mol.getAromaticRingCount();
  const rings = { aromatic, nonAromatic: Math.max(0, total - aromatic) };
  const hydroxides = parentSmiles.split('.').filter((p) => p.trim() === '[OH-]').length;
  const el = { ...parseFormula(parentFormula).elements };
  let ionFormula: string;
  if (hydroxides > 0) {
    el.O = (el.O ?? 0) - hydroxides;
    el.H = (el.H ?? 0) - hydroxides;
    ionFormula = hillFormula(el);
  } else if (net === charge) {
    ionFormula = parentFormula;
  } else if (net === 0) {
    ionFormula = hillFormula(withHydrogens(el, charge, 'smiles'));
  } else {
    throw new ChemInputError(
      'smiles',
      `the structure carries charge ${net}, the counter-ion ${charge}`,
      'the neutral parent acid or base, or the ion drawn with the same charge',
    );
  }
  return { ionFormula, parentFormula, rings, descriptors };
}

/**
 * The neutral parent of an ion drawn with its charge, for the descriptors: charged N, O and S atoms
 * are given back their protons (a carboxylate or sulfonate O⁻ → OH, an ammonium N⁺–H → N). A
 * quaternary N⁺ without hydrogen stays charged — such a cation has no neutral parent.
 * @throws ChemInputError (field `smiles`) for an unreadable SMILES.
 */
export function neutralParentSmiles(ocl: Ocl, ionSmiles: string): string {
  let mol: InstanceType<Ocl['Molecule']>;
  try {
    mol = ocl.Molecule.fromSmiles(ionSmiles);
  } catch (err) {
    throw new ChemInputError(
      'smiles',
      `cannot read the ion's SMILES (${err instanceof Error ? err.message : String(err)})`,
      'an OpenSMILES string of the ion',
    );
  }
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    const z = mol.getAtomicNo(a);
    const q = mol.getAtomCharge(a);
    if (q === 0 || (z !== 7 && z !== 8 && z !== 16)) continue;
    if (q < 0 || mol.getAllHydrogens(a) > 0) mol.setAtomCharge(a, 0);
  }
  mol.ensureHelperArrays(ocl.Molecule.cHelperNeighbours);
  return mol.toIsomericSmiles();
}
