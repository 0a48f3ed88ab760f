// Pure parts of progress (percentages, "continue where you left off") and search (snippet markers).
import { describe, expect, it } from "vitest";
import type { Course } from "@/lib/content";
import { percentOf, summarizeCourse } from "@/lib/server/progress";
import { splitSnippet } from "@/lib/server/search";

const lesson = (id: string, order: number) => ({ id, title: id.toUpperCase(), href: `/courses/demo/${id}`, order }) as unknown as Course["modules"][number]["lessons"][number];
const course = {
  slug: "demo",
  title: "Demo",
  modules: [
    { slug: "one", title: "One", lessons: [lesson("a", 1), lesson("b", 2)] },
    { slug: "two", title: "Two", lessons: [lesson("c", 1), lesson("d", 2), lesson("e", 3)] },
  ],
} as unknown as Course;

const at = (minutes: number) => new Date(Date.UTC(2027, 3, 1, 9, minutes));

describe("percentOf", () => {
  it("rounds down so an unfinished course never shows 100 %", () => {
    expect(percentOf(2, 7)).toBe(28); // 28.57… %
    expect(percentOf(199, 200)).toBe(99);
    expect(percentOf(3, 3)).toBe(100);
    expect(percentOf(0, 0)).toBe(0);
  });
});

describe("summarizeCourse", () => {
  it("starts at the first lesson when nothing has been opened", () => {
    const s = summarizeCourse(course, []);
    expect(s).toMatchObject({ completedLessons: 0, totalLessons: 5, percent: 0, continueLesson: { lessonId: "a" }, lastViewedAt: null });
  });

  it("gives percentages per module and per course", () => {
    const s = summarizeCourse(course, [
      { lessonId: "a", completedAt: at(1), lastViewedAt: at(1) },
      { lessonId: "b", completedAt: at(2), lastViewedAt: at(2) },
      { lessonId: "c", completedAt: at(3), lastViewedAt: at(3) },
    ]);
    expect(s.modules.map((m) => [m.slug, m.completedLessons, m.percent])).toEqual([
      ["one", 2, 100],
      ["two", 1, 33],
    ]);
    expect(s.percent).toBe(60);
    expect(s.completedLessonIds).toEqual(["a", "b", "c"]);
  });

  it("resumes the last lesson opened if it is unfinished, else the next unfinished one after it", () => {
    const opened = summarizeCourse(course, [
      { lessonId: "a", completedAt: at(1), lastViewedAt: at(1) },
      { lessonId: "d", completedAt: null, lastViewedAt: at(5) },
    ]);
    expect(opened.continueLesson?.lessonId).toBe("d");
    const finished = summarizeCourse(course, [
      { lessonId: "d", completedAt: at(5), lastViewedAt: at(5) },
      { lessonId: "e", completedAt: at(6), lastViewedAt: at(6) },
    ]);
    // after the last lesson it wraps round to the first unfinished one
    expect(finished.continueLesson?.lessonId).toBe("a");
    expect(finished.lastViewedAt).toBe(at(6).toISOString());
  });

  it("has nothing to continue when every lesson is complete, and ignores lessons no longer in the course", () => {
    const rows = ["a", "b", "c", "d", "e", "gone"].map((id, i) => ({ lessonId: id, completedAt: at(i), lastViewedAt: at(i) }));
    const s = summarizeCourse(course, rows);
    expect(s.continueLesson).toBeNull();
    expect(s.completedLessons).toBe(5);
    expect(s.percent).toBe(100);
  });
});

describe("splitSnippet", () => {
  it("turns ts_headline's markers into text and hits, never HTML", () => {
    // PostgreSQL docs, ts_headline: StartSel/StopSel delimit each match
    expect(splitSnippet("the \uE000null\uE001 of a <b>cardioid</b>")).toEqual([
      { text: "the ", hit: false },
      { text: "null", hit: true },
      { text: " of a <b>cardioid</b>", hit: false },
    ]);
    expect(splitSnippet("one\ntwo")).toEqual([{ text: "one · two", hit: false }]);
  });
});
