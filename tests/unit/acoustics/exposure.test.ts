/**
 * Noise exposure: NIOSH REL (NIOSH 98-126) and OSHA PEL (29 CFR 1910.95).
 * Sources (full citations in tests/sources.md): NIOSH 98-126 and its table as reproduced
 * by Engineering ToolBox; 29 CFR 1910.95 Table G-16 and App. A (Table G-16a, formulas).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { EXPOSURE_CRITERIA, noiseDose, permissibleExposureHours } from "@/lib/acoustics";
import { expectNear, expectPrinted } from "./near";

const niosh = (levelDba: number) => permissibleExposureHours({ levelDba, standard: "niosh" });
const osha = (levelDba: number) => permissibleExposureHours({ levelDba, standard: "osha" });

describe("NIOSH REL: T = 8/2^((L − 85)/3) h", () => {
  it("matches the NIOSH 98-126 table", () => {
    // NIOSH, Criteria for a Recommended Standard: Occupational Noise Exposure (1998), DHHS (NIOSH) 98-126;
    // table as reproduced by Engineering ToolBox.
    expect(niosh(85)).toBe(8);
    expect(niosh(88)).toBe(4);
    expect(niosh(91)).toBe(2);
    expect(niosh(94)).toBe(1);
    expectNear(niosh(97) * 60, 30, 1e-9); // 30 min
    expectNear(niosh(100) * 60, 15, 1e-9); // 15 min
    expectNear(niosh(103) * 60, 7.5, 1e-9); // 7.5 min
    expectNear(niosh(106) * 60, 3.75, 1e-9); // 3.75 min
    expectNear(niosh(109) * 3600, 112.5, 1e-6); // 112.5 s (table: 1 min 53 s)
    expectPrinted(niosh(109) * 3600, "113"); // 1 min 53 s, whole seconds; 112.5 rounds half-up to 113 (|Δ| = 0.5)
    expectNear(niosh(112) * 3600, 56.25, 1e-6); // 56.25 s
    expectPrinted(niosh(115) * 3600, "28.1"); // 28.1 s
    expectPrinted(niosh(120) * 3600, "8.86"); // 8.86 s [derived]
    expectPrinted(niosh(120) * 3600, "9"); // table: 9 s
  });

  it("ceiling 140 dBA", () => {
    expect(EXPOSURE_CRITERIA.niosh.ceilingDba).toBe(140); // AIHA NIOSH-TWA calculator page
    expect(permissibleExposureHours({ levelDba: 141, standard: "niosh", applyCeiling: true })).toBe(0);
    expect(permissibleExposureHours({ levelDba: 141, standard: "niosh" })).toBeGreaterThan(0);
  });
});

describe("OSHA PEL: T = 8/2^((L − 90)/5) h", () => {
  it("matches 29 CFR 1910.95 Table G-16 / G-16a", () => {
    expect(osha(90)).toBe(8); // 29 CFR 1910.95 Table G-16
    expectPrinted(osha(92), "6.06"); // formula; table G-16 prints 6
    expectPrinted(osha(92), "6.1"); // Table G-16a prints 6.1
    expect(osha(95)).toBe(4); // Table G-16
    expectPrinted(osha(97), "3.03"); // formula; table prints 3.0
    expectPrinted(osha(97), "3.0"); // Table G-16a
    expect(osha(100)).toBe(2); // Table G-16
    expect(osha(105)).toBe(1); // Table G-16
    expect(osha(110)).toBe(0.5); // Table G-16
    expect(osha(115)).toBe(0.25); // Table G-16
    expect(osha(85)).toBe(16); // Table G-16a
    expect(osha(80)).toBe(32); // Table G-16a
  });

  it("83 dBA: osha.gov prints 21.2 h, the formula gives 21.11 h (within 1 %)", () => {
    expectPrinted(osha(83), "21.11"); // 29 CFR 1910.95 App. A formula [derived]
    expect(Math.abs(osha(83) / 21.2 - 1)).toBeLessThan(0.01); // osha.gov Table G-16a, 1 % relative
  });

  it("115 dBA is the maximum for continuous noise", () => {
    expect(EXPOSURE_CRITERIA.osha.ceilingDba).toBe(115); // 29 CFR 1910.95 Table G-16 footnote (from memory)
    expect(permissibleExposureHours({ levelDba: 116, standard: "osha", applyCeiling: true })).toBe(0);
    expect(permissibleExposureHours({ levelDba: 115, standard: "osha", applyCeiling: true })).toBe(0.25);
  });
});

describe("noiseDose", () => {
  it("NIOSH: 5 min at 100 dBA + 30 min at 94 dBA → 83.3 %, 84.2 dBA", () => {
    const result = noiseDose({
      segments: [
        { levelDba: 100, hours: 5 / 60 },
        { levelDba: 94, hours: 30 / 60 },
      ],
      standard: "niosh",
    });
    expectPrinted(result.dosePercent, "83.3"); // Engineering ToolBox example [pub]
    expectPrinted(result.twaDba, "84.2"); // Engineering ToolBox; TWA = 10·log10(D/100) + 85 (NIOSH 98-126)
  });

  it("NIOSH: 2 h at 94 + 6 h at 85 → 275 %, 89.39 dBA", () => {
    const result = noiseDose({
      segments: [
        { levelDba: 94, hours: 2 },
        { levelDba: 85, hours: 6 },
      ],
      standard: "niosh",
    });
    expectNear(result.dosePercent, 275, 1e-9); // NIOSH 98-126 dose formula [derived]
    expectPrinted(result.twaDba, "89.39"); // [derived]
  });

  it("OSHA: 8 h at a constant 92 dBA → 131.95 %, TWA 92.0 dBA", () => {
    const result = noiseDose({ segments: [{ levelDba: 92, hours: 8 }], standard: "osha" });
    expectPrinted(result.dosePercent, "131.95"); // 29 CFR 1910.95 App. A
    expectPrinted(result.twaDba, "92.0"); // TWA = 16.61·log10(D/100) + 90
    // With the table's rounded T = 6.1 h the dose is 131 % (App. A), which the formula does not round to.
    expectPrinted((100 * 8) / 6.1, "131");
  });

  it("no segments → 0 % and TWA −Infinity; threshold leaves quiet segments out", () => {
    expect(noiseDose({ segments: [], standard: "osha" })).toEqual({ dosePercent: 0, twaDba: -Infinity });
    const withThreshold = noiseDose({
      segments: [
        { levelDba: 75, hours: 4 },
        { levelDba: 95, hours: 4 },
      ],
      standard: "osha",
      thresholdDba: 80,
    });
    expect(withThreshold.dosePercent).toBe(100); // 4 h / 4 h at 95 dBA
    expect(withThreshold.twaDba).toBeCloseTo(90, 12);
  });

  it("property: OSHA TWA of a constant level over 8 h is that level", () => {
    fc.assert(
      fc.property(fc.double({ min: 70, max: 130, noNaN: true }), (levelDba) => {
        expect(noiseDose({ segments: [{ levelDba, hours: 8 }], standard: "osha" }).twaDba).toBeCloseTo(levelDba, 9);
      }),
    );
  });

  it("property: a dose of 100 % is exactly the criterion level", () => {
    fc.assert(
      fc.property(fc.constantFrom("niosh" as const, "osha" as const), fc.double({ min: 70, max: 130, noNaN: true }), (standard, levelDba) => {
        const hours = permissibleExposureHours({ levelDba, standard });
        const result = noiseDose({ segments: [{ levelDba, hours }], standard });
        expect(result.dosePercent).toBeCloseTo(100, 9);
        expect(result.twaDba).toBeCloseTo(EXPOSURE_CRITERIA[standard].criterionDba, 9);
      }),
    );
  });

  it("property: splitting a segment in two leaves the dose unchanged; doubling time doubles it", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("niosh" as const, "osha" as const),
        fc.double({ min: 70, max: 120, noNaN: true }),
        fc.double({ min: 0.01, max: 12, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (standard, levelDba, hours, split) => {
          const whole = noiseDose({ segments: [{ levelDba, hours }], standard }).dosePercent;
          const parts = noiseDose({
            segments: [
              { levelDba, hours: hours * split },
              { levelDba, hours: hours * (1 - split) },
            ],
            standard,
          }).dosePercent;
          expect(parts / whole).toBeCloseTo(1, 12);
          expect(noiseDose({ segments: [{ levelDba, hours: 2 * hours }], standard }).dosePercent / whole).toBeCloseTo(2, 12);
        },
      ),
    );
  });

  it("throws for negative hours, a non-finite level or an unknown standard", () => {
    expect(() => noiseDose({ segments: [{ levelDba: 90, hours: -1 }], standard: "osha" })).toThrow(/segments\[0\]\.hours/);
    expect(() => noiseDose({ segments: [{ levelDba: Number.NaN, hours: 1 }], standard: "osha" })).toThrow(RangeError);
    expect(() => permissibleExposureHours({ levelDba: 90, standard: "msha" as never })).toThrow(RangeError);
  });
});
