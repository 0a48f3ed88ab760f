import "server-only";
// The instructors' "new work to review" mail, batched: a submission writes one review_notices row
// per instructor of the class (lib/server/briefs.ts); each run of the review-digest job
// (lib/jobs/review-digest.ts, every REVIEW_DIGEST_MINUTES) turns every instructor's undigested
// notices into ONE message through the outbox and marks them digested, in one transaction.
// So an instructor gets at most one such mail per run however many apprentices submit.
// Not an entry point: no viewer; only the worker calls it.
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { briefSubmissions, classes, reviewNotices, users } from "@/db/schema";
import { alias } from "drizzle-orm/pg-core";
import { listBriefs } from "@/lib/content/briefs";
import type { ReviewDigestItem } from "@/lib/email/placement-templates";
import { enqueueMail } from "@/lib/email/outbox";

/** How often the digest runs (the job's cron): the longest an instructor waits to hear of new work. */
export const REVIEW_DIGEST_MINUTES = 10;

export async function sendReviewDigests(database: Database, baseUrl: string): Promise<{ mails: number; notices: number }> {
  const titles = new Map((await listBriefs()).map((b) => [b.id, b.title]));
  return database.transaction(async (tx) => {
    const instructor = alias(users, "instructor");
    const apprentice = alias(users, "apprentice");
    // SKIP LOCKED: a second worker running at the same moment takes none of these rows twice.
    const rows = await tx
      .select({
        noticeId: reviewNotices.id,
        instructorId: reviewNotices.instructorId,
        instructorEmail: instructor.email,
        instructorName: instructor.name,
        apprentice: apprentice.name,
        briefId: briefSubmissions.briefId,
        className: classes.name,
        attempt: briefSubmissions.attempt,
      })
      .from(reviewNotices)
      .innerJoin(instructor, eq(instructor.id, reviewNotices.instructorId))
      .innerJoin(briefSubmissions, eq(briefSubmissions.id, reviewNotices.submissionId))
      .innerJoin(apprentice, eq(apprentice.id, briefSubmissions.userId))
      .innerJoin(classes, eq(classes.id, briefSubmissions.classId))
      .where(and(isNull(reviewNotices.digestedAt), eq(instructor.status, "active")))
      .orderBy(asc(reviewNotices.instructorId), asc(reviewNotices.createdAt))
      .for("update", { of: reviewNotices, skipLocked: true });
    const byInstructor = new Map<string, { email: string; name: string; items: ReviewDigestItem[] }>();
    for (const r of rows) {
      const entry = byInstructor.get(r.instructorId) ?? { email: r.instructorEmail, name: r.instructorName, items: [] };
      entry.items.push({ apprentice: r.apprentice, briefTitle: titles.get(r.briefId) ?? r.briefId, className: r.className, attempt: r.attempt });
      byInstructor.set(r.instructorId, entry);
    }
    for (const entry of byInstructor.values()) {
      await enqueueMail(tx, entry.email, { template: "review_digest", name: entry.name, items: entry.items, url: `${baseUrl}/teach/reviews` });
    }
    if (rows.length > 0) {
      await tx
        .update(reviewNotices)
        .set({ digestedAt: sql`now()` })
        .where(sql`${reviewNotices.id} in (${sql.join(rows.map((r) => sql`${r.noticeId}`), sql`, `)})`);
    }
    return { mails: byInstructor.size, notices: rows.length };
  });
}
