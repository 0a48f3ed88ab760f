// Question banks of the course how-microphones-hear (content/banks/how-microphones-hear/*.json):
// every numeric key, and the numbers other questions rest on, recomputed with lib/acoustics with
// the source of the value beside it. The checks all banks share are in banks-common.test.ts.
import { describe, expect, it } from "vitest";
import {
  HYPERCARDIOID_A,
  micOutputVolts,
  micSensitivityDbv,
  patternFigures,
  patternLevelDb,
  PHANTOM_SUPPLIES,
  phantomAtMic,
  PICKUP_PATTERNS,
  proximityBoostDb,
  SUBCARDIOID_A,
  SUPERCARDIOID_A,
  voltsToDbu,
  voltsToDbv,
} from "@/lib/acoustics";
import { describeNumericKeys, loadCourseBanks } from "./course-banks";

const COURSE_SLUG = "how-microphones-hear";
const { question } = loadCourseBanks(COURSE_SLUG);

/** Speed of sound pinned for the proximity figures, as the lessons state (Wikipedia "Speed of sound" gives 343.2 m/s at 20 °C). */
const SPEED_OF_SOUND_MS = 343.0;
const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
const FIGURE8_A = PICKUP_PATTERNS.figure8.a;
const CM_PER_M = 100;

function firstNullDeg(a: number): number {
  return patternFigures({ a }).nullAnglesDeg[0];
}

function cardioidBoostAt100HzDb(distanceM: number): number {
  return proximityBoostDb({ a: CARDIOID_A, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

/**
 * Every numeric key, recomputed with lib/acoustics, in the question's own unit.
 * Keyed "<bank>/<question id>" because question ids are unique only within a bank.
 */
const NUMERIC_KEYS: Record<string, number> = {
  // IEC 61938 P48 feed network: the mic sees the two 6.81 kΩ resistors in parallel, R/2 = 3.405 kΩ
  "transducers/q-transducers-06": PHANTOM_SUPPLIES.P48.feedResistorPerLegOhms / 2,
  // IEC 61938: V_mic = V − I·R/2; 24.17 V at 7 mA from 48 V ([derived])
  "transducers/q-transducers-07": phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 7 }).voltsAtMic,
  // 2 mV/Pa → −53.98 dB re 1 V/Pa (sengpielaudio; IEC 60268-4 V/Pa)
  "transducers/q-transducers-11": micSensitivityDbv({ mvPerPa: 2 }),
  // output at an SPL, V = S·10^((L − 94)/20); 12 mV/Pa at 134 dB SPL → 1.2 V [derived]
  "transducers/q-transducers-12": micOutputVolts({ mvPerPa: 12, splDb: 134, assume94DbIs1Pa: true }),
  // 0 dBu = 0.7746 V (STx manual table); 2 mV → −51.76 dBu [derived]
  "transducers/q-transducers-13": voltsToDbu(micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true })),

  // Eargle, The Microphone Book, Table 6-1 (DF 3): cardioid DSF √3 = 1.732; 30 cm × DSF
  "pickup-patterns/q-pickup-patterns-04": 0.3 * patternFigures({ a: CARDIOID_A }).distanceFactor * CM_PER_M,
  // Eargle Table 6-1 (RE 0.25): hypercardioid ambient rejection −6.02 dB
  "pickup-patterns/q-pickup-patterns-05": patternFigures({ a: HYPERCARDIOID_A }).ambientRejectionDb,
  // Heller (2011) exact supercardioid at 90° → −8.730 dB
  "pickup-patterns/q-pickup-patterns-06": patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 90 }),
  // Eargle ch. 5, r(θ) = A + B·cos θ, at the hypercardioid's 109.47° null (formulas [derived]): −16.21 dB
  "pickup-patterns/q-pickup-patterns-07": patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: firstNullDeg(HYPERCARDIOID_A) }),
  // proximity model 10·log10(1 + (B/kr)²): figure-8 at 10 cm, 100 Hz, c = 343 → 14.886 dB (= cardioid at 5 cm)
  "pickup-patterns/q-pickup-patterns-13": proximityBoostDb({ a: FIGURE8_A, distanceM: 0.1, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS }),

  // IEC 61938:2018 feed network, V − I·R/2: 26.98 V at 5 mA from a 44 V supply [derived]
  "final/q-final-04": phantomAtMic({ supply: "P48", supplyV: 44, currentMa: 5 }).voltsAtMic,
  // sengpielaudio, "Microphone sensitivity and conversion": 20 mV/Pa → −33.98 dB re 1 V/Pa
  "final/q-final-05": micSensitivityDbv({ mvPerPa: 20 }),
  // V = S·10^((L − 94)/20) → 0.2 V; 0 dBu = 0.7746 V (STx manual table) → −11.76 dBu [derived]
  "final/q-final-06": voltsToDbu(micOutputVolts({ mvPerPa: 2, splDb: 134, assume94DbIs1Pa: true })),
  // Eargle Table 6-1 (DF 4): hypercardioid DSF 2.000; 25 cm × DSF
  "final/q-final-10": 0.25 * patternFigures({ a: HYPERCARDIOID_A }).distanceFactor * CM_PER_M,
  // HyperPhysics prints −12 at 90°: hypercardioid 90° → −12.041 dB
  "final/q-final-11": patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: 90 }),
  // Eargle ch. 5 formula at 109.47° ([derived]): cardioid → 20·log10(1/3) = −9.54 dB
  "final/q-final-12": patternLevelDb({ a: CARDIOID_A, angleDeg: firstNullDeg(HYPERCARDIOID_A) }),
  // proximity model 10·log10(1 + (B/kr)²): figure-8 at 5 cm, 100 Hz, c = 343 → 20.799 dB
  "final/q-final-15": proximityBoostDb({ a: FIGURE8_A, distanceM: 0.05, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS }),
  // proximity model (c = 343, 100 Hz): 2 cm 22.72 dB [derived] minus 30 cm 2.619 dB
  "final/q-final-16": cardioidBoostAt100HzDb(0.02) - cardioidBoostAt100HzDb(0.3),
};

