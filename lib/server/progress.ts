import "server-only";
// Lesson progress: completion (enrolled apprentices only), "continue where you left off", and the
// percentages per module and course for the apprentice home, the course page and the instructor.
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { classMembers, classes, enrollments, lessonProgress, users } from "@/db/schema";
import type { CourseProgressDto, LessonLinkDto, ProgressOverviewDto } from "@/lib/dto/progress";
import { getCourse, listCourses, type Course } from "@/lib/content";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import { LessonRefInput, SEAT_NEEDED_MESSAGE } from "./lessons";
import type { Viewer } from "./viewer";

export type { CourseProgressDto, LessonLinkDto, ModuleProgressDto, ProgressOverviewDto } from "@/lib/dto/progress";

export type ProgressRow = { lessonId: string; completedAt: Date | null; lastViewedAt: Date | null };

/** Whole percent, rounded down so 99.5 % never shows as done. */
export function percentOf(done: number, total: number): number {
  return total > 0 ? Math.floor((done / total) * 100) : 0;
}

/** Pure: a course's progress from the viewer's rows (rows for lessons no longer in the course are ignored). */
export function summarizeCourse(course: Course, rows: ProgressRow[]): CourseProgressDto {
  const lessons = course.modules.flatMap((m) => m.lessons);
  const byId = new Map(rows.map((r) => [r.lessonId, r]));
  const isDone = (id: string) => Boolean(byId.get(id)?.completedAt);
  const modules = course.modules.map((m) => {
    const done = m.lessons.filter((l) => isDone(l.id)).length;
    return { slug: m.slug, title: m.title, completedLessons: done, totalLessons: m.lessons.length, percent: percentOf(done, m.lessons.length) };
  });
  const completedLessonIds = lessons.filter((l) => isDone(l.id)).map((l) => l.id);

  const viewed = lessons
    .map((l, index) => ({ index, at: byId.get(l.id)?.lastViewedAt ?? null }))
    .filter((v): v is { index: number; at: Date } => v.at !== null)
    .sort((a, b) => b.at.getTime() - a.at.getTime());
  const start = viewed[0]?.index ?? 0;
  const order = [...lessons.slice(start), ...lessons.slice(0, start)];
  const resume = order.find((l) => !isDone(l.id)) ?? null;

  return {
    courseSlug: course.slug,
    title: course.title,
    href: `/courses/${course.slug}`,
    completedLessons: completedLessonIds.length,
    totalLessons: lessons.length,
    percent: percentOf(completedLessonIds.length, lessons.length),
    modules,
    completedLessonIds,
    continueLesson: resume ? { lessonId: resume.id, title: resume.title, href: resume.href } : null,
    lastViewedAt: viewed[0]?.at.toISOString() ?? null,
  };
}

export const MarkCompleteInput = LessonRefInput.extend({ completed: z.boolean().default(true) });

/** Marks (or un-marks) a lesson complete. Only an apprentice with a seat on the course; the seat is checked in the same statement. */
export async function markLessonComplete(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ completedAt: string | null }>> {
  const allowed = guard(viewer, ["apprentice"], "Only apprentices keep lesson progress.");
  if (!allowed.ok) return allowed;
  const apprentice = allowed.viewer;
  const parsed = MarkCompleteInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const { courseSlug, lessonId, completed } = parsed.data;
  const course = await getCourse(courseSlug);
  if (!course?.modules.some((m) => m.lessons.some((l) => l.id === lessonId))) return fail("not_found", { message: "There is no such lesson in this course." });

  const completedAt = completed ? sql`now()` : sql`null`;
  // A second "complete" keeps the first completion time.
  const onConflictCompletedAt = completed ? sql`coalesce(${lessonProgress.completedAt}, now())` : sql`null`;
  const rows = await database
    .insert(lessonProgress)
    .select(
      database
        .select({
          userId: enrollments.userId,
          courseSlug: enrollments.courseSlug,
          lessonId: sql<string>`${lessonId}`.as("lesson_id"),
          completedAt: sql<Date | null>`${completedAt}::timestamptz`.as("completed_at"),
          lastViewedAt: sql<Date>`now()`.as("last_viewed_at"),
        })
        .from(enrollments)
        .where(and(eq(enrollments.userId, apprentice.id), eq(enrollments.courseSlug, courseSlug))),
    )
    .onConflictDoUpdate({ target: [lessonProgress.userId, lessonProgress.lessonId], set: { completedAt: onConflictCompletedAt } })
    .returning({ completedAt: lessonProgress.completedAt });
  if (rows.length === 0) return fail("forbidden", { message: SEAT_NEEDED_MESSAGE });
  return { ok: true, completedAt: rows[0].completedAt?.toISOString() ?? null };
}

