import { celsiusToKelvin, kelvinToCelsius } from '../units/temperature';
import { requireFiniteInRange } from '../result';

/**
 * Davies equation for single-ion activity coefficients (Davies 1962, "Ion Association",
 * Butterworths, p. 41): log₁₀ γ = −A·z²·(√I/(1 + √I) − 0.3·I), useful up to I ≈ 0.5 mol/L.
 *
 * A(T) = 1.8248·10⁶·(ε_r·T)^(−3/2) (mol/L)^(−1/2), the Debye–Hückel limiting-law constant, with the
 * relative permittivity of water from Malmberg & Maryott 1956 (J. Res. Natl. Bur. Stand. 56, 1):
 * ε_r = 87.740 − 0.40008·t + 9.398·10⁻⁴·t² − 1.410·10⁻⁶·t³, t in °C. Both from memory; they give
 * A ≈ 0.51 at 25 °C, close to the tabulated 0.509 (Robinson & Stokes, "Electrolyte Solutions").
 */
export function debyeHuckelA(temperatureK: number): number {
  requireFiniteInRange('temperatureK', temperatureK, celsiusToKelvin(0), celsiusToKelvin(100), 'K');
  const t = kelvinToCelsius(temperatureK);
  const eps = 87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t * t * t;
  return 1.8248e6 * (eps * temperatureK) ** -1.5;
}

/** log₁₀ γ for charge z at ionic strength I (mol/L) by the Davies equation. */
export function daviesLog10Gamma(z: number, ionicStrengthM: number, temperatureK = 298.15): number {
  requireFiniteInRange('ionicStrength', ionicStrengthM, 0, 10, 'mol/L');
  const sq = Math.sqrt(ionicStrengthM);
  return -debyeHuckelA(temperatureK) * z * z * (sq / (1 + sq) - 0.3 * ionicStrengthM);
}
