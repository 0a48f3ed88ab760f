import { describe, expect, it } from "vitest";
import { noiseDose, permissibleExposureHours, PHANTOM_SUPPLIES, phantomFaultCurrentMa } from "@/lib/acoustics";

// Every computed number quoted in the safe-stage-practice course, checked against lib/acoustics.
// Sources: NIOSH, Criteria for a Recommended Standard: Occupational Noise Exposure, Revised
// Criteria 1998, DHHS (NIOSH) Publ. No. 98-126 (85 dBA, 3 dB exchange, TWA = 10·log10(D/100) + 85);
// 29 CFR 1910.95, Table G-16 and App. A (90 dBA, 5 dB exchange, TWA = 16.61·log10(D/100) + 90).

const MINUTES_PER_HOUR = 60;

function nioshHours(levelDba: number): number {
  return permissibleExposureHours({ levelDba, standard: "niosh" });
}

function oshaHours(levelDba: number): number {
  return permissibleExposureHours({ levelDba, standard: "osha" });
}

/** Dose share of a single segment, in percent. */
function segmentDosePercent(levelDba: number, hours: number, standard: "niosh" | "osha"): number {
  return noiseDose({ segments: [{ levelDba, hours }], standard }).dosePercent;
}

// Plan A and Plan B of lesson les-ssp-show-day-dose (levels in dBA at the ear, times in hours).
const PLAN_A_SEGMENTS = [
  { levelDba: 91, hours: 0.5 }, // line check, 30 min
  { levelDba: 94, hours: 0.75 }, // soundcheck, 45 min
  { levelDba: 94, hours: 0.75 }, // support act, 45 min
  { levelDba: 97, hours: 1.25 }, // headline set, 75 min
];
const PLAN_B_SEGMENTS = [
  { levelDba: 85, hours: 0.5 }, // quiet line check
  { levelDba: 88, hours: 0.75 }, // quieter soundcheck
  { levelDba: 82, hours: 0.75 }, // support act, 94 dBA less an assumed 12 dB of earplug attenuation
  { levelDba: 85, hours: 1.25 }, // headline set, 97 dBA less an assumed 12 dB
];

describe("lesson les-ssp-exposure-limits", () => {
  it("NIOSH REL column of the table", () => {
    // NIOSH 98-126 table (check values in REFERENCES.md §10)
    expect(nioshHours(85)).toBeCloseTo(8, 0); // lesson les-ssp-exposure-limits: "85 dBA | 8 h"
    expect(nioshHours(88)).toBeCloseTo(4, 0); // lesson les-ssp-exposure-limits: "88 dBA | 4 h"
    expect(nioshHours(91)).toBeCloseTo(2, 0); // lesson les-ssp-exposure-limits: "91 dBA | 2 h"
    expect(nioshHours(94)).toBeCloseTo(1, 0); // lesson les-ssp-exposure-limits: "94 dBA | 1 h"
    expect(nioshHours(97) * MINUTES_PER_HOUR).toBeCloseTo(30, 0); // lesson les-ssp-exposure-limits: "97 dBA | 30 min"
    expect(nioshHours(100) * MINUTES_PER_HOUR).toBeCloseTo(15, 0); // lesson les-ssp-exposure-limits: "100 dBA | 15 min" and "100 dBA only 15 min"
    expect(nioshHours(103) * MINUTES_PER_HOUR).toBeCloseTo(7.5, 1); // lesson les-ssp-exposure-limits: "103 dBA | 7.5 min"
  });

  it("OSHA PEL column of the table", () => {
    // 29 CFR 1910.95 Table G-16 / G-16a and its footnote formula (REFERENCES.md §10)
    expect(oshaHours(85)).toBeCloseTo(16, 0); // lesson les-ssp-exposure-limits: "85 dBA | 8 h | 16 h"
    expect(oshaHours(88)).toBeCloseTo(10.6, 1); // lesson les-ssp-exposure-limits: "88 dBA | 4 h | 10.6 h"
    expect(oshaHours(91)).toBeCloseTo(7.0, 1); // lesson les-ssp-exposure-limits: "91 dBA | 2 h | 7.0 h"
    expect(oshaHours(94)).toBeCloseTo(4.6, 1); // lesson les-ssp-exposure-limits: "94 dBA | 1 h | 4.6 h" and "2 ÷ 4.6"
    expect(oshaHours(97)).toBeCloseTo(3.0, 1); // lesson les-ssp-exposure-limits: "97 dBA | 30 min | 3.0 h"
    expect(oshaHours(100)).toBeCloseTo(2, 0); // lesson les-ssp-exposure-limits: "100 dBA | 15 min | 2 h"
    expect(oshaHours(103)).toBeCloseTo(1.3, 1); // lesson les-ssp-exposure-limits: "103 dBA | 7.5 min | 1.3 h"
  });

  it("2 h at 94 dBA plus 6 h at 85 dBA", () => {
    const segments = [
      { levelDba: 94, hours: 2 },
      { levelDba: 85, hours: 6 },
    ];
    // REFERENCES.md §10, derived from the NIOSH 98-126 dose and TWA formulas: 275 %, 89.39 dBA
    const niosh = noiseDose({ segments, standard: "niosh" });
    expect(niosh.dosePercent).toBeCloseTo(275, 0); // lesson les-ssp-exposure-limits: "a dose of 275 %"
    expect(niosh.twaDba).toBeCloseTo(89.4, 1); // lesson les-ssp-exposure-limits: "the NIOSH TWA is 89.4 dBA"
    // derived from 29 CFR 1910.95 App. A: 2/4.595 + 6/16 = 81.03 %, TWA 88.48 dBA
    const osha = noiseDose({ segments, standard: "osha" });
    expect(osha.dosePercent).toBeCloseTo(81, 0); // lesson les-ssp-exposure-limits: "a dose of about 81 %"
    expect(osha.twaDba).toBeCloseTo(88.5, 1); // lesson les-ssp-exposure-limits: "the OSHA TWA is 88.5 dBA"
  });

  it("3 dB doubles the sound energy", () => {
    // common practice: 10^(3/10) = 1.995
    expect(10 ** (3 / 10)).toBeCloseTo(2, 1); // lesson les-ssp-exposure-limits: "Adding 3 dB doubles the sound energy"
  });
});

