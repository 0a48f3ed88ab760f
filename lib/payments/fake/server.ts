// The local payment stand-in: one node:http server on loopback speaking the payment service's wire
// protocol under /v1 (api.ts), serving the hosted checkout page under /checkout/<id> (page.ts), and
// test controls under /_fake/ (control.ts). The real `stripe` SDK is aimed at it with its
// host/port/protocol options. See docs/decisions/006-payments-stand-in.md.
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { isLoopbackHost } from "@/lib/env";
import { handleApi, type ApiContext } from "./api";
import { findSession } from "./checkout";
import { handleControl, OUTCOMES, runOutcome, type ControlDeps, type OutcomeName } from "./control";
import { Outcomes } from "./outcomes";
import { checkoutPage, messagePage, notFoundPage } from "./page";
import { Store, type EventRecord } from "./store";
import { ApiError, Clock, unrecognizedUrl } from "./wire";
import { DEFAULT_WEBHOOK_SETTINGS, Webhooks, type WebhookSettings } from "./webhooks";

export type PaymentsFakeOptions = {
  /** 0: a free port (a test's private stand-in). */
  port: number;
  host?: string;
  /** The app's webhook endpoint; null or unset: events are recorded, not sent. */
  webhookUrl?: string | null;
  secretKey?: string;
  webhookSecret?: string;
  /** Keep the state in this JSON file across restarts (null: memory only). */
  dataFile?: string | null;
  /** How long a delayed payment method takes to succeed or fail. */
  asyncDelayMs?: number;
  webhooks?: Partial<Omit<WebhookSettings, "url" | "secret">>;
  /** Written into events' api_version and answered in Stripe-Version (default: the SDK's pinned version). */
  apiVersion?: string;
};

export type PaymentsFake = {
  port: number;
  /** http://host:port: what STRIPE_API_URL points at. */
  url: string;
  store: Store;
  webhooks: Webhooks;
  events(): EventRecord[];
  /** Resolves once no webhook is in flight, waiting for a retry, or held for shuffling. */
  idle(): Promise<void>;
  close(): Promise<void>;
};

// The version stripe 23.1.0 pins (its ApiVersion); the stand-in's objects follow its reference.
export const DEFAULT_API_VERSION = "2026-10-28.endive";
const BODY_LIMIT = 1024 * 1024;

