// The `/v1` API: authentication, idempotency keys, routing, and the error answers
// (docs.stripe.com/api: "Authentication", "Idempotent requests", "Errors").
import { createHash } from "node:crypto";
import { createPrice, createProduct, retrieve } from "./catalog";
import { createSession, findSession, lineItemsList, listSessions, presentSession, type CheckoutDeps } from "./checkout";
import { FormError, parseForm, type FormObject } from "./form";
import type { Outcomes } from "./outcomes";
import { Params } from "./params";
import { createRefund, listRefunds, retrieveObject } from "./refunds";
import { newestFirst } from "./store";
import { ApiError, newId, noSuch, paginate, unrecognizedUrl } from "./wire";
import type { EventRequest, Webhooks } from "./webhooks";

export type ApiContext = CheckoutDeps & { webhooks: Webhooks; outcomes: Outcomes; secretKey: string; apiVersion: string };
export type ApiRequest = { method: string; path: string; query: string; body: string; headers: Record<string, string | string[] | undefined> };
export type ApiResponse = { status: number; headers: Record<string, string>; body: string };

// Keys are kept 24 hours, as the service documents ("Idempotent requests").
const IDEMPOTENCY_TTL_S = 24 * 60 * 60;

type Handler = (ctx: ApiContext, p: Params, id: string, request: EventRequest) => unknown;

// [method, path pattern (":id" is one segment), handler]
const ROUTES: [string, string, Handler][] = [
  ["POST", "/v1/checkout/sessions", (c, p) => presentSession(c.store, findSession(c.store, createSession(c, p).id), p.expand())],
  ["GET", "/v1/checkout/sessions", (c, p) => listSessions(c, p)],
  ["GET", "/v1/checkout/sessions/:id", (c, p, id) => presentSession(c.store, findSession(c.store, id), p.only([]).expand())],
  ["GET", "/v1/checkout/sessions/:id/line_items", (c, p, id) =>
    lineItemsList(c.store, findSession(c.store, id), page(p.only(["limit", "starting_after", "ending_before"])), p.expand())],
  ["POST", "/v1/checkout/sessions/:id/expire", (c, p, id) => {
    p.only([]);
    const stored = findSession(c.store, id);
    c.outcomes.expire(stored);
    return presentSession(c.store, stored, p.expand());
  }],
  ["POST", "/v1/products", (c, p) => createProduct(c.store, c.clock, p)],
  ["GET", "/v1/products/:id", (c, p, id) => (p.only([]), retrieve(c.store, "products", id))],
  ["POST", "/v1/prices", (c, p) => createPrice(c.store, c.clock, p)],
  ["GET", "/v1/prices/:id", (c, p, id) => (p.only([]), retrieve(c.store, "prices", id))],
  ["POST", "/v1/refunds", (c, p, _id, request) => createRefund(c, p, request)],
  ["GET", "/v1/refunds", (c, p) => listRefunds(c, p)],
  ["GET", "/v1/refunds/:id", (c, p, id) => retrieveObject(c.store, "refunds", id, p.only([]).expand())],
  ["GET", "/v1/payment_intents/:id", (c, p, id) => retrieveObject(c.store, "paymentIntents", id, p.only([]).expand())],
  ["GET", "/v1/charges/:id", (c, p, id) => retrieveObject(c.store, "charges", id, p.only([]).expand())],
  ["GET", "/v1/events", (c, p) => {
    p.only(["limit", "starting_after", "ending_before", "type"]);
    const type = p.string("type");
    const events = newestFirst(Object.fromEntries(c.store.state.events.map((r) => [r.event.id, r.event]))).filter((e) => !type || e.type === type);
    return paginate(events, "/v1/events", page(p), "event");
  }],
  ["GET", "/v1/events/:id", (c, p, id) => {
    p.only([]);
    const found = c.store.state.events.find((r) => r.event.id === id);
    if (!found) throw noSuch("event", id);
    return found.event;
  }],
];

function page(p: Params) {
  return { limit: p.int("limit"), startingAfter: p.string("starting_after"), endingBefore: p.string("ending_before") };
}

function route(method: string, path: string): { handler: Handler; id: string } | null {
  for (const [m, pattern, handler] of ROUTES) {
    if (m !== method) continue;
    const re = new RegExp(`^${pattern.replace(":id", "([A-Za-z0-9_]+)")}$`);
    const match = path.match(re);
    if (match) return { handler, id: match[1] ?? "" };
  }
  return null;
}

const header = (h: ApiRequest["headers"], name: string) => {
  const v = h[name];
  return Array.isArray(v) ? v[0] : v;
};

