import "server-only";
// Item statistics of a bank for instructors (their own classes' apprentices) and admins: the
// response matrix of submitted attempts → lib/assessment's itemStatistics.
import { and, asc, count, countDistinct, eq, inArray, isNotNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db, type Queryable } from "@/db/client";
import { classMembers, classes, quizAttempts, quizTimeExtensions, users, type StoredQuizResult } from "@/db/schema";
import { itemStatistics, type ItemFlag } from "@/lib/assessment";
import { templateForReview } from "@/lib/assessment/generated";
import { fail, type Failure, type Result } from "./errors";
import { guard } from "./guard";
import { allBankEntries, getBankEntry, listCourseBanks, type BankEntry, type BankSummaryDto } from "./quiz-banks";
import type { Viewer } from "./viewer";

export const FLAG_WORDS: Record<ItemFlag, string> = {
  "low-discrimination": "Low discrimination (D below 0.20)",
  "too-easy": "Very easy (p above 0.95)",
  "negative-point-biserial": "Negative point-biserial",
};

type ClassRef = { id: string; name: string; courseSlug: string };

const STATS_ROLES = ["instructor", "admin"] as const;
const NO_SUCH_QUIZ = "There is no such quiz.";
const NO_SUCH_CLASS = "We couldn't find that class among the classes you teach on this course.";

/** Classes whose results the viewer may read: those they teach (admins: every class). */
async function visibleClasses(database: Queryable, viewer: Viewer, courseSlug?: string): Promise<ClassRef[]> {
  const base = database.select({ id: classes.id, name: classes.name, courseSlug: classes.courseSlug }).from(classes);
  if (viewer.role === "admin") return base.where(courseSlug ? eq(classes.courseSlug, courseSlug) : undefined).orderBy(asc(classes.name));
  return base
    .innerJoin(classMembers, and(eq(classMembers.classId, classes.id), eq(classMembers.userId, viewer.id), eq(classMembers.role, "instructor")))
    .where(courseSlug ? eq(classes.courseSlug, courseSlug) : undefined)
    .orderBy(asc(classes.name));
}

function apprenticesOf(database: Queryable, classIds: string[]) {
  return database
    .select({ userId: classMembers.userId })
    .from(classMembers)
    .where(and(inArray(classMembers.classId, classIds), eq(classMembers.role, "apprentice")));
}

/**
 * Whose attempts count: one class (which the viewer must teach), or overall. Overall is every
 * attempt for an admin, and the apprentices of the instructor's classes on the bank's course
 * for an instructor. null = no restriction.
 */
async function scopeOf(database: Queryable, viewer: Viewer, entry: BankEntry, classId: string | null): Promise<Failure | { ok: true; classes: ClassRef[]; selected: ClassRef | null; classIds: string[] | null }> {
  const taught = await visibleClasses(database, viewer, entry.courseSlug);
  if (viewer.role === "instructor" && taught.length === 0) return fail("forbidden", { message: "You teach no class on this quiz's course." });
  if (classId !== null) {
    const klass = taught.find((c) => c.id === classId);
    if (!klass) return fail("not_found", { message: NO_SUCH_CLASS });
    return { ok: true, classes: taught, selected: klass, classIds: [klass.id] };
  }
  return { ok: true, classes: taught, selected: null, classIds: viewer.role === "admin" ? null : taught.map((c) => c.id) };
}

export type StatsBankDto = BankSummaryDto & { submittedAttempts: number; apprentices: number };

/** Banks of the courses the viewer teaches (admins: all), with submitted-attempt counts. */
export async function listStatsBanks(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ banks: StatsBankDto[] }>> {
  const allowed = guard(viewer, STATS_ROLES);
  if (!allowed.ok) return allowed;
  const v = allowed.viewer;
  const visible = await visibleClasses(database, v);
  const courseSlugs = v.role === "admin" ? [...new Set((await allBankEntries()).map((e) => e.courseSlug))].sort() : [...new Set(visible.map((c) => c.courseSlug))];
  const classIds = visible.map((c) => c.id);
  const counted = database
    .select({ bankId: quizAttempts.bankId, n: count(), people: countDistinct(quizAttempts.userId) })
    .from(quizAttempts)
    .where(and(isNotNull(quizAttempts.submittedAt), v.role === "admin" ? undefined : inArray(quizAttempts.userId, apprenticesOf(database, classIds))))
    .groupBy(quizAttempts.bankId);
  const byBank = new Map((await counted).map((r) => [r.bankId, r]));
  const out: StatsBankDto[] = [];
  for (const slug of courseSlugs) {
    for (const bank of await listCourseBanks(slug)) {
      const c = byBank.get(bank.bankId);
      out.push({ ...bank, submittedAttempts: c?.n ?? 0, apprentices: c?.people ?? 0 });
    }
  }
  return { ok: true, banks: out };
}

export type ItemRowDto = {
  position: number;
  questionId: string;
  kind: string;
  topic: string;
  prompt: string;
  p: number | null;
  d: number | null;
  rpb: number | null;
  rCorrected: number | null;
  flags: ItemFlag[];
  flagWords: string[];
};

