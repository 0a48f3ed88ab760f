import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  ANSWER_KEY_FIELDS,
  drawQuestionInputs,
  gradeAnswer,
  questionBankSchema,
  toClientQuestion,
  toClientQuiz,
  type ClientQuestion,
  type ClientSingleQuestion,
} from "@/lib/assessment";
import { anyQuestion, EXPLANATION_MARKER, orderingQuestionArb } from "./arbitraries";
import { allQuestions, generatedQuestion, singleQuestion, stubGenerators } from "./fixtures";
import { keyAnswer } from "../../support/key-answer";

function deepKeys(value: unknown, keys = new Set<string>()): Set<string> {
  if (Array.isArray(value)) value.forEach((item) => deepKeys(item, keys));
  else if (value !== null && typeof value === "object") {
    for (const [key, inner] of Object.entries(value)) {
      keys.add(key);
      deepKeys(inner, keys);
    }
  }
  return keys;
}

describe("toClientQuestion", () => {
  it("never contains an answer-key field or the explanation, for arbitrary questions", () => {
    fc.assert(
      fc.property(anyQuestion, fc.integer(), (question, seed) => {
        const view = toClientQuestion(question, { shuffleSeed: seed });
        const keys = deepKeys(view);
        for (const field of ANSWER_KEY_FIELDS) expect(keys.has(field)).toBe(false);
        expect(JSON.stringify(view)).not.toContain(EXPLANATION_MARKER);
        expect(keys.has("tolerance")).toBe(false);
      }),
    );
  });

  it("keeps every option, item and region id, so the key still grades as correct", () => {
    fc.assert(
      fc.property(anyQuestion, fc.integer(), (question, seed) => {
        const view = toClientQuestion(question, { shuffleSeed: seed });
        const answer = keyAnswer(question, seed, stubGenerators);
        const grade = gradeAnswer(question, answer, { generators: stubGenerators, variantSeed: seed });
        return view.kind === question.kind && grade.correct && grade.score === 1;
      }),
    );
  });

  it("shuffles options as a permutation and is deterministic per seed", () => {
    fc.assert(
      fc.property(anyQuestion, fc.integer(), (question, seed) => {
        const first = toClientQuestion(question, { shuffleSeed: seed });
        expect(toClientQuestion(question, { shuffleSeed: seed })).toEqual(first);
        if ((question.kind === "single" || question.kind === "multiple") && first.kind === question.kind) {
          const sortedIds = (ids: string[]) => [...ids].sort();
          expect(sortedIds(first.options.map((o) => o.id))).toEqual(sortedIds(question.options.map((o) => o.id)));
          if (question.shuffle === false) expect(first.options).toEqual(question.options);
        }
      }),
    );
  });

  it("never shows the items of an ordering question already in the correct order", () => {
    fc.assert(
      fc.property(orderingQuestionArb, fc.integer(), (question, seed) => {
        const view = toClientQuestion(question, { shuffleSeed: seed });
        if (view.kind !== "ordering" || question.kind !== "ordering") return false;
        return !view.items.every((item, i) => item.id === question.correctOrder[i]);
      }),
    );
  });

  it("fills a generated prompt from the variant seed and offers units of the same quantity", () => {
    const view = toClientQuestion(generatedQuestion, { shuffleSeed: 1, variantSeed: 99 });
    expect(view.kind).toBe("generated");
    if (view.kind !== "generated" || generatedQuestion.kind !== "generated") return;
    const inputs = drawQuestionInputs(generatedQuestion, 99);
    expect(view.inputs).toEqual(inputs);
    expect(view.prompt).toContain(`${inputs.pathDifferenceM.toFixed(2)} m`);
    expect(view.prompt).toContain(`${inputs.temperatureC.toFixed(0)} °C`);
    expect(view.prompt).not.toMatch(/\{[A-Za-z]+\}/);
    expect(view.acceptedUnits).toEqual(["Hz", "kHz"]);
  });

  it("has a type that rejects answer-key fields", () => {
    const view = toClientQuestion(singleQuestion, { shuffleSeed: 3 }) as ClientSingleQuestion;
    // @ts-expect-error a client view cannot carry correctOptionId
    const leaked: ClientSingleQuestion = { ...view, correctOptionId: "cardioid" };
    // @ts-expect-error a client view cannot carry an explanation
    const explained: ClientQuestion = { ...view, explanation: "A cardioid's null is at 180°." };
    expect(leaked.kind).toBe("single");
    expect(explained.kind).toBe("single");
  });
});

describe("toClientQuiz", () => {
  const bank = questionBankSchema.parse({
    id: "bank-mod2",
    title: "Pickup patterns check",
    moduleId: "mod-2",
    courseId: "band-miking",
    settings: { passingPercent: 70, attemptsAllowed: 3, timeLimitMinutes: null, showCorrectAnswers: true, shuffleQuestions: true },
    questions: allQuestions,
  });

  it("keeps every question, stripped, in a seeded order", () => {
    const quiz = toClientQuiz(bank, { shuffleSeed: 5 });
    expect(quiz.questions.map((q) => q.id).sort()).toEqual(allQuestions.map((q) => q.id).sort());
    expect(toClientQuiz(bank, { shuffleSeed: 5 })).toEqual(quiz);
    const keys = deepKeys(quiz);
    for (const field of ANSWER_KEY_FIELDS) expect(keys.has(field)).toBe(false);
    expect(quiz).toMatchObject({ passingPercent: 70, attemptsAllowed: 3, timeLimitMinutes: null });
  });

  it("keeps the bank order when shuffleQuestions is off", () => {
    const fixed = { ...bank, settings: { ...bank.settings, shuffleQuestions: false } };
    expect(toClientQuiz(fixed, { shuffleSeed: 5 }).questions.map((q) => q.id)).toEqual(allQuestions.map((q) => q.id));
  });
});
