/**
 * Question banks of the course safe-stage-practice (content/banks/safe-stage-practice/*.json):
 * every numeric key, the numbers inside choice, matching and ordering questions, and the
 * generated keys at their range ends, recomputed with lib/acoustics. The checks all banks share
 * are in banks-common.test.ts.
 *
 * Sources for the computed keys:
 * - NIOSH, Criteria for a Recommended Standard: Occupational Noise Exposure, Revised Criteria
 *   1998, DHHS (NIOSH) Publ. No. 98-126: 85 dBA for 8 h, 3 dB exchange, TWA = 10·log10(D/100) + 85.
 * - 29 CFR 1910.95, Table G-16 / G-16a and App. A: 90 dBA for 8 h, 5 dB exchange,
 *   TWA = 16.61·log10(D/100) + 90; 85 dBA action level (1910.95(c)).
 * - IEC 61938:2018, 48-volt variant: 48 ± 4 V, 6.81 kΩ per leg, up to 10 mA.
 */
import { describe, expect, it } from "vitest";
import { acousticsGenerators, computeGeneratedKey, convertUnit, gradeAnswer, type QuestionKind, type QuestionOfKind, type UnitId } from "@/lib/assessment";
import {
  inverseSquareChangeDb,
  noiseDose,
  PHANTOM_SUPPLIES,
  permissibleExposureHours,
  phantomAtMic,
  phantomFaultCurrentMa,
} from "@/lib/acoustics";
import { loadCourseBanks } from "./course-banks";

const { ofKind } = loadCourseBanks("safe-stage-practice");
const MINUTES_PER_HOUR = 60;

function findQuestion<K extends QuestionKind>(questionId: string, kind: K): QuestionOfKind<K> {
  const found = ofKind(kind).find((entry) => entry.question.id === questionId);
  if (!found) throw new Error(`no ${kind} question ${questionId}`);
  return found.question;
}

const nioshHours = (levelDba: number) => permissibleExposureHours({ levelDba, standard: "niosh" });
const oshaHours = (levelDba: number) => permissibleExposureHours({ levelDba, standard: "osha" });

// Show-day segments of lesson les-ssp-show-day-dose (levels in dBA at the ear, times in hours).
const PLAN_A_SEGMENTS = [
  { levelDba: 91, hours: 0.5 },
  { levelDba: 94, hours: 0.75 },
  { levelDba: 94, hours: 0.75 },
  { levelDba: 97, hours: 1.25 },
];
const PLAN_B_SEGMENTS = [
  { levelDba: 85, hours: 0.5 },
  { levelDba: 88, hours: 0.75 },
  { levelDba: 82, hours: 0.75 }, // 94 dBA less an assumed 12 dB of earplug attenuation
  { levelDba: 85, hours: 1.25 }, // 97 dBA less an assumed 12 dB
];
const TWO_HOURS_94_SIX_HOURS_85 = [
  { levelDba: 94, hours: 2 },
  { levelDba: 85, hours: 6 },
];
const P48 = PHANTOM_SUPPLIES.P48;

/**
 * Every numeric key in the banks, recomputed from lib/acoustics (or stated as a fact of the
 * trade), in the key's unit. A numeric question missing from this table fails the suite.
 */
