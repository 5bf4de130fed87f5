/**
 * Temperature units. Inside the core every temperature is in kelvin (`temperatureK`); Celsius is for
 * what people type and read.
 */

/**
 * 0 °C in kelvin: exactly 273.15 K, the definition of the Celsius scale (BIPM, The International
 * System of Units (SI Brochure), 9th ed., 2019, §2.3.1: t/°C = T/K − 273.15).
 */
export const CELSIUS_ZERO_K = 273.15;

/** A Celsius temperature in kelvin. */
export function celsiusToKelvin(temperatureC: number): number {
  return temperatureC + CELSIUS_ZERO_K;
}

/** A kelvin temperature in degrees Celsius. */
export function kelvinToCelsius(temperatureK: number): number {
  return temperatureK - CELSIUS_ZERO_K;
}
