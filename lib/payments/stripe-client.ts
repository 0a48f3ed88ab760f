import "server-only";
import Stripe from "stripe";
import { env, type Env } from "@/lib/env";
import { fail, type Result } from "@/lib/server/errors";

// The one way the app reaches the payment service: the real `stripe` SDK. With STRIPE_API_URL set
// (SERVICES_MODE=local defaults it to the stand-in, scripts/fakes/payments.ts) the SDK sends every
// request to that origin through its documented host/port/protocol options; unset, to the hosted
// service. Nothing else in the app changes between the two (docs/decisions/006-payments-stand-in.md).

/** Seconds a signed webhook stays acceptable: the service's published default (5 minutes). */
export const WEBHOOK_TOLERANCE_SECONDS = 300;

type PaymentsEnv = Pick<Env, "STRIPE_SECRET_KEY" | "STRIPE_API_URL">;

/** A client for the given settings (tests aim one at a private stand-in); the app uses paymentsClient(). */
export function createPaymentsClient(settings: PaymentsEnv): Stripe {
  const target = settings.STRIPE_API_URL ? new URL(settings.STRIPE_API_URL) : null;
  return new Stripe(settings.STRIPE_SECRET_KEY, {
    appInfo: { name: "Axisline" },
    // POSTs are retried with the same Idempotency-Key the SDK generates, so a retry never charges twice.
    maxNetworkRetries: 2,
    timeout: 20_000,
    telemetry: false,
    ...(target
      ? {
          host: target.hostname,
          port: target.port || (target.protocol === "https:" ? 443 : 80),
          protocol: target.protocol === "https:" ? ("https" as const) : ("http" as const),
        }
      : {}),
  });
}

let client: Stripe | undefined;

/** The process's one Stripe instance, configured from lib/env.ts. */
export function paymentsClient(): Stripe {
  client ??= createPaymentsClient(env());
  return client;
}

export type VerifiedWebhook = Result<{ event: Stripe.Event }>;

/**
 * Checks a webhook's `Stripe-Signature` over the raw body (exactly the bytes received, before any
 * JSON parsing) with the SDK's constructEvent: HMAC-SHA256 with the endpoint secret, timestamp
 * within WEBHOOK_TOLERANCE_SECONDS. A missing, malformed, tampered, stale or wrongly signed
 * request is an expected refusal (`invalid_input`, 400), never a throw.
 */
export function verifyWebhook(
  rawBody: string,
  signatureHeader: string | null,
  secret: string = env().STRIPE_WEBHOOK_SECRET,
): VerifiedWebhook {
  if (!signatureHeader) return fail("invalid_input", { message: "The webhook has no Stripe-Signature header." });
  try {
    const event = Stripe.webhooks.constructEvent(rawBody, signatureHeader, secret, WEBHOOK_TOLERANCE_SECONDS);
    return { ok: true, event };
  } catch (error) {
    if (error instanceof Stripe.errors.StripeSignatureVerificationError) {
      return fail("invalid_input", { message: "The webhook's signature could not be verified." });
    }
    // A correctly signed body that is not JSON: refused the same way (the service never sends one).
    if (error instanceof SyntaxError) return fail("invalid_input", { message: "The webhook's body is not an event." });
    throw error;
  }
}