describe("lesson les-ssp-hearing-protection", () => {
  it("allowed time at 94, 91 and 88 dBA", () => {
    // NIOSH 98-126 table (REFERENCES.md §10)
    expect(nioshHours(94)).toBeCloseTo(1, 0); // lesson les-ssp-hearing-protection: "94 dBA allows 1 hour"
    expect(nioshHours(91)).toBeCloseTo(2, 0); // lesson les-ssp-hearing-protection: "91 dBA allows 2 hours"
    expect(nioshHours(88)).toBeCloseTo(4, 0); // lesson les-ssp-hearing-protection: "88 dBA allows 4 hours"
    expect(nioshHours(91) / nioshHours(94)).toBeCloseTo(2, 0); // lesson les-ssp-hearing-protection: "Take 3 dB off and you double the time"
    expect(nioshHours(88) / nioshHours(94)).toBeCloseTo(4, 0); // lesson les-ssp-hearing-protection: "take 6 dB off and you have four times as long"
  });

  it("a 45-minute soundcheck at 94 and at 88 dBA", () => {
    // derived from the NIOSH 98-126 dose formula: 0.75/1 = 75 %, 0.75/4 = 18.75 %
    expect(segmentDosePercent(94, 0.75, "niosh")).toBeCloseTo(75, 0); // lesson les-ssp-hearing-protection: "uses 75 % of your daily NIOSH dose"
    expect(segmentDosePercent(88, 0.75, "niosh")).toBeCloseTo(19, 0); // lesson les-ssp-hearing-protection: "at 88 dBA uses about 19 %"
  });
});

