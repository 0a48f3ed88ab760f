// Refunds (docs.stripe.com/api/refunds): create against a payment_intent or a charge, whole or
// partial, up to what is left unrefunded; they succeed at once and the charge's amount_refunded
// grows, announced by `charge.refunded` (data.object: the charge; previous_attributes: what changed).
import { refundObject } from "./objects";
import type { Params } from "./params";
import { newestFirst, type ApiObject, type Store } from "./store";
import { ApiError, invalidParam, noSuch, paginate, type Clock } from "./wire";
import type { EventRequest, Webhooks } from "./webhooks";

export type RefundDeps = { store: Store; clock: Clock; webhooks: Webhooks };

const REASONS = ["duplicate", "fraudulent", "requested_by_customer"];

/** "10.00 EUR" from 1000 minor units (two-decimal currencies; the stand-in's messages only). */
const money = (minor: number, currency: string) => `${(minor / 100).toFixed(2)} ${currency.toUpperCase()}`;

function chargeToRefund(deps: RefundDeps, params: Params): ApiObject {
  const intentId = params.string("payment_intent");
  const chargeId = params.string("charge");
  if (intentId && chargeId) throw new ApiError(400, "invalid_request_error", "You may only specify one of these parameters: charge, payment_intent.", undefined, "charge");
  if (chargeId) {
    const charge = deps.store.state.charges[chargeId];
    if (!charge) throw noSuch("charge", chargeId, "charge", 400);
    return charge;
  }
  if (!intentId) throw new ApiError(400, "invalid_request_error", "One of `charge` or `payment_intent` is required.", "parameter_missing");
  const intent = deps.store.state.paymentIntents[intentId];
  if (!intent) throw noSuch("payment_intent", intentId, "payment_intent", 400);
  const charge = intent.latest_charge ? deps.store.state.charges[intent.latest_charge as string] : undefined;
  if (!charge || intent.status !== "succeeded") {
    throw new ApiError(400, "invalid_request_error", `This PaymentIntent (${intentId}) does not have a successful charge to refund.`, "charge_not_refundable", "payment_intent");
  }
  return charge;
}

export function createRefund(deps: RefundDeps, params: Params, request: EventRequest): ApiObject {
  params.only(["payment_intent", "charge", "amount", "reason", "metadata"]);
  const charge = chargeToRefund(deps, params);
  if (charge.status !== "succeeded") throw new ApiError(400, "invalid_request_error", `Charge ${charge.id} has not succeeded, so it cannot be refunded.`, "charge_not_refundable", "charge");
  const left = (charge.amount as number) - (charge.amount_refunded as number);
  if (left <= 0) throw new ApiError(400, "invalid_request_error", `Charge ${charge.id} has already been refunded.`, "charge_already_refunded");
  const amount = params.int("amount", { min: 1 }) ?? left;
  if (amount > left) {
    throw new ApiError(400, "invalid_request_error", `Refund amount (${money(amount, charge.currency as string)}) is greater than unrefunded amount on charge (${money(left, charge.currency as string)})`, "amount_too_large", "amount");
  }
  const reason = params.string("reason") ?? null;
  if (reason !== null && !REASONS.includes(reason)) throw invalidParam("reason", `Invalid reason: must be one of ${REASONS.join(", ")}`);
  const refund = refundObject(charge, { amount, created: deps.clock.nowSeconds(), reason, metadata: params.metadata() ?? {} });
  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded = (charge.amount_refunded as number) + amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  deps.store.state.refunds[refund.id] = refund;
  deps.store.changed();
  deps.webhooks.emit("charge.refunded", charge, request, previous);
  return refund;
}

export function listRefunds(deps: RefundDeps, params: Params) {
  params.only(["limit", "starting_after", "ending_before", "payment_intent", "charge"]);
  const intent = params.string("payment_intent");
  const charge = params.string("charge");
  const matches = newestFirst(deps.store.state.refunds).filter((r) => (!intent || r.payment_intent === intent) && (!charge || r.charge === charge));
  return paginate(matches, "/v1/refunds", { limit: params.int("limit"), startingAfter: params.string("starting_after"), endingBefore: params.string("ending_before") }, "refund");
}

/** GET /v1/{refunds,payment_intents,charges}/:id (payment_intent may expand latest_charge). */
export function retrieveObject(store: Store, kind: "refunds" | "paymentIntents" | "charges", id: string, expand: string[]): ApiObject {
  const names = { refunds: "refund", paymentIntents: "payment_intent", charges: "charge" } as const;
  const found = store.state[kind][id];
  if (!found) throw noSuch(names[kind], id);
  const out = { ...found };
  for (const path of expand) {
    if (kind === "paymentIntents" && path === "latest_charge") out.latest_charge = found.latest_charge ? store.state.charges[found.latest_charge as string] : null;
    else throw new ApiError(400, "invalid_request_error", `This property cannot be expanded (${path}).`, undefined, "expand");
  }
  return out;
}
