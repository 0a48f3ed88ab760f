import { describe, expect, it } from "vitest";
import { ANSWER_KEY_FIELDS, questionBankSchema, type Question } from "@/lib/assessment";
import { newPresentationSecret, secretPresenter } from "@/lib/server/attempt-presenter";
import { buildResultDto, clientQuestionsFor, describeAnswer, describeKey, questionOrderFor, type BankEntry } from "@/lib/server/quiz-banks";
import { allQuestions, hotspotQuestion, matchingQuestion, multipleQuestion, numericQuestion, orderingQuestion, singleQuestion } from "../assessment/fixtures";

function entryOf(questions: Question[], settings: Partial<{ shuffleQuestions: boolean; showCorrectAnswers: boolean }> = {}): BankEntry {
  const bank = questionBankSchema.parse({
    id: "bank-fixture",
    title: "Fixture bank",
    moduleId: null,
    courseId: "course-fixture",
    settings: { passingPercent: 70, attemptsAllowed: 2, timeLimitMinutes: null, showCorrectAnswers: settings.showCorrectAnswers ?? true, shuffleQuestions: settings.shuffleQuestions ?? true },
    questions,
  });
  return { bank, courseSlug: "fixture", fileSlug: "final", questionsById: new Map(bank.questions.map((q) => [q.id, q])) };
}

describe("question order of an attempt", () => {
  it("is a permutation fixed by the attempt's secret when the bank shuffles, and the bank's order otherwise", () => {
    const shuffled = entryOf(allQuestions);
    const secret = newPresentationSecret();
    const order = questionOrderFor(shuffled.bank, secretPresenter(secret));
    expect([...order].sort()).toEqual(allQuestions.map((q) => q.id).sort());
    expect(questionOrderFor(shuffled.bank, secretPresenter(secret))).toEqual(order);
    const orders = [1, 2, 3, 4, 5].map(() => questionOrderFor(shuffled.bank, secretPresenter(newPresentationSecret())).join());
    expect(new Set(orders).size).toBeGreaterThan(1);
    expect(questionOrderFor(entryOf(allQuestions, { shuffleQuestions: false }).bank, secretPresenter(secret))).toEqual(allQuestions.map((q) => q.id));
  });

  it("the client questions follow that order and carry no key field", () => {
    const entry = entryOf(allQuestions);
    const presenter = secretPresenter(newPresentationSecret());
    const order = questionOrderFor(entry.bank, presenter);
    const client = clientQuestionsFor(entry, [...order, "q-removed-since"], presenter, 99);
    expect(client.map((q) => q.id)).toEqual(order);
    const text = JSON.stringify(client);
    for (const field of ANSWER_KEY_FIELDS) expect(text).not.toContain(`"${field}"`);
  });
});

describe("answers and keys in words", () => {
  it("describes each kind of key", () => {
    expect(describeKey(singleQuestion, 1)).toBe("Cardioid");
    expect(describeKey(multipleQuestion, 1)).toBe("Mute the channel before patching; Switch phantom off before unplugging");
    expect(describeKey(numericQuestion, 1)).toBe("29.15 ms (accepted ± 0.05 ms)");
    expect(describeKey(orderingQuestion, 1)).toBe("1. Place the stands → 2. Mount the mics → 3. Run the cables → 4. Set the DIs → 5. Patch the stage box");
    expect(describeKey(matchingQuestion, 1)).toBe("Kick drum: A rugged cardioid dynamic; Stereo keyboard: Two active DIs; Drum overheads: A pair of small-diaphragm condensers");
    expect(describeKey(hotspotQuestion, 1)).toBe("Null, rear left or Null, rear right");
  });

  it("describes answers, a clicked point by the region it falls in, and ignores an answer of another kind", () => {
    expect(describeAnswer(numericQuestion, { kind: "numeric", value: 2.9, unit: "cm" })).toBe("2.9 cm");
    expect(describeAnswer(hotspotQuestion, { kind: "hotspot", pick: { by: "point", x: 31, y: 161 } })).toBe("Null, rear left");
    expect(describeAnswer(hotspotQuestion, { kind: "hotspot", pick: { by: "point", x: 199, y: 199 } })).toBe("Outside every marked position");
    expect(describeAnswer(matchingQuestion, { kind: "matching", pairs: { kick: "ribbon" } })).toBe("Kick drum: A figure-8 ribbon; Stereo keyboard: no choice; Drum overheads: no choice");
    expect(describeAnswer(singleQuestion, { kind: "numeric", value: 1 })).toBeNull();
    expect(describeAnswer(singleQuestion, undefined)).toBeNull();
  });

  it("a result hides correct answers and explanations unless the review is allowed, with the policy's sentence", () => {
    const entry = entryOf([singleQuestion, numericQuestion], { showCorrectAnswers: false });
    const graded = {
      items: [
        { questionId: singleQuestion.id, answered: true, score: 0, correct: false, points: 1, earnedPoints: 0 },
        { questionId: numericQuestion.id, answered: false, score: 0, correct: false, points: 1, earnedPoints: 0 },
      ],
      percent: 0,
      earnedPoints: 0,
      possiblePoints: 2,
      passingPercent: 70,
      topicsToRevisit: ["pickup patterns"],
      timedOut: false,
    };
    const attempt = { id: "a", seed: 1, submittedAt: new Date("2027-03-01T10:00:00Z"), passed: false };
    const answers = new Map([[singleQuestion.id, { kind: "single" as const, optionId: "omni" }]]);
    const note = "Correct answers and explanations are shown once all 2 attempts at this quiz are used (you have used 1).";
    const hidden = buildResultDto(entry, attempt, graded, answers, { shown: false, note });
    expect(hidden.questions.map((q) => [q.outcome, q.yourAnswer, q.correctAnswer, q.explanation])).toEqual([
      ["incorrect", "Omnidirectional", null, null],
      ["not answered", null, null, null],
    ]);
    expect(hidden).toMatchObject({ answersShown: false, answersNote: note, percent: 0 });
    const shown = buildResultDto(entry, attempt, graded, answers, { shown: true, note: null });
    expect(shown.questions.map((q) => q.correctAnswer)).toEqual(["Cardioid", "29.15 ms (accepted ± 0.05 ms)"]);
    expect(shown.questions.every((q) => (q.explanation ?? "").length > 0)).toBe(true);
    expect(shown).toMatchObject({ answersShown: true, answersNote: null });
  });
});
