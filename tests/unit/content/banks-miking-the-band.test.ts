// Question banks of the miking-the-band course (content/banks/miking-the-band/*.json): every
// numeric key and the numbers quoted in prompts and explanations, recomputed with lib/acoustics
// beside their sources, and the generators at published check values. The checks all banks
// share are in banks-common.test.ts.
import { describe, expect, it } from "vitest";
import { acousticsGenerators, convertUnit, gradeAnswer } from "@/lib/assessment";
import {
  combExtremesDb,
  combNotchesHz,
  dbvToDbu,
  delayMs,
  HYPERCARDIOID_A,
  inverseSquareChangeDb,
  neededAcousticGainDb,
  patternFigures,
  patternLevelDb,
  permissibleExposureHours,
  phantomAtMic,
  PICKUP_PATTERNS,
  potentialAcousticGainDb,
  proximityBoostDb,
  speedOfSoundMs,
  SUPERCARDIOID_A,
  twoPathAmplitudeRatio,
  wavelengthM,
} from "@/lib/acoustics";
import { loadCourseBanks } from "./course-banks";

const { ofKind } = loadCourseBanks("miking-the-band");

/** Half a unit in the last printed decimal of a key as stored in JSON (30.98 → ±0.005). */
function printedHalfUnit(value: number): number {
  const text = String(value);
  const decimals = text.includes(".") ? text.split(".")[1].length : 0;
  return 0.5 * 10 ** -decimals + 1e-12;
}

// ---------------------------------------------------------------------------------------------
// Library values behind every numeric key. The lessons pin c = 343 m/s ("at 343 m/s" in the
// prose and in each prompt); 343.0 (common tables), 343.2 (ISO 9613-1) and 343.4 (Wikipedia "Speed of sound", linear form) differ, so c is fixed.
// ---------------------------------------------------------------------------------------------
const SPEED_OF_SOUND_MS = 343.0;
const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;

function firstNotchHz(pathDifferenceM: number): number {
  return combNotchesHz({ pathDifferenceM, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 1 })[0];
}

