import { MADELUNG_CONSTANTS } from '@/chem';

/** The lattice methods, as the core names them. */
export const LATTICE_METHODS = ['auto', 'kapustinskii', 'born-mayer', 'born-lande', 'vbt'] as const;

/** Crystal structure types with a Madelung constant in the core (Born–Mayer, Born–Landé). */
export const STRUCTURE_TYPES = Object.keys(MADELUNG_CONSTANTS) as [string, ...string[]];

/**
 * Ranges of the measured sizes a request may give. The core refuses the same ranges when a method is
 * asked for by name; under `auto` it would drop an out-of-range size and choose another method, so
 * `lattice` and `eval` check them first.
 */
export const SIZE_RANGES = {
  /** nm³ per formula unit (the core's VBT range). */
  formulaUnitVolumeNm3: { min: 0.005, max: 10 },
  /** g/cm³ (the core's density range). */
  densityGPerCm3: { min: 0.3, max: 25 },
  /** g/mol of the salt formula unit. */
  molarMassGPerMol: { min: 1, max: 10000 },
} as const;
