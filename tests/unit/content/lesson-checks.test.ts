// The rules scripts/content-check.ts applies to each lesson (content contract in content.md).
import { describe, expect, it } from "vitest";
import { checkLessonTree, internalLinkProblem, MIN_LESSON_WORDS, modelNumberProblems, type CheckContext } from "@/lib/content/lesson-checks";
import { parseLessonBody } from "@/lib/content/mdx-pipeline";

const ctx: CheckContext = {
  glossaryIds: new Set(["cardioid", "null"]),
  figureNames: new Set(["pickup-pattern", "proximity"]),
  diagramPositions: new Map([["drum-kit", ["kick-inside", "snare-top"]]]),
  lessonCourse: new Map([
    ["les-a", "course-one"],
    ["les-b", "course-two"],
  ]),
  courseSlugs: new Set(["course-one", "course-two"]),
  componentNames: new Set(["Callout", "Figure", "Diagram", "Term", "KeyTakeaways", "Checklist"]),
  calloutKinds: new Set(["note", "tip", "caution", "danger"]),
  safetyTopics: new Set(["hearing", "electrical"]),
};

const prose = `${"Words of honest prose about a stage. ".repeat(Math.ceil(MIN_LESSON_WORDS / 7))}\n\n`;
const ending = "<KeyTakeaways>\n- One point.\n</KeyTakeaways>\n";

function check(body: string, lesson: Partial<{ figures: string[]; safety: string[] }> = {}) {
  return checkLessonTree({ body, bodyStartLine: 10, figures: lesson.figures ?? [], safety: lesson.safety ?? [] }, parseLessonBody(body), ctx).map((p) => p.message);
}

describe("internal links", () => {
  it("resolve to lessons by id inside their own course, glossary terms and Bench figures", () => {
    // content contract: /courses/<course-slug>/<lesson-id>, /glossary#<term-id>, /bench/<figure-name>
    expect(internalLinkProblem("/courses/course-one/les-a", ctx)).toBeNull();
    expect(internalLinkProblem("/courses/course-one", ctx)).toBeNull();
    expect(internalLinkProblem("/glossary#cardioid", ctx)).toBeNull();
    expect(internalLinkProblem("/bench/proximity", ctx)).toBeNull();
    expect(internalLinkProblem("https://example.org/page", ctx)).toBeNull();
  });

  it("say what is wrong when they don't", () => {
    expect(internalLinkProblem("/courses/course-one/les-b", ctx)).toMatch(/belongs to course "course-two"/);
    expect(internalLinkProblem("/courses/course-one/les-zz", ctx)).toMatch(/no lesson "les-zz"/);
    expect(internalLinkProblem("/courses/nowhere/les-a", ctx)).toMatch(/no course "nowhere"/);
    expect(internalLinkProblem("/glossary#cardiod", ctx)).toMatch(/no glossary term "cardiod"/);
    expect(internalLinkProblem("/bench/flanger", ctx)).toMatch(/no figure "flanger"/);
    expect(internalLinkProblem("/learn", ctx)).toMatch(/does not resolve/);
    expect(internalLinkProblem("http://example.org", ctx)).toMatch(/https/);
  });
});

describe("model numbers", () => {
  it("flags letter-and-digit product codes but not standard names of the trade", () => {
    expect(modelNumberProblems("A Tok-00 on the snare.", 4)).toEqual([{ line: 4, message: expect.stringMatching(/"Tok-00" looks like a product model number/) }]);
    expect(modelNumberProblems("Then a Tok1234 overhead.").map((p) => p.message)).toHaveLength(1);
    // IEC 61938 names the phantom variants P12, P12L, P24, P48 and SP48; AES14 is a standard number
    expect(modelNumberProblems("P48 and SP48 per IEC 61938; pins per AES14; a figure-8; 3:1; NIOSH 98-126.")).toEqual([]);
  });
});

describe("checkLessonTree", () => {
  it("passes a lesson that follows the contract", () => {
    const body = `${prose}## Kick\n\nA <Term id="cardioid">cardioid</Term>.\n\n<Diagram name="drum-kit" highlight="kick-inside" />\n\n<Callout kind="danger" hazard="hearing" title="Ears">Protect them, under the venue's noise policy.</Callout>\n\n${ending}`;
    expect(check(body, { figures: ["drum-kit"], safety: ["hearing"] })).toEqual([]);
  });

  it("needs exactly one KeyTakeaways, at the end", () => {
    expect(check(prose)).toContainEqual(expect.stringMatching(/exactly one <KeyTakeaways> \(found 0\)/));
    expect(check(`${prose}${ending}\nTrailing words.\n`)).toContainEqual("must end with <KeyTakeaways>");
    expect(check(`${prose}${ending}\n${ending}`)).toContainEqual(expect.stringMatching(/found 2/));
  });

  it("compares frontmatter figures with what the body uses", () => {
    const messages = check(`${prose}<Figure name="proximity" distanceM={0.05} />\n\n${ending}`, { figures: ["pickup-pattern"] });
    expect(messages).toContainEqual(expect.stringMatching(/missing proximity/));
    expect(messages).toContainEqual(expect.stringMatching(/lists pickup-pattern, which the body does not use/));
  });

  it("reports unknown names, positions, kinds and terms with the line they are on", () => {
    const body = `${prose}<Figure name="flanger" />\n\n<Diagram name="drum-kit" highlight="kick-insde" />\n\n<Callout kind="warning">x</Callout>\n\n<Term id="cardiod">c</Term>\n\n<Widget />\n\n${ending}`;
    const problems = checkLessonTree({ body, bodyStartLine: 10, figures: ["flanger", "drum-kit"], safety: [] }, parseLessonBody(body), ctx);
    const text = problems.map((p) => p.message).join("\n");
    expect(text).toMatch(/<Figure name="flanger">: no such figure/);
    expect(text).toMatch(/no position "kick-insde"/);
    expect(text).toMatch(/<Callout kind="warning">/);
    expect(text).toMatch(/<Term id="cardiod">: not in content\/glossary.json/);
    expect(text).toMatch(/unknown component <Widget>/);
    // the Figure is on body line 3 (after two lines of prose and a blank), so file line 12
    expect(problems.find((p) => p.message.includes("flanger"))?.line).toBe(12);
  });

  it("refuses h1, expressions, images and short lessons", () => {
    expect(check(`# Title\n\n${prose}${ending}`)).toContainEqual(expect.stringMatching(/no # h1/));
    expect(check(`${prose}Sum {1+1}\n\n${ending}`)).toContainEqual(expect.stringMatching(/expressions are not allowed/));
    expect(check(`${prose}![a photo](/x.png)\n\n${ending}`)).toContainEqual(expect.stringMatching(/images are not allowed/));
    expect(check(`Too short.\n\n${ending}`)).toContainEqual(expect.stringMatching(/only \d+ words of prose \(at least 500\)/));
  });

  it("needs a danger or caution callout when a lesson touches a safety topic", () => {
    // rules.md: where the topic can hurt someone, show the usual cautions (the full rule: safety-checks.test.ts)
    expect(check(`${prose}${ending}`, { safety: ["electrical"] })).toContainEqual('safety tag "electrical" has no caution or danger <Callout hazard="electrical">');
  });
});
