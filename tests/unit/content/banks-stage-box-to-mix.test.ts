// Question banks of the course stage-box-to-mix (content/banks/stage-box-to-mix/*.json): every
// numeric key, and the numbers other questions rest on, recomputed with lib/acoustics with the
// source of the value beside it (full citations in tests/sources.md). The checks all banks share
// are in banks-common.test.ts.
import { describe, expect, it } from "vitest";
import {
  dbfsToDbu,
  dbuToDbfs,
  delayMs,
  fullScaleDbu,
  headroomDb,
  inverseSquareChangeDb,
  micOutputDbu,
  noiseFigureDb,
  patternLevelDb,
  permissibleExposureHours,
  PICKUP_PATTERNS,
  speedOfSoundMs,
  thermalNoiseDbu,
  thermalNoiseVolts,
} from "@/lib/acoustics";
import { inputByChannel, stagePosition } from "@/lib/content/scenario";
import { describeNumericKeys, loadCourseBanks } from "./course-banks";

const COURSE_SLUG = "stage-box-to-mix";
const { question } = loadCourseBanks(COURSE_SLUG);

/** Speed of sound at 20 °C from the library (Wikipedia "Speed of sound": 343.2 m/s at 20 °C). */
const C_20 = speedOfSoundMs({ temperatureC: 20 });
/** EIN conditions: 150 Ω over 20 kHz (common practice) at the IEEE reference temperature 290 K (from memory). */
const EIN_SOURCE = { resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 };
const MINUTES_PER_HOUR = 60;
const UV_PER_V = 1e6;

/**
 * Every numeric key, recomputed with lib/acoustics, in the question's own unit.
 * Keyed "<bank>/<question id>" because question ids are unique only within a bank.
 */
const NUMERIC_KEYS: Record<string, number> = {
  // t = d/c; c from the dry-air formula (Wikipedia "Speed of sound"): 14 m at 20 °C → 40.79 ms
  "through-the-console/q-through-the-console-12": delayMs({ distanceM: 14, speedOfSoundMs: C_20 }),
  // inverse-square law (Ballou ch. 34): 20·log10(15/3) = 13.98 dB
  "through-the-console/q-through-the-console-13": -inverseSquareChangeDb({ fromM: 3, toM: 15 }),

  // V = S·p, p re 20 µPa (ISO 1683:2015), in dBu re 0.7746 V (ITU-R V.574-5): 2 mV/Pa at 104 dB SPL → −41.74 dBu
  "gain-structure/q-gain-structure-01": micOutputDbu({ mvPerPa: 2, splDb: 104 }),
  // EBU R68: −10 dBFS = +8 dBu; 2 mV/Pa at 110 dB SPL = −35.74 dBu → 43.74 dB of gain [derived]
  "gain-structure/q-gain-structure-02": dbfsToDbu({ dbfs: -10, alignment: "ebu-r68" }) - micOutputDbu({ mvPerPa: 2, splDb: 110 }),
  // Johnson (1928) / Nyquist (1928), k exact (BIPM SI Brochure): 200 Ω, 20 kHz, 290 K → 0.2531 µV
  "gain-structure/q-gain-structure-09": UV_PER_V * thermalNoiseVolts({ ...EIN_SOURCE, resistanceOhms: 200 }),
  // signal-to-noise = level − noise (common practice): −51.74 dBu against an EIN of −128 dBu → 76.26 dB
  "gain-structure/q-gain-structure-10": micOutputDbu({ mvPerPa: 2, splDb: 94 }) - -128,

  // first-order pattern 0.5 + 0.5·cos θ (Eargle ch. 5): 150° → −23.48 dB
  "monitors-and-soundcheck/q-monitors-and-soundcheck-02": -patternLevelDb({ a: PICKUP_PATTERNS.cardioid.a, angleDeg: 150 }),
  // exact supercardioid A = (√3 − 1)/2 (Heller 2011): −11.44 dB at 180°
  "monitors-and-soundcheck/q-monitors-and-soundcheck-03": -patternLevelDb({ a: PICKUP_PATTERNS.supercardioid.a, angleDeg: 180 }),
  // NIOSH 98-126: T = 8/2^((96 − 85)/3) h = 0.630 h → 37.80 min
  "monitors-and-soundcheck/q-monitors-and-soundcheck-08": MINUTES_PER_HOUR * permissibleExposureHours({ levelDba: 96, standard: "niosh" }),

  // EBU R68: +10 dBu → −8 dBFS
  "final/q-final-02": dbuToDbfs({ dbu: 10, alignment: "ebu-r68" }),
  // SMPTE RP 155 with +4 dBu (common practice): full scale +24 dBu, 6 dB over EBU R68's +18 dBu
  "final/q-final-03": dbuToDbfs({ dbu: fullScaleDbu({ alignment: "smpte-rp155" }), alignment: "ebu-r68" }),
  // Johnson–Nyquist: 150 Ω, 20 kHz, 300 K → −130.82 dBu
  "final/q-final-04": thermalNoiseDbu({ ...EIN_SOURCE, temperatureK: 300 }),
  // noise figure = EIN − source thermal noise (IEEE T₀ = 290 K, from memory): −127 dBu → 3.96 dB
  "final/q-final-05": noiseFigureDb({ einDbu: -127, ...EIN_SOURCE }),
  // headroom = clip − level (common practice): −40 + 50 = +10 dBu against +24 dBu → 14 dB
  "final/q-final-06": headroomDb({ levelDbu: -40 + 50, clipDbu: 24 }),
  // t = d/c at 20 °C: 9 m → 26.22 ms
  "final/q-final-21": delayMs({ distanceM: 9, speedOfSoundMs: C_20 }),
};

