import type { Estimate } from '../result';
import { rawLatticeOf, type RawLattice } from './lattice';
import type { CheckedSaltRequest } from './lattice-inputs';
import type { LatticeMethod } from './thermo.types';
import {
  calibratedRelU,
  cellLabel,
  chargeClassOf,
  findLatticeFactor,
  SHIPPED_LATTICE_CALIBRATION,
} from './calibration/calibration';
import type { CalibratedVariant, LatticeCalibration } from './calibration/calibration.types';
import { groupOf, METHOD_SOURCES, rawEstimate, sizeRelU, variantOf } from './lattice-uncertainty';

/**
 * How the lattice enthalpy is calibrated. `calibrate` (default true) applies the shipped calibration
 * (calibration/calibration.data.ts); `false` gives the raw model. `calibration` replaces the shipped
 * coefficients — used by the leave-one-salt-out validation, which refits without each salt.
 */
export interface LatticeCalibrationOptions {
  calibrate?: boolean;
  calibration?: LatticeCalibration;
}

/** Where the calibration factors come from. */
export const CALIBRATION_SOURCE =
  'calibration factor fitted on the bundled lattice reference salts (Born–Haber halides from the NBS tables of Wagman et al. 1982 and CRC/NIST ionisation energies and electron affinities; solution-cycle salts from NBS ΔfH° and Marcus hydration enthalpies) by calibration/fit-calibration.ts';

/**
 * The method name a calibrated lattice estimate carries: the bare model's id with " (calibrated)", so a
 * figure multiplied by a calibration factor never passes under the bare method's name.
 */
export function calibratedMethodName(method: LatticeMethod): string {
  return `${method} (calibrated)`;
}

/**
 * Lattice enthalpy by a named method with its measured uncertainty: calibrated by default (factor per
 * method and charge class, uncertainty = the leave-one-salt-out RMS error of the calibrated model on the
 * reference salts of the same kind), raw with `calibrate: false` or where no factor exists. `rawEstimate`
 * is always the uncalibrated figure.
 */
export function latticeEnthalpyEstimate(
  c: CheckedSaltRequest,
  method: LatticeMethod,
  opts: LatticeCalibrationOptions = {},
): {
  estimate: Estimate;
  raw: RawLattice;
  rawEstimate: Estimate;
  factor: number;
  calibrationNote: string;
} {
  const { req } = c;
  const raw = rawLatticeOf(c, method);
  const rawEst = rawEstimate(req, raw, method);
  if (opts.calibrate === false) {
    return {
      estimate: rawEst,
      raw,
      rawEstimate: rawEst,
      factor: 1,
      calibrationNote: 'not calibrated (calibrate: false): the raw model',
    };
  }
  const cal = opts.calibration ?? SHIPPED_LATTICE_CALIBRATION;
  const variant = variantOf(raw) as CalibratedVariant;
  const cls = chargeClassOf(req.cation.charge, req.anion.charge);
  const group = groupOf(req);
  const f = findLatticeFactor(cal, variant, cls, group);
  if (!f) {
    const kind = group === 'halides' ? 'monatomic-ion' : 'polyatomic-ion';
    const w = cal.withheld.find(
      (x) => x.variant === variant && x.chargeClass === cls && x.group === group,
    );
    const why = w
      ? `on the ${cellLabel(w)} the calibrated ${variant} did no better than the raw one, leave-one-salt-out (RMS ${w.crossValidated.rmsPercent.toFixed(1)} % vs ${w.raw.rmsPercent.toFixed(1)} %)`
      : `fewer than ${cal.minSalts} ${cls} ${kind} reference salts for ${variant}`;
    const note = `not calibrated: ${why}; the raw model and its raw uncertainty`;
    return {
      estimate: { ...rawEst, notes: [note, ...(rawEst.notes ?? [])] },
      raw,
      rawEstimate: rawEst,
      factor: 1,
      calibrationNote: note,
    };
  }
  const u = calibratedRelU(f);
  const s = sizeRelU(raw, req);
  const rel = Math.hypot(u.rel, s);
  const value = f.factor * raw.enthalpyKJ;
  const note = `calibrated: raw ${raw.enthalpyKJ.toFixed(1)} kJ/mol × ${f.factor.toFixed(4)} (median ratio reference/model over ${cellLabel(f)})`;
  const notes = [
    note,
    raw.detail,
    `uncertainty: ${u.basis}${s ? `, plus ${(s * 100).toFixed(1)} % from the estimated ion size` : ''}`,
  ];
  if (raw.distanceFrom === 'radii')
    notes.push('r₀ from the sum of six-coordinate radii, not a measured cell');
  return {
    raw,
    rawEstimate: rawEst,
    factor: f.factor,
    calibrationNote: note,
    estimate: {
      value,
      uncertainty: value * rel,
      method: calibratedMethodName(method),
      sources: [...METHOD_SOURCES[method], CALIBRATION_SOURCE],
      notes,
    },
  };
}
