import { ChemInputError } from '../../../result';
import type { ThermoIon } from '../../thermo.types';
import { organicIonFromFormula } from './ion-volume';
import { readSmilesStrictly } from '../../../input/structure-check';

const SMILES_ACCEPTED =
  'a SMILES string (OpenSMILES) of the ion, or of its neutral parent with the charge given separately; up to 500 characters';

/**
 * An ion from a SMILES string, through openchemlib (loaded on demand): atom counts (with implicit
 * hydrogens), ring counts (aromatic / non-aromatic, from the smallest set of smallest rings), then
 * {@link organicIonFromFormula}. If the SMILES is the neutral parent and `charge` is non-zero, a cation adds
 * `charge` protons and an anion loses |charge| protons (the usual salt-forming step), and a note says so.
 * If the SMILES carries formal charges, their sum must equal `charge`.
 */
export async function organicIonFromSmiles(
  smiles: string,
  charge: number,
  opts: { packingCoefficient?: number; label?: string; field?: string } = {},
): Promise<ThermoIon> {
  const field = opts.field ?? 'smiles';
  if (typeof smiles !== 'string' || smiles.trim() === '' || smiles.length > 500) {
    throw new ChemInputError(field, 'empty or too long', SMILES_ACCEPTED);
  }
  // The one structure check (input/structure-check.ts): whole text, complete parse, one component.
  const ocl = await import('openchemlib');
  const mol = readSmilesStrictly(ocl, smiles, field);
  const n = mol.getAllAtoms();
  if (n === 0) throw new ChemInputError(field, `no atoms in "${smiles}"`, SMILES_ACCEPTED);
  const counts: Record<string, number> = {};
  let formalCharge = 0;
  for (let i = 0; i < n; i++) {
    const el = mol.getAtomLabel(i);
    counts[el] = (counts[el] ?? 0) + 1;
    const h = mol.getAllHydrogens(i);
    if (h > 0) counts.H = (counts.H ?? 0) + h;
    formalCharge += mol.getAtomCharge(i);
  }
  const notes: string[] = [];
  if (formalCharge !== charge) {
    if (formalCharge !== 0) {
      throw new ChemInputError(
        'charge',
        `the SMILES carries charge ${formalCharge} but charge ${charge} was given`,
        'the SMILES’s own net charge, or a neutral SMILES with the salt’s ion charge',
      );
    }
    const dh = charge;
    if ((counts.H ?? 0) + dh < 0)
      throw new ChemInputError(
        'charge',
        `cannot remove ${-dh} protons from ${smiles}`,
        'no more protons than the parent has',
      );
    counts.H = (counts.H ?? 0) + dh;
    if (counts.H === 0) delete counts.H;
    notes.push(
      `${dh > 0 ? 'added' : 'removed'} ${Math.abs(dh)} H to make the ${dh > 0 ? 'protonated cation' : 'deprotonated anion'} from the neutral SMILES`,
    );
  }
  const ringSet = mol.getRingSet();
  let aromatic = 0;
  let nonAromatic = 0;
  for (let r = 0; r < ringSet.getSize(); r++) {
    if (ringSet.isAromatic(r)) aromatic++;
    else nonAromatic++;
  }
  const formula = Object.entries(counts)
    .sort(([a], [b]) =>
      a === 'C' ? -1 : b === 'C' ? 1 : a === 'H' ? -1 : b === 'H' ? 1 : a.localeCompare(b),
    )
    .map(([el, c]) => `${el}${c === 1 ? '' : c}`)
    .join('');
  const ion = organicIonFromFormula(formula, charge, { aromatic, nonAromatic }, opts);
  return {
    ...ion,
    sources: [
      ...ion.sources,
      'structure from SMILES via openchemlib (ring perception: smallest set of smallest rings)',
      ...notes,
    ],
  };
}
