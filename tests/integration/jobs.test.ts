// The worker's job runtime (lib/jobs, pg-boss 10) against the real PostgreSQL and a private
// SMTP catcher on free ports: schema created at start, mail delivery woken by due mail, pruning
// as a job, and two workers on one database sending each message once.
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { inArray, sql } from "drizzle-orm";
import { rateLimitEvents } from "@/db/schema";
import { closeDb, db, pool } from "@/db/connection";
import { env } from "@/lib/env";
import { enqueueMail } from "@/lib/email/outbox";
import { startCatcher, type Catcher } from "@/lib/email/fake-smtp-catcher";
import { smtpTransport, type MailTransport } from "@/lib/email/transport";
import { drainOutbox } from "@/lib/email/worker";
import { JOBS } from "@/lib/jobs/registry";
import { JOBS_SCHEMA, startJobs, type JobsRuntime } from "@/lib/jobs/runtime";
import { uniqueEmail } from "../support/unique";

const FROM = env().MAIL_FROM;
let catcher: Catcher;
let transport: MailTransport;
const running: JobsRuntime[] = [];
const logged: string[] = [];

async function start(workerId: string) {
  const runtime = await startJobs({ pool: pool(), db: db(), env: env(), transport, workerId, log: (line) => logged.push(line) });
  running.push(runtime);
  return runtime;
}

async function until<T>(probe: () => Promise<T | undefined> | T | undefined, timeoutMs: number, what: string): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await probe();
    if (v !== undefined) return v;
    if (Date.now() > end) throw new Error(`${what}: not within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

async function queueMail(label: string): Promise<string> {
  const email = uniqueEmail(label);
  await db().transaction((tx) => enqueueMail(tx, email, { template: "verify_email", name: "Jobs Test", url: "http://127.0.0.1:3100/verify?token=jobs-test" }));
  return email;
}

beforeAll(async () => {
  catcher = await startCatcher({ smtpPort: 0, httpPort: 0 });
  transport = smtpTransport({ host: "127.0.0.1", port: catcher.smtpPort, secure: false, ignoreTLS: true });
  await drainOutbox(db(), transport, FROM, 1000); // earlier files' leftovers, so counts below are ours
  // As on a fresh database: no pg-boss schema until a worker starts.
  await db().execute(sql.raw(`drop schema if exists ${JOBS_SCHEMA} cascade`));
});

afterEach(async () => {
  await Promise.all(running.splice(0).map((r) => r.stop({ timeoutMs: 5_000 })));
});

afterAll(async () => {
  await catcher?.close();
  await closeDb();
});

describe("the worker's jobs (pg-boss)", () => {
  it("creates pg-boss's schema at start, with a queue for every job and the schedules of the registry", async () => {
    const t0 = Date.now();
    const runtime = await start("worker-a");
    // Measured on the 2-core machine: ~0.5 s including the schema; generous bound for a busy one.
    expect(Date.now() - t0).toBeLessThan(10_000);
    const queues = (await runtime.boss.getQueues()).map((q) => ({ name: q.name, policy: q.policy }));
    for (const job of JOBS) expect(queues).toContainEqual({ name: job.queue, policy: job.policy });
    const schedules = (await runtime.boss.getSchedules()).map((s) => ({ name: s.name, cron: s.cron }));
    expect(schedules).toEqual(JOBS.filter((j) => j.cron).map((j) => ({ name: j.queue, cron: j.cron })));
    expect(schedules).toContainEqual({ name: "rate-limit-prune", cron: "*/10 * * * *" });
  });

  it("mail committed in a transaction reaches the relay through a mail-delivery job, without waiting for a schedule", async () => {
    await start("worker-a");
    const t0 = Date.now();
    const email = await queueMail("jobs-mail");
    const mail = await until(() => catcher.messages.find((m) => m.to.includes(email)), 10_000, "mail at the catcher");
    // MAIL_POLL_MS (500 ms unless set) plus the send: well under the minute a cron would take.
    expect(Date.now() - t0).toBeLessThan(5_000);
    expect(mail.messageId).toMatch(/^<[0-9a-f-]{36}@axisline\.test>$/);
    // The mail reaches the relay inside the job's handler; pg-boss marks the job completed just after.
    const completed = await until(
      async () => {
        const done = await db().execute(sql.raw(`select count(*)::int as n from ${JOBS_SCHEMA}.job where name = 'mail-delivery' and state = 'completed'`));
        const n = (done.rows[0] as { n: number }).n;
        return n >= 1 ? n : undefined;
      },
      5_000,
      "the mail-delivery job completed",
    );
    expect(completed).toBeGreaterThanOrEqual(1);
  });

  it("two workers on one database send each of 12 messages exactly once", async () => {
    await Promise.all([start("worker-a"), start("worker-b")]);
    const emails = await Promise.all(Array.from({ length: 12 }, (_, i) => queueMail(`jobs-pair-${i}`)));
    await until(() => (emails.every((e) => catcher.messages.some((m) => m.to.includes(e))) ? true : undefined), 15_000, "all 12 at the catcher");
    await new Promise((r) => setTimeout(r, 1_000)); // two more wake-ups of both workers
    for (const e of emails) expect(catcher.messages.filter((m) => m.to.includes(e))).toHaveLength(1);
  });

  it("rate-limit pruning runs as a job: events older than the longest window go, younger ones stay", async () => {
    const runtime = await start("worker-a");
    const tag = uniqueEmail("prune");
    // The longest window in LIMITS is an hour (sign-ups, the per-account sign-in ceiling): an
    // event 2 h old is seen by none, one 30 min old still counts for the hour-long windows.
    const inserted = await db()
      .insert(rateLimitEvents)
      .values([
        { bucket: `old:${tag}`, createdAt: new Date(Date.now() - 2 * 3600_000) },
        { bucket: `recent:${tag}`, createdAt: new Date(Date.now() - 30 * 60_000) },
      ])
      .returning({ id: rateLimitEvents.id, bucket: rateLimitEvents.bucket });
    const id = await runtime.send("rate-limit-prune");
    if (!id) throw new Error("the prune job was not queued");
    const job = await until(
      async () => {
        const j = await runtime.boss.getJobById<object>("rate-limit-prune", id);
        return j && ["completed", "failed"].includes(j.state) ? j : undefined;
      },
      15_000,
      "prune job finished",
    );
    expect(job.state).toBe("completed");
    expect(job.output).toMatchObject({ deleted: expect.any(Number) });
    const left = await db()
      .select({ bucket: rateLimitEvents.bucket })
      .from(rateLimitEvents)
      .where(inArray(rateLimitEvents.id, inserted.map((r) => r.id)));
    expect(left).toEqual([{ bucket: `recent:${tag}` }]);
  });

  it("stops promptly when nothing is in hand, and no run failed along the way", async () => {
    const runtime = await start("worker-a");
    running.splice(running.indexOf(runtime), 1);
    const t0 = Date.now();
    await runtime.stop({ timeoutMs: 5_000 });
    expect(Date.now() - t0).toBeLessThan(3_000);
    expect(logged.filter((l) => /failed/.test(l))).toEqual([]);
  });
});
