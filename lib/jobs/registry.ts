import "server-only";
import type { JobDefinition } from "./definition";
import { mailDelivery } from "./mail-delivery";
import { paymentsReconcile } from "./payments-reconcile";
import { rateLimitPrune } from "./rate-limit-prune";
import { reviewDigest } from "./review-digest";
import { uploadsReconcile } from "./uploads-reconcile";

/**
 * Every kind of background work the worker (scripts/worker.ts) runs. To add one: a file beside
 * these with `defineJob` (queue, policy, data schema, handler, and a `cron` if it recurs), then
 * list it here. See docs/decisions/004-background-jobs.md.
 */
export const JOBS: readonly JobDefinition[] = [mailDelivery, rateLimitPrune, paymentsReconcile, uploadsReconcile, reviewDigest];
