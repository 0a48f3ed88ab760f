// Fulfilment against a private payment stand-in: its signed webhooks reach receiveWebhook through
// a local endpoint (tests/integration/purchase-harness.ts). Checked: duplicates and out-of-order
// deliveries seat once and mail one receipt; bad signatures change nothing; declined, abandoned,
// expired and failed payments seat nobody; the success page may race the webhook; a lost webhook
// is caught by the reconciliation job; refunds remove only seats nobody holds.
// The rules followed are the service's published ones (docs.stripe.com/checkout/fulfillment;
// docs.stripe.com/webhooks: signature over the raw body, 300 s tolerance, events may repeat
// and arrive out of order).
import { randomBytes } from "node:crypto";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { classInvitations, enrollments, mailOutbox, paymentEvents, refunds } from "@/db/schema";
import { env } from "@/lib/env";
import { paymentsReconcile } from "@/lib/jobs/payments-reconcile";
import type { JobContext } from "@/lib/jobs/definition";
import { getOrderBySession } from "@/lib/server/orders";
import { receiveWebhook } from "@/lib/server/payment-webhook";
import { startSchoolPurchase, startSelfPurchase } from "@/lib/server/purchases";
import { decideRefund, requestRefund } from "@/lib/server/refunds";
import { claimSeat } from "@/lib/server/seat-pool";
import { testDb } from "./helpers";
import { control, formNonce, orderRow, receiptsTo, SECRET, startHarness, until, type Harness } from "./purchase-harness";
import { COURSE, makeClass, makeSchool, seatsOf, signedIn } from "./seats-fixtures";

let h: Harness;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  h = await startHarness();
  admin = await signedIn("admin");
});
afterAll(async () => {
  await h?.close();
  await closeDb();
});
beforeEach(async () => {
  await h.fake.idle();
  await control(h.fake, "reset");
  await control(h.fake, "settings", { retryBaseMs: 50, maxAttempts: 5, asyncDelayMs: 200 });
});

/** A manager, a school, an empty class and an open order of `quantity` seats for it. */
async function schoolOrder(quantity: number) {
  const manager = await signedIn("school_manager");
  const schoolId = await makeSchool(manager.id, "Fulfilment School");
  const classId = await makeClass(schoolId, 0, COURSE, "Fulfilment class");
  const r = await startSchoolPurchase(manager.viewer, { courseSlug: COURSE, classId, quantity, nonce: formNonce() }, testDb(), h.payments);
  if (!r.ok) throw new Error(r.message);
  return { manager, schoolId, classId, orderId: r.orderId, sessionId: r.checkoutSessionId };
}

const statusOf = async (orderId: string) => (await orderRow(orderId)).status;
const eventRows = async (sessionId: string) => testDb().select().from(paymentEvents).where(eq(paymentEvents.objectId, sessionId));

