import "server-only";
// The completion rule of a course for one apprentice (pure rule: lib/assessment/completion.ts):
// lessons from lesson_progress, module quizzes from quiz_attempts (overdue attempts graded first,
// so a finished attempt counts), placement briefs from lib/server/briefs.ts approvedBriefIds.
import { and, eq, inArray } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { enrollments, lessonProgress, quizAttempts } from "@/db/schema";
import { evaluateCompletion, requiredBriefs } from "@/lib/assessment/completion";
import { getCourse } from "@/lib/content";
import { listBriefs } from "@/lib/content/briefs";
import type { CompletionDto } from "@/lib/dto/certificates";
import { closeOverdueAttempts } from "./attempts";
import { approvedBriefIds } from "./briefs";
import { listCourseBanks } from "./quiz-banks";

export const NO_SEAT_MESSAGE = "You don't have a seat on this course, so there is no certificate to earn here.";

/** The checklist of one course for one user, or null when there is no such course. Not an entry point: it takes a user id. */
export async function completionOf(userId: string, courseSlug: string, database: Queryable = db()): Promise<CompletionDto | null> {
  const course = await getCourse(courseSlug);
  if (!course) return null;
  const lessons = course.modules.flatMap((m) => m.lessons).map((l) => ({ id: l.id, title: l.title, href: l.href }));
  const moduleQuizzes = (await listCourseBanks(courseSlug)).filter((b) => b.moduleTitle !== null).map((b) => ({ id: b.bankId, title: b.title, href: "/learn/quizzes" }));
  const { briefs, borrowed } = requiredBriefs(await listBriefs(), courseSlug);

  await database.transaction((tx) => closeOverdueAttempts(tx, userId));
  const done = await database
    .select({ lessonId: lessonProgress.lessonId, completedAt: lessonProgress.completedAt })
    .from(lessonProgress)
    .where(and(eq(lessonProgress.userId, userId), eq(lessonProgress.courseSlug, courseSlug)));
  const bankIds = moduleQuizzes.map((q) => q.id);
  const passed =
    bankIds.length === 0
      ? []
      : await database
          .selectDistinct({ bankId: quizAttempts.bankId })
          .from(quizAttempts)
          .where(and(eq(quizAttempts.userId, userId), inArray(quizAttempts.bankId, bankIds), eq(quizAttempts.passed, true)));
  const approved = new Set<string>();
  for (const slug of new Set(briefs.map((b) => b.courseSlug))) for (const id of await approvedBriefIds(userId, slug, database)) approved.add(id);

  return evaluateCompletion({
    courseSlug,
    courseTitle: course.title,
    lessons,
    moduleQuizzes,
    briefs: briefs.map((b) => ({ id: b.id, title: b.title, courseSlug: b.courseSlug, href: null })),
    borrowedBriefs: borrowed,
    completedLessonIds: new Set(done.filter((d) => d.completedAt).map((d) => d.lessonId)),
    passedBankIds: new Set(passed.map((p) => p.bankId)),
    approvedBriefIds: approved,
  });
}

/** The courses the user has a seat on, in the order the seats were given. */
export async function seatedCourses(userId: string, database: Queryable = db()): Promise<string[]> {
  const rows = await database.select({ courseSlug: enrollments.courseSlug }).from(enrollments).where(eq(enrollments.userId, userId)).orderBy(enrollments.createdAt);
  return rows.map((r) => r.courseSlug);
}
