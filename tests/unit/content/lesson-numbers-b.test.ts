import { describe, expect, it } from "vitest";
import {
  combExtremesDb,
  combNotchesHz,
  dbuToVolts,
  dbvToDbu,
  dbvToVolts,
  delayMs,
  HYPERCARDIOID_A,
  inverseSquareChangeDb,
  patternFigures,
  patternLevelDb,
  PHANTOM_SUPPLIES,
  phantomAtMic,
  PICKUP_PATTERNS,
  permissibleExposureHours,
  potentialAcousticGainDb,
  proximityBoostDb,
  speedOfSoundMs,
  SUPERCARDIOID_A,
  twoPathAmplitudeRatio,
} from "@/lib/acoustics";

// Every computed number quoted in the miking-the-band course, checked against lib/acoustics.
// Each expectation uses the value and the number of digits as printed in the lesson.
// Lessons les-mtb-order-of-work, les-mtb-input-list and les-mtb-wireless quote no computed numbers.
//
// The lessons pin the speed of sound at 343 m/s ("at 343 m/s" in the prose); REFERENCES.md §3, §4, §11.
const SPEED_OF_SOUND_MS = 343.0;

const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
/** The "3:5" supercardioid of HyperPhysics, "Directional Patterns of Microphones" (null 127°). */
const SUPERCARDIOID_3_TO_5_A = 0.375;

function firstNotchHz(pathDifferenceM: number): number {
  return combNotchesHz({ pathDifferenceM, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 1 })[0];
}

function firstNullDeg(a: number): number {
  return patternFigures({ a }).nullAnglesDeg[0];
}

function cardioidProximityAt100HzDb(distanceM: number): number {
  return proximityBoostDb({ a: CARDIOID_A, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

/** A reference free-field PAG geometry (metres) so that single changes can be compared. */
const REFERENCE_GAIN_GEOMETRY = { dsM: 0.05, d0M: 12, d1M: 1.5, d2M: 10, openMics: 1, stabilityMarginDb: 6 };

function pagChangeDb(change: Partial<typeof REFERENCE_GAIN_GEOMETRY>): number {
  return potentialAcousticGainDb({ ...REFERENCE_GAIN_GEOMETRY, ...change }) - potentialAcousticGainDb(REFERENCE_GAIN_GEOMETRY);
}

describe("lesson les-mtb-line-check", () => {
  it("P48 specification as quoted", () => {
    // IEC 61938:2018 via Sound On Sound glossary "Phantom Power" and Wikipedia "Phantom power" (REFERENCES.md §7) [pub]
    expect(PHANTOM_SUPPLIES.P48.nominalV).toBeCloseTo(48, 0); // lesson les-mtb-line-check: "48 V ± 4 V"
    expect(PHANTOM_SUPPLIES.P48.toleranceV).toBeCloseTo(4, 0); // lesson les-mtb-line-check: "48 V ± 4 V"
    expect(PHANTOM_SUPPLIES.P48.feedResistorPerLegOhms / 1000).toBeCloseTo(6.81, 2); // lesson les-mtb-line-check: "6.81 kΩ per leg"
    expect(PHANTOM_SUPPLIES.P48.maxCurrentMa).toBeCloseTo(10, 0); // lesson les-mtb-line-check: "up to 10 mA available"
  });

  it("voltage at a condenser drawing 5 mA", () => {
    // V_mic = V − I·R/2 = 48 − 0.005 × 3405 = 30.98 V (REFERENCES.md §7, P48 check values) [derived]
    const { voltsAtMic } = phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 });
    expect(voltsAtMic).toBeCloseTo(31, 0); // lesson les-mtb-line-check: "sees about 31 V at its connector"
  });
});

describe("lesson les-mtb-kick-snare-hihat", () => {
  it("cardioid side rejection", () => {
    // Eargle, The Microphone Book, ch. 5; HyperPhysics: cardioid 90° −6 dB (REFERENCES.md §1) [pub]
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 90 })).toBeCloseTo(-6, 0); // lesson les-mtb-kick-snare-hihat: "only about 6 dB down at 90°"
  });

  it("supercardioid and hypercardioid nulls and rear level", () => {
    // Heller (2011) exact supercardioid, null 125.26°; HyperPhysics 3:5 supercardioid, null 127° (REFERENCES.md §1)
    expect(firstNullDeg(SUPERCARDIOID_A)).toBeCloseTo(125, 0); // lesson les-mtb-kick-snare-hihat: "roughly 125–127° off axis"
    expect(firstNullDeg(SUPERCARDIOID_3_TO_5_A)).toBeCloseTo(127, 0); // lesson les-mtb-kick-snare-hihat: "roughly 125–127° off axis"
    // Exact supercardioid 180° level −11.439 dB (REFERENCES.md §1) [derived]
    expect(patternFigures({ a: SUPERCARDIOID_A }).level180Db).toBeCloseTo(-11, 0); // lesson les-mtb-kick-snare-hihat: "directly behind it is only about 11 dB down"
    // Hypercardioid null 109.47° (HyperPhysics prints 110°; REFERENCES.md §1)
    expect(firstNullDeg(HYPERCARDIOID_A)).toBeCloseTo(109, 0); // lesson les-mtb-kick-snare-hihat: "nulls at about 109°"
  });
});

