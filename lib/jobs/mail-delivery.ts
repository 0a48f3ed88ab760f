import "server-only";
import { z } from "zod";
import { drainOutbox, hasDueMail } from "@/lib/email/worker";
import { defineJob } from "./definition";

/**
 * Sends what is due in the mail outbox (lib/email/worker.ts). The outbox table stays the source
 * of truth and keeps each message's own retries and backoff, so pg-boss does not retry a run:
 * the next one comes as soon as something is due.
 */
export const mailDelivery = defineJob({
  queue: "mail-delivery",
  policy: "stately",
  retryLimit: 0,
  retryDelaySeconds: 0,
  expireInSeconds: 30 * 60,
  pollingIntervalSeconds: 10,
  wake: { everyMs: (env) => env.MAIL_POLL_MS, isDue: hasDueMail },
  data: z.object({}),
  async handler(ctx) {
    const r = await drainOutbox(ctx.db, ctx.transport, ctx.env.MAIL_FROM, 20, { workerId: ctx.workerId, signal: ctx.signal });
    if (r.sent || r.failed) ctx.log(`sent ${r.sent}, will retry ${r.failed}`);
    if (r.lostLease) ctx.log(`${r.lostLease} message(s) were no longer ours when sent or about to be (lease ran out)`);
    return r;
  },
});
