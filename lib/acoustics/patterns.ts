/**
 * First-order microphone pickup patterns.
 *
 * Every first-order pattern is a mix of a pressure (omni) part and a pressure-
 * gradient (figure-8) part:
 *
 *   r(θ) = A + B·cos θ,  B = 1 − A,  0 ≤ A ≤ 1
 *
 * (Eargle, The Microphone Book, 2nd ed., Focal 2004, ch. 5–6.) The response is
 * normalised to 1 on axis (θ = 0). It is signed: where B > A the rear lobe has
 * inverted polarity.
 */
import { requireFinite, requireIntegerAtLeast, requirePatternCoefficient, requirePositive } from "./validate";

export type PickupPatternId = "omni" | "subcardioid" | "cardioid" | "supercardioid" | "hypercardioid" | "figure8";

export interface PickupPattern {
  readonly id: PickupPatternId;
  /** Pressure (omni) coefficient A of r(θ) = A + (1 − A)·cos θ. */
  readonly a: number;
  /** Display label. */
  readonly label: string;
  /** One or two plain sentences for a learner. */
  readonly description: string;
}

/**
 * Supercardioid coefficient at the exact optimum A = (√3 − 1)/2 ≈ 0.366025:
 * the A that maximises the front-hemisphere share of random energy (equivalently
 * the hemispherical front-to-back ratio). Heller, "Exact value of a for
 * first-order supercardioid microphone" (2011).
 */
export const SUPERCARDIOID_A = (Math.sqrt(3) - 1) / 2;

/**
 * Hypercardioid coefficient A = 1/4: the first-order pattern of maximum
 * directivity factor (minimum random-energy efficiency). Eargle, Table 6-1;
 * Gerzon, "Maximum directivity factor of nth-order transducers", JASA 60 (1976).
 */
export const HYPERCARDIOID_A = 0.25;

/**
 * Subcardioid coefficient. Not standardized: 0.7 (a manufacturer's online
 * glossary) and 0.75 (Tashev, Sound Capture and Processing, 2009) are both seen.
 * We use 0.7.
 */
export const SUBCARDIOID_A = 0.7;

/**
 * The six named first-order patterns. Names follow Eargle's usage:
 * "supercardioid" = maximum front-to-back energy (A ≈ 0.366), "hypercardioid" =
 * maximum directivity (A = 0.25). Some literature swaps these names, so
 * calculations should rely on `a`, never on the name.
 */
export const PICKUP_PATTERNS: Readonly<Record<PickupPatternId, PickupPattern>> = Object.freeze({
  omni: Object.freeze({
    id: "omni",
    a: 1,
    label: "Omnidirectional",
    description:
      "Picks up equally from every direction. No rear rejection, so it hears the most room and monitor sound, and an ideal omni has no proximity effect.",
  }),
  subcardioid: Object.freeze({
    id: "subcardioid",
    a: SUBCARDIOID_A,
    label: "Subcardioid",
    description:
      "Mostly omni with a gentle lean to the front: about 8 dB quieter at the back, with no true null. Its coefficient is not standardized.",
  }),
  cardioid: Object.freeze({
    id: "cardioid",
    a: 0.5,
    label: "Cardioid",
    description:
      "Heart-shaped: 6 dB down at the sides and a null straight behind. Aim the null at the wedge or the loudest neighbour.",
  }),
  supercardioid: Object.freeze({
    id: "supercardioid",
    a: SUPERCARDIOID_A,
    label: "Supercardioid",
    description:
      "Tighter than a cardioid with a small rear lobe. Nulls sit about 125° off axis; it has the best front-to-back energy ratio of any first-order pattern.",
  }),
  hypercardioid: Object.freeze({
    id: "hypercardioid",
    a: HYPERCARDIOID_A,
    label: "Hypercardioid",
    description:
      "The least room pickup of any first-order pattern, but a larger rear lobe (6 dB down at 180°). Nulls sit about 110° off axis.",
  }),
  figure8: Object.freeze({
    id: "figure8",
    a: 0,
    label: "Figure-8 (bidirectional)",
    description:
      "Two equal lobes, front and back, of opposite polarity, with deep nulls at the sides (90°). Strongest proximity effect of the family.",
  }),
});

/** The pattern ids from omni to figure-8 (decreasing A), for menus and tables. */
export const PICKUP_PATTERN_IDS: readonly PickupPatternId[] = Object.freeze(
  Object.keys(PICKUP_PATTERNS) as PickupPatternId[],
);

/**
 * Magnitudes below this (relative to the on-axis response of 1, i.e. below
 * −240 dB) are treated as an exact null, so that floating-point rounding at a
 * computed null angle still yields −Infinity dB.
 */
