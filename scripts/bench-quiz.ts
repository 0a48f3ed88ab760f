/**
 * Load test of quiz autosave and submission: `npm run bench:quiz` against a running production
 * server (BENCH_BASE_URL, default http://127.0.0.1:3000; loopback only) and its database
 * (DATABASE_URL). It creates bench apprentices directly in the database, signs them in over
 * HTTP, starts an attempt on every quiz of their course over HTTP, pre-saves a full set of
 * answers, then runs autocannon at 50 connections, one operation at a time so each has its own
 * latencies: autosave (PUT one answer, round the attempts, a higher seq each time: a real write),
 * submit (each attempt graded once), and the retried submit (the stored result), each after a
 * short unmeasured warm-up of its route. Just before each phase it measures the floor: the p95 of a
 * signed-in GET /api/me (cookie decode + the viewer's one query) at the same connections, and
 * prints the phase's p95 beside it with the ratio (goal <= 1.5). Then the item-statistics timing (10,000 × 30); the bench accounts are deleted.
 *   BENCH_USERS (100)  BENCH_CONNECTIONS (50)  BENCH_SAVE_SECONDS (10)  BENCH_MAX_SECONDS (30, the submit phase's cap)
 *   BENCH_RATE (req/s, unset = as fast as it goes)
 */
import { createRequire } from "node:module";
import { randomBytes } from "node:crypto";
import { loadavg } from "node:os";
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
// Goal: each operation's p95 at most 1.5 × the p95 of a signed-in GET /api/me (the floor) in the same run.
const GOAL_RATIO = 1.5;
const SAVE_SECONDS = Number(process.env.BENCH_SAVE_SECONDS ?? 10);
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

const loadAverage = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(" ");

function percentile(sorted: number[], p: number): number {
  return sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

type Phase = { label: string; latenciesMs: number[]; seconds: number; statuses: Map<number, number>; errors: number };

/**
 * One operation alone at CONNECTIONS connections, so its latencies are its own: `next` gives each
 * request (null when the phase has used up its attempts), for at most `seconds`.
 */
function runPhase(label: string, amount: number, seconds: number, next: () => { method: string; path: string; attempt: PreparedAttempt; body: string } | null): Promise<Phase> {
  const latenciesMs: number[] = [];
  const statuses = new Map<number, number>();
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: BASE_URL,
        connections: CONNECTIONS,
        amount,
        ...(RATE ? { overallRate: RATE } : {}),
        requests: [
          {
            method: "GET",
            setupRequest: (req) => {
              const r = next();
              if (!r) return { ...req, method: "GET", path: "/api/health" }; // the pool ran dry: counted apart below
              return { ...req, method: r.method, path: r.path, headers: { cookie: r.attempt.cookie, origin: BASE_URL, "content-type": "application/json" }, body: r.body };
            },
          },
        ],
      },
      (err, result) => (err ? reject(err) : resolve({ label, latenciesMs, seconds: result.duration, statuses, errors: result.errors + result.timeouts })),
    );
    instance.on("response", (_client, status, _bytes, ms) => {
      latenciesMs.push(ms);
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
    });
    setTimeout(() => instance.stop(), seconds * 1000).unref();
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

