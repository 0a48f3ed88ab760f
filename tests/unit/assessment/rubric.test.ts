// Rubric totals (lib/assessment/rubric.ts). An analytic rubric scores each criterion at one of its
// levels and the total is the sum of the levels chosen (Brookhart, How to Create and Use Rubrics,
// ASCD 2013, ch. 1: analytic rubrics; common practice). The expected totals below are worked by hand.
import { describe, expect, it } from "vitest";
import { rubricMax, rubricTotal, scoreProblems } from "@/lib/assessment/rubric";

const RUBRIC = [
  { id: "aim", levels: [{ points: 4 }, { points: 2 }, { points: 0 }] },
  { id: "distance", levels: [{ points: 3 }, { points: 1 }, { points: 0 }] },
  { id: "clearance", levels: [{ points: 2 }, { points: 0 }] },
  { id: "stand-cable", levels: [{ points: 3 }, { points: 1 }, { points: 0 }] },
];

describe("rubric totals", () => {
  it("the maximum is the sum of each criterion's best level: 4 + 3 + 2 + 3 = 12", () => {
    expect(rubricMax(RUBRIC)).toBe(12);
  });

  it("adds the chosen levels: 4 + 1 + 0 + 3 = 8 of 12, complete", () => {
    expect(rubricTotal(RUBRIC, { aim: 4, distance: 1, clearance: 0, "stand-cable": 3 })).toEqual({ total: 8, max: 12, scored: 4, criteria: 4, complete: true });
  });

  it("a draft with two criteria scored: 2 + 3 = 5, not complete", () => {
    expect(rubricTotal(RUBRIC, { aim: 2, "stand-cable": 3 })).toEqual({ total: 5, max: 12, scored: 2, criteria: 4, complete: false });
  });

  it("a 0-point level counts as scored", () => {
    expect(rubricTotal(RUBRIC, { aim: 0, distance: 0, clearance: 0, "stand-cable": 0 })).toMatchObject({ total: 0, complete: true });
  });

  it("refuses points that are not a level, and unknown criteria", () => {
    expect(scoreProblems(RUBRIC, { aim: 3 })).toEqual(['3 is not a level of "aim" (4, 2, 0)']);
    expect(scoreProblems(RUBRIC, { tone: 2 })).toEqual(['"tone" is not a criterion of this rubric']);
    expect(scoreProblems(RUBRIC, { aim: 4, distance: 1 })).toEqual([]);
  });
});