export type HistogramBinDto = { fromPercent: number; toPercent: number; label: string; count: number };

export type BankStatsDto = {
  bankId: string;
  title: string;
  courseSlug: string;
  timeLimitMinutes: number | null;
  passingPercent: number;
  scope: { classId: string | null; label: string };
  classes: { id: string; name: string }[];
  /** Attempts in the matrix; attempts missing a current question (bank edited since) are left out. */
  n: number;
  k: number;
  excludedAttempts: number;
  items: ItemRowDto[];
  kr20: number | null;
  alpha: number | null;
  sem: number | null;
  /** Total score in item-score units (0…k). */
  mean: number | null;
  sd: number | null;
  meanPercent: number | null;
  histogram: HistogramBinDto[];
};

/** Ten bins of 10 %; 100 % falls in the last (90–100 %). */
export function scoreHistogram(percents: readonly number[]): HistogramBinDto[] {
  const bins = Array.from({ length: 10 }, (_, i) => ({ fromPercent: i * 10, toPercent: i * 10 + 10, label: `${i * 10}–${i * 10 + 10} %`, count: 0 }));
  for (const percent of percents) bins[Math.min(9, Math.max(0, Math.floor(percent / 10)))].count++;
  return bins;
}

/**
 * Pure: item scores in bank order from a result's question ids and scores (same order); null
 * where the attempt lacks a question (the bank gained it since).
 */
export function bankOrderFrom(entry: BankEntry, questionIds: readonly string[], scores: readonly number[]): (number | null)[] {
  const positions = bankPositions(entry);
  const out: (number | null)[] = new Array(positions.size).fill(null);
  for (let i = 0; i < questionIds.length; i++) {
    const at = positions.get(questionIds[i]);
    if (at !== undefined) out[at] = scores[i] ?? null;
  }
  return out;
}

// Each question's place in the bank, built once per bank entry and shared by every attempt:
// bench:dashboards (admin CSV, 3,280 attempts × 30) spent about 15 ms building a map per attempt.
const positionsByEntry = new WeakMap<BankEntry, ReadonlyMap<string, number>>();
function bankPositions(entry: BankEntry): ReadonlyMap<string, number> {
  let positions = positionsByEntry.get(entry);
  if (!positions) positionsByEntry.set(entry, (positions = new Map(entry.bank.questions.map((q, i) => [q.id, i]))));
  return positions;
}

/** One attempt's item scores in bank order. */
export function bankOrderScores(entry: BankEntry, result: StoredQuizResult): (number | null)[] {
  return bankOrderFrom(
    entry,
    result.items.map((item) => item.questionId),
    result.items.map((item) => item.score),
  );
}

// Only what the statistics read of a stored result, picked by the database: its question ids and
// item scores (two arrays in the items' order), not the whole result (kinds, topics, keys…).
// bench:dashboards: a third of the time of sending the results whole, on the database and here.
export const resultQuestionIdsSql = sql<string[]>`jsonb_path_query_array(${quizAttempts.result}, '$.items[*].questionId')`;
export const resultItemScoresSql = sql<number[]>`jsonb_path_query_array(${quizAttempts.result}, '$.items[*].score')`;

/** Rows = attempts with a score for every question (the others are left out), columns in bank order. */
export function completeRows(scoreRows: readonly (readonly (number | null)[])[]): { rows: number[][]; kept: number[] } {
  const rows: number[][] = [];
  const kept: number[] = [];
  scoreRows.forEach((scores, index) => {
    if (scores.some((s) => s === null)) return;
    rows.push(scores as number[]);
    kept.push(index);
  });
  return { rows, kept };
}

/** Rows = attempts, columns = the bank's questions in bank order; attempts lacking a question are left out. */
export function responseMatrix(entry: BankEntry, results: readonly StoredQuizResult[]): { rows: number[][]; kept: number[] } {
  return completeRows(results.map((result) => bankOrderScores(entry, result)));
}

/**
 * Item statistics of one bank, over one class the viewer teaches or over all they may see.
 * Instructors and admins only; an unknown quiz or a class the instructor doesn't teach is not_found.
 */
