import { GAS_CONSTANT_J_PER_MOL_K } from '../constants/physical';
import { ChemInputError, requireFiniteInRange, type Estimate } from '../result';

/**
 * General Solubility Equation (Jain & Yalkowsky 2001, J. Pharm. Sci. 90, 234, eq. 1):
 * log₁₀ S₀ (mol/L) = 0.5 − 0.01·(MP − 25) − log P, MP in °C; for liquids (MP < 25 °C) the melting
 * term is 0. Uncertainty: the paper reports an average absolute error of about 0.4–0.5 log units on
 * its test set (from memory); we carry σ = 0.6 log units (our own, slightly wider, assumption).
 */
export const GSE_UNCERTAINTY_LOG10 = 0.6;

export function gseLog10IntrinsicSolubilityM(meltingPointC: number, logP: number): Estimate {
  requireFiniteInRange('meltingPointC', meltingPointC, -100, 600, '°C');
  requireFiniteInRange('logP', logP, -10, 15);
  const value = 0.5 - 0.01 * (Math.max(meltingPointC, 25) - 25) - logP;
  return {
    value,
    uncertainty: GSE_UNCERTAINTY_LOG10,
    method: 'general-solubility-equation',
    sources: ['Jain & Yalkowsky 2001, J. Pharm. Sci. 90, 234 (General Solubility Equation)'],
    notes: ['log₁₀ S₀ in mol/L; an estimate from melting point and log P, not a measurement'],
  };
}

/**
 * Ideal solubility (mole fraction) from melting data: ln x = −(ΔH_fus/R)·(1/T − 1/T_m)
 * (Schröder–van Laar equation; e.g. Prausnitz, Lichtenthaler & de Azevedo, "Molecular
 * Thermodynamics of Fluid-Phase Equilibria", 3rd ed., ch. 11). Returns x ≤ 1 (1 above the melting point).
 */
export function idealSolubilityMoleFraction(
  fusionEnthalpyKJ: number,
  meltingPointK: number,
  temperatureK: number,
): number {
  requireFiniteInRange('fusionEnthalpyKJ', fusionEnthalpyKJ, 0, 500, 'kJ/mol');
  requireFiniteInRange('meltingPointK', meltingPointK, 1, 1000, 'K');
  if (!(Number.isFinite(temperatureK) && temperatureK > 0)) {
    throw new ChemInputError(
      'temperatureK',
      `must be above 0 K, got ${temperatureK}`,
      'a temperature > 0 K',
    );
  }
  if (temperatureK >= meltingPointK) return 1;
  return Math.exp(
    -((fusionEnthalpyKJ * 1000) / GAS_CONSTANT_J_PER_MOL_K) *
      (1 / temperatureK - 1 / meltingPointK),
  );
}
