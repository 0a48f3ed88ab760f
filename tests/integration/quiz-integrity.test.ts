import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { classMembers, classes, enrollments, quizAttempts, schools, users } from "@/db/schema";
import type { Answer, ClientQuestion, Question } from "@/lib/assessment";
import { getAttemptView, getResult, saveAnswer, startAttempt, submitAttempt, type AttemptViewDto } from "@/lib/server/attempts";
import { grantExtension } from "@/lib/server/quiz-extensions";
import type { Ok, Result } from "@/lib/server/errors";
import { getBankEntry, type BankEntry } from "@/lib/server/quiz-banks";
import { diagramBounds } from "@/components/quiz/diagram-bounds";
import type { Viewer } from "@/lib/server/viewer";
import { uniformityAtAlpha001 } from "../support/chi-square";
import { uniqueEmail } from "../support/unique";
import { keyAnswerForView } from "../support/view-answer";
import { testDb } from "./helpers";
import { choiceIds } from "../support/choice-ids";

// Quiz integrity against a real PostgreSQL: what the browser is shown says nothing about the
// key, a first attempt submitted empty teaches nothing about the second, extra time never
// reopens an attempt that had run out, and every acknowledged autosave is graded.

const MODULE_BANK = "bank-miking-the-band-setup"; // untimed, 3 attempts
const FINAL_BANK = "bank-miking-the-band-final"; // 40 minutes, 2 attempts
const COURSE = "miking-the-band";

let moduleBank: BankEntry;

function ok<T extends object>(result: Result<T>): Ok<T> {
  if (!result.ok) throw new Error(`expected ok, got ${result.code}: ${result.message}`);
  return result;
}

/** The refusal's code, or "ok". */
const failureCode = (result: Result<object>) => (result.ok ? "ok" : result.code);

/** `count` enrolled apprentices, inserted in bulk (no password: these never sign in). */
async function apprentices(count: number): Promise<Viewer[]> {
  const rows = await testDb()
    .insert(users)
    .values(Array.from({ length: count }, (_, i) => ({ email: uniqueEmail(`integrity-${i}`), name: `Apprentice ${i}`, role: "apprentice" as const, emailVerifiedAt: sql`now()` })))
    .returning({ id: users.id, email: users.email });
  await testDb()
    .insert(enrollments)
    .values(rows.map((r) => ({ userId: r.id, courseSlug: COURSE, source: "purchase" as const })));
  return rows.map((r) => ({ id: r.id, email: r.email, name: "Apprentice", role: "apprentice", sessionId: "00000000-0000-4000-8000-000000000000" }));
}

async function person(role: "instructor"): Promise<Viewer> {
  const [row] = await testDb().insert(users).values({ email: uniqueEmail(role), name: `Test ${role}`, role, emailVerifiedAt: sql`now()` }).returning({ id: users.id, email: users.email });
  return { id: row.id, email: row.email, name: `Test ${role}`, role, sessionId: "00000000-0000-4000-8000-000000000000" };
}

async function startAndView(v: Viewer, bankId = MODULE_BANK): Promise<AttemptViewDto> {
  const { attemptId } = ok(await startAttempt(v, { bankId }));
  return ok(await getAttemptView(v, attemptId)).view;
}


const allShownIds = (view: AttemptViewDto) => view.questions.flatMap(choiceIds);

function shownQuestion<K extends Question["kind"]>(view: AttemptViewDto, kind: K): { question: Extract<Question, { kind: K }>; shown: Extract<ClientQuestion, { kind: K }> } {
  const shown = view.questions.find((q) => q.kind === kind) as Extract<ClientQuestion, { kind: K }>;
  return { question: moduleBank.questionsById.get(shown.id) as Extract<Question, { kind: K }>, shown };
}

beforeAll(async () => {
  moduleBank = (await getBankEntry(MODULE_BANK))!;
  expect(moduleBank.bank.settings).toMatchObject({ attemptsAllowed: 3, showCorrectAnswers: true });
});

afterAll(async () => {
  await closeDb();
});

