import "server-only";
// Reviewing a placement submission (instructors of the apprentice's class only): the review page's
// data, autosaving the draft (pins, scores, comment) and finalizing it with a decision. The total
// is computed here from the brief's rubric (lib/assessment/rubric.ts), never taken from a browser.
import { and, desc, eq, isNull, lt, sql } from "drizzle-orm";
import { z } from "zod";
import { db as processDb, type Database, type Queryable } from "@/db/client";
import { briefReviews, briefSubmissions, classMembers, classes, reviewNotices, submissionPhotos, users } from "@/db/schema";
import { rubricTotal, scoreProblems } from "@/lib/assessment/rubric";
import { briefById } from "@/lib/content/briefs";
import { PLACEMENT_LIMITS, type ReviewDecision, type ReviewViewDto, type SavedReviewDto } from "@/lib/dto/placements";
import { enqueueMail } from "@/lib/email/outbox";
import { env } from "@/lib/env";
import { writeAudit } from "./audit";
import { fail, type Failure, type Result } from "./errors";
import { guard } from "./guard";
import { attemptsOf, briefContent, photosOf, reviewsOf } from "./placement-data";
import type { Viewer } from "./viewer";

export type { ReviewViewDto } from "@/lib/dto/placements";

const GUARD_MESSAGE = "Only the instructors of the apprentice's class review placement photos.";
const NOT_FOUND = "There is no such submission in a class you teach.";

/** The submission, if the viewer teaches its class; `lock` takes it FOR UPDATE (inside a transaction). */
async function taught(database: Queryable, viewerId: string, submissionId: string, lock = false) {
  const q = database
    .select({ id: briefSubmissions.id, briefId: briefSubmissions.briefId, userId: briefSubmissions.userId, attempt: briefSubmissions.attempt, status: briefSubmissions.status, submittedAt: briefSubmissions.submittedAt, reviewedAt: briefSubmissions.reviewedAt, className: classes.name })
    .from(briefSubmissions)
    .innerJoin(classMembers, and(eq(classMembers.classId, briefSubmissions.classId), eq(classMembers.userId, viewerId), eq(classMembers.role, "instructor")))
    .innerJoin(classes, eq(classes.id, briefSubmissions.classId))
    .where(eq(briefSubmissions.id, submissionId));
  const [row] = lock ? await q.for("update", { of: briefSubmissions }) : await q;
  return row ?? null;
}

/** Instructor: one submission with its photos, the brief's rubric, the review so far and the apprentice's earlier attempts. */
export async function getReviewView(viewer: Viewer | null, submissionId: unknown, database: Queryable = processDb()): Promise<Result<{ view: ReviewViewDto }>> {
  const g = guard(viewer, ["instructor"], GUARD_MESSAGE);
  if (!g.ok) return g;
  const id = z.uuid().safeParse(submissionId);
  const s = id.success ? await taught(database, g.viewer.id, id.data) : null;
  const brief = s ? await briefById(s.briefId) : null;
  if (!s || !brief) return fail("not_found", { message: NOT_FOUND });
  const content = briefContent(brief);
  const [[apprentice], photos, reviews, earlierRows] = await Promise.all([
    database.select({ name: users.name }).from(users).where(eq(users.id, s.userId)),
    photosOf(database, [s.id]),
    reviewsOf(database, [s.id], content.maxPoints, true),
    database
      .select({ id: briefSubmissions.id, attempt: briefSubmissions.attempt, status: briefSubmissions.status, submittedAt: briefSubmissions.submittedAt, reviewedAt: briefSubmissions.reviewedAt })
      .from(briefSubmissions)
      .where(and(eq(briefSubmissions.userId, s.userId), eq(briefSubmissions.briefId, s.briefId), lt(briefSubmissions.attempt, s.attempt)))
      .orderBy(desc(briefSubmissions.attempt)),
  ]);
  const view: ReviewViewDto = {
    submission: { id: s.id, attempt: s.attempt, status: s.status, submittedAt: s.submittedAt.toISOString(), reviewedAt: s.reviewedAt?.toISOString() ?? null, apprenticeName: apprentice.name, className: s.className },
    brief: content,
    photos: photos.get(s.id) ?? [],
    review: reviews.get(s.id) ?? null,
    earlier: await attemptsOf(database, earlierRows, content.maxPoints, false),
  };
  return { ok: true, view };
}

