// What a buyer can do on the hosted checkout page, and what the service does then
// (docs.stripe.com/checkout/fulfillment, "Handle delayed notification payment methods"):
// - pay by card: session complete + paid, a succeeded PaymentIntent and charge → checkout.session.completed
// - card declined: nothing changes, the page says so, the buyer may try again (no event)
// - delayed method: session complete but unpaid (PaymentIntent processing) → checkout.session.completed,
//   then a little later paid → checkout.session.async_payment_succeeded, or still unpaid →
//   checkout.session.async_payment_failed
// - abandon: back to cancel_url; the session stays open until it expires → checkout.session.expired
import { chargeObject, customerDetails, paymentIntentObject } from "./objects";
import type { ApiObject, Store, StoredSession } from "./store";
import { ApiError, type Clock } from "./wire";
import type { Webhooks } from "./webhooks";

export type OutcomeDeps = { store: Store; clock: Clock; webhooks: Webhooks; asyncDelayMs: () => number };

export type Outcome = { session: StoredSession["session"]; redirect: string | null; notice: string | null };

export const DECLINE_MESSAGE = "Your card was declined.";

function requireOpen(stored: StoredSession): void {
  if (stored.session.status !== "open") {
    throw new ApiError(400, "invalid_request_error", `This Checkout Session is ${stored.session.status}, not open.`, "checkout_session_not_open", "session");
  }
}

/** success_url with the documented {CHECKOUT_SESSION_ID} template filled in. */
export function successRedirect(stored: StoredSession): string | null {
  return stored.session.success_url?.replaceAll("{CHECKOUT_SESSION_ID}", stored.session.id) ?? null;
}

export type PaymentKind = "card" | "delayed" | "delayed_fail";

export class Outcomes {
  private readonly timers = new Set<NodeJS.Timeout>();

  constructor(private readonly deps: OutcomeDeps) {}

  pay(stored: StoredSession, kind: PaymentKind, email: string | null): Outcome {
    requireOpen(stored);
    const { store, clock, webhooks } = this.deps;
    const s = stored.session;
    const buyer = s.customer_email ?? email;
    const method = kind === "card" ? "card" : (s.payment_method_types as string[]).find((m) => m !== "card") ?? "us_bank_account";
    s.status = "complete";
    s.url = null;
    s.customer_details = customerDetails(buyer ?? "buyer@example.test");
    stored.notice = null;
    if (s.amount_total > 0) {
      const intent = paymentIntentObject({ amount: s.amount_total, currency: s.currency, created: clock.nowSeconds(), metadata: stored.intentData.metadata, description: stored.intentData.description, method });
      const charge = chargeObject(intent, { created: clock.nowSeconds(), email: buyer, method });
      intent.latest_charge = charge.id;
      store.state.paymentIntents[intent.id] = intent;
      store.state.charges[charge.id] = charge;
      s.payment_intent = intent.id;
      if (kind === "card") {
        settle(intent, charge, true);
        s.payment_status = "paid";
      } else intent.processing = { type: method };
    }
    store.changed();
    webhooks.emit("checkout.session.completed", s);
    if (kind !== "card" && s.payment_intent) this.later(stored, kind === "delayed");
    return { session: s, redirect: successRedirect(stored), notice: null };
  }

  decline(stored: StoredSession): Outcome {
    requireOpen(stored);
    stored.notice = DECLINE_MESSAGE;
    this.deps.store.changed();
    return { session: stored.session, redirect: null, notice: DECLINE_MESSAGE };
  }

  abandon(stored: StoredSession): Outcome {
    requireOpen(stored);
    return { session: stored.session, redirect: stored.session.cancel_url, notice: null };
  }

  expire(stored: StoredSession): StoredSession["session"] {
    if (stored.session.status !== "open") {
      throw new ApiError(400, "invalid_request_error", `Only Checkout Sessions with a status in ["open"] can be expired. This session has status "${stored.session.status}".`, undefined, "session");
    }
    stored.session.status = "expired";
    stored.session.url = null;
    this.deps.store.changed();
    this.deps.webhooks.emit("checkout.session.expired", stored.session);
    return stored.session;
  }

  /** Expires every open session whose expires_at has passed (run every second by the server). */
  sweep(): void {
    const now = this.deps.clock.nowSeconds();
    for (const stored of Object.values(this.deps.store.state.sessions)) {
      if (stored.session.status === "open" && stored.session.expires_at <= now) this.expire(stored);
    }
  }

  close(): void {
    for (const t of this.timers) clearTimeout(t);
    this.timers.clear();
  }

  private later(stored: StoredSession, succeeds: boolean): void {
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      const { store, webhooks } = this.deps;
      const s = stored.session;
      const intent = store.state.paymentIntents[s.payment_intent!];
      const charge = store.state.charges[intent.latest_charge as string];
      settle(intent, charge, succeeds);
      if (succeeds) s.payment_status = "paid";
      store.changed();
      webhooks.emit(succeeds ? "checkout.session.async_payment_succeeded" : "checkout.session.async_payment_failed", s);
    }, this.deps.asyncDelayMs());
    this.timers.add(timer);
  }
}

function settle(intent: ApiObject, charge: ApiObject, succeeded: boolean): void {
  intent.processing = null;
  if (succeeded) {
    Object.assign(intent, { status: "succeeded", amount_received: intent.amount });
    Object.assign(charge, { status: "succeeded", paid: true, captured: true, amount_captured: charge.amount, outcome: { network_status: "approved_by_network", reason: null, risk_level: "normal", seller_message: "Payment complete.", type: "authorized" } });
  } else {
    const error = { code: "payment_method_provider_decline", message: "The payment could not be completed by the delayed payment method.", type: "invalid_request_error" };
    Object.assign(intent, { status: "requires_payment_method", last_payment_error: error });
    Object.assign(charge, { status: "failed", failure_code: error.code, failure_message: error.message });
  }
}
