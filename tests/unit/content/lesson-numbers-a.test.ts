import { describe, expect, it } from "vitest";
import {
  combExtremesDb,
  combNotchesHz,
  combResponseDb,
  dbuToVolts,
  dbvToDbu,
  dbvToVolts,
  HYPERCARDIOID_A,
  inverseSquareChangeDb,
  micOutputVolts,
  micSensitivityDbv,
  patternFigures,
  patternLevelDb,
  PHANTOM_SUPPLIES,
  phantomAtMic,
  PICKUP_PATTERN_IDS,
  PICKUP_PATTERNS,
  permissibleExposureHours,
  proximityBoostDb,
  reflectedImpedanceOhms,
  splDbFromPa,
  SUBCARDIOID_A,
  SUPERCARDIOID_A,
  transformer,
  voltsToDbu,
  voltsToDbv,
} from "@/lib/acoustics";

// Every computed number quoted in the courses how-microphones-hear and direct-boxes-and-levels,
// checked against lib/acoustics. Each expectation uses the value and the digits as printed in the
// lesson, so toBeCloseTo(x, d) passes only if the library value rounds to what the lesson prints.
// Lessons les-mic-moving-coil and les-di-ground-lift quote no computed numbers.
//
// The proximity figures are pinned at c = 343 m/s, as les-pattern-proximity states in its prose
// (REFERENCES.md §2 and §3: 343.2 m/s moves them by at most 0.005 dB).
const SPEED_OF_SOUND_MS = 343.0;

const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
const FIGURE8_A = PICKUP_PATTERNS.figure8.a;
const OMNI_A = PICKUP_PATTERNS.omni.a;
/** The rounded supercardioid blend 0.37/0.63 (Sound On Sound, Robjohns; Tashev's code; REFERENCES.md §1). */
const SUPERCARDIOID_ROUNDED_A = 0.37;
/** The "3:5" supercardioid, which matches HyperPhysics' printed 127° null (REFERENCES.md §1). */
const SUPERCARDIOID_3_TO_5_A = 0.375;

const P48 = PHANTOM_SUPPLIES.P48;
const MINUTES_PER_HOUR = 60;

function firstNullDeg(a: number): number {
  return patternFigures({ a }).nullAnglesDeg[0];
}

