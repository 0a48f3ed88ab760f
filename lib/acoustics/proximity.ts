/**
 * Proximity effect of an ideal first-order microphone near an ideal point source.
 *
 * In a spherical wave the particle velocity is u = p/(ρc)·(1 + 1/(jkr)),
 * k = 2πf/c (Kinsler & Frey, Fundamentals of Acoustics; Beranek, Acoustics).
 * A pressure-gradient element follows u, so the gradient part B·cos θ of the
 * pattern gains the factor (1 + 1/(jkr)) while the pressure part A does not.
 * On axis, relative to the far-field response at the same distance:
 *
 *   boost = 20·log10|A + B·(1 + 1/(jkr))| = 20·log10|1 + B/(jkr)|
 *         = 10·log10(1 + (B/(kr))²) dB
 *
 * Real microphones add their own bass roll-off; this is the ideal ceiling.
 */
import { requireIntegerAtLeast, requirePatternCoefficient, requirePositive } from "./validate";

function boostDb(b: number, waveNumberTimesDistance: number): number {
  const ratio = b / waveNumberTimesDistance;
  return 10 * Math.log10(1 + ratio * ratio);
}

/**
 * On-axis bass boost (dB) of the gradient part of a first-order pattern from an
 * ideal point source at `distanceM`: 10·log10(1 + ((1 − A)/(kr))²), k = 2πf/c.
 * Derived from the spherical-wave particle velocity u = p/(ρc)·(1 + 1/(jkr))
 * (Kinsler & Frey, Fundamentals of Acoustics). 0 dB for an omni (A = 1);
 * a cardioid at r behaves like a figure-8 at 2r.
 */
export function proximityBoostDb({
  a,
  distanceM,
  frequencyHz,
  speedOfSoundMs,
}: {
  a: number;
  distanceM: number;
  frequencyHz: number;
  speedOfSoundMs: number;
}): number {
  requirePatternCoefficient(a);
  requirePositive("distanceM", distanceM);
  requirePositive("frequencyHz", frequencyHz);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  const waveNumberRadPerM = (2 * Math.PI * frequencyHz) / speedOfSoundMs;
  return boostDb(1 - a, waveNumberRadPerM * distanceM);
}

/**
 * Frequency (Hz) at which the ideal proximity boost reaches 3 dB, i.e. where
 * kr = B: f = B·c/(2πr). For a figure-8 (B = 1) this is c/(2πr); below it the
 * boost rises at about 6 dB per octave (Kinsler & Frey). An omni (B = 0)
 * has no boost at any frequency and yields 0 Hz.
 */
export function proximityCornerHz({
  a,
  distanceM,
  speedOfSoundMs,
}: {
  a: number;
  distanceM: number;
  speedOfSoundMs: number;
}): number {
  requirePatternCoefficient(a);
  requirePositive("distanceM", distanceM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  return ((1 - a) * speedOfSoundMs) / (2 * Math.PI * distanceM);
}

export interface ProximityPoint {
  readonly frequencyHz: number;
  readonly boostDb: number;
}

/**
 * Log-spaced curve of `proximityBoostDb` from `fromHz` to `toHz` inclusive
 * (defaults 20 Hz to 20 kHz), `points` samples: f_i = from·(to/from)^(i/(n−1)).
 */
export function proximityResponseCurve({
  a,
  distanceM,
  speedOfSoundMs,
  points,
  fromHz = 20,
  toHz = 20000,
}: {
  a: number;
  distanceM: number;
  speedOfSoundMs: number;
  points: number;
  fromHz?: number;
  toHz?: number;
}): ProximityPoint[] {
  requirePatternCoefficient(a);
  requirePositive("distanceM", distanceM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  requireIntegerAtLeast("points", points, 2);
  requirePositive("fromHz", fromHz);
  requirePositive("toHz", toHz);
  if (toHz <= fromHz) {
    throw new RangeError(`toHz must be greater than fromHz; received fromHz ${fromHz}, toHz ${toHz}`);
  }
  const b = 1 - a;
  const krPerHz = (2 * Math.PI * distanceM) / speedOfSoundMs;
  const logStep = Math.log(toHz / fromHz) / (points - 1);
  const curve: ProximityPoint[] = new Array(points);
  for (let index = 0; index < points; index += 1) {
    const frequencyHz = index === points - 1 ? toHz : fromHz * Math.exp(logStep * index);
    curve[index] = { frequencyHz, boostDb: boostDb(b, krPerHz * frequencyHz) };
  }
  return curve;
}
