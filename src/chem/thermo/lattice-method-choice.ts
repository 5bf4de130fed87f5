/**
 * Which lattice method answers a request, and why: `auto` runs every method the inputs allow and keeps
 * the one with the lowest stated relative uncertainty; a named method is checked and used as asked.
 */
import { ChemInputError } from '../result';
import { isStructureType } from './models/born-mayer/born-mayer';
import { formulaUnitVolume, type CheckedSaltRequest } from './lattice-inputs';
import type { LatticeMethod } from './thermo.types';
import { latticeEnthalpyEstimate, type LatticeCalibrationOptions } from './lattice-estimate';
import { groupOf } from './lattice-uncertainty';

/** The lattice estimate a request ends up with. */
export type ChosenLattice = ReturnType<typeof latticeEnthalpyEstimate>;

/** The methods that can run on a request, in order of preference for ties. */
export function applicableMethods(c: CheckedSaltRequest): LatticeMethod[] {
  const { req } = c;
  const out: LatticeMethod[] = [];
  const vol = volumeOrUndefined(c);
  if (vol) out.push('vbt');
  if (req.cation.radiusA && req.anion.radiusA) out.push('kapustinskii');
  if (req.structureType && isStructureType(req.structureType) && vol && vol.from !== 'ion-volumes')
    out.push('born-mayer');
  return out;
}

/** The request's formula-unit volume, or undefined when it has none or it cannot be found. */
function volumeOrUndefined(c: CheckedSaltRequest): ReturnType<typeof formulaUnitVolume> {
  try {
    return formulaUnitVolume(c);
  } catch {
    return undefined;
  }
}

/** The error when no lattice method applies to a request. */
export function noLatticeMethod(): ChemInputError {
  return new ChemInputError(
    'cation/anion',
    'no lattice method applies: give ions with radii or volumes, or a formula-unit volume or density',
    'bundled ions, formula or SMILES ions, formulaUnitVolumeNm3 or densityGPerCm3',
  );
}

type RankedEstimate = { m: LatticeMethod; r: ChosenLattice; rel: number };

/**
 * Each applicable method's estimate, lowest relative uncertainty first (ties in the order of
 * preference); a method that fails is left out, and when every one fails the first error is thrown.
 * A plain loop: a request runs this for every written candidate of a batch.
 */
function rankedEstimates(
  c: CheckedSaltRequest,
  methods: readonly LatticeMethod[],
  calOpts: LatticeCalibrationOptions,
): RankedEstimate[] {
  let firstError: unknown;
  let failed = false;
  const ranked: RankedEstimate[] = [];
  for (const m of methods) {
    try {
      const r = latticeEnthalpyEstimate(c, m, calOpts);
      ranked.push({ m, r, rel: r.estimate.uncertainty / r.estimate.value });
    } catch (err) {
      if (!failed) firstError = err;
      failed = true;
    }
  }
  if (ranked.length === 0) throw firstError;
  if (ranked.length > 1) ranked.sort((a, b) => a.rel - b.rel);
  return ranked;
}

/**
 * The lattice estimate for the requested method (`auto` when none is given) and the reason stated for
 * it. `auto` ranks the applicable methods by relative uncertainty on the bundled reference salts of
 * the same kind and names every candidate's figure in the reason.
 */
export function chooseLatticeEstimate(
  c: CheckedSaltRequest,
  calOpts: LatticeCalibrationOptions,
): { chosen: ChosenLattice; reason: string } {
  const { req } = c;
  const requested = req.method ?? 'auto';
  if (requested === 'auto') {
    const methods = applicableMethods(c);
    if (methods.length === 0) throw noLatticeMethod();
    const group = groupOf(req);
    const ranked = rankedEstimates(c, methods, calOpts);
    const best = ranked[0]!;
    return {
      chosen: best.r,
      reason: `auto: ${best.m} has the lowest ${calOpts.calibrate === false ? 'measured' : 'stated (cross-validated where calibrated)'} uncertainty (${(best.rel * 100).toFixed(1)} %) among the methods these inputs allow (${ranked.map((r) => `${r.m} ${(r.rel * 100).toFixed(1)} %`).join(', ')}), measured on the bundled ${group === 'halides' ? 'monatomic-ion' : 'polyatomic-ion'} reference salts`,
    };
  }
  if (!['kapustinskii', 'born-mayer', 'born-lande', 'vbt'].includes(requested)) {
    throw new ChemInputError(
      'method',
      `unknown method ${String(requested)}`,
      'auto, kapustinskii, born-mayer, born-lande, vbt',
    );
  }
  return {
    chosen: latticeEnthalpyEstimate(c, requested, calOpts),
    reason: `requested: ${requested}`,
  };
}