const NUMERIC_KEYS: Readonly<Record<string, { value: number; unit: UnitId }>> = {
  // NIOSH 98-126: 97 dBA → 30 min
  "q-hearing-12": { value: nioshHours(97) * MINUTES_PER_HOUR, unit: "min" },
  // [derived from NIOSH 98-126]: 2 h @ 94 + 6 h @ 85 → 275 %, TWA 89.39 dBA
  "q-hearing-13": { value: noiseDose({ segments: TWO_HOURS_94_SIX_HOURS_85, standard: "niosh" }).twaDba, unit: "dB" },
  // 29 CFR 1910.95 App. A formula T = 8/2^((L − 90)/5): 94 dBA → 4.595 h (Table G-16a prints 4.6)
  "q-hearing-14": { value: oshaHours(94), unit: "h" },
  // NIOSH 98-126 dose and TWA formulas; lesson les-ssp-show-day-dose Plan A: 425 %, 91.3 dBA
  "q-hearing-15": { value: noiseDose({ segments: PLAN_A_SEGMENTS, standard: "niosh" }).twaDba, unit: "dB" },
  // IEC 61938: P48 is 48 ± 4 V → lowest 44 V
  "q-power-and-signal-11": { value: P48.nominalV - P48.toleranceV, unit: "V" },
  // IEC 61938: 6.81 kΩ per leg
  "q-power-and-signal-12": { value: P48.feedResistorPerLegOhms, unit: "ohm" },
  // IEC 61938 feed network, V_mic = V − I·R/2: 30.98 V at 5 mA from 48 V
  "q-power-and-signal-13": { value: phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 }).voltsAtMic, unit: "V" },
  // common practice: arithmetic on the prompt's lengths, 4 + 16 + 3 m of route plus a 1 m service loop at each end
  "q-rigging-and-cables-11": { value: 4 + 16 + 3 + 2 * 1, unit: "m" },
  // NIOSH 98-126 dose and TWA formulas; lesson les-ssp-show-day-dose Plan B: 45.3 %, 81.6 dBA
  "q-show-day-10": { value: noiseDose({ segments: PLAN_B_SEGMENTS, standard: "niosh" }).twaDba, unit: "dB" },
  // NIOSH 98-126: 88 dBA → 4 h
  "q-show-day-11": { value: nioshHours(88), unit: "h" },
  // NIOSH 98-126: 94 − 12 = 82 dBA at the ear → 16 h (one exchange step below 85 dBA)
  "q-show-day-12": { value: nioshHours(94 - 12), unit: "h" },
  // NIOSH 98-126: 91 dBA → 2 h
  "q-final-12": { value: nioshHours(91), unit: "h" },
  // IEC 61938: P48 is 48 ± 4 V → highest 52 V
  "q-final-13": { value: P48.nominalV + P48.toleranceV, unit: "V" },
  // 29 CFR 1910.95 App. A dose and TWA [derived]: 2/4.595 + 6/16 = 81.03 %, TWA 88.48 dBA
  "q-final-14": { value: noiseDose({ segments: TWO_HOURS_94_SIX_HOURS_85, standard: "osha" }).twaDba, unit: "dB" },
  // IEC 61938 feed network: 13.95 V at 10 mA from 48 V
  "q-final-15": { value: phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 10 }).voltsAtMic, unit: "V" },
};

describe("hotspots", () => {
  it("use the stage plan at least once", () => {
    expect(ofKind("hotspot").some(({ question }) => question.diagram === "stage-plan")).toBe(true);
  });
});

describe("generated questions", () => {
  const generated = ofKind("generated");

  it("use only the noise-exposure, inverse-square and phantom-power generators", () => {
    const allowed = ["noisePermissibleTime", "noisePermissibleTimeOsha", "inverseSquareChange", "phantomVoltsAtMic", "phantomOneLegFault"];
    for (const { question } of generated) expect(allowed).toContain(question.generator);
  });

  it("the registry computes what lib/acoustics computes for the range ends", () => {
    for (const { question } of generated) {
      const ends = [
        Object.fromEntries(Object.entries(question.ranges).map(([name, range]) => [name, range.min])),
        Object.fromEntries(Object.entries(question.ranges).map(([name, range]) => [name, range.max])),
      ];
      for (const inputs of ends) {
        const key = computeGeneratedKey(question, inputs, acousticsGenerators).value;
        if (question.generator === "noisePermissibleTime") expect(key).toBe(nioshHours(inputs.levelDba)); // NIOSH 98-126
        if (question.generator === "noisePermissibleTimeOsha") expect(key).toBe(oshaHours(inputs.levelDba)); // 29 CFR 1910.95
        // IEC 61938 P48 feed network: V_mic = V − I·R/2, one leg grounded I = V/R
        if (question.generator === "phantomVoltsAtMic") {
          expect(key).toBe(phantomAtMic({ supply: "P48", supplyV: inputs.supplyV, currentMa: inputs.currentMa }).voltsAtMic);
        }
        if (question.generator === "phantomOneLegFault") {
          expect(key).toBe(phantomFaultCurrentMa({ supply: "P48", supplyV: inputs.supplyV, fault: "one-leg" }));
        }
        if (question.generator === "inverseSquareChange") {
          // inverse-square law: ΔL = −20·log10(r2/r1); the prompt asks for a drop, so keys are negative
          expect(key).toBe(inverseSquareChangeDb({ fromM: inputs.fromM, toM: inputs.toM }));
          expect(key).toBeLessThan(0);
        }
      }
    }
  });

  it("the smallest NIOSH key is still shown without losing more than the tolerance", () => {
    // The registry shows hours to 2 decimals; keep keys ≥ 0.25 h so the shown value is within 3 %.
    for (const { question } of generated) {
      if (question.generator !== "noisePermissibleTime") continue;
      expect(nioshHours(question.ranges.levelDba.max)).toBeGreaterThanOrEqual(0.25);
    }
  });
});

