import { describe, expect, it } from "vitest";
import {
  answerSchema,
  attemptAnswersSchema,
  computeGeneratedKey,
  drawQuestionInputs,
  gradeAnswer,
  gradeAttempt,
  gradeGenerated,
  gradeHotspot,
  gradeMatching,
  gradeMultiple,
  gradeNumeric,
  gradeOrdering,
  gradeSingle,
  hasPassed,
  type Question,
} from "@/lib/assessment";
import {
  generatedQuestion,
  hotspotQuestion,
  matchingQuestion,
  multipleQuestion,
  numericQuestion,
  orderingQuestion,
  parseQuestion,
  singleQuestion,
  stubGenerators,
} from "./fixtures";

const as = <K extends Question["kind"]>(question: Question, kind: K) => {
  if (question.kind !== kind) throw new Error(`fixture is ${question.kind}, not ${kind}`);
  return question as Extract<Question, { kind: K }>;
};

describe("single choice", () => {
  const question = as(singleQuestion, "single");
  it("scores 1 for the key and 0 otherwise", () => {
    expect(gradeSingle(question, { kind: "single", optionId: "cardioid" })).toEqual({ score: 1, correct: true });
    expect(gradeSingle(question, { kind: "single", optionId: "omni" })).toEqual({ score: 0, correct: false });
  });
});

describe("multiple choice, partial credit max(0, (right − wrong)/correct)", () => {
  const question = as(multipleQuestion, "multiple");
  const grade = (optionIds: string[]) => gradeMultiple(question, { kind: "multiple", optionIds });
  it("follows the documented rule", () => {
    expect(grade(["mute", "off"])).toEqual({ score: 1, correct: true });
    expect(grade(["mute"])).toEqual({ score: 0.5, correct: false });
    expect(grade(["mute", "off", "hot"])).toEqual({ score: 0.5, correct: false });
    expect(grade(["mute", "hot"])).toEqual({ score: 0, correct: false });
    expect(grade(["mute", "off", "hot", "lift"])).toEqual({ score: 0, correct: false });
    expect(grade(["hot", "lift"])).toEqual({ score: 0, correct: false });
    expect(grade([])).toEqual({ score: 0, correct: false });
  });
  it("counts a repeated pick once and an unknown id as a wrong pick", () => {
    expect(grade(["mute", "mute", "off"])).toEqual({ score: 1, correct: true });
    expect(grade(["mute", "off", "made-up"])).toEqual({ score: 0.5, correct: false });
  });
});

describe("numeric with units", () => {
  const question = as(numericQuestion, "numeric"); // key 29.15 ms ± 0.05 ms
  const grade = (value: number, unit?: Parameters<typeof gradeNumeric>[1]["unit"]) =>
    gradeNumeric(question, { kind: "numeric", value, unit }).correct;

  it("accepts the key in its own unit, with or without the unit given", () => {
    expect(grade(29.15, "ms")).toBe(true);
    expect(grade(29.15)).toBe(true);
    expect(grade(29.2, "ms")).toBe(true); // exactly on the tolerance edge
    expect(grade(29.21, "ms")).toBe(false);
  });

  it("converts seconds before comparing", () => {
    expect(grade(0.02915, "s")).toBe(true);
    expect(grade(0.0292, "s")).toBe(true);
    expect(grade(0.0293, "s")).toBe(false);
  });

  it("rejects a unit of another quantity", () => {
    expect(grade(29.15, "m")).toBe(false);
    expect(grade(29.15, "Hz")).toBe(false);
  });

  it("converts °F and ft for temperature and length keys", () => {
    const temperature = as(
      parseQuestion({
        kind: "numeric",
        id: "q-temp",
        topic: "speed of sound",
        prompt: "The room is at 20 °C. Type the temperature.",
        explanation: "20 °C = 68 °F.",
        answer: 20,
        unit: "degC",
        tolerance: { type: "absolute", amount: 0.5 },
      }),
      "numeric",
    );
    // 68 °F = 20 °C; 69 °F = 20.56 °C (outside ± 0.5 °C) // common practice
    expect(gradeNumeric(temperature, { kind: "numeric", value: 68, unit: "degF" }).correct).toBe(true);
    expect(gradeNumeric(temperature, { kind: "numeric", value: 69, unit: "degF" }).correct).toBe(false);
    const length = as(
      parseQuestion({
        kind: "numeric",
        id: "q-len",
        topic: "3:1 practice",
        prompt: "How far is 3 ft in metres?",
        explanation: "1 ft = 0.3048 m exactly.",
        answer: 0.9144,
        unit: "m",
        tolerance: { type: "relative", percent: 1 },
      }),
      "numeric",
    );
    // 1 ft = 0.3048 m, 1 in = 25.4 mm (exact by definition) // common practice
    expect(gradeNumeric(length, { kind: "numeric", value: 3, unit: "ft" }).correct).toBe(true);
    expect(gradeNumeric(length, { kind: "numeric", value: 36, unit: "in" }).correct).toBe(true);
    expect(gradeNumeric(length, { kind: "numeric", value: 91.44, unit: "cm" }).correct).toBe(true);
    expect(gradeNumeric(length, { kind: "numeric", value: 0.93, unit: "m" }).correct).toBe(false);
  });
});

