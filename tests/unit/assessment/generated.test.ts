import { describe, expect, it } from "vitest";
import {
  acousticsGenerators,
  convertUnit,
  createGeneratorRegistry,
  deriveSeed,
  drawInputs,
  fillTemplate,
  GENERATOR_CATALOG,
  GENERATOR_NAMES,
  mulberry32,
  seededShuffle,
  templatePlaceholders,
} from "@/lib/assessment";
import { templateForReview } from "@/lib/assessment/generated";
import { decimalsOf } from "@/lib/assessment/random";
import { stubAcoustics, stubGenerators } from "./fixtures";

describe("seeded randomness", () => {
  it("mulberry32 is deterministic, in [0, 1) and differs between seeds", () => {
    const a = mulberry32(2024);
    const b = mulberry32(2024);
    const c = mulberry32(2025);
    const first = Array.from({ length: 1000 }, () => a());
    expect(Array.from({ length: 1000 }, () => b())).toEqual(first);
    expect(first.every((value) => value >= 0 && value < 1)).toBe(true);
    expect(c()).not.toBe(first[0]);
    const mean = first.reduce((sum, value) => sum + value, 0) / first.length;
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.05); // uniform mean 1/2 // common practice
  });

  it("seededShuffle returns a permutation and leaves the input alone", () => {
    const items = ["stands", "mics", "cables", "dis", "box"];
    const shuffled = seededShuffle(items, 7);
    expect([...shuffled].sort()).toEqual([...items].sort());
    expect(items).toEqual(["stands", "mics", "cables", "dis", "box"]);
    expect(seededShuffle(items, 7)).toEqual(shuffled);
  });

  it("derives different seeds per question and purpose", () => {
    expect(deriveSeed(1, "q-a", "shuffle")).not.toBe(deriveSeed(1, "q-b", "shuffle"));
    expect(deriveSeed(1, "q-a", "shuffle")).not.toBe(deriveSeed(1, "q-a", "variant"));
    expect(deriveSeed(1, "q-a", "shuffle")).toBe(deriveSeed(1, "q-a", "shuffle"));
  });

  it("drawInputs covers the whole grid, ends included", () => {
    const seen = new Set<number>();
    for (let seed = 0; seed < 400; seed++) seen.add(drawInputs(seed, { levelDba: { min: 85, max: 100, step: 3 } }).levelDba);
    expect([...seen].sort((x, y) => x - y)).toEqual([85, 88, 91, 94, 97, 100]);
  });

  it("writes decimals without float noise", () => {
    expect(decimalsOf(0.05)).toBe(2);
    expect(decimalsOf(1e-7)).toBe(7);
    expect(decimalsOf(1.5e-7)).toBe(8);
    expect(decimalsOf(10)).toBe(0);
    const value = drawInputs(3, { pathDifferenceM: { min: 0.1, max: 0.3, step: 0.1 } }).pathDifferenceM;
    expect([0.1, 0.2, 0.3]).toContain(value);
  });
});

describe("prompt templates", () => {
  it("finds and fills named placeholders only", () => {
    const template = "Move from {fromM} m to {toM} m. {notAnInput} stays.";
    expect(templatePlaceholders(template)).toEqual(["fromM", "toM", "notAnInput"]);
    expect(fillTemplate(template, { fromM: "1.0", toM: "2.0" })).toBe("Move from 1.0 m to 2.0 m. {notAnInput} stays.");
  });

  it("shows an instructor no raw placeholder names: each becomes … and the prompt says the values vary", () => {
    expect(templateForReview("Move from {fromM} m to {toM} m.")).toBe("Move from … m to … m. (values drawn per attempt)");
    expect(templateForReview("No numbers here.")).toBe("No numbers here.");
  });
});

