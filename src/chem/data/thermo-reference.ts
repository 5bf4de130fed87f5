import { FORMATION_ENTHALPY_CHECKS } from './thermo-reference.data';
import type { FormationState } from './thermo-reference.types';
import { SRC } from './thermo-sources';

/**
 * Published reference data the thermochemistry engine is checked and calibrated against. The values
 * live in fixtures/reference/thermo-reference.json (every row with its source, and the notes on what
 * was checked against which copy); thermo-reference.data.ts is generated from it by
 * fixtures/reference/generate-thermo-data.mjs — edit the JSON, not the TypeScript.
 */
export type * from './thermo-reference.types';
export * from './thermo-reference.data';

/** The source of one ΔfH° value: the NBS tables plus the copy it was checked against, or "from memory". */
export function formationEnthalpySource(species: string, state: FormationState): string {
  const check = FORMATION_ENTHALPY_CHECKS[`${species}|${state}`];
  if (!check) return `${SRC.nbs1982} — from memory`;
  return check.startsWith('CODATA') ? check : `${SRC.nbs1982}; ${check}`;
}
