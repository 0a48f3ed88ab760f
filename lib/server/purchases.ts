import "server-only";
// Starting a purchase: a school manager buys seats for a class (or a new class) of their school,
// an apprentice without a seat buys one for themselves. Each makes ONE order row and ONE Checkout
// Session, whatever happens to the form: the session is created with an idempotency key derived
// from the buyer, the class, the course, the quantity and the form's nonce, and the order row
// (unique on that key) is written before the session, so its id travels in the metadata.
// Prices come from lib/pricing/prices.ts; nothing the browser sends becomes a line item but the
// course and the quantity, both validated. Fulfilment is lib/server/fulfilment.ts.
import { createHash } from "node:crypto";
import { and, eq, sql } from "drizzle-orm";
import Stripe from "stripe";
import { db, type Queryable } from "@/db/client";
import { classes, enrollments, orders, schoolMembers } from "@/db/schema";
import { getCourse } from "@/lib/content";
import { paymentsClient } from "@/lib/payments/stripe-client";
import { quoteSchoolOrder, quoteSelfPurchase, type Quote } from "@/lib/pricing/prices";
import { purchaseProblems, SchoolPurchaseInput, SelfPurchaseInput, type SchoolPurchaseInputT } from "@/lib/validation/purchase";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import { publicOrigin } from "./http";
import type { Viewer } from "./viewer";

export type StartedPurchase = { orderId: string; checkoutSessionId: string; checkoutUrl: string };

type OrderRow = typeof orders.$inferSelect;

/** SHA-256 of the parts that make two submissions "the same purchase". */
export function purchaseKey(parts: string[]): string {
  return `axisline-order-${createHash("sha256").update(parts.join("\u0000")).digest("hex").slice(0, 40)}`;
}

/** Seats for a class of a school the viewer manages (403 for anyone else, 404 for a class that isn't theirs). */
export async function startSchoolPurchase(viewer: Viewer | null, raw: unknown, database: Queryable = db(), payments: Stripe = paymentsClient()): Promise<Result<StartedPurchase>> {
  const allowed = guard(viewer, ["school_manager"], "Only a school's manager can buy seats for it.");
  if (!allowed.ok) return allowed;
  const parsed = SchoolPurchaseInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", purchaseProblems(parsed.error));
  const input = parsed.data;
  const quote = quoteSchoolOrder(input);
  if (!quote.ok) return fail("invalid_input", { message: quote.message });
  const course = await getCourse(input.courseSlug);
  if (!course) return fail("invalid_input", { message: "Choose one of the courses on sale.", fieldErrors: { courseSlug: "Choose one of the courses on sale." } });
  const buyer = allowed.viewer;
  const target = input.classId ? `class:${input.classId}` : `new:${input.newClass!.schoolId}:${input.newClass!.name}:${input.newClass!.term}`;
  const idempotencyKey = purchaseKey([buyer.id, target, input.courseSlug, String(input.quantity), input.nonce]);

  const recorded = await database.transaction(async (tx) => {
    const existing = await lockedOrderByKey(tx, idempotencyKey);
    if (existing) return { ok: true as const, order: existing };
    const placed = await schoolClassFor(tx, buyer.id, input);
    if (!placed.ok) return placed;
    return { ok: true as const, order: await insertOrder(tx, { kind: "school", schoolId: placed.schoolId, classId: placed.classId, userId: buyer.id, idempotencyKey }, quote) };
  });
  if (!recorded.ok) return recorded;
  return openSession(database, payments, recorded.order, { email: buyer.email, productName: `${course.title}: seats`, area: "school", cancelPath: "/school/buy?cancelled=1" });
}

/** One seat for an apprentice who has none on the course (not through a class, not bought before). */
export async function startSelfPurchase(viewer: Viewer | null, raw: unknown, database: Queryable = db(), payments: Stripe = paymentsClient()): Promise<Result<StartedPurchase>> {
  const allowed = guard(viewer, ["apprentice"], "Only an apprentice's own account can buy a seat for itself.");
  if (!allowed.ok) return allowed;
  const parsed = SelfPurchaseInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", purchaseProblems(parsed.error));
  const { courseSlug, nonce } = parsed.data;
  const quote = quoteSelfPurchase(courseSlug);
  const course = await getCourse(courseSlug);
  if (!quote.ok || !course) return fail("invalid_input", { message: "Choose one of the courses on sale.", fieldErrors: { courseSlug: "Choose one of the courses on sale." } });
  const buyer = allowed.viewer;
  const [seat] = await database.select({ source: enrollments.source }).from(enrollments).where(and(eq(enrollments.userId, buyer.id), eq(enrollments.courseSlug, courseSlug)));
  if (seat) {
    const how = seat.source === "class" ? "through your class" : "already";
    return fail("conflict", { message: `You have a seat on ${course.title} ${how}: open the course to continue.` });
  }
  const idempotencyKey = purchaseKey([buyer.id, "self", courseSlug, "1", nonce]);
  const order = await database.transaction(async (tx) => (await lockedOrderByKey(tx, idempotencyKey)) ?? insertOrder(tx, { kind: "self", schoolId: null, classId: null, userId: buyer.id, idempotencyKey }, quote));
  return openSession(database, payments, order, { email: buyer.email, productName: `${course.title}: one seat`, area: "learn", cancelPath: `/courses/${courseSlug}?purchase=cancelled` });
}

/**
 * The order of this key, after taking a transaction lock on the key: concurrent submissions of
 * one form queue here, so only the first creates a class and an order; the others find them.
 */