describe("generator registry with injected stubs", () => {
  it("computes each generator in its catalog unit", () => {
    // f_1 = c/(2Δd): Δd = 1 m → first notch c/2 (here c at 20 °C = 343.215 m/s, Wikipedia "Speed of sound") [derived]
    expect(stubGenerators.combFirstNotch.compute({ pathDifferenceM: 1, temperatureC: 20 }).value).toBeCloseTo(171.6075, 3);
    // t = d/c: 1 m → 2.9155 ms at 343.0; 343.215 m/s gives 2.91363 ms [derived]
    expect(stubGenerators.delayFromDistance.compute({ distanceM: 1, temperatureC: 20 }).value).toBeCloseTo(2.91363, 4);
    // inverse-square law, free field: distance ×2 → −6.0206 dB [derived]
    expect(stubGenerators.inverseSquareChange.compute({ fromM: 1, toM: 2 }).value).toBeCloseTo(-6.0206, 4);
    // NIOSH 98-126: 94 dBA → 1 h; 29 CFR 1910.95 Table G-16: 100 dBA → 2 h [pub]
    expect(stubGenerators.noisePermissibleTime.compute({ levelDba: 94 })).toEqual({ value: 1, unit: "h" });
    expect(stubGenerators.noisePermissibleTimeOsha.compute({ levelDba: 100 })).toEqual({ value: 2, unit: "h" });
    // NIOSH 98-126: 100 dBA → 15 min [pub]
    expect(convertUnit(stubGenerators.noisePermissibleTime.compute({ levelDba: 100 }).value, "h", "min")).toBeCloseTo(15, 9);
  });

  it("formats a key for feedback and refuses missing inputs", () => {
    const result = stubGenerators.combFirstNotch.compute({ pathDifferenceM: 0.343, temperatureC: 0 });
    expect(stubGenerators.combFirstNotch.format(result)).toBe("482.9 Hz"); // 331.3 / 0.686 [derived]
    expect(() => stubGenerators.delayFromDistance.compute({ distanceM: 1 })).toThrow(/temperatureC/);
  });

  it("refuses a non-finite result from an injected function", () => {
    const broken = createGeneratorRegistry({ ...stubAcoustics, inverseSquareChangeDb: () => Number.NaN });
    expect(() => broken.inverseSquareChange.compute({ fromM: 1, toM: 2 })).toThrow(/non-finite/);
  });

  it("lists the inputs of the catalog", () => {
    for (const name of GENERATOR_NAMES) expect(stubGenerators[name].inputs).toEqual(GENERATOR_CATALOG[name].inputs);
  });
});

