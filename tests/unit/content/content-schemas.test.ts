// The zod schemas of the content contract (the course/lesson/glossary formats the lessons follow).
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { courseSchema, glossarySchema, issueLines, lessonFrontmatterSchema, SAFETY_TOPICS } from "@/lib/content/schemas";

const course = JSON.parse(fs.readFileSync(path.join(process.cwd(), "content/courses/miking-the-band/course.json"), "utf8"));

const lesson = {
  id: "les-test-lesson",
  title: "A test lesson",
  summary: "One sentence.",
  objectives: ["Explain one thing", "Place another"],
  minutes: 12,
  order: 1,
  preview: false,
  safety: ["hearing"],
  figures: ["pickup-pattern"],
};

describe("course.json schema", () => {
  it("accepts a course file from the repository", () => {
    expect(courseSchema.safeParse(course).success).toBe(true);
  });

  it("rejects a level outside foundation | intermediate | advanced", () => {
    // content contract: level is one of three values
    const r = courseSchema.safeParse({ ...course, level: "beginner" });
    expect(r.success).toBe(false);
    if (!r.success) expect(issueLines(r.error)[0]).toMatch(/^level: /);
  });

  it("needs id = course-<slug>, 3–6 outcomes and unique module slugs and orders", () => {
    // content contract: "id": "course-<slug>", outcomes 3–6
    expect(courseSchema.safeParse({ ...course, id: "course-other" }).success).toBe(false);
    expect(courseSchema.safeParse({ ...course, outcomes: ["a", "b"] }).success).toBe(false);
    expect(courseSchema.safeParse({ ...course, outcomes: Array(7).fill("x") }).success).toBe(false);
    const twice = [course.modules[0], { ...course.modules[0], id: "mod-copy" }];
    const r = courseSchema.safeParse({ ...course, modules: twice });
    expect(r.success).toBe(false);
    if (!r.success) expect(issueLines(r.error).join("\n")).toMatch(/duplicate module slug/);
  });

  it("refuses unknown keys (a typo is an error, not silently ignored)", () => {
    expect(courseSchema.safeParse({ ...course, sumary: "typo" }).success).toBe(false);
  });
});

describe("lesson frontmatter schema", () => {
  it("accepts a complete frontmatter", () => {
    expect(lessonFrontmatterSchema.parse(lesson)).toEqual(lesson);
  });

  it("needs a les- id, 2–5 objectives and known safety topics", () => {
    // content contract: id les-<kebab>, objectives 2–5, safety from the eight topics
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, id: "lesson-one" }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, objectives: ["only one"] }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, objectives: Array(6).fill("x") }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, safety: ["ladders"] }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, safety: ["weather"] }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, safety: ["hearing", "electrical", "phantom-power", "stands-overhead", "cable-runs"] }).success).toBe(true);
    // the topics added with their callouts: lifting and carrying, ladders and access equipment, wind and rain outdoors
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, safety: ["manual-handling", "work-at-height", "outdoor-weather"] }).success).toBe(true);
    expect(SAFETY_TOPICS).toEqual(["hearing", "electrical", "phantom-power", "stands-overhead", "cable-runs", "manual-handling", "work-at-height", "outdoor-weather"]);
  });

  it("needs preview as a boolean and minutes as a positive whole number", () => {
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, preview: "yes" }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, minutes: 0 }).success).toBe(false);
    expect(lessonFrontmatterSchema.safeParse({ ...lesson, minutes: 7.5 }).success).toBe(false);
  });
});

describe("glossary schema", () => {
  const entry = (id: string, seeAlso: string[] = []) => ({ id, term: id, definition: "A plain sentence.", seeAlso });

  it("accepts entries whose seeAlso point at other entries", () => {
    expect(glossarySchema.safeParse([entry("cardioid", ["null"]), entry("null", ["cardioid"])]).success).toBe(true);
  });

  it("rejects duplicate ids, unknown seeAlso and self-references", () => {
    const lines = (value: unknown) => {
      const r = glossarySchema.safeParse(value);
      return r.success ? [] : issueLines(r.error);
    };
    expect(lines([entry("null"), entry("null")]).join()).toMatch(/duplicate glossary id "null"/);
    expect(lines([entry("null", ["nowhere"])]).join()).toMatch(/seeAlso "nowhere" is not a glossary id/);
    expect(lines([entry("null", ["null"])]).join()).toMatch(/cannot see itself/);
  });

  it("accepts the merged content/glossary.json", () => {
    const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "content/glossary.json"), "utf8"));
    const r = glossarySchema.safeParse(raw);
    expect(r.success).toBe(true);
    // merged from three fragments (66 + 33 + 19 entries, 11 ids in two of them), then 17 terms of
    // the stage-box-to-mix course
    expect(raw).toHaveLength(124);
  });
});
