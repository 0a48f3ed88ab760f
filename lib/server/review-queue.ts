import "server-only";
// The instructor's review queue across their classes: oldest waiting first, filters by class,
// brief and status, counts per status, and how long the oldest waiting submission has waited.
import { and, asc, count, eq, min, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { db as processDb, type Queryable } from "@/db/client";
import { briefReviews, briefSubmissions, classMembers, classes, users } from "@/db/schema";
import { listBriefs } from "@/lib/content/briefs";
import type { ReviewQueueDto, SubmissionStatus } from "@/lib/dto/placements";
import type { Result } from "./errors";
import { guard } from "./guard";
import type { Viewer } from "./viewer";

export type { ReviewQueueDto, QueueItemDto } from "@/lib/dto/placements";

const STATUSES = ["submitted", "redo_requested", "approved"] as const;

// Filters come from the page's query string: anything unusable is dropped, not an error.
const QueueFilters = z.object({
  classId: z.uuid().optional().catch(undefined),
  briefId: z.string().regex(/^brief-[a-z0-9-]+$/).max(100).optional().catch(undefined),
  status: z.enum([...STATUSES, "all"]).default("submitted").catch("submitted"),
});

/** The most rows the queue shows at once; the counts still count everything. */
export const QUEUE_PAGE = 200;

export async function listReviewQueue(viewer: Viewer | null, rawFilters: unknown = {}, database: Queryable = processDb()): Promise<Result<{ queue: ReviewQueueDto }>> {
  const g = guard(viewer, ["instructor"], "The review queue is for instructors.");
  if (!g.ok) return g;
  const filters = QueueFilters.parse(rawFilters ?? {});
  const teaches = and(eq(classMembers.classId, briefSubmissions.classId), eq(classMembers.userId, g.viewer.id), eq(classMembers.role, "instructor"));
  const scope: SQL[] = [];
  if (filters.classId) scope.push(eq(briefSubmissions.classId, filters.classId));
  if (filters.briefId) scope.push(eq(briefSubmissions.briefId, filters.briefId));
  const listed = filters.status === "all" ? scope : [...scope, eq(briefSubmissions.status, filters.status)];

  const [rows, counted, oldest, myClasses, briefs] = await Promise.all([
    database
      .select({
        submissionId: briefSubmissions.id,
        briefId: briefSubmissions.briefId,
        apprenticeName: users.name,
        classId: classes.id,
        className: classes.name,
        attempt: briefSubmissions.attempt,
        status: briefSubmissions.status,
        submittedAt: briefSubmissions.submittedAt,
        reviewedAt: briefSubmissions.reviewedAt,
        waitedSeconds: sql<number>`extract(epoch from coalesce(${briefSubmissions.reviewedAt}, now()) - ${briefSubmissions.submittedAt})::float8`,
        hasDraft: sql<boolean>`coalesce(${briefReviews.state} = 'draft', false)`,
      })
      .from(briefSubmissions)
      .innerJoin(classMembers, teaches)
      .innerJoin(classes, eq(classes.id, briefSubmissions.classId))
      .innerJoin(users, eq(users.id, briefSubmissions.userId))
      .leftJoin(briefReviews, eq(briefReviews.submissionId, briefSubmissions.id))
      .where(and(...listed))
      .orderBy(asc(briefSubmissions.submittedAt), asc(briefSubmissions.id))
      .limit(QUEUE_PAGE),
    database
      .select({ status: briefSubmissions.status, n: count() })
      .from(briefSubmissions)
      .innerJoin(classMembers, teaches)
      .where(and(...scope))
      .groupBy(briefSubmissions.status),
    database
      .select({ at: min(briefSubmissions.submittedAt), seconds: sql<number | null>`extract(epoch from now() - min(${briefSubmissions.submittedAt}))::float8` })
      .from(briefSubmissions)
      .innerJoin(classMembers, teaches)
      .where(and(...scope, eq(briefSubmissions.status, "submitted"))),
    database
      .select({ id: classes.id, name: classes.name, courseSlug: classes.courseSlug })
      .from(classMembers)
      .innerJoin(classes, eq(classes.id, classMembers.classId))
      .where(and(eq(classMembers.userId, g.viewer.id), eq(classMembers.role, "instructor")))
      .orderBy(asc(classes.name)),
    listBriefs(),
  ]);

  const title = new Map(briefs.map((b) => [b.id, b.title]));
  const counts = Object.fromEntries(STATUSES.map((s) => [s, 0])) as Record<SubmissionStatus, number>;
  for (const c of counted) counts[c.status] = c.n;
  const courses = new Set(myClasses.map((c) => c.courseSlug));
  const queue: ReviewQueueDto = {
    items: rows.map((r) => ({ ...r, briefTitle: title.get(r.briefId) ?? r.briefId, submittedAt: r.submittedAt.toISOString(), reviewedAt: r.reviewedAt?.toISOString() ?? null, waitedSeconds: Math.round(r.waitedSeconds) })),
    counts,
    oldestWaitingSeconds: oldest[0]?.seconds == null ? null : Math.round(oldest[0].seconds),
    filters: { classId: filters.classId ?? null, briefId: filters.briefId ?? null, status: filters.status },
    classes: myClasses.map((c) => ({ id: c.id, name: c.name })),
    briefs: briefs.filter((b) => courses.has(b.courseSlug)).map((b) => ({ id: b.id, title: b.title })),
  };
  return { ok: true, queue };
}
