import "server-only";
// Quiz attempts: start (enrolled apprentices only), autosave, submit (graded here, once) and
// results. History is in quiz-history.ts, instructors' extra time in quiz-extensions.ts.
// Every function checks who is asking in the query that touches the row.
// Deadlines are compared with the database clock (now()), the one clock every process shares.
// The browser sees each attempt's presented ids (attempt-presenter.ts); answers are mapped to
// authored ids here before they are stored, and stored answers are mapped back for the view.
import { randomInt } from "node:crypto";
import { and, eq, isNull, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { db as processDb, type Database } from "@/db/client";
import { enrollments, quizAnswers, quizAttempts, quizTimeExtensions, type StoredQuizResult } from "@/db/schema";
import {
  acousticsGenerators,
  answerSchema,
  answerSchemaFor,
  gradeAttempt,
  hasPassed,
  idSchema,
  toAuthoredAnswer,
  toClientQuestion,
  toPresentedAnswer,
  type Answer,
  type AttemptAnswers,
  type ImageBounds,
  type Presenter,
} from "@/lib/assessment";
import { newPresentationSecret, presenterOf } from "./attempt-presenter";
import type { AttemptStatus, AttemptViewDto, SavedAnswerDto } from "@/lib/dto/quiz";
import { fail, type Result } from "./errors";
import { attemptQuestions, buildResultDto, clientQuestionsFor, getBankEntry, questionOrderFor, type BankEntry, type QuizResultDto, type ReviewDto } from "./quiz-banks";
import type { Viewer } from "./viewer";

/** Seconds after the deadline during which a save or submit still counts (network latency, a slow click). */
export const GRACE_SECONDS = 5;

export type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
type Queryable = Database | Tx;

/** True when the attempt's deadline (plus grace) has passed, by the database clock. */
export const overdue = sql<boolean>`(${quizAttempts.deadlineAt} is not null and now() > ${quizAttempts.deadlineAt} + make_interval(secs => ${GRACE_SECONDS}))`;

const attemptColumns = {
  id: quizAttempts.id,
  userId: quizAttempts.userId,
  bankId: quizAttempts.bankId,
  courseSlug: quizAttempts.courseSlug,
  seed: quizAttempts.seed,
  presentationSecret: quizAttempts.presentationSecret,
  questionOrder: quizAttempts.questionOrder,
  startedAt: quizAttempts.startedAt,
  deadlineAt: quizAttempts.deadlineAt,
  submittedAt: quizAttempts.submittedAt,
  passed: quizAttempts.passed,
  result: quizAttempts.result,
  overdue,
  serverNow: sql`now()`.mapWith(quizAttempts.startedAt),
};

/** The saved answers of the attempt, in the same query as the attempt row (one round trip). */
// The outer row is named in full in these subqueries: in a one-table select Drizzle writes a
// column without its table ("user_id"), which inside `from quiz_attempts o` would mean o's own
// column and count every attempt at the bank.
const savedAnswersJson = sql<{ questionId: string; answer: unknown }[]>`(select coalesce(json_agg(json_build_object('questionId', a.question_id, 'answer', a.answer)), '[]'::json) from ${quizAnswers} a where a.attempt_id = "quiz_attempts"."id")`;

/** How many attempts the owner has at this bank, and how many of them are open (for reviewFor), with the attempt row. */
const usedAtBank = sql<number>`(select count(*)::int from ${quizAttempts} o where o.user_id = "quiz_attempts"."user_id" and o.bank_id = "quiz_attempts"."bank_id")`;
const openAtBank = sql<number>`(select count(*)::int from ${quizAttempts} o where o.user_id = "quiz_attempts"."user_id" and o.bank_id = "quiz_attempts"."bank_id" and o.submitted_at is null)`;

// node-pg turns a timestamptz into a Date; a value from a raw statement is checked all the same.
const asDate = (value: unknown) => (value instanceof Date ? value : new Date(String(value)));

type AttemptRow = {
  id: string;
  userId: string;
  bankId: string;
  courseSlug: string;
  seed: number;
  presentationSecret: string | null;
  questionOrder: string[];
  startedAt: Date;
  deadlineAt: Date | null;
  submittedAt: Date | null;
  passed: boolean | null;
  result: StoredQuizResult | null;
  overdue: boolean;
  serverNow: Date;
};

const AttemptRef = z.object({ attemptId: z.uuid() });
export const StartAttemptInput = z.object({ bankId: idSchema });
export const SaveAnswerInput = AttemptRef.extend({
  questionId: idSchema,
  // An increasing counter kept by the browser; int4 range because that is the column.
  seq: z.number().int().min(0).max(2_147_483_647),
  answer: answerSchema,
});

const NOT_ENROLLED = "This quiz belongs to a course you don't have a seat on. Ask your school to enrol you.";
const NO_SUCH_ATTEMPT = "We couldn't find that quiz attempt.";

function parsedAnswers(rows: { questionId: string; answer: unknown }[]): Map<string, Answer> {
  const answers = new Map<string, Answer>();
  for (const row of rows) {
    const parsed = answerSchema.safeParse(row.answer);
    if (parsed.success) answers.set(row.questionId, parsed.data);
  }
  return answers;
}

/** Pure: grades saved answers on the server, in the attempt's question order, into the stored shape. */
export function gradeSavedAnswers(entry: BankEntry, attempt: { seed: number; questionOrder: readonly string[] }, answers: ReadonlyMap<string, Answer>, timedOut: boolean) {
  const graded = gradeAttempt(attemptQuestions(entry, attempt.questionOrder), Object.fromEntries(answers) as AttemptAnswers, {
    generators: acousticsGenerators,
    variantSeed: attempt.seed,
  });
  const { passingPercent } = entry.bank.settings;
  const stored: StoredQuizResult = {
    items: graded.results.map((r) => ({
      questionId: r.questionId,
      kind: r.kind,
      topic: r.topic,
      answered: r.answered,
      score: r.score,
      correct: r.correct,
      points: r.points,
      earnedPoints: r.earnedPoints,
      ...(r.expected ? { expected: { value: r.expected.value, unit: r.expected.unit } } : {}),
    })),
    earnedPoints: graded.earnedPoints,
    possiblePoints: graded.possiblePoints,
    percent: graded.percent,
    passingPercent,
    topicsToRevisit: graded.topicsToRevisit,
    timedOut,
  };
  return { stored, passed: hasPassed(graded, passingPercent) };
}

async function loadAnswers(q: Queryable, attemptId: string) {
  return q.select({ questionId: quizAnswers.questionId, answer: quizAnswers.answer, seq: quizAnswers.seq, savedAt: quizAnswers.savedAt }).from(quizAnswers).where(eq(quizAnswers.attemptId, attemptId));
}

/**
 * Grades what was saved and closes the attempt. The caller holds the row lock (FOR UPDATE) and
 * read the answers after taking it, so an autosave acknowledged before the lock is among them.
 */
async function gradeAndClose(tx: Tx, row: AttemptRow, entry: BankEntry, timedOut: boolean, answers: ReadonlyMap<string, Answer>) {
  const { stored, passed } = gradeSavedAnswers(entry, row, answers, timedOut);
  // A timed-out attempt is closed as of its deadline, however late the server notices.
  const [closed] = await tx
    .update(quizAttempts)
    .set({ submittedAt: timedOut ? sql`${quizAttempts.deadlineAt}` : sql`now()`, scorePercent: stored.percent, passed, result: stored })
    .where(eq(quizAttempts.id, row.id))
    .returning({ submittedAt: quizAttempts.submittedAt });
  return { ...row, submittedAt: closed.submittedAt!, passed, result: stored };
}

/**
 * gradeAndClose for a submit: the same UPDATE, and in the same statement the owner's attempts at
 * the bank for reviewFor. The counting subqueries see the table as it was before the UPDATE,
 * so this attempt, still open there, is left out of the open ones. With `unchangedSince` it runs
 * without the row lock and closes nothing (null) unless the row is as it was read.
 */
async function closeAndCount(q: Queryable, row: AttemptRow, entry: BankEntry, timedOut: boolean, answers: ReadonlyMap<string, Answer>, unchangedSince?: { answersVersion: number }) {
  const { stored, passed } = gradeSavedAnswers(entry, row, answers, timedOut);
  const owned = sql`o.user_id = ${row.userId} and o.bank_id = ${row.bankId}`;
  // Without the lock: close only the attempt as it was read (still open, the same answers, on the same side of its deadline).
  const asRead = unchangedSince
    ? sql` and ${quizAttempts.submittedAt} is null and ${quizAttempts.answersVersion} = ${unchangedSince.answersVersion} and ${overdue} = ${timedOut}`
    : sql``;
  const { rows } = await q.execute(sql`
    with closed as (
      update ${quizAttempts}
      set submitted_at = ${timedOut ? sql`${quizAttempts.deadlineAt}` : sql`now()`}, score_percent = ${stored.percent}, passed = ${passed}, result = ${JSON.stringify(stored)}::jsonb
      where ${quizAttempts.id} = ${row.id}${asRead}
      returning submitted_at
    )
    select closed.submitted_at,
      (select count(*)::int from ${quizAttempts} o where ${owned}) as used,
      (select count(*)::int from ${quizAttempts} o where ${owned} and o.submitted_at is null and o.id <> ${row.id}) as open
    from closed`);
  const done = rows[0] as { submitted_at: unknown; used: number; open: number } | undefined;
  if (!done) return null;
  return { closed: { ...row, submittedAt: asDate(done.submitted_at), passed, result: stored }, counts: { used: done.used, open: done.open } };
}

/** Grades the viewer's attempts whose time ran out unsubmitted (there is no background job: any touch closes them). */
export async function closeOverdueAttempts(tx: Tx, userId: string, bankId?: string): Promise<void> {
  const rows: AttemptRow[] = await tx
    .select(attemptColumns)
    .from(quizAttempts)
    .where(and(eq(quizAttempts.userId, userId), bankId ? eq(quizAttempts.bankId, bankId) : undefined, isNull(quizAttempts.submittedAt), overdue))
    .for("update");
  for (const row of rows) {
    const entry = await getBankEntry(row.bankId);
    if (entry) await gradeAndClose(tx, row, entry, true, parsedAnswers(await loadAnswers(tx, row.id)));
  }
}

async function attemptRow(tx: Tx, attemptId: string): Promise<AttemptRow | undefined> {
  const [row] = await tx.select(attemptColumns).from(quizAttempts).where(eq(quizAttempts.id, attemptId));
  return row;
}

function storedResultDto(entry: BankEntry, row: AttemptRow, answers: ReadonlyMap<string, Answer>, review: ReviewDto): QuizResultDto {
  return buildResultDto(entry, { id: row.id, seed: row.seed, submittedAt: row.submittedAt!, passed: row.passed ?? false }, row.result!, answers, review);
}

/**
 * Correct answers and explanations are shown only when the bank allows it and the apprentice
 * has no attempt left at it (all used, none open): what one result teaches can't be used in a
 * later attempt at the same questions. Score and right or wrong per question are always shown.
 */
type AttemptCounts = { used: number; open: number };

/** Pure: the review rule above, from the apprentice's attempts at the bank (all of them, and the open ones). */
function reviewFrom(entry: BankEntry, counts: AttemptCounts): ReviewDto {
  const { attemptsAllowed, showCorrectAnswers } = entry.bank.settings;
  if (!showCorrectAnswers) {
    return { shown: false, note: "This quiz does not show its correct answers or explanations. Your instructor can go through them with you." };
  }
  if (counts.used >= attemptsAllowed && counts.open === 0) return { shown: true, note: null };
  const attempts = attemptsAllowed === 1 ? "your attempt" : `all ${attemptsAllowed} attempts`;
  return { shown: false, note: `Correct answers and explanations are shown once ${attempts} at this quiz are used (you have used ${counts.used}).` };
}

async function reviewFor(q: Queryable, userId: string, entry: BankEntry): Promise<ReviewDto> {
  if (!entry.bank.settings.showCorrectAnswers) return reviewFrom(entry, { used: 0, open: 0 });
  const [counts] = await q
    .select({ used: sql<number>`count(*)::int`, open: sql<number>`(count(*) filter (where ${quizAttempts.submittedAt} is null))::int` })
    .from(quizAttempts)
    .where(and(eq(quizAttempts.userId, userId), eq(quizAttempts.bankId, entry.bank.id)));
  return reviewFrom(entry, counts);
}

// ---------------------------------------------------------------- start

export type StartedAttemptDto = { attemptId: string; resumed: boolean };

/**
 * Starts an attempt, or resumes the open one. The apprentice's seat row is locked first, which
 * checks the enrollment and serialises two starts (a double click) so the attempt limit holds.
 */
export async function startAttempt(viewer: Viewer | null, raw: unknown, db: Database = processDb()): Promise<Result<StartedAttemptDto>> {
  if (!viewer) return fail("not_signed_in");
  if (viewer.role !== "apprentice") return fail("forbidden", { message: "Quizzes are taken from an apprentice account." });
  const parsed = StartAttemptInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const entry = await getBankEntry(parsed.data.bankId);
  if (!entry) return fail("not_found", { message: "There is no such quiz." });
  const { bank, courseSlug } = entry;

  return db.transaction(async (tx): Promise<Result<StartedAttemptDto>> => {
    const [seat] = await tx
      .select({ id: enrollments.id })
      .from(enrollments)
      .where(and(eq(enrollments.userId, viewer.id), eq(enrollments.courseSlug, courseSlug)))
      .for("update");
    if (!seat) return fail("forbidden", { message: NOT_ENROLLED });
    await closeOverdueAttempts(tx, viewer.id, bank.id);
    const mine = await tx
      .select({ id: quizAttempts.id, submittedAt: quizAttempts.submittedAt })
      .from(quizAttempts)
      .where(and(eq(quizAttempts.userId, viewer.id), eq(quizAttempts.bankId, bank.id)));
    const open = mine.find((a) => a.submittedAt === null);
    if (open) return { ok: true, attemptId: open.id, resumed: true };
    if (mine.length >= bank.settings.attemptsAllowed) {
      return fail("conflict", { message: `You have used all ${bank.settings.attemptsAllowed} attempts at this quiz.` });
    }
    // The secret orders and names what the browser sees; the seed only draws generated numbers.
    const presentationSecret = newPresentationSecret();
    const seed = randomInt(1, 2 ** 31 - 1);
    let deadlineAt: SQL | null = null;
    if (bank.settings.timeLimitMinutes !== null) {
      const [extension] = await tx
        .select({ extraMinutes: quizTimeExtensions.extraMinutes })
        .from(quizTimeExtensions)
        .where(and(eq(quizTimeExtensions.userId, viewer.id), eq(quizTimeExtensions.bankId, bank.id)));
      const minutes = bank.settings.timeLimitMinutes + (extension?.extraMinutes ?? 0);
      deadlineAt = sql`now() + ${minutes}::double precision * interval '1 minute'`;
    }
    const [created] = await tx
      .insert(quizAttempts)
      .values({ userId: viewer.id, bankId: bank.id, courseSlug, seed, presentationSecret, questionOrder: questionOrderFor(bank, presenterOf({ presentationSecret, seed })), deadlineAt })
      .returning({ id: quizAttempts.id });
    return { ok: true, attemptId: created.id, resumed: false };
  });
}

// ---------------------------------------------------------------- view

export type { AttemptStatus, AttemptViewDto, SavedAnswerDto } from "@/lib/dto/quiz";

function statusOf(row: AttemptRow): AttemptStatus {
  if (!row.submittedAt) return "in_progress";
  return row.result?.timedOut ? "timed_out" : "submitted";
}

/** The attempt as its owner may see it; anyone else gets not_found, so attempt ids can't be probed. */
export async function getAttemptView(viewer: Viewer | null, attemptId: string, db: Database = processDb()): Promise<Result<{ view: AttemptViewDto }>> {
  if (!viewer) return fail("not_signed_in");
  const ref = AttemptRef.safeParse({ attemptId });
  if (!ref.success) return fail("not_found", { message: NO_SUCH_ATTEMPT });
  return db.transaction(async (tx): Promise<Result<{ view: AttemptViewDto }>> => {
    let row = await attemptRow(tx, attemptId);
    if (!row || row.userId !== viewer.id) return fail("not_found", { message: NO_SUCH_ATTEMPT });
    const entry = await getBankEntry(row.bankId);
    if (!entry) return fail("not_found", { message: "This quiz is no longer offered." });
    if (!row.submittedAt && row.overdue) {
      await closeOverdueAttempts(tx, viewer.id, row.bankId);
      row = (await attemptRow(tx, attemptId))!;
    }
    const answerRows = await loadAnswers(tx, row.id);
    const answers = parsedAnswers(answerRows);
    const presenter = presenterOf(row);
    const saved: Record<string, SavedAnswerDto> = {};
    for (const a of answerRows) {
      const answer = answers.get(a.questionId);
      const question = entry.questionsById.get(a.questionId);
      const shown = answer && question ? toPresentedAnswer(question, answer, presenter) : null;
      if (shown) saved[a.questionId] = { answer: shown, seq: a.seq, savedAt: a.savedAt.toISOString() };
    }
    const result = row.submittedAt && row.result ? storedResultDto(entry, row, answers, await reviewFor(tx, viewer.id, entry)) : null;
    const { settings } = entry.bank;
    return {
      ok: true,
      view: {
        attemptId: row.id,
        bankId: row.bankId,
        title: entry.bank.title,
        courseSlug: row.courseSlug,
        status: statusOf(row),
        startedAt: row.startedAt.toISOString(),
        deadlineAt: row.deadlineAt?.toISOString() ?? null,
        submittedAt: row.submittedAt?.toISOString() ?? null,
        serverNow: row.serverNow.toISOString(),
        passingPercent: settings.passingPercent,
        timeLimitMinutes: settings.timeLimitMinutes,
        attemptsAllowed: settings.attemptsAllowed,
        questions: clientQuestionsFor(entry, row.questionOrder, presenter, row.seed),
        answers: saved,
        result,
      },
    };
  });
}

// ---------------------------------------------------------------- autosave

export type SavedDto = { questionId: string; seq: number; savedAt: string; stale: boolean };

type AttemptMeta = { userId: string; bankId: string; questionOrder: string[]; seed: number; presenter: Presenter };

// Who owns an attempt, its bank, its question order and its presentation never change once it
// exists, so autosave reads them from this per-process cache instead of the database (bounded;
// oldest dropped first). The cache is server memory: the secret behind `presenter` stays here.
const attemptMetaCache = new Map<string, AttemptMeta>();
const META_CACHE_SIZE = 20_000;

async function attemptMeta(db: Database, attemptId: string): Promise<AttemptMeta | null> {
  const cached = attemptMetaCache.get(attemptId);
  if (cached) return cached;
  const [row] = await db
    .select({ userId: quizAttempts.userId, bankId: quizAttempts.bankId, questionOrder: quizAttempts.questionOrder, seed: quizAttempts.seed, presentationSecret: quizAttempts.presentationSecret })
    .from(quizAttempts)
    .where(eq(quizAttempts.id, attemptId));
  if (!row) return null;
  const meta: AttemptMeta = { userId: row.userId, bankId: row.bankId, questionOrder: row.questionOrder, seed: row.seed, presenter: presenterOf(row) };
  if (attemptMetaCache.size >= META_CACHE_SIZE) attemptMetaCache.delete(attemptMetaCache.keys().next().value!);
  attemptMetaCache.set(attemptId, meta);
  return meta;
}


/**
 * The size of a hotspot question's drawing (components/quiz/diagram-bounds.ts, passed in by the
 * route: lib never imports components). Without it a clicked point is refused; a region pick is
 * always checked against the question's own regions.
 */
export type SaveAnswerContext = { diagramBounds?: (diagram: string) => ImageBounds | undefined };

/**
 * Upserts one answer. It must fit the question as this attempt showed it (its presented ids, a
 * point inside the picture), and is stored in authored ids. A save whose seq is not above the
 * stored one (a retry that arrives after a newer save) changes nothing and is acknowledged with
 * the stored seq. One statement: it locks the attempt row and raises its answers_version, so a
 * submit that read the answers before this save cannot close the attempt without them (see
 * submitAttempt), and a submitted or overdue attempt takes no answer.
 */
export async function saveAnswer(viewer: Viewer | null, raw: unknown, context: SaveAnswerContext = {}, db: Database = processDb()): Promise<Result<SavedDto>> {
  if (!viewer) return fail("not_signed_in");
  const parsed = SaveAnswerInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { message: "That answer could not be read. Reload the page and try again." });
  const { attemptId, questionId, seq, answer } = parsed.data;
  const meta = await attemptMeta(db, attemptId);
  if (!meta || meta.userId !== viewer.id) return fail("not_found", { message: NO_SUCH_ATTEMPT });
  const question = (await getBankEntry(meta.bankId))?.questionsById.get(questionId);
  if (!question || !meta.questionOrder.includes(questionId)) return fail("not_found", { message: "That question is not part of this attempt." });
  if (question.kind !== answer.kind) return fail("invalid_input", { message: "That answer does not fit the question." });
  const shown = toClientQuestion(question, { presenter: meta.presenter, variantSeed: meta.seed });
  const imageBounds = question.kind === "hotspot" ? context.diagramBounds?.(question.diagram) : undefined;
  const fits = answerSchemaFor(shown, { imageBounds }).safeParse(answer);
  const authored = fits.success ? toAuthoredAnswer(question, fits.data, meta.presenter) : null;
  if (!authored) return fail("invalid_input", { message: "That answer does not fit the question as it was shown. Reload the page and try again." });

  const { rows } = await db.execute(sql`
    with a as (
      select ${quizAttempts.id} as id, ${quizAttempts.submittedAt} is not null as submitted, ${overdue} as overdue
      from ${quizAttempts} where ${quizAttempts.id} = ${attemptId} and ${quizAttempts.userId} = ${viewer.id}
      for update
    ), v as (
      update ${quizAttempts} set answers_version = ${quizAttempts.answersVersion} + 1
      from a where ${quizAttempts.id} = a.id and not a.submitted and not a.overdue
      returning ${quizAttempts.id} as id
    ), w as (
      insert into ${quizAnswers} (attempt_id, question_id, answer, seq, saved_at)
      select v.id, ${questionId}, ${JSON.stringify(authored)}::jsonb, ${seq}, now() from v
      on conflict (attempt_id, question_id) do update set answer = excluded.answer, seq = excluded.seq, saved_at = excluded.saved_at
        where ${quizAnswers.seq} < excluded.seq
      returning seq, saved_at
    )
    select a.submitted, a.overdue, w.seq as written_seq, w.saved_at as written_at, s.seq as stored_seq, s.saved_at as stored_at
    from a left join w on true
      left join ${quizAnswers} s on s.attempt_id = a.id and s.question_id = ${questionId}`);
  const row = rows[0] as
    | { submitted: boolean; overdue: boolean; written_seq: number | null; written_at: unknown; stored_seq: number | null; stored_at: unknown }
    | undefined;
  if (!row) return fail("not_found", { message: NO_SUCH_ATTEMPT });
  if (row.submitted) return fail("conflict", { message: "This attempt has been submitted, so its answers can no longer change." });
  if (row.overdue) return fail("conflict", { message: "Time is up, so answers can no longer be saved. Your saved answers will be graded." });
  if (row.written_seq !== null) return { ok: true, questionId, seq: row.written_seq, savedAt: asDate(row.written_at).toISOString(), stale: false };
  // The outer select sees the table as it was before this statement: the newer answer that won.
  return { ok: true, questionId, seq: row.stored_seq!, savedAt: asDate(row.stored_at).toISOString(), stale: true };
}

