import "server-only";
// Placement briefs for apprentices: the briefs of their courses with their state, submitting
// photos, resubmitting after a redo. The instructor's side is lib/server/reviews.ts.
import { and, eq } from "drizzle-orm";
import { db as processDb, type Queryable } from "@/db/client";
import { briefSubmissions } from "@/db/schema";

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
