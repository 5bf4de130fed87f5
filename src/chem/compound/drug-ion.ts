import { ChemInputError } from '../result';
import type { Compound } from './compound.schema';
import {
  hillFormula,
  molarMassGPerMol,
  parseFormula,
  sameElements,
  withHydrogens,
  type ElementCounts,
} from './formula';
import type { ParsedStructure } from './structure';

/** The salt-forming drug ion derived from the neutral free form. */
export interface DrugIon {
  /** Hill formula of the ion (free form ± n H). */
  formula: string;
  elements: ElementCounts;
  /** +n for a base protonated n times, −n for an acid deprotonated n times. */
  charge: number;
  /** g/mol, IUPAC 2021 standard atomic weights (electron mass ignored). */
  molarMassGPerMol: number;
  freeFormFormula: string;
  freeFormMolarMassGPerMol: number;
  /** Ring counts, known only when a structure was parsed. */
  rings: { aromatic: number; nonAromatic: number };
  ringsKnown: boolean;
  /** Where the free-form formula came from. */
  formulaFrom: 'structure' | 'formula';
  notes: string[];
}

/**
 * Derive the drug ion: a base gains n protons (charge +n), an acid loses n (charge −n), n = |ionCharge|.
 * The free-form formula comes from the parsed structure when given, else from the typed formula.
 * @throws ChemInputError when neither is usable or an acid has too few hydrogen atoms.
 */
export function drugIon(
  compound: Pick<Compound, 'kind' | 'ionCharge' | 'formula'>,
  structure?: Pick<ParsedStructure, 'elements' | 'rings'>,
): DrugIon {
  const n = Math.abs(compound.ionCharge);
  if (!Number.isInteger(n) || n < 1 || n > 3) {
    throw new ChemInputError(
      'ionCharge',
      `charge ${compound.ionCharge} is not usable`,
      '±1, ±2 or ±3',
    );
  }
  const notes: string[] = [];
  let free: ElementCounts;
  let freeHill: string | null = null;
  let formulaFrom: DrugIon['formulaFrom'];
  if (structure) {
    free = structure.elements;
    formulaFrom = 'structure';
    if (compound.formula.trim() !== '') {
      try {
        const typed = parseFormula(compound.formula, 'formula').elements;
        if (!sameElements(typed, free)) {
          notes.push(
            `The typed formula ${compound.formula} differs from the structure's ${hillFormula(free)}; the structure is used.`,
          );
        }
      } catch {
        notes.push('The typed formula cannot be read; the structure is used.');
      }
    }
  } else {
    if (compound.formula.trim() === '') {
      throw new ChemInputError(
        'formula',
        'give a SMILES or a molecular formula',
        'a molecular formula such as C18H20ClN3O',
      );
    }
    const parsed = parseFormula(compound.formula, 'formula');
    free = parsed.elements;
    freeHill = parsed.hill; // hillFormula(free), made by the parse
    formulaFrom = 'formula';
  }
  const charge = compound.kind === 'base' ? n : -n;
  const ion = withHydrogens(free, compound.kind === 'base' ? n : -n, 'formula');
  return {
    formula: hillFormula(ion),
    elements: ion,
    charge,
    molarMassGPerMol: molarMassGPerMol(ion),
    freeFormFormula: freeHill ?? hillFormula(free),
    freeFormMolarMassGPerMol: molarMassGPerMol(free),
    rings: structure ? { ...structure.rings } : { aromatic: 0, nonAromatic: 0 },
    ringsKnown: Boolean(structure),
    formulaFrom,
    notes,
  };
}
