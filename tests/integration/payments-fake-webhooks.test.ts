// The payment stand-in's hosted checkout outcomes and webhook delivery: events signed with the
// service's scheme (verified here by the real SDK's constructEvent, and by an HMAC computed with
// node:crypto from the scheme as docs.stripe.com/webhooks states it), retries with exponential
// backoff, and the duplicate / out-of-order switch. The app's endpoint is a test receiver.
import { createHmac } from "node:crypto";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { createPaymentsClient } from "@/lib/payments/stripe-client";
import { startPaymentsFake, type PaymentsFake } from "@/lib/payments/fake/server";
import { startReceiver, until } from "../support/webhook-receiver";

const KEY = "sk_test_payments_fake_hooks";
const SECRET = "whsec_payments_fake_hooks_0123456789";
const BASE_MS = 150;
let fake: PaymentsFake;
let stripe: Stripe;
let receiver: Awaited<ReturnType<typeof startReceiver>>;

const control = async (path: string, body: unknown = {}) => {
  const res = await fetch(`${fake.url}/_fake/${path}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  return { status: res.status, body: await res.json() };
};

beforeAll(async () => {
  receiver = await startReceiver();
  fake = await startPaymentsFake({ port: 0, secretKey: KEY, webhookSecret: SECRET, webhookUrl: receiver.url, asyncDelayMs: 100, webhooks: { retryBaseMs: BASE_MS, maxAttempts: 4 } });
  stripe = createPaymentsClient({ STRIPE_SECRET_KEY: KEY, STRIPE_API_URL: fake.url });
});
afterAll(async () => {
  await fake?.close();
  await receiver?.close();
});
beforeEach(async () => {
  await control("reset");
  receiver.clear();
});

const newSession = () =>
  stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [{ quantity: 2, price_data: { currency: "eur", unit_amount: 5000, product_data: { name: "Course: Stage box to mix" } } }],
    success_url: "http://127.0.0.1:3000/courses/stage-box-to-mix/bought?session={CHECKOUT_SESSION_ID}",
    cancel_url: "http://127.0.0.1:3000/courses/stage-box-to-mix",
    metadata: { order: "ord_9" },
  });

describe("hosted checkout page", () => {
  it("shows the order and, on Pay, redirects to success_url with the session id filled in", async () => {
    const session = await newSession();
    const page = await (await fetch(session.url!)).text();
    expect(page).toContain('<html lang="en">');
    expect(page).toContain("Course: Stage box to mix");
    expect(page).toContain("€100.00");
    const res = await fetch(`${fake.url}/checkout/${session.id}/pay`, { method: "POST", body: new URLSearchParams({ email: "apprentice@axisline.test" }), redirect: "manual" });
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe(`http://127.0.0.1:3000/courses/stage-box-to-mix/bought?session=${session.id}`);
    const paid = await stripe.checkout.sessions.retrieve(session.id, { expand: ["payment_intent"] });
    expect(paid).toMatchObject({ status: "complete", payment_status: "paid", url: null, customer_details: { email: "apprentice@axisline.test" } });
    expect(paid.payment_intent).toMatchObject({ object: "payment_intent", status: "succeeded", amount: 10_000, amount_received: 10_000 });
  });

  it("a declined card changes nothing and sends no event; abandon goes back to cancel_url", async () => {
    const session = await newSession();
    expect((await control(`checkout/${session.id}/decline`)).body).toMatchObject({ notice: "Your card was declined." });
    expect(await (await fetch(session.url!)).text()).toContain("Your card was declined.");
    expect((await control(`checkout/${session.id}/abandon`)).body).toMatchObject({ redirect: "http://127.0.0.1:3000/courses/stage-box-to-mix" });
    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({ status: "open", payment_status: "unpaid" });
    await fake.idle();
    expect(fake.events()).toHaveLength(0);
  });
});

