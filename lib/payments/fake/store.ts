// The stand-in's state: the API objects exactly as it serves them, in memory, optionally kept in a
// JSON file (STRIPE_FAKE_DATA_FILE; the demo and `npm start` use .data/payments-fake.json) so a
// restart of the stand-in still knows the sessions the app's database refers to. Deliveries
// waiting for a retry are not resumed after a restart.
import { mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";

/** An API object as served (its fields are the service's; see objects.ts for each shape). */
export type ApiObject = { id: string; object: string; [field: string]: unknown };

export type StoredSession = {
  session: ApiObject & {
    created: number;
    status: "open" | "complete" | "expired";
    payment_status: "paid" | "unpaid" | "no_payment_required";
    expires_at: number;
    amount_total: number;
    currency: string;
    success_url: string | null;
    cancel_url: string | null;
    customer_email: string | null;
    payment_intent: string | null;
    url: string | null;
  };
  lineItems: ApiObject[];
  /** What the payment intent gets from payment_intent_data (metadata, description). */
  intentData: { metadata: Record<string, string>; description: string | null };
  /** The hosted page's last message (a declined card), shown until the next try. */
  notice: string | null;
};

export type Delivery = {
  copy: number;
  attempt: number;
  at: string;
  outcome: "delivered" | "failed" | "dropped" | "not_sent";
  status: number | null;
  responseBody: string | null;
  error: string | null;
  durationMs: number;
};

export type EventRecord = { event: ApiObject & { type: string; data: { object: ApiObject } }; deliveries: Delivery[] };

export type IdempotencyRecord = { method: string; path: string; params: string; status: number; body: string; requestId: string; createdAt: number };

export type FakeState = {
  products: Record<string, ApiObject>;
  prices: Record<string, ApiObject>;
  sessions: Record<string, StoredSession>;
  paymentIntents: Record<string, ApiObject>;
  charges: Record<string, ApiObject>;
  refunds: Record<string, ApiObject>;
  /** Oldest first; at most KEEP_EVENTS. */
  events: EventRecord[];
  /** By `<secret key>:<Idempotency-Key>`; kept 24 hours, as the service documents. */
  idempotency: Record<string, IdempotencyRecord>;
};

export const KEEP_EVENTS = 2000;

export function emptyState(): FakeState {
  return { products: {}, prices: {}, sessions: {}, paymentIntents: {}, charges: {}, refunds: {}, events: [], idempotency: {} };
}

/** Newest first, as the service lists. */
export function newestFirst<T>(items: Record<string, T>): T[] {
  return Object.values(items).reverse();
}

export class Store {
  state: FakeState;
  private saveTimer: NodeJS.Timeout | null = null;

  constructor(private readonly file: string | null) {
    this.state = file ? load(file) : emptyState();
  }

  /** Schedules a write of the file (at most one per 100 ms); no-op without a file. */
  changed(): void {
    if (!this.file || this.saveTimer) return;
    this.saveTimer = setTimeout(() => this.flush(), 100);
  }

  flush(): void {
    if (this.saveTimer) clearTimeout(this.saveTimer);
    this.saveTimer = null;
    if (!this.file) return;
    mkdirSync(dirname(this.file), { recursive: true });
    // Write then rename: a crash mid-write never leaves half a file.
    writeFileSync(`${this.file}.tmp`, JSON.stringify(this.state));
    renameSync(`${this.file}.tmp`, this.file);
  }

  reset(): void {
    this.state = emptyState();
    this.changed();
  }

  addEvent(record: EventRecord): void {
    this.state.events.push(record);
    if (this.state.events.length > KEEP_EVENTS) this.state.events.splice(0, this.state.events.length - KEEP_EVENTS);
    this.changed();
  }
}

function load(file: string): FakeState {
  try {
    return { ...emptyState(), ...(JSON.parse(readFileSync(file, "utf8")) as Partial<FakeState>) };
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return emptyState();
    throw new Error(`The payment stand-in cannot read its state file ${file}: ${(error as Error).message}`);
  }
}
