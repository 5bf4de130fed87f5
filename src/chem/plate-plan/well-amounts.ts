import { parentHandling, parentSolubility, type ParentForm } from './counter-ion-handling.data';
import type { StockSolution } from './plate-plan.schema';

/**
 * The arithmetic of one well, in named steps (units in the names):
 *   n(drug) / mmol = m / mg ÷ M(free form) / (g/mol)
 *   n(parent) / mmol = equivalents × n(drug)
 *   m(parent) / mg = n(parent) / mmol × M(parent) / (g/mol)
 *   neat liquid: V / µL = m / mg ÷ ρ / (g/mL)         (1 mg ÷ 1 g/mL = 1 µL)
 *   stock solution: V / µL = 1000 × n / mmol ÷ c / (mol/L)
 */

export function drugMmol(apiMg: number, freeFormMolarMassGPerMol: number): number {
  return apiMg / freeFormMolarMassGPerMol;
}

export function parentMg(parentMmol: number, parentMolarMassGPerMol: number): number {
  return parentMmol * parentMolarMassGPerMol;
}

export function neatLiquidUl(massMg: number, densityGPerMl: number): number {
  return massMg / densityGPerMl;
}

export function stockUl(parentMmol: number, molarMolPerL: number): number {
  return (1000 * parentMmol) / molarMolPerL;
}

export interface CounterIonDose {
  mmol: number;
  mg: number;
  /** µL of neat liquid or of stock solution; null for a solid weighed in. */
  ul: number | null;
  dosing: ParentForm | 'stock';
}

/** How much of a counter-ion's parent goes into a well, and how (weighed, by volume, or from a stock). */
export function counterIonDose(
  ion: { id: string; parent: { molarMassGPerMol: number } },
  apiMmol: number,
  equivalents: number,
  stock: StockSolution | undefined,
): CounterIonDose {
  const mmol = equivalents * apiMmol;
  const mg = parentMg(mmol, ion.parent.molarMassGPerMol);
  if (stock) return { mmol, mg, ul: stockUl(mmol, stock.molar), dosing: 'stock' };
  const handling = parentHandling(ion.id);
  if (handling?.form === 'liquid' && handling.densityGPerMl !== null) {
    return { mmol, mg, ul: neatLiquidUl(mg, handling.densityGPerMl), dosing: 'liquid' };
  }
  return { mmol, mg, ul: null, dosing: handling?.form ?? 'solid' };
}

/**
 * A warning when the parent is known to dissolve poorly in the well's solvent: either the well needs
 * more than its tabulated solubility (mg of parent per mL of solvent = g/L), or the source says it is
 * practically insoluble there. Null when nothing is known against it. Not checked for a stock solution.
 */
export function poorSolubilityWarning(
  ionId: string,
  parentName: string,
  solventId: string,
  parentMassMg: number,
  solventUl: number,
): string | null {
  const known = parentSolubility(ionId, solventId);
  if (!known) return null;
  if (known.solubilityGPerL === null) return `${known.statement} (${known.source}).`;
  const neededGPerL = parentMassMg / (solventUl / 1000);
  if (neededGPerL <= known.solubilityGPerL) return null;
  return `${parentName}: the well needs ${neededGPerL.toPrecision(3)} g/L; ${known.statement} (${known.source}) — it will not all dissolve.`;
}
