import { GAS_CONSTANT_KJ_PER_MOL_K } from '../constants/physical';
import { linearLeastSquares } from '../numerics/least-squares';
import { ChemInputError, requireFiniteInRange, type Estimate } from '../result';

/**
 * van 't Hoff analysis of solubility against temperature: ln S = −ΔH_sol,app/(R·T) + const, so a
 * straight-line fit of ln S on 1/T has slope −ΔH_sol,app/R (e.g. Grant, Mehdizadeh, Chow &
 * Fairbrother 1984, Int. J. Pharm. 18, 25). The apparent enthalpy includes the temperature
 * dependence of speciation and activity; it is an apparent, not a standard, enthalpy of solution.
 * R from CODATA 2018 (src/chem/constants/physical.ts).
 */
export interface SolubilityAtTemperature {
  temperatureK: number;
  /** Solubility in any consistent unit (mg/mL or mol/L): only ratios matter. */
  solubility: number;
}

export interface VanTHoffFit {
  /** ΔH_sol,app, kJ/mol (positive: solubility rises with temperature), with its standard error. */
  solutionEnthalpyKJ: Estimate;
  standardErrorKJ: number;
  /** Intercept of ln S against 1/T (the apparent ΔS_sol/R for S in mole-fraction units). */
  interceptLnS: number;
  /** Slope of ln S against 1/T, K (= −ΔH_sol,app/R). */
  lnSSlopeOnInverseTK: number;
  /** Mean of 1/T over the points, K⁻¹ (the line pivots about it). */
  meanInverseTemperaturePerK: number;
  rSquared: number;
  n: number;
  degreesOfFreedom: number;
  /** Residuals in ln S, one per point, in input order. */
  residualsLnS: number[];
}

/** Fit ΔH_sol,app from ≥ 3 solubilities at ≥ 2 distinct temperatures. */
export function vantHoffFit(points: readonly SolubilityAtTemperature[]): VanTHoffFit {
  if (points.length < 3) {
    throw new ChemInputError(
      'points',
      `${points.length} point(s) given`,
      'at least three solubilities at two or more temperatures',
    );
  }
  points.forEach((p, i) => {
    requireFiniteInRange(`points[${i}].temperatureK`, p.temperatureK, 1e-6, 1000, 'K');
    if (!(Number.isFinite(p.solubility) && p.solubility > 0)) {
      throw new ChemInputError(
        `points[${i}].solubility`,
        `must be greater than zero, got ${p.solubility}`,
        'a solubility > 0',
      );
    }
  });
  const distinct = new Set(points.map((p) => p.temperatureK.toFixed(6)));
  if (distinct.size < 2) {
    throw new ChemInputError(
      'points',
      'all solubilities were measured at one temperature',
      'solubilities at two or more temperatures',
    );
  }
  const fit = linearLeastSquares(
    points.map((p) => 1 / p.temperatureK),
    points.map((p) => Math.log(p.solubility)),
  );
  const dH = -fit.slope * GAS_CONSTANT_KJ_PER_MOL_K;
  const se = fit.slopeStandardError * GAS_CONSTANT_KJ_PER_MOL_K;
  return {
    solutionEnthalpyKJ: {
      value: dH,
      uncertainty: se,
      method: 'van-t-hoff-fit',
      sources: ['van ’t Hoff analysis of measured solubilities (ln S against 1/T, least squares)'],
      notes: [
        `${fit.n} points, ${distinct.size} temperatures, ${fit.degreesOfFreedom} degrees of freedom`,
      ],
    },
    standardErrorKJ: se,
    interceptLnS: fit.intercept,
    lnSSlopeOnInverseTK: fit.slope,
    meanInverseTemperaturePerK: points.reduce((a, p) => a + 1 / p.temperatureK, 0) / points.length,
    rSquared: fit.rSquared,
    n: fit.n,
    degreesOfFreedom: fit.degreesOfFreedom,
    residualsLnS: fit.residuals,
  };
}