export const NULL_MAGNITUDE_EPSILON = 1e-12;

/** cos of an angle in degrees, exact at multiples of 90° (so a figure-8 is exactly 0 at 90°). */
export function cosDeg(angleDeg: number): number {
  const reducedDeg = ((angleDeg % 360) + 360) % 360;
  if (reducedDeg === 0) return 1;
  if (reducedDeg === 90 || reducedDeg === 270) return 0;
  if (reducedDeg === 180) return -1;
  return Math.cos((reducedDeg * Math.PI) / 180);
}

function radiansToDegrees(angleRad: number): number {
  return (angleRad * 180) / Math.PI;
}

/** Amplitude ratio → dB: 20·log10|x|, −Infinity at an (epsilon-)null. */
function amplitudeToDb(amplitude: number): number {
  const magnitude = Math.abs(amplitude);
  return magnitude < NULL_MAGNITUDE_EPSILON ? -Infinity : 20 * Math.log10(magnitude);
}

/**
 * Signed response r(θ) = A + (1 − A)·cos θ, 1 on axis.
 * Eargle, The Microphone Book, 2nd ed., ch. 5 (first-order patterns).
 * Negative values mean inverted polarity (the rear lobe when A < 0.5).
 */
export function patternResponse({ a, angleDeg }: { a: number; angleDeg: number }): number {
  requirePatternCoefficient(a);
  requireFinite("angleDeg", angleDeg);
  return a + (1 - a) * cosDeg(angleDeg);
}

/**
 * Level relative to on axis, 20·log10|A + (1 − A)·cos θ| dB
 * (Eargle, ch. 5). Returns −Infinity at a null.
 */
export function patternLevelDb({ a, angleDeg }: { a: number; angleDeg: number }): number {
  return amplitudeToDb(patternResponse({ a, angleDeg }));
}

/**
 * Total included angle 2θ over which the front lobe stays within `amplitude`
 * of on axis: A + B·cos θ = amplitude ⇒ θ = arccos((amplitude − A)/B).
 * Returns 360 when the response never falls that far (e.g. an omni).
 */
function arcForAmplitudeDeg(a: number, amplitude: number): number {
  const b = 1 - a;
  if (b === 0) return 360;
  const cosEdge = (amplitude - a) / b;
  if (cosEdge <= -1) return 360;
  return 2 * radiansToDegrees(Math.acos(Math.min(1, cosEdge)));
}

/**
 * Pickup arc (included angle, degrees) at which the response has dropped by
 * `dropDb`: 2·arccos((10^(−dropDb/20) − A)/B). Published arcs for the named
 * patterns: HyperPhysics, "Directional Patterns of Microphones". Returns 360
 * when the pattern never drops that far.
 */
export function pickupArcDeg({ a, dropDb }: { a: number; dropDb: number }): number {
  requirePatternCoefficient(a);
  requirePositive("dropDb", dropDb);
  return arcForAmplitudeDeg(a, 10 ** (-dropDb / 20));
}

export interface PatternFigures {
  /** A of A + B·cos θ. */
  readonly a: number;
  /** B = 1 − A. */
  readonly b: number;
  /** REE = A² + B²/3: the pattern's response to a diffuse field, relative to an omni (Eargle: RE). */
  readonly randomEnergyEfficiency: number;
  /** DF = 1/REE (Eargle: DF; also written Q). */
  readonly directivityFactor: number;
  /** DI = 10·log10 DF, dB. */
  readonly directivityIndexDb: number;
  /** DSF = √DF: how much farther than an omni the mic can be for the same direct-to-diffuse ratio. */
  readonly distanceFactor: number;
  /** Diffuse-field (ambient) pickup relative to an omni, 10·log10 REE dB (≤ 0). */
  readonly ambientRejectionDb: number;
  /** Null angles in [0°, 360°): θ₀ = arccos(−A/B) and 360° − θ₀, only when B ≥ A. Empty if none. */
  readonly nullAnglesDeg: readonly number[];
  /** 20·log10 A dB (−Infinity for a figure-8). */
  readonly level90Db: number;
  /** 20·log10|A − B| dB (−Infinity for a cardioid). */
  readonly level180Db: number;
  /** True when the response at 180° has inverted polarity (B > A). */
  readonly invertedAt180: boolean;
  /** Front-hemisphere energy F = (1/2π)·∫front r² dΩ = A² + AB + B²/3 (an omni gives 1; REE = (F + R)/2). */
  readonly frontHemisphereEnergy: number;
  /** Rear-hemisphere energy R = (1/2π)·∫rear r² dΩ = A² − AB + B²/3. */
  readonly rearHemisphereEnergy: number;
  /** Hemispherical (random-incidence) front-to-back ratio 10·log10(F/R) dB. */
  readonly frontToBackHemiDb: number;
  /** Front-to-total random energy ratio F/(F + R). */
  readonly frontToTotal: number;
  /** Included angle within which the level stays above −3 dB (10^(−3/20)); 360 if it never drops that far. */
  readonly pickupArc3DbDeg: number;
  /** Included angle within which the response stays above half amplitude (−6.02 dB); 360 if never. */
  readonly pickupArc6DbDeg: number;
}

