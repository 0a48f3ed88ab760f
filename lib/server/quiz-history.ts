import "server-only";
// An apprentice's quiz history and the quizzes they can take, with best scores and the topics to
// revisit. Overdue attempts are closed (graded) first, so what is listed is final.
import { and, asc, desc, eq, isNull, sql } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { enrollments, quizAttempts } from "@/db/schema";
import { closeOverdueAttempts, overdue, type AttemptStatus } from "./attempts";
import type { Result } from "./errors";
import { guard } from "./guard";
import { getBankEntry, listCourseBanks } from "./quiz-banks";
import type { Viewer } from "./viewer";

export type AttemptHistoryDto = {
  attemptId: string;
  bankId: string;
  title: string;
  courseSlug: string;
  status: AttemptStatus;
  startedAt: string;
  submittedAt: string | null;
  percent: number | null;
  passed: boolean | null;
};

export type TopicToRevisitDto = { topic: string; bankId: string; bankTitle: string; courseSlug: string };

export type MyAttemptsDto = {
  attempts: AttemptHistoryDto[];
  /** bankId → best percent among submitted attempts. */
  bestPercentByBank: Record<string, number>;
  /** From the latest submitted attempt of each bank: what was still not fully right. */
  topicsToRevisit: TopicToRevisitDto[];
};

async function closeAllOverdue(database: Queryable, userId: string): Promise<void> {
  const [any] = await database
    .select({ id: quizAttempts.id })
    .from(quizAttempts)
    .where(and(eq(quizAttempts.userId, userId), isNull(quizAttempts.submittedAt), overdue))
    .limit(1);
  if (any) await database.transaction((tx) => closeOverdueAttempts(tx, userId));
}

/** The viewer's own attempts, newest first (any signed-in role; only apprentices have any). */
export async function listMyAttempts(viewer: Viewer | null, database: Queryable = db()): Promise<Result<MyAttemptsDto>> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  const me = allowed.viewer;
  await closeAllOverdue(database, me.id);
  const rows = await database
    .select({
      id: quizAttempts.id,
      bankId: quizAttempts.bankId,
      courseSlug: quizAttempts.courseSlug,
      startedAt: quizAttempts.startedAt,
      submittedAt: quizAttempts.submittedAt,
      scorePercent: quizAttempts.scorePercent,
      passed: quizAttempts.passed,
      topics: sql<string[] | null>`${quizAttempts.result} -> 'topicsToRevisit'`,
      timedOut: sql<boolean | null>`(${quizAttempts.result} ->> 'timedOut')::boolean`,
    })
    .from(quizAttempts)
    .where(eq(quizAttempts.userId, me.id))
    .orderBy(desc(quizAttempts.startedAt));
  const attempts: AttemptHistoryDto[] = [];
  const best: Record<string, number> = {};
  const topics: TopicToRevisitDto[] = [];
  const latestSeen = new Set<string>();
  for (const r of rows) {
    const entry = await getBankEntry(r.bankId);
    const title = entry?.bank.title ?? r.bankId;
    const status: AttemptStatus = !r.submittedAt ? "in_progress" : r.timedOut ? "timed_out" : "submitted";
    attempts.push({ attemptId: r.id, bankId: r.bankId, title, courseSlug: r.courseSlug, status, startedAt: r.startedAt.toISOString(), submittedAt: r.submittedAt?.toISOString() ?? null, percent: r.scorePercent, passed: r.passed });
    if (r.submittedAt && r.scorePercent !== null) {
      best[r.bankId] = Math.max(best[r.bankId] ?? 0, r.scorePercent);
      if (!latestSeen.has(r.bankId)) {
        latestSeen.add(r.bankId); // rows are newest first
        for (const topic of r.topics ?? []) topics.push({ topic, bankId: r.bankId, bankTitle: title, courseSlug: r.courseSlug });
      }
    }
  }
  return { ok: true, attempts, bestPercentByBank: best, topicsToRevisit: topics };
}

export type AvailableQuizDto = {
  bankId: string;
  title: string;
  moduleTitle: string | null;
  questionCount: number;
  passingPercent: number;
  timeLimitMinutes: number | null;
  attemptsAllowed: number;
  attemptsUsed: number;
  bestPercent: number | null;
  passed: boolean;
  /** An unsubmitted attempt to resume. */
  openAttemptId: string | null;
};

export type CourseQuizzesDto = { courseSlug: string; courseTitle: string; quizzes: AvailableQuizDto[] };

/** The quizzes of every course the apprentice has a seat on, with what they have used so far. */
export async function listAvailableQuizzes(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ courses: CourseQuizzesDto[] }>> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  const me = allowed.viewer;
  await closeAllOverdue(database, me.id);
  const seats = await database.select({ courseSlug: enrollments.courseSlug }).from(enrollments).where(eq(enrollments.userId, me.id)).orderBy(asc(enrollments.createdAt));
  const mine = await database
    .select({ id: quizAttempts.id, bankId: quizAttempts.bankId, submittedAt: quizAttempts.submittedAt, scorePercent: quizAttempts.scorePercent, passed: quizAttempts.passed })
    .from(quizAttempts)
    .where(eq(quizAttempts.userId, me.id));
  const courses: CourseQuizzesDto[] = [];
  for (const seat of seats) {
    const banks = await listCourseBanks(seat.courseSlug);
    if (banks.length === 0) continue;
    courses.push({
      courseSlug: seat.courseSlug,
      courseTitle: banks[0].courseTitle,
      quizzes: banks.map((b) => {
        const attempts = mine.filter((a) => a.bankId === b.bankId);
        const scores = attempts.filter((a) => a.submittedAt && a.scorePercent !== null).map((a) => a.scorePercent!);
        return {
          bankId: b.bankId,
          title: b.title,
          moduleTitle: b.moduleTitle,
          questionCount: b.questionCount,
          passingPercent: b.passingPercent,
          timeLimitMinutes: b.timeLimitMinutes,
          attemptsAllowed: b.attemptsAllowed,
          attemptsUsed: attempts.length,
          bestPercent: scores.length > 0 ? Math.max(...scores) : null,
          passed: attempts.some((a) => a.passed),
          openAttemptId: attempts.find((a) => !a.submittedAt)?.id ?? null,
        };
      }),
    });
  }
  return { ok: true, courses };
}
