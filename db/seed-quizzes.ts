// Demo quiz attempts for the spring class on "Miking the band": ~30 graded, submitted attempts
// on the first module quizzes, answered by a deterministic pseudo-random model (each apprentice
// has an ability, each question a difficulty), so the item statistics have something to show.
// Idempotent: an apprentice who already has attempts on a bank is not given more.
import { createHash } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import type { Database } from "./connection";
import { quizAnswers, quizAttempts, users } from "./schema";
import { DEMO_CLASSES, DEMO_USERS } from "./seed-data";
import { acousticsGenerators, computeGeneratedKey, drawQuestionInputs, mulberry32, type Answer, type Question } from "@/lib/assessment";
import { fnv1a32 } from "@/lib/assessment/random";
import { presenterOf } from "@/lib/server/attempt-presenter";
import { gradeSavedAnswers } from "@/lib/server/attempts";
import { getBankEntry, questionOrderFor, type BankEntry } from "@/lib/server/quiz-banks";

/** Attempts per bank: who takes it, and who takes it a second time. Later modules: fewer so far. */
const PLAN: { bankId: string; takers: string[]; retakers: string[]; daysAgo: number }[] = [
  { bankId: "bank-miking-the-band-setup", takers: ["ade", "lena", "marco", "sunniva", "kofi", "yara", "felix", "mira"], retakers: ["marco", "kofi"], daysAgo: 9 },
  // Ade's first drums attempt is left to the end-to-end test, which takes that quiz.
  { bankId: "bank-miking-the-band-drums", takers: ["lena", "marco", "sunniva", "kofi", "yara", "felix", "mira"], retakers: ["felix"], daysAgo: 6 },
  { bankId: "bank-miking-the-band-instruments", takers: ["ade", "lena", "sunniva", "yara", "mira"], retakers: ["lena"], daysAgo: 4 },
  { bankId: "bank-miking-the-band-vocals-and-wireless", takers: ["ade", "lena", "sunniva", "yara", "mira", "felix"], retakers: [], daysAgo: 2 },
];

/** Invented abilities on a logit scale; a retake adds a little (the apprentice revised). */
const ABILITY: Record<string, number> = { ade: 1.3, lena: 0.9, marco: -0.5, sunniva: 0.4, kofi: -1.0, yara: 0.7, felix: -0.2, mira: 0.1 };
const RETAKE_GAIN = 0.5;
const DAY_MS = 86_400_000;

/** A question's invented difficulty in [−1.2, 1.2], fixed by its id. */
function difficultyOf(questionId: string): number {
  return (fnv1a32(`difficulty:${questionId}`) / 0xffffffff) * 2.4 - 1.2;
}

function otherThan<T extends { id: string }>(items: readonly T[], ids: readonly string[]): T | undefined {
  return items.find((item) => !ids.includes(item.id));
}

/** The right answer, or a plausible wrong (sometimes partly right) one. */
export function demoAnswerFor(question: Question, right: boolean, seed: number): Answer {
  switch (question.kind) {
    case "single":
      return { kind: "single", optionId: right ? question.correctOptionId : (otherThan(question.options, [question.correctOptionId])?.id ?? question.correctOptionId) };
    case "multiple": {
      if (right) return { kind: "multiple", optionIds: [...question.correctOptionIds] };
      const wrong = otherThan(question.options, question.correctOptionIds);
      return { kind: "multiple", optionIds: [...question.correctOptionIds.slice(1), ...(wrong ? [wrong.id] : [])] };
    }
    case "numeric":
      return { kind: "numeric", value: right ? question.answer : question.answer * 2 + 1, unit: question.unit };
    case "generated": {
      const key = computeGeneratedKey(question, drawQuestionInputs(question, seed), acousticsGenerators);
      return { kind: "generated", value: right ? key.value : key.value * 1.5 + 1, unit: key.unit };
    }
    case "ordering": {
      const order = [...question.correctOrder];
      if (!right) [order[0], order[1]] = [order[1], order[0]];
      return { kind: "ordering", order };
    }
    case "matching": {
      const pairs = { ...question.correctPairs };
      if (!right) {
        const [firstLeft] = Object.keys(pairs);
        pairs[firstLeft] = otherThan(question.right, [pairs[firstLeft]])?.id ?? pairs[firstLeft];
      }
      return { kind: "matching", pairs };
    }
    case "hotspot":
      return { kind: "hotspot", pick: { by: "region", regionId: right ? question.correctRegionIds[0] : (otherThan(question.regions, question.correctRegionIds)?.id ?? question.correctRegionIds[0]) } };
  }
}