describe("lesson les-mtb-toms-overheads", () => {
  it("snare path mismatch between overheads", () => {
    // f1 = c/(2Δd) (Everest & Pohlmann; REFERENCES.md §4): 343/(2 × 0.1) = 1715 Hz [derived]
    expect(firstNotchHz(0.1)).toBeCloseTo(1715, 0); // lesson les-mtb-toms-overheads: "first cancellation falls at about 1715 Hz"
  });

  it("kick arrival in the overheads", () => {
    // t = d/c (REFERENCES.md §11): 1.3/343 s = 3.790 ms [derived]
    expect(delayMs({ distanceM: 1.3, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(3.8, 1); // lesson les-mtb-toms-overheads: "about 3.8 ms to cover 1.3 m"
    // f1 = 343/(2 × 1.3) = 131.9 Hz [derived]
    expect(firstNotchHz(1.3)).toBeCloseTo(132, 0); // lesson les-mtb-toms-overheads: "the first cancellation would fall at about 132 Hz"
  });
});

describe("lesson les-mtb-reduced-kit", () => {
  it("inverse-square rule of thumb and lowering the overhead", () => {
    // ΔL = −20·log10(r2/r1): ×2 → −6.02 dB (REFERENCES.md §5) [derived]
    expect(inverseSquareChangeDb({ fromM: 1, toM: 2 })).toBeCloseTo(-6, 0); // lesson les-mtb-reduced-kit: "each doubling of distance costs about 6 dB"
    // 20·log10(1.2/0.8) = 3.52 dB [derived]
    expect(inverseSquareChangeDb({ fromM: 1.2, toM: 0.8 })).toBeCloseTo(3.5, 1); // lesson les-mtb-reduced-kit: "raises the snare at the microphone by about 3.5 dB"
  });
});

describe("lesson les-mtb-bass-di-and-mic", () => {
  it("delay and first notch for a microphone 30 cm from the cone", () => {
    // t = d/c (REFERENCES.md §11): 0.3/343 s = 0.8746 ms [derived]
    expect(delayMs({ distanceM: 0.3, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(0.87, 2); // lesson les-mtb-bass-di-and-mic: "about 0.87 ms at 343 m/s"
    // f1 = 343/(2 × 0.3) = 571.7 Hz (REFERENCES.md §4) [derived]
    expect(firstNotchHz(0.3)).toBeCloseTo(572, 0); // lesson les-mtb-bass-di-and-mic: "cancel completely at about 572 Hz"
  });

  it("ripple with the microphone 6 dB below the DI", () => {
    // a = 0.5: +3.522 / −6.021 dB (REFERENCES.md §4) [derived]
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 0.5 });
    expect(peakDb).toBeCloseTo(3.5, 1); // lesson les-mtb-bass-di-and-mic: "about +3.5 dB at the peaks"
    expect(notchDb).toBeCloseTo(-6.0, 1); // lesson les-mtb-bass-di-and-mic: "−6.0 dB at the notches"
    // half the amplitude is 6 dB down, the same ratio as doubling a distance (REFERENCES.md §5)
    expect(inverseSquareChangeDb({ fromM: 1, toM: 2 })).toBeCloseTo(-6, 0); // lesson les-mtb-bass-di-and-mic: "6 dB below the DI (half the amplitude)"
  });
});

describe("lesson les-mtb-guitar-cabinet", () => {
  it("ideal cardioid at 45°", () => {
    // 20·log10(0.5 + 0.5·cos 45°) = −1.375 dB (Eargle, ch. 5 pattern formula) [derived]
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 45 })).toBeCloseTo(-1.4, 1); // lesson les-mtb-guitar-cabinet: "only about 1.4 dB down"
  });

  it("ideal cardioid proximity boost at 100 Hz", () => {
    // REFERENCES.md §2, c = 343.0: cardioid 5 cm 14.886 dB, 30 cm 2.619 dB [derived]
    expect(cardioidProximityAt100HzDb(0.05)).toBeCloseTo(15, 0); // lesson les-mtb-guitar-cabinet: "about 15 dB at 5 cm"
    expect(cardioidProximityAt100HzDb(0.3)).toBeCloseTo(2.6, 1); // lesson les-mtb-guitar-cabinet: "about 2.6 dB at 30 cm"
  });
});

describe("lesson les-mtb-keys", () => {
  it("consumer and professional line levels", () => {
    // REFERENCES.md §6: −10 dBV = 0.316228 V; +4 dBu = 1.22765 V; ControlBooth "11.78 dB" [pub]
    expect(dbvToVolts(-10)).toBeCloseTo(0.316, 3); // lesson les-mtb-keys: "−10 dBV (about 0.316 V)"
    expect(dbuToVolts(4)).toBeCloseTo(1.228, 3); // lesson les-mtb-keys: "+4 dBu (about 1.228 V)"
    expect(4 - dbvToDbu(-10)).toBeCloseTo(11.8, 1); // lesson les-mtb-keys: "about 11.8 dB higher than −10 dBV"
  });
});

describe("lesson les-mtb-vocal-mics", () => {
  it("pattern figures for wedge placement", () => {
    // Eargle Table 6-1 / HyperPhysics (REFERENCES.md §1)
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 90 })).toBeCloseTo(-6, 0); // lesson les-mtb-vocal-mics: "about 6 dB down at 90°"
    expect(firstNullDeg(SUPERCARDIOID_A)).toBeCloseTo(125, 0); // lesson les-mtb-vocal-mics: "its deepest rejection at roughly 125° off axis"
    expect(patternFigures({ a: SUPERCARDIOID_A }).level180Db).toBeCloseTo(-11, 0); // lesson les-mtb-vocal-mics: "Directly behind, it is about 11 dB down"
    expect(firstNullDeg(HYPERCARDIOID_A)).toBeCloseTo(109, 0); // lesson les-mtb-vocal-mics: "nulls at about 109°"
    expect(patternFigures({ a: HYPERCARDIOID_A }).level180Db).toBeCloseTo(-6, 0); // lesson les-mtb-vocal-mics: "only about 6 dB down at 180°"
  });

  it("ideal cardioid proximity boost at 100 Hz", () => {
    // REFERENCES.md §2, c = 343.0: 5 cm 14.886, 10 cm 9.269, 30 cm 2.619 dB [derived]
    expect(cardioidProximityAt100HzDb(0.05)).toBeCloseTo(15, 0); // lesson les-mtb-vocal-mics: "about 15 dB at 5 cm"
    expect(cardioidProximityAt100HzDb(0.1)).toBeCloseTo(9.3, 1); // lesson les-mtb-vocal-mics: "about 9.3 dB at 10 cm"
    expect(cardioidProximityAt100HzDb(0.3)).toBeCloseTo(2.6, 1); // lesson les-mtb-vocal-mics: "about 2.6 dB at 30 cm"
  });
});

