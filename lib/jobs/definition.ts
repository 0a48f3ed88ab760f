import "server-only";
import type { z } from "zod";
import type { Database } from "@/db/client";
import type { Env } from "@/lib/env";
import type { MailTransport } from "@/lib/email/transport";

/** What a job's handler gets from the worker process. */
export type JobContext = {
  db: Database;
  env: Env;
  transport: MailTransport;
  /** This worker process, as it signs leases (mail outbox rows). */
  workerId: string;
  /** Aborted when the worker is stopping: finish the item in hand, start no new one. */
  signal: AbortSignal;
  log(message: string): void;
};

/** pg-boss queue policies (pg-boss 10 docs, "Queues"): stately = at most one waiting and one running job. */
export type QueuePolicy = "standard" | "short" | "singleton" | "stately";

export type JobDefinition = {
  /** The pg-boss queue; also the job's name in logs. Letters, digits and hyphens. */
  queue: string;
  policy: QueuePolicy;
  /** pg-boss retries of a failed run, with exponential backoff from retryDelaySeconds. */
  retryLimit: number;
  retryDelaySeconds: number;
  /** pg-boss fails a run that takes longer than this. */
  expireInSeconds: number;
  /** How often this worker asks pg-boss for a queued job (it is also woken at once, see `wake`). */
  pollingIntervalSeconds: number;
  /** Recurring work: a cron line in UTC, minute precision (pg-boss runs it once per slot across workers). */
  cron?: string;
  /**
   * Work that must start within a fraction of a second of becoming due (mail): every `everyMs`
   * the worker asks `isDue`, and when it says yes queues a run (the policy keeps at most one
   * waiting) and wakes its own pg-boss worker for it.
   */
  wake?: { everyMs(env: Env): number; isDue(db: Database): Promise<boolean> };
  /** Runs one job; `data` is what was sent, not yet validated. The result is kept as the job's output. */
  run(ctx: JobContext, data: unknown): Promise<object | void>;
};

/** A job whose data is validated with `data` before `handler` sees it. */
export function defineJob<D extends z.ZodType>(
  def: Omit<JobDefinition, "run"> & { data: D; handler(ctx: JobContext, data: z.infer<D>): Promise<object | void> },
): JobDefinition {
  const { data, handler, ...rest } = def;
  return {
    ...rest,
    run: (ctx, raw) => {
      const parsed = data.safeParse(raw ?? {});
      if (!parsed.success) throw new Error(`Job ${def.queue} got data it cannot use: ${parsed.error.issues.map((i) => `${i.path.join(".") || "(data)"} ${i.message}`).join("; ")}`);
      return handler(ctx, parsed.data);
    },
  };
}
