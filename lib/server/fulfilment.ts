import "server-only";
// Fulfilment of Checkout Sessions, by the service's published rules: the truth is the session as
// the service returns it now (retrieved with its line items), never the event's copy or anything
// a browser says. One function, fulfilCheckoutSession, serves the webhook, the success page and
// the reconciliation job; it is idempotent per session: the order row is locked (FOR UPDATE) and
// seats, the paid status and the receipt mail are written in one transaction, once (fulfilled_at).
import { and, eq, isNull, or } from "drizzle-orm";
import type Stripe from "stripe";
import { db, type Queryable } from "@/db/client";
import { classes, enrollments, orders, users } from "@/db/schema";
import { enqueueMail } from "@/lib/email/outbox";
import { getCourse } from "@/lib/content";
import { paymentsClient } from "@/lib/payments/stripe-client";
import { formatMoney } from "@/lib/pricing/prices";
import { publicOrigin } from "./http";
import { addSeats } from "./seat-pool";

export type FulfilOutcome = "fulfilled" | "already_fulfilled" | "awaiting_payment" | "failed" | "expired" | "open" | "closed" | "no_order";

type Verdict = "paid" | "awaiting" | "failed" | "expired" | "open";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * What the retrieved session says. A delayed method completes the session unpaid and settles
 * later (async_payment_succeeded / _failed); a failure leaves the session complete and unpaid, so
 * it is known from the event (`paymentFailed`) or from the payment intent, when expanded.
 */
export function verdictOf(session: Stripe.Checkout.Session, paymentFailed = false): Verdict {
  if (session.payment_status === "paid" || session.payment_status === "no_payment_required") return "paid";
  if (session.status === "expired") return "expired";
  if (session.status !== "complete") return "open";
  const intent = typeof session.payment_intent === "object" ? session.payment_intent : null;
  if (paymentFailed || intent?.status === "canceled" || intent?.status === "requires_payment_method") return "failed";
  return "awaiting";
}

/** Seats bought, from the service's line items (never from our order row or the browser). */
function seatsIn(session: Stripe.Checkout.Session): number {
  const items = session.line_items?.data ?? [];
  const n = items.reduce((sum, item) => sum + (item.quantity ?? 0), 0);
  if (!Number.isSafeInteger(n) || n <= 0) throw new Error(`Checkout Session ${session.id} has no seat in its line items`);
  return n;
}

/** Retrieves the session from the service and brings its order up to date. Safe to call any number of times, concurrently. */
export async function fulfilCheckoutSession(
  sessionId: string,
  options: { paymentFailed?: boolean } = {},
  database: Queryable = db(),
  payments: Stripe = paymentsClient(),
): Promise<FulfilOutcome> {
  const session = await payments.checkout.sessions.retrieve(sessionId, { expand: ["line_items", "payment_intent"] });
  return applySession(session, verdictOf(session, options.paymentFailed), database);
}

/** Applies a retrieved session's verdict to its order, in one transaction on the locked order row. */
export async function applySession(session: Stripe.Checkout.Session, verdict: Verdict, database: Queryable = db()): Promise<FulfilOutcome> {
  // The order is found by the session id it recorded, or (if the webhook outran that update) by
  // the id in the session's metadata, as long as that order has no other session.
  const metaId = session.metadata?.orderId ?? session.client_reference_id ?? "";
  const byMeta = UUID.test(metaId) ? and(eq(orders.id, metaId), isNull(orders.checkoutSessionId)) : undefined;
  const [found] = await database.select({ id: orders.id, courseSlug: orders.courseSlug }).from(orders).where(or(eq(orders.checkoutSessionId, session.id), byMeta));
  if (!found) return "no_order";
  const courseTitle = verdict === "paid" ? ((await getCourse(found.courseSlug))?.title ?? found.courseSlug) : "";
  return database.transaction(async (tx) => {
    const [order] = await tx.select().from(orders).where(eq(orders.id, found.id)).for("update");
    if (order.fulfilledAt) return "already_fulfilled";
    if (order.checkoutSessionId && order.checkoutSessionId !== session.id) return "no_order";
    const open = order.status === "created" || order.status === "awaiting_payment";
    const now = new Date();
    switch (verdict) {
      case "open":
        return open ? "open" : "closed";
      case "awaiting":
        if (order.status === "created") await tx.update(orders).set({ status: "awaiting_payment", checkoutSessionId: session.id, updatedAt: now }).where(eq(orders.id, order.id));
        return open ? "awaiting_payment" : "closed";
      case "failed":
      case "expired":
        if (!open) return "closed";
        await tx.update(orders).set({ status: verdict, checkoutSessionId: session.id, updatedAt: now }).where(eq(orders.id, order.id));
        return verdict;
      case "paid":
        await seatBuyer(tx, order, session, courseTitle, now);
        return "fulfilled";
    }
  });
}

type OrderRow = typeof orders.$inferSelect;

/** Paid: the order, its seats and its receipt, together. A paid session is fulfilled even if the order had expired meanwhile. */
async function seatBuyer(tx: Queryable, order: OrderRow, session: Stripe.Checkout.Session, courseTitle: string, now: Date): Promise<void> {
  const quantity = seatsIn(session);
  const amountTotal = session.amount_total && session.amount_total > 0 ? session.amount_total : order.unitAmount * quantity;
  const paymentIntentId = typeof session.payment_intent === "string" ? session.payment_intent : (session.payment_intent?.id ?? null);
  await tx
    .update(orders)
    .set({ status: "paid", quantity, amountTotal, paymentIntentId, checkoutSessionId: session.id, paidAt: now, fulfilledAt: now, updatedAt: now })
    .where(eq(orders.id, order.id));
  let what = "Your own seat";
  if (order.kind === "school") {
    const added = await addSeats(tx, order.classId!, quantity);
    if (!added.ok) throw new Error(`Order ${order.id}: seats could not be added (${added.message})`);
    const [cls] = await tx.select({ name: classes.name, term: classes.term }).from(classes).where(eq(classes.id, order.classId!));
    what = `${quantity} ${quantity === 1 ? "seat" : "seats"} for the class ${cls.name} (${cls.term})`;
  } else {
    await tx.insert(enrollments).values({ userId: order.userId, courseSlug: order.courseSlug, source: "purchase" }).onConflictDoNothing();
  }
  const [buyer] = await tx.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, order.userId));
  await enqueueMail(tx, buyer.email, {
    template: "purchase_receipt",
    name: buyer.name,
    orderRef: orderRef(order.id),
    courseTitle,
    what,
    unitPrice: formatMoney(order.unitAmount, order.currency),
    quantity,
    total: formatMoney(amountTotal, order.currency),
    paidOn: now.toISOString().slice(0, 10),
    url: `${publicOrigin()}/${order.kind === "school" ? "school" : "learn"}/orders/${session.id}`,
  });
}

/** What a receipt and the office call an order: the first 8 characters of its id, upper case. */
export function orderRef(orderId: string): string {
  return orderId.slice(0, 8).toUpperCase();
}