describe("lesson les-mtb-piano-one-mic-pair", () => {
  it("first mono notch of a spaced pair", () => {
    // f1 = 343/(2 × 0.4) = 428.75 Hz (REFERENCES.md §4) [derived]
    expect(firstNotchHz(0.4)).toBeCloseTo(429, 0); // lesson les-mtb-piano-one-mic-pair: "first cancel at about 429 Hz (at 343 m/s)"
  });
});

describe("lesson les-mtb-piano-boundary", () => {
  it("reflection notch 10 cm from the lid, and at a boundary capsule", () => {
    // 2 × 0.1 m extra path at normal incidence: f1 = 343/0.4 = 857.5 Hz [derived]
    expect(firstNotchHz(0.2)).toBeCloseTo(860, -1); // lesson les-mtb-piano-boundary: "the first cancellation falls near 860 Hz"
    // 1 cm path difference: f1 = 343/0.02 = 17 150 Hz [derived]
    expect(firstNotchHz(0.01)).toBeCloseTo(17000, -3); // lesson les-mtb-piano-boundary: "puts the first notch near 17 kHz"
  });

  it("in-phase addition at a boundary", () => {
    // a = 1: +20·log10 2 = +6.021 dB (REFERENCES.md §4) [derived]
    expect(combExtremesDb({ amplitudeRatio: 1 }).peakDb).toBeCloseTo(6, 0); // lesson les-mtb-piano-boundary: "up to about +6 dB"
  });
});