const PinInput = z.object({
  id: z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, { error: "A pin's id is not valid." }),
  photoId: z.uuid({ error: "A pin must sit on one of the photos." }),
  x: z.number().min(0, { error: "A pin must sit on the photo." }).max(1, { error: "A pin must sit on the photo." }),
  y: z.number().min(0, { error: "A pin must sit on the photo." }).max(1, { error: "A pin must sit on the photo." }),
  comment: z.string().trim().min(1, { error: "Write a comment for each pin." }).max(PLACEMENT_LIMITS.pinCommentChars, { error: `Keep each pin's comment under ${PLACEMENT_LIMITS.pinCommentChars} characters.` }),
});

const DraftInput = z.object({
  submissionId: z.uuid(),
  // The review version the editor started from; 0 when there was no review yet.
  version: z.number().int().min(0),
  scores: z.record(z.string().max(60), z.number().int().min(0).max(10)).default({}),
  pins: z.array(PinInput).max(PLACEMENT_LIMITS.maxPins, { error: `At most ${PLACEMENT_LIMITS.maxPins} pins.` }).default([]),
  comment: z.string().max(PLACEMENT_LIMITS.commentChars, { error: `Keep the comment under ${PLACEMENT_LIMITS.commentChars} characters.` }).default(""),
});
const FinalInput = DraftInput.extend({ decision: z.enum(["approve", "redo"], { error: "Choose approve or ask for a redo." }) });

export type SavedReview = SavedReviewDto;

function invalid(error: z.ZodError): Failure {
  return fail("invalid_input", { message: error.issues[0].message, fieldErrors: Object.fromEntries(error.issues.map((i) => [i.path.join("."), i.message])) });
}

type Parsed = z.infer<typeof FinalInput> | (z.infer<typeof DraftInput> & { decision?: undefined });

/**
 * The one write path of a review: checks the viewer teaches the class, the submission still waits,
 * the scores are levels of the rubric and the pins sit on this submission's photos, then writes the
 * review if nobody saved a newer version meanwhile (409 otherwise). With a decision it is final:
 * the submission is approved or sent back, its pending digest notices dropped, the apprentice mailed.
 */
