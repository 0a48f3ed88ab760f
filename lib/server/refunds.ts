import "server-only";
// Refunds of unused seats. A school's manager asks for some seats of a paid order back; an admin
// approves (the money goes back through the payment service and the seats leave the class's pool
// in the same transaction as the refund record; only seats nobody claimed and no invitation
// holds can go, lib/server/seat-pool.ts removeSeats) or rejects. The service's charge.refunded
// webhook (or the reconciliation job) then marks the refund completed.
import { and, eq, inArray, sql } from "drizzle-orm";
import Stripe from "stripe";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { orders, refunds, schoolMembers, users } from "@/db/schema";
import type { RefundDto } from "@/lib/dto/orders";
import { enqueueMail } from "@/lib/email/outbox";
import { getCourse } from "@/lib/content";
import { paymentsClient } from "@/lib/payments/stripe-client";
import { formatMoney } from "@/lib/pricing/prices";
import { fail, type Failure, type Result } from "./errors";
import { orderRef } from "./fulfilment";
import { guard } from "./guard";
import { publicOrigin } from "./http";
import { paymentServiceFailure } from "./purchases";
import { releasableSeats, removeSeats } from "./seat-pool";
import type { Viewer } from "./viewer";

const RequestInput = z.object({
  orderId: z.uuid({ error: "Choose one of your school's orders." }),
  seats: z.number({ error: "Say how many seats to refund, as a whole number." }).int({ error: "Say how many seats to refund, as a whole number." }).min(1, { error: "Refund at least one seat." }).max(500, { error: "An order has at most 500 seats." }),
  reason: z.string({ error: "Say briefly why the seats are not needed." }).trim().min(3, { error: "Say briefly why the seats are not needed." }).max(500, { error: "Keep the reason under 500 characters." }),
});

const DecideInput = z.object({
  refundId: z.uuid({ error: "Choose a refund request." }),
  decision: z.enum(["approve", "reject"], { error: "Approve or reject the request." }),
  note: z.string().trim().max(500, { error: "Keep the note under 500 characters." }).optional(),
});

function invalid(error: z.ZodError): Failure {
  const fieldErrors = Object.fromEntries(error.issues.map((i) => [String(i.path[0] ?? "form"), i.message]));
  return fail("invalid_input", { message: error.issues[0]?.message, fieldErrors });
}

/** Seats of a school order that could be refunded now: not yet refunded or asked for, and free in the class. */
export async function refundableSeatsOf(tx: Queryable, order: { id: string; classId: string | null; quantity: number; seatsRefunded: number }): Promise<number> {
  if (!order.classId) return 0;
  const [open] = await tx.select({ n: sql<number>`coalesce(sum(${refunds.seats}), 0)::int` }).from(refunds).where(and(eq(refunds.orderId, order.id), inArray(refunds.status, ["requested"])));
  return Math.max(0, Math.min(await releasableSeats(tx, order.classId), order.quantity - order.seatsRefunded - (open?.n ?? 0)));
}

/** The school manager asks for unused seats of a paid order back. */
export async function requestRefund(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ refund: RefundDto }>> {
  const allowed = guard(viewer, ["school_manager"], "Only the school's manager can ask for a refund of its seats.");
  if (!allowed.ok) return allowed;
  const parsed = RequestInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  const { orderId, seats, reason } = parsed.data;
  return database.transaction(async (tx) => {
    const [order] = await tx
      .select({ id: orders.id, classId: orders.classId, quantity: orders.quantity, seatsRefunded: orders.seatsRefunded, status: orders.status, unitAmount: orders.unitAmount, amountTotal: orders.amountTotal, amountRefunded: orders.amountRefunded, currency: orders.currency })
      .from(orders)
      .innerJoin(schoolMembers, and(eq(schoolMembers.schoolId, orders.schoolId), eq(schoolMembers.userId, allowed.viewer.id), eq(schoolMembers.role, "manager")))
      .where(and(eq(orders.id, orderId), eq(orders.kind, "school")))
      .for("update", { of: orders });
    if (!order) return fail("not_found", { message: "We couldn't find that order among your school's orders." });
    if (order.status !== "paid" && order.status !== "refunded_partly") return fail("conflict", { message: "Only a paid order's seats can be refunded." });
    const free = await refundableSeatsOf(tx, order);
    if (seats > free) {
      const message = free === 0 ? "No seat of this order can be refunded now: every seat is taken, held by an invitation, or already asked for." : `At most ${free} ${free === 1 ? "seat" : "seats"} of this order can be refunded now (seats nobody has taken and no invitation holds).`;
      return fail("conflict", { message, fieldErrors: { seats: message } });
    }
    const amount = Math.min(seats * order.unitAmount, order.amountTotal - order.amountRefunded);
    const [row] = await tx.insert(refunds).values({ orderId, seats, amount, currency: order.currency, reason, requestedBy: allowed.viewer.id }).onConflictDoNothing().returning();
    if (!row) return fail("conflict", { message: "There is already a refund request for this order waiting for a decision." });
    return { ok: true, refund: refundDto(row) };
  });
}

class Rollback extends Error {
  constructor(readonly failure: Failure) {
    super(failure.message);
  }
}