describe("webhook events", () => {
  it("signs checkout.session.completed so constructEvent accepts it, and refuses it under another secret", async () => {
    const session = await newSession();
    await control(`checkout/${session.id}/pay`, { email: "a@axisline.test" });
    await until(() => receiver.hits.length === 1, 5000, "the completed event");
    const [hit] = receiver.hits;
    const event = Stripe.webhooks.constructEvent(hit.body, hit.signature!, SECRET, 300);
    expect(event).toMatchObject({ object: "event", type: "checkout.session.completed", livemode: false, pending_webhooks: 1, request: { id: null, idempotency_key: null }, api_version: "2026-10-28.endive", data: { object: { id: session.id, payment_status: "paid", metadata: { order: "ord_9" } } } });
    expect(event.id).toMatch(/^evt_/);
    expect(() => Stripe.webhooks.constructEvent(hit.body, hit.signature!, "whsec_some_other_secret_0123456789", 300)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    // The scheme by hand: v1 = hex HMAC-SHA256(secret, "<t>.<raw body>").
    const [, t, v1] = hit.signature!.match(/^t=(\d+),v1=([0-9a-f]{64})$/)!;
    expect(createHmac("sha256", SECRET).update(`${t}.${hit.body}`).digest("hex")).toBe(v1);
    expect(Math.abs(Number(t) - Date.now() / 1000)).toBeLessThan(5);
  });

  it("retries a delivery the app answered 500 with exponential backoff, then records the success", async () => {
    receiver.answerWith(500, 500, 503);
    const session = await newSession();
    await control(`checkout/${session.id}/pay`);
    await until(() => receiver.hits.length === 4, 10_000, "four attempts");
    const gaps = receiver.hits.slice(1).map((h, i) => h.at - receiver.hits[i].at);
    // BASE, 2 × BASE, 4 × BASE (timers fire no earlier than asked; allow 10 ms of clock rounding).
    expect(gaps[0]).toBeGreaterThanOrEqual(BASE_MS - 10);
    expect(gaps[1]).toBeGreaterThanOrEqual(2 * BASE_MS - 10);
    expect(gaps[2]).toBeGreaterThanOrEqual(4 * BASE_MS - 10);
    expect(new Set(receiver.hits.map((h) => h.eventId)).size).toBe(1);
    await fake.idle();
    const log = (await (await fetch(`${fake.url}/_fake/events?type=checkout.session.completed`)).json()) as { events: { deliveries: { attempt: number; outcome: string; status: number }[] }[] };
    expect(log.events[0].deliveries.map((d) => [d.attempt, d.outcome, d.status])).toEqual([[1, "failed", 500], [2, "failed", 500], [3, "failed", 503], [4, "delivered", 200]]);
  });

  it("retries an unreachable endpoint up to the attempt cap, then stops", async () => {
    await control("settings", { webhookUrl: "http://127.0.0.1:9/unreachable", maxAttempts: 3 });
    const session = await newSession();
    await control(`checkout/${session.id}/pay`);
    await fake.idle();
    const [record] = fake.events();
    expect(record.deliveries.map((d) => [d.attempt, d.outcome])).toEqual([[1, "failed"], [2, "failed"], [3, "failed"]]);
    expect(record.deliveries[0].error).toBeTruthy();
  });

  it("failNext loses the next attempt on the way (retried); enabled: false sends nothing (a lost webhook)", async () => {
    await control("settings", { failNext: 1 });
    const first = await newSession();
    await control(`checkout/${first.id}/pay`);
    await fake.idle();
    expect(fake.events()[0].deliveries.map((d) => [d.attempt, d.outcome])).toEqual([[1, "dropped"], [2, "delivered"]]);
    expect(receiver.hits).toHaveLength(1);
    expect((await control("settings", { enabled: false })).body).toMatchObject({ enabled: false, failNext: 0 });
    const second = await newSession();
    await control(`checkout/${second.id}/pay`);
    await fake.idle();
    expect(fake.events()[0]).toMatchObject({ event: { type: "checkout.session.completed", pending_webhooks: 0 }, deliveries: [{ outcome: "not_sent" }] });
    expect(receiver.hits).toHaveLength(1);
  });

  it("delayed methods: completed (unpaid), then async_payment_succeeded or async_payment_failed", async () => {
    const ok = await newSession();
    const bad = await newSession();
    await control(`checkout/${ok.id}/delay`);
    await control(`checkout/${bad.id}/delay-fail`);
    await until(() => receiver.hits.length === 4, 5000, "four events");
    const types = (id: string) => receiver.hits.filter((h) => JSON.parse(h.body).data.object.id === id).map((h) => [h.type, JSON.parse(h.body).data.object.payment_status]);
    expect(types(ok.id)).toEqual([["checkout.session.completed", "unpaid"], ["checkout.session.async_payment_succeeded", "paid"]]);
    expect(types(bad.id)).toEqual([["checkout.session.completed", "unpaid"], ["checkout.session.async_payment_failed", "unpaid"]]);
  });

  it("on the switch, delivers each event N times at once and out of order (async success before completed)", async () => {
    await control("settings", { duplicateDeliveries: 3, shuffle: true, shuffleWindowMs: 400 });
    const session = await newSession();
    await control(`checkout/${session.id}/delay`);
    await until(() => receiver.hits.length === 6, 5000, "six deliveries");
    expect(receiver.hits.slice(0, 3).map((h) => h.type)).toEqual(Array(3).fill("checkout.session.async_payment_succeeded"));
    expect(receiver.hits.slice(3).map((h) => h.type)).toEqual(Array(3).fill("checkout.session.completed"));
    // Copies of one event share its id and its bytes.
    expect(new Set(receiver.hits.map((h) => h.eventId)).size).toBe(2);
    expect(new Set(receiver.hits.slice(0, 3).map((h) => h.body)).size).toBe(1);
    // The copies are first attempts sent together (copy 1..3, attempt 1), not retries of one another.
    await fake.idle();
    for (const record of fake.events()) {
      expect(record.deliveries.map((d) => [d.copy, d.attempt, d.outcome]).sort()).toEqual([[1, 1, "delivered"], [2, 1, "delivered"], [3, 1, "delivered"]]);
    }
  });

  it("session expiry (the stand-in's clock passes expires_at) sends checkout.session.expired", async () => {
    const session = await newSession();
    await control("clock", { advanceSeconds: 86_400 });
    await until(() => receiver.hits.length === 1, 5000, "the expired event");
    expect(receiver.hits[0].type).toBe("checkout.session.expired");
    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({ status: "expired" });
  });

  it("a refund emits charge.refunded with the charge's refunded amount; no more than was paid", async () => {
    const session = await newSession();
    await control(`checkout/${session.id}/pay`);
    const intent = (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string;
    const refund = await stripe.refunds.create({ payment_intent: intent, amount: 5000 }, { idempotencyKey: "refund-1" });
    expect(refund).toMatchObject({ object: "refund", amount: 5000, status: "succeeded", payment_intent: intent });
    expect(await stripe.refunds.retrieve(refund.id)).toMatchObject({ id: refund.id, amount: 5000 });
    await until(() => receiver.hits.some((h) => h.type === "charge.refunded"), 5000, "charge.refunded");
    const event = Stripe.webhooks.constructEvent(receiver.hits.find((h) => h.type === "charge.refunded")!.body, receiver.hits.find((h) => h.type === "charge.refunded")!.signature!, SECRET);
    expect(event.data).toMatchObject({ object: { object: "charge", amount: 10_000, amount_refunded: 5000, refunded: false, payment_intent: intent }, previous_attributes: { amount_refunded: 0 } });
    expect(event.request).toEqual({ id: expect.stringMatching(/^req_/), idempotency_key: "refund-1" });
    const tooMuch = await stripe.refunds.create({ payment_intent: intent, amount: 5001 }).catch((e: unknown) => e);
    expect(tooMuch).toMatchObject({ statusCode: 400, code: "amount_too_large" });
    const rest = await stripe.refunds.create({ payment_intent: intent });
    expect(rest.amount).toBe(5000);
    const charge = await stripe.charges.retrieve((await stripe.paymentIntents.retrieve(intent)).latest_charge as string);
    expect(charge).toMatchObject({ amount_refunded: 10_000, refunded: true });
    await expect(stripe.refunds.create({ payment_intent: intent })).rejects.toMatchObject({ code: "charge_already_refunded" });
  });
});
