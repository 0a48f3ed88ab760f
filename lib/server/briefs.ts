import "server-only";
// Placement briefs for apprentices: the briefs of their courses with their state, one brief with
// its attempts (final reviews only, pins included), and submitting photos, again after a redo.
// The instructor's side is lib/server/reviews.ts; the instructors' digest mail is review-digest.ts.
import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { z } from "zod";
import { db as processDb, type Database, type Queryable } from "@/db/client";
import { briefSubmissions, classMembers, classes, reviewNotices, submissionPhotos } from "@/db/schema";
import { briefById, listBriefs, type BriefEntry } from "@/lib/content/briefs";
import { PLACEMENT_LIMITS, type BriefDetailDto, type BriefState, type BriefSummaryDto } from "@/lib/dto/placements";
import { attemptsOf, briefContent } from "./placement-data";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import { processedUploadsOwnedBy } from "./uploads";
import type { Viewer } from "./viewer";

export type { BriefDetailDto, BriefSummaryDto } from "@/lib/dto/placements";

/**
 * The ids of the briefs of a course the apprentice has had approved (any attempt), sorted. Not an
 * entry point: it takes a user id, not a viewer; the certificates code calls it for the person
 * whose completion it is deciding (issue 13).
 */
export async function approvedBriefIds(userId: string, courseSlug: string, database: Queryable = processDb()): Promise<string[]> {
  const rows = await database
    .selectDistinct({ briefId: briefSubmissions.briefId })
    .from(briefSubmissions)
    .where(and(eq(briefSubmissions.userId, userId), eq(briefSubmissions.courseSlug, courseSlug), eq(briefSubmissions.status, "approved")));
  return rows.map((r) => r.briefId).sort();
}

/** The apprentice's classes, newest first: a brief is reviewed in the newest class on its course. */
async function apprenticeClasses(database: Queryable, userId: string) {
  return database
    .select({ id: classes.id, name: classes.name, courseSlug: classes.courseSlug })
    .from(classMembers)
    .innerJoin(classes, eq(classes.id, classMembers.classId))
    .where(and(eq(classMembers.userId, userId), eq(classMembers.role, "apprentice")))
    .orderBy(desc(classes.createdAt));
}

/** Per brief: the latest attempt's status and the number of attempts. */
async function briefStates(database: Queryable, userId: string, briefIds: string[]): Promise<Map<string, { state: BriefState; attempts: number }>> {
  const out = new Map<string, { state: BriefState; attempts: number }>();
  if (briefIds.length === 0) return out;
  const rows = await database
    .selectDistinctOn([briefSubmissions.briefId], { briefId: briefSubmissions.briefId, status: briefSubmissions.status, attempt: briefSubmissions.attempt })
    .from(briefSubmissions)
    .where(and(eq(briefSubmissions.userId, userId), inArray(briefSubmissions.briefId, briefIds)))
    .orderBy(briefSubmissions.briefId, desc(briefSubmissions.attempt));
  for (const r of rows) out.set(r.briefId, { state: r.status, attempts: r.attempt });
  return out;
}

/** Apprentice: the briefs of the courses of their classes, each with where they stand. */
export async function listMyBriefs(viewer: Viewer | null, database: Queryable = processDb()): Promise<Result<{ courses: { courseSlug: string; courseTitle: string; briefs: BriefSummaryDto[] }[] }>> {
  const g = guard(viewer, ["apprentice"], "Placement briefs are for apprentices.");
  if (!g.ok) return g;
  const courseSlugs = new Set((await apprenticeClasses(database, g.viewer.id)).map((c) => c.courseSlug));
  const briefs = (await listBriefs()).filter((b) => courseSlugs.has(b.courseSlug));
  const states = await briefStates(database, g.viewer.id, briefs.map((b) => b.id));
  const courses = new Map<string, { courseSlug: string; courseTitle: string; briefs: BriefSummaryDto[] }>();
  for (const b of briefs) {
    const course = courses.get(b.courseSlug) ?? { courseSlug: b.courseSlug, courseTitle: b.courseTitle, briefs: [] };
    const s = states.get(b.id) ?? { state: "not_started" as const, attempts: 0 };
    course.briefs.push({ briefId: b.id, title: b.title, summary: b.summary, lessonId: b.lessonId, lessonTitle: b.lessonTitle, ...s });
    courses.set(b.courseSlug, course);
  }
  return { ok: true, courses: [...courses.values()] };
}

/** A brief of one of the apprentice's courses, or why not. */
async function myBrief(database: Queryable, userId: string, briefId: unknown): Promise<Result<{ brief: BriefEntry; klass: { id: string; name: string } | null }>> {
  const id = z.string().max(100).safeParse(briefId);
  const brief = id.success ? await briefById(id.data) : null;
  if (!brief) return fail("not_found", { message: "There is no such placement brief." });
  const klass = (await apprenticeClasses(database, userId)).find((c) => c.courseSlug === brief.courseSlug) ?? null;
  const past = await database.select({ id: briefSubmissions.id }).from(briefSubmissions).where(and(eq(briefSubmissions.userId, userId), eq(briefSubmissions.briefId, brief.id))).limit(1);
  if (!klass && past.length === 0) return fail("forbidden", { message: "This brief belongs to a course you are not in a class for." });
  return { ok: true, brief, klass: klass ? { id: klass.id, name: klass.name } : null };
}

