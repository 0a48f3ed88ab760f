// The cross-file rules for placement briefs (content/briefs/*.json), shared by the loader
// (lib/content/briefs.ts) and `npm run content:check`. Pure: files come in as text, lessons as a map.
import { briefSchema, type Brief } from "./brief-schema";
import { modelNumberProblems } from "./lesson-checks";
import { DEFERRAL_PHRASES, deferralsIn } from "./safety-checks";

export type BriefFile = { file: string; text: string };
export type BriefProblem = { file: string; line: number; message: string };

/**
 * Parses every brief and checks: the JSON and the zod contract; the id matches the file name
 * (`kick-inside-beater.json` holds `brief-kick-inside-beater`); ids unique; the lesson exists and
 * belongs to the brief's course; orders unique within a course; no product model numbers; every
 * safety note defers to local codes, venue rules or licensed practice (DEFERRAL_PHRASES), the
 * maker's instructions counting only for the topics that allow them.
 */
export function checkBriefFiles(files: readonly BriefFile[], lessonCourse: ReadonlyMap<string, string>): { briefs: Brief[]; problems: BriefProblem[] } {
  const problems: BriefProblem[] = [];
  const briefs: Brief[] = [];
  const seenIds = new Map<string, string>();
  const seenOrders = new Map<string, string>();
  for (const { file, text } of files) {
    const at = (message: string, line = 1) => problems.push({ file, line, message });
    for (const p of modelNumberProblems(text)) at(p.message, p.line);
    let raw: unknown;
    try {
      raw = JSON.parse(text);
    } catch (err) {
      at(`cannot read JSON: ${(err as Error).message}`);
      continue;
    }
    const parsed = briefSchema.safeParse(raw);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) at(`${issue.path.join(".") || "(brief)"}: ${issue.message}`);
      continue;
    }
    const brief = parsed.data;
    const base = file.split("/").at(-1)!.replace(/\.json$/, "");
    if (brief.id !== `brief-${base}`) at(`id "${brief.id}" must be "brief-${base}" (the file name)`);
    if (seenIds.has(brief.id)) at(`duplicate brief id "${brief.id}" (also in ${seenIds.get(brief.id)})`);
    seenIds.set(brief.id, file);
    const orderKey = `${brief.courseSlug}#${brief.order}`;
    if (seenOrders.has(orderKey)) at(`order ${brief.order} is already used in ${brief.courseSlug} by ${seenOrders.get(orderKey)}`);
    seenOrders.set(orderKey, file);
    const course = lessonCourse.get(brief.lessonId);
    if (!course) at(`lessonId "${brief.lessonId}": no such lesson`);
    else if (course !== brief.courseSlug) at(`lessonId "${brief.lessonId}" belongs to ${course}, not ${brief.courseSlug}`);
    brief.safety.forEach((note, i) => {
      if (deferralsIn(note.text, [note.hazard]).length === 0) {
        at(`safety.${i} (${note.hazard}) does not defer to local codes, venue rules or licensed practice: name one of ${DEFERRAL_PHRASES.map((p) => p.name).join("; ")}`);
      }
    });
    briefs.push(brief);
  }
  briefs.sort((a, b) => a.courseSlug.localeCompare(b.courseSlug) || a.order - b.order);
  return { briefs, problems };
}
