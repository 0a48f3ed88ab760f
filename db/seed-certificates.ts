// A graduate for the demo and the tests: an apprentice who has done everything the completion
// rule of a course asks (lib/assessment/completion.ts), without the certificate yet, so claiming
// it is one click. Rows are written as the app would leave them: every lesson complete, one
// passed, submitted attempt per module quiz, and an approved submission per required brief.
import { and, eq, sql } from "drizzle-orm";
import type { Database } from "./connection";
import { DEMO_GRADUATE } from "./seed-graduate";
import { briefSubmissions, classMembers, classes, enrollments, lessonProgress, quizAttempts, schoolMembers, users } from "./schema";
import { requiredBriefs } from "@/lib/assessment/completion";
import { listLessons } from "@/lib/content";
import { listBriefs } from "@/lib/content/briefs";
import { hashPassword } from "@/lib/server/passwords";
import { listCourseBanks } from "@/lib/server/quiz-banks";

/** Completes `courseSlug` for the user (who must have a seat in `classId`). Idempotent. */
export async function completeCourseFor(database: Database, userId: string, courseSlug: string, classId: string): Promise<void> {
  const lessons = await listLessons(courseSlug);
  if (lessons.length > 0) {
    await database
      .insert(lessonProgress)
      .values(lessons.map((l) => ({ userId, courseSlug, lessonId: l.id, completedAt: sql`now()`, lastViewedAt: sql`now()` })))
      .onConflictDoUpdate({ target: [lessonProgress.userId, lessonProgress.lessonId], set: { completedAt: sql`coalesce(${lessonProgress.completedAt}, now())` } });
  }
  for (const bank of (await listCourseBanks(courseSlug)).filter((b) => b.moduleTitle !== null)) {
    const [passed] = await database.select({ id: quizAttempts.id }).from(quizAttempts).where(and(eq(quizAttempts.userId, userId), eq(quizAttempts.bankId, bank.bankId), eq(quizAttempts.passed, true)));
    if (passed) continue;
    await database.insert(quizAttempts).values({ userId, bankId: bank.bankId, courseSlug, seed: 1, questionOrder: [], submittedAt: sql`now()`, scorePercent: 100, passed: true });
  }
  const { briefs } = requiredBriefs(await listBriefs(), courseSlug);
  for (const brief of briefs) {
    await database
      .insert(briefSubmissions)
      .values({ briefId: brief.id, courseSlug: brief.courseSlug, userId, classId, attempt: 1, status: "approved", reviewedAt: sql`now()` })
      .onConflictDoNothing();
  }
}

export async function seedGraduate(database: Database): Promise<void> {
  const [klass] = await database.select({ id: classes.id, schoolId: classes.schoolId }).from(classes).where(eq(classes.name, DEMO_GRADUATE.className));
  if (!klass) throw new Error(`seedGraduate: the class "${DEMO_GRADUATE.className}" is not seeded`);
  let [user] = await database.select({ id: users.id }).from(users).where(eq(users.email, DEMO_GRADUATE.email));
  if (!user) {
    [user] = await database
      .insert(users)
      .values({ name: DEMO_GRADUATE.name, email: DEMO_GRADUATE.email, role: "apprentice", passwordHash: await hashPassword(DEMO_GRADUATE.password), emailVerifiedAt: sql`now()` })
      .returning({ id: users.id });
  }
  await database.insert(schoolMembers).values({ schoolId: klass.schoolId, userId: user.id, role: "apprentice" }).onConflictDoNothing();
  await database.insert(classMembers).values({ classId: klass.id, userId: user.id, role: "apprentice" }).onConflictDoNothing();
  await database.insert(enrollments).values({ userId: user.id, courseSlug: DEMO_GRADUATE.courseSlug, source: "class", classId: klass.id }).onConflictDoNothing();
  await completeCourseFor(database, user.id, DEMO_GRADUATE.courseSlug, klass.id);
}
