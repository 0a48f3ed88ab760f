/**
 * Gain structure: headroom, signal-to-noise, power sums of noise and levels through a chain.
 * Sources (full citations in tests/sources.md): ITU-R V.574-5 (dB of field and power quantities),
 * Everest & Pohlmann (adding uncorrelated levels: two equal → +3 dB), ISO 1683 (20 µPa), the
 * headroom and signal-to-noise definitions (common practice; Ballou, gain structure).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { dbuToDbfs, fullScaleDbu } from "@/lib/acoustics/alignment";
import { gainStageLevels, headroomDb, micOutputDbu, signalToNoiseDb, sumUncorrelatedDb, type GainStage } from "@/lib/acoustics/gain-structure";
import { thermalNoiseDbu } from "@/lib/acoustics/thermal-noise";
import { expectNear, expectPrinted } from "./near";

describe("headroom and signal-to-noise", () => {
  it("headroom is clip − level; signal-to-noise is level − noise", () => {
    expect(headroomDb({ levelDbu: 4, clipDbu: 24 })).toBe(20); // +4 dBu on a +24 dBu stage: 20 dB, common practice
    expect(headroomDb({ levelDbu: 26, clipDbu: 24 })).toBe(-2); // over by 2 dB
    expect(signalToNoiseDb({ levelDbu: 4, noiseDbu: -86 })).toBe(90); // [derived]
  });

  it("headroom at the EBU and SMPTE alignment levels is the distance to full scale", () => {
    expect(headroomDb({ levelDbu: 0, clipDbu: fullScaleDbu({ alignment: "ebu-r68" }) })).toBe(18); // EBU R68-2000 [pub]
    expect(headroomDb({ levelDbu: 4, clipDbu: fullScaleDbu({ alignment: "smpte-rp155" }) })).toBe(20); // SMPTE RP 155 [pub]
  });
});

describe("sumUncorrelatedDb", () => {
  it("two equal noises add 3 dB; 10 dB apart add 0.41 dB", () => {
    expectPrinted(sumUncorrelatedDb([-90, -90]) + 90, "3.0"); // Everest & Pohlmann: two equal uncorrelated sources → +3 dB [pub]
    expectPrinted(sumUncorrelatedDb([-90, -90]) + 90, "3.0103"); // 10·log10 2 [derived]
    expectPrinted(sumUncorrelatedDb([-80, -90]) + 80, "0.41"); // 10·log10 1.1 [derived]
    expect(sumUncorrelatedDb([-Infinity, -70])).toBe(-70);
    expect(sumUncorrelatedDb([])).toBe(-Infinity);
  });

  it("property: the sum is at least the largest and at most 10·log10 n above it", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -150, max: 30, noNaN: true }), { minLength: 1, maxLength: 8 }), (levels) => {
        const total = sumUncorrelatedDb(levels);
        const largest = Math.max(...levels);
        expect(total).toBeGreaterThanOrEqual(largest - 1e-9);
        expect(total).toBeLessThanOrEqual(largest + 10 * Math.log10(levels.length) + 1e-9);
      }),
    );
  });
});

describe("micOutputDbu", () => {
  it("10 mV/Pa at 114 dB SPL → −17.76 dBu; 2 mV/Pa at 94 dB SPL → −51.74 dBu", () => {
    // V = S·p with p = 20 µPa·10^(L/20) (ISO 1683); dBu re √0.6 V (ITU-R V.574) [derived]
    expectPrinted(micOutputDbu({ splDb: 114, mvPerPa: 10 }), "-17.76");
    expectPrinted(micOutputDbu({ splDb: 94, mvPerPa: 2 }), "-51.74");
  });
});

// A club vocal channel: mic → preamp → channel fader → mix bus → converter (EBU R68).
const preamp = (gainDb: number): GainStage => ({ name: "preamp", gainDb, clipDbu: 24, noiseFloorDbu: -128 + gainDb });
const fader: GainStage = { name: "fader", gainDb: 0, clipDbu: 24, noiseFloorDbu: -90 };
const converter: GainStage = { name: "converter", gainDb: 0, clipDbu: fullScaleDbu({ alignment: "ebu-r68" }), noiseFloorDbu: 18 - 115 };

describe("gainStageLevels", () => {
  it("tracks level, noise, headroom and signal-to-noise stage by stage", () => {
    const chain = gainStageLevels({ sourceDbu: -50, stages: [preamp(40), fader, converter] });
    // Levels add: −50 + 40 = −10 dBu at every later stage [derived]
    expect(chain.stages.map((stage) => stage.outputDbu)).toEqual([-10, -10, -10]);
    expect(chain.stages.map((stage) => stage.headroomDb)).toEqual([34, 34, 28]);
    // Noise by power sum: −88; −88 ⊕ −90 = −85.88; ⊕ −97 = −85.55 dBu [derived]
    expectPrinted(chain.stages[0].noiseDbu, "-88");
    expectPrinted(chain.stages[1].noiseDbu, "-85.88");
    expectPrinted(chain.stages[2].noiseDbu, "-85.55");
    expectPrinted(chain.finalSnrDb, "75.55");
    expect(chain.tightestStage).toBe("converter");
    expect(chain.minimumHeadroomDb).toBe(28);
    expect(chain.firstClip).toBeNull();
    // The converter reads −10 dBu as −28 dBFS under EBU R68 [derived]
    expect(dbuToDbfs({ dbu: chain.stages[2].outputDbu, alignment: "ebu-r68" })).toBe(-28);
  });

  it("too much preamp gain clips the converter first, and says by how much", () => {
    const chain = gainStageLevels({ sourceDbu: -50, stages: [preamp(70), fader, converter] });
    expect(chain.stages[2].outputDbu).toBe(20);
    expect(chain.stages[2].headroomDb).toBe(-2); // 2 dB over +18 dBu full scale [derived]
    expect(chain.stages[0].clips).toBe(false);
    expect(chain.firstClip).toBe("converter");
  });

  it("starts from an SPL and a sensitivity, and from the thermal noise of the source", () => {
    const sourceNoiseDbu = thermalNoiseDbu({ resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 });
    const chain = gainStageLevels({ splDb: 94, mvPerPa: 2, sourceNoiseDbu, stages: [{ name: "preamp", gainDb: 50, clipDbu: 24 }] });
    expectPrinted(chain.sourceDbu, "-51.74"); // as micOutputDbu [derived]
    expectPrinted(chain.stages[0].noiseDbu, "-80.96"); // −130.96 + 50 [derived]
    expectPrinted(chain.stages[0].snrDb, "79.22"); // the mic's own floor limits it: −1.74 − (−80.96) [derived]
  });

  it("a noiseless chain has an infinite signal-to-noise ratio; a passive pad never clips", () => {
    const chain = gainStageLevels({ sourceDbu: 0, stages: [{ name: "pad", gainDb: -20 }] });
    expect(chain.stages[0].snrDb).toBe(Infinity);
    expect(chain.stages[0].noiseDbu).toBe(-Infinity);
    expect(chain.stages[0].headroomDb).toBe(Infinity);
    expect(chain.stages[0].clips).toBe(false);
  });

  it("a 20 dB pad before the preamp keeps a loud source from clipping it", () => {
    // 20 mV/Pa at 135 dB SPL: +9.26 dBu at the mic (ISO 1683, ITU-R V.574) [derived]
    const hot = { splDb: 135, mvPerPa: 20 };
    const withoutPad = gainStageLevels({ ...hot, stages: [{ name: "pad", gainDb: 0 }, { name: "preamp", gainDb: 20, clipDbu: 24 }] });
    const withPad = gainStageLevels({ ...hot, stages: [{ name: "pad", gainDb: -20 }, { name: "preamp", gainDb: 20, clipDbu: 24 }] });
    expectPrinted(withoutPad.sourceDbu, "9.26");
    expectPrinted(withoutPad.stages[1].headroomDb, "-5.26");
    expect(withoutPad.firstClip).toBe("preamp");
    expectPrinted(withPad.stages[1].headroomDb, "14.74");
    expect(withPad.tightestStage).toBe("preamp");
  });

  it("property: the output is the source plus the sum of the gains, and a silent unity stage changes nothing", () => {
    const gain = fc.double({ min: -40, max: 60, noNaN: true });
    fc.assert(
      fc.property(fc.double({ min: -80, max: 10, noNaN: true }), fc.array(gain, { minLength: 1, maxLength: 6 }), (sourceDbu, gains) => {
        const stages = gains.map((gainDb, index) => ({ name: `s${index}`, gainDb, clipDbu: 24, noiseFloorDbu: -100 }));
        const chain = gainStageLevels({ sourceDbu, stages });
        const last = chain.stages[chain.stages.length - 1];
        expectNear(last.outputDbu, sourceDbu + gains.reduce((sum, value) => sum + value, 0), 1e-9);
        const longer = gainStageLevels({ sourceDbu, stages: [...stages, { name: "wire", gainDb: 0, clipDbu: 1000 }] });
        expectNear(longer.finalSnrDb, chain.finalSnrDb, 1e-9);
      }),
    );
  });

  it("refuses an empty chain and a non-finite gain", () => {
    expect(() => gainStageLevels({ sourceDbu: -50, stages: [] })).toThrow(RangeError);
    expect(() => gainStageLevels({ sourceDbu: -50, stages: [{ name: "preamp", gainDb: Number.NaN, clipDbu: 24 }] })).toThrow(RangeError);
    expect(() => gainStageLevels({ splDb: 94, mvPerPa: 0, stages: [fader] })).toThrow(RangeError);
  });
});
