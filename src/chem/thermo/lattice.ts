import { ChemInputError } from '../result';
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
} from './models/kapustinskii/kapustinskii';
import { latticeEnthalpyCorrectionKJ } from './models/lattice-correction';
import { vbtPotentialKJ, vbtPotentialValueKJ } from './models/vbt/vbt';
import { checkSaltRequest, formulaUnitVolume, type CheckedSaltRequest } from './lattice-inputs';
import type { LatticeMethod, SaltThermoRequest } from './thermo.types';

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

type LatticeOptions = {
  kapustinskiiK?: number;
  kapustinskiiRadii?: { cation: number; anion: number };
};
type PotentialPart = Omit<RawLattice, 'enthalpyKJ' | 'method'>;

/** The radii Kapustinskii uses (the options' or the ions'); throws when an ion has none. */
function kapustinskiiRadii(
  c: CheckedSaltRequest,
  opts: LatticeOptions,
): { rcA: number; raA: number } {
  const { cation, anion } = c;
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
  return { rcA, raA };
}

function kapustinskiiPotential(
  c: CheckedSaltRequest,
  opts: LatticeOptions,
  rcA: number,
  raA: number,
): number {
  return kapustinskiiPotentialKJ({
    formulaUnit: c.formulaUnit,
    cationRadiusA: rcA,
    anionRadiusA: raA,
    constantKJA: opts.kapustinskiiK ?? KAPUSTINSKII_K_KJ_A_PER_MOL,
  });
}

function kapustinskiiPart(c: CheckedSaltRequest, opts: LatticeOptions): PotentialPart {
  const { rcA, raA } = kapustinskiiRadii(c, opts);
  return {
    potentialKJ: kapustinskiiPotential(c, opts, rcA, raA),
    detail: `r₊ = ${rcA.toFixed(3)} Å, r₋ = ${raA.toFixed(3)} Å, ν = ${c.p + c.q}`,
  };
}

/** Shortest cation–anion distance for Born–Mayer/Born–Landé: from a measured volume, else the radii. */
function nearestDistance(
  c: CheckedSaltRequest,
  s: ReturnType<typeof requireStructureType>,
): { nearestA: number; from: 'volume' | 'radii' } {
  const vol = formulaUnitVolume(c);
  if (vol && vol.from !== 'ion-volumes') {
    const nearestA = nearestDistanceFromVolumeA(s, vol.volumeNm3);
    if (nearestA !== undefined) return { nearestA, from: 'volume' };
  }
  const rcA = c.cation.crystalRadiusA?.value ?? c.cation.radiusA?.value;
  const raA = c.anion.crystalRadiusA?.value ?? c.anion.radiusA?.value;
  if (rcA === undefined || raA === undefined)
    throw new ChemInputError(
      'radius',
      'Born–Mayer needs a cell volume or both ions’ radii',
      'a formula-unit volume, a density, or bundled ions',
    );
  return { nearestA: rcA + raA, from: 'radii' };
}

function bornPart(c: CheckedSaltRequest, method: 'born-mayer' | 'born-lande'): PotentialPart {
  if (c.req.structureType === undefined)
    throw new ChemInputError(
      'structureType',
      `${method} needs a structure type`,
      'rock-salt, caesium-chloride, zinc-blende, wurtzite, fluorite, rutile',
    );
  const s = requireStructureType(c.req.structureType);
  const { nearestA, from } = nearestDistance(c, s);
  const base = {
    formulaUnit: c.formulaUnit,
    structureType: s,
    nearestDistanceA: nearestA,
  };
  if (method === 'born-mayer') {
    return {
      potentialKJ: bornMayerPotentialKJ(base),
      nearestDistanceA: nearestA,
      distanceFrom: from,
      detail: `${s}, r₀ = ${nearestA.toFixed(3)} Å (${from === 'volume' ? 'from the cell volume' : 'sum of radii'})`,
    };
  }
  const nc = c.cation.bornExponent;
  const na = c.anion.bornExponent;
  if (nc === undefined || na === undefined)
    throw new ChemInputError(
      'bornExponent',
      'Born–Landé needs monatomic ions with a noble-gas shell',
      'bundled monatomic ions',
    );
  const n = (c.p * nc + c.q * na) / (c.p + c.q);
  return {
    potentialKJ: bornLandePotentialKJ({ ...base, bornExponent: n }),
    nearestDistanceA: nearestA,
    distanceFrom: from,
    detail: `${s}, r₀ = ${nearestA.toFixed(3)} Å, n = ${n.toFixed(2)}`,
  };
}

