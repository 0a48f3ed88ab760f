import { sql } from "drizzle-orm";
import { check, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { classes } from "./schools";
import { uploads } from "./uploads";
import { users } from "./users";

// submitted: waiting in the class instructors' review queue. redo_requested: reviewed, the
// apprentice is asked to change something and submit a new attempt. approved: counts toward the
// course (lib/server/briefs.ts approvedBriefIds). A redo never reopens a row: the next attempt is
// a new row, so the history of attempts stays as it was reviewed.
export const submissionStatusEnum = pgEnum("submission_status", ["submitted", "redo_requested", "approved"]);

/** One attempt of an apprentice at a placement brief (briefs are content: content/briefs/<id>.json). */
export const briefSubmissions = pgTable(
  "brief_submissions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    briefId: text("brief_id").notNull(),
    // The brief's course, kept with the row so completion is one indexed query per course.
    courseSlug: text("course_slug").notNull(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    // The class whose instructors review it; restrict: deleting a class must not erase reviewed work.
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "restrict" }),
    // 1, 2, … per apprentice and brief.
    attempt: integer("attempt").notNull(),
    status: submissionStatusEnum("status").notNull().default("submitted"),
    submittedAt: timestamp("submitted_at", { withTimezone: true }).notNull().defaultNow(),
    reviewedAt: timestamp("reviewed_at", { withTimezone: true }),
  },
  (t) => [
    uniqueIndex("brief_submissions_user_brief_attempt_key").on(t.userId, t.briefId, t.attempt),
    // At most one attempt waiting and at most one approved per apprentice and brief.
    uniqueIndex("brief_submissions_one_waiting_key").on(t.userId, t.briefId).where(sql`${t.status} = 'submitted'`),
    uniqueIndex("brief_submissions_one_approved_key").on(t.userId, t.briefId).where(sql`${t.status} = 'approved'`),
    // The review queue: a class's waiting work, oldest first.
    index("brief_submissions_queue_idx").on(t.classId, t.status, t.submittedAt),
    index("brief_submissions_user_course_idx").on(t.userId, t.courseSlug, t.status),
    check("brief_submissions_attempt_positive", sql`${t.attempt} >= 1`),
    check("brief_submissions_reviewed_has_time", sql`${t.status} = 'submitted' or ${t.reviewedAt} is not null`),
  ],
);

/** The photos of a submission, in the apprentice's order, each with its caption. */
export const submissionPhotos = pgTable(
  "submission_photos",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    submissionId: uuid("submission_id")
      .notNull()
      .references(() => briefSubmissions.id, { onDelete: "cascade" }),
    // Only a processed upload of the submitter (checked by lib/server/briefs.ts in the same transaction).
    uploadId: uuid("upload_id")
      .notNull()
      .references(() => uploads.id, { onDelete: "restrict" }),
    caption: text("caption").notNull(),
    // 0-based order on the page.
    position: integer("position").notNull(),
  },
  (t) => [uniqueIndex("submission_photos_position_key").on(t.submissionId, t.position), uniqueIndex("submission_photos_upload_key").on(t.submissionId, t.uploadId)],
);

export const reviewStateEnum = pgEnum("review_state", ["draft", "final"]);
export const reviewDecisionEnum = pgEnum("review_decision", ["approve", "redo"]);

/** A pin on a photo: where (fractions 0…1 of the photo's width and height, from its top left) and what. */
export type StoredPin = { id: string; photoId: string; x: number; y: number; comment: string };
/** Criterion id → the points of the level chosen (one of the brief's rubric levels). */
export type StoredScores = Record<string, number>;

/**
 * The review of one submission: a draft autosaved while the instructor works, then final with a
 * decision. One per submission, shared by the class's instructors (reviewer_id: who last saved).
 * total and max are computed on the server from the brief's rubric (lib/assessment/rubric.ts).
 */
export const briefReviews = pgTable(
  "brief_reviews",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    submissionId: uuid("submission_id")
      .notNull()
      .references(() => briefSubmissions.id, { onDelete: "cascade" }),
    reviewerId: uuid("reviewer_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    state: reviewStateEnum("state").notNull().default("draft"),
    scores: jsonb("scores").$type<StoredScores>().notNull().default({}),
    pins: jsonb("pins").$type<StoredPin[]>().notNull().default([]),
    decision: reviewDecisionEnum("decision"),
    comment: text("comment").notNull().default(""),
    totalPoints: integer("total_points"),
    maxPoints: integer("max_points"),
    // Bumped on every save; an autosave names the version it started from, so a stale tab cannot overwrite a newer draft.
    version: integer("version").notNull().default(1),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
    finalizedAt: timestamp("finalized_at", { withTimezone: true }),
  },
  (t) => [
    uniqueIndex("brief_reviews_submission_key").on(t.submissionId),
    check("brief_reviews_final_complete", sql`${t.state} = 'draft' or (${t.decision} is not null and ${t.finalizedAt} is not null and ${t.totalPoints} is not null)`),
  ],
);

/**
 * "New work to review" notices, one per instructor and submission, written with the submission.
 * The review-digest job (lib/jobs/review-digest.ts) turns each instructor's undigested notices
 * into one e-mail per run, so ten submissions in an afternoon are one message, not ten.
 */
export const reviewNotices = pgTable(
  "review_notices",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    instructorId: uuid("instructor_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    submissionId: uuid("submission_id")
      .notNull()
      .references(() => briefSubmissions.id, { onDelete: "cascade" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    digestedAt: timestamp("digested_at", { withTimezone: true }),
  },
  (t) => [uniqueIndex("review_notices_instructor_submission_key").on(t.instructorId, t.submissionId), index("review_notices_pending_idx").on(t.instructorId).where(sql`${t.digestedAt} is null`)],
);

export type SubmissionStatus = (typeof submissionStatusEnum.enumValues)[number];
export type ReviewDecision = (typeof reviewDecisionEnum.enumValues)[number];
export type ReviewState = (typeof reviewStateEnum.enumValues)[number];
