import { waterRelativePermittivity } from '../constants/water';
import { celsiusToKelvin } from '../units/temperature';
import { requireFiniteInRange } from '../result';

/**
 * Davies equation for single-ion activity coefficients (Davies 1962, "Ion Association",
 * Butterworths, p. 41): log₁₀ γ = −A·z²·(√I/(1 + √I) − 0.3·I), useful up to I ≈ 0.5 mol/L.
 *
 * A(T) = 1.8248·10⁶·(ε_r·T)^(−3/2) (mol/L)^(−1/2), the Debye–Hückel limiting-law constant (from memory),
 * with the relative permittivity of water from {@link waterRelativePermittivity} (constants/water.ts,
 * the CRC Handbook fit; 78.36 at 25 °C). It gives A ≈ 0.51 at 25 °C, close to the tabulated 0.509
 * (Robinson & Stokes, "Electrolyte Solutions").
 */
export function debyeHuckelA(temperatureK: number): number {
  requireFiniteInRange('temperatureK', temperatureK, celsiusToKelvin(0), celsiusToKelvin(100), 'K');
  const eps = waterRelativePermittivity(temperatureK);
  return 1.8248e6 * (eps * temperatureK) ** -1.5;
}

/** log₁₀ γ for charge z at ionic strength I (mol/L) by the Davies equation. */
export function daviesLog10Gamma(z: number, ionicStrengthM: number, temperatureK = 298.15): number {
  requireFiniteInRange('ionicStrength', ionicStrengthM, 0, 10, 'mol/L');
  const sq = Math.sqrt(ionicStrengthM);
  return -debyeHuckelA(temperatureK) * z * z * (sq / (1 + sq) - 0.3 * ionicStrengthM);
}
