// The stand-in's own test controls, under /_fake/ (answered to loopback peers only):
//   GET  /_fake/events[?type=…&object=<id>]   events, newest first, each with its deliveries and the app's answers
//   GET  /_fake/settings · POST /_fake/settings {duplicateDeliveries, shuffle, shuffleWindowMs, failNext,
//        enabled, retryBaseMs, maxAttempts, webhookUrl, asyncDelayMs}   (any subset; answers the settings)
//   POST /_fake/checkout/<id>/{pay,decline,delay,delay-fail,abandon} {email?}   what the page's buttons do
//   POST /_fake/clock {advanceSeconds}   moves the stand-in's clock (then expires what is due)
//   POST /_fake/reset   forgets every object and event, back to the start settings
import { z } from "zod";
import { findSession } from "./checkout";
import type { Outcome, Outcomes, PaymentKind } from "./outcomes";
import type { Store, StoredSession } from "./store";
import type { Clock } from "./wire";
import type { WebhookSettings, Webhooks } from "./webhooks";

export type ControlDeps = { store: Store; clock: Clock; webhooks: Webhooks; outcomes: Outcomes; asyncDelay: { ms: number }; initial: () => void };
export type ControlAnswer = { status: number; body: unknown };

const SettingsSchema = z
  .object({
    duplicateDeliveries: z.number().int().min(1).max(50),
    shuffle: z.union([z.literal(false), z.literal(true), z.literal("reverse"), z.literal("random")]),
    shuffleWindowMs: z.number().int().min(0).max(60_000),
    failNext: z.number().int().min(0).max(1000),
    enabled: z.boolean(),
    retryBaseMs: z.number().int().min(1).max(3_600_000),
    maxAttempts: z.number().int().min(1).max(50),
    webhookUrl: z.string().url().nullable(),
    asyncDelayMs: z.number().int().min(0).max(600_000),
  })
  .partial()
  .strict();

export const OUTCOMES = ["pay", "decline", "delay", "delay-fail", "abandon"] as const;
export type OutcomeName = (typeof OUTCOMES)[number];

const KINDS: Record<string, PaymentKind> = { pay: "card", delay: "delayed", "delay-fail": "delayed_fail" };

/** Runs one of the hosted page's outcomes (shared by the page's form posts and the JSON control). */
export function runOutcome(outcomes: Outcomes, stored: StoredSession, name: OutcomeName, email: string | null): Outcome {
  if (name === "decline") return outcomes.decline(stored);
  if (name === "abandon") return outcomes.abandon(stored);
  return outcomes.pay(stored, KINDS[name], email);
}

export function settingsView(webhooks: Webhooks, asyncDelay: { ms: number }) {
  const { secret: _secret, url, ...rest } = webhooks.settings;
  return { ...rest, webhookUrl: url, asyncDelayMs: asyncDelay.ms, pendingRetries: webhooks.pendingRetries() };
}

function applySettings(deps: ControlDeps, body: unknown): ControlAnswer {
  const parsed = SettingsSchema.safeParse(body);
  if (!parsed.success) return { status: 400, body: { error: { type: "invalid_request_error", message: parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ") } } };
  const { webhookUrl, asyncDelayMs, shuffle, ...rest } = parsed.data;
  const next: WebhookSettings = { ...deps.webhooks.settings, ...rest };
  if (shuffle !== undefined) next.shuffle = shuffle === true ? "reverse" : shuffle;
  if (webhookUrl !== undefined) next.url = webhookUrl;
  deps.webhooks.settings = next;
  if (asyncDelayMs !== undefined) deps.asyncDelay.ms = asyncDelayMs;
  return { status: 200, body: settingsView(deps.webhooks, deps.asyncDelay) };
}

function listEvents(deps: ControlDeps, query: URLSearchParams): ControlAnswer {
  const type = query.get("type");
  const object = query.get("object");
  const events = [...deps.store.state.events]
    .reverse()
    .filter((r) => (!type || r.event.type === type) && (!object || r.event.data.object.id === object))
    .map((r) => ({ id: r.event.id, type: r.event.type, created: r.event.created, objectId: r.event.data.object.id, deliveries: r.deliveries, event: r.event }));
  return { status: 200, body: { events, pendingRetries: deps.webhooks.pendingRetries() } };
}

export function handleControl(deps: ControlDeps, method: string, path: string, query: URLSearchParams, body: unknown): ControlAnswer {
  if (method === "GET" && path === "/_fake/events") return listEvents(deps, query);
  if (method === "GET" && path === "/_fake/settings") return { status: 200, body: settingsView(deps.webhooks, deps.asyncDelay) };
  if (method === "POST" && path === "/_fake/settings") return applySettings(deps, body);
  if (method === "POST" && path === "/_fake/reset") {
    deps.initial();
    return { status: 200, body: { reset: true } };
  }
  if (method === "POST" && path === "/_fake/clock") {
    const parsed = z.object({ advanceSeconds: z.number().int().min(0).max(366 * 86_400) }).strict().safeParse(body);
    if (!parsed.success) return { status: 400, body: { error: { type: "invalid_request_error", message: "Send {advanceSeconds: <whole seconds ≥ 0>}." } } };
    deps.clock.advance(parsed.data.advanceSeconds);
    deps.outcomes.sweep();
    return { status: 200, body: { now: deps.clock.nowSeconds() } };
  }
  const outcome = path.match(/^\/_fake\/checkout\/([A-Za-z0-9_]+)\/([a-z-]+)$/);
  if (method === "POST" && outcome && (OUTCOMES as readonly string[]).includes(outcome[2])) {
    const email = z.object({ email: z.string().email().optional() }).safeParse(body ?? {});
    const stored = findSession(deps.store, outcome[1]);
    const result = runOutcome(deps.outcomes, stored, outcome[2] as OutcomeName, email.success ? (email.data.email ?? null) : null);
    return { status: 200, body: result };
  }
  return { status: 404, body: { error: { type: "invalid_request_error", message: `Unrecognized control URL (${method}: ${path}).` } } };
}
