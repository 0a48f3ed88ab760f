import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { DEMO_USERS } from "@/db/seed-data";
import { A, B, context, sessionCookieOf, withDb } from "./cluster";

// A quiz lives in PostgreSQL: an answer autosaved on instance A is graded by a submit on B.
// The answer is chosen from the attempt view the server returns (its ids mean nothing to us),
// by the words of the option the bank marks correct, as a person who knows the answer would.

const BANK_FILE = "content/banks/how-microphones-hear/transducers.json";
type BankQuestion = { kind: string; prompt: string; options?: { id: string; text: string }[]; correctOptionId?: string };
const BANK = JSON.parse(readFileSync(BANK_FILE, "utf8")) as { id: string; questions: BankQuestion[] };
// An apprentice of the seeded class on this course that no e2e test signs in as.
const APPRENTICE = DEMO_USERS.find((u) => u.email.startsWith("june."))!;

type ViewQuestion = { id: string; kind: string; prompt: string; options?: { id: string; text: string }[] };
type ResultQuestion = { questionId: string; prompt: string; outcome: string; yourAnswer: string | null; earnedPoints: number; points: number };

test("an answer autosaved on A is graded by a submit on B", async () => {
  await withDb((c) => c.query("delete from quiz_attempts where bank_id = $1 and user_id = (select id from users where email = $2)", [BANK.id, APPRENTICE.email]));
  const signIn = await context(A);
  expect((await signIn.post("/api/account/sign-in", { data: { email: APPRENTICE.email, password: APPRENTICE.password } })).status()).toBe(200);
  const cookie = await sessionCookieOf(signIn);
  const onA = await context(A, { cookie });
  const onB = await context(B, { cookie });

  const started = await onA.post(`/api/quizzes/${BANK.id}/attempts`);
  expect(started.status()).toBe(200);
  const { attemptId } = (await started.json()) as { attemptId: string };
  const viewRes = await onA.get(`/api/attempts/${attemptId}`);
  expect(viewRes.status()).toBe(200);
  const view = ((await viewRes.json()) as { view: { questions: ViewQuestion[] } }).view;

  // The first single-choice question shown, and the option the bank's key names, found by its words.
  const shown = view.questions.find((q) => q.kind === "single")!;
  expect(shown, "the attempt shows a single-choice question").toBeTruthy();
  const authored = BANK.questions.find((q) => q.kind === "single" && q.prompt === shown.prompt)!;
  expect(authored, "the shown prompt is one of the bank's").toBeTruthy();
  const keyText = authored.options!.find((o) => o.id === authored.correctOptionId)!.text;
  const option = shown.options!.find((o) => o.text === keyText)!;
  expect(option, "the key's option is among those shown").toBeTruthy();

  const saved = await onA.put(`/api/attempts/${attemptId}/answers/${shown.id}`, { data: { answer: { kind: "single", optionId: option.id }, seq: 1 } });
  expect(saved.status()).toBe(200);
  expect(await saved.json()).toMatchObject({ ok: true, seq: 1, stale: false });

  const submitted = await onB.post(`/api/attempts/${attemptId}/submit`);
  expect(submitted.status()).toBe(200);
  const { result } = (await submitted.json()) as { result: { questions: ResultQuestion[]; earnedPoints: number } };
  const graded = result.questions.find((q) => q.prompt === shown.prompt)!;
  expect(graded).toMatchObject({ outcome: "correct", yourAnswer: keyText });
  expect(graded.earnedPoints).toBe(graded.points);
  expect(result.earnedPoints).toBe(graded.points);
  expect(result.questions.filter((q) => q !== graded).every((q) => q.outcome === "not answered")).toBe(true);

  // And A reads the same result back.
  const onAResult = await onA.get(`/api/attempts/${attemptId}/result`);
  expect(onAResult.status()).toBe(200);
  expect(((await onAResult.json()) as { result: { earnedPoints: number } }).result.earnedPoints).toBe(graded.points);
});