describe("what the browser is shown says nothing about the key", () => {
  it("over 1,000 started attempts the key's position and the rank of its id are uniform (chi-square, α = 0.001), and ids never repeat", async () => {
    const learners = await apprentices(1000);
    const views: AttemptViewDto[] = [];
    for (let i = 0; i < learners.length; i += 20) views.push(...(await Promise.all(learners.slice(i, i + 20).map((v) => startAndView(v)))));
    // Single-choice questions with four shuffled options (most of the bank); k = 4 cells.
    const singles = moduleBank.bank.questions.filter((q): q is Extract<Question, { kind: "single" }> => q.kind === "single" && q.options.length === 4 && q.shuffle !== false);
    expect(singles.length).toBeGreaterThanOrEqual(3);
    const byPosition = [0, 0, 0, 0];
    const byRank = [0, 0, 0, 0];
    for (const question of singles) {
      const keyText = question.options.find((o) => o.id === question.correctOptionId)!.text;
      const seen = new Set<string>();
      for (const view of views) {
        const shown = view.questions.find((q) => q.id === question.id);
        if (shown?.kind !== "single") throw new Error(`${question.id} missing from a view`);
        const position = shown.options.findIndex((o) => o.text === keyText);
        byPosition[position] += 1;
        byRank[shown.options.map((o) => o.id).sort().indexOf(shown.options[position].id)] += 1;
        for (const o of shown.options) seen.add(o.id);
      }
      expect(seen.size, `${question.id}: distinct option ids over 1,000 attempts`).toBe(1000 * question.options.length);
    }
    // Real random secrets, so the statistic is random: at α = 0.001 a fair shuffle fails one run in a
    // thousand per statistic (the unit test of the same property, on fixed secrets, uses α = 0.01).
    const position = uniformityAtAlpha001(byPosition, 0.001);
    const rank = uniformityAtAlpha001(byRank, 0.001);
    expect(position.statistic, `key position counts ${position.counts.join("/")}`).toBeLessThan(position.critical);
    expect(rank.statistic, `rank of the key's id counts ${rank.counts.join("/")}`).toBeLessThan(rank.critical);
  }, 180_000);
});

describe("a first attempt submitted empty gains nothing", () => {
  it("reveals no keys or explanations while attempts remain, and attempt 2's view carries nothing of attempt 1", async () => {
    const [v] = await apprentices(1);
    const explanations = moduleBank.bank.questions.map((q) => q.explanation);
    const first = await startAndView(v);
    const submitted = ok(await submitAttempt(v, { attemptId: first.attemptId })).result;
    expect(submitted.percent).toBe(0);
    const hidden = (result: typeof submitted) => {
      const text = JSON.stringify(result);
      for (const explanation of explanations) expect(text).not.toContain(explanation);
      expect(result.questions.every((q) => q.correctAnswer === null && !q.explanation)).toBe(true);
      expect(result.questions.every((q) => q.outcome === "not answered" || q.outcome === "correct" || q.outcome === "incorrect" || q.outcome === "partly correct")).toBe(true);
    };
    hidden(submitted);
    // A sentence says when the answers will be shown.
    expect((submitted as { answersNote?: string | null }).answersNote).toMatch(/all 3 attempts/);
    hidden(ok(await getResult(v, first.attemptId)).result);

    const second = await startAndView(v);
    const before = new Set(allShownIds(first));
    expect(allShownIds(second).filter((id) => before.has(id))).toEqual([]);
    expect(second.result).toBeNull();
    expect(second.answers).toEqual({});
    for (const explanation of explanations) expect(JSON.stringify(second)).not.toContain(explanation);
    // While attempt 2 is open, attempt 1's result still hides the key.
    hidden(ok(await getResult(v, first.attemptId)).result);

    ok(await submitAttempt(v, { attemptId: second.attemptId }));
    const third = await startAndView(v);
    hidden(ok(await getResult(v, first.attemptId)).result);
    // The last attempt answered right through the ids it was shown: grading maps them back.
    let seq = 0;
    for (const shown of third.questions) {
      const answer = keyAnswerForView(moduleBank.questionsById.get(shown.id)!, shown);
      ok(await saveAnswer(v, { attemptId: third.attemptId, questionId: shown.id, seq: ++seq, answer }));
    }
    const last = ok(await submitAttempt(v, { attemptId: third.attemptId })).result;
    expect(last.percent).toBe(100);
    // No attempt left: every result now shows the keys and explanations.
    for (const attemptId of [first.attemptId, second.attemptId, third.attemptId]) {
      const result = ok(await getResult(v, attemptId)).result;
      expect(result.questions.every((q) => q.correctAnswer !== null && (q.explanation ?? "").length > 0)).toBe(true);
    }
  });
});