function readBody(req: IncomingMessage): Promise<string | null> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size <= BODY_LIMIT) chunks.push(c);
    });
    req.on("end", () => resolve(size > BODY_LIMIT ? null : Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function send(res: ServerResponse, status: number, body: string, headers: Record<string, string>): void {
  res.writeHead(status, { "cache-control": "no-store", ...headers });
  res.end(body);
}

const json = (res: ServerResponse, status: number, body: unknown) => send(res, status, JSON.stringify(body, null, 2), { "content-type": "application/json" });
const html = (res: ServerResponse, status: number, body: string) => send(res, status, body, { "content-type": "text/html; charset=utf-8" });

export async function startPaymentsFake(options: PaymentsFakeOptions): Promise<PaymentsFake> {
  const host = options.host ?? "127.0.0.1";
  const store = new Store(options.dataFile ?? null);
  const clock = new Clock();
  let base = "";
  const startSettings = (): WebhookSettings => ({
    ...DEFAULT_WEBHOOK_SETTINGS,
    ...options.webhooks,
    url: options.webhookUrl ?? null,
    secret: options.webhookSecret ?? "whsec_axisline_local_0123456789abcdef",
  });
  const apiVersion = options.apiVersion ?? DEFAULT_API_VERSION;
  const webhooks = new Webhooks(store, clock, startSettings(), () => apiVersion);
  const asyncDelay = { ms: options.asyncDelayMs ?? 4000 };
  const outcomes = new Outcomes({ store, clock, webhooks, asyncDelayMs: () => asyncDelay.ms });
  const api: ApiContext = { store, clock, webhooks, outcomes, secretKey: options.secretKey ?? "sk_test_axisline_local", apiVersion, pageUrl: (id) => `${base}/checkout/${id}` };
  const control: ControlDeps = {
    store, clock, webhooks, outcomes, asyncDelay,
    initial: () => {
      webhooks.cancelPending();
      outcomes.close();
      store.reset();
      clock.reset();
      webhooks.settings = startSettings();
      asyncDelay.ms = options.asyncDelayMs ?? 4000;
    },
  };

  const server = createServer((req, res) => {
    handle(req, res).catch((error) => {
      console.error("[payments] request failed", error);
      if (!res.headersSent) json(res, 500, new ApiError(500, "api_error", "An unknown error occurred in the local payment stand-in.").body());
    });
  });

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://stand-in");
    const method = req.method ?? "GET";
    const body = await readBody(req);
    if (body === null) return json(res, 413, new ApiError(413, "invalid_request_error", "The request body is larger than the stand-in accepts (1 MB).").body());
    if (url.pathname.startsWith("/v1/")) {
      const answer = handleApi(api, { method, path: url.pathname, query: url.search.slice(1), body, headers: req.headers });
      return send(res, answer.status, answer.body, answer.headers);
    }
    if (method === "GET" && url.pathname === "/health") return json(res, 200, { ok: true });
    // A browser asks for it on any page of this origin (the JSON ones too); nothing to show.
    if (method === "GET" && url.pathname === "/favicon.ico") return send(res, 204, "", {});
    if (url.pathname.startsWith("/checkout/")) return checkoutRoute(method, url.pathname, body, res);
    if (url.pathname.startsWith("/_fake/")) {
      if (!isLoopbackHost(req.socket.remoteAddress ?? "")) return json(res, 404, unrecognizedUrl(method, url.pathname).body());
      let payload: unknown = null;
      try {
        payload = body ? JSON.parse(body) : null;
      } catch {
        return json(res, 400, { error: { type: "invalid_request_error", message: "The control API takes a JSON body." } });
      }
      try {
        const answer = handleControl(control, method, url.pathname, url.searchParams, payload);
        return json(res, answer.status, answer.body);
      } catch (error) {
        if (error instanceof ApiError) return json(res, error.status, error.body());
        throw error;
      }
    }
    return json(res, 404, unrecognizedUrl(method, url.pathname).body());
  }

  function checkoutRoute(method: string, path: string, body: string, res: ServerResponse): void {
    const m = path.match(/^\/checkout\/([A-Za-z0-9_]+)(?:\/([a-z-]+))?$/);
    const stored = m ? store.state.sessions[m[1]] : undefined;
    if (!m || !stored) return html(res, 404, notFoundPage());
    if (method === "GET" && !m[2]) return html(res, 200, checkoutPage(stored));
    if (method !== "POST" || !m[2] || !(OUTCOMES as readonly string[]).includes(m[2])) return html(res, 404, notFoundPage());
    const email = new URLSearchParams(body).get("email")?.trim() || null;
    try {
      const outcome = runOutcome(outcomes, findSession(store, m[1]), m[2] as OutcomeName, email);
      // 303: the browser follows with a GET (to the shop, or back to this page to show the decline).
      return send(res, 303, "", { location: outcome.redirect ?? `/checkout/${m[1]}` });
    } catch (error) {
      if (error instanceof ApiError) return html(res, 409, messagePage("This checkout is closed", error.message));
      throw error;
    }
  }

  const port = await new Promise<number>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, host, () => resolve((server.address() as AddressInfo).port));
  });
  base = `http://${host.includes(":") ? `[${host}]` : host}:${port}`;
  const sweeper = setInterval(() => outcomes.sweep(), 1000);

  return {
    port,
    url: base,
    store,
    webhooks,
    events: () => [...store.state.events].reverse(),
    idle: () => webhooks.idle(),
    async close() {
      clearInterval(sweeper);
      outcomes.close();
      await webhooks.close();
      store.flush();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