/** A phase's figures beside the signed-in floor measured just before it; true when the goal is met. */
function reportPhase(phase: Phase, floorP95: number): boolean {
  const sorted = [...phase.latenciesMs].sort((a, b) => a - b);
  const p95 = percentile(sorted, 95);
  const ratio = p95 / floorP95;
  const non2xx = [...phase.statuses].filter(([s]) => s < 200 || s > 299).reduce((n, [, c]) => n + c, 0);
  console.log(
    `[bench:quiz] ${phase.label}: ${sorted.length} requests in ${phase.seconds.toFixed(1)} s, ${(sorted.length / phase.seconds).toFixed(0)} req/s; ` +
      `p50 ${percentile(sorted, 50).toFixed(1)} ms, p95 ${p95.toFixed(1)} ms, p99 ${percentile(sorted, 99).toFixed(1)} ms | floor p95 ${floorP95.toFixed(1)} ms | ratio ${ratio.toFixed(2)} (goal <= ${GOAL_RATIO}) ${ratio <= GOAL_RATIO ? "met" : "NOT met"}` +
      `${non2xx || phase.errors ? ` | statuses ${JSON.stringify(Object.fromEntries(phase.statuses))}, errors ${phase.errors}` : ""}`,
  );
  return ratio <= GOAL_RATIO && non2xx === 0 && phase.errors === 0;
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
    console.log(`[bench:quiz] floor of any dynamic route, GET /api/me signed out (no database) at ${CONNECTIONS} connections: ${bare.rps.toFixed(0)} req/s, p95 ${bare.p95.toFixed(1)} ms; load average ${loadAverage()}`);
    let met = true;
    // Autosave: one answer PUT after another, round the pool, each with a higher seq (a real write each time).
    let floor = await baseline(cookies[0]);
    console.log(`[bench:quiz] floor of any signed-in route, GET /api/me signed in at ${CONNECTIONS} connections: ${floor.rps.toFixed(0)} req/s, p95 ${floor.p95.toFixed(1)} ms`);
    let turn = 0;
    const save = () => {
      const a = pool[turn++ % pool.length];
      return { method: "PUT", path: `/api/attempts/${a.attemptId}/answers/${a.questionId}`, attempt: a, body: JSON.stringify({ seq: 100 + turn, answer: a.answer }) };
    };
    // Each phase is measured warm: its route's first requests load the route's code on the server,
    // a one-off cost that a few cold requests at 50 connections would otherwise put in the p95.
    await runPhase("autosave warm-up", 1_000_000, 2, save);
    met = reportPhase(await runPhase("autosave PUT", 1_000_000, SAVE_SECONDS, save), floor.p95) && met;
    // Submit: each attempt graded once (a full set of saved answers), until the pool or the time cap runs out.
    // The first CONNECTIONS attempts warm the submit route up (graded, not measured); the rest are measured.
    const fresh = pool.slice();
    const submit = () => {
      const a = fresh.shift();
      return a ? { method: "POST", path: `/api/attempts/${a.attemptId}/submit`, attempt: a, body: "" } : null;
    };
    await runPhase("submit warm-up", CONNECTIONS, MAX_SECONDS, submit);
    floor = await baseline(cookies[0]);
    console.log(`[bench:quiz] floor again before the submits: ${floor.rps.toFixed(0)} req/s, p95 ${floor.p95.toFixed(1)} ms; load average ${loadAverage()}`);
    met = reportPhase(await runPhase("submit POST (grades)", fresh.length, MAX_SECONDS, submit), floor.p95) && met;
    const [graded] = await db().select({ n: sql<number>`count(*)::int` }).from(quizAttempts).where(and(inArray(quizAttempts.id, attemptIds), isNotNull(quizAttempts.submittedAt)));
    // A retried submit: the stored result again, no grading.
    turn = 0;
    const retry = () => {
      const a = pool[turn++ % pool.length];
      return { method: "POST", path: `/api/attempts/${a.attemptId}/submit`, attempt: a, body: "" };
    };
    floor = await baseline(cookies[0]);
    console.log(`[bench:quiz] floor again before the retried submits: ${floor.rps.toFixed(0)} req/s, p95 ${floor.p95.toFixed(1)} ms; load average ${loadAverage()}`);
    met = reportPhase(await runPhase("submit POST retried (stored result)", 1_000_000, SAVE_SECONDS, retry), floor.p95) && met;
    console.log(`[bench:quiz] attempts graded ${graded.n} of ${attemptIds.length}; load average ${loadAverage()}`);
    if (!met) process.exitCode = 1;
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