describe("lesson les-ssp-show-day-dose", () => {
  it("NIOSH allowances used in Plan A", () => {
    // NIOSH 98-126 table (REFERENCES.md §10)
    expect(nioshHours(91)).toBeCloseTo(2, 0); // lesson les-ssp-show-day-dose: "91 dBA allows 2 hours"
    expect(nioshHours(94)).toBeCloseTo(1, 0); // lesson les-ssp-show-day-dose: "94 dBA allows 1 hour"
    expect(nioshHours(97) * MINUTES_PER_HOUR).toBeCloseTo(30, 0); // lesson les-ssp-show-day-dose: "97 dBA allows 30 minutes"
  });

  it("Plan A segment shares and total under NIOSH", () => {
    // derived from the NIOSH 98-126 dose and TWA formulas
    expect(segmentDosePercent(91, 0.5, "niosh")).toBeCloseTo(25, 0); // lesson les-ssp-show-day-dose: "The line check uses 25 %"
    expect(segmentDosePercent(94, 0.75, "niosh")).toBeCloseTo(75, 0); // lesson les-ssp-show-day-dose: "the soundcheck 75 %, the support act another 75 %"
    expect(segmentDosePercent(97, 1.25, "niosh")).toBeCloseTo(250, 0); // lesson les-ssp-show-day-dose: "the headline set 250 %"
    const beforeDoors = noiseDose({ segments: PLAN_A_SEGMENTS.slice(0, 2), standard: "niosh" });
    expect(beforeDoors.dosePercent).toBeCloseTo(100, 0); // lesson les-ssp-show-day-dose: "the line check and soundcheck together come to 100 %"
    const planA = noiseDose({ segments: PLAN_A_SEGMENTS, standard: "niosh" });
    expect(planA.dosePercent).toBeCloseTo(425, 0); // lesson les-ssp-show-day-dose: "The total dose is 425 %"
    expect(planA.dosePercent / 100).toBeGreaterThan(4); // lesson les-ssp-show-day-dose: "more than four times the recommended limit"
    expect(planA.twaDba).toBeCloseTo(91.3, 1); // lesson les-ssp-show-day-dose: "the NIOSH TWA is 91.3 dBA"
    const loudHours = PLAN_A_SEGMENTS.reduce((sum, segment) => sum + segment.hours, 0);
    expect(loudHours).toBeCloseTo(3.25, 2); // lesson les-ssp-show-day-dose: "only 3¼ hours long"
  });

  it("Plan A under OSHA", () => {
    // derived from 29 CFR 1910.95 App. A formulas: 81.06 %, TWA 88.49 dBA
    const planA = noiseDose({ segments: PLAN_A_SEGMENTS, standard: "osha" });
    expect(planA.dosePercent).toBeCloseTo(81, 0); // lesson les-ssp-show-day-dose: "the dose is about 81 %"
    expect(planA.dosePercent).toBeLessThan(100); // lesson les-ssp-show-day-dose: "below the permissible limit"
    expect(planA.twaDba).toBeCloseTo(88.5, 1); // lesson les-ssp-show-day-dose: "an OSHA TWA of 88.5 dBA"
  });

  it("Plan B segment shares and total under NIOSH", () => {
    // derived from the NIOSH 98-126 dose and TWA formulas; the 12 dB plug attenuation is the lesson's stated assumption
    expect(segmentDosePercent(85, 0.5, "niosh")).toBeCloseTo(6.25, 2); // lesson les-ssp-show-day-dose: "6.25 % for the line check"
    expect(segmentDosePercent(88, 0.75, "niosh")).toBeCloseTo(18.75, 2); // lesson les-ssp-show-day-dose: "18.75 % for the soundcheck"
    expect(segmentDosePercent(82, 0.75, "niosh")).toBeCloseTo(4.7, 1); // lesson les-ssp-show-day-dose: "4.7 % for the support act"
    expect(segmentDosePercent(85, 1.25, "niosh")).toBeCloseTo(15.6, 1); // lesson les-ssp-show-day-dose: "15.6 % for the headline set"
    const planB = noiseDose({ segments: PLAN_B_SEGMENTS, standard: "niosh" });
    expect(planB.dosePercent).toBeCloseTo(45.3, 1); // lesson les-ssp-show-day-dose: "a total NIOSH dose of about 45.3 %"
    expect(planB.twaDba).toBeCloseTo(81.6, 1); // lesson les-ssp-show-day-dose: "with a TWA of 81.6 dBA"
  });
});

describe("lesson les-ssp-phantom-cautions", () => {
  it("the 48-volt variant's supply, feed resistors and current", () => {
    // IEC 61938:2018, 48 V variant: 48 ± 4 V, 6.81 kΩ per leg, 10 mA maximum (REFERENCES.md §7)
    const p48 = PHANTOM_SUPPLIES.P48;
    expect(p48.nominalV).toBeCloseTo(48, 0); // lesson les-ssp-phantom-cautions: "a supply of 48 V"
    expect(p48.toleranceV).toBeCloseTo(4, 0); // lesson les-ssp-phantom-cautions: "a tolerance of ±4 V"
    expect(p48.nominalV - p48.toleranceV).toBeCloseTo(44, 0); // lesson les-ssp-phantom-cautions: "anywhere from 44 V to 52 V"
    expect(p48.nominalV + p48.toleranceV).toBeCloseTo(52, 0); // lesson les-ssp-phantom-cautions: "anywhere from 44 V to 52 V"
    expect(p48.feedResistorPerLegOhms / 1000).toBeCloseTo(6.81, 2); // lesson les-ssp-phantom-cautions: "fed through 6.81 kΩ resistors"
    expect(p48.maxCurrentMa).toBeCloseTo(10, 0); // lesson les-ssp-phantom-cautions: "microphones that draw up to 10 mA"
  });

  it("current with one leg tied to ground", () => {
    // IEC 61938 feed network, one leg to ground: I = V/R = 48 V / 6.81 kΩ = 7.05 mA (REFERENCES.md §7, derived)
    expect(phantomFaultCurrentMa({ supply: "P48", fault: "one-leg" })).toBeCloseTo(7, 0); // lesson les-ssp-phantom-cautions: "About 7 mA of DC can then flow"
  });
});

describe("lesson les-ssp-lantern-room-load-in", () => {
  it("the dose plan carried into the show day", () => {
    // derived from the NIOSH 98-126 dose formula (same Plan B as les-ssp-show-day-dose)
    const planB = noiseDose({ segments: PLAN_B_SEGMENTS, standard: "niosh" });
    expect(planB.dosePercent).toBeCloseTo(45.3, 1); // lesson les-ssp-lantern-room-load-in: "about 45.3 % of the NIOSH daily dose"
  });
});
