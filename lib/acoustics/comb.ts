/**
 * Two coherent paths (a direct sound and one delayed copy) and the
 * inverse-square law that sets their level difference.
 *
 * Summing a signal with a copy of relative amplitude a (0 ≤ a ≤ 1) delayed by
 * τ gives H(f) = 1 + a·e^(−j2πfτ), so
 *
 *   |H(f)| = √(1 + a² + 2a·cos(2πfτ))
 *
 * (recordingology.com, "Comb Filter Calculations"; Everest & Pohlmann, Master
 * Handbook of Acoustics). Notches fall at odd multiples of 1/(2τ), peaks at
 * multiples of 1/τ.
 */
import { requireFinite, requireIntegerAtLeast, requireNonNegative, requirePositive, requireUnitInterval } from "./validate";

/**
 * Notch frequencies f_n = (2n − 1)·c/(2Δd), n = 1…count (Everest & Pohlmann,
 * Master Handbook of Acoustics). Δd = 0.343 m at 343 m/s (τ = 1 ms) → 500,
 * 1500, 2500 Hz.
 */
export function combNotchesHz({
  pathDifferenceM,
  speedOfSoundMs,
  count,
}: {
  pathDifferenceM: number;
  speedOfSoundMs: number;
  count: number;
}): number[] {
  requirePositive("pathDifferenceM", pathDifferenceM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  requireIntegerAtLeast("count", count, 0);
  const firstNotchHz = speedOfSoundMs / (2 * pathDifferenceM);
  return Array.from({ length: count }, (_, index) => (2 * index + 1) * firstNotchHz);
}

/**
 * Peak frequencies f_n = n·c/Δd, n = 0…count − 1 (spacing 1/τ; Everest &
 * Pohlmann). The first peak is at 0 Hz.
 */
export function combPeaksHz({
  pathDifferenceM,
  speedOfSoundMs,
  count,
}: {
  pathDifferenceM: number;
  speedOfSoundMs: number;
  count: number;
}): number[] {
  requirePositive("pathDifferenceM", pathDifferenceM);
  requirePositive("speedOfSoundMs", speedOfSoundMs);
  requireIntegerAtLeast("count", count, 0);
  const spacingHz = speedOfSoundMs / pathDifferenceM;
  return Array.from({ length: count }, (_, index) => index * spacingHz);
}

/** 10·log10(1 + a² + 2a·cos(2π·cycles)) with the phase reduced to one cycle, so the result is periodic to rounding. */
function twoPathLevelDb(amplitudeRatio: number, cycles: number): number {
  const fractionOfCycle = cycles - Math.floor(cycles);
  const cosine = fractionOfCycle === 0.5 ? -1 : Math.cos(2 * Math.PI * fractionOfCycle);
  const powerRatio = 1 + amplitudeRatio * amplitudeRatio + 2 * amplitudeRatio * cosine;
  return powerRatio <= 0 ? -Infinity : 10 * Math.log10(powerRatio);
}

/**
 * Level of the two-path sum relative to the direct sound alone, dB:
 * 20·log10|H| = 10·log10(1 + a² + 2a·cos(2πfτ)), τ = delayMs/1000
 * (recordingology.com, "Comb Filter Calculations"). −Infinity at a full null
 * (a = 1 at an odd multiple of 1/(2τ)). `amplitudeRatio` is the delayed copy's
 * amplitude relative to the direct sound, in [0, 1].
 */
export function combResponseDb({
  amplitudeRatio,
  delayMs,
  frequencyHz,
}: {
  amplitudeRatio: number;
  delayMs: number;
  frequencyHz: number;
}): number {
  requireUnitInterval("amplitudeRatio", amplitudeRatio);
  requireNonNegative("delayMs", delayMs);
  requireNonNegative("frequencyHz", frequencyHz);
  return twoPathLevelDb(amplitudeRatio, (frequencyHz * delayMs) / 1000);
}

/**
 * Peak and notch depth of the two-path sum: +20·log10(1 + a) and
 * 20·log10(1 − a) dB (from |H| above). a = 1 → +6.021 / −Infinity dB.
 */
export function combExtremesDb({ amplitudeRatio }: { amplitudeRatio: number }): { peakDb: number; notchDb: number } {
  requireUnitInterval("amplitudeRatio", amplitudeRatio);
  return {
    peakDb: 20 * Math.log10(1 + amplitudeRatio),
    notchDb: amplitudeRatio === 1 ? -Infinity : 20 * Math.log10(1 - amplitudeRatio),
  };
}

/**
 * Amplitude ratio of the farther path to the nearer one by the inverse-square
 * law (pressure ∝ 1/r): a = nearM/farM. Used for the 3:1 rule (a = 1/3).
 */
export function twoPathAmplitudeRatio({ nearM, farM }: { nearM: number; farM: number }): number {
  requirePositive("nearM", nearM);
  requirePositive("farM", farM);
  if (farM < nearM) {
    throw new RangeError(`farM must not be less than nearM; received nearM ${nearM}, farM ${farM}`);
  }
  return nearM / farM;
}

/**
 * Free-field level change of a point source moving from `fromM` to `toM`:
 * ΔL = −20·log10(toM/fromM) dB (inverse-square law; the basis of the Handbook
 * for Sound Engineers ch. 34 gain equations). Doubling the distance → −6.021 dB.
 */
export function inverseSquareChangeDb({ fromM, toM }: { fromM: number; toM: number }): number {
  requirePositive("fromM", fromM);
  requirePositive("toM", toM);
  return -20 * Math.log10(toM / fromM);
}

/**
 * Distance at which a point source's free-field level has changed by
 * `changeDb` from its level at `fromM`: r = fromM·10^(−changeDb/20)
 * (inverse of `inverseSquareChangeDb`). −6.021 dB → twice the distance.
 */
export function distanceForLevelChangeM({ fromM, changeDb }: { fromM: number; changeDb: number }): number {
  requirePositive("fromM", fromM);
  requireFinite("changeDb", changeDb);
  return fromM * 10 ** (-changeDb / 20);
}

export interface CombPoint {
  readonly frequencyHz: number;
  /** Two-path level re direct sound alone, dB; −Infinity at a full null (clamp for drawing). */
  readonly levelDb: number;
}

/**
 * Sampled `combResponseDb` from `fromHz` to `toHz` inclusive (defaults 20 Hz to
 * 20 kHz), `points` samples, log-spaced by default or linear (a linear axis
 * shows the evenly spaced teeth of the comb).
 */
export function combResponseCurve({
  amplitudeRatio,
  delayMs,
  points,
  fromHz = 20,
  toHz = 20000,
  spacing = "log",
}: {
  amplitudeRatio: number;
  delayMs: number;
  points: number;
  fromHz?: number;
  toHz?: number;
  spacing?: "log" | "linear";
}): CombPoint[] {
  requireUnitInterval("amplitudeRatio", amplitudeRatio);
  requireNonNegative("delayMs", delayMs);
  requireIntegerAtLeast("points", points, 2);
  if (spacing === "log") requirePositive("fromHz", fromHz);
  else requireNonNegative("fromHz", fromHz);
  requirePositive("toHz", toHz);
  if (toHz <= fromHz) {
    throw new RangeError(`toHz must be greater than fromHz; received fromHz ${fromHz}, toHz ${toHz}`);
  }
  const delayS = delayMs / 1000;
  const logStep = spacing === "log" ? Math.log(toHz / fromHz) / (points - 1) : 0;
  const linearStepHz = (toHz - fromHz) / (points - 1);
  const curve: CombPoint[] = new Array(points);
  for (let index = 0; index < points; index += 1) {
    let frequencyHz: number;
    if (index === points - 1) frequencyHz = toHz;
    else if (spacing === "log") frequencyHz = fromHz * Math.exp(logStep * index);
    else frequencyHz = fromHz + linearStepHz * index;
    curve[index] = { frequencyHz, levelDb: twoPathLevelDb(amplitudeRatio, frequencyHz * delayS) };
  }
  return curve;
}