describe("numeric keys equal the library values", () => {
  const numeric = ofKind("numeric");

  it("every numeric question has a recomputed key", () => {
    expect(numeric.map(({ question }) => question.id).sort()).toEqual(Object.keys(NUMERIC_KEYS).sort());
  });

  it.each(numeric.map(({ question }) => [question.id, question] as const))("%s", (id, question) => {
    const expected = NUMERIC_KEYS[id];
    expect(question.unit).toBe(expected.unit);
    expect(question.answer).toBeCloseTo(expected.value, 2);
    // The unrounded library value grades as correct too.
    expect(gradeAnswer(question, { kind: "numeric", value: expected.value, unit: expected.unit }).score).toBe(1);
  });

  it("spot values agree with the printed tables and worked examples", () => {
    expect(NUMERIC_KEYS["q-hearing-12"].value).toBeCloseTo(30, 6); // NIOSH 98-126 table: 97 dBA → 30 min
    expect(NUMERIC_KEYS["q-hearing-13"].value).toBeCloseTo(89.39, 2); // NIOSH 98-126 TWA formula: 89.39 dBA
    expect(NUMERIC_KEYS["q-hearing-14"].value).toBeCloseTo(4.6, 1); // 29 CFR 1910.95 Table G-16a: 94 dBA → 4.6 h
    expect(noiseDose({ segments: PLAN_A_SEGMENTS, standard: "niosh" }).dosePercent).toBeCloseTo(425, 6); // lesson les-ssp-show-day-dose
    expect(NUMERIC_KEYS["q-show-day-10"].value).toBeCloseTo(81.6, 1); // lesson les-ssp-show-day-dose: TWA 81.6 dBA
    expect(noiseDose({ segments: PLAN_B_SEGMENTS, standard: "niosh" }).dosePercent).toBeCloseTo(45.3, 1); // lesson: about 45.3 %
    expect(NUMERIC_KEYS["q-power-and-signal-13"].value).toBeCloseTo(30.98, 2); // IEC 61938:2018: 30.98 V at 5 mA
    expect(NUMERIC_KEYS["q-final-15"].value).toBeCloseTo(13.95, 2); // IEC 61938:2018: 13.95 V at 10 mA
    expect(NUMERIC_KEYS["q-final-14"].value).toBeCloseTo(88.48, 2); // 29 CFR 1910.95 App. A TWA [derived]: 88.48 dBA
    expect(NUMERIC_KEYS["q-show-day-12"].value).toBe(16); // NIOSH 98-126 formula: 82 dBA → 16 h
  });

  it("answers in another unit of the same quantity are accepted", () => {
    const allowed = findQuestion("q-hearing-12", "numeric"); // 30 min
    expect(gradeAnswer(allowed, { kind: "numeric", value: 0.5, unit: "h" }).score).toBe(1);
    const resistor = findQuestion("q-power-and-signal-12", "numeric"); // 6810 Ω
    expect(gradeAnswer(resistor, { kind: "numeric", value: 6.81, unit: "kohm" }).score).toBe(1);
    expect(gradeAnswer(resistor, { kind: "numeric", value: 6.8, unit: "kohm" }).score).toBe(1); // 6.8 kΩ in practice, common practice
    const osha94 = findQuestion("q-hearing-14", "numeric"); // 4.595 h
    expect(gradeAnswer(osha94, { kind: "numeric", value: convertUnit(4.6, "h", "min"), unit: "min" }).score).toBe(1); // Table G-16a's 4.6 h
    const multicore = findQuestion("q-rigging-and-cables-11", "numeric"); // 25 m
    expect(gradeAnswer(multicore, { kind: "numeric", value: 25 / 0.3048, unit: "ft" }).score).toBe(1);
  });

  it("the lesson's rounded values are accepted and a neighbouring step is not", () => {
    expect(gradeAnswer(findQuestion("q-hearing-13", "numeric"), { kind: "numeric", value: 89.4 }).score).toBe(1); // lesson: 89.4 dBA
    expect(gradeAnswer(findQuestion("q-hearing-15", "numeric"), { kind: "numeric", value: 91.3 }).score).toBe(1); // lesson: 91.3 dBA
    expect(gradeAnswer(findQuestion("q-show-day-10", "numeric"), { kind: "numeric", value: 81.6 }).score).toBe(1); // lesson: 81.6 dBA
    expect(gradeAnswer(findQuestion("q-hearing-12", "numeric"), { kind: "numeric", value: 15 }).score).toBe(0); // 100 dBA's answer
    expect(gradeAnswer(findQuestion("q-show-day-11", "numeric"), { kind: "numeric", value: 8 }).score).toBe(0); // 85 dBA's answer
  });
});

