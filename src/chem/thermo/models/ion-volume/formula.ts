/**
 * Formulas are read by the one parser in src/chem/compound/formula.ts. This file only keeps the old
 * import path alive for src/chem/thermo/validation/reference.ts (owned and being edited elsewhere).
 * @deprecated import `formulaMolarMassGPerMol` from '../../../compound/formula' instead.
 */
export { formulaMolarMassGPerMol as molarMassGPerMol } from '../../../compound/formula';
