import type * as OpenChemLib from 'openchemlib';
import { ChemInputError, type Estimate } from '../result';
import { molarMassGPerMol, parseFormula, type ElementCounts } from './formula';
import { readSmilesStrictly } from '../input/structure-check';

/** What the workbench reads from a structure (SMILES). */
export interface ParsedStructure {
  /** Hill formula of the structure as drawn (all fragments). */
  formula: string;
  elements: ElementCounts;
  /** g/mol, IUPAC 2021 standard atomic weights (same table as the counter-ion library). */
  molarMassGPerMol: number;
  /** Sum of formal charges as drawn (0 for a neutral free form). */
  netCharge: number;
  /** Smallest set of smallest rings, split by aromaticity (the volume increments need this). */
  rings: { aromatic: number; nonAromatic: number };
  heavyAtoms: number;
  /** Disconnected fragments (a salt drawn with its counter-ion has two or more). */
  fragments: number;
  /** 2-D drawing as a standalone SVG document. */
  svg: string;
  /** Octanol/water log P computed by openchemlib's increment method — an estimate, labelled so. */
  logP?: Estimate;
  /** Remarks for the user (several fragments, charged structure). */
  notes: string[];
}

/** The chemistry library (loaded on demand) could not be loaded: no verdict on the SMILES is possible. */
export class StructureLibraryUnavailableError extends Error {
  constructor(cause: unknown) {
    super(
      `the chemistry library could not be loaded (${cause instanceof Error ? cause.message : String(cause)})`,
    );
    this.name = 'StructureLibraryUnavailableError';
  }
}

const ACCEPTED = 'an OpenSMILES string of the neutral free form, e.g. CN1CCN(CC1)c1ccc(cc1)C(=O)N';

/** openchemlib's logP increments have a typical error of about half a log unit (from memory; treat as ±0.5). */
const OCL_LOGP_UNCERTAINTY = 0.5;

/**
 * Parse a SMILES string with openchemlib, loaded on first use (`await import`) so the first screen
 * never waits for the ~1 MB library. Ring counts: SSSR size = bonds − atoms + fragments; aromatic
 * rings as openchemlib perceives them.
 * @throws ChemInputError (field `smiles`, or `opts.field`) for an empty, unparsable, incomplete or
 *   several-component SMILES (see {@link readSmilesStrictly}).
 */
export async function parseStructure(
  smiles: string,
  opts: { widthPx?: number; heightPx?: number; field?: string } = {},
): Promise<ParsedStructure> {
  const field = opts.field ?? 'smiles';
  const text = typeof smiles === 'string' ? smiles.trim() : '';
  if (text === '') throw new ChemInputError(field, 'the SMILES is empty', ACCEPTED);
  if (text.length > 2000)
    throw new ChemInputError(field, 'the SMILES is longer than 2000 characters', ACCEPTED);
  let ocl: typeof OpenChemLib;
  try {
    ocl = await import('openchemlib');
  } catch (err) {
    throw new StructureLibraryUnavailableError(err);
  }
  const { MoleculeProperties } = ocl;
  // The one structure check (input/structure-check.ts): whole text, complete parse, one component.
  const mol = readSmilesStrictly(ocl, text, field);
  const heavyAtoms = mol.getAllAtoms();
  if (heavyAtoms === 0) throw new ChemInputError('smiles', 'no atoms found', ACCEPTED);

  const oclFormula = mol.getMolecularFormula().formula;
  const parsed = parseFormula(oclFormula.replace(/[()+-]/g, ''), field);
  let netCharge = 0;
  for (let a = 0; a < heavyAtoms; a++) netCharge += mol.getAtomCharge(a);
  const fragments = mol.getFragments().length;
  const sssr = Math.max(0, mol.getAllBonds() - heavyAtoms + fragments);
  const aromatic = Math.min(sssr, mol.getAromaticRingCount());

  let logP: Estimate | undefined;
  try {
    const value = new MoleculeProperties(mol).logP;
    if (Number.isFinite(value)) {
      logP = {
        value,
        uncertainty: OCL_LOGP_UNCERTAINTY,
        method: 'computed (openchemlib logP increments)',
        sources: [
          'openchemlib MoleculeProperties.logP (atom-type increment method); uncertainty ±0.5 from memory',
        ],
      };
    }
  } catch {
    logP = undefined;
  }

  const notes: string[] = [];
  if (fragments > 1)
    notes.push(`The structure has ${fragments} separate parts; enter the free form alone.`);
  if (netCharge !== 0)
    notes.push(`The structure carries a net charge of ${netCharge}; enter the neutral free form.`);

  return {
    formula: parsed.hill,
    elements: parsed.elements,
    molarMassGPerMol: molarMassGPerMol(parsed.elements),
    netCharge,
    rings: { aromatic, nonAromatic: sssr - aromatic },
    heavyAtoms,
    fragments,
    svg: mol.toSVG(opts.widthPx ?? 320, opts.heightPx ?? 220, 'saltsmith-structure', {
      autoCrop: true,
      autoCropMargin: 10,
    }),
    ...(logP ? { logP } : {}),
    notes,
  };
}
