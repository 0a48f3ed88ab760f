// The cross-bank rules of the content check (lib/content/bank-checks.ts) on small made-up banks,
// and on the real banks under content/banks.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { questionBankSchema, type QuestionBank, type QuestionBankInput } from "@/lib/assessment/question-schema";
import { checkBanks, duplicateItems, fairShare, generatorSpread, keyCues, orderingPrompts, similarity, itemWords } from "@/lib/content/bank-checks";

type SingleInput = Extract<QuestionBankInput["questions"][number], { kind: "single" }>;

function single(id: string, texts: string[], keyIndex: number): SingleInput {
  return {
    kind: "single",
    id,
    topic: "t",
    prompt: `Question ${id} about neutral token ${id}?`,
    explanation: "e",
    options: texts.map((text, i) => ({ id: `o${i}`, text })),
    correctOptionId: `o${keyIndex}`,
  };
}

function bank(id: string, questions: QuestionBankInput["questions"]): QuestionBank {
  return questionBankSchema.parse({
    id,
    title: "A bank",
    moduleId: null,
    courseId: "course-x",
    settings: { passingPercent: 70, attemptsAllowed: 1, timeLimitMinutes: null, showCorrectAnswers: true, shuffleQuestions: true },
    questions,
  });
}

const even = ["aaaa", "bbbb", "cccc", "dddd"];

describe("key cues", () => {
  it("fails a bank whose key is the longest option in more than 35 % of its single-choice items", () => {
    const longKey = (id: string, at: number) => single(id, even.map((t, i) => (i === at ? t + " and more" : t)), at);
    const ok = bank("b-ok", [longKey("q1", 0), single("q2", even, 1), single("q3", even.map((t, i) => (i === 3 ? t + "!!" : t)), 2)]);
    // q2's options tie in length, so its key counts as the longest: 2 of 3 is over the limit.
    expect(keyCues(ok).some((p) => p.message.includes("longest option in 2 of 3"))).toBe(true);
    const fine = bank("b-fine", [longKey("q1", 0), single("q2", ["a", "bb", "ccc", "dddd"], 1), single("q3", ["a", "bb", "ccc", "dddd"], 2), single("q4", ["a", "bb", "ccc", "dddd"], 0)]);
    expect(keyCues(fine).filter((p) => p.message.includes("longest"))).toEqual([]);
  });

  it("fails a bank whose key sits in one authored position more than its fair share", () => {
    const items = Array.from({ length: 8 }, (_, i) => single(`q${i}`, ["a", "bb", "ccc", "dddd"], i < 3 ? 0 : i % 4));
    const b = bank("b-pos", items);
    expect(fairShare(b, 0)).toBe(2);
    expect(keyCues(b).some((p) => p.message.includes("option 1 in 4 single-choice items, more than its fair share of 2"))).toBe(true);
    const balanced = bank("b-bal", Array.from({ length: 8 }, (_, i) => single(`q${i}`, ["a", "bb", "ccc", "dddd"], i % 4)));
    expect(keyCues(balanced).filter((p) => p.message.includes("fair share"))).toEqual([]);
  });
});

describe("duplicates, generators and ordering prompts", () => {
  it("finds the same item asked twice, in any two banks, by the words a learner reads", () => {
    const a = bank("b-a", [single("q1", ["Omni", "Cardioid", "Figure-8", "Hypercardioid"], 1)]);
    const b = bank("b-b", [{ ...single("q9", ["Omni", "Cardioid", "Figure-8", "Hypercardioid"], 1), prompt: "Question q1 about neutral token q1?" }]);
    expect(duplicateItems([a, b])).toHaveLength(1);
    expect(similarity(itemWords(a.questions[0]), itemWords(b.questions[0]))).toBe(1);
    const c = bank("b-c", [{ ...single("q2", ["Stage left", "Stage right", "Centre", "Off stage"], 0), prompt: "Where does the guitar rig stand?" }]);
    expect(duplicateItems([a, c])).toEqual([]);
  });

  it("allows at most three items of a bank from one generator", () => {
    const gen = (id: string) => ({ kind: "generated" as const, id, topic: "t", prompt: "At {levelDba} dBA, how long?", explanation: "e", generator: "noisePermissibleTime" as const, ranges: { levelDba: { min: 85, max: 100, step: 1 } }, tolerance: { type: "relative" as const, percent: 3 } });
    expect(generatorSpread(bank("b-g3", [gen("g1"), gen("g2"), gen("g3")]))).toEqual([]);
    expect(generatorSpread(bank("b-g4", [gen("g1"), gen("g2"), gen("g3"), gen("g4")]))).toHaveLength(1);
  });

  it("refuses an ordering item that asks for the lesson's order", () => {
    const ordering = (prompt: string) => ({ kind: "ordering" as const, id: "o1", topic: "t", prompt, explanation: "e", items: [{ id: "x", text: "X" }, { id: "y", text: "Y" }], correctOrder: ["x", "y"] });
    expect(orderingPrompts(bank("b-o1", [ordering("Put the steps in the order the lesson recommends.")]))).toHaveLength(1);
    expect(orderingPrompts(bank("b-o2", [ordering("Nothing may be unplugged with phantom live. Put the steps in the order that rule fixes.")]))).toEqual([]);
  });
});

describe("the banks under content/banks", () => {
  it("pass every cross-bank rule", () => {
    const root = path.join(process.cwd(), "content/banks");
    const banks = fs.readdirSync(root).flatMap((course) =>
      fs.readdirSync(path.join(root, course)).filter((n) => n.endsWith(".json")).map((n) => questionBankSchema.parse(JSON.parse(fs.readFileSync(path.join(root, course, n), "utf8")))),
    );
    expect(banks.length).toBe(22);
    expect(checkBanks(banks)).toEqual([]);
  });
});
