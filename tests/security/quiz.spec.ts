// §1 answer keys readable before and between attempts, §6 quiz time and autosave edges, §7 a
// quiz answer's body cap: over HTTP against the production build, as the probes were made.
import { readFileSync } from "node:fs";
import { expect, test } from "../e2e/page-check";
import { DEMO_USERS } from "@/db/seed-data";
import { baseURL } from "../e2e/helpers";
import { from, sessionCookieOf, uniqueAddress, withDb } from "./support";

type Authored = { id: string; kind: string; prompt: string; options?: { id: string; text: string }[]; items?: { id: string }[]; regions?: { id: string }[]; left?: { id: string }[]; right?: { id: string }[] };
const bank = (file: string) => JSON.parse(readFileSync(file, "utf8")) as { id: string; questions: Authored[] };
const PATTERNS = bank("content/banks/how-microphones-hear/pickup-patterns.json");
const FINAL = bank("content/banks/how-microphones-hear/final.json");
const apprentice = (key: string) => DEMO_USERS.find((u) => u.key === key)!;
const ORIGIN = { origin: new URL(baseURL).origin };

async function signedIn(key: string) {
  const u = apprentice(key);
  const api = await from(uniqueAddress());
  expect((await api.post("/api/account/sign-in", { data: { email: u.email, password: u.password } })).status()).toBe(200);
  return from(uniqueAddress(), baseURL, await sessionCookieOf(api));
}

async function clearAttempts(key: string, bankId: string) {
  await withDb((c) => c.query("delete from quiz_attempts where bank_id = $1 and user_id = (select id from users where email = $2)", [bankId, apprentice(key).email]));
}

type ViewQuestion = { id: string; kind: string; prompt: string; options?: { id: string; text: string }[] };
async function startAttempt(api: Awaited<ReturnType<typeof from>>, bankId: string) {
  const started = await api.post(`/api/quizzes/${bankId}/attempts`, { headers: ORIGIN });
  expect(started.status()).toBe(200);
  const { attemptId } = (await started.json()) as { attemptId: string };
  const res = await api.get(`/api/attempts/${attemptId}`);
  expect(res.status()).toBe(200);
  const body = await res.json();
  return { attemptId, body, view: body.view as { questions: ViewQuestion[] } };
}

/** Every id-like value anywhere in a JSON payload. */
function idsIn(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v) => idsIn(v, out));
  else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (/id$/i.test(k) && typeof v === "string") out.push(v);
      if (/ids$/i.test(k) && Array.isArray(v)) out.push(...v.filter((x): x is string => typeof x === "string"));
      idsIn(v, out);
    }
  }
  return out;
}

test.describe("§1 answer keys", () => {
  test("the attempt view carries no authored option, item, region or pair id, and no seed", async () => {
    await clearAttempts("noor", PATTERNS.id);
    const api = await signedIn("noor");
    const { body } = await startAttempt(api, PATTERNS.id);
    const authored = new Set(PATTERNS.questions.flatMap((q) => [...(q.options ?? []), ...(q.items ?? []), ...(q.regions ?? []), ...(q.left ?? []), ...(q.right ?? [])].map((x) => x.id)));
    const leaked = idsIn(body).filter((id) => authored.has(id));
    expect(leaked).toEqual([]);
    expect(JSON.stringify(body)).not.toMatch(/"seed"/i);
  });

  test("two attempts of the same quiz show different ids for the same options", async () => {
    await clearAttempts("noor", PATTERNS.id);
    const api = await signedIn("noor");
    const first = await startAttempt(api, PATTERNS.id);
    expect((await api.post(`/api/attempts/${first.attemptId}/submit`, { headers: ORIGIN })).status()).toBe(200);
    const second = await startAttempt(api, PATTERNS.id);
    const optionIds = (v: { questions: ViewQuestion[] }) => new Set(v.questions.flatMap((q) => (q.options ?? []).map((o) => o.id)));
    const a = optionIds(first.view);
    expect([...optionIds(second.view)].filter((id) => a.has(id))).toEqual([]);
  });

  test("submitting attempt 1 empty reveals no correct answer or explanation while attempts remain", async () => {
    await clearAttempts("elias", PATTERNS.id);
    const api = await signedIn("elias");
    const { attemptId } = await startAttempt(api, PATTERNS.id);
    const submitted = await api.post(`/api/attempts/${attemptId}/submit`, { headers: ORIGIN });
    expect(submitted.status()).toBe(200);
    const result = (await submitted.json()).result as { answersShown?: boolean; questions: { correctAnswer: string | null; explanation: string | null; outcome: string }[] };
    expect(result.questions.length).toBeGreaterThan(0);
    expect(result.questions.filter((q) => q.correctAnswer !== null || q.explanation !== null)).toEqual([]);
    expect(result.questions.every((q) => q.outcome === "not answered")).toBe(true);
    const reread = await (await api.get(`/api/attempts/${attemptId}/result`)).text();
    for (const q of PATTERNS.questions.filter((x) => x.kind === "single")) {
      const key = q.options!.find((o) => o.id === (q as unknown as { correctOptionId: string }).correctOptionId)!;
      expect(reread).not.toContain(JSON.stringify(key.text));
    }
  });
});

