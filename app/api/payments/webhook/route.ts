// POST /api/payments/webhook: the payment service's signed events. The body is read raw (capped)
// because the signature covers the exact bytes; lib/server/payment-webhook.ts verifies, records
// each event once and fulfils idempotently. 400 for a bad signature (nothing changed), 503 when
// the work can't be done now (the service retries), 200 otherwise.
import { handleRoute } from "@/lib/server/unavailable";
import { respond } from "@/lib/server/http";
import { readRawBody, receiveWebhook } from "@/lib/server/payment-webhook";

export const POST = handleRoute(async (request: Request) => {
  const body = await readRawBody(request);
  if (!body.ok) return respond(body);
  return respond(await receiveWebhook(body.text, request.headers.get("stripe-signature")), { headers: { "cache-control": "no-store" } });
});
