// The completion rule of a course, pure (lib/server/completion.ts reads the rows and calls it):
//   1. every lesson complete;
//   2. every module quiz passed (a bank with a module; the course's final quiz is not part of
//      the rule, as issue 13 words it) — passed = some submitted attempt reached the bank's pass mark;
//   3. every placement brief of the course approved; a course with no briefs of its own counts
//      the first two briefs of the catalogue instead (in catalogue order), so every certificate
//      rests on at least two placements an instructor has seen.
import type { ChecklistItem, CompletionDto } from "@/lib/dto/certificates";

export const BORROWED_BRIEFS = 2;

type Named = { id: string; title: string; href?: string | null };
export type BriefRef = Named & { courseSlug: string };

export type CompletionFacts = {
  courseSlug: string;
  courseTitle: string;
  lessons: Named[];
  moduleQuizzes: Named[];
  /** The briefs the course requires (see requiredBriefs). */
  briefs: BriefRef[];
  borrowedBriefs: boolean;
  completedLessonIds: ReadonlySet<string>;
  passedBankIds: ReadonlySet<string>;
  approvedBriefIds: ReadonlySet<string>;
};

/** The course's own briefs, or (none) the first two of the whole catalogue. `all` is in catalogue order. */
export function requiredBriefs<T extends { courseSlug: string }>(all: readonly T[], courseSlug: string): { briefs: T[]; borrowed: boolean } {
  const own = all.filter((b) => b.courseSlug === courseSlug);
  return own.length > 0 ? { briefs: own, borrowed: false } : { briefs: all.slice(0, BORROWED_BRIEFS), borrowed: true };
}

function count(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function listOf(words: string[]): string {
  return words.length <= 1 ? (words[0] ?? "") : `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`;
}

/** "Still to do: 3 lessons, 1 module quiz (Drums) and 2 placement briefs (Kick inside the beater, …)." */
export function missingSentence(items: readonly ChecklistItem[]): string {
  const open = (kind: ChecklistItem["kind"]) => items.filter((i) => i.kind === kind && !i.done);
  const lessons = open("lesson");
  const quizzes = open("quiz");
  const briefs = open("brief");
  const parts: string[] = [];
  if (lessons.length > 0) parts.push(`complete ${count(lessons.length, "lesson", "lessons")}`);
  if (quizzes.length > 0) parts.push(`pass ${count(quizzes.length, "module quiz", "module quizzes")} (${quizzes.map((q) => q.title).join(", ")})`);
  if (briefs.length > 0) parts.push(`have ${count(briefs.length, "placement brief", "placement briefs")} approved (${briefs.map((b) => b.title).join(", ")})`);
  if (parts.length === 0) return "";
  return `Before the certificate can be issued, ${listOf(parts)}.`;
}

export function evaluateCompletion(f: CompletionFacts): CompletionDto {
  const items: ChecklistItem[] = [
    ...f.lessons.map((l) => ({ kind: "lesson" as const, id: l.id, title: l.title, href: l.href ?? null, done: f.completedLessonIds.has(l.id) })),
    ...f.moduleQuizzes.map((q) => ({ kind: "quiz" as const, id: q.id, title: q.title, href: q.href ?? null, done: f.passedBankIds.has(q.id) })),
    ...f.briefs.map((b) => ({ kind: "brief" as const, id: b.id, title: b.title, href: b.href ?? null, done: f.approvedBriefIds.has(b.id) })),
  ];
  // A course with nothing to do is not complete: there is nothing to certify.
  const complete = items.length > 0 && items.every((i) => i.done);
  return { courseSlug: f.courseSlug, courseTitle: f.courseTitle, items, complete, missing: complete ? "" : missingSentence(items) || "This course has nothing to complete yet.", borrowedBriefs: f.borrowedBriefs };
}
