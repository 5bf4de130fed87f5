/**
 * Entry point of the thermochemistry engine: checks a salt request once (checkSaltRequest,
 * lattice-inputs.ts) and passes the checked request inward; chooses the lattice method
 * (lattice-method-choice.ts), takes its calibrated lattice enthalpy (lattice-estimate.ts, raw-model
 * uncertainty in lattice-uncertainty.ts) and assembles the cycle by Hess's law (hess-law-assembly.ts,
 * which also states the sign convention).
 */
import { checkSaltRequest } from './lattice-inputs';
import type { SaltThermoRequest } from './thermo.types';
import { assembleSaltThermo, type CalibratedSaltThermoResult } from './hess-law-assembly';
import type { LatticeCalibrationOptions } from './lattice-estimate';
import { chooseLatticeEstimate } from './lattice-method-choice';

export { latticeEnthalpyEstimate, type LatticeCalibrationOptions } from './lattice-estimate';
export { SIGN_CONVENTION, type CalibratedSaltThermoResult } from './hess-law-assembly';

/**
 * Lattice, hydration and solution enthalpies of a salt M_pX_q, each with a measured uncertainty.
 *
 * The lattice enthalpy is calibrated by default (calibration/calibration.ts: one factor per method and
 * charge class, fitted on the bundled reference salts, its uncertainty the leave-one-salt-out RMS error);
 * the raw model's figure stays in `rawLatticeEnthalpyKJ` and in the notes. `calibrate: false` returns the
 * raw model throughout.
 *
 * `method: 'auto'` (the default) runs every method the inputs allow — VBT when a formula-unit volume, a
 * density or both ions' volumes are known; Kapustinskii when both ions have radii; Born–Mayer when a cubic
 * structure type and a measured volume are given — and picks the one with the lowest relative uncertainty
 * (the cross-validated error of the calibrated model, or the raw model's RMS error with `calibrate: false`)
 * on the bundled reference salts of the same kind, saying so.
 *
 * ΔH_sol is a small difference of large numbers: its uncertainty, from the lattice and hydration
 * uncertainties in quadrature (treated as independent — a conservative choice, as part of the model errors
 * cancel between salts of one drug ion), is usually larger than its value. Compare counter-ions for one
 * drug ion rather than reading one absolute ΔH_sol.
 */
export function estimateSaltThermo(
  req: SaltThermoRequest & LatticeCalibrationOptions,
): CalibratedSaltThermoResult {
  const checked = checkSaltRequest(req);
  const calOpts: LatticeCalibrationOptions = {
    ...(req.calibrate === false ? { calibrate: false } : {}),
    ...(req.calibration ? { calibration: req.calibration } : {}),
  };
  const { chosen, reason } = chooseLatticeEstimate(checked, calOpts);
  return assembleSaltThermo(checked, chosen, reason);
}
