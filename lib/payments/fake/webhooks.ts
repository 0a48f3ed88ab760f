// Events and their delivery to the app's webhook endpoint, as the service documents them
// (docs.stripe.com/webhooks): a JSON event `{ id: "evt_…", object: "event", api_version, created,
// data: { object, previous_attributes? }, livemode, pending_webhooks, request: { id,
// idempotency_key }, type }` POSTed with `Stripe-Signature: t=<unix seconds>,v1=<hex
// HMAC-SHA256(endpoint secret, "<t>.<body>")>`; any answer but 2xx (or none) is retried later with
// exponential backoff. Test switches: each event delivered N times at once, events of a short
// window delivered out of order, the next n attempts lost, or no delivery at all.
import { createHmac } from "node:crypto";
import type { Delivery, EventRecord, Store, ApiObject } from "./store";
import { newId, type Clock } from "./wire";

export type WebhookSettings = {
  /** The app's endpoint; null: events are recorded, never sent. */
  url: string | null;
  secret: string;
  /** Attempts per copy of an event, the first included. */
  maxAttempts: number;
  /** Delay before retry k (k = 1, 2, …): retryBaseMs × 2^(k−1), at most an hour. */
  retryBaseMs: number;
  /** Copies of each event, sent concurrently (1: normal). */
  duplicateDeliveries: number;
  /** Out of order: events emitted within shuffleWindowMs are sent newest first, or in random order. */
  shuffle: false | "reverse" | "random";
  shuffleWindowMs: number;
  /** The next n attempts are lost on the way (never reach the app) and retried like failures. */
  failNext: number;
  /** false: events are recorded but nothing is sent (a lost webhook, for reconciliation tests). */
  enabled: boolean;
  timeoutMs: number;
};

export const DEFAULT_WEBHOOK_SETTINGS: Omit<WebhookSettings, "url" | "secret"> = {
  maxAttempts: 8,
  retryBaseMs: 5_000,
  duplicateDeliveries: 1,
  shuffle: false,
  shuffleWindowMs: 500,
  failNext: 0,
  enabled: true,
  timeoutMs: 10_000,
};

export type EventRequest = { id: string | null; idempotency_key: string | null };

/** The documented scheme, computed with node:crypto (the SDK's generateTestHeaderString does the same). */
export function signatureHeader(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

export class Webhooks {
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<Promise<void>>();
  private batch: EventRecord[] = [];
  private batchTimer: NodeJS.Timeout | null = null;
  private closed = false;

  constructor(
    private readonly store: Store,
    private readonly clock: Clock,
    public settings: WebhookSettings,
    private readonly apiVersion: () => string,
  ) {}

  /** Records an event about `object` (a snapshot of it now) and sends it. */
  emit(type: string, object: ApiObject, request: EventRequest = { id: null, idempotency_key: null }, previous?: Record<string, unknown>): EventRecord {
    const sending = this.settings.enabled && this.settings.url !== null;
    const event = {
      id: newId("evt"),
      object: "event",
      api_version: this.apiVersion(),
      created: this.clock.nowSeconds(),
      data: { object: structuredClone(object), ...(previous ? { previous_attributes: previous } : {}) },
      livemode: false,
      pending_webhooks: sending ? 1 : 0,
      request,
      type,
    };
    const record: EventRecord = { event, deliveries: [] };
    this.store.addEvent(record);
    if (!sending) {
      record.deliveries.push(this.note(0, 0, { outcome: "not_sent", error: this.settings.url ? "delivery switched off" : "no webhook URL" }));
    } else if (this.settings.shuffle) {
      this.batch.push(record);
      this.batchTimer ??= setTimeout(() => this.flushBatch(), this.settings.shuffleWindowMs);
    } else {
      this.dispatch(record);
    }
    return record;
  }

  /** Resolves when nothing is being sent or waiting for a retry or a shuffle window. */
  async idle(): Promise<void> {
    while (this.inFlight.size > 0 || this.timers.size > 0 || this.batchTimer) {
      await Promise.all([...this.inFlight]);
      await new Promise((r) => setTimeout(r, 10));
    }
  }

  pendingRetries(): number {
    return this.timers.size;
  }

  /** Drops waiting retries and the shuffle window; lets requests already sent finish. */
  async close(): Promise<void> {
    this.closed = true;
    this.cancelPending();
    await Promise.all([...this.inFlight]);
  }

  cancelPending(): void {
    for (const t of this.timers) clearTimeout(t);
    this.timers.clear();
    if (this.batchTimer) clearTimeout(this.batchTimer);
    this.batchTimer = null;
    this.batch = [];
  }

  private flushBatch(): void {
    this.batchTimer = null;
    const batch = this.batch;
    this.batch = [];
    const ordered = this.settings.shuffle === "random" ? shuffled(batch) : batch.reverse();
    for (const record of ordered) this.dispatch(record);
  }

  private dispatch(record: EventRecord): void {
    for (let copy = 1; copy <= this.settings.duplicateDeliveries; copy++) this.attempt(record, copy, 1);
  }

  private attempt(record: EventRecord, copy: number, attempt: number): void {
    if (this.closed) return;
    const sending = this.send(record, copy, attempt).finally(() => this.inFlight.delete(sending));
    this.inFlight.add(sending);
  }

  private async send(record: EventRecord, copy: number, attempt: number): Promise<void> {
    const started = Date.now();
    const payload = JSON.stringify(record.event, null, 2);
    let delivery: Delivery;
    if (this.settings.failNext > 0) {
      this.settings.failNext--;
      delivery = this.note(copy, attempt, { outcome: "dropped", error: "lost on the way (failNext switch)" });
    } else {
      delivery = await this.post(payload, copy, attempt, started);
    }
    record.deliveries.push(delivery);
    if (delivery.outcome === "delivered") record.event.pending_webhooks = 0;
    else if (attempt < this.settings.maxAttempts) this.retryLater(record, copy, attempt + 1);
    this.store.changed();
  }

  private async post(payload: string, copy: number, attempt: number, started: number): Promise<Delivery> {
    try {
      const response = await fetch(this.settings.url!, {
        method: "POST",
        headers: {
          "content-type": "application/json; charset=utf-8",
          "stripe-signature": signatureHeader(payload, this.settings.secret),
          "user-agent": "Stripe/1.0 (+https://stripe.com/docs/webhooks)",
        },
        body: payload,
        // A redirect is a failed delivery for the service too.
        redirect: "manual",
        signal: AbortSignal.timeout(this.settings.timeoutMs),
      });
      const text = (await response.text()).slice(0, 1000);
      const ok = response.status >= 200 && response.status < 300;
      return this.note(copy, attempt, { outcome: ok ? "delivered" : "failed", status: response.status, responseBody: text, durationMs: Date.now() - started });
    } catch (error) {
      return this.note(copy, attempt, { outcome: "failed", error: (error as Error).message, durationMs: Date.now() - started });
    }
  }

  private retryLater(record: EventRecord, copy: number, attempt: number): void {
    if (this.closed) return;
    const delay = Math.min(this.settings.retryBaseMs * 2 ** (attempt - 2), 3_600_000);
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      this.attempt(record, copy, attempt);
    }, delay);
    this.timers.add(timer);
  }

  private note(copy: number, attempt: number, d: Partial<Delivery> & Pick<Delivery, "outcome">): Delivery {
    return { copy, attempt, at: new Date().toISOString(), status: null, responseBody: null, error: null, durationMs: 0, ...d };
  }
}

function shuffled<T>(items: T[]): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(Math.random() * (i + 1));
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}
