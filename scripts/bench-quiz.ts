/**
 * Load test of quiz autosave and submission: `npm run bench:quiz` against a running production
 * server (BENCH_BASE_URL, default http://127.0.0.1:3000; loopback only) and its database
 * (DATABASE_URL). It creates bench apprentices directly in the database, signs them in over
 * HTTP, starts an attempt on every quiz of their course over HTTP, pre-saves a full set of
 * answers, then runs autocannon with 50 connections, each looping over
 *   PUT one answer of a fresh attempt → POST submit (grades it) → POST submit again (idempotent retry),
 * so every submit but the retries grades a real attempt once. Bounded by the attempt pool and a
 * time cap. Prints req/s and p50/p95/p99, then the item-statistics timing (10,000 × 30), and
 * deletes the bench accounts.
 *   BENCH_USERS (100)  BENCH_CONNECTIONS (50)  BENCH_MAX_SECONDS (30)  BENCH_RATE (req/s, unset = as fast as it goes)
 */
import { createRequire } from "node:module";
import { randomBytes } from "node:crypto";
import { and, inArray, isNotNull, like, sql } from "drizzle-orm";
import { closeDb, db } from "../db/connection";
import { enrollments, quizAnswers, quizAttempts, users } from "../db/schema";
import { demoAnswerFor } from "../db/seed-quizzes";
import { toPresentedAnswer } from "../lib/assessment/presentation";
import { mulberry32 } from "../lib/assessment/random";
import { presenterOf } from "../lib/server/attempt-presenter";
import { hashPassword } from "../lib/server/passwords";
import { getBankEntry, listCourseBanks } from "../lib/server/quiz-banks";

// autocannon ships no type declarations: the few parts used here, typed by hand.
type BenchRequest = { method: string; path?: string; headers?: Record<string, string>; body?: string };
type BenchContext = { attempt?: PreparedAttempt };
type AutocannonOptions = {
  url: string;
  connections: number;
  amount: number;
  overallRate?: number;
  requests: { method: string; setupRequest: (req: BenchRequest, context: BenchContext) => BenchRequest }[];
};
type AutocannonResult = { requests: { average: number; total: number }; duration: number; errors: number; timeouts: number; non2xx: number };
type AutocannonInstance = { on(event: "response", fn: (client: unknown, status: number, bytes: number, ms: number) => void): void; stop(): void };
type Autocannon = (options: AutocannonOptions, done: (err: Error | null, result: AutocannonResult) => void) => AutocannonInstance;
const autocannon = createRequire(import.meta.url)("autocannon") as Autocannon;