async function lockedOrderByKey(tx: Queryable, idempotencyKey: string): Promise<OrderRow | null> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${idempotencyKey}, 0))`);
  return orderByKey(tx, idempotencyKey);
}

async function orderByKey(tx: Queryable, idempotencyKey: string): Promise<OrderRow | null> {
  const [row] = await tx.select().from(orders).where(eq(orders.idempotencyKey, idempotencyKey));
  return row ?? null;
}

type NewOrder = { kind: "school" | "self"; schoolId: string | null; classId: string | null; userId: string; idempotencyKey: string };

/** Inserts the order, or (a concurrent submission of the same form won) returns the one that exists. */
async function insertOrder(tx: Queryable, o: NewOrder, quote: Quote): Promise<OrderRow> {
  const [row] = await tx
    .insert(orders)
    .values({ ...o, courseSlug: quote.courseSlug, quantity: quote.quantity, unitAmount: quote.unitAmount, amountTotal: quote.amountTotal, currency: quote.currency })
    .onConflictDoNothing({ target: orders.idempotencyKey })
    .returning();
  return row ?? (await orderByKey(tx, o.idempotencyKey))!;
}

type Placement = { ok: true; schoolId: string; classId: string } | Extract<Result, { ok: false }>;

/** The class the seats go to: one of the viewer's schools' classes on that course, or a new one created now. */
async function schoolClassFor(tx: Queryable, userId: string, input: SchoolPurchaseInputT): Promise<Placement> {
  if (input.classId) {
    const [row] = await tx
      .select({ schoolId: classes.schoolId, courseSlug: classes.courseSlug })
      .from(classes)
      .innerJoin(schoolMembers, and(eq(schoolMembers.schoolId, classes.schoolId), eq(schoolMembers.userId, userId), eq(schoolMembers.role, "manager")))
      .where(eq(classes.id, input.classId));
    if (!row) return fail("not_found", { message: "We couldn't find that class among your school's classes." });
    if (row.courseSlug !== input.courseSlug) {
      const message = "That class follows another course. Choose the class's own course, or buy for a new class.";
      return fail("invalid_input", { message, fieldErrors: { classId: message } });
    }
    return { ok: true, schoolId: row.schoolId, classId: input.classId };
  }
  const { schoolId, name, term } = input.newClass!;
  const [managed] = await tx.select({ schoolId: schoolMembers.schoolId }).from(schoolMembers).where(and(eq(schoolMembers.schoolId, schoolId), eq(schoolMembers.userId, userId), eq(schoolMembers.role, "manager")));
  if (!managed) return fail("not_found", { message: "We couldn't find that school among the schools you manage." });
  const [created] = await tx.insert(classes).values({ schoolId, name, term, courseSlug: input.courseSlug }).returning({ id: classes.id });
  return { ok: true, schoolId, classId: created.id };
}

type SessionFor = { email: string; productName: string; area: "school" | "learn"; cancelPath: string };

/**
 * Creates (or, for the same key, gets back) the order's Checkout Session and records its id.
 * The body is built from the order row only, so a repeated call sends the same body, as the
 * service's idempotency rules require (same key + another body is an error).
 */
async function openSession(database: Queryable, payments: Stripe, order: OrderRow, s: SessionFor): Promise<Result<StartedPurchase>> {
  if (order.status !== "created") {
    return fail("conflict", { message: "This purchase form was already used for an order that is now closed. Reload the page to start a new one." });
  }
  const origin = publicOrigin();
  let session: Stripe.Checkout.Session;
  try {
    session = await payments.checkout.sessions.create(
      {
        mode: "payment",
        line_items: [{ quantity: order.quantity, price_data: { currency: order.currency, unit_amount: order.unitAmount, product_data: { name: s.productName } } }],
        metadata: { orderId: order.id, kind: order.kind },
        client_reference_id: order.id,
        customer_email: s.email,
        payment_intent_data: { metadata: { orderId: order.id } },
        success_url: `${origin}/${s.area}/orders/{CHECKOUT_SESSION_ID}`,
        cancel_url: `${origin}${s.cancelPath}`,
      },
      { idempotencyKey: order.idempotencyKey },
    );
  } catch (error) {
    return paymentServiceFailure(error);
  }
  if (!session.url) throw new Error(`Checkout Session ${session.id} came back without a url`);
  await database.update(orders).set({ checkoutSessionId: session.id, checkoutUrl: session.url, updatedAt: new Date() }).where(eq(orders.id, order.id));
  return { ok: true, orderId: order.id, checkoutSessionId: session.id, checkoutUrl: session.url };
}

/** The service refused or could not be reached: a sentence, nothing charged. Bugs (anything else) still throw. */
export function paymentServiceFailure(error: unknown): Extract<Result, { ok: false }> {
  if (error instanceof Stripe.errors.StripeConnectionError || error instanceof Stripe.errors.StripeAPIError || error instanceof Stripe.errors.StripeRateLimitError) {
    return fail("unavailable", { message: "The payment service can't be reached right now. Nothing was charged; please try again in a minute.", retryAfterSeconds: 60 });
  }
  if (error instanceof Stripe.errors.StripeIdempotencyError) {
    return fail("conflict", { message: "This purchase form was already sent with other details. Reload the page and try again." });
  }
  if (error instanceof Stripe.errors.StripeError) {
    console.error("[payments] refused:", error.type, error.code, error.message);
    return fail("unavailable", { message: "The payment service refused the request. Nothing was charged; please try again later or contact us.", retryAfterSeconds: 60 });
  }
  throw error;
}