test.describe("§6 quiz time and autosave edges", () => {
  test("extra time granted after an attempt ran out does not reopen it", async () => {
    await clearAttempts("callum", FINAL.id);
    const api = await signedIn("callum");
    const { attemptId, view } = await startAttempt(api, FINAL.id);
    // The 40-minute limit ran out an hour ago (moved in the database rather than waited for).
    await withDb((c) => c.query("update quiz_attempts set started_at = now() - interval '100 minutes', deadline_at = now() - interval '60 minutes' where id = $1", [attemptId]));
    const tomasz = DEMO_USERS.find((u) => u.key === "tomasz")!;
    const teach = await from(uniqueAddress());
    expect((await teach.post("/api/account/sign-in", { data: { email: tomasz.email, password: tomasz.password } })).status()).toBe(200);
    const userId = await withDb(async (c) => (await c.query("select id from users where email = $1", [apprentice("callum").email])).rows[0].id as string);
    const granted = await teach.post(`/api/quizzes/${FINAL.id}/extensions`, { data: { userId, extraMinutes: 120 }, headers: ORIGIN });
    expect(granted.status()).toBe(200);
    const q = view.questions.find((x) => x.kind === "single")!;
    const late = await api.put(`/api/attempts/${attemptId}/answers/${q.id}`, { data: { answer: { kind: "single", optionId: q.options![0].id }, seq: 1 } });
    expect(late.status()).not.toBe(200);
    const closed = await withDb(async (c) => (await c.query("select submitted_at from quiz_attempts where id = $1", [attemptId])).rows[0].submitted_at);
    expect(closed).not.toBeNull();
  });

  test("every answer acknowledged while a submit waits is graded (20 races)", async () => {
    const api = await signedIn("june");
    for (let round = 0; round < 20; round++) {
      await clearAttempts("june", PATTERNS.id);
      const { attemptId, view } = await startAttempt(api, PATTERNS.id);
      const q = view.questions.find((x) => x.kind === "single")!;
      const [put, submit] = await Promise.all([
        api.put(`/api/attempts/${attemptId}/answers/${q.id}`, { data: { answer: { kind: "single", optionId: q.options![0].id }, seq: 1 } }),
        api.post(`/api/attempts/${attemptId}/submit`, { headers: ORIGIN }),
      ]);
      expect(submit.status()).toBe(200);
      const graded = ((await (await api.get(`/api/attempts/${attemptId}/result`)).json()).result.questions as { prompt: string; outcome: string }[]).find((g) => g.prompt === q.prompt)!;
      if (put.status() === 200) expect(graded.outcome, `round ${round}: an acknowledged answer was left out`).not.toBe("not answered");
    }
  });

  test("a 5 MB answer is answered 413", async () => {
    await clearAttempts("noor", PATTERNS.id);
    const api = await signedIn("noor");
    const { attemptId, view } = await startAttempt(api, PATTERNS.id);
    const q = view.questions[0];
    const res = await api.put(`/api/attempts/${attemptId}/answers/${q.id}`, {
      data: JSON.stringify({ answer: { kind: "single", optionId: "x".repeat(5 * 1024 * 1024) }, seq: 1 }),
      headers: { "content-type": "application/json" },
    });
    expect(res.status()).toBe(413);
  });
});