/**
 * Summary figures of a first-order pattern r(θ) = A + B·cos θ, B = 1 − A.
 *
 * Formulas (Eargle, The Microphone Book, 2nd ed., ch. 5–6 and Table 6-1):
 * - REE = A² + B²/3, DF = 1/REE, DI = 10·log10 DF, DSF = √DF.
 * - Null θ₀ = arccos(−A/B), defined only for B ≥ A.
 * - Level at 90° = 20·log10 A; at 180° = 20·log10|A − B|.
 * - Hemisphere energies F = A² + AB + B²/3, R = A² − AB + B²/3 (integrals of
 *   r² over the front and rear hemispheres, up to a common factor 2π);
 *   front-to-back = 10·log10(F/R), front-to-total = F/(F + R).
 * - Pickup arcs: 2·arccos((g − A)/B) with g = 10^(−3/20) for the −3 dB arc and
 *   g = 0.5 (half amplitude, the trade's "−6 dB" point) for the −6 dB arc;
 *   published integers: HyperPhysics, "Directional Patterns of Microphones".
 * The supercardioid optimum of F/(F + R) is A = (√3 − 1)/2 (Heller, 2011).
 */
export function patternFigures({ a }: { a: number }): PatternFigures {
  requirePatternCoefficient(a);
  const b = 1 - a;
  const randomEnergyEfficiency = a * a + (b * b) / 3;
  const directivityFactor = 1 / randomEnergyEfficiency;
  const frontHemisphereEnergy = a * a + a * b + (b * b) / 3;
  // R = (7A² − 5A + 1)/3 > 0 for every A (negative discriminant), so F/R is always finite.
  const rearHemisphereEnergy = a * a - a * b + (b * b) / 3;

  let nullAnglesDeg: number[] = [];
  if (b > 0 && b >= a) {
    const nullDeg = radiansToDegrees(Math.acos(-a / b));
    nullAnglesDeg = nullDeg === 180 ? [180] : [nullDeg, 360 - nullDeg];
  }

  return {
    a,
    b,
    randomEnergyEfficiency,
    directivityFactor,
    directivityIndexDb: 10 * Math.log10(directivityFactor),
    distanceFactor: Math.sqrt(directivityFactor),
    ambientRejectionDb: 10 * Math.log10(randomEnergyEfficiency),
    nullAnglesDeg,
    level90Db: amplitudeToDb(a),
    level180Db: amplitudeToDb(a - b),
    invertedAt180: b > a,
    frontHemisphereEnergy,
    rearHemisphereEnergy,
    frontToBackHemiDb: 10 * Math.log10(frontHemisphereEnergy / rearHemisphereEnergy),
    frontToTotal: frontHemisphereEnergy / (frontHemisphereEnergy + rearHemisphereEnergy),
    pickupArc3DbDeg: arcForAmplitudeDeg(a, 10 ** (-3 / 20)),
    pickupArc6DbDeg: arcForAmplitudeDeg(a, 0.5),
  };
}

export interface PolarPoint {
  readonly angleDeg: number;
  /** 20·log10|r(θ)| dB re on axis; −Infinity at a null (clamp for drawing). */
  readonly levelDb: number;
}

/**
 * Evenly spaced polar trace from 0° to 360° inclusive, `points` samples
 * (361 points → 1° steps). Level per `patternLevelDb` (Eargle, ch. 5).
 */
export function polarTrace({ a, points }: { a: number; points: number }): PolarPoint[] {
  requirePatternCoefficient(a);
  requireIntegerAtLeast("points", points, 2);
  const b = 1 - a;
  const stepDeg = 360 / (points - 1);
  const trace: PolarPoint[] = new Array(points);
  for (let index = 0; index < points; index += 1) {
    const angleDeg = index === points - 1 ? 360 : index * stepDeg;
    trace[index] = { angleDeg, levelDb: amplitudeToDb(a + b * cosDeg(angleDeg)) };
  }
  return trace;
}