describe("generated numeric", () => {
  const question = as(generatedQuestion, "generated");
  const context = { generators: stubGenerators, variantSeed: 4242 };

  it("grades against the key of the learner's own variant", () => {
    const inputs = drawQuestionInputs(question, 4242);
    const key = computeGeneratedKey(question, inputs, stubGenerators);
    // f₁ = c/(2Δd), c = 331.3·√(1 + T/273.15) (Wikipedia "Speed of sound"; notch formula, recordingology.com "Comb Filter Calculations")
    const expectedHz = (331.3 * Math.sqrt(1 + inputs.temperatureC / 273.15)) / (2 * inputs.pathDifferenceM);
    expect(key.unit).toBe("Hz");
    expect(key.value).toBeCloseTo(expectedHz, 9);
    expect(gradeGenerated(question, { kind: "generated", value: key.value }, context).correct).toBe(true);
    expect(gradeGenerated(question, { kind: "generated", value: key.value / 1000, unit: "kHz" }, context).correct).toBe(true);
    expect(gradeGenerated(question, { kind: "generated", value: key.value * 1.019 }, context).correct).toBe(true);
    expect(gradeGenerated(question, { kind: "generated", value: key.value * 1.03 }, context).correct).toBe(false);
  });

  it("needs the registry and seed to grade", () => {
    expect(() => gradeAnswer(question, { kind: "generated", value: 1 })).toThrow(/variantSeed/);
  });
});

describe("ordering, all-or-nothing", () => {
  const question = as(orderingQuestion, "ordering");
  const grade = (order: string[]) => gradeOrdering(question, { kind: "ordering", order });
  it("scores 1 only for the identical order", () => {
    expect(grade(["stands", "mics", "cables", "dis", "box"])).toEqual({ score: 1, correct: true });
    expect(grade(["mics", "stands", "cables", "dis", "box"])).toEqual({ score: 0, correct: false });
    expect(grade(["stands", "mics", "cables", "dis"])).toEqual({ score: 0, correct: false });
    expect(grade(["stands", "mics", "cables", "dis", "box", "box"])).toEqual({ score: 0, correct: false });
  });
});

describe("matching, fraction of correct pairs", () => {
  const question = as(matchingQuestion, "matching");
  const grade = (pairs: Record<string, string>) => gradeMatching(question, { kind: "matching", pairs });
  it("gives a third per correct pair", () => {
    expect(grade({ kick: "dynamic", keys: "di", overheads: "sdc" })).toEqual({ score: 1, correct: true });
    expect(grade({ kick: "dynamic", keys: "di", overheads: "ribbon" })).toEqual({ score: 2 / 3, correct: false });
    expect(grade({ kick: "dynamic" })).toEqual({ score: 1 / 3, correct: false });
    expect(grade({})).toEqual({ score: 0, correct: false });
  });
});

