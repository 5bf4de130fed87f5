import { STANDARD_TEMPERATURE_K } from '../constants/physical';
import { ChemInputError, requireFiniteInRange } from '../result';
import { checkFormulaUnit, type CheckedFormulaUnit } from './models/formula-unit';
import { volumeFromDensityNm3 } from './models/vbt/vbt';
import type { SaltThermoRequest, ThermoIon } from './thermo.types';

/**
 * The edge of the thermochemistry engine: a salt request (estimateSaltThermo, rawLattice) is checked
 * here once — the request and its ions present, each ion's charge, whole counts making a neutral
 * formula unit, the temperature — and travels inward as a {@link CheckedSaltRequest}, which only
 * {@link checkSaltRequest} makes. The steps and models inside take it and never check these again.
 */

declare const checkedSaltRequest: unique symbol;

/** A salt request checked by {@link checkSaltRequest}. */
export interface CheckedSaltRequest {
  readonly req: SaltThermoRequest;
  readonly cation: ThermoIon;
  readonly anion: ThermoIon;
  /** Cations and anions per formula unit. */
  readonly p: number;
  readonly q: number;
  /** Charges and counts for the lattice models. */
  readonly formulaUnit: CheckedFormulaUnit;
  /** The request's temperature, or 298.15 K, within 250–400 K. */
  readonly temperatureK: number;
  readonly [checkedSaltRequest]: true;
}

function requireIonObject(ion: ThermoIon, field: string): ThermoIon {
  if (!ion || typeof ion !== 'object')
    throw new ChemInputError(
      field,
      'missing ion',
      'a bundled ion id, a formula with charge, or a SMILES with charge',
    );
  return ion;
}

/** The one check of a salt request; throws ChemInputError naming the field. */
export function checkSaltRequest(req: SaltThermoRequest): CheckedSaltRequest {
  if (!req || typeof req !== 'object')
    throw new ChemInputError(
      'request',
      'missing request',
      'an object with cation, anion, cationsPerFormula, anionsPerFormula',
    );
  const cation = requireIonObject(req.cation, 'cation');
  const anion = requireIonObject(req.anion, 'anion');
  const formulaUnit = checkFormulaUnit(
    {
      cationCharge: cation.charge,
      anionCharge: anion.charge,
      cationsPerFormula: requireCount('cationsPerFormula', req.cationsPerFormula),
      anionsPerFormula: requireCount('anionsPerFormula', req.anionsPerFormula),
    },
    { cationCharge: 'cation.charge', anionCharge: 'anion.charge' },
  );
  const temperatureK = requireFiniteInRange(
    'temperatureK',
    req.temperatureK ?? STANDARD_TEMPERATURE_K,
    250,
    400,
    'K',
  );
  return {
    req,
    cation,
    anion,
    p: formulaUnit.cationsPerFormula,
    q: formulaUnit.anionsPerFormula,
    formulaUnit,
    temperatureK,
  } as CheckedSaltRequest;
}

/** A request's count must be given (the formula unit's default from the charges is for the models' own callers). */
function requireCount(field: string, n: number): number {
  return requireFiniteInRange(field, n, 1, 6);
}

/** Formula-unit volume from the request: given V_m, else density + molar mass, else the ions' volumes summed. */
export function formulaUnitVolume(
  c: CheckedSaltRequest,
):
  | { volumeNm3: number; from: 'given' | 'density' | 'ion-volumes'; relativeSigma: number }
  | undefined {
  const { req, p, q } = c;
  if (req.formulaUnitVolumeNm3 !== undefined) {
    return {
      volumeNm3: requireFiniteInRange(
        'formulaUnitVolumeNm3',
        req.formulaUnitVolumeNm3,
        0.005,
        10,
        'nm³',
      ),
      from: 'given',
      relativeSigma: 0,
    };
  }
  if (req.densityGPerCm3 !== undefined) {
    const saltGPerMol =
      req.molarMassGPerMol ??
      (req.cation.molarMassGPerMol !== undefined && req.anion.molarMassGPerMol !== undefined
        ? p * req.cation.molarMassGPerMol + q * req.anion.molarMassGPerMol
        : undefined);
    if (saltGPerMol === undefined)
      throw new ChemInputError(
        'molarMassGPerMol',
        'a density needs the molar mass of the salt',
        'g/mol, 1–10000',
      );
    return {
      volumeNm3: volumeFromDensityNm3(saltGPerMol, req.densityGPerCm3),
      from: 'density',
      relativeSigma: 0,
    };
  }
  const vc = req.cation.volumeNm3;
  const va = req.anion.volumeNm3;
  if (vc && va) {
    const volumeNm3 = p * vc.value + q * va.value;
    const sigmaNm3 = Math.sqrt((p * vc.uncertainty) ** 2 + (q * va.uncertainty) ** 2);
    return { volumeNm3, from: 'ion-volumes', relativeSigma: sigmaNm3 / volumeNm3 };
  }
  return undefined;
}