describe("lesson les-mtb-phase-three-to-one", () => {
  it("speed of sound and delay per distance", () => {
    // c = 331.3·√(1 + 20/273.15) = 343.215 m/s (REFERENCES.md §3) [pub formula]
    expect(speedOfSoundMs({ temperatureC: 20 })).toBeCloseTo(343, 0); // lesson les-mtb-phase-three-to-one: "about 343 m/s (the speed of sound in air at 20 °C)"
    expect(delayMs({ distanceM: 0.34, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(1, 0); // lesson les-mtb-phase-three-to-one: "every 34 cm of extra path is about 1 ms"
  });

  it("two microphones at 0.3 m and 0.9 m", () => {
    // Δd = 0.6 m: t = 1.749 ms, f1 = 285.8 Hz, notches at odd multiples (REFERENCES.md §4, §11) [derived]
    expect(delayMs({ distanceM: 0.6, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(1.75, 2); // lesson les-mtb-phase-three-to-one: "arrives about 1.75 ms later"
    const notchesHz = combNotchesHz({ pathDifferenceM: 0.6, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 4 });
    expect(notchesHz[0]).toBeCloseTo(286, 0); // lesson les-mtb-phase-three-to-one: "about 286 Hz here"
    expect(notchesHz[1] / notchesHz[0]).toBeCloseTo(3, 6); // lesson les-mtb-phase-three-to-one: "3, 5, 7… times that"
    expect(notchesHz[2] / notchesHz[0]).toBeCloseTo(5, 6); // lesson les-mtb-phase-three-to-one: "3, 5, 7… times that"
    expect(notchesHz[3] / notchesHz[0]).toBeCloseTo(7, 6); // lesson les-mtb-phase-three-to-one: "3, 5, 7… times that"
  });

  it("equal-level copies", () => {
    // a = 1: +6.021 dB / −∞ (REFERENCES.md §4) [derived]
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 1 });
    expect(peakDb).toBeCloseTo(6, 0); // lesson les-mtb-phase-three-to-one: "peaks would reach +6 dB"
    expect(notchDb).toBe(-Infinity); // lesson les-mtb-phase-three-to-one: "the notches would be complete cancellations"
  });

  it("the 3:1 practice in line", () => {
    // 20·log10 3 = 9.542 dB; a = 1/3 → +2.499 / −3.522 dB; swing 20·log10 2 = 6.021 dB (REFERENCES.md §4, §5) [derived]
    expect(inverseSquareChangeDb({ fromM: 1, toM: 3 })).toBeCloseTo(-9.5, 1); // lesson les-mtb-phase-three-to-one: "hears the source about 9.5 dB lower"
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: twoPathAmplitudeRatio({ nearM: 1, farM: 3 }) });
    expect(peakDb).toBeCloseTo(2.5, 1); // lesson les-mtb-phase-three-to-one: "peaks of about +2.5 dB"
    expect(notchDb).toBeCloseTo(-3.5, 1); // lesson les-mtb-phase-three-to-one: "notches of about −3.5 dB"
    expect(peakDb - notchDb).toBeCloseTo(6.0, 1); // lesson les-mtb-phase-three-to-one: "a peak-to-notch swing of about 6.0 dB"
  });

  it("what a 1 dB dip would need", () => {
    // notch = 20·log10(1 − a); a 1 dB dip needs a ≈ 0.109, i.e. about −19.3 dB (REFERENCES.md §4) [derived]
    expect(combExtremesDb({ amplitudeRatio: 10 ** (-19 / 20) }).notchDb).toBeCloseTo(-1.0, 1); // lesson les-mtb-phase-three-to-one: "a 1 dB dip needs the second copy about 19 dB down"
  });

  it("the 3:1 practice off to the side", () => {
    // path √10·d → −10.0 dB, a = 0.316 → +2.387 / −3.302 dB (REFERENCES.md §4) [derived]
    const sidePathM = Math.sqrt(10);
    expect(inverseSquareChangeDb({ fromM: 1, toM: sidePathM })).toBeCloseTo(-10.0, 1); // lesson les-mtb-phase-three-to-one: "about 10.0 dB down"
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: twoPathAmplitudeRatio({ nearM: 1, farM: sidePathM }) });
    expect(peakDb).toBeCloseTo(2.4, 1); // lesson les-mtb-phase-three-to-one: "peaks of about +2.4 dB"
    expect(notchDb).toBeCloseTo(-3.3, 1); // lesson les-mtb-phase-three-to-one: "notches of about −3.3 dB"
  });

  it("3:1 plus a cardioid's side rejection", () => {
    // −9.542 + −6.021 = −15.563 dB; a = 1/6 → +1.339 / −1.584 dB [derived]
    const cardioidSideDb = patternLevelDb({ a: CARDIOID_A, angleDeg: 90 });
    expect(cardioidSideDb).toBeCloseTo(-6, 0); // lesson les-mtb-phase-three-to-one: "it is another 6 dB down"
    expect(inverseSquareChangeDb({ fromM: 1, toM: 3 }) + cardioidSideDb).toBeCloseTo(-15.6, 1); // lesson les-mtb-phase-three-to-one: "the far copy is about 15.6 dB below"
    const amplitudeRatio = twoPathAmplitudeRatio({ nearM: 1, farM: 3 }) * 10 ** (cardioidSideDb / 20);
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio });
    expect(peakDb).toBeCloseTo(1.3, 1); // lesson les-mtb-phase-three-to-one: "about +1.3 dB"
    expect(notchDb).toBeCloseTo(-1.6, 1); // lesson les-mtb-phase-three-to-one: "and −1.6 dB"
  });

  it("close vocal miking", () => {
    // 20·log10(0.6/0.05) = 21.58 dB (REFERENCES.md §5) [derived]
    expect(inverseSquareChangeDb({ fromM: 0.05, toM: 0.6 })).toBeCloseTo(-21.6, 1); // lesson les-mtb-phase-three-to-one: "hears her voice about 21.6 dB down"
  });
});

