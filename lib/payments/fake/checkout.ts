// Checkout Sessions (docs.stripe.com/api/checkout/sessions): create (mode=payment), retrieve,
// list, expire, and their line items. What happens on the hosted page is in outcomes.ts.
import { createPrice, MAX_UNIT_AMOUNT } from "./catalog";
import { lineItemObject, sessionObject } from "./objects";
import { Params } from "./params";
import { newestFirst, type ApiObject, type Store, type StoredSession } from "./store";
import { ApiError, invalidParam, missingParam, noSuch, paginate, type Clock } from "./wire";

export type CheckoutDeps = { store: Store; clock: Clock; pageUrl: (id: string) => string };

const CREATE_PARAMS = [
  "mode", "line_items", "metadata", "client_reference_id", "success_url", "cancel_url", "customer_email",
  "expires_at", "payment_method_types", "payment_intent_data", "locale", "submit_type", "ui_mode",
];
const PAYMENT_METHOD_TYPES = ["card", "us_bank_account", "sepa_debit", "bacs_debit", "acss_debit", "au_becs_debit", "link"];
// The service's limits (docs.stripe.com/api/checkout/sessions/create, expires_at): 30 min to 24 h.
const MIN_EXPIRY_S = 30 * 60;
const MAX_EXPIRY_S = 24 * 60 * 60;
// Smallest charge per currency, minor units (docs.stripe.com/currencies, "Minimum and maximum charge amounts"; from memory for these three).
const MINIMUM_CHARGE: Record<string, number> = { usd: 50, eur: 50, gbp: 30 };

function readUrl(params: Params, key: string, required: boolean): string | null {
  const value = required ? params.requiredString(key) : params.string(key);
  if (value === undefined || value === "") return null;
  // The template {CHECKOUT_SESSION_ID} is not URL-safe as written; test the URL with it filled in.
  const probe = value.replaceAll("{CHECKOUT_SESSION_ID}", "cs_test_probe");
  if (!URL.canParse(probe) || !/^https?:$/.test(new URL(probe).protocol)) {
    throw new ApiError(400, "invalid_request_error", "Not a valid URL", "url_invalid", params.name(key));
  }
  return value;
}

function readLineItems(deps: CheckoutDeps, params: Params): ApiObject[] {
  const items = params.objects("line_items");
  if (!items || items.length === 0) throw missingParam("line_items");
  if (items.length > 100) throw invalidParam("line_items", "A Checkout Session can have at most 100 line items.");
  return items.map((item) => {
    item.only(["price", "price_data", "quantity"]);
    const quantity = item.int("quantity", { min: 1, max: 999_999 });
    if (quantity === undefined) throw missingParam(item.name("quantity"));
    const priceData = item.object("price_data");
    const priceId = item.string("price");
    if (priceData && priceId) throw new ApiError(400, "invalid_request_error", "You may only specify one of these parameters: price, price_data.", undefined, item.name("price"));
    let price: ApiObject;
    if (priceData) price = createPrice(deps.store, deps.clock, priceData, { inline: true });
    else if (priceId) {
      const found = deps.store.state.prices[priceId];
      if (!found) throw noSuch("price", priceId, item.name("price"), 400);
      if (!found.active) throw invalidParam(item.name("price"), `The price specified (${priceId}) is inactive. This field only accepts active prices.`);
      price = found;
    } else throw missingParam(item.name("price"));
    const product = deps.store.state.products[price.product as string];
    return lineItemObject(price, (product?.name as string) ?? "", quantity);
  });
}

