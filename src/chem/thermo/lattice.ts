import { STANDARD_TEMPERATURE_K } from '../constants/physical';
import { ChemInputError, requireFiniteInRange } from '../result';
import {
  bornLandePotentialKJ,
  bornMayerPotentialKJ,
  isStructureType,
  nearestDistanceFromVolumeA,
  requireStructureType,
} from './models/born-mayer/born-mayer';
import {
  KAPUSTINSKII_K_KJ_A_PER_MOL,
  kapustinskiiPotentialKJ,
  requireIonCharges,
} from './models/kapustinskii/kapustinskii';
import { latticeEnthalpyCorrectionKJ } from './models/lattice-correction';
import { volumeFromDensityNm3, vbtPotentialKJ } from './models/vbt/vbt';
import type { LatticeMethod, SaltThermoRequest, ThermoIon } from './thermo.types';

/** A raw lattice computation before calibration: U_POT, ΔH_L and what went in. */
export interface RawLattice {
  method: LatticeMethod;
  potentialKJ: number;
  enthalpyKJ: number;
  /** Formula-unit volume used (VBT) and where it came from. */
  volumeNm3?: number;
  volumeFrom?: 'given' | 'density' | 'ion-volumes';
  /** Relative uncertainty of the input volume (for ion-volume sums), fraction. */
  volumeRelU?: number;
  /** Shortest cation–anion distance used (Born–Mayer), Å, and where it came from. */
  nearestDistanceA?: number;
  distanceFrom?: 'volume' | 'radii';
  detail: string;
}

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

/** Compute the lattice by one named method, without calibration. Throws ChemInputError if the inputs do not allow it. */
export function rawLattice(
  req: SaltThermoRequest,
  method: LatticeMethod,
  opts: { kapustinskiiK?: number; kapustinskiiRadii?: { cation: number; anion: number } } = {},
): RawLattice {
  const cation = requireIon(req.cation, 'cation', 1);
  const anion = requireIon(req.anion, 'anion', -1);
  requireIonCharges(cation.charge, anion.charge);
  const { p, q } = requireBalanced(req);
  const temperatureK = requireFiniteInRange(
    'temperatureK',
    req.temperatureK ?? STANDARD_TEMPERATURE_K,
    250,
    400,
    'K',
  );
  const correctionKJ = latticeEnthalpyCorrectionKJ(p, cation.shape, q, anion.shape, temperatureK);
  const done = (partial: Omit<RawLattice, 'enthalpyKJ' | 'method'>): RawLattice => ({
    method,
    ...partial,
    enthalpyKJ: partial.potentialKJ + correctionKJ,
  });
  switch (method) {
    case 'kapustinskii': {
      const rcA = opts.kapustinskiiRadii?.cation ?? cation.radiusA?.value;
      const raA = opts.kapustinskiiRadii?.anion ?? anion.radiusA?.value;
      if (rcA === undefined)
        throw new ChemInputError(
          'cation.radiusA',
          `${cation.label} has no radius`,
          'an ion with a radius or volume',
        );
      if (raA === undefined)
        throw new ChemInputError(
          'anion.radiusA',
          `${anion.label} has no radius`,
          'an ion with a radius or volume',
        );
      const potentialKJ = kapustinskiiPotentialKJ({
        cationCharge: cation.charge,
        anionCharge: anion.charge,
        cationRadiusA: rcA,
        anionRadiusA: raA,
        ionsPerFormulaUnit: p + q,
        constantKJA: opts.kapustinskiiK ?? KAPUSTINSKII_K_KJ_A_PER_MOL,
      });
      return done({
        potentialKJ,
        detail: `r₊ = ${rcA.toFixed(3)} Å, r₋ = ${raA.toFixed(3)} Å, ν = ${p + q}`,
      });
    }
    case 'born-mayer':
    case 'born-lande': {
      if (req.structureType === undefined)
        throw new ChemInputError(
          'structureType',
          `${method} needs a structure type`,
          'rock-salt, caesium-chloride, zinc-blende, wurtzite, fluorite, rutile',
        );
      const s = requireStructureType(req.structureType);
      const vol = formulaUnitVolume(req, p, q);
      let nearestA: number | undefined;
      let from: 'volume' | 'radii' = 'volume';
      if (vol && vol.from !== 'ion-volumes')
        nearestA = nearestDistanceFromVolumeA(s, vol.volumeNm3);
      if (nearestA === undefined) {
        const rcA = cation.crystalRadiusA?.value ?? cation.radiusA?.value;
        const raA = anion.crystalRadiusA?.value ?? anion.radiusA?.value;
        if (rcA === undefined || raA === undefined)
          throw new ChemInputError(
            'radius',
            'Born–Mayer needs a cell volume or both ions’ radii',
            'a formula-unit volume, a density, or bundled ions',
          );
        nearestA = rcA + raA;
        from = 'radii';
      }
      const base = {
        cationCharge: cation.charge,
        anionCharge: anion.charge,
        structureType: s,
        nearestDistanceA: nearestA,
      };
      if (method === 'born-mayer') {
        return done({
          potentialKJ: bornMayerPotentialKJ(base),
          nearestDistanceA: nearestA,
          distanceFrom: from,
          detail: `${s}, r₀ = ${nearestA.toFixed(3)} Å (${from === 'volume' ? 'from the cell volume' : 'sum of radii'})`,
        });
      }
      const nc = cation.bornExponent;
      const na = anion.bornExponent;
      if (nc === undefined || na === undefined)
        throw new ChemInputError(
          'bornExponent',
          'Born–Landé needs monatomic ions with a noble-gas shell',
          'bundled monatomic ions',
        );
      const n = (p * nc + q * na) / (p + q);
      return done({
        potentialKJ: bornLandePotentialKJ({ ...base, bornExponent: n }),
        nearestDistanceA: nearestA,
        distanceFrom: from,
        detail: `${s}, r₀ = ${nearestA.toFixed(3)} Å, n = ${n.toFixed(2)}`,
      });
    }
    case 'vbt': {
      const vol = formulaUnitVolume(req, p, q);
      if (!vol)
        throw new ChemInputError(
          'formulaUnitVolumeNm3',
          'VBT needs a formula-unit volume, a density, or ions with volumes',
          '0.005–10 nm³',
        );
      const r = vbtPotentialKJ({
        cationCharge: cation.charge,
        anionCharge: anion.charge,
        cationsPerFormula: p,
        anionsPerFormula: q,
        formulaUnitVolumeNm3: vol.volumeNm3,
      });
      return done({
        potentialKJ: r.valueKJ,
        volumeNm3: vol.volumeNm3,
        volumeFrom: vol.from,
        volumeRelU: vol.relativeSigma,
        detail: `V_m = ${vol.volumeNm3.toFixed(4)} nm³ (${vol.from}); ${r.form}`,
      });
    }
    default:
      throw new ChemInputError(
        'method',
        `unknown method ${String(method)}`,
        'auto, kapustinskii, born-mayer, born-lande, vbt',
      );
  }
}

export { isStructureType };
