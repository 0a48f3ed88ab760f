// The payment stand-in's API, driven by the real `stripe` SDK (23.1.0) aimed at a private stand-in
// on a free port, exactly as the app aims it (createPaymentsClient with STRIPE_API_URL). The
// expectations are the service's published behaviour (docs.stripe.com/api: Checkout Sessions,
// Errors, Idempotent requests, Pagination); the SDK's own error classes show the error bodies are
// the shapes it parses.
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { createPaymentsClient } from "@/lib/payments/stripe-client";
import { startPaymentsFake, type PaymentsFake } from "@/lib/payments/fake/server";

const KEY = "sk_test_payments_fake_suite";
let fake: PaymentsFake;
let stripe: Stripe;

beforeAll(async () => {
  fake = await startPaymentsFake({ port: 0, secretKey: KEY, webhookUrl: null });
  stripe = createPaymentsClient({ STRIPE_SECRET_KEY: KEY, STRIPE_API_URL: fake.url });
});
afterAll(() => fake?.close());
beforeEach(() => fetch(`${fake.url}/_fake/reset`, { method: "POST" }));

const seats = (quantity: number, unitAmount = 4900): Stripe.Checkout.SessionCreateParams => ({
  mode: "payment",
  line_items: [{ quantity, price_data: { currency: "eur", unit_amount: unitAmount, product_data: { name: "Seats: Stage box to mix" } } }],
  metadata: { order: "ord_1", kind: "school" },
  client_reference_id: "class-42",
  success_url: "http://127.0.0.1:3000/school/orders/done?session={CHECKOUT_SESSION_ID}",
  cancel_url: "http://127.0.0.1:3000/school/orders/cancelled",
  customer_email: "manager@school.test",
});

describe("Checkout Sessions", () => {
  it("creates an open session with its hosted page, and retrieves it with line items expanded", async () => {
    const created = await stripe.checkout.sessions.create(seats(6));
    expect(created).toMatchObject({ object: "checkout.session", status: "open", payment_status: "unpaid", mode: "payment", amount_total: 29_400, currency: "eur", client_reference_id: "class-42", payment_intent: null, metadata: { order: "ord_1", kind: "school" } });
    expect(created.id).toMatch(/^cs_test_/);
    expect(created.url).toBe(`${fake.url}/checkout/${created.id}`);
    // The template stays in success_url; the redirect fills it in (outcomes test below).
    expect(created.success_url).toContain("{CHECKOUT_SESSION_ID}");
    // Default expiry: 24 hours after creation.
    expect(created.expires_at - created.created).toBe(86_400);
    const again = await stripe.checkout.sessions.retrieve(created.id, { expand: ["line_items"] });
    expect(again.line_items?.data).toHaveLength(1);
    expect(again.line_items?.data[0]).toMatchObject({ object: "item", quantity: 6, amount_total: 29_400, amount_subtotal: 29_400, currency: "eur", description: "Seats: Stage box to mix", price: { unit_amount: 4900, type: "one_time" } });
    const items = await stripe.checkout.sessions.listLineItems(created.id, { limit: 5 });
    expect(items).toMatchObject({ object: "list", has_more: false, url: `/v1/checkout/sessions/${created.id}/line_items` });
  });

  it("sums line items of a created Product and Price and of inline price_data (unit amount × quantity)", async () => {
    const product = await stripe.products.create({ name: "Workbook", metadata: { sku: "wb" } });
    const price = await stripe.prices.create({ product: product.id, currency: "eur", unit_amount: 1250 });
    expect(await stripe.prices.retrieve(price.id)).toMatchObject({ id: price.id, product: product.id, unit_amount: 1250, active: true });
    const session = await stripe.checkout.sessions.create({ ...seats(3, 3300), line_items: [{ price: price.id, quantity: 4 }, ...seats(3, 3300).line_items!] });
    // 4 × 12.50 + 3 × 33.00 = 149.00 EUR
    expect(session.amount_total).toBe(4 * 1250 + 3 * 3300);
    const items = await stripe.checkout.sessions.listLineItems(session.id);
    expect(items.data.map((li) => [li.quantity, li.amount_total])).toEqual([[4, 5000], [3, 9900]]);
  });

  it("lists newest first with limit, starting_after, has_more and a status filter", async () => {
    const ids: string[] = [];
    for (let i = 0; i < 5; i++) ids.push((await stripe.checkout.sessions.create(seats(1 + i))).id);
    const first = await stripe.checkout.sessions.list({ limit: 2 });
    expect(first.data.map((s) => s.id)).toEqual([ids[4], ids[3]]);
    expect(first.has_more).toBe(true);
    const next = await stripe.checkout.sessions.list({ limit: 2, starting_after: ids[3] });
    expect(next.data.map((s) => s.id)).toEqual([ids[2], ids[1]]);
    const last = await stripe.checkout.sessions.list({ limit: 2, starting_after: ids[1] });
    expect(last.data.map((s) => s.id)).toEqual([ids[0]]);
    expect(last.has_more).toBe(false);
    await stripe.checkout.sessions.expire(ids[2]);
    expect((await stripe.checkout.sessions.list({ status: "expired" })).data.map((s) => s.id)).toEqual([ids[2]]);
    expect((await stripe.checkout.sessions.list({ status: "open" })).data).toHaveLength(4);
    // The SDK's auto-pagination walks every page through starting_after.
    const all: string[] = [];
    for await (const s of stripe.checkout.sessions.list({ limit: 2 })) all.push(s.id);
    expect(all).toEqual([...ids].reverse());
  });

  it("expires an open session once; a second expire is the service's invalid_request_error", async () => {
    const session = await stripe.checkout.sessions.create(seats(2));
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ status: "expired", url: null });
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 400 });
  });

  it.each([
    ["quantity 0", { line_items: [{ quantity: 0, price_data: { currency: "eur", unit_amount: 100, product_data: { name: "x" } } }] }, "parameter_invalid_integer", "line_items[0][quantity]"],
    ["no line items", { line_items: undefined }, "parameter_missing", "line_items"],
    ["an unknown price", { line_items: [{ quantity: 1, price: "price_nope" }] }, "resource_missing", "line_items[0][price]"],
    ["a total under the minimum charge", { line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 10, product_data: { name: "x" } } }] }, "amount_too_small", "line_items"],
    ["an unknown parameter", { shipping_options: [{ shipping_rate: "shr_1" }] }, "parameter_unknown", "shipping_options"],
    ["expiry in 10 minutes", { expires_at: Math.floor(Date.now() / 1000) + 600 }, "parameter_invalid_empty", "expires_at"],
  ])("refuses %s with a 400 naming the parameter", async (_what, override, code, param) => {
    const error = await stripe.checkout.sessions.create({ ...seats(1), ...override } as Stripe.Checkout.SessionCreateParams).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error).toMatchObject({ statusCode: 400, code, param });
  });
});

