// What each figure remembers, in SI units (metres, °C, dB, Ω, mA, hours), with its defaults
// and limits. Plain data: shared by the figures, the Bench URL parser and the tests.
// From the modules, not the barrel: this file is in the first load of every Bench page.
import { PICKUP_PATTERNS, type PickupPatternId } from "@/lib/acoustics/patterns";
import { PHANTOM_SUPPLIES, type PhantomSupplyId } from "@/lib/acoustics/phantom";
import { feetToMetres } from "@/lib/acoustics/units";

export type PatternChoice = PickupPatternId | "custom";

export interface PickupPatternState {
  /** A named preset, or "custom" when A was set with the slider. */
  pattern: PatternChoice;
  /** A of r(θ) = A + (1 − A)·cos θ. */
  a: number;
  /** Bearings of the sources from the mic's axis, degrees clockwise seen from above. */
  voiceDeg: number;
  wedgeDeg: number;
  cymbalDeg: number;
}

export interface ProximityState {
  pattern: PickupPatternId;
  distanceM: number;
  temperatureC: number;
}

export interface TwoMicsState {
  /** Source to the nearer mic. */
  nearM: number;
  /** Source to the farther mic. */
  farM: number;
  temperatureC: number;
}

export interface DistanceLevelState {
  /** SPL measured at the reference distance, dB. */
  referenceLevelDb: number;
  referenceM: number;
  /** Where the listener or mic is now. */
  distanceM: number;
  /** The change wanted, dB (negative = quieter). */
  changeDb: number;
}

export interface DirectBoxState {
  /** Instrument output, dBu. */
  sourceLevelDbu: number;
  sourceImpedanceOhms: number;
  /** N of an N:1 step-down transformer. */
  turnsRatio: number;
  preampInputOhms: number;
  groundLift: boolean;
}

export interface PhantomPowerState {
  supply: PhantomSupplyId;
  supplyV: number;
  currentMa: number;
}

export interface FeedbackMarginState {
  /** Talker to mic (D_s). */
  dsM: number;
  /** Talker to farthest listener (D_0). */
  d0M: number;
  /** Mic to nearest loudspeaker (D_1). */
  d1M: number;
  /** Loudspeaker to farthest listener (D_2). */
  d2M: number;
  /** Equivalent acoustic distance. */
  eadM: number;
  openMics: number;
  room: "indoor" | "outdoor";
  /** Critical distance of the room (indoors only). */
  criticalDistanceM: number;
}

export interface NoiseSegmentState {
  levelDba: number;
  hours: number;
}

export interface NoiseDoseState {
  segments: NoiseSegmentState[];
  /** Level for the "time left" readout, dBA. */
  nextLevelDba: number;
}

/** The preset's A, else the custom value. */
export function patternCoefficient(pattern: PatternChoice, customA: number): number {
  return pattern === "custom" ? customA : PICKUP_PATTERNS[pattern].a;
}

/** The preset whose A equals `a` (to 1e-9), else "custom". */
export function patternForCoefficient(a: number): PatternChoice {
  const match = Object.values(PICKUP_PATTERNS).find((pattern) => Math.abs(pattern.a - a) < 1e-9);
  return match ? match.id : "custom";
}

export const PICKUP_PATTERN_DEFAULTS: PickupPatternState = { pattern: "cardioid", a: 0.5, voiceDeg: 0, wedgeDeg: 180, cymbalDeg: 135 };
export const PROXIMITY_DEFAULTS: ProximityState = { pattern: "cardioid", distanceM: 0.1, temperatureC: 20 };
export const TWO_MICS_DEFAULTS: TwoMicsState = { nearM: 0.3, farM: 0.9, temperatureC: 20 };
export const DISTANCE_LEVEL_DEFAULTS: DistanceLevelState = { referenceLevelDb: 100, referenceM: 1, distanceM: 4, changeDb: -6 };
export const DIRECT_BOX_DEFAULTS: DirectBoxState = {
  sourceLevelDbu: -10,
  sourceImpedanceOhms: 10_000,
  turnsRatio: 12,
  preampInputOhms: 1500,
  groundLift: false,
};
export const PHANTOM_POWER_DEFAULTS: PhantomPowerState = { supply: "P48", supplyV: 48, currentMa: 5 };

/**
 * The worked example of Ballou (ed.), Handbook for Sound Engineers, 4th ed., ch. 34 (given in
 * feet there; only ratios enter, so the results are the same in metres): D_s 2 ft, D_0 128 ft,
 * D_1 45 ft, D_2 90 ft, EAD 4 ft, NOM 3, D_c 31.2 ft.
 */
export const FEEDBACK_MARGIN_DEFAULTS: FeedbackMarginState = {
  dsM: feetToMetres(2),
  d0M: feetToMetres(128),
  d1M: feetToMetres(45),
  d2M: feetToMetres(90),
  eadM: feetToMetres(4),
  openMics: 3,
  room: "indoor",
  criticalDistanceM: feetToMetres(31.2),
};

/** A club show day for the crew: load-in, soundcheck, the set, changeover. */
export const NOISE_DOSE_DEFAULTS: NoiseDoseState = {
  segments: [
    { levelDba: 82, hours: 2 },
    { levelDba: 90, hours: 1 },
    { levelDba: 96, hours: 1.5 },
    { levelDba: 85, hours: 0.5 },
  ],
  nextLevelDba: 94,
};

/** Stability margin used throughout, dB (the handbook's 6 dB FSM). */
export const FEEDBACK_STABILITY_MARGIN_DB = 6;

/** Bounds shared by the controls and the URL parser (SI units). */
export const LIMITS = {
  angleDeg: { min: 0, max: 359 },
  patternA: { min: 0, max: 1 },
  proximityDistanceM: { min: 0.01, max: 1 },
  temperatureC: { min: -10, max: 40 },
  micDistanceM: { min: 0.02, max: 5 },
  referenceLevelDb: { min: 40, max: 140 },
  levelDistanceM: { min: 0.1, max: 100 },
  changeDb: { min: -30, max: 30 },
  sourceLevelDbu: { min: -40, max: 10 },
  sourceImpedanceOhms: { min: 100, max: 1_000_000 },
  turnsRatio: { min: 1, max: 20 },
  preampInputOhms: { min: 600, max: 10_000 },
  supplyV: { min: 8, max: 56 },
  currentMa: { min: 0, max: 20 },
  feedbackDistanceM: { min: 0.1, max: 100 },
  openMics: { min: 1, max: 16 },
  criticalDistanceM: { min: 0.5, max: 50 },
  noiseLevelDba: { min: 70, max: 140 },
  noiseHours: { min: 0, max: 24 },
  noiseSegments: { min: 1, max: 8 },
} as const;

/** The supply-voltage slider spans twice the IEC tolerance either side of nominal, so out-of-spec supplies can be tried. */
export function supplyVoltageRange(supply: PhantomSupplyId): { min: number; max: number } {
  const { nominalV, toleranceV } = PHANTOM_SUPPLIES[supply];
  return { min: Math.max(LIMITS.supplyV.min, nominalV - 2 * toleranceV), max: Math.min(LIMITS.supplyV.max, nominalV + 2 * toleranceV) };
}