/** An admin approves (refund through the service + seats out of the pool, together) or rejects. */
export async function decideRefund(viewer: Viewer | null, raw: unknown, database: Queryable = db(), payments: Stripe = paymentsClient()): Promise<Result<{ refund: RefundDto }>> {
  const allowed = guard(viewer, ["admin"]);
  if (!allowed.ok) return allowed;
  const parsed = DecideInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  const { refundId, decision } = parsed.data;
  const note = parsed.data.note || null;
  try {
    return await database.transaction(async (tx) => {
      const [refund] = await tx.select().from(refunds).where(eq(refunds.id, refundId)).for("update");
      if (!refund) return fail("not_found", { message: "We couldn't find that refund request." });
      if (refund.status !== "requested") return fail("conflict", { message: "This refund request was already decided." });
      const [order] = await tx.select().from(orders).where(eq(orders.id, refund.orderId)).for("update");
      const decided = { decidedBy: allowed.viewer.id, decidedAt: new Date(), decisionNote: note };
      if (decision === "reject") {
        const [row] = await tx.update(refunds).set({ status: "rejected", ...decided }).where(eq(refunds.id, refundId)).returning();
        await mailDecision(tx, order, row, false);
        return { ok: true as const, refund: refundDto(row) };
      }
      if (!order.paymentIntentId) throw new Rollback(fail("conflict", { message: "This order has no recorded payment to refund." }));
      const removed = await removeSeats(tx, order.classId!, refund.seats);
      if (!removed.ok) throw new Rollback(removed);
      const stripeRefund = await createServiceRefund(payments, order.paymentIntentId, refund);
      const [row] = await tx.update(refunds).set({ status: "approved", stripeRefundId: stripeRefund.id, ...decided }).where(eq(refunds.id, refundId)).returning();
      const seatsRefunded = order.seatsRefunded + refund.seats;
      await tx
        .update(orders)
        .set({ seatsRefunded, amountRefunded: order.amountRefunded + refund.amount, status: seatsRefunded >= order.quantity ? "refunded" : "refunded_partly", updatedAt: new Date() })
        .where(eq(orders.id, order.id));
      await mailDecision(tx, order, row, true);
      return { ok: true as const, refund: refundDto(row) };
    });
  } catch (error) {
    if (error instanceof Rollback) return error.failure;
    throw error;
  }
}

/** The refund at the service; the key makes a retried approval get the same refund back. */
async function createServiceRefund(payments: Stripe, paymentIntent: string, refund: typeof refunds.$inferSelect): Promise<Stripe.Refund> {
  try {
    return await payments.refunds.create({ payment_intent: paymentIntent, amount: refund.amount, metadata: { refundId: refund.id, orderId: refund.orderId } }, { idempotencyKey: `axisline-refund-${refund.id}` });
  } catch (error) {
    throw new Rollback(paymentServiceFailure(error));
  }
}

async function mailDecision(tx: Queryable, order: typeof orders.$inferSelect, refund: typeof refunds.$inferSelect, approved: boolean): Promise<void> {
  const [to] = await tx.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, refund.requestedBy ?? order.userId));
  if (!to) return;
  await enqueueMail(tx, to.email, {
    template: "refund_decision",
    name: to.name,
    orderRef: orderRef(order.id),
    courseTitle: (await getCourse(order.courseSlug))?.title ?? order.courseSlug,
    approved,
    seats: refund.seats,
    amount: formatMoney(refund.amount, refund.currency),
    note: refund.decisionNote,
    url: `${publicOrigin()}/school/orders/${order.checkoutSessionId}`,
  });
}

/**
 * Approved refunds of a payment that the service reports as succeeded become completed. Returns
 * how many. The rows are locked first: a charge.refunded event can arrive while the approving
 * transaction (which created the refund at the service) has not committed yet, and must wait for it.
 */
export async function completeRefunds(paymentIntentId: string | null, database: Queryable = db(), payments: Stripe = paymentsClient()): Promise<number> {
  return database.transaction(async (tx) => {
    const open = await tx
      .select({ id: refunds.id })
      .from(refunds)
      .innerJoin(orders, eq(orders.id, refunds.orderId))
      .where(and(inArray(refunds.status, ["requested", "approved"]), paymentIntentId ? eq(orders.paymentIntentId, paymentIntentId) : undefined))
      .for("update", { of: refunds });
    if (open.length === 0) return 0;
    const approved = await tx.select({ id: refunds.id, stripeRefundId: refunds.stripeRefundId }).from(refunds).where(and(inArray(refunds.id, open.map((r) => r.id)), eq(refunds.status, "approved")));
    let completed = 0;
    for (const r of approved) {
      if (!r.stripeRefundId) continue;
      const remote = await retrieveRefund(payments, r.stripeRefundId);
      if (remote?.status !== "succeeded") continue;
      await tx.update(refunds).set({ status: "completed", completedAt: new Date() }).where(eq(refunds.id, r.id));
      completed++;
    }
    return completed;
  });
}

/** The service's refund, or null if it does not know it (a 4xx: never retried; anything else throws). */
async function retrieveRefund(payments: Stripe, id: string): Promise<Stripe.Refund | null> {
  try {
    return await payments.refunds.retrieve(id);
  } catch (error) {
    if (error instanceof Stripe.errors.StripeInvalidRequestError) {
      console.error(`[payments] refund ${id} is unknown to the payment service: ${error.message}`);
      return null;
    }
    throw error;
  }
}

export function refundDto(r: typeof refunds.$inferSelect): RefundDto {
  return {
    id: r.id,
    seats: r.seats,
    amount: r.amount,
    currency: r.currency,
    status: r.status,
    reason: r.reason,
    decisionNote: r.decisionNote,
    requestedAtUtc: r.createdAt.toISOString(),
    decidedAtUtc: r.decidedAt?.toISOString() ?? null,
  };
}
