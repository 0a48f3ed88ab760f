// The completion rule as issue 13 states it (our own rule, no outside source): every lesson,
// every module quiz, every brief of the course; a course without briefs counts the catalogue's first two.
import { describe, expect, it } from "vitest";
import { evaluateCompletion, missingSentence, requiredBriefs } from "@/lib/assessment/completion";

const facts = (over: Partial<Parameters<typeof evaluateCompletion>[0]> = {}) =>
  evaluateCompletion({
    courseSlug: "c",
    courseTitle: "Course",
    lessons: [{ id: "l1", title: "One" }, { id: "l2", title: "Two" }],
    moduleQuizzes: [{ id: "q1", title: "Drums" }],
    briefs: [{ id: "b1", title: "Kick", courseSlug: "c" }],
    borrowedBriefs: false,
    completedLessonIds: new Set(["l1", "l2"]),
    passedBankIds: new Set(["q1"]),
    approvedBriefIds: new Set(["b1"]),
    ...over,
  });

describe("the completion rule", () => {
  it("is complete only when every item is done", () => {
    expect(facts()).toMatchObject({ complete: true, missing: "" });
    expect(facts({ completedLessonIds: new Set(["l1"]) }).complete).toBe(false);
    expect(facts({ passedBankIds: new Set() }).complete).toBe(false);
    expect(facts({ approvedBriefIds: new Set() }).complete).toBe(false);
  });

  it("says what is missing in one sentence", () => {
    const r = facts({ completedLessonIds: new Set(["l1"]), passedBankIds: new Set(), approvedBriefIds: new Set() });
    expect(r.missing).toBe("Before the certificate can be issued, complete 1 lesson, pass 1 module quiz (Drums) and have 1 placement brief approved (Kick).");
    expect(missingSentence([])).toBe("");
  });

  it("never certifies a course with nothing in it", () => {
    expect(facts({ lessons: [], moduleQuizzes: [], briefs: [] })).toMatchObject({ complete: false, missing: "This course has nothing to complete yet." });
  });

  it("takes the course's own briefs, or the first two of the catalogue when it has none", () => {
    const all = [
      { id: "a", courseSlug: "x" },
      { id: "b", courseSlug: "y" },
      { id: "c", courseSlug: "y" },
    ];
    expect(requiredBriefs(all, "y")).toEqual({ briefs: [all[1], all[2]], borrowed: false });
    expect(requiredBriefs(all, "z")).toEqual({ briefs: [all[0], all[1]], borrowed: true });
  });
});
