// Placement briefs (content/briefs/*.json) and their checks (lib/content/brief-checks.ts): every
// shipped brief passes, and each rule refuses a broken copy. Safety wording rule: the project's
// deferral phrases (lib/content/safety-checks.ts), common practice in the trade's safety guidance.
import { beforeAll, describe, expect, it } from "vitest";
import { checkBriefFiles, type BriefFile } from "@/lib/content/brief-checks";
import { briefById, listBriefs, readBriefFiles } from "@/lib/content/briefs";
import { listAllLessons } from "@/lib/content";
import { rubricMax } from "@/lib/assessment/rubric";

let files: BriefFile[];
let kick: BriefFile;
let lessonCourse: Map<string, string>;

beforeAll(async () => {
  files = await readBriefFiles();
  kick = files.find((f) => f.file.endsWith("kick-inside-beater.json"))!;
  lessonCourse = new Map((await listAllLessons()).map((l) => [l.id, l.courseSlug]));
}, 60_000);

/** A copy of the kick brief with one change made to its parsed JSON. */
function broken(change: (brief: Record<string, unknown>) => void): BriefFile[] {
  const brief = JSON.parse(kick.text) as Record<string, unknown>;
  change(brief);
  return [{ file: kick.file, text: JSON.stringify(brief, null, 2) }];
}
const messages = (f: BriefFile[]) => checkBriefFiles(f, lessonCourse).problems.map((p) => p.message);

describe("the shipped briefs", () => {
  it("parse and pass every check, at least 8 of them, attached to lessons of their courses", async () => {
    const { briefs, problems } = checkBriefFiles(files, lessonCourse);
    expect(problems).toEqual([]);
    expect(briefs.length).toBeGreaterThanOrEqual(8);
    for (const b of briefs) expect(lessonCourse.get(b.lessonId)).toBe(b.courseSlug);
    const loaded = await listBriefs();
    expect(loaded.map((b) => b.id)).toEqual(briefs.map((b) => b.id));
    expect(loaded.every((b) => b.lessonTitle.length > 0 && b.courseTitle.length > 0)).toBe(true);
  });

  it("each asks for a measurement in shot, has a rubric worth something and safety notes", async () => {
    for (const b of await listBriefs()) {
      expect(b.photos.measure, b.id).toMatch(/\b(?:cm|centimetres|tape|length)\b/);
      expect(rubricMax(b.rubric), b.id).toBeGreaterThanOrEqual(6);
      expect(b.safety.length, b.id).toBeGreaterThanOrEqual(1);
    }
  });

  it("briefById finds one and answers null for an unknown id", async () => {
    expect((await briefById("brief-kick-inside-beater"))?.lessonId).toBe("les-mtb-kick-snare-hihat");
    expect(await briefById("brief-nothing")).toBeNull();
  });
});

describe("the checks refuse a broken brief", () => {
  it("a lesson of another course, or no such lesson", () => {
    expect(messages(broken((b) => (b.lessonId = "les-ssp-cable-runs")))).toEqual([expect.stringMatching(/belongs to safe-stage-practice, not/)]);
    expect(messages(broken((b) => (b.lessonId = "les-nowhere")))).toEqual(['lessonId "les-nowhere": no such lesson']);
  });

  it("a safety note that defers to nobody, or to the maker where only a venue or the law may decide", () => {
    expect(messages(broken((b) => ((b.safety as { hazard: string; text: string }[])[0] = { hazard: "hearing", text: "Wear earplugs near the kit." })))).toEqual([
      expect.stringMatching(/^safety\.0 \(hearing\) does not defer/),
    ]);
    expect(messages(broken((b) => ((b.safety as { hazard: string; text: string }[])[0] = { hazard: "stands-overhead", text: "Follow the maker's instructions for the boom." })))).toEqual([
      expect.stringMatching(/^safety\.0 \(stands-overhead\) does not defer/),
    ]);
  });

  it("an id that is not the file's name, a duplicate, and a repeated order", () => {
    expect(messages(broken((b) => (b.id = "brief-other")))).toEqual([expect.stringMatching(/must be "brief-kick-inside-beater"/)]);
    const twice = [kick, { file: "content/briefs/copy.json", text: kick.text }];
    expect(messages(twice)).toEqual(expect.arrayContaining([expect.stringMatching(/duplicate brief id/), expect.stringMatching(/order 1 is already used/)]));
  });

  it("rubric levels out of order or without a 0 level, and more shots than photos", () => {
    const rubric = (b: Record<string, unknown>) => (b.rubric as { levels: { points: number; label: string; descriptor: string }[] }[])[0];
    expect(messages(broken((b) => rubric(b).levels.reverse()))).toEqual(expect.arrayContaining([expect.stringMatching(/levels go from the most points/)]));
    expect(messages(broken((b) => rubric(b).levels.pop()))).toEqual([expect.stringMatching(/last level is worth 0/)]);
    expect(messages(broken((b) => ((b.photos as { max: number }).max = 2)))).toEqual([expect.stringMatching(/more shots asked for than photos allowed/)]);
  });

  it("something that looks like a product model number", () => {
    expect(messages(broken((b) => (b.summary = "Use a ZX-300 on the kick.")))).toEqual([expect.stringMatching(/looks like a product model number/)]);
  });
});
