import { sql } from "drizzle-orm";
import { check, index, integer, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { classes, schools } from "./schools";
import { users } from "./users";

// Buying seats (lib/server/purchases.ts, fulfilment.ts, refunds.ts). Money is integer minor units
// (cents) in the order's currency; prices come from lib/pricing/prices.ts, never from a browser.

export const orderKindEnum = pgEnum("order_kind", ["school", "self"]);

/**
 * created: the Checkout Session exists, nobody has paid. awaiting_payment: completed with a delayed
 * method, the money is not in yet. paid: seats given (fulfilled_at). failed / expired: nobody seated.
 * refunded_partly / refunded: some or all seats given back after payment.
 */
export const orderStatusEnum = pgEnum("order_status", ["created", "awaiting_payment", "paid", "failed", "expired", "refunded_partly", "refunded"]);

export const orders = pgTable(
  "orders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    kind: orderKindEnum("kind").notNull(),
    // A school order seats a class of the school; a self purchase seats its buyer.
    schoolId: uuid("school_id").references(() => schools.id, { onDelete: "restrict" }),
    classId: uuid("class_id").references(() => classes.id, { onDelete: "restrict" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    courseSlug: text("course_slug").notNull(),
    quantity: integer("quantity").notNull(),
    unitAmount: integer("unit_amount").notNull(),
    amountTotal: integer("amount_total").notNull(),
    currency: text("currency").notNull(),
    // Set right after the session is created (the order row exists first, so the session's
    // metadata can name it); unique, so one session fulfils one order.
    checkoutSessionId: text("checkout_session_id"),
    checkoutUrl: text("checkout_url"),
    // The key sent with the session's creation: buyer + class + course + quantity + form nonce.
    idempotencyKey: text("idempotency_key").notNull(),
    status: orderStatusEnum("status").notNull().default("created"),
    paymentIntentId: text("payment_intent_id"),
    paidAt: timestamp("paid_at", { withTimezone: true }),
    fulfilledAt: timestamp("fulfilled_at", { withTimezone: true }),
    seatsRefunded: integer("seats_refunded").notNull().default(0),
    amountRefunded: integer("amount_refunded").notNull().default(0),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("orders_checkout_session_key").on(t.checkoutSessionId),
    uniqueIndex("orders_idempotency_key").on(t.idempotencyKey),
    index("orders_school_idx").on(t.schoolId, t.createdAt),
    index("orders_user_idx").on(t.userId, t.createdAt),
    // The reconciliation job's scan: unfinished orders by age.
    index("orders_unfinished_idx").on(t.createdAt).where(sql`${t.status} IN ('created', 'awaiting_payment')`),
    check("orders_quantity_check", sql`${t.quantity} > 0`),
    check("orders_amounts_check", sql`${t.unitAmount} > 0 AND ${t.amountTotal} > 0`),
    check("orders_refunded_check", sql`${t.seatsRefunded} >= 0 AND ${t.seatsRefunded} <= ${t.quantity} AND ${t.amountRefunded} >= 0 AND ${t.amountRefunded} <= ${t.amountTotal}`),
    check(
      "orders_kind_check",
      sql`(${t.kind} = 'school' AND ${t.schoolId} IS NOT NULL AND ${t.classId} IS NOT NULL) OR (${t.kind} = 'self' AND ${t.schoolId} IS NULL AND ${t.classId} IS NULL AND ${t.quantity} = 1)`,
    ),
  ],
);

/** Every webhook event we accepted, once (the service may deliver an event more than once). */
export const paymentEvents = pgTable(
  "payment_events",
  {
    eventId: text("event_id").primaryKey(),
    type: text("type").notNull(),
    // The Checkout Session or charge the event is about.
    objectId: text("object_id"),
    receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
    processedAt: timestamp("processed_at", { withTimezone: true }),
    // What fulfilment made of it: "fulfilled", "already fulfilled", "expired", "ignored: …".
    result: text("result"),
  },
  (t) => [index("payment_events_object_idx").on(t.objectId)],
);

export const refundStatusEnum = pgEnum("refund_status", ["requested", "approved", "rejected", "completed"]);

/** Unused seats of a paid school order given back: the manager asks, an admin decides. */
export const refunds = pgTable(
  "refunds",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "restrict" }),
    seats: integer("seats").notNull(),
    amount: integer("amount").notNull(),
    currency: text("currency").notNull(),
    status: refundStatusEnum("status").notNull().default("requested"),
    reason: text("reason").notNull(),
    requestedBy: uuid("requested_by").references(() => users.id, { onDelete: "set null" }),
    decidedBy: uuid("decided_by").references(() => users.id, { onDelete: "set null" }),
    decisionNote: text("decision_note"),
    stripeRefundId: text("stripe_refund_id"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    completedAt: timestamp("completed_at", { withTimezone: true }),
  },
  (t) => [
    index("refunds_order_idx").on(t.orderId),
    uniqueIndex("refunds_stripe_refund_key").on(t.stripeRefundId),
    // One open request per order at a time.
    uniqueIndex("refunds_open_key").on(t.orderId).where(sql`${t.status} = 'requested'`),
    check("refunds_positive_check", sql`${t.seats} > 0 AND ${t.amount} > 0`),
  ],
);

export type OrderStatus = (typeof orderStatusEnum.enumValues)[number];
export type OrderKind = (typeof orderKindEnum.enumValues)[number];
export type RefundStatus = (typeof refundStatusEnum.enumValues)[number];