describe("lesson les-mtb-feedback-monitors", () => {
  it("stability margin as used in the PAG equation", () => {
    // Ballou, Handbook for Sound Engineers, 4th ed., eq. 34-5: FSM 6 dB (REFERENCES.md §9) [pub]
    expect(pagChangeDb({ stabilityMarginDb: 0 })).toBeCloseTo(6, 0); // lesson les-mtb-feedback-monitors: "subtracts a 6 dB feedback stability margin"
  });

  it("microphone-to-mouth and microphone-to-wedge distances", () => {
    // inverse square (REFERENCES.md §5) and the D_s, D_1 terms of eq. 34-5 [derived]
    expect(inverseSquareChangeDb({ fromM: 0.05, toM: 0.1 })).toBeCloseTo(-6, 0); // lesson les-mtb-feedback-monitors: "her level at the microphone falls by about 6 dB"
    expect(pagChangeDb({ dsM: 0.1 })).toBeCloseTo(-6, 0); // lesson les-mtb-feedback-monitors: "That gain comes straight out of the margin"
    expect(pagChangeDb({ d1M: 2 * REFERENCE_GAIN_GEOMETRY.d1M })).toBeCloseTo(6, 0); // lesson les-mtb-feedback-monitors: "Each doubling of the distance from the microphone to the wedge is worth about the same 6 dB"
  });

  it("number of open microphones", () => {
    // −10·log10 NOM (Ballou eq. 34-5): 2 → −3.01 dB, 4 → −6.02 dB [derived]
    expect(pagChangeDb({ openMics: 2 })).toBeCloseTo(-3, 0); // lesson les-mtb-feedback-monitors: "each doubling of the number of open microphones costs about 3 dB"
    expect(pagChangeDb({ openMics: 4 })).toBeCloseTo(-6, 0); // lesson les-mtb-feedback-monitors: "going from one to four costs about 6 dB"
  });

  it("pattern figures for wedge placement", () => {
    // REFERENCES.md §1
    expect(firstNullDeg(SUPERCARDIOID_A)).toBeCloseTo(125, 0); // lesson les-mtb-feedback-monitors: "about 125° off axis"
    expect(patternFigures({ a: SUPERCARDIOID_A }).level180Db).toBeCloseTo(-11, 0); // lesson les-mtb-feedback-monitors: "directly behind it is only about 11 dB down"
    expect(firstNullDeg(HYPERCARDIOID_A)).toBeCloseTo(109, 0); // lesson les-mtb-feedback-monitors: "the null is at about 109°"
    expect(patternFigures({ a: HYPERCARDIOID_A }).level180Db).toBeCloseTo(-6, 0); // lesson les-mtb-feedback-monitors: "straight behind it is only about 6 dB down"
    expect(patternFigures({ a: CARDIOID_A }).nullAnglesDeg).toEqual([180]); // lesson les-mtb-feedback-monitors: "For a cardioid that is straight behind"
  });

  it("NIOSH recommended exposure times", () => {
    // NIOSH 98-126: 94 dBA → 1 h, 100 dBA → 15 min (REFERENCES.md §10) [pub]
    expect(permissibleExposureHours({ levelDba: 94, standard: "niosh" })).toBeCloseTo(1, 2); // lesson les-mtb-feedback-monitors: "94 dBA is one hour's full daily allowance"
    expect(permissibleExposureHours({ levelDba: 100, standard: "niosh" }) * 60).toBeCloseTo(15, 1); // lesson les-mtb-feedback-monitors: "100 dBA only 15 minutes"
  });
});
