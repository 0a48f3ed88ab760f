import "server-only";
import { z } from "zod";
import { pruneRateLimitEvents } from "@/lib/server/rate-limit";
import { defineJob } from "./definition";

/** Every 10 minutes, drops rate-limit events older than the longest window. */
export const rateLimitPrune = defineJob({
  queue: "rate-limit-prune",
  policy: "stately",
  retryLimit: 2,
  retryDelaySeconds: 30,
  expireInSeconds: 5 * 60,
  pollingIntervalSeconds: 5,
  cron: "*/10 * * * *",
  data: z.object({}),
  async handler(ctx) {
    const deleted = await pruneRateLimitEvents(ctx.db);
    if (deleted > 0) ctx.log(`dropped ${deleted} expired event(s)`);
    return { deleted };
  },
});