function authenticate(ctx: ApiContext, req: ApiRequest): string {
  const auth = header(req.headers, "authorization") ?? "";
  let key = "";
  if (/^bearer /i.test(auth)) key = auth.slice(7).trim();
  // curl -u sk_test_…: (Basic, the key as the user name)
  else if (/^basic /i.test(auth)) key = Buffer.from(auth.slice(6), "base64").toString("utf8").split(":")[0];
  if (!key) {
    throw new ApiError(401, "invalid_request_error", "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY'). See https://stripe.com/docs/api#authentication for details, or we can help at https://support.stripe.com/.");
  }
  if (key !== ctx.secretKey) throw new ApiError(401, "invalid_request_error", `Invalid API Key provided: ${key.slice(0, 8)}${"*".repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`, "api_key_invalid");
  return key;
}

/** The parameters in a canonical order, so the same parameters in another order are "the same body". */
function canonical(form: FormObject): string {
  const sort = (v: unknown): unknown => (v && typeof v === "object" && !Array.isArray(v) ? Object.fromEntries(Object.keys(v).sort().map((k) => [k, sort((v as Record<string, unknown>)[k])])) : Array.isArray(v) ? v.map(sort) : v);
  return createHash("sha256").update(JSON.stringify(sort(form))).digest("hex");
}

export function handleApi(ctx: ApiContext, req: ApiRequest): ApiResponse {
  const requestId = newId("req", 14);
  const headers: Record<string, string> = { "content-type": "application/json", "request-id": requestId, "stripe-version": header(req.headers, "stripe-version") ?? ctx.apiVersion };
  const answer = (status: number, body: unknown): ApiResponse => ({ status, headers, body: JSON.stringify(body, null, 2) });
  try {
    const key = authenticate(ctx, req);
    let form: FormObject;
    try {
      form = parseForm(req.method === "GET" || req.method === "DELETE" ? req.query : req.body);
    } catch (error) {
      if (error instanceof FormError) throw new ApiError(400, "invalid_request_error", `Invalid parameter name: ${error.param}`, "parameter_unknown", error.param);
      throw error;
    }
    const found = route(req.method, req.path);
    if (!found) throw unrecognizedUrl(req.method, req.path);
    const idempotencyKey = req.method === "POST" ? header(req.headers, "idempotency-key") : undefined;
    if (idempotencyKey !== undefined) {
      headers["idempotency-key"] = idempotencyKey;
      const replay = replayed(ctx, key, idempotencyKey, req, form);
      if (replay) return { ...replay, headers: { ...headers, "idempotent-replayed": "true", "original-request": replay.headers["original-request"] } };
    }
    const result = found.handler(ctx, new Params(form), found.id, { id: requestId, idempotency_key: idempotencyKey ?? null });
    const response = answer(200, result);
    if (idempotencyKey !== undefined) {
      ctx.store.state.idempotency[`${key}:${idempotencyKey}`] = { method: req.method, path: req.path, params: canonical(form), status: 200, body: response.body, requestId, createdAt: ctx.clock.nowSeconds() };
      ctx.store.changed();
    }
    return response;
  } catch (error) {
    if (error instanceof ApiError) return answer(error.status, error.body());
    console.error("[payments] unexpected error", error);
    return answer(500, new ApiError(500, "api_error", "An unknown error occurred in the local payment stand-in.").body());
  }
}

/**
 * The stored answer for a key used before with the same endpoint and parameters; an
 * idempotency_error (400) for a key used with others. Only successful answers are stored: the
 * service saves no result for a request that failed validation.
 */
function replayed(ctx: ApiContext, apiKey: string, idemKey: string, req: ApiRequest, form: FormObject): ApiResponse | null {
  if (idemKey.length > 255) throw new ApiError(400, "invalid_request_error", "Idempotency-Key must be at most 255 characters long.", undefined, "Idempotency-Key");
  const slot = `${apiKey}:${idemKey}`;
  const saved = ctx.store.state.idempotency[slot];
  if (saved && saved.createdAt + IDEMPOTENCY_TTL_S < ctx.clock.nowSeconds()) delete ctx.store.state.idempotency[slot];
  else if (saved) {
    if (saved.method !== req.method || saved.path !== req.path) {
      throw new ApiError(400, "idempotency_error", `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${saved.method} ${saved.path}' vs '${req.method} ${req.path}'). Try using a key other than '${idemKey}' if you meant to execute a different request.`);
    }
    if (saved.params !== canonical(form)) {
      throw new ApiError(400, "idempotency_error", `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idemKey}' if you meant to execute a different request.`);
    }
    return { status: saved.status, headers: { "original-request": saved.requestId }, body: saved.body };
  }
  return null;
}