describeNumericKeys(`${COURSE_SLUG} question banks`, loadCourseBanks(COURSE_SLUG), NUMERIC_KEYS);

describe(`${COURSE_SLUG} question banks: computed keys of other kinds match lib/acoustics`, () => {
  it("the ordering of levels runs from the lowest dBu to the highest", () => {
    const levels: Record<string, number> = {
      // Johnson–Nyquist, 150 Ω over 20 kHz at 290 K → −130.96 dBu
      thermal: thermalNoiseDbu(EIN_SOURCE),
      // the item's stated EIN
      ein: -128,
      // ISO 1683 / ITU-R V.574-5: 2 mV/Pa at 94 dB SPL → −51.74 dBu
      voice: micOutputDbu({ mvPerPa: 2, splDb: 94 }),
      // professional line level, +4 dBu (common practice)
      line: 4,
      // EBU R68 and SMPTE RP 155 (with +4 dBu) full scale
      ebu: fullScaleDbu({ alignment: "ebu-r68" }),
      smpte: fullScaleDbu({ alignment: "smpte-rp155" }),
    };
    const order = question("gain-structure", "q-gain-structure-13", "ordering").correctOrder;
    expect(new Set(order)).toEqual(new Set(Object.keys(levels)));
    for (let index = 1; index < order.length; index++) expect(levels[order[index]]).toBeGreaterThan(levels[order[index - 1]]);
  });

  it("the alignment matching pairs agree with EBU R68 and SMPTE RP 155", () => {
    const match = question("final", "q-final-12", "matching");
    const rightValue: Record<string, number> = { m18: -18, m20: -20, p18: 18, p24: 24, m14: -14, p4: 4 };
    const computed: Record<string, number> = {
      ebu0: dbuToDbfs({ dbu: 0, alignment: "ebu-r68" }),
      smpte4: dbuToDbfs({ dbu: 4, alignment: "smpte-rp155" }),
      ebufs: fullScaleDbu({ alignment: "ebu-r68" }),
      smptefs: fullScaleDbu({ alignment: "smpte-rp155" }),
    };
    for (const [left, right] of Object.entries(match.correctPairs)) expect(rightValue[right], left).toBe(computed[left]);
    // the −14 dBFS distractor is +4 dBu under EBU R68, as the explanation says
    expect(dbuToDbfs({ dbu: 4, alignment: "ebu-r68" })).toBe(rightValue.m14);
  });

  it("the line-level receiver clips at minimum gain without the pad (EBU R68 full scale +18 dBu)", () => {
    expect(question("gain-structure", "q-gain-structure-15", "hotspot").correctRegionIds).toEqual(["stage-box"]);
    // the item's +12 dBu peaks through the lesson's 10 dB minimum gain, with and without a 20 dB pad
    expect(headroomDb({ levelDbu: 12 + 10, clipDbu: fullScaleDbu({ alignment: "ebu-r68" }) })).toBeLessThan(0);
    expect(headroomDb({ levelDbu: 12 - 20 + 10, clipDbu: fullScaleDbu({ alignment: "ebu-r68" }) })).toBeGreaterThan(0);
  });

  it("the thermal-noise explanation: 200 Ω is about 1.2 dB above 150 Ω (10·log10 of the ratio)", () => {
    expect(thermalNoiseDbu({ ...EIN_SOURCE, resistanceOhms: 200 }) - thermalNoiseDbu(EIN_SOURCE)).toBeCloseTo(1.2, 1);
  });
});

describe(`${COURSE_SLUG} question banks: hotspot keys agree with the scenario data`, () => {
  it("the wireless receiver sits by the stage box", () => {
    expect(inputByChannel(17)?.position).toBe("stage-box");
  });

  it("the active DI with its ground lift is at the bass rig", () => {
    expect(question("monitors-and-soundcheck", "q-monitors-and-soundcheck-07", "hotspot").correctRegionIds).toEqual(["bass-rig"]);
    expect(inputByChannel(9)?.di?.type).toBe("active");
    expect(inputByChannel(9)?.position).toBe("bass-rig");
    expect(stagePosition("bass-rig")).toBeDefined();
  });

  it("the input list inverts the snare bottom's polarity", () => {
    expect(question("final", "q-final-14", "hotspot").correctRegionIds).toEqual(["snare-bottom"]);
    expect(inputByChannel(3)?.notes).toMatch(/polarity inverted/);
  });

  it("every line gathers at the stage box", () => {
    expect(question("through-the-console", "q-through-the-console-16", "hotspot").correctRegionIds).toEqual(["stage-box"]);
  });
});
