import { execFileSync } from "node:child_process";
import { expect, test } from "@playwright/test";
import { DEMO_USERS } from "@/db/seed-data";
import { A, B, context, sessionCookieOf, withDb } from "./cluster";

// PostgreSQL stopped in the middle of a quiz: every route answers 503 with Retry-After and a
// sentence (never a 500 or a stack trace), nothing acknowledged is lost, and the app recovers by
// itself once the database is back. The database is stopped with the same script that started it
// (scripts/pg.sh, with the test cluster's PG_DATA_DIR/PGPORT from scripts/test.sh).

const BANK_ID = "bank-miking-the-band-drums";
const APPRENTICE = DEMO_USERS.find((u) => u.key === "kofi")!;
type ViewQuestion = { id: string; kind: string; prompt: string; options?: { id: string; text: string }[] };

function pg(command: "start" | "stop") {
  execFileSync("bash", ["scripts/pg.sh", command], { stdio: "pipe", timeout: 60_000 });
}

test("PostgreSQL stopped mid-quiz: 503s with a sentence, nothing acknowledged lost, recovery without a restart", async () => {
  test.skip(!process.env.PG_DATA_DIR, "scripts/test.sh exports the test cluster's PG_DATA_DIR");
  test.setTimeout(120_000);
  await withDb((c) => c.query("delete from quiz_attempts where bank_id = $1 and user_id = (select id from users where email = $2)", [BANK_ID, APPRENTICE.email]));
  const signIn = await context(A);
  expect((await signIn.post("/api/account/sign-in", { data: { email: APPRENTICE.email, password: APPRENTICE.password } })).status()).toBe(200);
  const cookie = await sessionCookieOf(signIn);
  const api = await context(B, { cookie });
  const started = await api.post(`/api/quizzes/${BANK_ID}/attempts`);
  expect(started.status()).toBe(200);
  const { attemptId } = (await started.json()) as { attemptId: string };
  const view = (await (await api.get(`/api/attempts/${attemptId}`)).json()).view as { questions: ViewQuestion[] };
  const [first, second] = view.questions.filter((q) => q.kind === "single");
  const save = (q: ViewQuestion, seq: number) => api.put(`/api/attempts/${attemptId}/answers/${q.id}`, { data: { answer: { kind: "single", optionId: q.options![0].id }, seq } });
  expect((await save(first, 1)).status()).toBe(200);

  pg("stop");
  try {
    for (const res of [await save(second, 1), await api.get(`/api/attempts/${attemptId}`), await api.post(`/api/attempts/${attemptId}/submit`), await api.get("/api/me"), await api.get("/api/health")]) {
      expect(res.status(), res.url()).toBe(503);
      expect(Number(res.headers()["retry-after"])).toBeGreaterThan(0);
      const body = await res.json();
      expect(body).toMatchObject({ ok: false, code: "unavailable" });
      expect(body.message).toMatch(/can't reach its database/);
      expect(JSON.stringify(body)).not.toMatch(/\bat .+\.(js|ts):\d+/);
    }
  } finally {
    pg("start");
  }

  // No restart of the app: its pool finds the database again by itself.
  await expect.poll(async () => (await api.get("/api/health")).status(), { timeout: 30_000, intervals: [250, 500, 1000] }).toBe(200);
  expect((await save(second, 1)).status()).toBe(200);
  const submitted = await api.post(`/api/attempts/${attemptId}/submit`);
  expect(submitted.status()).toBe(200);
  const graded = ((await submitted.json()).result.questions as { prompt: string; outcome: string }[]).filter((g) => g.prompt === first.prompt || g.prompt === second.prompt);
  expect(graded).toHaveLength(2);
  expect(graded.every((g) => g.outcome !== "not answered")).toBe(true);
});