export async function getBankStatistics(viewer: Viewer | null, input: { bankId: string; classId?: string | null }, database: Queryable = db()): Promise<Result<{ stats: BankStatsDto }>> {
  const allowed = guard(viewer, STATS_ROLES);
  if (!allowed.ok) return allowed;
  const v = allowed.viewer;
  const entry = await getBankEntry(input.bankId);
  if (!entry) return fail("not_found", { message: NO_SUCH_QUIZ });
  const classId = input.classId && /^[0-9a-f-]{36}$/i.test(input.classId) ? input.classId : input.classId ? "invalid" : null;
  if (classId === "invalid") return fail("not_found", { message: NO_SUCH_CLASS });
  const scope = await scopeOf(database, v, entry, classId);
  if (!scope.ok) return scope;

  const results = await database
    .select({ questionIds: resultQuestionIdsSql, scores: resultItemScoresSql, scorePercent: quizAttempts.scorePercent })
    .from(quizAttempts)
    .where(
      and(
        eq(quizAttempts.bankId, entry.bank.id),
        isNotNull(quizAttempts.submittedAt),
        isNotNull(quizAttempts.result),
        scope.classIds === null ? undefined : inArray(quizAttempts.userId, apprenticesOf(database, scope.classIds)),
      ),
    );
  const { rows, kept } = completeRows(results.map((a) => bankOrderFrom(entry, a.questionIds, a.scores)));
  const stats = rows.length > 0 ? itemStatistics({ responses: rows }) : null;
  const k = entry.bank.questions.length;

  const items: ItemRowDto[] = entry.bank.questions.map((q, j) => {
    const s = stats?.items[j];
    const flags = s?.flags ?? [];
    return {
      position: j + 1,
      questionId: q.id,
      kind: q.kind,
      topic: q.topic,
      // Each attempt drew its own numbers, so a generated prompt shows "…" and says so.
      prompt: q.kind === "generated" ? templateForReview(q.prompt) : q.prompt,
      p: s?.p ?? null,
      d: s?.d ?? null,
      rpb: s?.rpb ?? null,
      rCorrected: s?.rCorrected ?? null,
      flags,
      flagWords: flags.map((f) => FLAG_WORDS[f]),
    };
  });
  const dto: BankStatsDto = {
    bankId: entry.bank.id,
    title: entry.bank.title,
    courseSlug: entry.courseSlug,
    timeLimitMinutes: entry.bank.settings.timeLimitMinutes,
    passingPercent: entry.bank.settings.passingPercent,
    scope: { classId: scope.selected?.id ?? null, label: scope.selected ? scope.selected.name : v.role === "admin" ? "All apprentices" : "All your classes" },
    classes: scope.classes.map((c) => ({ id: c.id, name: c.name })),
    n: rows.length,
    k,
    excludedAttempts: results.length - rows.length,
    items,
    kr20: stats?.kr20 ?? null,
    alpha: stats?.alpha ?? null,
    sem: stats?.sem ?? null,
    mean: stats?.mean ?? null,
    sd: stats?.sd ?? null,
    meanPercent: stats ? (100 * stats.mean) / k : null,
    histogram: scoreHistogram(kept.map((i) => results[i].scorePercent ?? 0)),
  };
  return { ok: true, stats: dto };
}

// Spreadsheet formula injection: a text cell starting with = + - @ (or tab/CR) is prefixed with '
// (OWASP, "CSV Injection").
function csvText(value: string): string {
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\n\r]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

function csvNumber(value: number | null): string {
  return value === null ? "" : value.toFixed(4);
}

export function statsCsv(stats: BankStatsDto): string {
  const header = ["position", "question_id", "kind", "topic", "prompt", "p", "D", "r_pb", "r_corrected", "flags", "n"];
  const lines = stats.items.map((item) =>
    [String(item.position), csvText(item.questionId), item.kind, csvText(item.topic), csvText(item.prompt), csvNumber(item.p), csvNumber(item.d), csvNumber(item.rpb), csvNumber(item.rCorrected), csvText(item.flagWords.join("; ")), String(stats.n)].join(","),
  );
  return [header.join(","), ...lines].join("\r\n") + "\r\n";
}

export type ExtensionTargetDto = { userId: string; name: string; className: string; extraMinutes: number };

/** Apprentices the instructor may give extra time on this bank, with what they have now. */
/** Instructors only (extra time is the apprentice's instructor's call); an unknown quiz is not_found. */
export async function listExtensionTargets(viewer: Viewer | null, input: { bankId: string; classId?: string | null }, database: Queryable = db()): Promise<Result<{ targets: ExtensionTargetDto[] }>> {
  const allowed = guard(viewer, ["instructor"], "Only an apprentice's instructor can give extra time.");
  if (!allowed.ok) return allowed;
  const entry = await getBankEntry(input.bankId);
  if (!entry) return fail("not_found", { message: NO_SUCH_QUIZ });
  const taught = (await visibleClasses(database, allowed.viewer, entry.courseSlug)).filter((c) => !input.classId || c.id === input.classId);
  if (taught.length === 0) return { ok: true, targets: [] };
  const learner = alias(classMembers, "learner");
  const rows = await database
    .select({ userId: users.id, name: users.name, className: classes.name, extraMinutes: sql<number>`coalesce(${quizTimeExtensions.extraMinutes}, 0)`.mapWith(Number) })
    .from(learner)
    .innerJoin(users, eq(users.id, learner.userId))
    .innerJoin(classes, eq(classes.id, learner.classId))
    .leftJoin(quizTimeExtensions, and(eq(quizTimeExtensions.userId, learner.userId), eq(quizTimeExtensions.bankId, entry.bank.id)))
    .where(and(inArray(learner.classId, taught.map((c) => c.id)), eq(learner.role, "apprentice")))
    .orderBy(asc(users.name));
  // An apprentice in two of the instructor's classes is listed once.
  return { ok: true, targets: [...new Map(rows.map((r) => [r.userId, r])).values()] };
}
