/**
 * Johnson–Nyquist noise and a preamp's noise figure.
 * Sources (full citations in tests/sources.md): Johnson (1928) and Nyquist (1928), v = √(4kTRB);
 * BIPM SI Brochure 9th ed. (k = 1.380649e-23 J/K exactly); Wikipedia "Johnson–Nyquist noise"
 * (1 kΩ, 10 kHz, room temperature → 400 nV; 50 Ω in 1 Hz ≈ 1 nV); Horowitz & Hill, The Art of
 * Electronics (10 kΩ, 10 kHz → 1.3 µV, from memory); the trade's −131 dBu for 150 Ω over 20 kHz
 * (common practice); the IEEE noise-figure reference temperature 290 K (from memory).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { voltsToDbu } from "@/lib/acoustics/levels";
import {
  AUDIO_BANDWIDTH_HZ,
  BOLTZMANN_J_PER_K,
  EIN_SOURCE_RESISTANCE_OHMS,
  noiseFigureDb,
  preampOwnNoiseDbu,
  STANDARD_NOISE_TEMPERATURE_K,
  thermalNoiseDbu,
  thermalNoiseDensityNvPerRootHz,
  thermalNoiseVolts,
} from "@/lib/acoustics/thermal-noise";
import { expectNear, expectPrinted } from "./near";

describe("thermalNoiseVolts, v = √(4kTRB)", () => {
  it("uses the exact SI Boltzmann constant", () => {
    expect(BOLTZMANN_J_PER_K).toBe(1.380649e-23); // BIPM SI Brochure, 9th ed. (2019) [pub]
    expect(STANDARD_NOISE_TEMPERATURE_K).toBe(290); // IEEE noise-figure T₀ (from memory)
  });

  it("1 kΩ over 10 kHz at room temperature → 400 nV", () => {
    // Wikipedia "Johnson–Nyquist noise": "400 nV" [pub] at room temperature; at 290 K 400.2 nV.
    expectPrinted(thermalNoiseVolts({ resistanceOhms: 1000, bandwidthHz: 10_000, temperatureK: 290 }) * 1e9, "400");
    // At 300 K: 0.4070 µV = −125.59 dBu [derived]
    const at300 = thermalNoiseVolts({ resistanceOhms: 1000, bandwidthHz: 10_000, temperatureK: 300 });
    expectPrinted(at300 * 1e6, "0.4070");
    expectPrinted(thermalNoiseDbu({ resistanceOhms: 1000, bandwidthHz: 10_000, temperatureK: 300 }), "-125.59");
  });

  it("50 Ω in a 1 Hz bandwidth ≈ 1 nV; 1 kΩ ≈ 4 nV/√Hz", () => {
    // Wikipedia "Johnson–Nyquist noise", rule of thumb "50 Ω at 1 Hz bandwidth correspond to 1 nV" [pub]
    expectPrinted(thermalNoiseVolts({ resistanceOhms: 50, bandwidthHz: 1, temperatureK: 290 }) * 1e9, "1");
    expectPrinted(thermalNoiseDensityNvPerRootHz({ resistanceOhms: 1000, temperatureK: 300 }), "4.07"); // [derived]
    expectPrinted(thermalNoiseDensityNvPerRootHz({ resistanceOhms: 1000, temperatureK: 300 }), "4"); // common practice "4 nV/√Hz per kΩ"
  });

  it("10 kΩ over 10 kHz → 1.3 µV", () => {
    // Horowitz & Hill, The Art of Electronics, Johnson noise example (from memory): 1.3 µV rms
    expectPrinted(thermalNoiseVolts({ resistanceOhms: 10_000, bandwidthHz: 10_000, temperatureK: 300 }) * 1e6, "1.3");
    expectPrinted(thermalNoiseVolts({ resistanceOhms: 10_000, bandwidthHz: 10_000, temperatureK: 290 }) * 1e6, "1.3");
  });

  it("150 Ω over 20 kHz → −131 dBu, the floor of a mic preamp's EIN", () => {
    const at290 = thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 });
    const at300 = thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 300 });
    expectPrinted(at290, "-131"); // common practice: "−131 dBu" for 150 Ω, 20 kHz
    expectPrinted(at300, "-131"); // same
    expectPrinted(at290, "-130.96"); // [derived]
    expectPrinted(at300, "-130.82"); // [derived]
    // 200 Ω is 1.25 dB noisier (10·log10(200/150)): −129.72 dBu at 290 K [derived]
    expectPrinted(thermalNoiseDbu({ resistanceOhms: 200, bandwidthHz: 20_000, temperatureK: 290 }), "-129.72");
    expect(EIN_SOURCE_RESISTANCE_OHMS).toBe(150); // common practice
    expect(AUDIO_BANDWIDTH_HZ).toBe(20_000); // common practice
  });

  it("agrees with the dBu of the volts function", () => {
    const args = { resistanceOhms: 600, bandwidthHz: 20_000, temperatureK: 290 };
    expect(thermalNoiseDbu(args)).toBeCloseTo(voltsToDbu(thermalNoiseVolts(args)), 12);
    expectPrinted(thermalNoiseDbu(args), "-124.94"); // [derived]
  });

  it("property: doubling R, B or T raises the noise by 3.01 dB", () => {
    const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    fc.assert(
      fc.property(positive(1, 1e6), positive(1, 1e5), positive(1, 1000), (resistanceOhms, bandwidthHz, temperatureK) => {
        const base = thermalNoiseDbu({ resistanceOhms, bandwidthHz, temperatureK });
        // 10·log10 2 = 3.0103 dB: the noise power is proportional to each (ITU-R V.574-5, power quantity)
        expectNear(thermalNoiseDbu({ resistanceOhms: 2 * resistanceOhms, bandwidthHz, temperatureK }) - base, 3.0103, 1e-4);
        expectNear(thermalNoiseDbu({ resistanceOhms, bandwidthHz: 2 * bandwidthHz, temperatureK }) - base, 3.0103, 1e-4);
        expectNear(thermalNoiseDbu({ resistanceOhms, bandwidthHz, temperatureK: 2 * temperatureK }) - base, 3.0103, 1e-4);
      }),
    );
  });

  it("refuses zero or negative resistance, bandwidth or temperature", () => {
    expect(() => thermalNoiseVolts({ resistanceOhms: 0, bandwidthHz: 1, temperatureK: 290 })).toThrow(RangeError);
    expect(() => thermalNoiseVolts({ resistanceOhms: 150, bandwidthHz: -1, temperatureK: 290 })).toThrow(RangeError);
    expect(() => thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 0 })).toThrow(RangeError);
  });
});

describe("noiseFigureDb: EIN against the source's thermal noise", () => {
  it("EIN −129 dBu with 150 Ω over 20 kHz → 2.0 dB at 290 K", () => {
    expectPrinted(noiseFigureDb({ einDbu: -129 }), "1.96"); // −129 − (−130.96) [derived]
    expectPrinted(noiseFigureDb({ einDbu: -120 }), "10.96"); // [derived]
    expectPrinted(noiseFigureDb({ einDbu: -129, temperatureK: 300 }), "1.82"); // [derived]
  });

  it("an EIN at the floor is a noiseless preamp, 0 dB", () => {
    const floor = thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 });
    expect(noiseFigureDb({ einDbu: floor })).toBeCloseTo(0, 12);
    expect(noiseFigureDb({ einDbu: -131 })).toBe(0); // a quoted −131 dBu rounds the −130.96 floor
  });

  it("refuses an EIN below the source's own noise (measured with a shorted input)", () => {
    expect(() => noiseFigureDb({ einDbu: -133 })).toThrow(RangeError);
    expect(() => noiseFigureDb({ einDbu: -128, resistanceOhms: 600 })).toThrow(/below the thermal noise/);
  });
});

describe("preampOwnNoiseDbu: EIN less the source's share", () => {
  it("an EIN 3.01 dB above the floor is a preamp as noisy as the source", () => {
    const floor = thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 });
    // equal uncorrelated powers add 10·log10 2 = 3.0103 dB (ITU-R V.574-5, power quantity) [derived]
    expectNear(preampOwnNoiseDbu({ einDbu: floor + 10 * Math.log10(2) }), floor, 1e-9);
    // EIN −127 dBu: 10·log10(10^−12.7 − 10^−13.0965) = −129.23 dBu [derived]
    expectPrinted(preampOwnNoiseDbu({ einDbu: -127 }), "-129.23");
    expect(preampOwnNoiseDbu({ einDbu: floor })).toBe(-Infinity);
  });

  it("property: the source's noise and the preamp's own add back up to the EIN", () => {
    const floor = thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 });
    fc.assert(
      fc.property(fc.double({ min: -130.9, max: -100, noNaN: true }), (einDbu) => {
        const own = preampOwnNoiseDbu({ einDbu });
        expectNear(10 * Math.log10(10 ** (own / 10) + 10 ** (floor / 10)), einDbu, 1e-9);
      }),
    );
  });
});
