import "server-only";
import { z } from "zod";
import { createPaymentsClient } from "@/lib/payments/stripe-client";
import { reconcileOrders } from "@/lib/server/reconcile";
import { defineJob } from "./definition";

/**
 * Every 5 minutes: Checkout Sessions created more than 10 minutes ago (olderThanMinutes) whose
 * order is still open are retrieved from the service and fulfilled, marked failed or expired, so
 * a lost webhook still seats the class; approved refunds are completed. The client is made from
 * the job's own env (the worker's settings; a test aims it at a private stand-in).
 */
export const paymentsReconcile = defineJob({
  queue: "payments-reconcile",
  policy: "stately",
  retryLimit: 2,
  retryDelaySeconds: 60,
  expireInSeconds: 10 * 60,
  pollingIntervalSeconds: 10,
  cron: "*/5 * * * *",
  data: z.object({
    olderThanMinutes: z.number().int().min(0).max(24 * 60).default(10),
    limit: z.number().int().min(1).max(1000).default(200),
  }),
  async handler(ctx, data) {
    const report = await reconcileOrders(ctx.db, createPaymentsClient(ctx.env), { ...data, log: ctx.log });
    if (report.checked || report.abandonedWithoutSession || report.refundsCompleted) ctx.log(JSON.stringify(report));
    return report;
  },
});