describe("state file", () => {
  it("a restarted stand-in with a data file still knows its sessions and idempotency keys", async () => {
    const file = join(mkdtempSync(join(tmpdir(), "payments-fake-")), "state.json");
    const first = await startPaymentsFake({ port: 0, secretKey: KEY, dataFile: file });
    const client = createPaymentsClient({ STRIPE_SECRET_KEY: KEY, STRIPE_API_URL: first.url });
    const created = await client.checkout.sessions.create(seats(3), { idempotencyKey: "kept" });
    await first.close();
    const second = await startPaymentsFake({ port: 0, secretKey: KEY, dataFile: file });
    try {
      const again = createPaymentsClient({ STRIPE_SECRET_KEY: KEY, STRIPE_API_URL: second.url });
      expect(await again.checkout.sessions.retrieve(created.id)).toMatchObject({ id: created.id, amount_total: 3 * 4900, status: "open" });
      expect((await again.checkout.sessions.create(seats(3), { idempotencyKey: "kept" })).id).toBe(created.id);
    } finally {
      await second.close();
    }
  });
});

describe("idempotency keys", () => {
  it("replays the stored answer for the same key and body, with Idempotent-Replayed", async () => {
    const first = await stripe.checkout.sessions.create(seats(5), { idempotencyKey: "order-77-attempt" });
    const second = await stripe.checkout.sessions.create(seats(5), { idempotencyKey: "order-77-attempt" });
    expect(second.id).toBe(first.id);
    expect(second.lastResponse.headers["idempotent-replayed"]).toBe("true");
    expect(first.lastResponse.headers["idempotent-replayed"]).toBeUndefined();
    expect((await stripe.checkout.sessions.list()).data).toHaveLength(1);
  });

  it("refuses the same key with another body: idempotency_error, nothing created", async () => {
    await stripe.checkout.sessions.create(seats(5), { idempotencyKey: "order-78" });
    const error = await stripe.checkout.sessions.create(seats(6), { idempotencyKey: "order-78" }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(error).toMatchObject({ statusCode: 400, type: "StripeIdempotencyError" });
    // The service's sentence, from memory (tests/sources.md, "Idempotent requests").
    expect((error as Error).message).toBe("Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than 'order-78' if you meant to execute a different request.");
    expect((await stripe.checkout.sessions.list()).data).toHaveLength(1);
  });
});

describe("errors on the wire", () => {
  // Status codes and body shape as the API reference's "Errors"; the sentences from memory (tests/sources.md).
  it("answers a wrong key with 401 and a missing one with the service's message", async () => {
    const wrong = createPaymentsClient({ STRIPE_SECRET_KEY: "sk_test_not_the_key_1234", STRIPE_API_URL: fake.url });
    const error = await wrong.checkout.sessions.list().catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(error).toMatchObject({ statusCode: 401 });
    expect((error as Error).message).toMatch(/^Invalid API Key provided: sk_test_\**1234$/);
    const bare = await fetch(`${fake.url}/v1/checkout/sessions`);
    expect(bare.status).toBe(401);
    expect(await bare.json()).toEqual({ error: { type: "invalid_request_error", message: expect.stringMatching(/^You did not provide an API key/) } });
  });

  it("answers an unknown path with a 404 invalid_request_error body", async () => {
    const res = await fetch(`${fake.url}/v1/subscriptions`, { headers: { authorization: `Bearer ${KEY}` } });
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual({ error: { type: "invalid_request_error", message: expect.stringMatching(/^Unrecognized request URL \(GET: \/v1\/subscriptions\)/) } });
    await expect(stripe.rawRequest("GET", "/v1/subscriptions")).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  it("answers a missing object with resource_missing and the service's sentence", async () => {
    const error = await stripe.checkout.sessions.retrieve("cs_test_missing").catch((e: unknown) => e);
    expect(error).toMatchObject({ statusCode: 404, code: "resource_missing", message: "No such checkout.session: 'cs_test_missing'" });
  });
});