export function createSession(deps: CheckoutDeps, params: Params): StoredSession["session"] {
  params.only(CREATE_PARAMS);
  const mode = params.requiredString("mode");
  if (mode !== "payment") throw invalidParam("mode", `The local payment stand-in implements mode=payment only, not ${mode}.`);
  const uiMode = params.string("ui_mode") ?? "hosted";
  if (uiMode !== "hosted") throw invalidParam("ui_mode", "The local payment stand-in implements ui_mode=hosted only.");
  const successUrl = readUrl(params, "success_url", true);
  const cancelUrl = readUrl(params, "cancel_url", false);
  const lineItems = readLineItems(deps, params);
  const currency = lineItems[0].currency as string;
  if (lineItems.some((li) => li.currency !== currency)) throw invalidParam("line_items", "All line items must use the same currency.");
  const total = lineItems.reduce((sum, li) => sum + (li.amount_total as number), 0);
  if (total > MAX_UNIT_AMOUNT) throw new ApiError(400, "invalid_request_error", "The Checkout Session's total amount due must be no more than 99,999,999 in minor units.", "amount_too_large", "line_items");
  if (total > 0 && total < (MINIMUM_CHARGE[currency] ?? 0)) {
    throw new ApiError(400, "invalid_request_error", `The Checkout Session's total amount due must add up to at least ${MINIMUM_CHARGE[currency]} minor units of ${currency}.`, "amount_too_small", "line_items");
  }
  const now = deps.clock.nowSeconds();
  const expiresAt = params.int("expires_at") ?? now + MAX_EXPIRY_S;
  if (expiresAt < now + MIN_EXPIRY_S) throw invalidParam("expires_at", "The `expires_at` timestamp must be at least 30 minutes from Checkout Session creation.");
  if (expiresAt > now + MAX_EXPIRY_S) throw invalidParam("expires_at", "The `expires_at` timestamp must be less than 24 hours from Checkout Session creation.");
  const email = params.string("customer_email") ?? null;
  if (email !== null && !/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) throw invalidParam("customer_email", `Invalid email address: ${email}`);
  const reference = params.string("client_reference_id") ?? null;
  if (reference !== null && reference.length > 200) throw invalidParam("client_reference_id", "client_reference_id can be at most 200 characters.");
  const methods = params.strings("payment_method_types") ?? ["card"];
  for (const [i, m] of methods.entries()) {
    if (!PAYMENT_METHOD_TYPES.includes(m)) throw invalidParam(`payment_method_types[${i}]`, `The payment method type "${m}" is invalid or not implemented by the local payment stand-in.`);
  }
  const intentData = params.object("payment_intent_data")?.only(["metadata", "description"]);
  const session = sessionObject({
    created: now,
    expiresAt,
    currency,
    amountTotal: total,
    metadata: params.metadata() ?? {},
    clientReferenceId: reference,
    customerEmail: email,
    successUrl,
    cancelUrl,
    paymentMethodTypes: methods,
    locale: params.string("locale") ?? null,
    submitType: params.string("submit_type") ?? null,
    pageUrl: deps.pageUrl,
  });
  deps.store.state.sessions[session.id] = {
    session,
    lineItems,
    intentData: { metadata: intentData?.metadata() ?? {}, description: intentData?.string("description") ?? null },
    notice: null,
  };
  deps.store.changed();
  return session;
}

export function findSession(store: Store, id: string): StoredSession {
  const found = store.state.sessions[id];
  if (!found) throw noSuch("checkout.session", id, "session");
  return found;
}

/** A session as served, with `expand[]` applied: line_items, payment_intent (and their nested product). */
export function presentSession(store: Store, stored: StoredSession, expand: string[], prefix = ""): ApiObject {
  const out: ApiObject = { ...stored.session };
  for (const path of expand) {
    if (path === `${prefix}line_items`) {
      out.line_items = lineItemsList(store, stored, { limit: 10 }, []);
    } else if (path === `${prefix}payment_intent`) {
      out.payment_intent = stored.session.payment_intent ? store.state.paymentIntents[stored.session.payment_intent] : null;
    } else if (path === `${prefix}line_items.data.price.product`) {
      out.line_items = lineItemsList(store, stored, { limit: 10 }, ["data.price.product"]);
    } else {
      throw new ApiError(400, "invalid_request_error", `This property cannot be expanded (${path.slice(prefix.length)}).`, undefined, "expand");
    }
  }
  return out;
}

export function lineItemsList(store: Store, stored: StoredSession, page: { limit?: number; startingAfter?: string; endingBefore?: string }, expand: string[]) {
  for (const path of expand) {
    if (path !== "data.price.product") throw new ApiError(400, "invalid_request_error", `This property cannot be expanded (${path}).`, undefined, "expand");
  }
  const items = expand.length === 0 ? stored.lineItems : stored.lineItems.map((li) => {
    const price = li.price as ApiObject;
    return { ...li, price: { ...price, product: store.state.products[price.product as string] } };
  });
  return paginate(items, `/v1/checkout/sessions/${stored.session.id}/line_items`, page, "item");
}

export function listSessions(deps: CheckoutDeps, params: Params) {
  params.only(["limit", "starting_after", "ending_before", "status", "created", "payment_intent", "customer_details"]);
  const status = params.string("status");
  const created = params.object("created")?.only(["gt", "gte", "lt", "lte"]);
  const bounds = created ? { gt: created.int("gt"), gte: created.int("gte"), lt: created.int("lt"), lte: created.int("lte") } : {};
  const createdExact = created ? undefined : params.int("created");
  const intent = params.string("payment_intent");
  const email = params.object("customer_details")?.only(["email"]).requiredString("email");
  const matches = newestFirst(deps.store.state.sessions).filter(({ session: s }) =>
    (!status || s.status === status) &&
    (createdExact === undefined || s.created === createdExact) &&
    (bounds.gt === undefined || s.created > bounds.gt) && (bounds.gte === undefined || s.created >= bounds.gte) &&
    (bounds.lt === undefined || s.created < bounds.lt) && (bounds.lte === undefined || s.created <= bounds.lte) &&
    (!intent || s.payment_intent === intent) &&
    (!email || (s.customer_details as { email?: string } | null)?.email === email));
  const page = { limit: params.int("limit"), startingAfter: params.string("starting_after"), endingBefore: params.string("ending_before") };
  const list = paginate(matches.map((stored) => ({ id: stored.session.id, stored })), "/v1/checkout/sessions", page, "checkout.session");
  const expand = params.expand().map((p) => {
    if (!p.startsWith("data.")) throw new ApiError(400, "invalid_request_error", `This property cannot be expanded (${p}).`, undefined, "expand");
    return p;
  });
  return { ...list, data: list.data.map((x) => presentSession(deps.store, x.stored, expand, "data.")) };
}