async function seedOneAttempt(db: Database, entry: BankEntry, userId: string, userKey: string, attemptNo: number, daysAgo: number): Promise<void> {
  const random = mulberry32(fnv1a32(`${userKey}:${entry.bank.id}:${attemptNo}`));
  const seed = 1 + Math.floor(random() * 2_000_000_000);
  // Demo rows are reproducible, so their secret is derived from their names; a real attempt's
  // secret comes from crypto.randomBytes (lib/server/attempt-presenter.ts). These attempts are
  // all submitted: their order and ids help no later attempt, which gets its own secret.
  const presentationSecret = createHash("sha256").update(`demo attempt:${userKey}:${entry.bank.id}:${attemptNo}`).digest("base64url");
  const questionOrder = questionOrderFor(entry.bank, presenterOf({ presentationSecret, seed }));
  const ability = (ABILITY[userKey] ?? 0) + (attemptNo > 1 ? RETAKE_GAIN : 0);
  const answers = new Map<string, Answer>();
  for (const id of questionOrder) {
    if (random() < 0.04) continue; // now and then a question is left unanswered
    const question = entry.questionsById.get(id)!;
    const chance = 1 / (1 + Math.exp(-1.7 * (ability - difficultyOf(id)))); // logistic item response
    answers.set(id, demoAnswerFor(question, random() < chance, seed));
  }
  const { stored, passed } = gradeSavedAnswers(entry, { seed, questionOrder }, answers, false);
  const startedAt = new Date(Date.now() - (daysAgo - (attemptNo - 1)) * DAY_MS - Math.floor(random() * 8) * 3_600_000);
  const submittedAt = new Date(startedAt.getTime() + (12 + Math.floor(random() * 14)) * 60_000);
  const [attempt] = await db
    .insert(quizAttempts)
    .values({ userId, bankId: entry.bank.id, courseSlug: entry.courseSlug, seed, presentationSecret, questionOrder, startedAt, submittedAt, scorePercent: stored.percent, passed, result: stored })
    .returning({ id: quizAttempts.id });
  const rows = [...answers].map(([questionId, answer], index) => ({ attemptId: attempt.id, questionId, answer, seq: index + 1, savedAt: new Date(startedAt.getTime() + (index + 1) * 40_000) }));
  if (rows.length > 0) await db.insert(quizAnswers).values(rows);
}

/** Creates the demo attempts; call after seedDemo (it needs the demo apprentices). */
export async function seedQuizAttempts(db: Database): Promise<void> {
  const klass = DEMO_CLASSES.find((c) => c.courseSlug === "miking-the-band");
  if (!klass) return;
  const emails = new Map(DEMO_USERS.filter((u) => klass.apprentices.includes(u.key)).map((u) => [u.email, u.key]));
  const found = await db.select({ id: users.id, email: users.email }).from(users).where(inArray(users.email, [...emails.keys()]));
  const idOf = new Map(found.map((u) => [emails.get(u.email)!, u.id]));
  for (const plan of PLAN) {
    const entry = await getBankEntry(plan.bankId);
    if (!entry) continue; // the bank is not written yet
    for (const key of plan.takers) {
      const userId = idOf.get(key);
      if (!userId) continue;
      const existing = await db.select({ id: quizAttempts.id }).from(quizAttempts).where(and(eq(quizAttempts.userId, userId), eq(quizAttempts.bankId, plan.bankId)));
      if (existing.length > 0) continue;
      const attempts = plan.retakers.includes(key) ? 2 : 1;
      for (let n = 1; n <= attempts; n++) await seedOneAttempt(db, entry, userId, key, n, plan.daysAgo);
    }
  }
}
