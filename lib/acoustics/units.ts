/**
 * Unit conversions used across the acoustics library.
 *
 * Lengths: the international foot is exactly 0.3048 m (international yard and
 * pound agreement, 1959; NIST SP 811, appendix B).
 * Temperatures: °F = °C × 9/5 + 32 and 0 °C = 273.15 K (NIST SP 811; ISO 80000-5).
 */
import { requireFinite } from "./validate";

/** Metres per international foot, exact by definition (NIST SP 811). */
export const METRES_PER_FOOT = 0.3048;

/** Absolute zero in degrees Celsius (ISO 80000-5: T/K = t/°C + 273.15). */
export const ABSOLUTE_ZERO_C = -273.15;

/** Absolute zero in degrees Fahrenheit (−273.15 °C × 9/5 + 32). */
export const ABSOLUTE_ZERO_F = -459.67;

/**
 * Metres to feet: ft = m / 0.3048 (NIST SP 811).
 * Negative values are allowed (a signed offset along a line is still a length).
 */
export function metresToFeet(lengthM: number): number {
  requireFinite("lengthM", lengthM);
  return lengthM / METRES_PER_FOOT;
}

/** Feet to metres: m = ft × 0.3048 (NIST SP 811). */
export function feetToMetres(lengthFt: number): number {
  requireFinite("lengthFt", lengthFt);
  return lengthFt * METRES_PER_FOOT;
}

/**
 * Degrees Celsius to degrees Fahrenheit: °F = °C × 9/5 + 32 (NIST SP 811).
 * Throws a RangeError below absolute zero (−273.15 °C).
 */
export function celsiusToFahrenheit(temperatureC: number): number {
  requireFinite("temperatureC", temperatureC);
  if (temperatureC < ABSOLUTE_ZERO_C) {
    throw new RangeError(`temperatureC must not be below absolute zero (−273.15 °C); received ${temperatureC}`);
  }
  return (temperatureC * 9) / 5 + 32;
}

/**
 * Degrees Fahrenheit to degrees Celsius: °C = (°F − 32) × 5/9 (NIST SP 811).
 * Throws a RangeError below absolute zero (−459.67 °F).
 */
export function fahrenheitToCelsius(temperatureF: number): number {
  requireFinite("temperatureF", temperatureF);
  if (temperatureF < ABSOLUTE_ZERO_F) {
    throw new RangeError(`temperatureF must not be below absolute zero (−459.67 °F); received ${temperatureF}`);
  }
  return ((temperatureF - 32) * 5) / 9;
}

/** Degrees Celsius to kelvins: T/K = t/°C + 273.15 (ISO 80000-5). */
export function celsiusToKelvin(temperatureC: number): number {
  requireFinite("temperatureC", temperatureC);
  if (temperatureC < ABSOLUTE_ZERO_C) {
    throw new RangeError(`temperatureC must not be below absolute zero (−273.15 °C); received ${temperatureC}`);
  }
  return temperatureC - ABSOLUTE_ZERO_C;
}