async function writeReview(viewerId: string, input: Parsed, database: Database): Promise<Result<{ review: SavedReview }>> {
  return database.transaction(async (tx): Promise<Result<{ review: SavedReview }>> => {
    const s = await taught(tx, viewerId, input.submissionId, true);
    const brief = s ? await briefById(s.briefId) : null;
    if (!s || !brief) return fail("not_found", { message: NOT_FOUND });
    if (s.status !== "submitted") return fail("conflict", { message: "This submission has already been reviewed." });
    const problems = scoreProblems(brief.rubric, input.scores);
    if (problems.length > 0) return fail("invalid_input", { message: `The scores don't fit the rubric: ${problems[0]}.` });
    const photoIds = new Set((await tx.select({ id: submissionPhotos.id }).from(submissionPhotos).where(eq(submissionPhotos.submissionId, s.id))).map((p) => p.id));
    if (input.pins.some((p) => !photoIds.has(p.photoId))) return fail("invalid_input", { message: "A pin must sit on one of this submission's photos." });
    if (new Set(input.pins.map((p) => p.id)).size !== input.pins.length) return fail("invalid_input", { message: "Two pins share an id." });
    const totals = rubricTotal(brief.rubric, input.scores);
    const decision: ReviewDecision | undefined = input.decision;
    if (decision && !totals.complete) return fail("invalid_input", { message: "Score every criterion of the rubric before you decide." });
    if (decision === "redo" && input.comment.trim() === "") return fail("invalid_input", { message: "Say what to change: write a comment for the apprentice.", fieldErrors: { comment: "Say what to change." } });
    const final = decision !== undefined;
    const values = {
      reviewerId: viewerId,
      scores: input.scores,
      pins: input.pins,
      comment: input.comment.trim(),
      totalPoints: totals.total,
      maxPoints: totals.max,
      state: final ? ("final" as const) : ("draft" as const),
      decision: decision ?? null,
      finalizedAt: final ? sql`now()` : null,
      updatedAt: sql`now()`,
    };
    const saved =
      input.version === 0
        ? await tx.insert(briefReviews).values({ submissionId: s.id, ...values }).onConflictDoNothing().returning({ version: briefReviews.version, updatedAt: briefReviews.updatedAt })
        : await tx
            .update(briefReviews)
            .set({ ...values, version: sql`${briefReviews.version} + 1` })
            .where(and(eq(briefReviews.submissionId, s.id), eq(briefReviews.version, input.version), eq(briefReviews.state, "draft")))
            .returning({ version: briefReviews.version, updatedAt: briefReviews.updatedAt });
    if (saved.length === 0) return fail("conflict", { message: "Someone saved this review after you opened it. Reload to see their changes." });
    if (final) await closeSubmission(tx, viewerId, s, brief.title, decision, totals, values.comment, input.pins.length);
    return { ok: true, review: { version: saved[0].version, totalPoints: totals.total, maxPoints: totals.max, scored: totals.scored, criteria: totals.criteria, savedAt: saved[0].updatedAt.toISOString() } };
  });
}

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

async function closeSubmission(
  tx: Tx,
  viewerId: string,
  s: { id: string; userId: string; briefId: string },
  briefTitle: string,
  decision: ReviewDecision,
  totals: { total: number; max: number },
  comment: string,
  pinCount: number,
): Promise<void> {
  await tx
    .update(briefSubmissions)
    .set({ status: decision === "approve" ? "approved" : "redo_requested", reviewedAt: sql`now()` })
    .where(eq(briefSubmissions.id, s.id));
  // Reviewed before the digest went out: the other instructors need not be told it is waiting.
  await tx.update(reviewNotices).set({ digestedAt: sql`now()` }).where(and(eq(reviewNotices.submissionId, s.id), isNull(reviewNotices.digestedAt)));
  const [apprentice] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, s.userId));
  await enqueueMail(tx, apprentice.email, {
    template: "review_result",
    name: apprentice.name,
    briefTitle,
    approved: decision === "approve",
    total: totals.total,
    max: totals.max,
    comment,
    pinCount,
    url: `${env().NEXTAUTH_URL}/learn/briefs/${s.briefId}`,
  });
  await writeAudit(tx, { actorId: viewerId, action: decision === "approve" ? "placement.approved" : "placement.redo_requested", targetType: "brief_submission", targetId: s.id, detail: { briefId: s.briefId, total: totals.total, max: totals.max } });
}

/** Instructor: autosaves the draft review (scores so far, pins, comment). */
export async function saveReviewDraft(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ review: SavedReview }>> {
  const g = guard(viewer, ["instructor"], GUARD_MESSAGE);
  if (!g.ok) return g;
  const parsed = DraftInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  return writeReview(g.viewer.id, parsed.data, database);
}

/** Instructor: finalizes the review with a decision: approve, or a redo saying what to change. */
export async function finalizeReview(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ review: SavedReview }>> {
  const g = guard(viewer, ["instructor"], GUARD_MESSAGE);
  if (!g.ok) return g;
  const parsed = FinalInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  return writeReview(g.viewer.id, parsed.data, database);
}
