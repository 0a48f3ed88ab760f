/**
 * Ideal DI transformers.
 * Sources (full citations in tests/sources.md): Electronic Musician "Going Direct"
 * (10:1, 12:1 ratios), atelier-der-tonkunst.de (10:1: impedance ×100, level ÷10), NCVEC
 * General pool question G5C07 (12.2 to 1); values of the ideal-transformer formulas [derived].
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { reflectedImpedanceOhms, transformer, turnsRatioForImpedances } from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

describe("transformer", () => {
  it("voltage change of N:1 step-down ratios", () => {
    // Ratios: Electronic Musician "Going Direct" (Nov 2001) describes 10:1 and 12:1 DIs; values [derived]
    expectPrinted(transformer({ turnsRatio: 10 }).voltageChangeDb, "-20.00");
    expectPrinted(transformer({ turnsRatio: 12 }).voltageChangeDb, "-21.58");
    expectPrinted(transformer({ turnsRatio: 15 }).voltageChangeDb, "-23.52");
    expectPrinted(transformer({ turnsRatio: 20 }).voltageChangeDb, "-26.02");
  });

  it("impedance ratio N²: 10:1 → 100:1, 12:1 → 144:1", () => {
    expect(transformer({ turnsRatio: 10 }).impedanceRatio).toBe(100); // atelier-der-tonkunst.de "impedance ×100, level ÷10"
    expect(transformer({ turnsRatio: 12 }).impedanceRatio).toBe(144); // [derived]
    expectNear(dbRatio(transformer({ turnsRatio: 10 }).voltageChangeDb), 0.1, 1e-12); // "level ÷10"
  });

  it("property: cascading transformers multiplies ratios and adds dB", () => {
    const ratio = fc.double({ min: 0.05, max: 50, noNaN: true });
    fc.assert(
      fc.property(ratio, ratio, (first, second) => {
        const cascade = transformer({ turnsRatio: first * second });
        expect(cascade.voltageChangeDb).toBeCloseTo(transformer({ turnsRatio: first }).voltageChangeDb + transformer({ turnsRatio: second }).voltageChangeDb, 9);
        expect(cascade.impedanceRatio / (transformer({ turnsRatio: first }).impedanceRatio * transformer({ turnsRatio: second }).impedanceRatio)).toBeCloseTo(1, 12);
      }),
    );
  });

  it("throws for a zero or negative turns ratio", () => {
    expect(() => transformer({ turnsRatio: 0 })).toThrow(RangeError);
    expect(() => transformer({ turnsRatio: -10 })).toThrow(RangeError);
  });
});

describe("reflectedImpedanceOhms", () => {
  it("12:1 DI into a 1.5 kΩ preamp → 216 kΩ; into 2 kΩ → 288 kΩ", () => {
    expect(reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 1500 })).toBe(216000); // Z_p = N²·Z_s [derived]
    expect(reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 2000 })).toBe(288000); // [derived]
  });

  it("throws for a zero load", () => {
    expect(() => reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 0 })).toThrow(RangeError);
  });
});

describe("turnsRatioForImpedances", () => {
  it("600 Ω to 4 Ω → 12.25 (printed '12.2 to 1')", () => {
    expectPrinted(turnsRatioForImpedances({ primaryOhms: 600, secondaryOhms: 4 }), "12.25"); // N = √(Z_p/Z_s); NCVEC G5C07 prints "12.2 to 1" [derived]
    expectPrinted(turnsRatioForImpedances({ primaryOhms: 600, secondaryOhms: 4 }), "12.2"); // NCVEC General pool G5C07, via kb6nu.com
  });

  it("property: inverts the impedance ratio", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e6, noNaN: true }), fc.double({ min: 1, max: 1e6, noNaN: true }), (primaryOhms, secondaryOhms) => {
        const turnsRatio = turnsRatioForImpedances({ primaryOhms, secondaryOhms });
        expect(reflectedImpedanceOhms({ turnsRatio, loadOhms: secondaryOhms }) / primaryOhms).toBeCloseTo(1, 9);
      }),
    );
  });
});

function dbRatio(levelDb: number): number {
  return 10 ** (levelDb / 20);
}
