/**
 * Potential and needed acoustic gain (Ballou (ed.), Handbook for Sound
 * Engineers, 4th ed., Focal 2008, ch. 34, eqs. 34-5, 34-8, 34-21 to 34-23; full
 * citation in tests/sources.md). The handbook's example is in feet; we
 * convert to metres (only ratios enter, so the results are unit-free).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  criticalDistanceM,
  feetToMetres,
  metresToFeet,
  neededAcousticGainDb,
  potentialAcousticGainDb,
  potentialAcousticGainFromRoomDb,
} from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

// Handbook for Sound Engineers ch. 34 worked example (feet → metres).
const EXAMPLE = {
  dsM: feetToMetres(2),
  d0M: feetToMetres(128),
  d1M: feetToMetres(45),
  d2M: feetToMetres(90),
  openMics: 3,
  stabilityMarginDb: 6,
};
const EAD_M = feetToMetres(4);
const CRITICAL_DISTANCE_M = feetToMetres(31.2);

describe("free field", () => {
  it("PAG = 19.33 dB (eq. 34-5 inputs)", () => {
    expectNear(potentialAcousticGainDb(EXAMPLE), 19.33); // Ballou eq. 34-5 [derived from the book's inputs]
  });

  it("NAG = 30.10 dB (eq. 34-8 inputs)", () => {
    expectNear(neededAcousticGainDb({ d0M: EXAMPLE.d0M, eadM: EAD_M }), 30.1); // [derived]
  });
});

describe("indoors, with a critical distance of 31.2 ft", () => {
  it("PAG = 11.7 dB (eq. 34-21; calculated 11.647, room term 7.685 dB)", () => {
    const indoorDb = potentialAcousticGainDb({ ...EXAMPLE, criticalDistanceM: CRITICAL_DISTANCE_M });
    // The handbook prints 11.7 dB; eq. 34-21 with its own inputs gives 11.647, which rounds to 11.6
    // (the book presumably rounded intermediate terms). Checked at ±0.1 dB and reported.
    expectNear(indoorDb, 11.7, 0.1); // Handbook for Sound Engineers eq. 34-21, p. 1252 [pub]
    expectNear(indoorDb, 11.647); // [derived]
    expectNear(potentialAcousticGainDb(EXAMPLE) - indoorDb, 7.685); // room term, [derived]
  });

  it("NAG = 17.7 dB (eq. 34-22; calculated 17.662), so PAG < NAG and the system will feed back", () => {
    const neededDb = neededAcousticGainDb({ d0M: EXAMPLE.d0M, eadM: EAD_M, criticalDistanceM: CRITICAL_DISTANCE_M });
    expectPrinted(neededDb, "17.7"); // Handbook for Sound Engineers eq. 34-22 [pub]
    expectNear(neededDb, 17.662); // [derived]
    expect(potentialAcousticGainDb({ ...EXAMPLE, criticalDistanceM: CRITICAL_DISTANCE_M })).toBeLessThan(neededDb); // stable only if PAG ≥ NAG [pub]
  });
});

describe("room form, eq. 34-23: Q = 5, S = 28 000 ft², ā = 0.35", () => {
  const roomInMetres = {
    directivityFactor: 5,
    surfaceAreaM2: 28000 * feetToMetres(1) ** 2,
    averageAbsorptionCoefficient: 0.35,
  };

  it("PAG = 11.7 dB (calculated 11.651)", () => {
    const pagDb = potentialAcousticGainFromRoomDb({ ...EXAMPLE, ...roomInMetres });
    expectPrinted(pagDb, "11.7"); // Handbook for Sound Engineers eq. 34-23 [pub]
    expectNear(pagDb, 11.651); // [derived]
  });

  it("critical distance √(Q·S·ā/(16π)) = 31.22 ft", () => {
    expectPrinted(metresToFeet(criticalDistanceM(roomInMetres)), "31.22"); // D_c = √(Q·S·ā/(16π)), Ballou eq. 34-23 inputs [derived]
  });

  it("throws for an absorption coefficient above 1", () => {
    expect(() => criticalDistanceM({ ...roomInMetres, averageAbsorptionCoefficient: 1.2 })).toThrow(RangeError);
  });
});

describe("properties", () => {
  const distance = fc.double({ min: 0.1, max: 100, noNaN: true });

  it("property: results do not depend on the length unit", () => {
    fc.assert(
      fc.property(distance, distance, distance, distance, distance, fc.double({ min: 0.1, max: 10, noNaN: true }), (dsM, d0M, d1M, d2M, dcM, scale) => {
        const base = { dsM, d0M, d1M, d2M, openMics: 2, stabilityMarginDb: 6, criticalDistanceM: dcM };
        const scaled = { ...base, dsM: dsM * scale, d0M: d0M * scale, d1M: d1M * scale, d2M: d2M * scale, criticalDistanceM: dcM * scale };
        expect(potentialAcousticGainDb(scaled)).toBeCloseTo(potentialAcousticGainDb(base), 9);
      }),
    );
  });

  it("property: doubling the open mics costs 10·log10 2 = 3.01 dB", () => {
    fc.assert(
      fc.property(distance, distance, fc.integer({ min: 1, max: 32 }), (d1M, d2M, openMics) => {
        const base = { dsM: 0.5, d0M: 30, d1M, d2M, openMics, stabilityMarginDb: 6 };
        expectNear(potentialAcousticGainDb(base) - potentialAcousticGainDb({ ...base, openMics: 2 * openMics }), 10 * Math.log10(2), 1e-9);
      }),
    );
  });

  it("property: a very large critical distance gives the free-field result", () => {
    fc.assert(
      fc.property(distance, distance, (d0M, eadM) => {
        const freeDb = neededAcousticGainDb({ d0M, eadM });
        expectNear(neededAcousticGainDb({ d0M, eadM, criticalDistanceM: 1e7 }), freeDb, 1e-6);
      }),
    );
  });

  it("throws for zero distances, zero open mics or a negative margin", () => {
    expect(() => potentialAcousticGainDb({ ...EXAMPLE, dsM: 0 })).toThrow(RangeError);
    expect(() => potentialAcousticGainDb({ ...EXAMPLE, openMics: 0 })).toThrow(RangeError);
    expect(() => potentialAcousticGainDb({ ...EXAMPLE, stabilityMarginDb: -6 })).toThrow(RangeError);
    expect(() => neededAcousticGainDb({ d0M: 10, eadM: 0 })).toThrow(RangeError);
    expect(() => neededAcousticGainDb({ d0M: 10, eadM: 1, criticalDistanceM: -1 })).toThrow(RangeError);
  });
});