describe("generator registry wired to lib/acoustics", () => {
  it("agrees with the published check values", () => {
    // NIOSH 98-126 (94 dBA → 1 h) and 29 CFR 1910.95 Table G-16 (100 dBA → 2 h) [pub]
    expect(acousticsGenerators.noisePermissibleTime.compute({ levelDba: 94 }).value).toBeCloseTo(1, 9);
    expect(acousticsGenerators.noisePermissibleTimeOsha.compute({ levelDba: 100 }).value).toBeCloseTo(2, 9);
    // inverse-square law, free field: ×2 → −6.0206 dB [derived]
    expect(acousticsGenerators.inverseSquareChange.compute({ fromM: 1, toM: 2 }).value).toBeCloseTo(-6.0206, 4);
    // Wikipedia "Speed of sound": 20 °C → 343.215 m/s; t = d/c → 2.91363 ms for 1 m [derived]
    expect(acousticsGenerators.delayFromDistance.compute({ distanceM: 1, temperatureC: 20 }).value).toBeCloseTo(2.91363, 4);
  });

  it("agrees with the published phantom-power, level and DI check values", () => {
    // P48 (IEC 61938: 48 V, 6.81 kΩ per leg): 24.17 V at 7 mA, 26.98 V at 5 mA
    // from 44 V, 7.05 mA with one leg grounded [derived from the published resistor values]
    // (the table prints 24.17 for 48 − 7 × 3.405 = 24.165)
    expect(acousticsGenerators.phantomVoltsAtMic.compute({ supplyV: 48, currentMa: 7 }).value).toBeCloseTo(24.165, 6);
    expect(acousticsGenerators.phantomVoltsAtMic.compute({ supplyV: 44, currentMa: 5 }).value).toBeCloseTo(26.98, 2);
    expect(acousticsGenerators.phantomOneLegFault.compute({ supplyV: 48 })).toEqual({ value: expect.closeTo(7.05, 2), unit: "mA" });
    // STx manual table: +4 dBu = 1.2276 V; ControlBooth: "1.228 V" [pub]
    // (STx prints 1.2276 for the exact 0.7746·10^(4/20) = 1.22765, so compare to 3 decimals)
    expect(acousticsGenerators.dbuInVolts.compute({ levelDbu: 4 }).value).toBeCloseTo(1.2276, 3);
    expect(acousticsGenerators.dbuInVolts.format(acousticsGenerators.dbuInVolts.compute({ levelDbu: 4 }))).toBe("1.228 V");
    // V = S·10^((L − 94)/20): 10 mV/Pa at 114 dB SPL → 0.100 V; exactly 10 mV × 10.0237 Pa = 100.24 mV [derived]
    expect(acousticsGenerators.micOutputAtSpl.compute({ mvPerPa: 10, splDb: 114 })).toEqual({ value: expect.closeTo(100.24, 2), unit: "mV" });
    // 10:1 → −20.00 dB, 12:1 → −21.58 dB (ratios: Electronic Musician, "Going Direct") [derived]
    expect(acousticsGenerators.diTransformerLoss.compute({ turnsRatio: 10 }).value).toBeCloseTo(-20, 9);
    expect(acousticsGenerators.diTransformerLoss.compute({ turnsRatio: 12 }).value).toBeCloseTo(-21.58, 2);
  });

  it("agrees with the published alignment, thermal-noise and gain-structure values", () => {
    // EBU R68-2000: −18 dBFS = 0 dBu; SMPTE RP 155: −20 dBFS = +4 dBu (the +4 dBu pairing is common practice) [pub]
    expect(acousticsGenerators.dbfsToDbuEbu.compute({ dbfs: -18 })).toEqual({ value: 0, unit: "dBu" });
    expect(acousticsGenerators.dbfsToDbuSmpte.compute({ dbfs: -20 })).toEqual({ value: 4, unit: "dBu" });
    expect(acousticsGenerators.dbuToDbfsEbu.compute({ levelDbu: 0 })).toEqual({ value: -18, unit: "dBFS" });
    expect(acousticsGenerators.dbuToDbfsSmpte.compute({ levelDbu: 4 })).toEqual({ value: -20, unit: "dBFS" });
    // full scale: +18 dBu (EBU) and +24 dBu (SMPTE) [derived]
    expect(acousticsGenerators.dbfsToDbuEbu.compute({ dbfs: 0 }).value).toBe(18);
    expect(acousticsGenerators.dbfsToDbuSmpte.format(acousticsGenerators.dbfsToDbuSmpte.compute({ dbfs: 0 }))).toBe("24.0 dBu");
    // Wikipedia "Johnson–Nyquist noise": 1 kΩ, 10 kHz, room temperature → 400 nV [pub] (17 °C = 290.15 K: 0.400 µV)
    const microvolts = acousticsGenerators.sourceThermalNoiseMicrovolts.compute({ resistanceOhms: 1000, bandwidthHz: 10_000, temperatureC: 17 });
    expect(acousticsGenerators.sourceThermalNoiseMicrovolts.format(microvolts)).toBe("0.400 µV");
    expect(convertUnit(microvolts.value, "uV", "mV")).toBeCloseTo(0.0004, 6);
    // 150 Ω over 20 kHz: the trade's −131 dBu (common practice); −130.96 dBu at 290.15 K [derived]
    const floor = acousticsGenerators.sourceThermalNoiseDbu.compute({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureC: 17 });
    expect(floor.unit).toBe("dBu");
    expect(floor.value).toBeCloseTo(-131, 0);
    expect(floor.value).toBeCloseTo(-130.96, 2);
    // noise figure = EIN − floor: −129 dBu → 1.96 dB at 290 K [derived]
    expect(acousticsGenerators.preampNoiseFigure.compute({ einDbu: -129 }).value).toBeCloseTo(1.96, 2);
    // 10 mV/Pa at 114 dB SPL is −17.76 dBu (ISO 1683, ITU-R V.574) [derived]: 21.76 dB of gain to +4 dBu
    expect(acousticsGenerators.preampGainForLevel.compute({ mvPerPa: 10, splDb: 114, targetDbu: 4 }).value).toBeCloseTo(21.76, 2);
    // +4 dBu on a stage that clips at +24 dBu: 20 dB of headroom (common practice)
    expect(acousticsGenerators.stageHeadroom.compute({ sourceDbu: -36, gainDb: 40, clipDbu: 24 })).toEqual({ value: 20, unit: "dB" });
  });

  it("keeps every draw of the gain-structure generators inside what the library accepts", () => {
    // The domain corners: no draw a bank can make reaches a value the formulas refuse.
    for (const name of ["sourceThermalNoiseDbu", "sourceThermalNoiseMicrovolts", "preampNoiseFigure", "preampGainForLevel", "stageHeadroom"] as const) {
      const domain = GENERATOR_CATALOG[name].domain as Record<string, readonly [number, number]>;
      const names = Object.keys(domain);
      for (let corner = 0; corner < 2 ** names.length; corner++) {
        const inputs = Object.fromEntries(names.map((input, index) => [input, domain[input][(corner >> index) & 1]]));
        expect(Number.isFinite(acousticsGenerators[name].compute(inputs).value), `${name} ${JSON.stringify(inputs)}`).toBe(true);
      }
    }
  });

  it("answers a phantom question in any unit of current (mA or A)", () => {
    const key = acousticsGenerators.phantomOneLegFault.compute({ supplyV: 48 });
    expect(convertUnit(key.value, "mA", "A")).toBeCloseTo(0.00705, 5);
  });

  it("matches the stubbed textbook formulas over the whole catalog, at each entry's worked case", () => {
    for (const name of GENERATOR_NAMES) {
      const inputs = GENERATOR_CATALOG[name].example;
      expect(Object.keys(inputs).sort()).toEqual([...GENERATOR_CATALOG[name].inputs].sort());
      const real = acousticsGenerators[name].compute(inputs);
      const stub = stubGenerators[name].compute(inputs);
      expect(real.unit).toBe(stub.unit);
      expect(real.value).toBeCloseTo(stub.value, 9);
    }
  });
});
