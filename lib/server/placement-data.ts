import "server-only";
// Shared reads of placement submissions for lib/server/briefs.ts (apprentice) and reviews.ts
// (instructor): a brief as its DTO, and submissions with their photos and reviews. Not entry
// points: callers have already decided which submissions the viewer may see.
import { asc, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { briefReviews, briefSubmissions, submissionPhotos, uploads, users } from "@/db/schema";
import { rubricMax } from "@/lib/assessment/rubric";
import type { BriefEntry } from "@/lib/content/briefs";
import type { AttemptDto, BriefContentDto, PhotoDto, ReviewDto } from "@/lib/dto/placements";
import { photoUrl } from "@/lib/dto/uploads";

export function briefContent(b: BriefEntry): BriefContentDto {
  return {
    id: b.id,
    title: b.title,
    courseSlug: b.courseSlug,
    courseTitle: b.courseTitle,
    lessonId: b.lessonId,
    lessonTitle: b.lessonTitle,
    summary: b.summary,
    setting: b.setting,
    task: b.task,
    photos: b.photos,
    rubric: b.rubric,
    maxPoints: rubricMax(b.rubric),
    safety: b.safety,
  };
}

export async function photosOf(database: Queryable, submissionIds: readonly string[]): Promise<Map<string, PhotoDto[]>> {
  const out = new Map<string, PhotoDto[]>();
  if (submissionIds.length === 0) return out;
  const rows = await database
    .select({ id: submissionPhotos.id, submissionId: submissionPhotos.submissionId, uploadId: submissionPhotos.uploadId, caption: submissionPhotos.caption, position: submissionPhotos.position, width: uploads.width, height: uploads.height })
    .from(submissionPhotos)
    .innerJoin(uploads, eq(uploads.id, submissionPhotos.uploadId))
    .where(inArray(submissionPhotos.submissionId, [...submissionIds]))
    .orderBy(asc(submissionPhotos.position));
  for (const r of rows) {
    const list = out.get(r.submissionId) ?? [];
    list.push({ id: r.id, uploadId: r.uploadId, caption: r.caption, position: r.position, width: r.width ?? 0, height: r.height ?? 0, displayUrl: photoUrl(r.uploadId, "display"), thumbUrl: photoUrl(r.uploadId, "thumb") });
    out.set(r.submissionId, list);
  }
  return out;
}

/** Reviews by submission id; drafts only when `withDrafts` (the apprentice never sees a draft). */
export async function reviewsOf(database: Queryable, submissionIds: readonly string[], maxPoints: number, withDrafts: boolean): Promise<Map<string, ReviewDto>> {
  const out = new Map<string, ReviewDto>();
  if (submissionIds.length === 0) return out;
  const rows = await database
    .select({
      submissionId: briefReviews.submissionId,
      state: briefReviews.state,
      scores: briefReviews.scores,
      pins: briefReviews.pins,
      decision: briefReviews.decision,
      comment: briefReviews.comment,
      totalPoints: briefReviews.totalPoints,
      maxPoints: briefReviews.maxPoints,
      version: briefReviews.version,
      updatedAt: briefReviews.updatedAt,
      reviewerName: users.name,
    })
    .from(briefReviews)
    .innerJoin(users, eq(users.id, briefReviews.reviewerId))
    .where(inArray(briefReviews.submissionId, [...submissionIds]));
  for (const r of rows) {
    if (r.state === "draft" && !withDrafts) continue;
    out.set(r.submissionId, { ...r, maxPoints: r.maxPoints ?? maxPoints, updatedAt: r.updatedAt.toISOString() });
  }
  return out;
}

type SubmissionRow = Pick<typeof briefSubmissions.$inferSelect, "id" | "attempt" | "status" | "submittedAt" | "reviewedAt">;

/** Submissions as attempts with their photos and reviews, in the order given. */
export async function attemptsOf(database: Queryable, rows: readonly SubmissionRow[], maxPoints: number, withDrafts: boolean): Promise<AttemptDto[]> {
  const ids = rows.map((r) => r.id);
  const [photos, reviews] = await Promise.all([photosOf(database, ids), reviewsOf(database, ids, maxPoints, withDrafts)]);
  return rows.map((r) => ({
    submissionId: r.id,
    attempt: r.attempt,
    status: r.status,
    submittedAt: r.submittedAt.toISOString(),
    reviewedAt: r.reviewedAt?.toISOString() ?? null,
    photos: photos.get(r.id) ?? [],
    review: reviews.get(r.id) ?? null,
  }));
}
