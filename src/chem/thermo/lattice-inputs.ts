import { ChemInputError, requireFiniteInRange } from '../result';
import { volumeFromDensityNm3 } from './models/vbt/vbt';
import type { SaltThermoRequest, ThermoIon } from './thermo.types';

/**
 * The checks a salt request passes at the edge of the thermochemistry engine (estimateSaltThermo,
 * rawLattice): each ion's charge, a neutral formula unit, and the formula-unit volume the request gives.
 */

export function requireIon(ion: ThermoIon, field: string, sign: 1 | -1): ThermoIon {
  if (!ion || typeof ion !== 'object')
    throw new ChemInputError(
      field,
      'missing ion',
      'a bundled ion id, a formula with charge, or a SMILES with charge',
    );
  const z = ion.charge;
  if (
    typeof z !== 'number' ||
    !Number.isInteger(z) ||
    z === 0 ||
    Math.abs(z) > 4 ||
    Math.sign(z) !== sign
  ) {
    throw new ChemInputError(
      `${field}.charge`,
      `charge ${String(z)} is not allowed for the ${field}`,
      sign > 0 ? 'whole numbers +1…+4' : 'whole numbers −4…−1',
    );
  }
  return ion;
}

/** Check p·z₊ + q·z₋ = 0 and the counts' ranges; returns p, q. */
export function requireBalanced(
  req: Pick<SaltThermoRequest, 'cation' | 'anion' | 'cationsPerFormula' | 'anionsPerFormula'>,
) {
  const p = requireFiniteInRange('cationsPerFormula', req.cationsPerFormula, 1, 6);
  const q = requireFiniteInRange('anionsPerFormula', req.anionsPerFormula, 1, 6);
  if (!Number.isInteger(p) || !Number.isInteger(q))
    throw new ChemInputError(
      'stoichiometry',
      'ion counts must be whole numbers',
      'whole numbers 1–6',
    );
  if (p * req.cation.charge + q * req.anion.charge !== 0) {
    throw new ChemInputError(
      'stoichiometry',
      `${p}×(${req.cation.charge}) + ${q}×(${req.anion.charge}) ≠ 0: the formula unit is not neutral`,
      'counts with p·z₊ = q·|z₋|',
    );
  }
  return { p, q };
}

/** Formula-unit volume from the request: given V_m, else density + molar mass, else the ions' volumes summed. */
export function formulaUnitVolume(
  req: SaltThermoRequest,
  p: number,
  q: number,
):
  | { volumeNm3: number; from: 'given' | 'density' | 'ion-volumes'; relativeSigma: number }
  | undefined {
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
