import { createHmac } from "node:crypto";
import { describe, expect, it } from "vitest";
import { EnvError, LOCAL_PAYMENTS, parseEnv, paymentSettings } from "@/lib/env";
import { createPaymentsClient, verifyWebhook } from "@/lib/payments/stripe-client";

const good = {
  DATABASE_URL: "postgres://u:p@127.0.0.1:54329/axisline",
  NEXTAUTH_URL: "http://127.0.0.1:3000",
  NEXTAUTH_SECRET: "0123456789abcdef0123456789abcdef",
};
const realKeys = { STRIPE_SECRET_KEY: "sk_live_0123456789abcdef", STRIPE_WEBHOOK_SECRET: "whsec_0123456789abcdef0123" };

describe("payment settings", () => {
  it("local mode defaults to the stand-in on loopback", () => {
    expect(parseEnv(good)).toMatchObject(LOCAL_PAYMENTS);
  });
  it("local mode refuses a non-loopback service address and a live key", () => {
    expect(() => parseEnv({ ...good, STRIPE_API_URL: "https://api.payments.example" })).toThrow(/STRIPE_API_URL must be a loopback address/);
    expect(() => parseEnv({ ...good, STRIPE_SECRET_KEY: "sk_live_abc123" })).toThrow(/must not be a live key/);
  });
  // paymentSettings directly: parseEnv checks other hosted-mode variables too (uploads, certificates).
  it("hosted mode needs the real keys, not the stand-in's, and no plain-http address", () => {
    expect(() => paymentSettings("hosted", {})).toThrow(/STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET must be set/);
    expect(() => paymentSettings("hosted", { ...LOCAL_PAYMENTS, STRIPE_API_URL: undefined })).toThrow(EnvError);
    expect(() => paymentSettings("hosted", { ...realKeys, STRIPE_API_URL: "http://127.0.0.1:2610" })).toThrow(/must use https/);
    expect(paymentSettings("hosted", realKeys)).toEqual({ ...realKeys, STRIPE_API_URL: undefined });
  });
  it.each([
    [{ STRIPE_SECRET_KEY: "pk_test_abc" }, /STRIPE_SECRET_KEY must be a secret key/],
    [{ STRIPE_WEBHOOK_SECRET: "secret" }, /STRIPE_WEBHOOK_SECRET must be a webhook signing secret/],
    [{ STRIPE_API_URL: "not a url" }, /STRIPE_API_URL must be a URL/],
  ])("names the variable and the reason: %o", (override, message) => {
    expect(() => parseEnv({ ...good, ...override })).toThrow(message);
  });
  it("aims the SDK at STRIPE_API_URL's host, port and protocol", () => {
    const stripe = createPaymentsClient({ STRIPE_SECRET_KEY: "sk_test_x", STRIPE_API_URL: "http://127.0.0.1:2610" });
    // getApiField is the SDK's public accessor of its configured options.
    expect([stripe.getApiField("host"), String(stripe.getApiField("port")), stripe.getApiField("protocol")]).toEqual(["127.0.0.1", "2610", "http"]);
    const real = createPaymentsClient({ STRIPE_SECRET_KEY: "sk_test_x", STRIPE_API_URL: undefined });
    expect(real.getApiField("host")).toBe("api.stripe.com");
  });
});

// The signature scheme as the service documents it ("Verify webhook signatures manually",
// docs.stripe.com/webhooks): header `t=<unix seconds>,v1=<hex HMAC-SHA256(secret, "<t>.<raw body>")>`.
// Computed here with node:crypto, independently of the SDK the app verifies with.
const secret = "whsec_test_0123456789abcdef0123";
const sign = (body: string, t: number, key = secret) => `t=${t},v1=${createHmac("sha256", key).update(`${t}.${body}`).digest("hex")}`;
const body = JSON.stringify({ id: "evt_1", object: "event", type: "checkout.session.completed", data: { object: { id: "cs_1" } } });
const now = () => Math.floor(Date.now() / 1000);

describe("verifyWebhook", () => {
  it("accepts a body signed by the documented scheme and returns the event", () => {
    const result = verifyWebhook(body, sign(body, now()), secret);
    expect(result.ok && result.event.id).toBe("evt_1");
  });
  it.each([
    ["no header", () => verifyWebhook(body, null, secret)],
    ["a malformed header", () => verifyWebhook(body, "garbage", secret)],
    ["a tampered body", () => verifyWebhook(body.replace("cs_1", "cs_2"), sign(body, now()), secret)],
    ["the wrong secret", () => verifyWebhook(body, sign(body, now(), "whsec_other_0123456789abcdef"), secret)],
    ["a timestamp 301 s old (tolerance 300 s)", () => verifyWebhook(body, sign(body, now() - 301), secret)],
  ])("refuses %s as invalid_input without throwing", (_what, run) => {
    expect(run()).toMatchObject({ ok: false, code: "invalid_input" });
  });
  it("accepts a timestamp 290 s old", () => {
    expect(verifyWebhook(body, sign(body, now() - 290), secret).ok).toBe(true);
  });
});
