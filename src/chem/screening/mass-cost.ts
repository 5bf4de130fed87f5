import { ChemInputError, requireFiniteInRange } from '../result';

import { WATER_MOLAR_MASS_G_PER_MOL } from '../constants/water';

export interface SaltMassInput {
  /** Molar mass of the free (neutral) drug, g/mol — the dose is expressed as free form. */
  freeFormMolarMassGPerMol: number;
  /** Molar mass of the drug ion in the salt (free form ± transferred protons), g/mol. */
  drugIonMolarMassGPerMol: number;
  /** Molar mass of the counter-ion in its salt charge state, g/mol. */
  counterIonMolarMassGPerMol: number;
  drugPerSalt: number;
  counterIonPerSalt: number;
  /** Water (or other solvate, as water equivalents) per formula unit. */
  hydrateWater?: number;
}

/** Molar mass of the salt's formula unit, g/mol: m·M(drug ion) + n·M(counter-ion) + w·M(H₂O). */
export function saltMolarMassGPerMol(i: SaltMassInput): number {
  requireFiniteInRange('freeFormMolarMass', i.freeFormMolarMassGPerMol, 1, 1e5, 'g/mol');
  requireFiniteInRange('drugIonMolarMass', i.drugIonMolarMassGPerMol, 1, 1e5, 'g/mol');
  requireFiniteInRange('counterIonMolarMass', i.counterIonMolarMassGPerMol, 1, 1e5, 'g/mol');
  // in this order (every candidate of every screen comes here: no pair arrays built per call)
  requireCount('drugPerSalt', i.drugPerSalt);
  requireCount('counterIonPerSalt', i.counterIonPerSalt);
  const w = requireFiniteInRange(
    'hydrateWater',
    i.hydrateWater ?? 0,
    0,
    20,
    'molecules per formula unit',
  );
  return (
    i.drugPerSalt * i.drugIonMolarMassGPerMol +
    i.counterIonPerSalt * i.counterIonMolarMassGPerMol +
    w * WATER_MOLAR_MASS_G_PER_MOL
  );
}

/** A count of ions per formula unit: an integer from 1 to 4. */
function requireCount(field: string, v: number): void {
  if (!Number.isInteger(v) || v < 1 || v > 4)
    throw new ChemInputError(field, `${v} is not allowed`, 'an integer from 1 to 4');
}

/**
 * Active fraction f = m·M(free drug) / M(salt formula unit incl. hydrate water) — the share of the
 * salt's mass that is the drug as free form (Stahl & Wermuth 2002, ch. on salt
 * selection, where heavy counter-ions are noted to cost tablet mass).
 */
export function activeFraction(i: SaltMassInput): number {
  return (i.drugPerSalt * i.freeFormMolarMassGPerMol) / saltMolarMassGPerMol(i);
}

/** Mass of salt that delivers a dose of free form: dose / f, mg. */
export function saltMassPerDoseMg(doseMg: number, fraction: number): number {
  if (!(Number.isFinite(doseMg) && doseMg > 0))
    throw new ChemInputError('doseMg', `must be greater than zero, got ${doseMg}`, 'a dose > 0 mg');
  requireFiniteInRange('activeFraction', fraction, 1e-6, 1);
  return doseMg / fraction;
}
