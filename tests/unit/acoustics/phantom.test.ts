/**
 * Phantom power per IEC 61938:2018.
 * Sources (full citations in tests/sources.md): IEC 61938:2018 through the Sound On Sound
 * glossary "Phantom Power" and Wikipedia "Phantom power"; ips.org.uk. P48 checks use the
 * 6.81 kΩ feed resistor (Wikipedia "Phantom power"; 6.8 kΩ is the usual part).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { PHANTOM_SUPPLIES, phantomAtMic, phantomFaultCurrentMa, phantomMaxPowerMw } from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

describe("PHANTOM_SUPPLIES", () => {
  it("P48: 48 ± 4 V, 6.81 kΩ per leg, 10 mA", () => {
    // Sound On Sound glossary "Phantom Power" (44–52 V, 6k8, 10 mA); Wikipedia "Phantom power" (6.81 kΩ)
    expect(PHANTOM_SUPPLIES.P48).toMatchObject({ nominalV: 48, toleranceV: 4, feedResistorPerLegOhms: 6810, maxCurrentMa: 10 });
  });

  it("P24: 24 ± 4 V, 1.2 kΩ per leg, 10 mA", () => {
    // Wikipedia "Phantom power"; a summary of IEC 61938 / JEITA RC-8162 (note.com)
    expect(PHANTOM_SUPPLIES.P24).toMatchObject({ nominalV: 24, toleranceV: 4, feedResistorPerLegOhms: 1200, maxCurrentMa: 10 });
  });

  it("P12: 12 ± 1 V, 680 Ω per leg, 15 mA", () => {
    // Wikipedia "Phantom power"; SOS "15 mA". Tolerance ±1 V from memory (IEC); ips.org.uk prints ±3 V — we use ±1 V.
    expect(PHANTOM_SUPPLIES.P12).toMatchObject({ nominalV: 12, toleranceV: 1, feedResistorPerLegOhms: 680, maxCurrentMa: 15 });
  });
});

describe("phantomAtMic: V_mic = V − I·R/2", () => {
  it("P48 at 48 V: 41.19 / 34.38 / 30.98 / 24.17 / 13.95 V at 2 / 4 / 5 / 7 / 10 mA", () => {
    const rows: [number, string][] = [
      [2, "41.19"],
      [4, "34.38"],
      [5, "30.98"],
      [7, "24.17"],
      [10, "13.95"],
    ];
    for (const [currentMa, printed] of rows) {
      const { voltsAtMic, withinSpec } = phantomAtMic({ supply: "P48", supplyV: 48, currentMa });
      expectPrinted(voltsAtMic, printed); // V − I·R/2 [derived]
      expect(withinSpec).toBe(true);
    }
  });

  it("P48 at 44 V drawing 5 mA: 26.98 V", () => {
    expectPrinted(phantomAtMic({ supply: "P48", supplyV: 44, currentMa: 5 }).voltsAtMic, "26.98"); // [derived]
  });

  it("defaults to the nominal supply voltage", () => {
    expect(phantomAtMic({ supply: "P48", currentMa: 5 })).toEqual(phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 }));
  });

  it("flags a supply out of tolerance or an over-current draw", () => {
    expect(phantomAtMic({ supply: "P48", supplyV: 43.5, currentMa: 2 }).withinSpec).toBe(false); // below 44 V (IEC 61938)
    expect(phantomAtMic({ supply: "P48", supplyV: 52, currentMa: 2 }).withinSpec).toBe(true); // 52 V is the upper limit
    expect(phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 11 }).withinSpec).toBe(false); // over 10 mA
    expect(phantomAtMic({ supply: "P12", supplyV: 12, currentMa: 15 }).withinSpec).toBe(true); // P12 allows 15 mA
    expect(phantomAtMic({ supply: "P12", supplyV: 10.5, currentMa: 5 }).withinSpec).toBe(false); // ±1 V
  });

  it("property: the voltage falls linearly from V at 0 mA to 0 V at the short-circuit current", () => {
    fc.assert(
      fc.property(fc.constantFrom("P12" as const, "P24" as const, "P48" as const), fc.double({ min: 0, max: 1, noNaN: true }), (supply, fraction) => {
        const { nominalV, feedResistorPerLegOhms } = PHANTOM_SUPPLIES[supply];
        const shortCircuitMa = phantomFaultCurrentMa({ supply, fault: "both-legs" });
        const { voltsAtMic } = phantomAtMic({ supply, currentMa: fraction * shortCircuitMa });
        expect(voltsAtMic).toBeCloseTo(nominalV * (1 - fraction), 9);
        expect(shortCircuitMa).toBeCloseTo((2000 * nominalV) / feedResistorPerLegOhms, 9);
      }),
    );
  });

  it("throws for a current the supply cannot deliver, a negative current or an unknown supply", () => {
    expect(() => phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 15 })).toThrow(RangeError); // > 14.10 mA short circuit
    expect(() => phantomAtMic({ supply: "P48", supplyV: 48, currentMa: -1 })).toThrow(RangeError);
    expect(() => phantomAtMic({ supply: "P48", supplyV: 0, currentMa: 1 })).toThrow(RangeError);
    expect(() => phantomAtMic({ supply: "unknown" as never, currentMa: 1 })).toThrow(/P12, P24, P48/);
  });
});

describe("phantomFaultCurrentMa", () => {
  it("P48: one leg grounded at 48 V → 7.05 mA; both legs shorted at 52 V → 15.27 mA", () => {
    expectPrinted(phantomFaultCurrentMa({ supply: "P48", supplyV: 48, fault: "one-leg" }), "7.05"); // [derived]
    expectPrinted(phantomFaultCurrentMa({ supply: "P48", supplyV: 52, fault: "both-legs" }), "15.27"); // [derived]
  });

  it("short-circuit currents at nominal voltage: 14.10, 40.0, 35.3 mA", () => {
    expectPrinted(phantomFaultCurrentMa({ supply: "P48", fault: "both-legs" }), "14.10"); // 2V/R; ips.org.uk "< 15 mA" [derived]
    expectPrinted(phantomFaultCurrentMa({ supply: "P24", fault: "both-legs" }), "40.0"); // [derived]
    expectPrinted(phantomFaultCurrentMa({ supply: "P12", fault: "both-legs" }), "35.3"); // [derived]
    // ips.org.uk: "< 15 mA" if shorted — true at 48 V, but not at the 52 V upper limit (15.27 mA, above).
    expect(phantomFaultCurrentMa({ supply: "P48", fault: "both-legs" })).toBeLessThan(15);
  });

  it("throws for an unknown fault", () => {
    expect(() => phantomFaultCurrentMa({ supply: "P48", fault: "open" as never })).toThrow(RangeError);
  });
});

describe("phantomMaxPowerMw: V²/(2R)", () => {
  it("P48 169.2 mW, P24 240 mW, P12 105.9 mW", () => {
    expectPrinted(phantomMaxPowerMw({ supply: "P48" }), "169.2"); // V²/(2R); Sound On Sound "up to 170 mW" [derived]
    expectNear(phantomMaxPowerMw({ supply: "P48" }), 170, 1); // Sound On Sound glossary "up to 170 mW"
    expectPrinted(phantomMaxPowerMw({ supply: "P24" }), "240"); // [derived]
    expectPrinted(phantomMaxPowerMw({ supply: "P12" }), "105.9"); // [derived]; SOS prints "100 mW" (1 s.f.)
  });
});