// ---------------------------------------------------------------- submit and result

export type SubmittedDto = { alreadySubmitted: boolean; result: QuizResultDto };

/**
 * Grades the saved answers once. One read brings the attempt, its saved answers and their
 * answers_version (an autosave raises it in the statement that writes the answer); the answers are
 * graded and the attempt closed by one UPDATE that holds only if the row is still open, with the
 * same answers_version and on the same side of its deadline. So a save acknowledged after the read
 * makes the UPDATE miss instead of being left out of the grade (the UPDATE waits for a save that
 * holds the row, then checks the row as that save left it). A miss, a rare event (a save racing
 * the click, a second submit, the deadline passing in between), takes the locking path: the row
 * locked FOR UPDATE, the answers read under the lock, graded and closed; a double click or a retry
 * waits there and returns the stored result. After the deadline (plus grace) the saved answers are
 * graded all the same, and the late submit is answered 409.
 * Round trips for a first submit: the read and the UPDATE (the locking path adds five).
 */
export async function submitAttempt(viewer: Viewer | null, raw: unknown, db: Database = processDb()): Promise<Result<SubmittedDto>> {
  if (!viewer) return fail("not_signed_in");
  const ref = AttemptRef.safeParse(raw);
  if (!ref.success) return fail("not_found", { message: NO_SUCH_ATTEMPT });
  const [seen] = await db
    .select({ ...attemptColumns, answersVersion: quizAttempts.answersVersion, saved: savedAnswersJson, used: usedAtBank, open: openAtBank })
    .from(quizAttempts)
    .where(eq(quizAttempts.id, ref.data.attemptId));
  if (!seen || seen.userId !== viewer.id) return fail("not_found", { message: NO_SUCH_ATTEMPT });
  const entry = await getBankEntry(seen.bankId);
  if (!entry) return fail("not_found", { message: "This quiz is no longer offered." });
  const seenAnswers = parsedAnswers(seen.saved);
  if (seen.submittedAt && seen.result) {
    return { ok: true, alreadySubmitted: true, result: storedResultDto(entry, seen, seenAnswers, reviewFrom(entry, seen)) };
  }
  const closedAsRead = await closeAndCount(db, seen, entry, seen.overdue, seenAnswers, { answersVersion: seen.answersVersion });
  if (closedAsRead) return submittedNow(entry, closedAsRead, seenAnswers, seen.overdue);

  return db.transaction(async (tx): Promise<Result<SubmittedDto>> => {
    // The lock makes a concurrent submit wait here, then find the attempt graded.
    const [row] = await tx.select(attemptColumns).from(quizAttempts).where(eq(quizAttempts.id, ref.data.attemptId)).for("update");
    const answers = parsedAnswers(await loadAnswers(tx, row.id));
    if (row.submittedAt && row.result) return { ok: true, alreadySubmitted: true, result: storedResultDto(entry, row, answers, await reviewFor(tx, viewer.id, entry)) };
    return submittedNow(entry, (await closeAndCount(tx, row, entry, row.overdue, answers))!, answers, row.overdue);
  });
}

/** The answer to the submit that closed the attempt: its result, or 409 when the deadline had passed (the saved answers graded all the same). */
function submittedNow(entry: BankEntry, done: { closed: AttemptRow; counts: AttemptCounts }, answers: ReadonlyMap<string, Answer>, late: boolean): Result<SubmittedDto> {
  if (late) return fail("conflict", { message: "The time limit had passed before this submission arrived. We graded the answers saved in time." });
  return { ok: true, alreadySubmitted: false, result: storedResultDto(entry, done.closed, answers, reviewFrom(entry, done.counts)) };
}

export async function getResult(viewer: Viewer | null, attemptId: string, db: Database = processDb()): Promise<Result<{ result: QuizResultDto }>> {
  const view = await getAttemptView(viewer, attemptId, db);
  if (!view.ok) return view;
  if (!view.view.result) return fail("conflict", { message: "This attempt has not been submitted yet." });
  return { ok: true, result: view.view.result };
}
