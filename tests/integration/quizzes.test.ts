import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { classMembers, classes, enrollments, quizAttempts, schools, type Role } from "@/db/schema";
import { ANSWER_KEY_FIELDS, drawQuestionInputs, type Answer, type ClientQuestion, type Question } from "@/lib/assessment";
import { getAttemptView, getResult, saveAnswer, startAttempt, submitAttempt, type AttemptViewDto } from "@/lib/server/attempts";
import { grantExtension } from "@/lib/server/quiz-extensions";
import { listAvailableQuizzes, listMyAttempts } from "@/lib/server/quiz-history";
import { statusOf, type Result } from "@/lib/server/errors";
import { getBankEntry, type BankEntry } from "@/lib/server/quiz-banks";
import { bankOrderFrom, bankOrderScores, getBankStatistics, resultItemScoresSql, resultQuestionIdsSql, statsCsv } from "@/lib/server/quiz-stats";
import type { Viewer } from "@/lib/server/viewer";
import { keyAnswerForView } from "../support/view-answer";
import { createUser, testDb } from "./helpers";

// The quiz data-access layer against a real PostgreSQL: who may touch an attempt, the deadline,
// idempotent submission, autosave ordering, the attempt limit, and statistics authorization.

const MODULE_BANK = "bank-miking-the-band-setup"; // untimed, 3 attempts
const FINAL_BANK = "bank-miking-the-band-final"; // 40 minutes, 2 attempts
const COURSE = "miking-the-band";

let moduleBank: BankEntry;
let finalBank: BankEntry;

async function person(role: Role): Promise<Viewer> {
  const u = await createUser(role);
  return { id: u.id, email: u.email, name: `Test ${role}`, role, sessionId: "00000000-0000-4000-8000-000000000000" };
}

async function enrolled(courseSlug = COURSE): Promise<Viewer> {
  const v = await person("apprentice");
  await testDb().insert(enrollments).values({ userId: v.id, courseSlug, source: "purchase" });
  return v;
}

function ok<T extends object>(result: Result<T>): T {
  if (!result.ok) throw new Error(`expected ok, got ${result.code}: ${result.message}`);
  return result;
}

async function started(v: Viewer, bankId = MODULE_BANK): Promise<string> {
  return ok(await startAttempt(v, { bankId })).attemptId;
}

/** The attempt as its owner sees it: the presented ids a browser answers in. */
async function shownTo(v: Viewer, attemptId: string): Promise<AttemptViewDto> {
  return ok(await getAttemptView(v, attemptId)).view;
}

/** A right answer to a question, as a browser would send it: in the ids the attempt showed. */
function rightAnswer(q: Question, view: AttemptViewDto): Answer {
  const shown = view.questions.find((x) => x.id === q.id);
  if (!shown) throw new Error(`${q.id} is not in attempt ${view.attemptId}`);
  return keyAnswerForView(q, shown);
}

async function seedOf(attemptId: string): Promise<number> {
  const [row] = await testDb().select({ seed: quizAttempts.seed }).from(quizAttempts).where(eq(quizAttempts.id, attemptId));
  return row.seed;
}

async function ageDeadline(attemptId: string, interval: string) {
  await testDb().execute(sql`update quiz_attempts set deadline_at = now() - ${interval}::interval where id = ${attemptId}`);
}

/** Every key field name and every explanation of the bank: none may appear before submission. */
function assertNoKeys(payload: unknown, entry: BankEntry) {
  const text = JSON.stringify(payload);
  for (const field of ANSWER_KEY_FIELDS.filter((f) => f !== "answer")) expect(text).not.toContain(`"${field}"`);
  for (const q of entry.bank.questions) expect(text).not.toContain(q.explanation);
}

beforeAll(async () => {
  moduleBank = (await getBankEntry(MODULE_BANK))!;
  finalBank = (await getBankEntry(FINAL_BANK))!;
  expect(moduleBank).toBeTruthy();
  expect(finalBank?.bank.settings.timeLimitMinutes).toBe(40);
});