/** The viewer's progress on every course they have a seat on, in catalog order (any signed-in role; no seat, no courses). */
export async function getProgressOverview(viewer: Viewer | null, database: Queryable = db()): Promise<Result<ProgressOverviewDto>> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  const me = allowed.viewer;
  // One statement: each seat, with its course's progress rows (none yet: one row of nulls).
  const rows = await database
    .select({ courseSlug: enrollments.courseSlug, lessonId: lessonProgress.lessonId, completedAt: lessonProgress.completedAt, lastViewedAt: lessonProgress.lastViewedAt })
    .from(enrollments)
    .leftJoin(lessonProgress, and(eq(lessonProgress.userId, enrollments.userId), eq(lessonProgress.courseSlug, enrollments.courseSlug)))
    .where(eq(enrollments.userId, me.id));
  const byCourse = groupBy(rows, (r) => r.courseSlug);
  const courses = (await listCourses())
    .filter((c) => byCourse.has(c.slug))
    .map((c) => summarizeCourse(c, progressRows(byCourse.get(c.slug)!)));
  return { ok: true, courses };
}

function groupBy<T>(rows: readonly T[], key: (row: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const row of rows) {
    const k = key(row);
    const group = groups.get(k);
    if (group) group.push(row);
    else groups.set(k, [row]);
  }
  return groups;
}

/** The progress rows of a left join (a person or seat without progress has one row of nulls). */
function progressRows(rows: readonly { lessonId: string | null; completedAt: Date | null; lastViewedAt: Date | null }[]): ProgressRow[] {
  return rows.filter((r): r is ProgressRow => r.lessonId !== null);
}

export type ApprenticeProgressDto = {
  userId: string;
  name: string;
  completedLessons: number;
  totalLessons: number;
  percent: number;
  modulePercents: Record<string, number>;
  lastViewedAt: string | null;
  continueLesson: LessonLinkDto | null;
};

const NO_SUCH_CLASS = "We couldn't find that class among the classes you teach.";

export type ClassProgressDto = {
  classId: string;
  name: string;
  term: string;
  courseSlug: string;
  courseTitle: string;
  modules: { slug: string; title: string }[];
  apprentices: ApprenticeProgressDto[];
};

/**
 * Each apprentice's progress in a class. Instructors only (others: forbidden); an instructor who
 * does not teach that class gets not_found, the same as for no such class, so ids can't be probed.
 */
export async function listClassProgress(viewer: Viewer | null, classId: string, database: Queryable = db()): Promise<Result<{ progress: ClassProgressDto }>> {
  const allowed = guard(viewer, ["instructor"]);
  if (!allowed.ok) return allowed;
  const instructor = allowed.viewer;
  if (!z.uuid().safeParse(classId).success) return fail("not_found", { message: NO_SUCH_CLASS });
  const [klass] = await database
    .select({ id: classes.id, name: classes.name, term: classes.term, courseSlug: classes.courseSlug })
    .from(classes)
    .innerJoin(classMembers, and(eq(classMembers.classId, classes.id), eq(classMembers.userId, instructor.id), eq(classMembers.role, "instructor")))
    .where(eq(classes.id, classId));
  if (!klass) return fail("not_found", { message: NO_SUCH_CLASS });
  const course = await getCourse(klass.courseSlug);
  const people = await database
    .select({ userId: users.id, name: users.name })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(and(eq(classMembers.classId, klass.id), eq(classMembers.role, "apprentice")))
    .orderBy(asc(users.name));
  // Two statements, not a join: with the ids listed, lesson_progress is read through
  // lesson_progress_user_course_idx; joined (even LATERAL, which the planner flattens) it chose to
  // hash the whole table (bench:dashboards: about 4 to 6 ms against under 1 ms at 46,000 rows).
  const rows =
    people.length === 0
      ? []
      : await database
          .select({ userId: lessonProgress.userId, lessonId: lessonProgress.lessonId, completedAt: lessonProgress.completedAt, lastViewedAt: lessonProgress.lastViewedAt })
          .from(lessonProgress)
          .where(and(inArray(lessonProgress.userId, people.map((p) => p.userId)), eq(lessonProgress.courseSlug, klass.courseSlug)));
  const byPerson = groupBy(rows, (r) => r.userId);
  const apprentices = people.map((p) => {
    const mine = byPerson.get(p.userId) ?? [];
    const summary = course ? summarizeCourse(course, progressRows(mine)) : null;
    return {
      userId: p.userId,
      name: p.name,
      completedLessons: summary?.completedLessons ?? 0,
      totalLessons: summary?.totalLessons ?? 0,
      percent: summary?.percent ?? 0,
      modulePercents: Object.fromEntries((summary?.modules ?? []).map((m) => [m.slug, m.percent])),
      lastViewedAt: summary?.lastViewedAt ?? null,
      continueLesson: summary?.continueLesson ?? null,
    };
  });
  return {
    ok: true,
    progress: {
      classId: klass.id,
      name: klass.name,
      term: klass.term,
      courseSlug: klass.courseSlug,
      courseTitle: course?.title ?? klass.courseSlug,
      modules: (course?.modules ?? []).map((m) => ({ slug: m.slug, title: m.title })),
      apprentices,
    },
  };
}
