import "server-only";
// Locked lesson bodies leave the server only through here, after an access check.
import { and, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { classMembers, classes, enrollments, lessonProgress } from "@/db/schema";
import { getLesson, glossaryLookup, lessonHref } from "@/lib/content";
import { buildLessonTree } from "@/lib/content/lesson-tree";
import type { LessonTreeNode } from "@/lib/content/lesson-tree-types";
import { fail, type Failure, type Result } from "./errors";
import type { Viewer } from "./viewer";

const slugPart = z.string().trim().min(1).max(120).regex(/^[a-z0-9-]+$/);

export const LessonRefInput = z.object({ courseSlug: slugPart, lessonId: slugPart });
export type LessonRef = z.infer<typeof LessonRefInput>;

export const SEAT_NEEDED_MESSAGE = "This lesson is part of the course; ask your school for a seat.";
export const SIGN_IN_NEEDED_MESSAGE = "This lesson is part of the course. Sign in with the account your school enrolled to read it.";

/** Why a viewer may read a course's locked lessons: a seat of their own, teaching a class on it, or admin. */
export type CourseAccess = "enrolled" | "teaching" | "admin";

async function courseAccess(viewer: Viewer | null, courseSlug: string, database: Queryable): Promise<CourseAccess | null> {
  if (!viewer) return null;
  if (viewer.role === "admin") return "admin";
  const [seat] = await database
    .select({ id: enrollments.id })
    .from(enrollments)
    .where(and(eq(enrollments.userId, viewer.id), eq(enrollments.courseSlug, courseSlug)))
    .limit(1);
  if (seat) return "enrolled";
  const [taught] = await database
    .select({ id: classes.id })
    .from(classMembers)
    .innerJoin(classes, eq(classes.id, classMembers.classId))
    .where(and(eq(classMembers.userId, viewer.id), eq(classMembers.role, "instructor"), eq(classes.courseSlug, courseSlug)))
    .limit(1);
  return taught ? "teaching" : null;
}

/**
 * The courses whose locked lessons the viewer may read (admins: every course, returned as "all").
 * A predicate for other data-access functions (search), not an entry point of its own.
 */
export async function readableCourseSlugs(viewer: Viewer | null, database: Queryable = db()): Promise<Set<string> | "all"> {
  if (!viewer) return new Set();
  if (viewer.role === "admin") return "all";
  const seats = await database.select({ slug: enrollments.courseSlug }).from(enrollments).where(eq(enrollments.userId, viewer.id));
  const taught = await database
    .select({ slug: classes.courseSlug })
    .from(classMembers)
    .innerJoin(classes, eq(classes.id, classMembers.classId))
    .where(and(eq(classMembers.userId, viewer.id), eq(classMembers.role, "instructor")));
  return new Set([...seats, ...taught].map((r) => r.slug));
}

/** "Resume where you left off": remembers the last lesson an enrolled apprentice opened. */
async function recordLessonView(viewer: Viewer, ref: LessonRef, database: Queryable): Promise<void> {
  await database
    .insert(lessonProgress)
    .values({ userId: viewer.id, courseSlug: ref.courseSlug, lessonId: ref.lessonId, lastViewedAt: sql`now()` })
    .onConflictDoUpdate({ target: [lessonProgress.userId, lessonProgress.lessonId], set: { lastViewedAt: sql`now()` } });
}

export type LessonBodyDto = {
  courseSlug: string;
  lessonId: string;
  title: string;
  tree: LessonTreeNode[];
  /** ISO time the viewer completed the lesson, if they have a seat and did. */
  completedAt: string | null;
};

export type LessonBodyFailure = Failure & { signInHref?: string };

// Trees are built once per process; the content is part of the build.
const trees = new Map<string, Promise<LessonTreeNode[]>>();

async function treeOf(lessonId: string, body: string): Promise<LessonTreeNode[]> {
  if (process.env.NODE_ENV === "development") return buildLessonTree(body, await glossaryLookup());
  let tree = trees.get(lessonId);
  if (!tree) {
    tree = glossaryLookup().then((glossary) => buildLessonTree(body, glossary));
    trees.set(lessonId, tree);
    tree.catch(() => trees.delete(lessonId));
  }
  return tree;
}

/**
 * A lesson body for the player. Preview lessons: anyone. Locked lessons: signed out → 401 with
 * a sign-in link; signed in without a seat → 403. An enrolled viewer's visit is recorded.
 */
export async function getLessonBody(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ lesson: LessonBodyDto }> | LessonBodyFailure> {
  const parsed = LessonRefInput.safeParse(raw);
  if (!parsed.success) return fail("not_found");
  const ref = parsed.data;
  const lesson = await getLesson(ref.courseSlug, ref.lessonId);
  if (!lesson) return fail("not_found", { message: "There is no such lesson in this course." });

  const access = await courseAccess(viewer, ref.courseSlug, database);
  if (!lesson.preview && !access) {
    if (!viewer) return { ...fail("not_signed_in", { message: SIGN_IN_NEEDED_MESSAGE }), signInHref: `/sign-in?next=${encodeURIComponent(lessonHref(ref.courseSlug, ref.lessonId))}` };
    return fail("forbidden", { message: SEAT_NEEDED_MESSAGE });
  }

  let completedAt: string | null = null;
  if (viewer && access === "enrolled") {
    await recordLessonView(viewer, ref, database);
    const [row] = await database
      .select({ completedAt: lessonProgress.completedAt })
      .from(lessonProgress)
      .where(and(eq(lessonProgress.userId, viewer.id), eq(lessonProgress.lessonId, ref.lessonId)));
    completedAt = row?.completedAt?.toISOString() ?? null;
  }
  return {
    ok: true,
    lesson: { courseSlug: lesson.courseSlug, lessonId: lesson.id, title: lesson.title, tree: await treeOf(lesson.id, lesson.body), completedAt },
  };
}