afterAll(async () => {
  await closeDb();
});

describe("starting", () => {
  it("an apprentice without a seat on the course can't start its quiz", async () => {
    const outsider = await person("apprentice");
    const result = await startAttempt(outsider, { bankId: MODULE_BANK });
    expect(result).toMatchObject({ ok: false, code: "forbidden" });
    expect(statusOf((result as { code: "forbidden" }).code)).toBe(403);
    const elsewhere = await enrolled("how-microphones-hear");
    expect(await startAttempt(elsewhere, { bankId: MODULE_BANK })).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("instructors and signed-out visitors can't start; an unknown bank is not found", async () => {
    expect(await startAttempt(await person("instructor"), { bankId: MODULE_BANK })).toMatchObject({ code: "forbidden" });
    expect(await startAttempt(null, { bankId: MODULE_BANK })).toMatchObject({ code: "not_signed_in" });
    expect(await startAttempt(await enrolled(), { bankId: "bank-no-such-thing" })).toMatchObject({ code: "not_found" });
  });

  it("a second start resumes the open attempt instead of spending another", async () => {
    const v = await enrolled();
    const first = ok(await startAttempt(v, { bankId: MODULE_BANK }));
    const again = ok(await startAttempt(v, { bankId: MODULE_BANK }));
    expect(first.resumed).toBe(false);
    expect(again).toMatchObject({ attemptId: first.attemptId, resumed: true });
  });

  it("two concurrent starts (a double click) create one attempt", async () => {
    const v = await enrolled();
    const both = await Promise.all([startAttempt(v, { bankId: MODULE_BANK }), startAttempt(v, { bankId: MODULE_BANK })]);
    expect(new Set(both.map((r) => ok(r).attemptId)).size).toBe(1);
  });

  it("refuses a start once the attempts allowed are used", async () => {
    const v = await enrolled();
    const allowed = moduleBank.bank.settings.attemptsAllowed;
    for (let i = 0; i < allowed; i++) ok(await submitAttempt(v, { attemptId: await started(v) }));
    const over = await startAttempt(v, { bankId: MODULE_BANK });
    expect(over).toMatchObject({ ok: false, code: "conflict" });
    expect((over as { message: string }).message).toContain(`all ${allowed} attempts`);
    const available = ok(await listAvailableQuizzes(v)).courses[0].quizzes.find((q) => q.bankId === MODULE_BANK)!;
    expect(available).toMatchObject({ attemptsUsed: allowed, openAttemptId: null });
  });

  it("a timed quiz's deadline is the start plus the limit plus the apprentice's extension", async () => {
    const v = await enrolled();
    const attemptId = await started(v, FINAL_BANK);
    const [row] = await testDb().select().from(quizAttempts).where(eq(quizAttempts.id, attemptId));
    expect((row.deadlineAt!.getTime() - row.startedAt.getTime()) / 60_000).toBeCloseTo(40, 6);
  });
});

describe("only the owner touches an attempt", () => {
  it("another apprentice gets not found for view, save, submit and result", async () => {
    const owner = await enrolled();
    const other = await enrolled();
    const attemptId = await started(owner);
    const q = moduleBank.bank.questions[0];
    const answer = rightAnswer(q, await shownTo(owner, attemptId));
    expect(await getAttemptView(other, attemptId)).toMatchObject({ ok: false, code: "not_found" });
    expect(await saveAnswer(other, { attemptId, questionId: q.id, seq: 1, answer })).toMatchObject({ ok: false, code: "not_found" });
    expect(await submitAttempt(other, { attemptId })).toMatchObject({ ok: false, code: "not_found" });
    expect(await getResult(other, attemptId)).toMatchObject({ ok: false, code: "not_found" });
    // …and nothing happened to the owner's attempt.
    const view = ok(await getAttemptView(owner, attemptId)).view;
    expect(view).toMatchObject({ status: "in_progress", answers: {} });
    expect(await getAttemptView(owner, "not-a-uuid")).toMatchObject({ code: "not_found" });
  });
});

describe("answer keys stay on the server until submission", () => {
  it("no payload before submission carries a key field or an explanation", async () => {
    const v = await enrolled();
    const start = ok(await startAttempt(v, { bankId: MODULE_BANK }));
    assertNoKeys(start, moduleBank);
    const shown = await shownTo(v, start.attemptId);
    for (const q of moduleBank.bank.questions.slice(0, 6)) {
      assertNoKeys(await saveAnswer(v, { attemptId: start.attemptId, questionId: q.id, seq: 1, answer: rightAnswer(q, shown) }), moduleBank);
    }
    const view = ok(await getAttemptView(v, start.attemptId)).view;
    assertNoKeys(view, moduleBank);
    expect(view.result).toBeNull();
    const allowed = new Set(["id", "topic", "prompt", "points", "kind", "options", "unit", "acceptedUnits", "inputs", "items", "left", "right", "diagram", "regions"]);
    for (const q of view.questions) expect(Object.keys(q).filter((k) => !allowed.has(k))).toEqual([]);
    assertNoKeys(await listMyAttempts(v), moduleBank);
    assertNoKeys(await listAvailableQuizzes(v), moduleBank);
    expect(await getResult(v, start.attemptId)).toMatchObject({ ok: false, code: "conflict" });

    // After submission, with attempts left, the result has the score and right or wrong per
    // question, but neither the correct answers nor the explanations (quiz-integrity.test.ts).
    const submitted = ok(await submitAttempt(v, { attemptId: start.attemptId }));
    for (const q of moduleBank.bank.questions) expect(JSON.stringify(submitted)).not.toContain(q.explanation);
    expect(submitted.result.questions.every((q) => q.explanation === null && q.correctAnswer === null)).toBe(true);
    expect(submitted.result.questions.filter((q) => q.outcome === "correct").length).toBe(6);
  });
});

describe("the time limit is the server's", () => {
  it("after the deadline a save is refused with 409 and a submit grades what was saved, answered 409", async () => {
    const v = await enrolled();
    const attemptId = await started(v, FINAL_BANK);
    const shown = await shownTo(v, attemptId);
    const [q1, q2] = finalBank.bank.questions;
    ok(await saveAnswer(v, { attemptId, questionId: q1.id, seq: 1, answer: rightAnswer(q1, shown) }));
    await ageDeadline(attemptId, "1 minute");
    const late = await saveAnswer(v, { attemptId, questionId: q2.id, seq: 2, answer: rightAnswer(q2, shown) });
    expect(late).toMatchObject({ ok: false, code: "conflict" });
    expect(statusOf((late as { code: "conflict" }).code)).toBe(409);
    const submit = await submitAttempt(v, { attemptId });
    expect(submit).toMatchObject({ ok: false, code: "conflict" });
    const result = ok(await getResult(v, attemptId)).result;
    expect(result.timedOut).toBe(true);
    expect(result.questions.filter((q) => q.outcome === "correct").map((q) => q.questionId)).toEqual([q1.id]);
    const [row] = await testDb().select().from(quizAttempts).where(eq(quizAttempts.id, attemptId));
    expect(row.submittedAt?.getTime()).toBe(row.deadlineAt?.getTime()); // closed as of the deadline
  });

  it("a save a moment after the deadline, within the grace, still counts", async () => {
    const v = await enrolled();
    const attemptId = await started(v, FINAL_BANK);
    const q = finalBank.bank.questions[0];
    await ageDeadline(attemptId, "2 seconds");
    expect(await saveAnswer(v, { attemptId, questionId: q.id, seq: 1, answer: rightAnswer(q, await shownTo(v, attemptId)) })).toMatchObject({ ok: true });
  });

  it("an overdue attempt is graded when next opened, and a new start is allowed", async () => {
    const v = await enrolled();
    const attemptId = await started(v, FINAL_BANK);
    await ageDeadline(attemptId, "10 minutes");
    const view = ok(await getAttemptView(v, attemptId)).view;
    expect(view.status).toBe("timed_out");
    expect(view.result?.timedOut).toBe(true);
    const next = ok(await startAttempt(v, { bankId: FINAL_BANK }));
    expect(next).toMatchObject({ resumed: false });
    expect(next.attemptId).not.toBe(attemptId);
  });
});

describe("submission", () => {
  it("two concurrent submits grade once and return the same result", async () => {
    const v = await enrolled();
    const attemptId = await started(v);
    const shown = await shownTo(v, attemptId);
    for (const q of moduleBank.bank.questions.slice(0, 5)) ok(await saveAnswer(v, { attemptId, questionId: q.id, seq: 1, answer: rightAnswer(q, shown) }));
    const [a, b] = await Promise.all([submitAttempt(v, { attemptId }), submitAttempt(v, { attemptId })]);
    const both = [ok(a), ok(b)];
    expect(both.map((r) => r.alreadySubmitted).sort()).toEqual([false, true]);
    expect(both[0].result).toEqual(both[1].result);
    expect(both[0].result.earnedPoints).toBe(5);
    const third = ok(await submitAttempt(v, { attemptId }));
    expect(third).toMatchObject({ alreadySubmitted: true, result: { submittedAt: both[0].result.submittedAt } });
    // A retry reads the owner's attempt counts with the row: the same review note, counted for this apprentice only.
    expect(third.result).toEqual(both[0].result);
    expect(third.result.answersNote).toContain("you have used 1)");
    expect(await saveAnswer(v, { attemptId, questionId: moduleBank.bank.questions[6].id, seq: 9, answer: rightAnswer(moduleBank.bank.questions[6], shown) })).toMatchObject({ code: "conflict" });
  });

  it("a save racing a submit is either graded or refused, never silently lost", async () => {
    const v = await enrolled();
    const q = moduleBank.bank.questions[0];
    for (let round = 0; round < 2; round++) {
      const attemptId = await started(v);
      const answer = rightAnswer(q, await shownTo(v, attemptId));
      const [saved, submitted] = await Promise.all([saveAnswer(v, { attemptId, questionId: q.id, seq: 1, answer }), submitAttempt(v, { attemptId })]);
      const outcome = ok(submitted).result.questions.find((x) => x.questionId === q.id)!.outcome;
      if (saved.ok) expect(outcome).toBe("correct");
      else expect(saved).toMatchObject({ code: "conflict" });
    }
  });

  it("grades a generated question with the numbers drawn for this attempt", async () => {
    const v = await enrolled();
    const attemptId = await started(v);
    const seed = await seedOf(attemptId);
    const generated = moduleBank.bank.questions.find((q) => q.kind === "generated")!;
    const view = ok(await getAttemptView(v, attemptId)).view;
    const shown = view.questions.find((q) => q.id === generated.id)!;
    expect(shown.kind === "generated" && shown.inputs).toEqual(drawQuestionInputs(generated as Extract<Question, { kind: "generated" }>, seed));
    ok(await saveAnswer(v, { attemptId, questionId: generated.id, seq: 1, answer: rightAnswer(generated, view) }));
    const result = ok(await submitAttempt(v, { attemptId })).result;
    expect(result.questions.find((q) => q.questionId === generated.id)?.outcome).toBe("correct");
  });
});

describe("autosave ordering", () => {
  it("a save with a lower or equal seq is ignored and acknowledged with the stored seq", async () => {
    const v = await enrolled();
    const attemptId = await started(v);
    const q = (await shownTo(v, attemptId)).questions.find((x) => x.kind === "single") as Extract<ClientQuestion, { kind: "single" }>;
    const [first, second] = q.options;
    expect(await saveAnswer(v, { attemptId, questionId: q.id, seq: 5, answer: { kind: "single", optionId: first.id } })).toMatchObject({ ok: true, seq: 5, stale: false });
    expect(await saveAnswer(v, { attemptId, questionId: q.id, seq: 3, answer: { kind: "single", optionId: second.id } })).toMatchObject({ ok: true, seq: 5, stale: true });
    expect(await saveAnswer(v, { attemptId, questionId: q.id, seq: 5, answer: { kind: "single", optionId: second.id } })).toMatchObject({ ok: true, seq: 5, stale: true });
    expect(ok(await getAttemptView(v, attemptId)).view.answers[q.id]).toMatchObject({ seq: 5, answer: { optionId: first.id } });
    expect(await saveAnswer(v, { attemptId, questionId: q.id, seq: 6, answer: { kind: "single", optionId: second.id } })).toMatchObject({ ok: true, seq: 6, stale: false });
    expect(ok(await getAttemptView(v, attemptId)).view.answers[q.id]).toMatchObject({ seq: 6, answer: { optionId: second.id } });
  });

  it("refuses an answer of the wrong kind or for a question outside the attempt", async () => {
    const v = await enrolled();
    const attemptId = await started(v);
    const single = moduleBank.bank.questions.find((x) => x.kind === "single")!;
    expect(await saveAnswer(v, { attemptId, questionId: single.id, seq: 1, answer: { kind: "numeric", value: 1 } })).toMatchObject({ code: "invalid_input" });
    expect(await saveAnswer(v, { attemptId, questionId: "q-not-here", seq: 1, answer: { kind: "numeric", value: 1 } })).toMatchObject({ code: "not_found" });
    expect(await saveAnswer(v, { attemptId, questionId: single.id, seq: -1, answer: { kind: "single", optionId: "a" } })).toMatchObject({ code: "invalid_input" });
  });
});

describe("statistics and extra time are for the class's own instructor", () => {
  let teacher: Viewer;
  let otherTeacher: Viewer;
  let learner: Viewer;
  let classId: string;
  let otherClassId: string;

  beforeAll(async () => {
    teacher = await person("instructor");
    otherTeacher = await person("instructor");
    learner = await enrolled();
    const [school] = await testDb().insert(schools).values({ slug: `quiz-school-${Date.now()}`, name: "Quiz Test School" }).returning();
    const [mine, theirs] = await testDb()
      .insert(classes)
      .values([
        { schoolId: school.id, name: "Quiz class A", term: "Test", courseSlug: COURSE },
        { schoolId: school.id, name: "Quiz class B", term: "Test", courseSlug: COURSE },
      ])
      .returning();
    classId = mine.id;
    otherClassId = theirs.id;
    await testDb().insert(classMembers).values([
      { classId, userId: teacher.id, role: "instructor" },
      { classId, userId: learner.id, role: "apprentice" },
      { classId: otherClassId, userId: otherTeacher.id, role: "instructor" },
    ]);
    const attemptId = await started(learner);
    const shown = await shownTo(learner, attemptId);
    for (const q of moduleBank.bank.questions.slice(0, 10)) ok(await saveAnswer(learner, { attemptId, questionId: q.id, seq: 1, answer: rightAnswer(q, shown) }));
    ok(await submitAttempt(learner, { attemptId }));
  });

  it("the class's instructor reads its statistics, per class and overall", async () => {
    const { stats } = ok(await getBankStatistics(teacher, { bankId: MODULE_BANK, classId }, testDb()));
    expect(stats).toMatchObject({ n: 1, k: moduleBank.bank.questions.length, scope: { classId } });
    expect(stats.items.slice(0, 10).every((i) => i.p === 1)).toBe(true);
    expect(stats.histogram.reduce((s, b) => s + b.count, 0)).toBe(1);
    expect(ok(await getBankStatistics(teacher, { bankId: MODULE_BANK }, testDb())).stats.n).toBe(1);
    expect(statsCsv(stats).split("\r\n")[0]).toBe("position,question_id,kind,topic,prompt,p,D,r_pb,r_corrected,flags,n");
  });

  it("the ids and scores the database picks from a result give the same bank-order scores as the whole result, null where a question is missing", async () => {
    const picked = { result: quizAttempts.result, questionIds: resultQuestionIdsSql, scores: resultItemScoresSql };
    const [graded] = await testDb().select(picked).from(quizAttempts).where(eq(quizAttempts.userId, learner.id));
    const scores = bankOrderFrom(moduleBank, graded.questionIds, graded.scores);
    expect(scores).toEqual(bankOrderScores(moduleBank, graded.result!));
    expect(scores.slice(0, 10)).toEqual(Array(10).fill(1));
    // An older attempt, graded before the bank's last question was added (here: the question dropped from its result).
    const older = await person("apprentice");
    const items = graded.result!.items.filter((i) => i.questionId !== moduleBank.bank.questions.at(-1)!.id);
    const [row] = await testDb()
      .insert(quizAttempts)
      .values({ userId: older.id, bankId: MODULE_BANK, courseSlug: COURSE, seed: 1, questionOrder: items.map((i) => i.questionId), submittedAt: new Date(), result: { ...graded.result!, items } })
      .returning({ id: quizAttempts.id });
    const [projected] = await testDb().select(picked).from(quizAttempts).where(eq(quizAttempts.id, row.id));
    const olderScores = bankOrderFrom(moduleBank, projected.questionIds, projected.scores);
    expect(olderScores.at(-1)).toBeNull();
    expect(olderScores).toEqual(bankOrderScores(moduleBank, { ...graded.result!, items }));
  });

  it("an instructor of another class is refused that class, and sees none of its attempts overall", async () => {
    expect(await getBankStatistics(otherTeacher, { bankId: MODULE_BANK, classId }, testDb())).toMatchObject({ ok: false, code: "not_found" });
    expect(ok(await getBankStatistics(otherTeacher, { bankId: MODULE_BANK }, testDb())).stats.n).toBe(0);
    const stranger = await person("instructor");
    expect(await getBankStatistics(stranger, { bankId: MODULE_BANK }, testDb())).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("apprentices and signed-out visitors are refused; an admin may read any class", async () => {
    expect(await getBankStatistics(learner, { bankId: MODULE_BANK }, testDb())).toMatchObject({ ok: false, code: "forbidden" });
    expect(await getBankStatistics(null, { bankId: MODULE_BANK }, testDb())).toMatchObject({ ok: false, code: "not_signed_in" });
    const admin = await person("admin");
    expect(ok(await getBankStatistics(admin, { bankId: MODULE_BANK, classId }, testDb())).stats.n).toBe(1);
  });

  it("extra time: only the apprentice's instructor grants it, and it moves the deadline", async () => {
    expect(await grantExtension(otherTeacher, { userId: learner.id, bankId: FINAL_BANK, extraMinutes: 15 })).toMatchObject({ ok: false, code: "forbidden" });
    expect(await grantExtension(learner, { userId: learner.id, bankId: FINAL_BANK, extraMinutes: 15 })).toMatchObject({ ok: false, code: "forbidden" });
    expect(await grantExtension(teacher, { userId: learner.id, bankId: MODULE_BANK, extraMinutes: 15 })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await grantExtension(teacher, { userId: learner.id, bankId: FINAL_BANK, extraMinutes: 15 })).toMatchObject({ ok: true, extraMinutes: 15, openAttemptsExtended: 0 });
    const attemptId = await started(learner, FINAL_BANK);
    const deadlineMinutes = async () => {
      const [row] = await testDb().select().from(quizAttempts).where(eq(quizAttempts.id, attemptId));
      return (row.deadlineAt!.getTime() - row.startedAt.getTime()) / 60_000;
    };
    expect(await deadlineMinutes()).toBeCloseTo(55, 6);
    // Given during the attempt, it moves the deadline of the attempt under way.
    expect(await grantExtension(teacher, { userId: learner.id, bankId: FINAL_BANK, extraMinutes: "25" })).toMatchObject({ ok: true, openAttemptsExtended: 1 });
    expect(await deadlineMinutes()).toBeCloseTo(65, 6);
  });
});
