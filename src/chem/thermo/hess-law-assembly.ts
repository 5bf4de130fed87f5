/**
 * Hess's-law assembly of a salt's thermochemistry: the chosen lattice enthalpy plus the ions' hydration
 * enthalpies give the solution enthalpy, with uncertainties in quadrature and the sign convention stated.
 */
import type { Estimate } from '../result';
import { hydrationEnthalpyKJ } from './models/hydration/hydration-enthalpy';
import type { SaltThermoResult } from './thermo.types';
import type { CheckedSaltRequest } from './lattice-inputs';
import { publishedHydrationClosure } from './validation/validation';
import type { ChosenLattice } from './lattice-method-choice';

/** The result of `estimateSaltThermo` (estimate-salt.ts): the calibrated figures plus the raw lattice enthalpy beside them. */
export interface CalibratedSaltThermoResult extends SaltThermoResult {
  /** The lattice model's own figure before calibration, with the raw model's measured uncertainty. */
  rawLatticeEnthalpyKJ: Estimate;
  /** The factor applied (1 when not calibrated) and why. */
  latticeCalibration: { applied: boolean; factor: number; note: string };
}

/** The sign convention every result states. */
export const SIGN_CONVENTION =
  'ΔH_L is the lattice dissociation enthalpy, > 0 for MₚXq(s) → p Mᶻ⁺(g) + q Xᶻ⁻(g) (the lattice formation enthalpy is the same number with a minus sign); ΔH_hyd < 0 for one gaseous ion → aqueous ion, absolute scale of Marcus (ΔH_hyd(H⁺) = −1103 kJ/mol as implied by his Na⁺ value and the NBS tables); ΔH_sol = ΔH_L + p·ΔH_hyd,+ + q·ΔH_hyd,− at infinite dilution, 298.15 K, kJ/mol per formula unit.';

/** The entries of the lists in order, each once (as [...new Set([...a, ...b, ...c])], without the copies). */
export function uniqueInOrder(...lists: readonly (readonly string[])[]): string[] {
  const out: string[] = [];
  for (const list of lists) for (const x of list) if (!out.includes(x)) out.push(x);
  return out;
}

/**
 * ΔH_sol = ΔH_L + p·ΔH_hyd,+ + q·ΔH_hyd,− for M_pX_q from the chosen lattice estimate, and the full
 * result around it (hydration enthalpies, calibration figures, formula-unit volume when one was used).
 */
export function assembleSaltThermo(
  c: CheckedSaltRequest,
  chosen: ChosenLattice,
  reason: string,
): CalibratedSaltThermoResult {
  const { req, p, q } = c;
  const perIon = publishedHydrationClosure().perIonKJ;
  const t = req.temperatureK !== undefined ? { temperatureK: req.temperatureK } : {};
  const hc = hydrationEnthalpyKJ(req.cation, { ...t, perIonPublishedUncertaintyKJ: perIon });
  const ha = hydrationEnthalpyKJ(req.anion, { ...t, perIonPublishedUncertaintyKJ: perIon });
  const lat = chosen.estimate;
  const solValue = lat.value + p * hc.value + q * ha.value;
  const solU = Math.sqrt(
    lat.uncertainty ** 2 + (p * hc.uncertainty) ** 2 + (q * ha.uncertainty) ** 2,
  );
  const solution: Estimate = {
    value: solValue,
    uncertainty: solU,
    method: 'hess-law',
    sources: uniqueInOrder(lat.sources, hc.sources, ha.sources),
    notes: [
      `ΔH_sol = ΔH_L + ${p}·ΔH_hyd(${req.cation.label}) + ${q}·ΔH_hyd(${req.anion.label}): a small difference of large numbers (${lat.value.toFixed(0)} vs ${(-(p * hc.value + q * ha.value)).toFixed(0)} kJ/mol)`,
      'uncertainties combined in quadrature as if independent; differences between counter-ions for one drug ion are better determined than this absolute value',
      chosen.factor !== 1
        ? `ΔH_L ${chosen.calibrationNote}; uncalibrated ΔH_sol would be ${(chosen.raw.enthalpyKJ + p * hc.value + q * ha.value).toFixed(1)} kJ/mol`
        : `ΔH_L ${chosen.calibrationNote}`,
    ],
  };
  const result: CalibratedSaltThermoResult = {
    latticeEnthalpyKJ: lat,
    rawLatticeEnthalpyKJ: chosen.rawEstimate,
    latticeCalibration: {
      applied: chosen.factor !== 1,
      factor: chosen.factor,
      note: chosen.calibrationNote,
    },
    cationHydrationKJ: hc,
    anionHydrationKJ: ha,
    solutionEnthalpyKJ: solution,
    methodChosen: chosen.raw.method,
    methodReason: reason,
    signConvention: SIGN_CONVENTION,
  };
  if (chosen.raw.volumeNm3 !== undefined) {
    result.formulaUnitVolumeNm3 = {
      value: chosen.raw.volumeNm3,
      uncertainty: chosen.raw.volumeNm3 * (chosen.raw.volumeRelU ?? 0),
      method: chosen.raw.volumeFrom ?? 'given',
      sources: [],
    };
  }
  return result;
}
