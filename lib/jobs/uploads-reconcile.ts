import "server-only";
import { z } from "zod";
import { reconcileUploads } from "@/lib/storage/reconcile";
import { defineJob } from "./definition";

/**
 * Every 5 minutes: uploads whose callback never came (pending, but the service holds the file),
 * processing left unfinished (stored), uploads that can no longer arrive (failed), and originals
 * left at the service. See lib/storage/reconcile.ts.
 */
export const uploadsReconcile = defineJob({
  queue: "uploads-reconcile",
  policy: "stately",
  retryLimit: 1,
  retryDelaySeconds: 60,
  expireInSeconds: 10 * 60,
  pollingIntervalSeconds: 10,
  cron: "*/5 * * * *",
  data: z.object({}),
  async handler(ctx) {
    const report = await reconcileUploads({}, ctx.db);
    if (report.stored + report.failed + report.retried + report.originalsDeleted > 0) ctx.log(`uploads: ${JSON.stringify(report)}`);
    return report;
  },
});