describe("answers are checked against the question that was shown", () => {
  it("refuses ids that are not the question's, a point outside the diagram and prototype keys", async () => {
    const [v] = await apprentices(1);
    const view = await startAndView(v);
    const save = (questionId: string, answer: unknown, seq: number) => saveAnswer(v, { attemptId: view.attemptId, questionId, seq, answer }, { diagramBounds });
    const matching = shownQuestion(view, "matching");
    const [leftA] = matching.shown.left;
    const [rightA] = matching.shown.right;
    expect(failureCode(await save(matching.shown.id, { kind: "matching", pairs: { [leftA.id]: "not-a-choice" } }, 1))).toBe("invalid_input");
    expect(failureCode(await save(matching.shown.id, { kind: "matching", pairs: { "not-an-item": rightA.id } }, 2))).toBe("invalid_input");
    expect(failureCode(await save(matching.shown.id, JSON.parse(`{"kind": "matching", "pairs": {"constructor": "${rightA.id}"}}`), 3))).toBe("invalid_input");
    expect(ok(await save(matching.shown.id, { kind: "matching", pairs: { [leftA.id]: rightA.id } }, 4))).toMatchObject({ seq: 4 });

    const single = shownQuestion(view, "single");
    expect(failureCode(await save(single.shown.id, { kind: "single", optionId: "not-an-option" }, 5))).toBe("invalid_input");

    const hotspot = shownQuestion(view, "hotspot");
    expect(failureCode(await save(hotspot.shown.id, { kind: "hotspot", pick: { by: "point", x: -5000, y: 10 } }, 6))).toBe("invalid_input");
    expect(failureCode(await save(hotspot.shown.id, { kind: "hotspot", pick: { by: "point", x: 10, y: 1e9 } }, 7))).toBe("invalid_input");
    expect(failureCode(await save(hotspot.shown.id, { kind: "hotspot", pick: { by: "region", regionId: "not-a-region" } }, 8))).toBe("invalid_input");
    const region = hotspot.shown.regions[0];
    const centre = region.shape.type === "circle" ? { x: region.shape.cx, y: region.shape.cy } : { x: region.shape.x + region.shape.w / 2, y: region.shape.y + region.shape.h / 2 };
    expect(ok(await save(hotspot.shown.id, { kind: "hotspot", pick: { by: "point", ...centre } }, 9))).toMatchObject({ seq: 9 });
  });
});

describe("quiz time and autosave edges", () => {
  it("extra time granted after an attempt ran out does not reopen it", async () => {
    const teacher = await person("instructor");
    const [learner] = await apprentices(1);
    const [school] = await testDb().insert(schools).values({ slug: `integrity-school-${Date.now()}`, name: "Integrity Test School" }).returning();
    const [klass] = await testDb().insert(classes).values({ schoolId: school.id, name: "Integrity class", term: "Test", courseSlug: COURSE }).returning();
    await testDb().insert(classMembers).values([
      { classId: klass.id, userId: teacher.id, role: "instructor" },
      { classId: klass.id, userId: learner.id, role: "apprentice" },
    ]);
    const view = await startAndView(learner, FINAL_BANK);
    const finalBank = (await getBankEntry(FINAL_BANK))!;
    const shown = view.questions[0];
    ok(await saveAnswer(learner, { attemptId: view.attemptId, questionId: shown.id, seq: 1, answer: keyAnswerForView(finalBank.questionsById.get(shown.id)!, shown) }));
    // Ran out ten minutes ago (well past the grace) and nobody has touched it since.
    await testDb().execute(sql`update quiz_attempts set deadline_at = now() - interval '10 minutes' where id = ${view.attemptId}`);
    const [{ deadlineAt }] = await testDb().select({ deadlineAt: quizAttempts.deadlineAt }).from(quizAttempts).where(eq(quizAttempts.id, view.attemptId));

    const granted = ok(await grantExtension(teacher, { userId: learner.id, bankId: FINAL_BANK, extraMinutes: 60 }));
    expect(granted.openAttemptsExtended).toBe(0);
    const [row] = await testDb().select().from(quizAttempts).where(eq(quizAttempts.id, view.attemptId));
    expect(row.deadlineAt?.getTime()).toBe(deadlineAt?.getTime());
    expect(row.submittedAt?.getTime()).toBe(deadlineAt?.getTime());
    const late: Answer = keyAnswerForView(finalBank.questionsById.get(view.questions[1].id)!, view.questions[1]);
    expect(failureCode(await saveAnswer(learner, { attemptId: view.attemptId, questionId: view.questions[1].id, seq: 2, answer: late }))).toBe("conflict");
    const after = ok(await getAttemptView(learner, view.attemptId)).view;
    expect(after.status).toBe("timed_out");
    expect(after.result?.questions.filter((q) => q.outcome === "correct").map((q) => q.questionId)).toEqual([shown.id]);
  });

  it("an autosave acknowledged while a submit waits for the row is graded (50 races)", async () => {
    const learners = await apprentices(50);
    const lost: string[] = [];
    let acknowledged = 0;
    for (const [round, v] of learners.entries()) {
      const view = await startAndView(v);
      const shown = view.questions[round % view.questions.length];
      const answer = keyAnswerForView(moduleBank.questionsById.get(shown.id)!, shown);
      const [saved, submitted] = await Promise.all([
        saveAnswer(v, { attemptId: view.attemptId, questionId: shown.id, seq: 1, answer }),
        submitAttempt(v, { attemptId: view.attemptId }),
      ]);
      const result = ok(submitted).result;
      const outcome = result.questions.find((q) => q.questionId === shown.id)?.outcome;
      if (saved.ok) {
        acknowledged += 1;
        if (outcome !== "correct") lost.push(`round ${round}: acknowledged, graded "${outcome}"`);
      } else {
        expect(failureCode(saved)).toBe("conflict");
      }
    }
    expect(lost).toEqual([]);
    expect(acknowledged).toBeGreaterThan(0);
  }, 120_000);
});
