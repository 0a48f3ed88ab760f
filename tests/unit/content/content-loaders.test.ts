// The loaders of lib/content over the real content/ folder, and readContent on broken copies.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getCourse, getGlossary, getLesson, lessonNeighbours, listAllLessons, listCourses, listLessons } from "@/lib/content";
import { readContent } from "@/lib/content/read";

describe("content/ as the app reads it", () => {
  // The first read parses every lesson's MDX: seconds on a busy machine, with other test files
  // (the lesson-number tests) parsing the same content in parallel. Read once before the checks.
  beforeAll(() => listCourses(), 60_000);

  it("has five courses in catalog order, with the counts the catalog shows", async () => {
    const courses = await listCourses();
    expect(courses.map((c) => c.slug)).toEqual(["how-microphones-hear", "direct-boxes-and-levels", "miking-the-band", "safe-stage-practice", "stage-box-to-mix"]);
    for (const c of courses) {
      const lessons = c.modules.flatMap((m) => m.lessons);
      expect(c.lessonCount).toBe(lessons.length);
      expect(c.minutes).toBe(lessons.reduce((sum, l) => sum + l.minutes, 0));
      // content contract: the FIRST lesson of each course is the free preview, and only it
      expect(c.previewCount).toBe(1);
      expect(lessons[0].preview).toBe(true);
    }
  });

  it("gives every lesson a unique id across all courses", async () => {
    const all = await listAllLessons();
    expect(all.length).toBeGreaterThanOrEqual(37);
    expect(new Set(all.map((l) => l.id)).size).toBe(all.length);
  });

  it("lists a course's lessons in module order, then lesson order", async () => {
    const course = await getCourse("miking-the-band");
    const lessons = await listLessons("miking-the-band");
    expect(lessons.map((l) => l.id)).toEqual(course!.modules.flatMap((m) => [...m.lessons].sort((a, b) => a.order - b.order).map((l) => l.id)));
    expect(lessons[0].id).toBe("les-mtb-order-of-work");
    expect(await listLessons("no-such-course")).toEqual([]);
  });

  it("finds a lesson only inside its own course, with its body, headings and href", async () => {
    const lesson = await getLesson("miking-the-band", "les-mtb-kick-snare-hihat");
    expect(lesson?.href).toBe("/courses/miking-the-band/les-mtb-kick-snare-hihat");
    expect(lesson?.headings.map((h) => h.id)).toEqual(["kick", "snare-top", "snare-bottom", "hi-hat", "a-first-listen"]);
    expect(lesson?.body.startsWith("---")).toBe(false);
    expect(lesson?.words).toBeGreaterThanOrEqual(500);
    expect(await getLesson("how-microphones-hear", "les-mtb-kick-snare-hihat")).toBeNull();
    expect(await getCourse("nope")).toBeNull();
  });

  it("knows each lesson's neighbours across module boundaries", async () => {
    const lessons = await listLessons("miking-the-band");
    const lastOfFirstModule = lessons[2];
    const { previous, next } = await lessonNeighbours("miking-the-band", lastOfFirstModule.id);
    expect(previous?.id).toBe(lessons[1].id);
    expect(next?.id).toBe(lessons[3].id);
    expect((await lessonNeighbours("miking-the-band", lessons[0].id)).previous).toBeNull();
  });

  it("reads one merged glossary whose seeAlso all resolve", async () => {
    const glossary = await getGlossary();
    const ids = new Set(glossary.map((g) => g.id));
    expect(ids.size).toBe(glossary.length);
    for (const g of glossary) for (const other of g.seeAlso) expect(ids.has(other), `${g.id} → ${other}`).toBe(true);
    expect(fs.existsSync(path.join(process.cwd(), "content/glossary-parts"))).toBe(false);
  });
});

describe("readContent on a broken copy reports problems with file and line", () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "axisline-content-"));
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  function write(rel: string, text: string) {
    fs.mkdirSync(path.dirname(path.join(dir, rel)), { recursive: true });
    fs.writeFileSync(path.join(dir, rel), text);
  }

  const course = {
    id: "course-demo",
    slug: "demo",
    title: "Demo",
    summary: "A demo.",
    level: "foundation",
    outcomes: ["a", "b", "c"],
    version: "1.0.0",
    order: 1,
    modules: [{ id: "mod-one", slug: "one", title: "One", summary: "First.", order: 1 }],
  };
  const front = (id: string, order: number) =>
    `---\nid: ${id}\ntitle: "T"\nsummary: "S"\nobjectives:\n  - "A"\n  - "B"\nminutes: 5\norder: ${order}\npreview: ${order === 1}\nsafety: []\nfigures: []\n---\n`;

  it("collects schema, naming, duplicate-id and MDX syntax problems without throwing", async () => {
    write("glossary.json", "[]");
    write("courses/demo/course.json", JSON.stringify(course));
    write("courses/demo/one/01-first.mdx", `${front("les-demo-a", 1)}\n## Fine\n`);
    write("courses/demo/one/02-second.mdx", `${front("les-demo-a", 2)}\nText\n\n<Callout kind="note">\n`);
    write("courses/demo/one/04-third.mdx", `${front("les-demo-c", 3)}\n## Fine\n`);
    write("courses/demo/stray/01-x.mdx", front("les-demo-x", 1));
    write("courses/bad/course.json", JSON.stringify({ ...course, id: "course-bad", slug: "bad", level: "expert" }));
    const index = await readContent(dir);
    const messages = index.problems.map((p) => `${path.basename(p.file)}:${p.line} ${p.message}`);
    expect(messages).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^course\.json:1 level: /),
        expect.stringMatching(/^stray:1 folder is not a module/),
        expect.stringMatching(/^02-second\.mdx:\d+ MDX does not parse/),
        expect.stringMatching(/^04-third\.mdx:2 file name prefix must be the lesson order/),
      ]),
    );
    // The MDX error points into the body: the frontmatter above it is 13 lines long.
    const mdx = index.problems.find((p) => p.message.startsWith("MDX does not parse"));
    expect(mdx!.line).toBeGreaterThan(13);
    expect(index.courses.map((c) => c.slug)).toEqual(["demo"]);
  });

  it("reports a lesson id used twice", async () => {
    write("courses/demo/one/02-second.mdx", `${front("les-demo-a", 2)}\n## Fine\n`);
    const index = await readContent(dir);
    expect(index.problems.map((p) => p.message)).toContainEqual(expect.stringMatching(/lesson id "les-demo-a" is also used by/));
    expect(index.allLessons).toHaveLength(3);
  });
});
