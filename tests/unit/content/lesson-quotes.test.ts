import { describe, expect, it } from "vitest";
import { expectQuoted, LessonQuotes } from "../../support/lesson-quotes";

// The helper the lesson-number tests read lessons with (tests/support/lesson-quotes.ts), on text
// shaped like lib/content's plain text of a lesson (table cells on lines of their own).
const TEXT = [
  "A cardioid is only about 6 dB down at 90°, and a supercardioid is about 11.4 dB down behind.",
  "The far copy is about −3.5 dB at the notches; the loud part lasted 3¼ hours.",
  "Level",
  "NIOSH",
  "88 dBA",
  "4 h",
  "188 dBA",
  "40 h",
  "A doubling costs about 6 dB. A doubling costs about 6 dB.",
  "It rose by about 3 dB here and by about 4 dB there.",
].join("\n");
const lesson = new LessonQuotes("les-example", "content/courses/example/01-example.mdx", TEXT);

describe("LessonQuotes", () => {
  it("reads numbers with their printed precision, signs and fractions", () => {
    expect(lesson.quote("about {} dB down at 90°")).toMatchObject({ printed: "6", value: 6, decimals: 0 });
    expect(lesson.quote("a supercardioid is about {} dB down")).toMatchObject({ value: 11.4, decimals: 1 });
    expect(lesson.quote("about {} dB at the notches")).toMatchObject({ printed: "−3.5", value: -3.5 });
    expect(lesson.quote("lasted {} hours")).toMatchObject({ value: 3.25 });
    expect(lesson.quotes("only about {} dB down at {}°").map((q) => q.value)).toEqual([6, 90]);
  });

  it("matches table rows cell by cell, and a row's first number whole", () => {
    expect(lesson.quote("88 dBA | {} h").value).toBe(4);
    expect(lesson.quote("188 dBA | {} h").value).toBe(40);
  });

  it("refuses a passage the lesson no longer contains, naming the file", () => {
    expect(() => lesson.quote("about {} dB down at 45°")).toThrow(/01-example\.mdx \(les-example\) no longer says/);
    expect(() => lesson.says("a hypercardioid")).toThrow(/no longer says/);
  });

  it("accepts a passage repeated with the same number, refuses one repeated with different numbers", () => {
    expect(lesson.quote("A doubling costs about {} dB").value).toBe(6);
    expect(() => lesson.quote("by about {} dB")).toThrow(/different numbers/);
  });

  it("expectQuoted passes when the computed value rounds to the printed one, and fails otherwise", () => {
    const q = lesson.quote("a supercardioid is about {} dB down");
    expectQuoted(11.439, q);
    expect(() => expectQuoted(11.46, q)).toThrow(/prints 11.4/);
    const coarse = lesson.quote("about {} dB down at 90°");
    expectQuoted(6.02, coarse);
    expect(() => expectQuoted(6.6, coarse)).toThrow();
    expectQuoted(8.4, coarse, { step: 5 });
  });
});