/** Apprentice: one brief with its rubric and safety notes, and their attempts (newest first, final reviews with pins). */
export async function getMyBrief(viewer: Viewer | null, briefId: unknown, database: Queryable = processDb()): Promise<Result<{ detail: BriefDetailDto }>> {
  const g = guard(viewer, ["apprentice"], "Placement briefs are for apprentices.");
  if (!g.ok) return g;
  const found = await myBrief(database, g.viewer.id, briefId);
  if (!found.ok) return found;
  const { brief, klass } = found;
  const rows = await database
    .select({ id: briefSubmissions.id, attempt: briefSubmissions.attempt, status: briefSubmissions.status, submittedAt: briefSubmissions.submittedAt, reviewedAt: briefSubmissions.reviewedAt })
    .from(briefSubmissions)
    .where(and(eq(briefSubmissions.userId, g.viewer.id), eq(briefSubmissions.briefId, brief.id)))
    .orderBy(desc(briefSubmissions.attempt));
  const content = briefContent(brief);
  const attempts = await attemptsOf(database, rows, content.maxPoints, false);
  const state: BriefState = rows.length > 0 ? rows[0].status : "not_started";
  const canSubmit = klass !== null && (state === "not_started" || state === "redo_requested");
  return { ok: true, detail: { brief: content, state, className: klass?.name ?? null, canSubmit, attempts } };
}

const SubmitInput = z.object({
  briefId: z.string().max(100),
  photos: z
    .array(
      z.object({
        uploadId: z.uuid({ error: "Upload the photo again: its reference is not valid." }),
        caption: z
          .string({ error: "Write a caption for each photo." })
          .trim()
          .min(1, { error: "Write a caption for each photo: what it shows and from where." })
          .max(PLACEMENT_LIMITS.captionChars, { error: `Keep each caption under ${PLACEMENT_LIMITS.captionChars} characters.` }),
      }),
    )
    .min(1, { error: "Add at least one photo." })
    .max(6, { error: "Send at most 6 photos." }),
});

/**
 * Apprentice: sends photos for a brief as a new attempt (the first, or the next after a redo).
 * Only their own processed photos, each with a caption; the count within the brief's min and max.
 * One transaction: the attempt, its photos and a notice for each instructor of the class (the
 * digest job mails them later, batched).
 */
export async function submitBrief(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ submissionId: string; attempt: number }>> {
  const g = guard(viewer, ["apprentice"], "Only apprentices send placement photos.");
  if (!g.ok) return g;
  const parsed = SubmitInput.safeParse(raw);
  if (!parsed.success) {
    const fieldErrors = Object.fromEntries(parsed.error.issues.map((i) => [i.path.join("."), i.message]));
    return fail("invalid_input", { message: parsed.error.issues[0].message, fieldErrors });
  }
  const { photos } = parsed.data;
  const found = await myBrief(database, g.viewer.id, parsed.data.briefId);
  if (!found.ok) return found;
  const { brief, klass } = found;
  if (!klass) return fail("forbidden", { message: "You are no longer in a class on this course, so nobody can review new photos." });
  if (photos.length < brief.photos.min || photos.length > brief.photos.max) {
    return fail("invalid_input", { message: `This brief needs ${brief.photos.min === brief.photos.max ? brief.photos.min : `${brief.photos.min} to ${brief.photos.max}`} photos.` });
  }
  const uploadIds = photos.map((p) => p.uploadId);
  if (new Set(uploadIds).size !== uploadIds.length) return fail("invalid_input", { message: "The same photo is attached twice." });
  const userId = g.viewer.id;

  return database.transaction(async (tx): Promise<Result<{ submissionId: string; attempt: number }>> => {
    // One submitter at a time per apprentice and brief, so two tabs cannot both take attempt n.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${`brief-submit:${userId}:${brief.id}`}, 0))`);
    const owned = await processedUploadsOwnedBy(tx as unknown as Database, userId, uploadIds);
    if (owned.length !== uploadIds.length) return fail("invalid_input", { message: "One of those photos is not ready yet or is not yours. Wait for every photo to finish, or upload it again." });
    const latest = await tx
      .select({ status: briefSubmissions.status, attempt: briefSubmissions.attempt })
      .from(briefSubmissions)
      .where(and(eq(briefSubmissions.userId, userId), eq(briefSubmissions.briefId, brief.id)))
      .orderBy(desc(briefSubmissions.attempt))
      .limit(1);
    if (latest[0]?.status === "submitted") return fail("conflict", { message: "Your photos for this brief are waiting for review. You can send new ones if a redo is asked for." });
    if (latest[0]?.status === "approved") return fail("conflict", { message: "This brief is already approved." });
    const attempt = (latest[0]?.attempt ?? 0) + 1;
    const [row] = await tx.insert(briefSubmissions).values({ briefId: brief.id, courseSlug: brief.courseSlug, userId, classId: klass.id, attempt }).returning({ id: briefSubmissions.id });
    await tx.insert(submissionPhotos).values(photos.map((p, position) => ({ submissionId: row.id, uploadId: p.uploadId, caption: p.caption, position })));
    const instructors = await tx.select({ id: classMembers.userId }).from(classMembers).where(and(eq(classMembers.classId, klass.id), eq(classMembers.role, "instructor")));
    if (instructors.length > 0) await tx.insert(reviewNotices).values(instructors.map((i) => ({ instructorId: i.id, submissionId: row.id })));
    return { ok: true, submissionId: row.id, attempt };
  });
}