describe("paid by card", () => {
  it("the same signed event delivered 10 times at once: one order paid, one set of seats, one receipt", async () => {
    await control(h.fake, "settings", { duplicateDeliveries: 10 });
    const o = await schoolOrder(6);
    await control(h.fake, `checkout/${o.sessionId}/pay`);
    await until(async () => (await statusOf(o.orderId)) === "paid", "paid");
    await h.fake.idle();
    const [event] = h.fake.events().filter((e) => e.event.type === "checkout.session.completed");
    expect(event.deliveries.length).toBeGreaterThanOrEqual(10);
    expect(event.deliveries.every((d) => d.status === 200)).toBe(true);
    expect(await seatsOf(o.classId)).toEqual({ purchased: 6, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(1);
    expect(await eventRows(o.sessionId)).toEqual([expect.objectContaining({ eventId: event.event.id, type: "checkout.session.completed", result: expect.stringMatching(/fulfilled/) })]);
    const order = await orderRow(o.orderId);
    expect(order).toMatchObject({ quantity: 6, amountTotal: 41400, paymentIntentId: expect.stringMatching(/^pi_/) });
    expect(order.fulfilledAt).toBeInstanceOf(Date);
  });

  it("the same body handed to receiveWebhook 10 times concurrently, then again: fulfilled once", async () => {
    await control(h.fake, "settings", { enabled: false });
    const o = await schoolOrder(3);
    await control(h.fake, `checkout/${o.sessionId}/pay`);
    const [record] = h.fake.events();
    const body = JSON.stringify(record.event);
    const sign = () => Stripe.webhooks.generateTestHeaderString({ payload: body, secret: SECRET });
    const answers = await Promise.all(Array.from({ length: 10 }, () => receiveWebhook(body, sign(), testDb(), h.payments, SECRET)));
    expect(answers.every((a) => a.ok)).toBe(true);
    expect(answers.filter((a) => a.ok && a.outcome === "fulfilled")).toHaveLength(1);
    expect(await receiveWebhook(body, sign(), testDb(), h.payments, SECRET)).toMatchObject({ ok: true, duplicate: true });
    expect(await seatsOf(o.classId)).toEqual({ purchased: 3, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(1);
    expect(await eventRows(o.sessionId)).toHaveLength(1);
  });

  it("the receipt names the order, the class and the amounts", async () => {
    const o = await schoolOrder(2);
    await control(h.fake, `checkout/${o.sessionId}/pay`);
    await until(async () => (await statusOf(o.orderId)) === "paid", "paid");
    const [mail] = await testDb().select().from(mailOutbox).where(and(eq(mailOutbox.toAddress, o.manager.email), eq(mailOutbox.template, "purchase_receipt")));
    expect(mail.subject).toBe(`Receipt for your Axisline order ${o.orderId.slice(0, 8).toUpperCase()}`);
    expect(mail.text).toContain("2 seats for the class Fulfilment class (Test term)");
    expect(mail.text).toContain("2 × €69.00 = €138.00");
    expect(mail.text).toContain(`/school/orders/${o.sessionId}`);
  });
});

describe("a delayed payment method", () => {
  it("completed-unpaid waits; the async success delivered BEFORE the completed event (reversed) still seats once", async () => {
    // A window long enough that both events fall into it even on a busy machine.
    await control(h.fake, "settings", { shuffle: "reverse", shuffleWindowMs: 2000, asyncDelayMs: 100, duplicateDeliveries: 3 });
    const o = await schoolOrder(4);
    await control(h.fake, `checkout/${o.sessionId}/delay`);
    await until(async () => (await statusOf(o.orderId)) === "paid", "paid", 15_000);
    await h.fake.idle();
    const types = h.fake.events().map((e) => e.event.type);
    expect(types).toEqual(expect.arrayContaining(["checkout.session.completed", "checkout.session.async_payment_succeeded"]));
    // Each event recorded once, whatever order its copies came in.
    expect((await eventRows(o.sessionId)).map((e) => e.type).sort()).toEqual(["checkout.session.async_payment_succeeded", "checkout.session.completed"]);
    expect(await seatsOf(o.classId)).toEqual({ purchased: 4, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(1);
  });

  it("handed the async success first and the completed event after, 10 copies each at once: seated once", async () => {
    await control(h.fake, "settings", { enabled: false, asyncDelayMs: 100 });
    const o = await schoolOrder(5);
    await control(h.fake, `checkout/${o.sessionId}/delay`);
    const succeeded = await until(async () => h.fake.events().find((e) => e.event.type === "checkout.session.async_payment_succeeded"), "async success");
    const completed = h.fake.events().find((e) => e.event.type === "checkout.session.completed")!;
    const deliver = (record: typeof completed) => {
      const body = JSON.stringify(record.event);
      return receiveWebhook(body, Stripe.webhooks.generateTestHeaderString({ payload: body, secret: SECRET }), testDb(), h.payments, SECRET);
    };
    const first = await Promise.all(Array.from({ length: 10 }, () => deliver(succeeded)));
    expect(first.filter((a) => a.ok && a.outcome === "fulfilled")).toHaveLength(1);
    const later = await Promise.all(Array.from({ length: 10 }, () => deliver(completed)));
    expect(later.every((a) => a.ok && a.outcome === "already_fulfilled")).toBe(true);
    expect(await seatsOf(o.classId)).toEqual({ purchased: 5, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(1);
    expect(await statusOf(o.orderId)).toBe("paid");
  });

  it("completed-unpaid alone leaves the order awaiting payment with no seat", async () => {
    await control(h.fake, "settings", { asyncDelayMs: 60_000 });
    const o = await schoolOrder(2);
    await control(h.fake, `checkout/${o.sessionId}/delay`);
    await until(async () => (await statusOf(o.orderId)) === "awaiting_payment", "awaiting_payment");
    expect(await seatsOf(o.classId)).toEqual({ purchased: 0, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(0);
  });

  it("an async failure marks the order failed and seats nobody", async () => {
    const o = await schoolOrder(2);
    await control(h.fake, `checkout/${o.sessionId}/delay-fail`);
    await until(async () => (await statusOf(o.orderId)) === "failed", "failed", 15_000);
    await h.fake.idle();
    expect(await seatsOf(o.classId)).toEqual({ purchased: 0, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(0);
  });
});

describe("nobody pays", () => {
  it("a declined card and an abandoned checkout seat nobody; the session's expiry closes the order", async () => {
    const o = await schoolOrder(5);
    await control(h.fake, `checkout/${o.sessionId}/decline`);
    await control(h.fake, `checkout/${o.sessionId}/abandon`);
    await h.fake.idle();
    expect(await statusOf(o.orderId)).toBe("created");
    await h.payments.checkout.sessions.expire(o.sessionId);
    await until(async () => (await statusOf(o.orderId)) === "expired", "expired");
    expect(await seatsOf(o.classId)).toEqual({ purchased: 0, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(0);
  });
});

describe("signatures", () => {
  it("unsigned, tampered, wrong-secret and stale deliveries are 400 and change nothing; the genuine one then works", async () => {
    await control(h.fake, "settings", { enabled: false });
    const o = await schoolOrder(2);
    await control(h.fake, `checkout/${o.sessionId}/pay`);
    const body = JSON.stringify(h.fake.events()[0].event);
    const now = Math.floor(Date.now() / 1000);
    const tampered = body.replace('"payment_status": "paid"', '"payment_status": "paid" ').replace(/"amount_total":\s*\d+/, '"amount_total": 1');
    expect(tampered).not.toBe(body);
    const cases: [string, string, string | null][] = [
      ["unsigned", body, null],
      ["garbage header", body, "not a signature"],
      ["tampered body", tampered, Stripe.webhooks.generateTestHeaderString({ payload: body, secret: SECRET })],
      ["wrong secret", body, Stripe.webhooks.generateTestHeaderString({ payload: body, secret: "whsec_someone_else_0123456789abcdef" })],
      // The SDK's default tolerance and ours: 300 s (docs.stripe.com/webhooks, "replay attacks").
      ["stale (301 s old)", body, Stripe.webhooks.generateTestHeaderString({ payload: body, secret: SECRET, timestamp: now - 301 })],
    ];
    for (const [label, payload, header] of cases) {
      const r = await receiveWebhook(payload, header, testDb(), h.payments, SECRET);
      expect(r, label).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/^The webhook/) });
    }
    expect(await eventRows(o.sessionId)).toEqual([]);
    expect(await statusOf(o.orderId)).toBe("created");
    expect(await seatsOf(o.classId)).toEqual({ purchased: 0, claimed: 0 });
    // 299 s old is still inside the tolerance.
    const fresh = Stripe.webhooks.generateTestHeaderString({ payload: body, secret: SECRET, timestamp: now - 299 });
    expect(await receiveWebhook(body, fresh, testDb(), h.payments, SECRET)).toMatchObject({ ok: true, outcome: "fulfilled" });
    expect(await seatsOf(o.classId)).toEqual({ purchased: 2, claimed: 0 });
  });
});

describe("the success page races the webhook", () => {
  it("page reads and webhook deliveries at once fulfil once", async () => {
    await control(h.fake, "settings", { duplicateDeliveries: 4 });
    const o = await schoolOrder(3);
    await control(h.fake, `checkout/${o.sessionId}/pay`);
    const pages = await Promise.all(Array.from({ length: 5 }, () => getOrderBySession(o.manager.viewer, o.sessionId, testDb(), h.payments)));
    for (const p of pages) expect(p).toMatchObject({ ok: true, order: { status: "paid", quantity: 3, className: "Fulfilment class" } });
    await h.fake.idle();
    expect(await seatsOf(o.classId)).toEqual({ purchased: 3, claimed: 0 });
    expect(await receiptsTo(o.manager.email)).toBe(1);
  });

  it("another school's manager, an apprentice and the buyer's own page of someone else's session: 404", async () => {
    const o = await schoolOrder(1);
    const stranger = await signedIn("school_manager");
    await makeSchool(stranger.id, "Stranger school");
    const apprentice = await signedIn("apprentice");
    expect(await getOrderBySession(stranger.viewer, o.sessionId, testDb(), h.payments)).toMatchObject({ ok: false, code: "not_found" });
    expect(await getOrderBySession(apprentice.viewer, o.sessionId, testDb(), h.payments)).toMatchObject({ ok: false, code: "not_found" });
    expect(await getOrderBySession(o.manager.viewer, "cs_nope", testDb(), h.payments)).toMatchObject({ ok: false, code: "not_found" });
  });
});

describe("an apprentice buying alone", () => {
  it("is enrolled (source purchase) once, with one receipt", async () => {
    await control(h.fake, "settings", { duplicateDeliveries: 3 });
    const a = await signedIn("apprentice");
    const r = await startSelfPurchase(a.viewer, { courseSlug: "safe-stage-practice", nonce: formNonce() }, testDb(), h.payments);
    if (!r.ok) throw new Error(r.message);
    await control(h.fake, `checkout/${r.checkoutSessionId}/pay`);
    await until(async () => (await statusOf(r.orderId)) === "paid", "paid");
    await h.fake.idle();
    expect(await testDb().select().from(enrollments).where(eq(enrollments.userId, a.id))).toEqual([expect.objectContaining({ courseSlug: "safe-stage-practice", source: "purchase", classId: null })]);
    expect(await receiptsTo(a.email)).toBe(1);
    expect(await getOrderBySession(a.viewer, r.checkoutSessionId, testDb(), h.payments)).toMatchObject({ ok: true, order: { kind: "self", status: "paid" } });
  });
});

describe("reconciliation job", () => {
  const ctx = (): JobContext => ({ db: testDb(), env: { ...env(), STRIPE_API_URL: h.fake.url, STRIPE_SECRET_KEY: "sk_test_axisline_local" }, transport: null as never, workerId: "test", signal: new AbortController().signal, log: () => {} });

  it("a lost webhook: the job retrieves the session and seats the class once; a second run changes nothing", async () => {
    await control(h.fake, "settings", { enabled: false });
    const paid = await schoolOrder(4);
    const abandoned = await schoolOrder(2);
    await control(h.fake, `checkout/${paid.sessionId}/pay`);
    await h.payments.checkout.sessions.expire(abandoned.sessionId);
    expect(await statusOf(paid.orderId)).toBe("created");
    // Orders younger than olderThanMinutes are left alone.
    await paymentsReconcile.run(ctx(), { olderThanMinutes: 60 });
    expect(await statusOf(paid.orderId)).toBe("created");
    const report = (await paymentsReconcile.run(ctx(), { olderThanMinutes: 0 })) as { outcomes: Record<string, number> };
    expect(report.outcomes.fulfilled).toBeGreaterThanOrEqual(1);
    expect(await statusOf(paid.orderId)).toBe("paid");
    expect(await statusOf(abandoned.orderId)).toBe("expired");
    expect(await seatsOf(paid.classId)).toEqual({ purchased: 4, claimed: 0 });
    await paymentsReconcile.run(ctx(), { olderThanMinutes: 0 });
    expect(await seatsOf(paid.classId)).toEqual({ purchased: 4, claimed: 0 });
    expect(await receiptsTo(paid.manager.email)).toBe(1);
  });
});

describe("refunds of unused seats", () => {
  async function paidOrder(quantity: number) {
    const o = await schoolOrder(quantity);
    await control(h.fake, `checkout/${o.sessionId}/pay`);
    await until(async () => (await statusOf(o.orderId)) === "paid", "paid");
    return o;
  }

  it("only seats nobody claimed and no invitation holds can go back; approval refunds and shrinks the pool, charge.refunded completes it", async () => {
    const o = await paidOrder(6);
    // Two apprentices take seats, one invitation is pending: 3 seats are free.
    for (let i = 0; i < 2; i++) {
      const a = await signedIn("apprentice");
      await testDb().transaction(async (tx) => {
        const c = await claimSeat(tx, o.classId, a.id);
        if (!c.ok) throw new Error(c.message);
      });
    }
    await testDb().insert(classInvitations).values({ classId: o.classId, email: `held-${randomBytes(3).toString("hex")}@test.example`, tokenHash: randomBytes(32).toString("hex"), expiresAt: new Date(Date.now() + 86_400_000) });
    expect(await requestRefund(o.manager.viewer, { orderId: o.orderId, seats: 4, reason: "Two apprentices left" }, testDb())).toMatchObject({ ok: false, code: "conflict", message: expect.stringContaining("At most 3 seats") });
    const asked = await requestRefund(o.manager.viewer, { orderId: o.orderId, seats: 3, reason: "Three places not needed" }, testDb());
    if (!asked.ok) throw new Error(asked.message);
    expect(asked.refund).toMatchObject({ seats: 3, amount: 3 * 6900, status: "requested" });
    // One open request per order.
    expect(await requestRefund(o.manager.viewer, { orderId: o.orderId, seats: 1, reason: "More" }, testDb())).toMatchObject({ ok: false, code: "conflict" });
    // The manager can't decide; the admin approves.
    expect(await decideRefund(o.manager.viewer, { refundId: asked.refund.id, decision: "approve" }, testDb(), h.payments)).toMatchObject({ ok: false, code: "forbidden" });
    const approved = await decideRefund(admin.viewer, { refundId: asked.refund.id, decision: "approve", note: "Fine" }, testDb(), h.payments);
    expect(approved).toMatchObject({ ok: true, refund: { status: "approved" } });
    expect(await seatsOf(o.classId)).toEqual({ purchased: 3, claimed: 2 });
    expect(await orderRow(o.orderId)).toMatchObject({ status: "refunded_partly", seatsRefunded: 3, amountRefunded: 20700 });
    await until(async () => (await testDb().select().from(refunds).where(eq(refunds.id, asked.refund.id)))[0].status === "completed", "refund completed by charge.refunded");
    const [row] = await testDb().select().from(refunds).where(eq(refunds.id, asked.refund.id));
    const remote = await h.payments.refunds.retrieve(row.stripeRefundId!);
    expect(remote).toMatchObject({ amount: 20700, status: "succeeded", payment_intent: (await orderRow(o.orderId)).paymentIntentId });
    expect((await testDb().select().from(mailOutbox).where(and(eq(mailOutbox.toAddress, o.manager.email), eq(mailOutbox.template, "refund_decision"))))[0].subject).toMatch(/^Refund approved/);
    // Deciding twice is refused.
    expect(await decideRefund(admin.viewer, { refundId: asked.refund.id, decision: "reject" }, testDb(), h.payments)).toMatchObject({ ok: false, code: "conflict" });
  });

  it("if the seats were taken between request and approval, approval is refused and nothing is refunded", async () => {
    const o = await paidOrder(2);
    const asked = await requestRefund(o.manager.viewer, { orderId: o.orderId, seats: 2, reason: "Class cancelled" }, testDb());
    if (!asked.ok) throw new Error(asked.message);
    const a = await signedIn("apprentice");
    await testDb().transaction((tx) => claimSeat(tx, o.classId, a.id));
    expect(await decideRefund(admin.viewer, { refundId: asked.refund.id, decision: "approve" }, testDb(), h.payments)).toMatchObject({ ok: false, code: "conflict" });
    expect(await seatsOf(o.classId)).toEqual({ purchased: 2, claimed: 1 });
    const [row] = await testDb().select().from(refunds).where(eq(refunds.id, asked.refund.id));
    expect(row).toMatchObject({ status: "requested", stripeRefundId: null });
    expect(await orderRow(o.orderId)).toMatchObject({ status: "paid", seatsRefunded: 0 });
  });

  it("a rejection keeps the seats and tells the manager", async () => {
    const o = await paidOrder(2);
    const asked = await requestRefund(o.manager.viewer, { orderId: o.orderId, seats: 1, reason: "Not sure" }, testDb());
    if (!asked.ok) throw new Error(asked.message);
    expect(await decideRefund(admin.viewer, { refundId: asked.refund.id, decision: "reject", note: "Past the refund period" }, testDb(), h.payments)).toMatchObject({ ok: true, refund: { status: "rejected", decisionNote: "Past the refund period" } });
    expect(await seatsOf(o.classId)).toEqual({ purchased: 2, claimed: 0 });
    const [mail] = await testDb().select().from(mailOutbox).where(and(eq(mailOutbox.toAddress, o.manager.email), eq(mailOutbox.template, "refund_decision")));
    expect(mail.text).toContain("was not approved");
    expect(mail.text).toContain("Past the refund period");
  });

  it("bad refund input is refused with a sentence; another school's manager gets 404", async () => {
    const o = await paidOrder(2);
    for (const seats of [0, -1, 2.5, "2"]) {
      expect(await requestRefund(o.manager.viewer, { orderId: o.orderId, seats, reason: "x reason" }, testDb())).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/^[A-Z].+\.$/) });
    }
    const stranger = await signedIn("school_manager");
    expect(await requestRefund(stranger.viewer, { orderId: o.orderId, seats: 1, reason: "Mine now" }, testDb())).toMatchObject({ ok: false, code: "not_found" });
  });
});
