/**
 * Two coherent paths (comb filtering) and the inverse-square law.
 * Sources (full citations in tests/sources.md): recordingology.com "Comb Filter
 * Calculations" (|H| formula), Everest & Pohlmann (notch and peak frequencies, from
 * memory), the inverse-square law of a free-field point source [derived values].
 * Speed of sound pinned at 343 m/s (the reference rows use it).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  combExtremesDb,
  combNotchesHz,
  combPeaksHz,
  combResponseCurve,
  combResponseDb,
  distanceForLevelChangeM,
  inverseSquareChangeDb,
  twoPathAmplitudeRatio,
} from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

const C_MS = 343;

describe("combNotchesHz and combPeaksHz", () => {
  it("Δd = 0.343 m (τ = 1 ms): notches 500, 1500, 2500 Hz; peaks 0, 1000, 2000 Hz", () => {
    // Everest & Pohlmann, Master Handbook of Acoustics (from memory) — f_n = (2n−1)/(2τ) [derived]
    const notches = combNotchesHz({ pathDifferenceM: 0.343, speedOfSoundMs: C_MS, count: 3 });
    [500, 1500, 2500].forEach((expectedHz, index) => expectNear(notches[index], expectedHz, 1e-9));
    const peaks = combPeaksHz({ pathDifferenceM: 0.343, speedOfSoundMs: C_MS, count: 3 });
    [0, 1000, 2000].forEach((expectedHz, index) => expectNear(peaks[index], expectedHz, 1e-9));
  });

  it("Δd = 1 m, c = 343: notches 171.5, 514.5, 857.5 Hz", () => {
    const notches = combNotchesHz({ pathDifferenceM: 1, speedOfSoundMs: C_MS, count: 3 });
    expect(notches.map((hz) => Number(hz.toFixed(1)))).toEqual([171.5, 514.5, 857.5]); // f_n = (2n−1)·c/(2Δd) [derived]
  });

  it("returns no notches for count 0 and throws for a zero path difference", () => {
    expect(combNotchesHz({ pathDifferenceM: 1, speedOfSoundMs: C_MS, count: 0 })).toEqual([]);
    expect(() => combNotchesHz({ pathDifferenceM: 0, speedOfSoundMs: C_MS, count: 3 })).toThrow(RangeError);
    expect(() => combNotchesHz({ pathDifferenceM: 1, speedOfSoundMs: C_MS, count: 2.5 })).toThrow(RangeError);
  });
});

describe("combExtremesDb: +20·log10(1 + a) / 20·log10(1 − a)", () => {
  it("a = 1: +6.021 dB / −∞", () => {
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 1 });
    expectNear(peakDb, 6.021); // 20·log10(1 + a), recordingology.com |H| at a = 1 [derived]
    expect(notchDb).toBe(-Infinity);
  });

  it("a = 0.5 (−6.02 dB): +3.522 / −6.021 dB", () => {
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 0.5 });
    expectNear(peakDb, 3.522); // [derived]
    expectNear(notchDb, -6.021); // [derived]
  });

  it("a = 10^(−10/20): +2.387 / −3.302 dB", () => {
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 10 ** (-10 / 20) });
    expectNear(peakDb, 2.387); // [derived]
    expectNear(notchDb, -3.302); // [derived]
  });

  it("throws for an amplitude ratio outside [0, 1]", () => {
    expect(() => combExtremesDb({ amplitudeRatio: -0.1 })).toThrow(RangeError);
    expect(() => combExtremesDb({ amplitudeRatio: 1.01 })).toThrow(RangeError);
  });
});

describe("the 3:1 rule (rule: Burroughs 1974, from memory; tested with the two-path model)", () => {
  it("second mic at 3× the distance: 9.542 dB down, peak +2.499 dB, notch −3.522 dB, 6.021 dB peak-to-notch", () => {
    // Rule: Burroughs, Microphones: Design and Application (1974) (from memory); values [derived]
    const amplitudeRatio = twoPathAmplitudeRatio({ nearM: 1, farM: 3 });
    expectNear(inverseSquareChangeDb({ fromM: 1, toM: 3 }), -9.542);
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio });
    expectNear(peakDb, 2.499);
    expectNear(notchDb, -3.522);
    expectNear(peakDb - notchDb, 6.021);
  });

  it("mic B 3d to the side of a source d in front of mic A: path √10·d, 10.0 dB, a = 0.316, +2.387 / −3.302 dB", () => {
    const farM = Math.hypot(1, 3); // √10: the second mic 3d to the side of the first
    expectPrinted(-inverseSquareChangeDb({ fromM: 1, toM: farM }), "10.0"); // [derived]
    const amplitudeRatio = twoPathAmplitudeRatio({ nearM: 1, farM });
    expectPrinted(amplitudeRatio, "0.316"); // [derived]
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio });
    expectNear(peakDb, 2.387); // [derived]
    expectNear(notchDb, -3.302); // [derived]
  });

  it("the model does not reproduce the published '≤ 1 dB dips' slogan", () => {
    // wikiaudio.org "3 to 1 rule" and a manufacturer tip state "≥ 9 dB … dips ≤ 1 dB" [pub].
    // The two-path model gives −3.5 dB at a = 1/3; a 1 dB dip needs a ≈ 0.109 (−19.3 dB). We test the model.
    expect(combExtremesDb({ amplitudeRatio: 1 / 3 }).notchDb).toBeLessThan(-3.5);
    expectNear(combExtremesDb({ amplitudeRatio: 0.109 }).notchDb, -1.0); // notch 20·log10(1 − a) [derived]
    expectPrinted(20 * Math.log10(0.109), "-19.3"); // a = 0.109 as a level [derived]
  });

  it("throws when the far path is shorter than the near one", () => {
    expect(() => twoPathAmplitudeRatio({ nearM: 3, farM: 1 })).toThrow(RangeError);
  });
});

describe("combResponseDb: 10·log10(1 + a² + 2a·cos 2πfτ)", () => {
  it("reaches the extremes at the peak and notch frequencies (τ = 1 ms)", () => {
    expectNear(combResponseDb({ amplitudeRatio: 0.5, delayMs: 1, frequencyHz: 1000 }), 3.522); // peak, [derived]
    expectNear(combResponseDb({ amplitudeRatio: 0.5, delayMs: 1, frequencyHz: 1500 }), -6.021); // notch, [derived]
    expect(combResponseDb({ amplitudeRatio: 1, delayMs: 1, frequencyHz: 500 })).toBe(-Infinity); // full null
    expect(combResponseDb({ amplitudeRatio: 0, delayMs: 1, frequencyHz: 500 })).toBe(0); // no second path
  });

  it("property: periodic in 1/τ", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.99, noNaN: true }),
        fc.double({ min: 0.05, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 5000, noNaN: true }),
        fc.integer({ min: 1, max: 20 }),
        (amplitudeRatio, delayMsValue, frequencyHz, periods) => {
          const periodHz = 1000 / delayMsValue;
          const base = combResponseDb({ amplitudeRatio, delayMs: delayMsValue, frequencyHz });
          const shifted = combResponseDb({ amplitudeRatio, delayMs: delayMsValue, frequencyHz: frequencyHz + periods * periodHz });
          expect(shifted).toBeCloseTo(base, 6);
        },
      ),
    );
  });

  it("property: bounded by combExtremesDb", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.99, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 20000, noNaN: true }),
        (amplitudeRatio, delayMsValue, frequencyHz) => {
          const levelDb = combResponseDb({ amplitudeRatio, delayMs: delayMsValue, frequencyHz });
          const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio });
          expect(levelDb).toBeLessThanOrEqual(peakDb + 1e-9);
          expect(levelDb).toBeGreaterThanOrEqual(notchDb - 1e-9);
        },
      ),
    );
  });

  it("throws for negative delay or frequency", () => {
    expect(() => combResponseDb({ amplitudeRatio: 0.5, delayMs: -1, frequencyHz: 100 })).toThrow(RangeError);
    expect(() => combResponseDb({ amplitudeRatio: 0.5, delayMs: 1, frequencyHz: -100 })).toThrow(RangeError);
  });
});

describe("combResponseCurve", () => {
  it("samples the response on a linear or log axis", () => {
    const linear = combResponseCurve({ amplitudeRatio: 0.5, delayMs: 1, points: 5, fromHz: 0, toHz: 2000, spacing: "linear" });
    expect(linear.map((point) => point.frequencyHz)).toEqual([0, 500, 1000, 1500, 2000]);
    expectNear(linear[1].levelDb, -6.021); // notch at 500 Hz, [derived]
    expectNear(linear[2].levelDb, 3.522); // peak at 1 kHz, [derived]
    const log = combResponseCurve({ amplitudeRatio: 0.5, delayMs: 1, points: 256 });
    expect(log[0].frequencyHz).toBe(20);
    expect(log[255].frequencyHz).toBe(20000);
    for (const point of log) {
      expect(point.levelDb).toBeCloseTo(combResponseDb({ amplitudeRatio: 0.5, delayMs: 1, frequencyHz: point.frequencyHz }), 9);
    }
  });

  it("rejects a log axis that starts at 0 Hz", () => {
    expect(() => combResponseCurve({ amplitudeRatio: 0.5, delayMs: 1, points: 5, fromHz: 0 })).toThrow(RangeError);
  });
});

describe("inverse-square law (free-field point source: ΔL = −20·log10(r2/r1))", () => {
  it("×2 → −6.0206, ×3 → −9.5424, ×4 → −12.041, ×10 → −20.000 dB", () => {
    expectPrinted(inverseSquareChangeDb({ fromM: 1, toM: 2 }), "-6.0206"); // [derived]
    expectPrinted(inverseSquareChangeDb({ fromM: 1, toM: 3 }), "-9.5424"); // [derived]
    expectPrinted(inverseSquareChangeDb({ fromM: 1, toM: 4 }), "-12.041"); // [derived]
    expectPrinted(inverseSquareChangeDb({ fromM: 1, toM: 10 }), "-20.000"); // [derived]
  });

  it("property: antisymmetric, additive along a path, and inverted by distanceForLevelChangeM", () => {
    const distance = fc.double({ min: 0.01, max: 1000, noNaN: true });
    fc.assert(
      fc.property(distance, distance, distance, (firstM, secondM, thirdM) => {
        const forward = inverseSquareChangeDb({ fromM: firstM, toM: secondM });
        expect(inverseSquareChangeDb({ fromM: secondM, toM: firstM })).toBeCloseTo(-forward, 9);
        expect(forward + inverseSquareChangeDb({ fromM: secondM, toM: thirdM })).toBeCloseTo(inverseSquareChangeDb({ fromM: firstM, toM: thirdM }), 9);
        expect(distanceForLevelChangeM({ fromM: firstM, changeDb: forward }) / secondM).toBeCloseTo(1, 9);
      }),
    );
  });

  it("distanceForLevelChangeM: −6.0206 dB is twice the distance", () => {
    expectNear(distanceForLevelChangeM({ fromM: 2, changeDb: -20 * Math.log10(2) }), 4, 1e-12); // [derived]
  });

  it("throws for zero or negative distances", () => {
    expect(() => inverseSquareChangeDb({ fromM: 0, toM: 1 })).toThrow(RangeError);
    expect(() => inverseSquareChangeDb({ fromM: 1, toM: -1 })).toThrow(RangeError);
    expect(() => distanceForLevelChangeM({ fromM: -1, changeDb: 6 })).toThrow(RangeError);
  });
});
