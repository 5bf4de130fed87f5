/**
 * The shape every estimate in the core returns: a value, its one-standard-uncertainty, the method
 * that produced it and the published sources it leans on. Units live in the field that holds the
 * result (for instance `latticeEnthalpyKJ: Estimate`), never in a bare number.
 */
export interface Estimate {
  /** Best estimate, in the unit the owning field names. */
  value: number;
  /** Standard uncertainty (1σ) in the same unit, from the model's measured error where one exists. */
  uncertainty: number;
  /** Short machine-readable method id, e.g. `kapustinskii`, `vbt`, `born-fitted`, `published`. */
  method: string;
  /** Human-readable citations of the sources behind this value. */
  sources: string[];
  /** Optional remarks: assumptions made, warnings, why a method was chosen. */
  notes?: string[];
}

/** A typed, user-facing input error: names the field and what was accepted. */
export class ChemInputError extends Error {
  readonly field: string;
  readonly accepted: string;
  constructor(field: string, message: string, accepted: string) {
    super(`${field}: ${message} (accepted: ${accepted})`);
    this.name = 'ChemInputError';
    this.field = field;
    this.accepted = accepted;
  }
}

/** A finite number within [min, max]: exactly when requireFiniteInRange would not throw. */
export const finiteWithin = (x: unknown, min: number, max: number): x is number =>
  typeof x === 'number' && Number.isFinite(x) && x >= min && x <= max;

const acceptedRange = (min: number, max: number, unit: string) =>
  `a finite number from ${min} to ${max}${unit ? ' ' + unit : ''}`;

/** Throw a {@link ChemInputError} unless `x` is a finite number within [min, max]. */
export function requireFiniteInRange(
  field: string,
  x: unknown,
  min: number,
  max: number,
  unit = '',
): number {
  // the accepted range is put in words only when the check fails (hot loops call this)
  if (typeof x !== 'number' || !Number.isFinite(x)) {
    throw new ChemInputError(
      field,
      `expected a number, got ${String(x)}`,
      acceptedRange(min, max, unit),
    );
  }
  if (x < min || x > max) {
    throw new ChemInputError(field, `${x} is out of range`, acceptedRange(min, max, unit));
  }
  return x;
}
