import "server-only";
// POST /api/payments/webhook: the payment service tells us a session completed, settled, failed,
// expired, or a charge was refunded. The signature is checked on the raw bytes first (nothing is
// read or written for a request that fails it); each event id is recorded once; the work itself
// is idempotent (lib/server/fulfilment.ts, refunds.ts), so a retried, duplicated or out-of-order
// delivery changes nothing twice. A 2xx tells the service to stop retrying, so we answer non-2xx
// only when the work could not be done now (the service unreachable, the database down).
import { eq, sql } from "drizzle-orm";
import type Stripe from "stripe";
import { db, type Queryable } from "@/db/client";
import { paymentEvents } from "@/db/schema";
import { paymentsClient, verifyWebhook } from "@/lib/payments/stripe-client";
import { fail, type Result } from "./errors";
import { fulfilCheckoutSession } from "./fulfilment";
import { paymentServiceFailure } from "./purchases";
import { completeRefunds } from "./refunds";

/** The most we read of a webhook body. The service's events are a few KB; this is generous. */
export const WEBHOOK_BODY_LIMIT = 256 * 1024;

/** The body exactly as received, as text, up to `maxBytes` (413 beyond it, checked while reading). */
export async function readRawBody(request: Request, maxBytes: number = WEBHOOK_BODY_LIMIT): Promise<Result<{ text: string }>> {
  const tooLarge = fail("payload_too_large", { message: `A webhook body may be at most ${maxBytes / 1024} KB.` });
  const declared = Number(request.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > maxBytes) return tooLarge;
  if (!request.body) return { ok: true, text: "" };
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      return tooLarge;
    }
    chunks.push(value);
  }
  return { ok: true, text: Buffer.concat(chunks).toString("utf8") };
}

export type WebhookAnswer = { received: true; duplicate: boolean; outcome: string };

const SESSION_EVENTS = new Set(["checkout.session.completed", "checkout.session.async_payment_succeeded", "checkout.session.async_payment_failed", "checkout.session.expired"]);

/** Verifies, records once and handles one delivery. */
export async function receiveWebhook(
  rawBody: string,
  signatureHeader: string | null,
  database: Queryable = db(),
  payments: Stripe = paymentsClient(),
  secret?: string,
): Promise<Result<WebhookAnswer>> {
  const verified = verifyWebhook(rawBody, signatureHeader, secret);
  if (!verified.ok) return verified;
  const { event } = verified;
  const object = event.data.object as { id?: string };
  const [fresh] = await database
    .insert(paymentEvents)
    .values({ eventId: event.id, type: event.type, objectId: typeof object.id === "string" ? object.id : null })
    .onConflictDoNothing()
    .returning({ eventId: paymentEvents.eventId });
  if (!fresh) {
    const [seen] = await database.select({ processedAt: paymentEvents.processedAt, result: paymentEvents.result }).from(paymentEvents).where(eq(paymentEvents.eventId, event.id));
    // Handled before: acknowledge. Recorded but not finished (a crash, a retry in flight): handle again, idempotently.
    if (seen?.processedAt) return { ok: true, received: true, duplicate: true, outcome: seen.result ?? "processed" };
  }
  let outcome: string;
  try {
    outcome = await handle(event, database, payments);
  } catch (error) {
    return paymentServiceFailure(error);
  }
  await database.update(paymentEvents).set({ processedAt: sql`now()`, result: outcome }).where(eq(paymentEvents.eventId, event.id));
  return { ok: true, received: true, duplicate: !fresh, outcome };
}

async function handle(event: Stripe.Event, database: Queryable, payments: Stripe): Promise<string> {
  if (SESSION_EVENTS.has(event.type)) {
    const session = event.data.object as Stripe.Checkout.Session;
    return fulfilCheckoutSession(session.id, { paymentFailed: event.type === "checkout.session.async_payment_failed" }, database, payments);
  }
  if (event.type === "charge.refunded") {
    const charge = event.data.object as Stripe.Charge;
    const intent = typeof charge.payment_intent === "string" ? charge.payment_intent : charge.payment_intent?.id;
    if (!intent) return "ignored: the charge names no payment";
    return `refunds completed: ${await completeRefunds(intent, database, payments)}`;
  }
  return `ignored: ${event.type}`;
}
