// A private payment stand-in for the purchase and fulfilment tests: the real SDK aimed at it, and
// a small HTTP endpoint standing in for the app's webhook route that hands the raw body and the
// Stripe-Signature header to receiveWebhook exactly as app/api/payments/webhook/route.ts does.
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { and, eq } from "drizzle-orm";
import type Stripe from "stripe";
import { mailOutbox, orders } from "@/db/schema";
import { createPaymentsClient } from "@/lib/payments/stripe-client";
import { startPaymentsFake, type PaymentsFake } from "@/lib/payments/fake/server";
import { statusOf } from "@/lib/server/errors";
import { receiveWebhook } from "@/lib/server/payment-webhook";
import { testDb } from "./helpers";

export const KEY = "sk_test_axisline_local";
export const SECRET = "whsec_axisline_local_0123456789abcdef";

export type Harness = { fake: PaymentsFake; payments: Stripe; receiver: Server; receiverUrl: string; answers: number[]; close(): Promise<void> };

export async function startHarness(): Promise<Harness> {
  const answers: number[] = [];
  // Set once the stand-in is up (the receiver must exist first: the stand-in is given its URL).
  const client: { payments?: Stripe } = {};
  const receiver = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const raw = Buffer.concat(chunks).toString("utf8");
      receiveWebhook(raw, (req.headers["stripe-signature"] as string | undefined) ?? null, testDb(), client.payments!, SECRET).then(
        (result) => {
          const status = result.ok ? 200 : statusOf(result.code);
          answers.push(status);
          res.writeHead(status, { "content-type": "application/json" }).end(JSON.stringify(result));
        },
        (error: unknown) => {
          answers.push(500);
          res.writeHead(500).end(String(error));
        },
      );
    });
  });
  await new Promise<void>((resolve) => receiver.listen(0, "127.0.0.1", resolve));
  const receiverUrl = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/api/payments/webhook`;
  const fake = await startPaymentsFake({ port: 0, secretKey: KEY, webhookSecret: SECRET, webhookUrl: receiverUrl, asyncDelayMs: 200, webhooks: { retryBaseMs: 50, maxAttempts: 5 } });
  const payments = (client.payments = createPaymentsClient({ STRIPE_SECRET_KEY: KEY, STRIPE_API_URL: fake.url }));
  return {
    fake,
    payments,
    receiver,
    receiverUrl,
    answers,
    async close() {
      await fake.close();
      receiver.closeAllConnections();
      await new Promise<void>((resolve) => receiver.close(() => resolve()));
    },
  };
}

/** POST to the stand-in's test controls (/_fake/…). */
export async function control(fake: PaymentsFake, path: string, body: unknown = {}): Promise<unknown> {
  const res = await fetch(`${fake.url}/_fake/${path}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  if (!res.ok) throw new Error(`control ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}

/** Every Checkout Session the stand-in holds (the service's list endpoint, through the SDK). */
export async function sessionCount(payments: Stripe): Promise<number> {
  let n = 0;
  for await (const _s of payments.checkout.sessions.list({ limit: 100 })) n++;
  return n;
}

export async function orderRow(id: string) {
  const [row] = await testDb().select().from(orders).where(eq(orders.id, id));
  return row;
}

export async function receiptsTo(email: string): Promise<number> {
  return (await testDb().select({ id: mailOutbox.id }).from(mailOutbox).where(and(eq(mailOutbox.toAddress, email), eq(mailOutbox.template, "purchase_receipt")))).length;
}

export async function until<T>(probe: () => Promise<T | undefined | false>, what: string, timeoutMs = 10_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await probe();
    if (v !== undefined && v !== false) return v;
    if (Date.now() > end) throw new Error(`${what}: not within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

let nonces = 0;
/** A form nonce as the purchase pages render one. */
export function formNonce(): string {
  return `test-nonce-${Date.now().toString(36)}-${(nonces++).toString(36).padStart(4, "0")}`;
}
