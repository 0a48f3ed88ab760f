/**
 * Sound in air: speed, wavelength and propagation delay.
 *
 * Pin the speed of sound explicitly wherever a number matters: 343.0, 343.2
 * and 343.4 m/s are all quoted "at 20 °C" and differ enough to change a
 * printed delay in the third digit.
 */
import { ABSOLUTE_ZERO_C } from "./units";
import { requireFinite, requireNonNegative, requirePositive } from "./validate";

/** Speed of sound in dry air at 0 °C used by the ideal-gas form, m/s (Wikipedia, "Speed of sound", practical formula for dry air). */
export const SPEED_OF_SOUND_AT_0C_MS = 331.3;

/** ISO 9613-1:1993 reference speed of sound at 293.15 K (20 °C), m/s. */
export const ISO_9613_1_SPEED_OF_SOUND_MS = 343.2;

/** ISO 9613-1:1993 reference temperature, K. */
export const ISO_9613_1_REFERENCE_TEMPERATURE_K = 293.15;

function requireAboveAbsoluteZero(temperatureC: number): void {
  requireFinite("temperatureC", temperatureC);
  if (temperatureC <= ABSOLUTE_ZERO_C) {
    throw new RangeError(`temperatureC must be above absolute zero (−273.15 °C); received ${temperatureC}`);
  }
}

/**
 * Speed of sound in dry air, ideal-gas form: c = 331.3·√(1 + T/273.15) m/s,
 * T in °C (Wikipedia, "Speed of sound", practical formula for dry air,
 * γ = 1.4). 20 °C → 343.215 m/s.
 */
export function speedOfSoundMs({ temperatureC }: { temperatureC: number }): number {
  requireAboveAbsoluteZero(temperatureC);
  return SPEED_OF_SOUND_AT_0C_MS * Math.sqrt(1 + temperatureC / 273.15);
}

/**
 * Linear approximation c ≈ 331.3 + 0.606·T m/s (first two Taylor terms of the
 * ideal-gas form; Wikipedia, "Speed of sound"). Good near room temperature:
 * +0.2 m/s at 20 °C, +0.46 m/s at 30 °C compared with the exact form.
 */
export function speedOfSoundLinearMs({ temperatureC }: { temperatureC: number }): number {
  requireAboveAbsoluteZero(temperatureC);
  return SPEED_OF_SOUND_AT_0C_MS + 0.606 * temperatureC;
}

/**
 * ISO 9613-1:1993 form c = 343.2·√(T/293.15) m/s, T in kelvins (as implemented
 * in the python-acoustics package, `iso_9613_1_1993.py`). 20 °C → 343.2 m/s.
 */
export function speedOfSoundIso9613Ms({ temperatureC }: { temperatureC: number }): number {
  requireAboveAbsoluteZero(temperatureC);
  return ISO_9613_1_SPEED_OF_SOUND_MS * Math.sqrt((temperatureC - ABSOLUTE_ZERO_C) / ISO_9613_1_REFERENCE_TEMPERATURE_K);
}

/** Wavelength λ = c/f in metres (textbook; e.g. Everest & Pohlmann, Master Handbook of Acoustics). */
export function wavelengthM({ frequencyHz, speedOfSoundMs }: { frequencyHz: number; speedOfSoundMs: number }): number {
  requirePositive("frequencyHz", frequencyHz);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  return speedOfSoundMs / frequencyHz;
}

/** Frequency f = c/λ in hertz for a given wavelength (inverse of `wavelengthM`). */
export function frequencyForWavelengthHz({ wavelengthM, speedOfSoundMs }: { wavelengthM: number; speedOfSoundMs: number }): number {
  requirePositive("wavelengthM", wavelengthM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  return speedOfSoundMs / wavelengthM;
}

/** Acoustic travel time t = d/c, in milliseconds (textbook). 1 m at 343.0 m/s → 2.9155 ms. */
export function delayMs({ distanceM, speedOfSoundMs }: { distanceM: number; speedOfSoundMs: number }): number {
  requireNonNegative("distanceM", distanceM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  return (1000 * distanceM) / speedOfSoundMs;
}

/**
 * Acoustic travel time in samples, n = f_s·d/c (fractional; round as the
 * delay line requires). 1 m at 48 kHz and 343.0 m/s → 139.94 samples.
 */
export function delaySamples({
  distanceM,
  speedOfSoundMs,
  sampleRateHz,
}: {
  distanceM: number;
  speedOfSoundMs: number;
  sampleRateHz: number;
}): number {
  requireNonNegative("distanceM", distanceM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  requirePositive("sampleRateHz", sampleRateHz);
  return (sampleRateHz * distanceM) / speedOfSoundMs;
}

/** Distance sound travels in a given time, d = c·t, metres (inverse of `delayMs`). */
export function distanceForDelayM({ delayMs, speedOfSoundMs }: { delayMs: number; speedOfSoundMs: number }): number {
  requireNonNegative("delayMs", delayMs);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  return (speedOfSoundMs * delayMs) / 1000;
}