function cardioidProximityAt100HzDb(distanceM: number): number {
  return proximityBoostDb({ a: CARDIOID_A, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

/** A free-field PAG geometry in metres; only single changes to it are asked about. */
const GAIN_GEOMETRY = { dsM: 0.05, d0M: 12, d1M: 1, d2M: 10, openMics: 1, stabilityMarginDb: 6 };
function pagChangeDb(change: Partial<typeof GAIN_GEOMETRY>, from: Partial<typeof GAIN_GEOMETRY> = {}): number {
  return (
    potentialAcousticGainDb({ ...GAIN_GEOMETRY, ...from, ...change }) - potentialAcousticGainDb({ ...GAIN_GEOMETRY, ...from })
  );
}

/** Question id → the library value of its key, in the key's unit. */
const NUMERIC_KEY_VALUES: Readonly<Record<string, () => number>> = {
  // IEC 61938 (P48: 48 V, 6.81 kΩ per leg): V_mic = 30.98 V at 5 mA [derived]
  "q-setup-13": () => phantomAtMic({ supply: "P48", currentMa: 5 }).voltsAtMic,

  // Eargle, The Microphone Book, ch. 5: cardioid 0.5 + 0.5·cos 90° → −6.021 dB
  "q-drums-07": () => patternLevelDb({ a: CARDIOID_A, angleDeg: 90 }),
  // f1 = c/(2Δd); Δd = 0.1 m at 343 m/s → 1715 Hz [derived]
  "q-drums-10": () => firstNotchHz(0.1),
  // t = d/c; 1.3 m at 343.0 m/s → 3.79 ms [derived]
  "q-drums-12": () => delayMs({ distanceM: 1.3, speedOfSoundMs: SPEED_OF_SOUND_MS }),
  // inverse-square law: −20·log10(0.8/1.2) = +3.52 dB [derived]
  "q-drums-15": () => inverseSquareChangeDb({ fromM: 1.2, toM: 0.8 }),

  // t = d/c: 0.3 m at 343.0 m/s → 0.8746 ms [derived]
  "q-instruments-04": () => delayMs({ distanceM: 0.3, speedOfSoundMs: SPEED_OF_SOUND_MS }),
  // f1 = c/(2Δd): 343/(2·0.3) = 571.67 Hz [derived]
  "q-instruments-05": () => firstNotchHz(0.3),
  // 20·log10(1 + a) (two-path model): a = 0.5 → peak +3.522 dB [derived]
  "q-instruments-06": () => combExtremesDb({ amplitudeRatio: 0.5 }).peakDb,
  // Eargle, ch. 5: cardioid at 45° → 20·log10(0.8536) = −1.375 dB [derived]
  "q-instruments-11": () => patternLevelDb({ a: CARDIOID_A, angleDeg: 45 }),
  // proximity model 10·log10(1 + (B/kr)²): cardioid, 100 Hz, 5 cm, c = 343.0 → 14.886 dB [derived]
  "q-instruments-13": () => cardioidProximityAt100HzDb(0.05),
  // +4 dBu vs −10 dBV = 11.7815 dB (ControlBooth "11.78 dB" [pub])
  "q-instruments-16": () => 4 - dbvToDbu(-10),

  // supercardioid (exact optimum, Heller 2011) 180° → −11.439 dB [derived]
  "q-vocals-and-wireless-04": () => patternFigures({ a: SUPERCARDIOID_A }).level180Db,
  // hypercardioid 180° → −6.021 dB; HyperPhysics "180° −6" [pub]
  "q-vocals-and-wireless-05": () => patternFigures({ a: HYPERCARDIOID_A }).level180Db,
  // proximity model 10·log10(1 + (B/kr)²): cardioid, 100 Hz, 10 cm, c = 343.0 → 9.269 dB [derived]
  "q-vocals-and-wireless-06": () => cardioidProximityAt100HzDb(0.1),

  // f1 = c/(2Δd): 343/(2·0.4) = 428.75 Hz [derived]
  "q-piano-06": () => firstNotchHz(0.4),
  // two-path model, 3:1 practice: mic B 3d to the side, path √10·d → −10.0 dB [derived]
  "q-piano-07": () => inverseSquareChangeDb({ fromM: 0.2, toM: Math.hypot(0.6, 0.2) }),
  // f1 = c/(2Δd): 343/(2·0.2) = 857.5 Hz [derived]
  "q-piano-12": () => firstNotchHz(0.2),
  // f1 = c/(2Δd): 343/(2·0.01) = 17 150 Hz, stored in kHz [derived]
  "q-piano-13": () => convertUnit(firstNotchHz(0.01), "Hz", "kHz"),
  // 20·log10(1 + a) (two-path model): a = 1 → peak +6.021 dB [derived]
  "q-piano-14": () => combExtremesDb({ amplitudeRatio: 1 }).peakDb,

  // t = d/c: 0.6 m at 343.0 m/s → 1.749 ms [derived]
  "q-phase-and-feedback-04": () => delayMs({ distanceM: 0.6, speedOfSoundMs: SPEED_OF_SOUND_MS }),
  // f1 = c/(2Δd): 343/(2·0.6) = 285.83 Hz [derived]
  "q-phase-and-feedback-05": () => firstNotchHz(0.6),
  // two-path model, 3:1 practice: 20·log10 3 = 9.542 dB down
  "q-phase-and-feedback-06": () => inverseSquareChangeDb({ fromM: 1, toM: 3 }),
  // two-path model, 3:1 practice: a = 1/3 → notch −3.522 dB [derived]
  "q-phase-and-feedback-07": () =>
    combExtremesDb({ amplitudeRatio: twoPathAmplitudeRatio({ nearM: 1, farM: 3 }) }).notchDb,
  // inverse-square law (×3 → −9.542) plus Eargle ch. 5 (cardioid at 90° → −6.021): −15.563 dB [derived]
  "q-phase-and-feedback-09": () => inverseSquareChangeDb({ fromM: 1, toM: 3 }) + patternLevelDb({ a: CARDIOID_A, angleDeg: 90 }),
  // inverse-square law: −20·log10(0.6/0.05) = −21.58 dB [derived]
  "q-phase-and-feedback-10": () => inverseSquareChangeDb({ fromM: 0.05, toM: 0.6 }),
  // Ballou, Handbook for Sound Engineers, eq. 34-5: −10·log10 NOM; 1 → 4 mics = −6.02 dB
  "q-phase-and-feedback-14": () => pagChangeDb({ openMics: 4 }),
  // Ballou, eq. 34-5: +20·log10 D1; 1 m → 2 m = +6.02 dB
  "q-phase-and-feedback-15": () => pagChangeDb({ d1M: 2 }),
  // NIOSH 98-126 REL: 100 dBA → 15 min ([pub]); library returns hours
  "q-phase-and-feedback-19": () => convertUnit(permissibleExposureHours({ levelDba: 100, standard: "niosh" }), "h", "min"),

  // IEC 61938:2018: P48 V_mic = 24.17 V at 7 mA [derived]
  "q-final-03": () => phantomAtMic({ supply: "P48", currentMa: 7 }).voltsAtMic,
  // f1 = c/(2Δd): 343/(2·1.3) = 131.92 Hz [derived]
  "q-final-09": () => firstNotchHz(1.3),
  // f1 = c/(2Δd): 343/(2·0.35) = 490 Hz [derived]
  "q-final-10": () => firstNotchHz(0.35),
  // 20·log10(1 − a) (two-path model): a = 0.5 → notch −6.021 dB [derived]
  "q-final-11": () => combExtremesDb({ amplitudeRatio: 0.5 }).notchDb,
  // proximity model 10·log10(1 + (B/kr)²): cardioid, 100 Hz, 30 cm, c = 343.0 → 2.619 dB [derived]
  "q-final-12": () => cardioidProximityAt100HzDb(0.3),
  // Ballou, eq. 34-5: 4 → 8 open mics = −10·log10 2 = −3.01 dB
  "q-final-19": () => pagChangeDb({ openMics: 8 }, { openMics: 4 }),
};

describe("miking-the-band banks: generated questions", () => {
  it("the generators agree with published check values", () => {
    // Wikipedia "Speed of sound": c(20 °C) = 331.3·√(1 + 20/273.15) = 343.215 m/s [pub form]
    expect(speedOfSoundMs({ temperatureC: 20 })).toBeCloseTo(343.215, 3);
    // f1 = c/(2Δd) → 0.1 m at 20 °C = 343.215/0.2 = 1716.08 Hz [derived]
    expect(acousticsGenerators.combFirstNotch.compute({ pathDifferenceM: 0.1, temperatureC: 20 }).value).toBeCloseTo(1716.08, 1);
    // t = d/c: 1 m at 343.215 m/s → 2.9136 ms [derived]
    expect(acousticsGenerators.delayFromDistance.compute({ distanceM: 1, temperatureC: 20 }).value).toBeCloseTo(2.9136, 3);
    // inverse-square law: ×2 → −6.0206 dB
    expect(acousticsGenerators.inverseSquareChange.compute({ fromM: 0.05, toM: 0.1 }).value).toBeCloseTo(-6.0206, 4);
    // NIOSH 98-126: 94 dBA → 1 h, 100 dBA → 0.25 h ([pub])
    expect(acousticsGenerators.noisePermissibleTime.compute({ levelDba: 94 }).value).toBeCloseTo(1, 9);
    expect(acousticsGenerators.noisePermissibleTime.compute({ levelDba: 100 }).value).toBeCloseTo(0.25, 9);
  });
});

describe("miking-the-band banks: numeric keys equal the library values", () => {
  const numericQuestions = ofKind("numeric").map((entry) => entry.question);

  it("every numeric question has a recorded library value, and every recorded value a question", () => {
    expect(numericQuestions.map((question) => question.id).sort()).toEqual(Object.keys(NUMERIC_KEY_VALUES).sort());
  });

  it.each(numericQuestions.map((question) => [question.id, question] as const))("%s", (id, question) => {
    const libraryValue = NUMERIC_KEY_VALUES[id]();
    expect(Number.isFinite(libraryValue)).toBe(true);
    // The stored key is the library value rounded to the decimals it is written with.
    expect(Math.abs(libraryValue - question.answer)).toBeLessThanOrEqual(printedHalfUnit(question.answer));
    // The exact library value is accepted by the question's tolerance.
    expect(gradeAnswer(question, { kind: "numeric", value: libraryValue, unit: question.unit }).score).toBe(1);
  });

  it.each(numericQuestions.map((question) => [question.id, question] as const))(
    "%s: a sign error is not accepted",
    (_id, question) => {
      if (question.answer !== 0) {
        expect(gradeAnswer(question, { kind: "numeric", value: -question.answer, unit: question.unit }).score).toBe(0);
      }
    },
  );
});

describe("miking-the-band banks: numbers quoted in prompts and explanations", () => {
  it("agree with the library", () => {
    // final q-final-20 prompt: "roughly 12 dB" PAG and "roughly 18 dB" NAG. Ballou, Handbook for Sound
    // Engineers, eq. 34-21/34-22 worked example (ft): D_s 2, D_0 128, D_1 45, D_2 90, NOM 3, D_c 31.2, EAD 4.
    const handbookPag = potentialAcousticGainDb({
      dsM: 2,
      d0M: 128,
      d1M: 45,
      d2M: 90,
      openMics: 3,
      stabilityMarginDb: 6,
      criticalDistanceM: 31.2,
    });
    const handbookNag = neededAcousticGainDb({ d0M: 128, eadM: 4, criticalDistanceM: 31.2 });
    expect(handbookPag).toBeCloseTo(12, 0);
    expect(handbookNag).toBeCloseTo(18, 0);
    expect(handbookNag - handbookPag).toBeCloseTo(6, 0); // "falls about 6 dB short"
    // q-piano-15: "A 100 Hz wave is about 3.4 m long" — λ = c/f: 100 Hz → 3.43 m at 343
    expect(wavelengthM({ frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(3.4, 1);
    // q-drums-12 explanation: "a first cancellation near 132 Hz" — f1 = c/(2Δd)
    expect(firstNotchHz(1.3)).toBeCloseTo(132, 0);
    // q-phase-and-feedback-05: "peaks … at multiples of 1/τ ≈ 572 Hz" — two-path peak spacing 1/τ
    expect(1000 / delayMs({ distanceM: 0.6, speedOfSoundMs: SPEED_OF_SOUND_MS })).toBeCloseTo(572, 0);
    // q-phase-and-feedback-07/08: peaks "+2.5 dB" at 3:1; "a ≈ 0.11 … about 19 dB" for a 1 dB dip — two-path model
    expect(combExtremesDb({ amplitudeRatio: 1 / 3 }).peakDb).toBeCloseTo(2.5, 1);
    const oneDbDipRatio = 1 - 10 ** (-1 / 20);
    expect(combExtremesDb({ amplitudeRatio: oneDbDipRatio }).notchDb).toBeCloseTo(-1, 9);
    expect(oneDbDipRatio).toBeCloseTo(0.11, 2);
    expect(inverseSquareChangeDb({ fromM: 1, toM: 1 / oneDbDipRatio })).toBeCloseTo(-19, 0);
    // q-phase-and-feedback-09: ripple "+1.3 dB and −1.6 dB" at a = 1/6 — two-path model [derived]
    expect(combExtremesDb({ amplitudeRatio: 1 / 6 }).peakDb).toBeCloseTo(1.3, 1);
    expect(combExtremesDb({ amplitudeRatio: 1 / 6 }).notchDb).toBeCloseTo(-1.6, 1);
    // q-drums-06 / q-final-13: nulls 125° (supercardioid), 109° (hypercardioid), 180° (cardioid) — Eargle, The Microphone Book, ch. 5–6
    expect(patternFigures({ a: SUPERCARDIOID_A }).nullAnglesDeg[0]).toBeCloseTo(125, 0);
    expect(patternFigures({ a: HYPERCARDIOID_A }).nullAnglesDeg[0]).toBeCloseTo(109, 0);
    expect(patternFigures({ a: CARDIOID_A }).nullAnglesDeg[0]).toBe(180);
    expect(patternFigures({ a: 0 }).nullAnglesDeg[0]).toBe(90);
    expect(patternFigures({ a: 1 }).nullAnglesDeg).toEqual([]);
    // q-piano-07 explanation: diagonal "≈ 0.632 m" — geometry (√10·0.2 m)
    expect(Math.hypot(0.6, 0.2)).toBeCloseTo(0.632, 3);
    // q-final-13: "the 3:5 variant puts it near 127°" — HyperPhysics null 127° [pub]
    expect(patternFigures({ a: 0.375 }).nullAnglesDeg[0]).toBeCloseTo(127, 0);
    // Generated prompts: "each metre is roughly 2.9 ms at club temperatures" — t = d/c
    expect(delayMs({ distanceM: 1, speedOfSoundMs: speedOfSoundMs({ temperatureC: 15 }) })).toBeCloseTo(2.9, 1);
    expect(delayMs({ distanceM: 1, speedOfSoundMs: speedOfSoundMs({ temperatureC: 30 }) })).toBeCloseTo(2.9, 1);
    // q-instruments-16: "−10 dBV (0.316 V) is about −7.78 dBu" — ControlBooth wiki
    expect(dbvToDbu(-10)).toBeCloseTo(-7.78, 2);
  });
});
