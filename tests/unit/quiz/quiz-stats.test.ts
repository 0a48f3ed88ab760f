import { describe, expect, it } from "vitest";
import type { StoredQuizResult } from "@/db/schema";
import { itemStatistics, questionBankSchema } from "@/lib/assessment";
import type { BankEntry } from "@/lib/server/quiz-banks";
import { bankOrderFrom, responseMatrix, scoreHistogram, statsCsv, type BankStatsDto } from "@/lib/server/quiz-stats";

// pingouin `cronbach_wide_missing` dataset (src/pingouin/datasets/cronbach_wide_missing.csv; 12 examinees ×
// 11 binary items, null = missing); the stored results built from it go through the same
// matrix builder as the instructor's page.
const _ = null;
const ROWS: (0 | 1 | null)[][] = [
  [1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1],
  [1, 1, 1, 1, 1, 1, 1, 1, 0, 1, 0],
  [_, 0, 1, 1, _, 1, 1, 1, 1, 0, 0],
  [1, 1, 1, 0, 1, 1, 0, 1, 1, 0, 0],
  [1, 1, 1, 1, 1, 0, 0, 0, 1, 0, 0],
  [0, 1, _, 0, 1, 1, 1, 1, 0, 0, 0],
  [1, 1, 1, 1, 0, 0, 1, 0, 0, 0, 0],
  [1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0],
  [0, 1, 0, 1, 1, 0, 0, 0, 0, 1, 0],
  [1, 0, 0, 1, 0, 1, 0, 0, _, 0, 0],
  [1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0],
  [1, 0, 0, 1, 0, 0, 0, 0, 0, 0, 0],
];

const ids = ROWS[0].map((_, j) => `Q${j + 1}`);

const bank = questionBankSchema.parse({
  id: "bank-test-stats",
  title: "Statistics test bank",
  moduleId: "mod-test",
  courseId: "course-test",
  settings: { passingPercent: 70, attemptsAllowed: 3, timeLimitMinutes: null, showCorrectAnswers: true, shuffleQuestions: true },
  questions: ids.map((id) => ({
    kind: "single",
    id,
    topic: `topic ${id}`,
    prompt: id === "Q1" ? "=SUM(A1) looks like a formula" : `Prompt of ${id}, with a comma`,
    explanation: "Because.",
    options: [
      { id: "a", text: "A" },
      { id: "b", text: "B" },
    ],
    correctOptionId: "a",
  })),
});
const entry: BankEntry = { bank, courseSlug: "test", fileSlug: "test", questionsById: new Map(bank.questions.map((q) => [q.id, q])) };

/** A stored result as the grader writes it; a missing score means the question was not in that attempt. */
function stored(row: (0 | 1 | null)[]): StoredQuizResult {
  const items = row.flatMap((score, j) => (score === null ? [] : [{ questionId: ids[j], kind: "single", topic: "t", answered: true, score, correct: score === 1, points: 1, earnedPoints: score }]));
  const earned = items.reduce((s, i) => s + i.score, 0);
  // Shuffled storage order, as an attempt with shuffled questions stores them.
  return { items: items.reverse(), earnedPoints: earned, possiblePoints: 11, percent: (100 * earned) / 11, passingPercent: 70, topicsToRevisit: [], timedOut: false };
}

describe("bankOrderFrom", () => {
  it("puts a result's scores in bank order, null where a question is missing, and ignores questions the bank no longer has", () => {
    const scores = bankOrderFrom(entry, ["Q3", "Q-removed", "Q1", "Q11"], [0.5, 1, 1, 0]);
    expect(scores).toEqual([1, _, 0.5, _, _, _, _, _, _, _, 0]);
    // The same answer the second time round (the bank's positions are kept per bank entry).
    expect(bankOrderFrom(entry, ["Q2"], [1])).toEqual([_, 1, _, _, _, _, _, _, _, _, _]);
  });
});

describe("responseMatrix + itemStatistics", () => {
  it("rebuilds bank-order rows, drops incomplete attempts and reproduces pingouin's listwise α", () => {
    const { rows, kept } = responseMatrix(entry, ROWS.map(stored));
    expect(kept).toEqual([0, 1, 3, 4, 6, 7, 8, 10, 11]); // the 9 complete rows of that dataset
    const stats = itemStatistics({ responses: rows });
    // pingouin cronbach_alpha docstring, listwise (= R psych::alpha use="complete.obs"): 0.8016949152542373
    expect(stats.alpha).toBeCloseTo(0.8016949152542373, 12);
    expect(stats.kr20).toBeCloseTo(0.8016949152542373, 12);
    // [derived from pingouin's published data]: p of Q1 = 0.8889, corrected r of Q4 = 0
    expect(stats.items[0].p).toBeCloseTo(8 / 9, 12);
    expect(stats.items[3].rCorrected).toBeCloseTo(0, 12);
    expect(stats.items[5].rpb).toBeCloseTo(0.8442, 4);
  });
});

describe("scoreHistogram", () => {
  it("puts scores in ten 10 % bands, 100 % in the last", () => {
    const bins = scoreHistogram([0, 9.99, 10, 55, 99.9, 100, 100]);
    expect(bins.map((b) => b.count)).toEqual([2, 1, 0, 0, 0, 1, 0, 0, 0, 3]);
    expect(bins[0].label).toBe("0–10 %");
    expect(bins[9]).toMatchObject({ fromPercent: 90, toPercent: 100 });
  });
});

describe("statsCsv", () => {
  it("quotes commas and defuses spreadsheet formulas (OWASP, CSV injection)", () => {
    const stats = {
      n: 9,
      items: bank.questions.slice(0, 2).map((q, j) => ({ position: j + 1, questionId: q.id, kind: q.kind, topic: q.topic, prompt: q.prompt, p: 0.5, d: -0.25, rpb: null, rCorrected: 0.1, flags: [], flagWords: j === 0 ? ["Negative point-biserial"] : [] })),
    } as unknown as BankStatsDto;
    const lines = statsCsv(stats).split("\r\n");
    expect(lines[0]).toBe("position,question_id,kind,topic,prompt,p,D,r_pb,r_corrected,flags,n");
    expect(lines[1]).toBe("1,Q1,single,topic Q1,'=SUM(A1) looks like a formula,0.5000,-0.2500,,0.1000,Negative point-biserial,9");
    expect(lines[2]).toBe('2,Q2,single,topic Q2,"Prompt of Q2, with a comma",0.5000,-0.2500,,0.1000,,9');
  });
});