describe("hotspot, graded by region", () => {
  const question = as(hotspotQuestion, "hotspot");
  const point = (x: number, y: number) => gradeHotspot(question, { kind: "hotspot", pick: { by: "point", x, y } });
  const region = (regionId: string) => gradeHotspot(question, { kind: "hotspot", pick: { by: "region", regionId } });

  it("accepts a click inside either null, including the boundary", () => {
    expect(point(30, 160).correct).toBe(true);
    expect(point(170, 148).correct).toBe(true); // on the circle's edge (r = 12)
    expect(point(100, 160).correct).toBe(false); // rear lobe
    expect(point(100, 50).correct).toBe(false); // front
    expect(point(190, 190).correct).toBe(false); // no region
  });

  it("accepts a keyboard pick of a correct region", () => {
    expect(region("null-left").correct).toBe(true);
    expect(region("front").correct).toBe(false);
    expect(region("not-a-region").correct).toBe(false);
  });
});

describe("gradeAttempt", () => {
  const questions = [singleQuestion, multipleQuestion, numericQuestion, orderingQuestion];

  it("weights by points and lists topics to revisit", () => {
    const attempt = gradeAttempt(questions, {
      "q-kick-pattern": { kind: "single", optionId: "cardioid" },
      "q-phantom-safe": { kind: "multiple", optionIds: ["mute"] }, // 0.5 × 2 points
      "q-delay-distance": { kind: "numeric", value: 40, unit: "ms" },
      // q-order-of-work unanswered
    });
    expect(attempt.possiblePoints).toBe(5);
    expect(attempt.earnedPoints).toBe(2);
    expect(attempt.percent).toBe(40);
    expect(attempt.results.map((result) => result.answered)).toEqual([true, true, true, false]);
    expect(attempt.topicsToRevisit).toEqual(["phantom power", "delay and time alignment", "order of work"]);
    expect(attempt.results[2].expected).toEqual({ value: 29.15, unit: "ms" });
    expect(hasPassed(attempt, 40)).toBe(true);
    expect(hasPassed(attempt, 70)).toBe(false);
  });

  it("scores an answer of the wrong kind as 0", () => {
    const attempt = gradeAttempt([singleQuestion], { "q-kick-pattern": { kind: "ordering", order: ["cardioid"] } });
    expect(attempt.results[0]).toMatchObject({ score: 0, correct: false, answered: true });
  });

  it("grades generated questions with the registry and attempt seed", () => {
    const context = { generators: stubGenerators, variantSeed: 77 };
    const question = as(generatedQuestion, "generated");
    const key = computeGeneratedKey(question, drawQuestionInputs(question, 77), stubGenerators);
    const attempt = gradeAttempt([generatedQuestion], { "q-comb-notch": { kind: "generated", value: key.value } }, context);
    expect(attempt.percent).toBe(100);
    expect(attempt.results[0].expected).toEqual(key);
  });

  it("handles an empty quiz", () => {
    expect(gradeAttempt([], {}).percent).toBe(0);
  });
});

describe("answer schemas", () => {
  it("accept well-formed answers", () => {
    expect(answerSchema.safeParse({ kind: "numeric", value: 3.4, unit: "ms" }).success).toBe(true);
    expect(answerSchema.safeParse({ kind: "hotspot", pick: { by: "point", x: 1, y: 2 } }).success).toBe(true);
    expect(answerSchema.safeParse({ kind: "matching", pairs: { kick: "dynamic" } }).success).toBe(true);
    expect(attemptAnswersSchema.safeParse({ "q-1": { kind: "single", optionId: "a" } }).success).toBe(true);
  });

  it("reject what a browser should never send", () => {
    expect(answerSchema.safeParse({ kind: "numeric", value: Number.POSITIVE_INFINITY }).success).toBe(false);
    expect(answerSchema.safeParse({ kind: "numeric", value: 1, unit: "furlong" }).success).toBe(false);
    expect(answerSchema.safeParse({ kind: "single", optionId: "a", score: 1 }).success).toBe(false);
    expect(answerSchema.safeParse({ kind: "hotspot", pick: { by: "region" } }).success).toBe(false);
    expect(answerSchema.safeParse({ kind: "essay", text: "..." }).success).toBe(false);
    expect(answerSchema.safeParse({ kind: "multiple", optionIds: Array(500).fill("a") }).success).toBe(false);
  });
});