/** The formula-unit volume VBT needs; throws when the request gives none. */
function vbtVolume(c: CheckedSaltRequest): NonNullable<ReturnType<typeof formulaUnitVolume>> {
  const vol = formulaUnitVolume(c);
  if (!vol)
    throw new ChemInputError(
      'formulaUnitVolumeNm3',
      'VBT needs a formula-unit volume, a density, or ions with volumes',
      '0.005–10 nm³',
    );
  return vol;
}

function vbtPart(c: CheckedSaltRequest): PotentialPart {
  const vol = vbtVolume(c);
  const r = vbtPotentialKJ({
    formulaUnit: c.formulaUnit,
    formulaUnitVolumeNm3: vol.volumeNm3,
  });
  return {
    potentialKJ: r.valueKJ,
    volumeNm3: vol.volumeNm3,
    volumeFrom: vol.from,
    volumeRelU: vol.relativeSigma,
    detail: `V_m = ${vol.volumeNm3.toFixed(4)} nm³ (${vol.from}); ${r.form}`,
  };
}

function potentialPart(
  c: CheckedSaltRequest,
  method: LatticeMethod,
  opts: LatticeOptions,
): PotentialPart {
  switch (method) {
    case 'kapustinskii':
      return kapustinskiiPart(c, opts);
    case 'born-mayer':
    case 'born-lande':
      return bornPart(c, method);
    case 'vbt':
      return vbtPart(c);
    default:
      throw new ChemInputError(
        'method',
        `unknown method ${String(method)}`,
        'auto, kapustinskii, born-mayer, born-lande, vbt',
      );
  }
}

/** The potential-to-enthalpy correction of a checked request (both raw paths add the same one). */
const correctionOf = (c: CheckedSaltRequest): number =>
  latticeEnthalpyCorrectionKJ(c.p, c.cation.shape, c.q, c.anion.shape, c.temperatureK);

/**
 * Compute the lattice by one named method, without calibration, from a request checked at the edge
 * (checkSaltRequest): nothing is checked again here but what the method itself needs (radii, a
 * structure type, a volume). Throws ChemInputError if the inputs do not allow the method.
 */
export function rawLatticeOf(
  c: CheckedSaltRequest,
  method: LatticeMethod,
  opts: LatticeOptions = {},
): RawLattice {
  const part = potentialPart(c, method, opts);
  const correctionKJ = correctionOf(c);
  return { method, ...part, enthalpyKJ: part.potentialKJ + correctionKJ };
}

/** What a calibrated figure and its uncertainty read of a raw lattice computation (no words). */
export type RawLatticeNumbers = Pick<
  RawLattice,
  'method' | 'enthalpyKJ' | 'volumeFrom' | 'volumeRelU'
>;

/**
 * {@link rawLatticeOf}'s numbers without its `detail` words, by the same operations in the same order
 * and with the same errors (default options): for a ΔH_sol whose notes nobody reads (a batch's
 * written rows, solution-enthalpy-numbers.ts). Born–Mayer and Born–Landé go through rawLatticeOf.
 */
export function rawLatticeNumbersOf(
  c: CheckedSaltRequest,
  method: LatticeMethod,
): RawLatticeNumbers {
  let potentialKJ: number;
  let volumeFrom: RawLattice['volumeFrom'];
  let volumeRelU: number | undefined;
  if (method === 'kapustinskii') {
    const { rcA, raA } = kapustinskiiRadii(c, {});
    potentialKJ = kapustinskiiPotential(c, {}, rcA, raA);
  } else if (method === 'vbt') {
    const vol = vbtVolume(c);
    potentialKJ = vbtPotentialValueKJ({
      formulaUnit: c.formulaUnit,
      formulaUnitVolumeNm3: vol.volumeNm3,
    });
    volumeFrom = vol.from;
    volumeRelU = vol.relativeSigma;
  } else return rawLatticeOf(c, method);
  const correctionKJ = correctionOf(c);
  return { method, enthalpyKJ: potentialKJ + correctionKJ, volumeFrom, volumeRelU };
}

/** rawLatticeOf for an unchecked request: the request is checked first (an edge, e.g. the validation). */
export function rawLattice(
  req: SaltThermoRequest,
  method: LatticeMethod,
  opts: LatticeOptions = {},
): RawLattice {
  return rawLatticeOf(checkSaltRequest(req), method, opts);
}

export { isStructureType };
