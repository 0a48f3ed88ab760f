import "server-only";
import PgBoss from "pg-boss";
import type { Pool } from "pg";
import type { Database } from "@/db/client";
import type { Env } from "@/lib/env";
import type { MailTransport } from "@/lib/email/transport";
import { WORKER_ID } from "@/lib/email/worker";
import type { JobContext, JobDefinition } from "./definition";
import { JOBS } from "./registry";

/** pg-boss keeps its tables in this schema; the worker creates or upgrades it when it starts. */
export const JOBS_SCHEMA = "pgboss";

export type StartJobsOptions = {
  pool: Pool;
  db: Database;
  env: Env;
  transport: MailTransport;
  jobs?: readonly JobDefinition[];
  workerId?: string;
  log?: (line: string) => void;
};

export type JobsRuntime = {
  boss: PgBoss;
  /** Queues a run of a job (null when its policy already has one waiting) and wakes this process's worker for it. */
  send(queue: string, data?: object): Promise<string | null>;
  /** Stops taking work, lets the job in hand finish (up to timeoutMs), then returns. The pool stays open. */
  stop(options?: { timeoutMs?: number }): Promise<void>;
};

const message = (err: unknown) => (err instanceof Error ? err.message : String(err));

/**
 * Starts pg-boss on the process's own pool (creating its schema on a fresh database), then for
 * every job: its queue, a pg-boss worker, its cron schedule, and its wake-up check.
 */
export async function startJobs(o: StartJobsOptions): Promise<JobsRuntime> {
  const jobs = o.jobs ?? JOBS;
  const log = o.log ?? ((line: string) => console.log(line));
  const workerId = o.workerId ?? WORKER_ID;
  const stopping = new AbortController();
  const boss = new PgBoss({ db: { executeSql: (text, values) => o.pool.query(text, values) }, schema: JOBS_SCHEMA, migrate: true });
  boss.on("error", (err) => log(`[worker] pg-boss: ${message(err)}`));
  await boss.start();

  const timers: NodeJS.Timeout[] = [];
  const workIds = new Map<string, string>();
  for (const job of jobs) {
    const queue = { name: job.queue, policy: job.policy, retryLimit: job.retryLimit, retryDelay: job.retryDelaySeconds, retryBackoff: true, expireInSeconds: job.expireInSeconds };
    await boss.createQueue(job.queue, queue);
    await boss.updateQueue(job.queue, queue); // createQueue leaves an existing queue as it was
    const ctx: JobContext = { db: o.db, env: o.env, transport: o.transport, workerId, signal: stopping.signal, log: (m) => log(`[worker] ${job.queue}: ${m}`) };
    const workId = await boss.work(job.queue, { pollingIntervalSeconds: job.pollingIntervalSeconds, batchSize: 1 }, async ([j]) => {
      try {
        return await job.run(ctx, j.data);
      } catch (err) {
        ctx.log(`failed: ${message(err)}`);
        throw err;
      }
    });
    workIds.set(job.queue, workId);
    if (job.cron) await boss.schedule(job.queue, job.cron, {}, { tz: "UTC" });
    if (job.wake) timers.push(wakeWhenDue(job.queue, job.wake, workId));
  }
  // The registry is the whole truth: a job taken out of it leaves no schedule behind.
  for (const s of await boss.getSchedules()) {
    if (!jobs.some((j) => j.queue === s.name && j.cron)) await boss.unschedule(s.name);
  }

  function wakeWhenDue(queue: string, wake: NonNullable<JobDefinition["wake"]>, workId: string): NodeJS.Timeout {
    let busy = false;
    let failing = false;
    const tick = async () => {
      if (busy || stopping.signal.aborted) return;
      busy = true;
      try {
        if (await wake.isDue(o.db)) {
          await boss.send(queue, {});
          boss.notifyWorker(workId);
        }
        failing = false;
      } catch (err) {
        if (!failing) log(`[worker] ${queue}: checking for due work failed: ${message(err)}`);
        failing = true;
      } finally {
        busy = false;
      }
    };
    void tick();
    return setInterval(tick, wake.everyMs(o.env));
  }

  return {
    boss,
    async send(queue, data = {}) {
      const id = await boss.send(queue, data);
      const workId = workIds.get(queue);
      if (workId) boss.notifyWorker(workId); // this process takes it now rather than at its next poll
      return id;
    },
    async stop({ timeoutMs = 30_000 } = {}) {
      for (const t of timers) clearInterval(t);
      stopping.abort();
      await boss.stop({ graceful: true, wait: true, timeout: timeoutMs, close: false });
    },
  };
}
