/**
 * dBu, dBV, SPL and microphone sensitivity.
 * Sources (full citations in tests/sources.md): ITU-R BS.645-2 and V.574-5 (dBu), the
 * STx manual table (0 dBu = 0.7746 V), ControlBooth (line levels), itwissen.info (dBV in
 * dBu), ISO 1683:2015 (20 µPa), sengpielaudio (microphone sensitivity).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  dbuToDbv,
  dbuToVolts,
  dbvPerPaToDbvPerMicrobar,
  dbvToDbu,
  dbvToVolts,
  micOutputVolts,
  micSensitivityDbv,
  micSensitivityMvPerPa,
  paFromSplDb,
  splDbFromPa,
  voltsToDbu,
  voltsToDbv,
} from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

describe("dBu and dBV", () => {
  it("0 dBu = √0.6 V", () => {
    expectPrinted(dbuToVolts(0), "0.7745967"); // √(1 mW × 600 Ω); STx manual table "0 dBu = 0.7746 V"
    expectPrinted(dbuToVolts(0), "0.7746"); // STx manual (Acoustics Research Institute) table
    expectPrinted(dbuToVolts(0), "0.775"); // ITU-R BS.645-2: 0 dBu0s = 0.775 V rms
  });

  it("+4 dBu = 1.2276 V = +1.78151 dBV", () => {
    // STx manual table prints 1.2276 V; the exact value 1.227653 V rounds to 1.2277, so the
    // printed figure is truncated (or made from a rounded reference). Checked at ±1e-4 V.
    expectNear(dbuToVolts(4), 1.2276, 1e-4); // STx manual (Acoustics Research Institute) table
    expectPrinted(dbuToVolts(4), "1.228"); // ControlBooth wiki
    expectPrinted(dbuToVolts(4), "1.22765"); // [derived]
    expectPrinted(voltsToDbv(dbuToVolts(4)), "1.78151"); // [derived]
    expectPrinted(dbuToVolts(4) * Math.SQRT2, "1.7362"); // peak of a sine, [derived]
  });

  it("0 dBV = 1 V; −10 dBV = 0.316228 V = −7.7815 dBu", () => {
    expect(dbvToVolts(0)).toBe(1); // definition of dBV (ITU-R V.574-5, absolute voltage level)
    expectPrinted(dbvToVolts(-10), "0.316228"); // [derived]
    expectPrinted(dbvToVolts(-10), "0.316"); // ControlBooth
    expectPrinted(voltsToDbu(dbvToVolts(-10)), "-7.7815"); // [derived]
  });

  it("+4 dBu is 11.78 dB above −10 dBV (voltage ratio 3.882)", () => {
    expectPrinted(4 - dbvToDbu(-10), "11.78"); // ControlBooth "11.78 dB"
    expectPrinted(4 - dbvToDbu(-10), "11.7815"); // [derived]
    expectPrinted(dbuToVolts(4) / dbvToVolts(-10), "3.882"); // [derived]
  });

  it("0 dBV = +2.2185 dBu", () => {
    expectPrinted(dbvToDbu(0), "2.2185"); // [derived]
    expectPrinted(dbvToDbu(0), "2.2"); // itwissen.info "≈ +2.2 dBu"
    expectPrinted(dbuToDbv(0), "-2.2185"); // [derived]
  });

  it("property: the conversions round-trip", () => {
    fc.assert(
      fc.property(fc.double({ min: -120, max: 40, noNaN: true }), (levelDb) => {
        expect(voltsToDbu(dbuToVolts(levelDb))).toBeCloseTo(levelDb, 9);
        expect(voltsToDbv(dbvToVolts(levelDb))).toBeCloseTo(levelDb, 9);
        expect(dbuToDbv(dbvToDbu(levelDb))).toBeCloseTo(levelDb, 9);
      }),
    );
  });

  it("0 V is −Infinity; negative volts throw", () => {
    expect(voltsToDbu(0)).toBe(-Infinity);
    expect(() => voltsToDbv(-1)).toThrow(RangeError);
    expect(() => dbuToVolts(Number.NaN)).toThrow(RangeError);
  });
});

describe("SPL re 20 µPa (ISO 1683:2015)", () => {
  it("matches the check values", () => {
    expectPrinted(splDbFromPa(1), "93.979"); // re 20 µPa, ISO 1683:2015 [derived]
    expectPrinted(paFromSplDb(94), "1.00237"); // [derived]
    expectPrinted(splDbFromPa(0.1), "73.98"); // 1 µbar, [derived]
    expectPrinted(splDbFromPa(20), "120.0"); // [derived]
    expect(splDbFromPa(20e-6)).toBe(0); // reference pressure
  });

  it("property: splDbFromPa and paFromSplDb are inverses", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 194, noNaN: true }), (splDb) => {
        expect(splDbFromPa(paFromSplDb(splDb))).toBeCloseTo(splDb, 9);
      }),
    );
  });
});

describe("microphone sensitivity", () => {
  it("mV/Pa → dB re 1 V/Pa", () => {
    // [derived] except 50 mV/Pa, which sengpielaudio prints as −26 dBV.
    const rows: [number, string][] = [
      [1, "-60.00"],
      [2, "-53.98"],
      [5, "-46.02"],
      [10, "-40.00"],
      [12, "-38.42"],
      [20, "-33.98"],
      [50, "-26.02"],
    ];
    for (const [mvPerPa, printed] of rows) expectPrinted(micSensitivityDbv({ mvPerPa }), printed);
    expectPrinted(micSensitivityDbv({ mvPerPa: 50 }), "-26"); // sengpielaudio "Microphone sensitivity and conversion"
  });

  it("dB re 1 V/µbar = dB re 1 V/Pa − 20", () => {
    expect(dbvPerPaToDbvPerMicrobar(-40)).toBe(-60); // sengpielaudio
  });

  it("property: micSensitivityMvPerPa inverts micSensitivityDbv", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1000, noNaN: true }), (mvPerPa) => {
        expect(micSensitivityMvPerPa({ sensitivityDbv: micSensitivityDbv({ mvPerPa }) }) / mvPerPa).toBeCloseTo(1, 12);
      }),
    );
  });

  it("10 mV/Pa at 114 dB SPL → 0.100 V", () => {
    // [derived] with the trade's shortcut V = S·10^((L−94)/20): 0.100 V = −20 dBV = −17.78 dBu.
    const shortcutV = micOutputVolts({ mvPerPa: 10, splDb: 114, assume94DbIs1Pa: true });
    expectPrinted(shortcutV, "0.100");
    expectNear(voltsToDbv(shortcutV), -20);
    expectNear(voltsToDbu(shortcutV), -17.78);
    // The exact V = S·p (94 dB SPL = 1.00237 Pa) is 0.02 dB higher: −19.98 dBV. Same value at the printed 3 s.f.
    const exactV = micOutputVolts({ mvPerPa: 10, splDb: 114 });
    expectPrinted(exactV, "0.100");
    expectNear(voltsToDbv(exactV), -19.979, 1e-3); // 20·log10(0.01·20e-6·10^(114/20)), [derived]
  });

  it("throws for a zero or negative sensitivity", () => {
    expect(() => micSensitivityDbv({ mvPerPa: 0 })).toThrow(RangeError);
    expect(() => micOutputVolts({ mvPerPa: -1, splDb: 94 })).toThrow(RangeError);
  });
});
