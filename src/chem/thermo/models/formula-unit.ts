import { saltStoichiometryFromCharges } from '../../compound/salt-stoichiometry';
import { ChemInputError, requireFiniteInRange } from '../../result';

declare const checkedFormulaUnit: unique symbol;

/**
 * The ions' charges and counts of a formula unit M_pX_q, checked once by {@link checkFormulaUnit}:
 * whole charges +1…+4 and −4…−1, whole counts 1–6, p·z₊ + q·z₋ = 0. The lattice models
 * (Kapustinskii, Born–Mayer/Born–Landé, VBT) take this type, so they never check charges or counts
 * again and cannot be handed unchecked ones.
 */
export interface CheckedFormulaUnit {
  readonly cationCharge: number;
  readonly anionCharge: number;
  readonly cationsPerFormula: number;
  readonly anionsPerFormula: number;
  readonly [checkedFormulaUnit]: true;
}

/** The names the caller's fields go by in error messages (`cationCharge`, or `cation.charge` for a request). */
export interface FormulaUnitFields {
  cationCharge: string;
  anionCharge: string;
}

const PARAMETER_FIELDS: FormulaUnitFields = {
  cationCharge: 'cationCharge',
  anionCharge: 'anionCharge',
};

function requireCharge(z: unknown, field: string, sign: 1 | -1): number {
  if (
    typeof z !== 'number' ||
    !Number.isInteger(z) ||
    z === 0 ||
    Math.abs(z) > 4 ||
    Math.sign(z) !== sign
  ) {
    throw new ChemInputError(
      field,
      `charge ${String(z)} is not allowed for the ${sign > 0 ? 'cation' : 'anion'}`,
      sign > 0 ? 'whole numbers +1…+4' : 'whole numbers −4…−1',
    );
  }
  return z;
}

/**
 * The one check of a formula unit's charges and counts. Counts left out are the lowest-terms
 * balance of the charges (MX₂ for +2 and −1). Throws ChemInputError naming the field.
 */
export function checkFormulaUnit(
  u: {
    cationCharge: number;
    anionCharge: number;
    cationsPerFormula?: number | undefined;
    anionsPerFormula?: number | undefined;
  },
  fields: FormulaUnitFields = PARAMETER_FIELDS,
): CheckedFormulaUnit {
  const zc = requireCharge(u.cationCharge, fields.cationCharge, 1);
  const za = requireCharge(u.anionCharge, fields.anionCharge, -1);
  const lowest = saltStoichiometryFromCharges(zc, za);
  const p = requireFiniteInRange(
    'cationsPerFormula',
    u.cationsPerFormula ?? lowest.drugPerSalt,
    1,
    6,
  );
  const q = requireFiniteInRange(
    'anionsPerFormula',
    u.anionsPerFormula ?? lowest.counterIonPerSalt,
    1,
    6,
  );
  if (!Number.isInteger(p) || !Number.isInteger(q))
    throw new ChemInputError(
      'stoichiometry',
      'ion counts must be whole numbers',
      'whole numbers 1–6',
    );
  if (p * zc + q * za !== 0) {
    throw new ChemInputError(
      'stoichiometry',
      `${p}×(${zc}) + ${q}×(${za}) ≠ 0: the formula unit is not neutral`,
      'counts with p·z₊ = q·|z₋|',
    );
  }
  return {
    cationCharge: zc,
    anionCharge: za,
    cationsPerFormula: p,
    anionsPerFormula: q,
  } as CheckedFormulaUnit;
}
