import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { questionBankSchema, questionSchema, type QuestionBankInput, type QuestionInput } from "@/lib/assessment";
import { anyQuestionInput } from "./arbitraries";
import { allQuestions } from "./fixtures";

const base = { id: "q-1", topic: "phantom power", prompt: "Which?", explanation: "Because." };

const failsWith = (input: unknown, message: RegExp) => {
  const result = questionSchema.safeParse(input);
  expect(result.success).toBe(false);
  if (!result.success) expect(result.error.issues.map((issue) => issue.message).join("; ")).toMatch(message);
};

describe("question schema", () => {
  it("parses every generated valid question and defaults points to 1", () => {
    fc.assert(fc.property(anyQuestionInput, (input) => questionSchema.safeParse(input).success));
    const parsed = questionSchema.parse({
      ...base,
      kind: "single",
      options: [{ id: "a", text: "A" }, { id: "b", text: "B" }],
      correctOptionId: "a",
    } satisfies QuestionInput);
    expect(parsed.points).toBe(1);
  });

  it("rejects a key that names no option, and duplicate ids", () => {
    const options = [{ id: "a", text: "A" }, { id: "b", text: "B" }];
    failsWith({ ...base, kind: "single", options, correctOptionId: "c" }, /unknown id "c"/);
    failsWith({ ...base, kind: "multiple", options: [...options, { id: "a", text: "again" }], correctOptionIds: ["a"] }, /duplicate id "a"/);
    failsWith({ ...base, kind: "multiple", options, correctOptionIds: [] }, /./);
  });

  it("rejects unknown keys such as a misspelt answer key", () => {
    failsWith({ ...base, kind: "single", options: [{ id: "a", text: "A" }, { id: "b", text: "B" }], corectOptionId: "a" }, /./);
  });

  it("checks numeric units and tolerances", () => {
    const numeric = { ...base, kind: "numeric", answer: 3, unit: "ms", tolerance: { type: "relative", percent: 2 } };
    expect(questionSchema.safeParse(numeric).success).toBe(true);
    failsWith({ ...numeric, unit: "parsec" }, /./);
    failsWith({ ...numeric, tolerance: { type: "absolute", amount: -1 } }, /./);
  });

  it("checks a generated question's ranges and placeholders against its generator", () => {
    const generated = {
      ...base,
      kind: "generated",
      prompt: "Distance {distanceM} m at {temperatureC} °C: delay?",
      generator: "delayFromDistance",
      ranges: { distanceM: { min: 1, max: 30, step: 0.5 }, temperatureC: { min: 0, max: 35, step: 1 } },
      tolerance: { type: "absolute", amount: 0.1 },
    };
    expect(questionSchema.safeParse(generated).success).toBe(true);
    failsWith({ ...generated, generator: "anyFormula" }, /./);
    failsWith({ ...generated, ranges: { distanceM: generated.ranges.distanceM } }, /missing range for input "temperatureC"/);
    failsWith({ ...generated, prompt: "Delay over {distanceFt} ft?" }, /unknown placeholder/);
    failsWith({ ...generated, ranges: { ...generated.ranges, distanceM: { min: 5, max: 1, step: 1 } } }, /max must be ≥ min/);
    // IEC 61938 P48 is 48 ± 4 V: a draw outside it is not a P48 supply.
    const phantom = {
      ...base,
      kind: "generated",
      prompt: "P48 at {supplyV} V, {currentMa} mA: volts at the mic?",
      generator: "phantomVoltsAtMic",
      ranges: { supplyV: { min: 44, max: 52, step: 1 }, currentMa: { min: 1, max: 10, step: 1 } },
      tolerance: { type: "absolute", amount: 0.1 },
    };
    expect(questionSchema.safeParse(phantom).success).toBe(true);
    failsWith({ ...phantom, ranges: { ...phantom.ranges, supplyV: { min: 1, max: 10, step: 1 } } }, /range for "supplyV" must lie within 44 to 52/);
    failsWith({ ...phantom, ranges: { ...phantom.ranges, currentMa: { min: 1, max: 15, step: 1 } } }, /range for "currentMa" must lie within 0 to 10/);
  });

  it("checks that an ordering key lists every item once", () => {
    const items = [{ id: "a", text: "A" }, { id: "b", text: "B" }, { id: "c", text: "C" }];
    failsWith({ ...base, kind: "ordering", items, correctOrder: ["a", "b"] }, /every item once/);
    failsWith({ ...base, kind: "ordering", items, correctOrder: ["a", "b", "b"] }, /duplicate/);
  });

  it("checks that every left item has a partner that exists", () => {
    const pair = {
      ...base,
      kind: "matching",
      left: [{ id: "kick", text: "Kick" }, { id: "keys", text: "Keys" }],
      right: [{ id: "dyn", text: "Dynamic" }, { id: "di", text: "DI" }],
    };
    failsWith({ ...pair, correctPairs: { kick: "dyn" } }, /"keys" has no partner/);
    failsWith({ ...pair, correctPairs: { kick: "dyn", keys: "ribbon" } }, /unknown id "ribbon"/);
  });

  it("checks hotspot shapes and keys", () => {
    const regions = [
      { id: "null", label: "Null", shape: { type: "circle", cx: 10, cy: 10, r: 4 } },
      { id: "front", label: "Front", shape: { type: "rect", x: 0, y: 0, w: 20, h: 5 } },
    ];
    const hotspot = { ...base, kind: "hotspot", diagram: "polar-cardioid", regions, correctRegionIds: ["null"] };
    expect(questionSchema.safeParse(hotspot).success).toBe(true);
    failsWith({ ...hotspot, correctRegionIds: ["rear"] }, /unknown id/);
    failsWith({ ...hotspot, regions: [{ ...regions[0], shape: { type: "circle", cx: 1, cy: 1, r: 0 } }, regions[1]] }, /./);
  });
});

describe("question bank schema", () => {
  const bank: QuestionBankInput = {
    id: "final-band-miking",
    title: "Band miking: course final",
    moduleId: null, // null = course final
    courseId: "band-miking",
    settings: { passingPercent: 75, attemptsAllowed: 2, timeLimitMinutes: 45, showCorrectAnswers: false, shuffleQuestions: true },
    questions: allQuestions,
  };

  it("accepts a JSON round-trip of a valid bank", () => {
    const parsed = questionBankSchema.parse(JSON.parse(JSON.stringify(bank)));
    expect(parsed.questions).toHaveLength(allQuestions.length);
    expect(parsed.moduleId).toBeNull();
  });

  it("rejects duplicate question ids and bad settings", () => {
    expect(questionBankSchema.safeParse({ ...bank, questions: [allQuestions[0], allQuestions[0]] }).success).toBe(false);
    expect(questionBankSchema.safeParse({ ...bank, settings: { ...bank.settings, passingPercent: 120 } }).success).toBe(false);
    expect(questionBankSchema.safeParse({ ...bank, settings: { ...bank.settings, attemptsAllowed: 0 } }).success).toBe(false);
    expect(questionBankSchema.safeParse({ ...bank, questions: [] }).success).toBe(false);
  });
});
