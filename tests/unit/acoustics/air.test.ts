/**
 * Sound in air: speed of sound, wavelength and delay.
 * Sources (full citations in tests/sources.md): Wikipedia "Speed of sound" (dry-air
 * formula), ISO 9613-1:1993 (343.2 m/s at 20 °C); delay t = d/c and n = f_s·d/c [derived].
 *
 * Sources disagree on "the" speed of sound at 20 °C: the ideal-gas practical
 * formula gives 343.215 m/s, ISO 9613-1 uses 343.2 m/s and many tables use
 * 343.0 m/s. Each test below pins the value it uses.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  delayMs,
  delaySamples,
  distanceForDelayM,
  feetToMetres,
  frequencyForWavelengthHz,
  speedOfSoundIso9613Ms,
  speedOfSoundLinearMs,
  speedOfSoundMs,
  wavelengthM,
} from "@/lib/acoustics";
import { expectPrinted } from "./near";

describe("speedOfSoundMs (ideal-gas form 331.3·√(1 + T/273.15))", () => {
  it("matches the check values", () => {
    expectPrinted(speedOfSoundMs({ temperatureC: 0 }), "331.30"); // Wikipedia "Speed of sound", practical formula [pub]
    expectPrinted(speedOfSoundMs({ temperatureC: 20 }), "343.215"); // same formula (Wikipedia "Speed of sound", dry air)
    expectPrinted(speedOfSoundMs({ temperatureC: 25 }), "346.129"); // same
    expectPrinted(speedOfSoundMs({ temperatureC: -10 }), "325.179"); // same
  });

  it("linear form 331.3 + 0.606·T", () => {
    expectPrinted(speedOfSoundLinearMs({ temperatureC: 20 }), "343.42"); // Wikipedia "Speed of sound" [pub]
    expectPrinted(speedOfSoundLinearMs({ temperatureC: 30 }), "349.48"); // same
    // Wikipedia "Speed of sound", linear form: +0.46 m/s vs the exact form at 30 °C [derived]
    expectPrinted(speedOfSoundLinearMs({ temperatureC: 30 }) - speedOfSoundMs({ temperatureC: 30 }), "0.46");
  });

  it("ISO 9613-1 form 343.2·√(T/293.15)", () => {
    expect(speedOfSoundIso9613Ms({ temperatureC: 20 })).toBeCloseTo(343.2, 12); // ISO 9613-1 via python-acoustics SOUNDSPEED = 343.2
    expectPrinted(speedOfSoundIso9613Ms({ temperatureC: 0 }), "331.286"); // ISO 9613-1:1993 reference c = 343.2·√(T/293.15) [derived]
  });

  it("property: rises with temperature", () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 60, noNaN: true }), (temperatureC) => {
        expect(speedOfSoundMs({ temperatureC: temperatureC + 1 })).toBeGreaterThan(speedOfSoundMs({ temperatureC }));
      }),
    );
  });

  it("throws a RangeError at or below absolute zero", () => {
    expect(() => speedOfSoundMs({ temperatureC: -273.15 })).toThrow(RangeError);
    expect(() => speedOfSoundMs({ temperatureC: -300 })).toThrow(/absolute zero/);
    expect(() => speedOfSoundMs({ temperatureC: Number.NaN })).toThrow(RangeError);
  });
});

describe("wavelengthM (λ = c/f, c = 343 m/s)", () => {
  it("matches the check values", () => {
    expectPrinted(wavelengthM({ frequencyHz: 20, speedOfSoundMs: 343 }), "17.15"); // [derived]
    expectPrinted(wavelengthM({ frequencyHz: 100, speedOfSoundMs: 343 }), "3.43"); // [derived]
    expectPrinted(wavelengthM({ frequencyHz: 1000, speedOfSoundMs: 343 }), "0.343"); // [derived]
    expectPrinted(wavelengthM({ frequencyHz: 10000, speedOfSoundMs: 343 }) * 100, "3.43"); // cm, [derived]
    expectPrinted(wavelengthM({ frequencyHz: 20000, speedOfSoundMs: 343 }) * 100, "1.715"); // cm, [derived]
  });

  it("property: λ·f = c and frequencyForWavelengthHz inverts it", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 100000, noNaN: true }), fc.double({ min: 300, max: 360, noNaN: true }), (frequencyHz, c) => {
        const lambdaM = wavelengthM({ frequencyHz, speedOfSoundMs: c });
        expect(lambdaM * frequencyHz).toBeCloseTo(c, 9);
        expect(frequencyForWavelengthHz({ wavelengthM: lambdaM, speedOfSoundMs: c }) / frequencyHz).toBeCloseTo(1, 12);
      }),
    );
  });

  it("throws for zero frequency or speed", () => {
    expect(() => wavelengthM({ frequencyHz: 0, speedOfSoundMs: 343 })).toThrow(RangeError);
    expect(() => wavelengthM({ frequencyHz: 100, speedOfSoundMs: -343 })).toThrow(RangeError);
  });
});

describe("delayMs and delaySamples (t = d/c, n = f_s·d/c)", () => {
  it("1 m at three speeds of sound", () => {
    expectPrinted(delayMs({ distanceM: 1, speedOfSoundMs: 343.0 }), "2.9155"); // [derived], c = 343.0
    expectPrinted(delayMs({ distanceM: 1, speedOfSoundMs: 343.2 }), "2.9138"); // [derived], c = 343.2 (ISO 9613-1)
    expectPrinted(delayMs({ distanceM: 1, speedOfSoundMs: 343.42 }), "2.9119"); // [derived], c = 343.42 (linear form at 20 °C)
    expectPrinted(delayMs({ distanceM: 1, speedOfSoundMs: 343.0 }), "2.92"); // the commonly printed 2.92 ms is 2.9155 rounded
  });

  it("10 m and 1 ft at 343.0 m/s", () => {
    expectPrinted(delayMs({ distanceM: 10, speedOfSoundMs: 343.0 }), "29.15"); // [derived]
    expectPrinted(delayMs({ distanceM: feetToMetres(1), speedOfSoundMs: 343 }), "0.889"); // [derived]
  });

  it("1 m at 48 kHz in samples", () => {
    expectPrinted(delaySamples({ distanceM: 1, speedOfSoundMs: 343.0, sampleRateHz: 48000 }), "139.94"); // [derived], c = 343.0
    expectPrinted(delaySamples({ distanceM: 1, speedOfSoundMs: 343.2, sampleRateHz: 48000 }), "139.86"); // [derived], c = 343.2
  });

  it("property: delay is linear in distance and distanceForDelayM inverts it", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1000, noNaN: true }), (distanceM) => {
        const milliseconds = delayMs({ distanceM, speedOfSoundMs: 343 });
        expect(delayMs({ distanceM: 2 * distanceM, speedOfSoundMs: 343 })).toBeCloseTo(2 * milliseconds, 9);
        expect(distanceForDelayM({ delayMs: milliseconds, speedOfSoundMs: 343 })).toBeCloseTo(distanceM, 9);
        expect(delaySamples({ distanceM, speedOfSoundMs: 343, sampleRateHz: 48000 })).toBeCloseTo(48 * milliseconds, 6);
      }),
    );
  });

  it("allows zero distance but throws for a negative one", () => {
    expect(delayMs({ distanceM: 0, speedOfSoundMs: 343 })).toBe(0);
    expect(() => delayMs({ distanceM: -1, speedOfSoundMs: 343 })).toThrow(/must not be negative/);
    expect(() => delaySamples({ distanceM: 1, speedOfSoundMs: 343, sampleRateHz: 0 })).toThrow(RangeError);
  });
});