const BASE_URL = (process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
const USERS = Number(process.env.BENCH_USERS ?? 100);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const MAX_SECONDS = Number(process.env.BENCH_MAX_SECONDS ?? 30);
const RATE = process.env.BENCH_RATE ? Number(process.env.BENCH_RATE) : undefined;
const COURSE = "miking-the-band";
const PASSWORD = "bench passphrase at the stage door";
const GOAL_P95_MS = 30;
const RUN = randomBytes(3).toString("hex");

type PreparedAttempt = { attemptId: string; cookie: string; questionId: string; answer: unknown };

function refuseRemoteTargets(): void {
  const host = new URL(BASE_URL).hostname;
  if (host !== "127.0.0.1") throw new Error(`BENCH_BASE_URL must point at 127.0.0.1 (got ${host}): this load test never leaves the machine`);
}

/** Runs `work` over `items` with at most `limit` in flight. */
async function pooled<T, R>(items: T[], limit: number, work: (item: T, index: number) => Promise<R>): Promise<R[]> {
  const results: R[] = new Array(items.length);
  let next = 0;
  await Promise.all(
    Array.from({ length: Math.min(limit, items.length) }, async () => {
      while (next < items.length) {
        const index = next++;
        results[index] = await work(items[index], index);
      }
    }),
  );
  return results;
}

async function createBenchUsers(): Promise<{ id: string; email: string }[]> {
  const passwordHash = await hashPassword(PASSWORD); // one hash for all: they share the password
  const rows = Array.from({ length: USERS }, (_, i) => ({ email: `bench-${RUN}-${i}@bench.example`, name: `Bench apprentice ${i + 1}`, role: "apprentice" as const, passwordHash, emailVerifiedAt: sql`now()` }));
  const created = await db().insert(users).values(rows).returning({ id: users.id, email: users.email });
  await db().insert(enrollments).values(created.map((u) => ({ userId: u.id, courseSlug: COURSE, source: "purchase" as const })));
  return created;
}

async function signIn(email: string, index: number): Promise<string> {
  const res = await fetch(`${BASE_URL}/api/account/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: BASE_URL, "x-forwarded-for": `10.77.${Math.floor(index / 250)}.${index % 250}` },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  const cookie = res.headers.getSetCookie().map((c) => c.split(";")[0]).find((c) => c.includes("session-token"));
  if (res.status !== 200 || !cookie) throw new Error(`sign-in of ${email}: ${res.status} ${await res.text()}`);
  return cookie;
}

async function startAttempt(cookie: string, bankId: string): Promise<string> {
  const res = await fetch(`${BASE_URL}/api/quizzes/${bankId}/attempts`, { method: "POST", headers: { cookie, origin: BASE_URL } });
  const body = (await res.json()) as { attemptId?: string; message?: string };
  if (!res.ok || !body.attemptId) throw new Error(`start ${bankId}: ${res.status} ${body.message}`);
  return body.attemptId;
}

/**
 * A full set of answers per attempt (about 70 % right), saved straight into the database in
 * authored ids (as the server stores them); the answer PUT over HTTP is in the attempt's presented ids.
 */
async function presaveAnswers(attemptIds: string[], cookies: Map<string, string>): Promise<PreparedAttempt[]> {
  const rows = await db().select({ id: quizAttempts.id, bankId: quizAttempts.bankId, seed: quizAttempts.seed, presentationSecret: quizAttempts.presentationSecret, questionOrder: quizAttempts.questionOrder }).from(quizAttempts).where(inArray(quizAttempts.id, attemptIds));
  const prepared: PreparedAttempt[] = [];
  const answerRows: (typeof quizAnswers.$inferInsert)[] = [];
  for (const row of rows) {
    const entry = (await getBankEntry(row.bankId))!;
    const random = mulberry32(row.seed);
    for (const questionId of row.questionOrder) {
      answerRows.push({ attemptId: row.id, questionId, seq: 1, answer: demoAnswerFor(entry.questionsById.get(questionId)!, random() < 0.7, row.seed) });
    }
    const first = entry.questionsById.get(row.questionOrder[0])!;
    const answer = toPresentedAnswer(first, demoAnswerFor(first, true, row.seed), presenterOf(row))!;
    prepared.push({ attemptId: row.id, cookie: cookies.get(row.id)!, questionId: first.id, answer });
  }
  for (let i = 0; i < answerRows.length; i += 2_000) await db().insert(quizAnswers).values(answerRows.slice(i, i + 2_000));
  return prepared;
}

function percentile(sorted: number[], p: number): number {
  return sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

function runLoad(pool: PreparedAttempt[]): Promise<{ result: AutocannonResult; latenciesMs: number[]; statuses: Map<number, number> }> {
  const queue = pool.slice();
  const latenciesMs: number[] = [];
  const statuses = new Map<number, number>();
  // Three requests per attempt; a little headroom so no connection runs dry before the end.
  const amount = 3 * Math.floor(pool.length * 0.97);
  const json = (attempt: PreparedAttempt) => ({ cookie: attempt.cookie, origin: BASE_URL, "content-type": "application/json" });
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: BASE_URL,
        connections: CONNECTIONS,
        amount,
        ...(RATE ? { overallRate: RATE } : {}),
        requests: [
          {
            method: "PUT",
            setupRequest: (req, context) => {
              context.attempt = queue.shift() ?? pool[0];
              const a = context.attempt;
              return { ...req, method: "PUT", path: `/api/attempts/${a.attemptId}/answers/${a.questionId}`, headers: json(a), body: JSON.stringify({ seq: 100, answer: a.answer }) };
            },
          },
          { method: "POST", setupRequest: (req, context) => ({ ...req, method: "POST", path: `/api/attempts/${context.attempt!.attemptId}/submit`, headers: json(context.attempt!), body: "" }) },
          { method: "POST", setupRequest: (req, context) => ({ ...req, method: "POST", path: `/api/attempts/${context.attempt!.attemptId}/submit`, headers: json(context.attempt!), body: "" }) },
        ],
      },
      (err, result) => (err ? reject(err) : resolve({ result, latenciesMs, statuses })),
    );
    instance.on("response", (_client, status, _bytes, ms) => {
      latenciesMs.push(ms);
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
    });
    setTimeout(() => instance.stop(), MAX_SECONDS * 1000).unref();
  });
}

/**
 * Floors on this machine, same connections, 5 s each: GET /api/me signed in (cookie decode +
 * one query) is the floor of any signed-in route; signed out it touches no database at all, so
 * it is the floor of any dynamic route of this Next.js server.
 */
function baseline(cookie: string | null): Promise<{ rps: number; p95: number }> {
  const latenciesMs: number[] = [];
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      { url: BASE_URL, connections: CONNECTIONS, amount: 1_000_000, requests: [{ method: "GET", setupRequest: (req) => ({ ...req, method: "GET", path: "/api/me", headers: cookie ? { cookie } : ({} as Record<string, string>) }) }] },
      (err, result) => (err ? reject(err) : resolve({ rps: latenciesMs.length / result.duration, p95: percentile(latenciesMs.sort((a, b) => a - b), 95) })),
    );
    instance.on("response", (_c, _s, _b, ms) => latenciesMs.push(ms));
    setTimeout(() => instance.stop(), 5_000).unref();
  });
}

async function cleanUp(): Promise<void> {
  await db().delete(users).where(like(users.email, `bench-${RUN}-%@bench.example`));
}

async function main() {
  refuseRemoteTargets();
  const health = await fetch(`${BASE_URL}/api/health`).catch(() => null);
  if (!health?.ok) throw new Error(`no server answering at ${BASE_URL}/api/health: start the production build first`);
  const banks = await listCourseBanks(COURSE);
  console.log(`[bench:quiz] ${USERS} apprentices × ${banks.length} quizzes of ${COURSE}, ${CONNECTIONS} connections, at most ${MAX_SECONDS} s, target ${BASE_URL}`);
  try {
    const created = await createBenchUsers();
    const cookies = await pooled(created, 8, (u, i) => signIn(u.email, i));
    const jobs = created.flatMap((_, i) => banks.map((b) => ({ cookie: cookies[i], bankId: b.bankId })));
    const byAttempt = new Map<string, string>();
    const started = Date.now();
    const attemptIds = await pooled(jobs, 16, async (job) => {
      const id = await startAttempt(job.cookie, job.bankId);
      byAttempt.set(id, job.cookie);
      return id;
    });
    console.log(`[bench:quiz] started ${attemptIds.length} attempts over HTTP in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    const pool = await presaveAnswers(attemptIds, byAttempt);
    const bare = await baseline(null);
    console.log(`[bench:quiz] floor of any dynamic route, GET /api/me signed out (no database) at ${CONNECTIONS} connections: ${bare.rps.toFixed(0)} req/s, p95 ${bare.p95.toFixed(1)} ms`);
    const floor = await baseline(cookies[0]);
    console.log(`[bench:quiz] floor of any signed-in route, GET /api/me signed in at ${CONNECTIONS} connections: ${floor.rps.toFixed(0)} req/s, p95 ${floor.p95.toFixed(1)} ms`);
    const { result, latenciesMs, statuses } = await runLoad(pool);
    latenciesMs.sort((a, b) => a - b);
    const p95 = percentile(latenciesMs, 95);
    const [graded] = await db().select({ n: sql<number>`count(*)::int` }).from(quizAttempts).where(and(inArray(quizAttempts.id, attemptIds), isNotNull(quizAttempts.submittedAt)));
    console.log(
      `[bench:quiz] ${latenciesMs.length} requests in ${result.duration.toFixed(1)} s: ${(latenciesMs.length / result.duration).toFixed(0)} req/s; ` +
        `latency p50 ${percentile(latenciesMs, 50).toFixed(1)} ms, p95 ${p95.toFixed(1)} ms, p99 ${percentile(latenciesMs, 99).toFixed(1)} ms (goal p95 <= ${GOAL_P95_MS} ms at ${CONNECTIONS} connections)`,
    );
    console.log(`[bench:quiz] statuses ${JSON.stringify(Object.fromEntries(statuses))}; errors ${result.errors}, timeouts ${result.timeouts}; attempts graded ${graded.n} of ${attemptIds.length}`);
    if (p95 > GOAL_P95_MS || result.non2xx > 0) process.exitCode = 1;
  } finally {
    await cleanUp();
    await closeDb();
  }
  // The item-statistics timing (10,000 attempts × 30 items) is its own script; run it here too.
  await import("./bench-item-stats");
}

main().catch((err) => {
  console.error(`[bench:quiz] failed: ${err.message}`);
  process.exitCode = 1;
});
