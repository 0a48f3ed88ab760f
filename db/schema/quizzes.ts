import { sql } from "drizzle-orm";
import { boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { users } from "./users";

/** One graded question as stored with its attempt; item statistics read `score` (0…1). */
export type StoredItemResult = {
  questionId: string;
  kind: string;
  topic: string;
  answered: boolean;
  /** Fraction of the question's points earned, 0…1. */
  score: number;
  correct: boolean;
  points: number;
  earnedPoints: number;
  /** Numeric and generated questions: the key the answer was compared with. */
  expected?: { value: number; unit: string };
};

/** The grade of a submitted attempt, written once by the server (never by a browser). */
export type StoredQuizResult = {
  items: StoredItemResult[];
  earnedPoints: number;
  possiblePoints: number;
  percent: number;
  passingPercent: number;
  topicsToRevisit: string[];
  /** True when the time limit ran out and the server graded what had been saved. */
  timedOut: boolean;
};

/**
 * An apprentice's attempt at one question bank. Banks are content (content/banks), so they are
 * referenced by id. `presentationSecret` (256 bits, base64url; server-only, never in a DTO) keys
 * the ids and orders the browser is shown (lib/server/attempt-presenter.ts); `seed` draws the
 * numbers of generated questions, which the apprentice is shown anyway. Rows started before the
 * secret existed have it null and keep their old seeded order and authored ids.
 * `questionOrder` is fixed at the start so a later bank edit cannot reshuffle a live attempt.
 */
export const quizAttempts = pgTable(
  "quiz_attempts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    bankId: text("bank_id").notNull(),
    courseSlug: text("course_slug").notNull(),
    seed: integer("seed").notNull(),
    presentationSecret: text("presentation_secret"),
    questionOrder: jsonb("question_order").$type<string[]>().notNull(),
    startedAt: timestamp("started_at", { withTimezone: true }).notNull().defaultNow(),
    /** null = untimed. Includes any extension granted before the start. */
    deadlineAt: timestamp("deadline_at", { withTimezone: true }),
    submittedAt: timestamp("submitted_at", { withTimezone: true }),
    scorePercent: doublePrecision("score_percent"),
    passed: boolean("passed"),
    result: jsonb("result").$type<StoredQuizResult>(),
    /**
     * Raised by every autosave, in the statement that writes the answer. A submit grades the
     * answers it read and closes the attempt only if this is still the number it read with them,
     * so no acknowledged save is left out (lib/server/attempts.ts).
     */
    answersVersion: integer("answers_version").notNull().default(0),
  },
  (t) => [
    index("quiz_attempts_user_bank_idx").on(t.userId, t.bankId),
    index("quiz_attempts_bank_submitted_idx").on(t.bankId).where(sql`${t.submittedAt} is not null`),
    // The submitted attempts of a set of apprentices, counted per bank (an instructor's quiz list):
    // read from the index alone. Without it the planner scanned every attempt of the school
    // (100,000 rows: 200 ms cold, against 9 ms with it, under bench:dashboards' seed).
    index("quiz_attempts_user_bank_submitted_idx").on(t.userId, t.bankId).where(sql`${t.submittedAt} is not null`),
  ],
);

/** The latest saved answer per question. `seq` orders autosaves: an older one never overwrites a newer one. */
export const quizAnswers = pgTable(
  "quiz_answers",
  {
    attemptId: uuid("attempt_id")
      .notNull()
      .references(() => quizAttempts.id, { onDelete: "cascade" }),
    questionId: text("question_id").notNull(),
    answer: jsonb("answer").$type<Record<string, unknown>>().notNull(),
    seq: integer("seq").notNull(),
    savedAt: timestamp("saved_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.attemptId, t.questionId] })],
);

/** Extra minutes on a timed bank for one apprentice (WCAG 2.2 SC 2.2.1), granted by their instructor. */
export const quizTimeExtensions = pgTable(
  "quiz_time_extensions",
  {
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    bankId: text("bank_id").notNull(),
    extraMinutes: integer("extra_minutes").notNull(),
    grantedBy: uuid("granted_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.bankId] })],
);

export type QuizAttemptRow = typeof quizAttempts.$inferSelect;
