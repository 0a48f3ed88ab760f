/**
 * Proximity effect of an ideal first-order mic near an ideal point source.
 * Reference values (tests/sources.md, "Proximity effect"), all [derived] from the
 * spherical-wave particle velocity u = p/(ρc)·(1 + 1/(jkr)) (Kinsler & Frey,
 * Fundamentals of Acoustics). Speed of sound pinned at c = 343.0 m/s, as in
 * the reference table; one check at 343.2 m/s shows the (tiny) difference.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SUPERCARDIOID_A, proximityBoostDb, proximityCornerHz, proximityResponseCurve } from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

const C_MS = 343.0; // the check values below are computed at c = 343.0 m/s

// Boost 10·log10(1 + (B/kr)²) at f = 100 Hz [derived]. Columns: figure-8 (A 0), hyper (A 0.25),
// super (B 0.634 when rounded; we use the exact A = (√3−1)/2, within 0.0005 dB), cardioid (A 0.5).
const TABLE = [
  { distanceM: 0.01, figure8: 34.744, hyper: 32.246, super: 30.788, cardioid: 28.728 },
  { distanceM: 0.05, figure8: 20.799, hyper: 18.328, super: 16.894, cardioid: 14.886 },
  { distanceM: 0.1, figure8: 14.886, hyper: 12.495, super: 11.132, cardioid: 9.269 },
  { distanceM: 0.3, figure8: 6.346, hyper: 4.568, super: 3.675, cardioid: 2.619 },
  { distanceM: 1, figure8: 1.133, hyper: 0.673, super: 0.491, cardioid: 0.312 },
];

describe("proximityBoostDb (c = 343.0 m/s, f = 100 Hz)", () => {
  for (const row of TABLE) {
    it(`at ${row.distanceM * 100} cm`, () => {
      const at = (a: number) => proximityBoostDb({ a, distanceM: row.distanceM, frequencyHz: 100, speedOfSoundMs: C_MS });
      expectNear(at(0), row.figure8); // [derived] ±0.01 dB
      expectNear(at(0.25), row.hyper); // [derived]
      expectNear(at(SUPERCARDIOID_A), row.super); // [derived]
      expectNear(at(0.5), row.cardioid); // [derived]
    });
  }

  it("with c = 343.2 m/s the figure-8 at 5 cm is 20.804 dB", () => {
    // [derived]: c = 343.2 raises every value by ≤ 0.005 dB.
    expectNear(proximityBoostDb({ a: 0, distanceM: 0.05, frequencyHz: 100, speedOfSoundMs: 343.2 }), 20.804);
  });

  it("is 3 dB at the figure-8 corner f = c/(2πr): 1092 Hz at 5 cm, 546 Hz at 10 cm, 182 Hz at 30 cm", () => {
    expectPrinted(proximityCornerHz({ a: 0, distanceM: 0.05, speedOfSoundMs: C_MS }), "1092"); // corner f = c/(2πr) [derived]
    expectPrinted(proximityCornerHz({ a: 0, distanceM: 0.1, speedOfSoundMs: C_MS }), "546"); // [derived]
    expectPrinted(proximityCornerHz({ a: 0, distanceM: 0.3, speedOfSoundMs: C_MS }), "182"); // [derived]
    const cornerHz = proximityCornerHz({ a: 0, distanceM: 0.05, speedOfSoundMs: C_MS });
    expectNear(proximityBoostDb({ a: 0, distanceM: 0.05, frequencyHz: cornerHz, speedOfSoundMs: C_MS }), 10 * Math.log10(2)); // 3.01 dB at kr = 1
  });

  it("is zero for an omni", () => {
    expect(proximityBoostDb({ a: 1, distanceM: 0.01, frequencyHz: 50, speedOfSoundMs: C_MS })).toBe(0);
    expect(proximityCornerHz({ a: 1, distanceM: 0.01, speedOfSoundMs: C_MS })).toBe(0);
  });

  it("property: a cardioid at r behaves like a figure-8 at 2r (B/kr with B halved)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.005, max: 5, noNaN: true }), fc.double({ min: 20, max: 20000, noNaN: true }), (distanceM, frequencyHz) => {
        const cardioid = proximityBoostDb({ a: 0.5, distanceM, frequencyHz, speedOfSoundMs: C_MS });
        const figure8 = proximityBoostDb({ a: 0, distanceM: 2 * distanceM, frequencyHz, speedOfSoundMs: C_MS });
        expect(cardioid).toBeCloseTo(figure8, 10);
      }),
    );
  });

  it("property: the boost falls as frequency or distance rises, and grows as A falls", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.99, noNaN: true }),
        fc.double({ min: 0.005, max: 2, noNaN: true }),
        fc.double({ min: 20, max: 10000, noNaN: true }),
        (a, distanceM, frequencyHz) => {
          const base = proximityBoostDb({ a, distanceM, frequencyHz, speedOfSoundMs: C_MS });
          expect(proximityBoostDb({ a, distanceM, frequencyHz: frequencyHz * 2, speedOfSoundMs: C_MS })).toBeLessThan(base);
          expect(proximityBoostDb({ a, distanceM: distanceM * 2, frequencyHz, speedOfSoundMs: C_MS })).toBeLessThan(base);
          expect(proximityBoostDb({ a: a / 2, distanceM, frequencyHz, speedOfSoundMs: C_MS })).toBeGreaterThanOrEqual(base);
        },
      ),
    );
  });

  it("property: far below the corner the boost rises 6.02 dB per octave (Kinsler & Frey)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.9, noNaN: true }), (a) => {
        const low = proximityBoostDb({ a, distanceM: 0.001, frequencyHz: 1, speedOfSoundMs: C_MS });
        const octaveUp = proximityBoostDb({ a, distanceM: 0.001, frequencyHz: 2, speedOfSoundMs: C_MS });
        expectNear(low - octaveUp, 20 * Math.log10(2), 1e-3);
      }),
    );
  });

  it("throws a RangeError for meaningless input", () => {
    expect(() => proximityBoostDb({ a: 0.5, distanceM: 0, frequencyHz: 100, speedOfSoundMs: C_MS })).toThrow(RangeError);
    expect(() => proximityBoostDb({ a: 0.5, distanceM: -0.1, frequencyHz: 100, speedOfSoundMs: C_MS })).toThrow(/distanceM/);
    expect(() => proximityBoostDb({ a: 0.5, distanceM: 0.1, frequencyHz: 0, speedOfSoundMs: C_MS })).toThrow(RangeError);
    expect(() => proximityBoostDb({ a: 1.5, distanceM: 0.1, frequencyHz: 100, speedOfSoundMs: C_MS })).toThrow(RangeError);
    expect(() => proximityBoostDb({ a: 0.5, distanceM: 0.1, frequencyHz: 100, speedOfSoundMs: 0 })).toThrow(RangeError);
  });
});

describe("proximityResponseCurve", () => {
  it("returns log-spaced points from 20 Hz to 20 kHz that match proximityBoostDb", () => {
    const curve = proximityResponseCurve({ a: 0.5, distanceM: 0.05, speedOfSoundMs: C_MS, points: 512 });
    expect(curve).toHaveLength(512);
    expect(curve[0].frequencyHz).toBe(20);
    expect(curve[511].frequencyHz).toBe(20000);
    const ratio = curve[1].frequencyHz / curve[0].frequencyHz;
    for (let index = 1; index < curve.length; index += 1) {
      expect(curve[index].frequencyHz / curve[index - 1].frequencyHz).toBeCloseTo(ratio, 9);
      const { frequencyHz, boostDb } = curve[index];
      expect(boostDb).toBeCloseTo(proximityBoostDb({ a: 0.5, distanceM: 0.05, frequencyHz, speedOfSoundMs: C_MS }), 10);
    }
  });

  it("honours fromHz/toHz and rejects an empty range", () => {
    const curve = proximityResponseCurve({ a: 0, distanceM: 0.1, speedOfSoundMs: C_MS, points: 3, fromHz: 100, toHz: 400 });
    expect(curve.map((point) => point.frequencyHz)).toEqual([100, 200, 400]);
    expectNear(curve[0].boostDb, 14.886); // figure-8 at 10 cm, 100 Hz [derived]
    expect(() => proximityResponseCurve({ a: 0, distanceM: 0.1, speedOfSoundMs: C_MS, points: 3, fromHz: 400, toHz: 100 })).toThrow(RangeError);
    expect(() => proximityResponseCurve({ a: 0, distanceM: 0.1, speedOfSoundMs: C_MS, points: 1 })).toThrow(RangeError);
  });
});