describe("numbers inside choice, matching and ordering questions", () => {
  it("q-hearing-22 pairs each level with its NIOSH time", () => {
    const question = findQuestion("q-hearing-22", "matching");
    const hoursByRightId: Record<string, number> = { t4h: 4, t2h: 2, t1h: 1, t15m: 0.25, t45m: 0.75 };
    const levelByLeftId: Record<string, number> = { l88: 88, l91: 91, l94: 94, l100: 100 };
    for (const [leftId, rightId] of Object.entries(question.correctPairs)) {
      expect(nioshHours(levelByLeftId[leftId])).toBeCloseTo(hoursByRightId[rightId], 9); // NIOSH 98-126 table
    }
    // The 45-minute distractor matches no level in the list.
    for (const level of Object.values(levelByLeftId)) expect(nioshHours(level)).not.toBeCloseTo(0.75, 3);
  });

  it("q-final-19 is in order of allowed time, longest first, with no ties", () => {
    const question = findQuestion("q-final-19", "ordering");
    const hoursById: Record<string, number> = {
      "osha-85": oshaHours(85), // 29 CFR 1910.95 Table G-16a: 16 h
      "niosh-88": nioshHours(88), // NIOSH 98-126: 4 h
      "osha-100": oshaHours(100), // Table G-16: 2 h
      "niosh-97": nioshHours(97), // NIOSH 98-126: 30 min
      "niosh-100": nioshHours(100), // NIOSH 98-126: 15 min
    };
    const hours = question.correctOrder.map((id) => hoursById[id]);
    for (let index = 1; index < hours.length; index++) expect(hours[index]).toBeLessThan(hours[index - 1]);
  });

  it("q-final-01 (100 dBA under NIOSH) keys 15 min and its 2 h distractor is the OSHA figure", () => {
    const question = findQuestion("q-final-01", "single");
    expect(question.correctOptionId).toBe("15m");
    expect(nioshHours(100) * MINUTES_PER_HOUR).toBeCloseTo(15, 9); // NIOSH 98-126
    expect(oshaHours(100)).toBe(2); // 29 CFR 1910.95 Table G-16
  });

  it("q-hearing-06: 6 dB quieter is four times the NIOSH time", () => {
    expect(findQuestion("q-hearing-06", "single").correctOptionId).toBe("x4");
    expect(nioshHours(88) / nioshHours(94)).toBeCloseTo(4, 9); // NIOSH 98-126: 3 dB exchange rate
  });

  it("q-final-03: the OSHA action level is 85 dBA", () => {
    expect(findQuestion("q-final-03", "single").correctOptionId).toBe("85"); // 29 CFR 1910.95(c) action level (paragraph letter from memory); lesson les-ssp-exposure-limits
  });
});
