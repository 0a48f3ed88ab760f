import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  ANSWER_KEY_FIELDS,
  deriveSeed,
  drawQuestionInputs,
  gradeAnswer,
  legacyPresenter,
  questionBankSchema,
  seededShuffle,
  toAuthoredAnswer,
  toClientQuestion,
  toClientQuiz,
  toPresentedAnswer,
  type ClientQuestion,
  type ClientSingleQuestion,
  type Presenter,
} from "@/lib/assessment";
import { secretPresenter } from "@/lib/server/attempt-presenter";
import { anyQuestion, EXPLANATION_MARKER, orderingQuestionArb } from "./arbitraries";
import { allQuestions, generatedQuestion, singleQuestion, stubGenerators } from "./fixtures";
import { keyAnswer } from "../../support/key-answer";

/** The presenter of attempt number `seed`: a 256-bit secret derived from it, as a started attempt would hold. */
function presenterFor(seed: number): Presenter {
  return secretPresenter(createHash("sha256").update(`client-view attempt ${seed}`).digest("base64url"));
}

const viewOf = (question: Parameters<typeof toClientQuestion>[0], seed: number) => toClientQuestion(question, { presenter: presenterFor(seed), variantSeed: seed });

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
        const view = viewOf(question, seed);
        const keys = deepKeys(view);
        for (const field of ANSWER_KEY_FIELDS) expect(keys.has(field)).toBe(false);
        expect(JSON.stringify(view)).not.toContain(EXPLANATION_MARKER);
        expect(keys.has("tolerance")).toBe(false);
      }),
    );
  });

  it("shows the key's choices under presented ids that map back to the key, which grades as correct", () => {
    fc.assert(
      fc.property(anyQuestion, fc.integer(), (question, seed) => {
        const presenter = presenterFor(seed);
        const view = toClientQuestion(question, { presenter, variantSeed: seed });
        const key = keyAnswer(question, seed, stubGenerators);
        const shown = toPresentedAnswer(question, key, presenter);
        expect(shown).not.toBeNull();
        // Every id of the key, as presented, is one the view offers.
        const offered = JSON.stringify(view);
        for (const id of JSON.stringify(shown).match(/"c[A-Za-z0-9_-]{16}"/g) ?? []) expect(offered).toContain(id);
        const back = toAuthoredAnswer(question, shown!, presenter);
        expect(back).toEqual(key);
        const grade = gradeAnswer(question, back!, { generators: stubGenerators, variantSeed: seed });
        return view.kind === question.kind && grade.correct && grade.score === 1;
      }),
    );
  });

  it("refuses to map back an id the question did not show", () => {
    const presenter = presenterFor(1);
    expect(toAuthoredAnswer(singleQuestion, { kind: "single", optionId: "cardioid" }, presenter)).toBeNull();
    const shown = toClientQuestion(singleQuestion, { presenter: presenterFor(2), variantSeed: 2 }) as ClientSingleQuestion;
    expect(toAuthoredAnswer(singleQuestion, { kind: "single", optionId: shown.options[0].id }, presenter)).toBeNull();
  });

  it("shuffles options as a permutation and is deterministic per attempt", () => {
    fc.assert(
      fc.property(anyQuestion, fc.integer(), (question, seed) => {
        const first = viewOf(question, seed);
        expect(viewOf(question, seed)).toEqual(first);
        if ((question.kind === "single" || question.kind === "multiple") && first.kind === question.kind) {
          const presenter = presenterFor(seed);
          const sortedIds = (ids: string[]) => [...ids].sort();
          expect(sortedIds(first.options.map((o) => o.id))).toEqual(sortedIds(question.options.map((o) => presenter.presentedId(question.id, "option", o.id))));
          if (question.shuffle === false) expect(first.options.map((o) => o.text)).toEqual(question.options.map((o) => o.text));
        }
      }),
    );
  });

  it("never shows the items of an ordering question already in the correct order", () => {
    fc.assert(
      fc.property(orderingQuestionArb, fc.integer(), (question, seed) => {
        const presenter = presenterFor(seed);
        const view = toClientQuestion(question, { presenter, variantSeed: seed });
        if (view.kind !== "ordering" || question.kind !== "ordering") return false;
        return !view.items.every((item, i) => item.id === presenter.presentedId(question.id, "item", question.correctOrder[i]));
      }),
    );
  });

  it("reads an attempt started before presented ids exactly as it was shown then", () => {
    const view = toClientQuestion(singleQuestion, { presenter: legacyPresenter(1234), variantSeed: 1234 }) as ClientSingleQuestion;
    if (singleQuestion.kind !== "single") return;
    expect(view.options).toEqual(seededShuffle(singleQuestion.options, deriveSeed(1234, singleQuestion.id, "shuffle")));
  });

  it("fills a generated prompt from the variant seed and offers units of the same quantity", () => {
    const view = toClientQuestion(generatedQuestion, { presenter: presenterFor(1), variantSeed: 99 });
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
    const view = viewOf(singleQuestion, 3) as ClientSingleQuestion;
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

  it("keeps every question, stripped, in the attempt's order", () => {
    const quiz = toClientQuiz(bank, { presenter: presenterFor(5), variantSeed: 5 });
    expect(quiz.questions.map((q) => q.id).sort()).toEqual(allQuestions.map((q) => q.id).sort());
    expect(toClientQuiz(bank, { presenter: presenterFor(5), variantSeed: 5 })).toEqual(quiz);
    const keys = deepKeys(quiz);
    for (const field of ANSWER_KEY_FIELDS) expect(keys.has(field)).toBe(false);
    expect(quiz).toMatchObject({ passingPercent: 70, attemptsAllowed: 3, timeLimitMinutes: null });
  });

  it("keeps the bank order when shuffleQuestions is off", () => {
    const fixed = { ...bank, settings: { ...bank.settings, shuffleQuestions: false } };
    expect(toClientQuiz(fixed, { presenter: presenterFor(5), variantSeed: 5 }).questions.map((q) => q.id)).toEqual(allQuestions.map((q) => q.id));
  });
});
