import "server-only";
// The safety net for lost webhooks: orders whose Checkout Session was created a while ago and is
// still not settled here are brought up to date from the service (the same idempotent
// fulfilment as the webhook), and approved refunds the service reports as succeeded are
// completed. Run by the worker every few minutes (lib/jobs/payments-reconcile.ts).
import { and, asc, eq, inArray, isNotNull, isNull, lt, sql } from "drizzle-orm";
import type Stripe from "stripe";
import type { Queryable } from "@/db/client";
import { orders } from "@/db/schema";
import { fulfilCheckoutSession, type FulfilOutcome } from "./fulfilment";
import { completeRefunds } from "./refunds";

export type ReconcileReport = { checked: number; outcomes: Partial<Record<FulfilOutcome | "error", number>>; abandonedWithoutSession: number; refundsCompleted: number };

/** An order whose session could not even be created is closed after this long (the buyer saw the failure). */
const NO_SESSION_GRACE_MINUTES = 60;

export async function reconcileOrders(database: Queryable, payments: Stripe, options: { olderThanMinutes: number; limit: number; log?: (m: string) => void }): Promise<ReconcileReport> {
  const cutoff = sql`now() - make_interval(mins => ${options.olderThanMinutes})`;
  const stale = await database
    .select({ sessionId: orders.checkoutSessionId })
    .from(orders)
    .where(and(inArray(orders.status, ["created", "awaiting_payment"]), isNotNull(orders.checkoutSessionId), lt(orders.createdAt, cutoff)))
    .orderBy(asc(orders.createdAt))
    .limit(options.limit);
  const outcomes: ReconcileReport["outcomes"] = {};
  for (const { sessionId } of stale) {
    let outcome: FulfilOutcome | "error";
    try {
      outcome = await fulfilCheckoutSession(sessionId!, {}, database, payments);
    } catch (error) {
      // One session the service can't answer for must not stop the others; the next run retries it.
      options.log?.(`session ${sessionId}: ${error instanceof Error ? error.message : String(error)}`);
      outcome = "error";
    }
    outcomes[outcome] = (outcomes[outcome] ?? 0) + 1;
  }
  const abandoned = await database
    .update(orders)
    .set({ status: "expired", updatedAt: new Date() })
    .where(and(eq(orders.status, "created"), isNull(orders.checkoutSessionId), lt(orders.createdAt, sql`now() - make_interval(mins => ${NO_SESSION_GRACE_MINUTES})`)))
    .returning({ id: orders.id });
  let refundsCompleted = 0;
  try {
    refundsCompleted = await completeRefunds(null, database, payments);
  } catch (error) {
    options.log?.(`refunds: ${error instanceof Error ? error.message : String(error)}`);
  }
  return { checked: stale.length, outcomes, abandonedWithoutSession: abandoned.length, refundsCompleted };
}