describeNumericKeys(`${COURSE_SLUG} question banks`, loadCourseBanks(COURSE_SLUG), NUMERIC_KEYS);

describe(`${COURSE_SLUG} question banks: computed keys of other kinds match lib/acoustics`, () => {
  const patternA = {
    cardioid: CARDIOID_A,
    supercardioid: SUPERCARDIOID_A,
    hypercardioid: HYPERCARDIOID_A,
    figure8: FIGURE8_A,
    omni: PICKUP_PATTERNS.omni.a,
    subcardioid: SUBCARDIOID_A,
  } as const;

  it("null-angle matching agrees with θ₀ = arccos(−A/B)", () => {
    // Eargle ch. 5: nulls 180°, 125.26°, 109.47°, 90°, none for omni
    const match = question("pickup-patterns", "q-pickup-patterns-03", "matching");
    const rightDeg: Record<string, number | null> = { deg180: 180, deg125: 125, deg110: 109.5, deg90: 90, none: null, deg150: 150, deg70: 70 };
    for (const [patternId, rightId] of Object.entries(match.correctPairs)) {
      const nulls = patternFigures({ a: patternA[patternId as keyof typeof patternA] }).nullAnglesDeg;
      const expected = rightDeg[rightId];
      if (expected === null) expect(nulls).toEqual([]);
      else expect(Math.abs(nulls[0] - expected)).toBeLessThan(1);
    }
    // The distractor angles are no pattern's null (so they are unambiguously wrong).
    for (const a of Object.values(patternA)) {
      const nulls = patternFigures({ a }).nullAnglesDeg;
      for (const distractorDeg of [150, 70]) expect(nulls.every((deg) => Math.abs(deg - distractorDeg) > 5)).toBe(true);
    }
  });

  it("side-rejection ordering agrees with 20·log10 A at 90°", () => {
    // 20·log10 A (Eargle ch. 5): 90° levels −6.021, −8.730, −12.041, −∞ dB
    const ordering = question("pickup-patterns", "q-pickup-patterns-10", "ordering");
    const levels = ordering.correctOrder.map((id) => patternLevelDb({ a: patternA[id as keyof typeof patternA], angleDeg: 90 }));
    for (let index = 1; index < levels.length; index++) expect(levels[index]).toBeLessThan(levels[index - 1]);
  });

  it("the pattern loudest at 180° among cardioid, super and hyper is the hypercardioid", () => {
    // 20·log10|A − B| (Eargle ch. 5): 180° levels −∞, −11.439, −6.021 dB
    const single = question("pickup-patterns", "q-pickup-patterns-08", "single");
    const ids = single.options.map((option) => option.id as keyof typeof patternA);
    const loudest = ids.reduce((best, id) =>
      patternLevelDb({ a: patternA[id], angleDeg: 180 }) > patternLevelDb({ a: patternA[best], angleDeg: 180 }) ? id : best,
    );
    expect(single.correctOptionId).toBe(loudest);
  });

  it("random-energy-efficiency matching agrees with REE = A² + B²/3", () => {
    // Eargle Table 6-1, REE = A² + B²/3: 1, 0.52, 1/3, 1/3, 0.268, 0.25
    const match = question("final", "q-final-09", "matching");
    const rightValue: Record<string, number> = { one: 1, half: 0.52, third: 1 / 3, p27: 0.27, quarter: 0.25, zero: 0 };
    for (const [patternId, rightId] of Object.entries(match.correctPairs)) {
      const ree = patternFigures({ a: patternA[patternId as keyof typeof patternA] }).randomEnergyEfficiency;
      expect(Math.abs(ree - rightValue[rightId])).toBeLessThan(0.005);
    }
  });

  it("the least diffuse pickup belongs to the hypercardioid", () => {
    // Eargle Table 6-1: the hypercardioid has the lowest RE (0.25) of the first-order family
    const single = question("final", "q-final-14", "single");
    expect(single.correctOptionId).toBe("hyper");
    const lowest = Object.entries(patternA).reduce((best, entry) =>
      patternFigures({ a: entry[1] }).randomEnergyEfficiency < patternFigures({ a: best[1] }).randomEnergyEfficiency ? entry : best,
    );
    expect(lowest[0]).toBe("hypercardioid");
  });

  it("20 dB more pressure is ten times the voltage", () => {
    // common practice: a level difference is 20·log10 of the voltage ratio (ITU-R V.574-5)
    expect(question("final", "q-final-07", "single").correctOptionId).toBe("x10");
    expect(voltsToDbv(10)).toBeCloseTo(20, 9);
  });
});
