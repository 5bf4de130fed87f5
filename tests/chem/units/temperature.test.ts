import { describe, expect, it } from 'vitest';
import { CELSIUS_ZERO_K, STANDARD_TEMPERATURE_K, celsiusToKelvin, kelvinToCelsius } from '@/chem';

describe('temperature units', () => {
  it('follows the SI definition of the Celsius scale (SI Brochure, 9th ed., 2019, §2.3.1)', () => {
    expect(CELSIUS_ZERO_K).toBe(273.15);
    expect(kelvinToCelsius(0)).toBe(-273.15);
    // 25 °C is the 298.15 K of thermochemical tables (IUPAC standard state convention).
    expect(celsiusToKelvin(25)).toBeCloseTo(STANDARD_TEMPERATURE_K, 12);
    // 37 °C, the ICH M9 (2019) solubility temperature, is 310.15 K.
    expect(celsiusToKelvin(37)).toBeCloseTo(310.15, 12);
  });
  it('round-trips', () => {
    for (const t of [-40, 0, 20.5, 37, 100])
      expect(kelvinToCelsius(celsiusToKelvin(t))).toBeCloseTo(t, 12);
  });
});