function cardioidBoostAt100HzDb(distanceM: number): number {
  return proximityBoostDb({ a: CARDIOID_A, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

function nioshHours(levelDba: number): number {
  return permissibleExposureHours({ levelDba, standard: "niosh" });
}

/** Voltage ratio in dB, using the library's dBV conversion (dB re 1 V of a ratio to 1 V). */
function voltageRatioDb(ratio: number): number {
  return voltsToDbv(ratio);
}

describe("how-microphones-hear / transducers", () => {
  it("les-mic-condenser-phantom", () => {
    // IEC 61938:2018 P48 (Sound On Sound glossary "Phantom Power"; Wikipedia "Phantom power") [pub]
    expect(P48.nominalV).toBeCloseTo(48, 0); // lesson les-mic-condenser-phantom: "a nominal 48 V"
    expect(P48.feedResistorPerLegOhms / 1000).toBeCloseTo(6.81, 2); // lesson les-mic-condenser-phantom: "two matched resistors of 6.81 kΩ"
    expect(P48.maxCurrentMa).toBeCloseTo(10, 0); // lesson les-mic-condenser-phantom: "up to 10 mA"
    // REFERENCES.md §7: the mic sees R/2 [derived]
    expect(P48.feedResistorPerLegOhms / 2 / 1000).toBeCloseTo(3.405, 3); // lesson les-mic-condenser-phantom: "3.405 kΩ in series with a 48 V supply"
    // REFERENCES.md §7: V_mic = 30.98 V at 5 mA [derived]
    expect(phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 }).voltsAtMic).toBeCloseTo(31, 0); // lesson les-mic-condenser-phantom: "drawing 5 mA therefore sees about 31 V"
  });

  it("les-mic-ribbon", () => {
    // REFERENCES.md §2, figure-8 at 5 cm, 100 Hz, c = 343: 20.799 dB [derived]
    expect(proximityBoostDb({ a: FIGURE8_A, distanceM: 0.05, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(20.8, 1); // lesson les-mic-ribbon: "boosted by about 20.8 dB at 100 Hz"
    // Eargle, The Microphone Book, Table 6-1; HyperPhysics: figure-8 null at 90° [pub]
    expect(firstNullDeg(FIGURE8_A)).toBeCloseTo(90, 0); // lesson les-mic-ribbon: "deep nulls at 90° to either side"
    // IEC 61938 P48 nominal supply
    expect(P48.nominalV).toBeCloseTo(48, 0); // lesson les-mic-ribbon: "a sudden 48 V step"
  });

  it("les-mic-sensitivity-spl", () => {
    // ISO 1683 reference 20 µPa: 1 Pa → 93.979 dB SPL (REFERENCES.md §6) [pub reference]
    expect(splDbFromPa(1)).toBeCloseTo(94, 0); // lesson les-mic-sensitivity-spl: "a pressure of 1 pascal ... about 94 dB SPL"
    // sengpielaudio "Microphone sensitivity and conversion": 2 → −53.98, 12 → −38.42 (REFERENCES.md §6)
    expect(micSensitivityDbv({ mvPerPa: 2 })).toBeCloseTo(-54, 0); // lesson les-mic-sensitivity-spl: "about 2 mV/Pa, which is about −54 dB re 1 V/Pa"
    expect(micSensitivityDbv({ mvPerPa: 12 })).toBeCloseTo(-38.4, 1); // lesson les-mic-sensitivity-spl: "about 12 mV/Pa, about −38.4 dB re 1 V/Pa"
    // 20·log10 10 = 20 dB (ITU-R V.574 definition of the decibel for field quantities)
    expect(dbvToVolts(20)).toBeCloseTo(10, 6); // lesson les-mic-sensitivity-spl: "A difference of 20 dB is a factor of ten in voltage"
    // The lesson uses the trade's shortcut 94 dB SPL = 1 Pa (REFERENCES.md §6, "output at SPL").
    const voiceVolts = micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true });
    expect(voiceVolts * 1000).toBeCloseTo(2, 0); // lesson les-mic-sensitivity-spl: "makes about 2 mV"
    expect(voltsToDbu(voiceVolts)).toBeCloseTo(-51.8, 1); // lesson les-mic-sensitivity-spl: "which is about −51.8 dBu"
    expect(dbvToVolts(40)).toBeCloseTo(100, 6); // lesson les-mic-sensitivity-spl: "40 dB more pressure, so a hundred times the voltage"
    const kickDynamicVolts = micOutputVolts({ mvPerPa: 2, splDb: 134, assume94DbIs1Pa: true });
    expect(kickDynamicVolts).toBeCloseTo(0.2, 1); // lesson les-mic-sensitivity-spl: "about 0.2 V"
    expect(kickDynamicVolts / voiceVolts).toBeCloseTo(100, 6); // lesson les-mic-sensitivity-spl: "134 dB SPL gives 100 times the 94 dB output"
    expect(voltsToDbu(kickDynamicVolts)).toBeCloseTo(-11.8, 1); // lesson les-mic-sensitivity-spl: "or about −11.8 dBu"
    const kickCondenserVolts = micOutputVolts({ mvPerPa: 12, splDb: 134, assume94DbIs1Pa: true });
    expect(kickCondenserVolts).toBeCloseTo(1.2, 1); // lesson les-mic-sensitivity-spl: "12 mV/Pa becomes 1.2 V"
    expect(voltsToDbu(kickCondenserVolts)).toBeCloseTo(3.8, 1); // lesson les-mic-sensitivity-spl: "about +3.8 dBu"
    // Inverse-square law, REFERENCES.md §5: ×2 → −6.0206, ×4 → −12.041 [derived]
    expect(inverseSquareChangeDb({ fromM: 1, toM: 2 })).toBeCloseTo(-6, 0); // lesson les-mic-sensitivity-spl: "each doubling of distance lowers the level by about 6 dB"
    expect(inverseSquareChangeDb({ fromM: 0.1, toM: 0.4 })).toBeCloseTo(-12, 0); // lesson les-mic-sensitivity-spl: "from 10 cm to 40 cm ... by about 12 dB"
    // NIOSH 98-126: 100 dBA → 15 min (REFERENCES.md §10) [pub]
    expect(nioshHours(100) * MINUTES_PER_HOUR).toBeCloseTo(15, 0); // lesson les-mic-sensitivity-spl: "At 100 dBA the NIOSH recommended limit is only 15 minutes"
  });
});

describe("how-microphones-hear / pickup-patterns", () => {
  it("les-pattern-first-order: the table of figures", () => {
    // Eargle, The Microphone Book, Table 6-1 (RE, DF, DI); REFERENCES.md §1 derived values.
    const omni = patternFigures({ a: OMNI_A });
    const sub = patternFigures({ a: SUBCARDIOID_A });
    const cardioid = patternFigures({ a: CARDIOID_A });
    const superc = patternFigures({ a: SUPERCARDIOID_A });
    const hyper = patternFigures({ a: HYPERCARDIOID_A });
    const fig8 = patternFigures({ a: FIGURE8_A });

    expect(SUBCARDIOID_A).toBeCloseTo(0.7, 1); // lesson les-pattern-first-order: "Subcardioid | 0.7"
    expect(SUPERCARDIOID_A).toBeCloseTo(0.366, 3); // lesson les-pattern-first-order: "Supercardioid | 0.366" (Heller 2011)
    expect(HYPERCARDIOID_A).toBeCloseTo(0.25, 2); // lesson les-pattern-first-order: "Hypercardioid | 0.25"

    expect(omni.randomEnergyEfficiency).toBeCloseTo(1, 0); // lesson les-pattern-first-order: "Omni | 1 | 1"
    expect(sub.randomEnergyEfficiency).toBeCloseTo(0.52, 2); // lesson les-pattern-first-order: "Subcardioid | 0.7 | 0.52"
    expect(cardioid.randomEnergyEfficiency).toBeCloseTo(0.333, 3); // lesson les-pattern-first-order: "Cardioid | 0.5 | 0.333"
    expect(cardioid.randomEnergyEfficiency).toBeCloseTo(1 / 3, 9); // lesson les-pattern-first-order: "A cardioid scores one third"
    expect(superc.randomEnergyEfficiency).toBeCloseTo(0.268, 3); // lesson les-pattern-first-order: "Supercardioid | 0.366 | 0.268"
    expect(hyper.randomEnergyEfficiency).toBeCloseTo(0.25, 2); // lesson les-pattern-first-order: "Hypercardioid | 0.25 | 0.25"
    expect(fig8.randomEnergyEfficiency).toBeCloseTo(0.333, 3); // lesson les-pattern-first-order: "Figure-8 | 0 | 0.333"

    // Ambient (diffuse) rejection vs omni = 10·log10 REE, REFERENCES.md §1
    expect(omni.ambientRejectionDb).toBeCloseTo(0, 1); // lesson les-pattern-first-order: "0 dB"
    expect(sub.ambientRejectionDb).toBeCloseTo(-2.8, 1); // lesson les-pattern-first-order: "−2.8 dB"
    expect(cardioid.ambientRejectionDb).toBeCloseTo(-4.8, 1); // lesson les-pattern-first-order: "−4.8 dB"
    expect(superc.ambientRejectionDb).toBeCloseTo(-5.7, 1); // lesson les-pattern-first-order: "−5.7 dB"
    expect(hyper.ambientRejectionDb).toBeCloseTo(-6.0, 1); // lesson les-pattern-first-order: "−6.0 dB"
    expect(fig8.ambientRejectionDb).toBeCloseTo(-4.8, 1); // lesson les-pattern-first-order: "−4.8 dB"

    // Distance factor √DF; commonly printed 1, 1.7, 1.9, 2, 1.7 (REFERENCES.md §1)
    expect(omni.distanceFactor).toBeCloseTo(1.0, 2); // lesson les-pattern-first-order: "1.00"
    expect(sub.distanceFactor).toBeCloseTo(1.39, 2); // lesson les-pattern-first-order: "1.39"
    expect(cardioid.distanceFactor).toBeCloseTo(1.73, 2); // lesson les-pattern-first-order: "A cardioid has a distance factor of about 1.73"
    expect(superc.distanceFactor).toBeCloseTo(1.93, 2); // lesson les-pattern-first-order: "1.93 for supercardioid"
    expect(hyper.distanceFactor).toBeCloseTo(2.0, 2); // lesson les-pattern-first-order: "2.00" / "2 for hypercardioid"
    expect(fig8.distanceFactor).toBeCloseTo(1.73, 2); // lesson les-pattern-first-order: "Figure-8 ... 1.73"
    expect(cardioid.distanceFactor * 30).toBeCloseTo(52, 0); // lesson les-pattern-first-order: "at 30 cm, a cardioid gives the same balance at about 52 cm"

    // Null θ₀ = arccos(−A/B); Eargle; HyperPhysics 180°, 110°, 90°; Heller 125.26° (REFERENCES.md §1)
    expect(omni.nullAnglesDeg).toEqual([]); // lesson les-pattern-first-order: "Omni ... none"
    expect(sub.nullAnglesDeg).toEqual([]); // lesson les-pattern-first-order: "Subcardioid ... none"
    expect(firstNullDeg(CARDIOID_A)).toBeCloseTo(180, 0); // lesson les-pattern-first-order: "Cardioid ... 180°"
    expect(firstNullDeg(SUPERCARDIOID_A)).toBeCloseTo(125.3, 1); // lesson les-pattern-first-order: "Supercardioid ... 125.3°"
    expect(firstNullDeg(HYPERCARDIOID_A)).toBeCloseTo(109.5, 1); // lesson les-pattern-first-order: "Hypercardioid ... 109.5°"
    expect(firstNullDeg(FIGURE8_A)).toBeCloseTo(90, 0); // lesson les-pattern-first-order: "Figure-8 ... 90°"
    expect(firstNullDeg(SUPERCARDIOID_ROUNDED_A)).toBeCloseTo(126, 0); // lesson les-pattern-first-order: "round it to 0.37 put the null at about 126°"
    expect(firstNullDeg(SUPERCARDIOID_3_TO_5_A)).toBeCloseTo(127, 0); // lesson les-pattern-first-order: "a 0.375 blend puts it at about 127°"
  });

  it("les-pattern-first-order: the claims about the table", () => {
    const figures = PICKUP_PATTERN_IDS.map((id) => ({ id, ...patternFigures({ a: PICKUP_PATTERNS[id].a }) }));
    // Heller 2011 citing Gerzon (JASA 60, 278, 1976): A = 0.25 minimises REE (REFERENCES.md §1)
    const lowestRee = [...figures].sort((x, y) => x.randomEnergyEfficiency - y.randomEnergyEfficiency)[0];
    expect(lowestRee.id).toBe("hypercardioid"); // lesson les-pattern-first-order: "the hypercardioid ... has the lowest REE of the family"
    // Heller 2011: A = (√3 − 1)/2 maximises hemispherical front-to-back (REFERENCES.md §1)
    const bestFrontToBack = [...figures].sort((x, y) => y.frontToBackHemiDb - x.frontToBackHemiDb)[0];
    expect(bestFrontToBack.id).toBe("supercardioid"); // lesson les-pattern-first-order: "The supercardioid is the pattern with the best ratio of front-half pickup to rear-half pickup"
    // Eargle Table 6-1: cardioid and figure-8 both RE 0.33
    expect(patternFigures({ a: FIGURE8_A }).randomEnergyEfficiency).toBeCloseTo(patternFigures({ a: CARDIOID_A }).randomEnergyEfficiency, 9); // lesson les-pattern-first-order: "a figure-8 rejects diffuse sound exactly as well as a cardioid"
  });

  it("les-pattern-nulls-wedges", () => {
    // Level at 90° = 20·log10 A; HyperPhysics prints −6, −8.5 (A = 0.375), −12 (REFERENCES.md §1)
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 90 })).toBeCloseTo(-6.0, 1); // lesson les-pattern-nulls-wedges: "a cardioid is about 6.0 dB down"
    expect(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 90 })).toBeCloseTo(-8.7, 1); // lesson les-pattern-nulls-wedges: "a supercardioid is about 8.7 dB down"
    expect(patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: 90 })).toBeCloseTo(-12.0, 1); // lesson les-pattern-nulls-wedges: "a hypercardioid is about 12.0 dB down"
    // Level at 180° = 20·log10|A − B|; Heller: −11.439 dB for the exact supercardioid; HyperPhysics hyper −6
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 180 })).toBe(-Infinity); // lesson les-pattern-nulls-wedges: "The cardioid has its only null there"
    expect(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 180 })).toBeCloseTo(-11.4, 1); // lesson les-pattern-nulls-wedges: "only about 11.4 dB down directly behind"
    expect(patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: 180 })).toBeCloseTo(-6.0, 1); // lesson les-pattern-nulls-wedges: "only about 6.0 dB down at 180°"

    const superNullDeg = firstNullDeg(SUPERCARDIOID_A);
    const hyperNullDeg = firstNullDeg(HYPERCARDIOID_A);
    expect(superNullDeg).toBeCloseTo(125.3, 1); // lesson les-pattern-nulls-wedges: "a cone of nulls at about 125.3° from the front"
    expect(firstNullDeg(SUPERCARDIOID_ROUNDED_A)).toBeCloseTo(126, 0); // lesson les-pattern-nulls-wedges: "or about 126° for the rounded blend"
    expect(180 - superNullDeg).toBeCloseTo(55, 0); // lesson les-pattern-nulls-wedges: "about 55° either side of the tail"
    expect(hyperNullDeg).toBeCloseTo(109.5, 1); // lesson les-pattern-nulls-wedges: "a cone of nulls at about 109.5°"
    expect(180 - hyperNullDeg).toBeCloseTo(70.5, 1); // lesson les-pattern-nulls-wedges: "about 70.5° either side of the tail"

    // The wedge table: levels at each pattern's null angle, r(θ) = A + B·cos θ [derived]
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 125.3 })).toBeCloseTo(-13.5, 1); // lesson les-pattern-nulls-wedges: "125.3° | −13.5 dB"
    expect(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: superNullDeg })).toBe(-Infinity); // lesson les-pattern-nulls-wedges: "125.3° | ... | null"
    expect(patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: 125.3 })).toBeCloseTo(-14.7, 1); // lesson les-pattern-nulls-wedges: "125.3° | ... | −14.7 dB"
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 109.5 })).toBeCloseTo(-9.5, 1); // lesson les-pattern-nulls-wedges: "109.5° | −9.5 dB"
    expect(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 109.5 })).toBeCloseTo(-16.2, 1); // lesson les-pattern-nulls-wedges: "109.5° | ... | −16.2 dB"
    expect(patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: hyperNullDeg })).toBe(-Infinity); // lesson les-pattern-nulls-wedges: "109.5° | ... | null"
  });

  it("les-pattern-proximity", () => {
    // REFERENCES.md §2, c = 343.0 m/s, f = 100 Hz: cardioid 1 cm 28.728, 5 cm 14.886, 10 cm 9.269,
    // 30 cm 2.619, 1 m 0.312; figure-8 5 cm 20.799 [derived from Kinsler & Frey's spherical-wave velocity]
    expect(cardioidBoostAt100HzDb(0.02)).toBeCloseTo(22.7, 1); // lesson les-pattern-proximity: "2 cm | about 22.7 dB"
    expect(cardioidBoostAt100HzDb(0.05)).toBeCloseTo(14.9, 1); // lesson les-pattern-proximity: "5 cm | about 14.9 dB"
    expect(cardioidBoostAt100HzDb(0.1)).toBeCloseTo(9.3, 1); // lesson les-pattern-proximity: "10 cm | about 9.3 dB"
    expect(cardioidBoostAt100HzDb(0.3)).toBeCloseTo(2.6, 1); // lesson les-pattern-proximity: "30 cm | about 2.6 dB"
    expect(cardioidBoostAt100HzDb(1)).toBeCloseTo(0.3, 1); // lesson les-pattern-proximity: "1 m | about 0.3 dB"
    expect(proximityBoostDb({ a: FIGURE8_A, distanceM: 0.05, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(20.8, 1); // lesson les-pattern-proximity: "A figure-8 at 5 cm is boosted by about 20.8 dB"
    expect(proximityBoostDb({ a: OMNI_A, distanceM: 0.05, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBe(0); // lesson les-pattern-proximity: "An omni shows none."
    // REFERENCES.md §2: "a cardioid at r behaves like a figure-8 at 2r"
    expect(cardioidBoostAt100HzDb(0.1)).toBeCloseTo(
      proximityBoostDb({ a: FIGURE8_A, distanceM: 0.2, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS }),
      9,
    ); // lesson les-pattern-proximity: "A cardioid, half gradient, behaves like a figure-8 at twice the distance"
    // REFERENCES.md §2: "Below that it rises 6 dB/octave" — one octave down, well below the corner
    const octaveRiseDb =
      proximityBoostDb({ a: CARDIOID_A, distanceM: 0.01, frequencyHz: 50, speedOfSoundMs: SPEED_OF_SOUND_MS }) -
      proximityBoostDb({ a: CARDIOID_A, distanceM: 0.01, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
    expect(octaveRiseDb).toBeCloseTo(6, 0); // lesson les-pattern-proximity: "the boost rises by about 6 dB for every octave you go down"
    // Inverse-square law, REFERENCES.md §5: ×2 → −6.0206 dB
    expect(inverseSquareChangeDb({ fromM: 0.025, toM: 0.05 })).toBeCloseTo(-6, 0); // lesson les-pattern-proximity: "moving from 2.5 cm to 5 cm lowers the level by about 6 dB"
  });
});

describe("direct-boxes-and-levels / levels-and-lines", () => {
  it("les-di-decibel-references", () => {
    // 20·log10 2 = 6.02 dB, 20·log10 10 = 20 dB (ITU-R V.574 decibel for field quantities)
    expect(voltageRatioDb(2)).toBeCloseTo(6, 0); // lesson les-di-decibel-references: "Double a voltage and you have added about 6 dB"
    expect(voltageRatioDb(10)).toBeCloseTo(20, 6); // lesson les-di-decibel-references: "multiply it by ten and you have added 20 dB"
    // STx manual table "0 dBu = 0.7746 V"; ITU-R BS.645-2 "0.775 V" (REFERENCES.md §6) [pub]
    expect(dbuToVolts(0)).toBeCloseTo(0.775, 3); // lesson les-di-decibel-references: "decibels relative to 0.775 V"
    expect(Math.sqrt(0.001 * 600)).toBeCloseTo(dbuToVolts(0), 9); // lesson les-di-decibel-references: "the voltage that delivers 1 milliwatt into 600 Ω"
    // ISO 1683 reference 20 µPa: 1 Pa → 93.979 dB SPL [pub reference]
    expect(splDbFromPa(1)).toBeCloseTo(94, 0); // lesson les-di-decibel-references: "One pascal ... is about 94 dB SPL"
    // itwissen.info "1 dBV ≈ +2.2 dBu" [pub]; derived +2.2185
    expect(dbvToDbu(0)).toBeCloseTo(2.2, 1); // lesson les-di-decibel-references: "1 V is 0 dBV and about +2.2 dBu"
    // REFERENCES.md §6 "output at SPL", trade shortcut 94 dB SPL = 1 Pa
    const voiceVolts = micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true });
    expect(voiceVolts * 1000).toBeCloseTo(2, 0); // lesson les-di-decibel-references: "makes about 2 mV"
    expect(voltsToDbu(voiceVolts)).toBeCloseTo(-51.8, 1); // lesson les-di-decibel-references: "about −51.8 dBu"
    expect(4 - voltsToDbu(voiceVolts)).toBeCloseTo(56, 0); // lesson les-di-decibel-references: "bringing the 2 mV voice to +4 dBu takes about 56 dB of gain"
    // ControlBooth "0.316 V", "+4 dBu is 1.228 V", "11.78 dB" (REFERENCES.md §6) [pub]
    expect(dbvToVolts(-10)).toBeCloseTo(0.316, 3); // lesson les-di-decibel-references: "a nominal −10 dBV, about 0.316 V"
    expect(dbuToVolts(4)).toBeCloseTo(1.228, 3); // lesson les-di-decibel-references: "a nominal +4 dBu, about 1.228 V"
    expect(4 - dbvToDbu(-10)).toBeCloseTo(11.8, 1); // lesson les-di-decibel-references: "The gap between the two nominal line levels is about 11.8 dB"
    // NIOSH 98-126: 85 dBA 8 h, 3 dB exchange; 94 → 1 h; 100 → 15 min (REFERENCES.md §10) [pub]
    expect(nioshHours(85)).toBeCloseTo(8, 6); // lesson les-di-decibel-references: "allows 85 dBA for 8 hours"
    expect(nioshHours(88) / nioshHours(85)).toBeCloseTo(0.5, 6); // lesson les-di-decibel-references: "halves the time for every 3 dB more"
    expect(nioshHours(94)).toBeCloseTo(1, 6); // lesson les-di-decibel-references: "At 94 dBA that is 1 hour"
    expect(nioshHours(100) * MINUTES_PER_HOUR).toBeCloseTo(15, 6); // lesson les-di-decibel-references: "at the 100 dBA on the band's sheet it is 15 minutes"
  });

  it("les-di-impedance-bridging", () => {
    // Matched 600 Ω source into 600 Ω load: divider 600/(600 + 600) = 0.5, 20·log10 0.5 = −6.02 dB
    // (voltage-divider formula; Ballou, Handbook for Sound Engineers, interconnection chapter [memory])
    const matchedRatio = 600 / (600 + 600);
    expect(matchedRatio).toBeCloseTo(0.5, 9); // lesson les-di-impedance-bridging: "Matching throws away half of the voltage"
    expect(voltageRatioDb(matchedRatio)).toBeCloseTo(-6, 0); // lesson les-di-impedance-bridging: "a 6 dB loss"
    // Load ten times the source: 10/(10 + 1) → −0.83 dB (same divider formula) [derived]
    expect(voltageRatioDb(10 / (10 + 1))).toBeGreaterThan(-1); // lesson les-di-impedance-bridging: "With a tenfold ratio the loss is well under a decibel"
  });

  it("les-di-balanced-lines", () => {
    // −60 dB as a voltage ratio = 10^(−60/20) = 0.001 (decibel definition)
    expect(dbvToVolts(-60)).toBeCloseTo(0.001, 6); // lesson les-di-balanced-lines: "60 dB of rejection reduces common-mode noise to a thousandth of its voltage"
  });
});

describe("direct-boxes-and-levels / direct-boxes", () => {
  it("les-di-passive-active", () => {
    // Electronic Musician "Going Direct" (10:1, 12:1 ratios); atelier-der-tonkunst.de "impedance ×100,
    // level ÷10" for 10:1; derived −20.00 and −21.58 dB (REFERENCES.md §8)
    expect(transformer({ turnsRatio: 10 }).voltageChangeDb).toBeCloseTo(-20, 0); // lesson les-di-passive-active: "A 10:1 transformer lowers the level by 20 dB"
    expect(transformer({ turnsRatio: 10 }).impedanceRatio).toBeCloseTo(100, 6); // lesson les-di-passive-active: "and multiplies impedance by 100"
    expect(transformer({ turnsRatio: 12 }).voltageChangeDb).toBeCloseTo(-21.6, 1); // lesson les-di-passive-active: "A 12:1 transformer lowers the level by about 21.6 dB"
    expect(transformer({ turnsRatio: 12 }).impedanceRatio).toBeCloseTo(144, 6); // lesson les-di-passive-active: "and multiplies impedance by 144"
    // REFERENCES.md §8: 12:1 into 1.5 kΩ → 216 kΩ; into 2 kΩ → 288 kΩ [derived]
    expect(reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 1500 }) / 1000).toBeCloseTo(216, 0); // lesson les-di-passive-active: "presents a load of about 216 kΩ"
    expect(reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 2000 }) / 1000).toBeCloseTo(288, 0); // lesson les-di-passive-active: "the load is about 288 kΩ"
    // IEC 61938 P48 feed network (REFERENCES.md §7)
    expect(P48.feedResistorPerLegOhms / 1000).toBeCloseTo(6.81, 2); // lesson les-di-passive-active: "a P48 supply has 6.81 kΩ in each leg"
    expect(phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 }).voltsAtMic).toBeCloseTo(31, 0); // lesson les-di-passive-active: "a DI drawing 5 mA receives only about 31 V"
  });

  it("les-di-thru-amp-feeds", () => {
    // Two loads in parallel: R = R1·R2/(R1 + R2) (common practice; lib/acoustics has no helper for it)
    const parallelMegohm = (1 * 1) / (1 + 1);
    expect(parallelMegohm).toBeCloseTo(0.5, 6); // lesson les-di-thru-amp-feeds: "the combined load is still about half a megohm"
    // +4 dBu through a 12:1 transformer: 4 − 21.58 = −17.58 dBu (REFERENCES.md §8) [derived]
    expect(4 + transformer({ turnsRatio: 12 }).voltageChangeDb).toBeCloseTo(-17.6, 1); // lesson les-di-thru-amp-feeds: "arrives at the preamp at about −17.6 dBu"
    // P = V²/R → V = √(P·R): 100 W into 8 Ω → 28.28 V (Ohm's law; lib/acoustics has no helper for it)
    const speakerVolts = Math.sqrt(100 * 8);
    expect(speakerVolts).toBeCloseTo(28, 0); // lesson les-di-thru-amp-feeds: "100 W into an 8 Ω cabinet produces about 28 V"
    expect(voltsToDbu(speakerVolts)).toBeCloseTo(31, 0); // lesson les-di-thru-amp-feeds: "about +31 dBu"
  });

  it("les-di-stereo-keys", () => {
    // Two equal coherent signals: +20·log10 2 = +6.021 dB (REFERENCES.md §4) [derived]
    expect(combExtremesDb({ amplitudeRatio: 1 }).peakDb).toBeCloseTo(6.0, 1); // lesson les-di-stereo-keys: "about 6.0 dB louder"
    // τ = 1 ms ≡ Δd = 0.343 m at 343 m/s → 500, 1500, 2500 Hz (REFERENCES.md §4; Everest & Pohlmann)
    const notchesHz = combNotchesHz({ pathDifferenceM: 0.343, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 3 });
    expect(notchesHz[0]).toBeCloseTo(500, 0); // lesson les-di-stereo-keys: "the first notches fall at 500 Hz"
    expect(notchesHz[1]).toBeCloseTo(1500, 0); // lesson les-di-stereo-keys: "1500 Hz"
    expect(notchesHz[2]).toBeCloseTo(2500, 0); // lesson les-di-stereo-keys: "and 2500 Hz"
    expect(combResponseDb({ amplitudeRatio: 1, delayMs: 1, frequencyHz: 500 })).toBe(-Infinity); // lesson les-di-stereo-keys: "With a 1 ms offset ... 500 Hz" (a full null for equal levels)
  });
});
