import { requireFiniteInRange, type Estimate } from '../result';

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
