import "server-only";
import { z } from "zod";
import { REVIEW_DIGEST_MINUTES, sendReviewDigests } from "@/lib/server/review-digest";
import { defineJob } from "./definition";

/**
 * Every REVIEW_DIGEST_MINUTES (10), one mail per instructor listing the placement submissions
 * that arrived in their classes since the last run (lib/server/review-digest.ts). Stately: at most
 * one run waiting and one running; the notices are marked in the same transaction as the mail.
 */
export const reviewDigest = defineJob({
  queue: "review-digest",
  policy: "stately",
  retryLimit: 2,
  retryDelaySeconds: 30,
  expireInSeconds: 5 * 60,
  pollingIntervalSeconds: 5,
  cron: `*/${REVIEW_DIGEST_MINUTES} * * * *`,
  data: z.object({}),
  async handler(ctx) {
    const r = await sendReviewDigests(ctx.db, ctx.env.NEXTAUTH_URL);
    if (r.mails > 0) ctx.log(`queued ${r.mails} digest(s) for ${r.notices} submission notice(s)`);
    return r;
  },
});
