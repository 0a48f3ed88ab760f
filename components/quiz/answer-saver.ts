// The quiz player's autosave engine (no React): debounced PUTs with an increasing seq, retried
// with exponential backoff while the network is down, stopped for good by a 409 (submitted or
// out of time). The server ignores a seq that is not above the stored one, so a late retry can
// never overwrite a newer answer.

export type SaverStatus = "idle" | "saving" | "saved" | "offline" | "closed" | "failed";

export type SaverSnapshot = {
  status: SaverStatus;
  /** Questions whose latest change is not acknowledged yet. */
  unsavedQuestionIds: string[];
  /** The server's words for a refusal (409 or a rejected answer). */
  message: string | null;
  /** Milliseconds until the next retry while offline. */
  retryInMs: number | null;
};

export type SaverOptions = {
  attemptId: string;
  /** The highest seq the server has acknowledged so far (0 for a fresh attempt). */
  initialSeq: number;
  debounceMs?: number;
  baseRetryMs?: number;
  maxRetryMs?: number;
  fetchImpl?: typeof fetch;
  onChange?: (snapshot: SaverSnapshot) => void;
  /** Called once when the server refuses further saves (409). */
  onClosed?: (message: string) => void;
};

type Pending = { answer: unknown; seq: number };

const DEFAULT_DEBOUNCE_MS = 500;

export class AnswerSaver {
  private seq: number;
  private readonly pending = new Map<string, Pending>();
  private readonly timers = new Map<string, ReturnType<typeof setTimeout>>();
  private readonly inFlight = new Set<string>();
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private failures = 0;
  private savedOnce = false;
  private closed = false;
  private failedMessage: string | null = null;
  private closedMessage: string | null = null;
  private retryInMs: number | null = null;
  private waiters: (() => void)[] = [];
  private closedHandler: ((message: string) => void) | undefined;

  constructor(private readonly options: SaverOptions) {
    this.seq = options.initialSeq;
    this.closedHandler = options.onClosed;
  }

  /** Records a new answer; it is sent after `delayMs` of quiet (typing) or the default debounce. */
  change(questionId: string, answer: unknown, delayMs = this.options.debounceMs ?? DEFAULT_DEBOUNCE_MS): void {
    if (this.closed) return;
    this.seq += 1;
    this.pending.set(questionId, { answer, seq: this.seq });
    this.failedMessage = null;
    const timer = this.timers.get(questionId);
    if (timer) clearTimeout(timer);
    this.timers.set(
      questionId,
      setTimeout(() => {
        this.timers.delete(questionId);
        void this.send(questionId);
      }, delayMs),
    );
    this.emit();
  }

  /** Sends everything now; resolves true once every change is acknowledged, false if offline or closed. */
  flush(): Promise<boolean> {
    for (const [questionId, timer] of this.timers) {
      clearTimeout(timer);
      this.timers.delete(questionId);
    }
    if (this.retryTimer) this.retryNow();
    for (const questionId of this.pending.keys()) void this.send(questionId);
    return new Promise((resolve) => {
      const check = () => {
        if (this.closed || this.failedMessage !== null || this.retryInMs !== null) return resolve(false);
        if (this.pending.size === 0 && this.inFlight.size === 0) return resolve(true);
        this.waiters.push(check);
      };
      check();
    });
  }

  /** The browser says it is back online: retry at once instead of waiting out the backoff. */
  retryNow(): void {
    if (this.retryTimer) clearTimeout(this.retryTimer);
    this.retryTimer = null;
    this.retryInMs = null;
    for (const questionId of this.pending.keys()) void this.send(questionId);
    this.emit();
  }

  /** Replaces the 409 handler (the player's submit function changes as it re-renders). */
  setClosedHandler(handler: (message: string) => void): void {
    this.closedHandler = handler;
  }

  dispose(): void {
    for (const timer of this.timers.values()) clearTimeout(timer);
    if (this.retryTimer) clearTimeout(this.retryTimer);
    this.timers.clear();
  }

  snapshot(): SaverSnapshot {
    const unsavedQuestionIds = [...this.pending.keys()];
    let status: SaverStatus;
    if (this.closed) status = "closed";
    else if (this.failedMessage !== null) status = "failed";
    else if (this.retryInMs !== null) status = "offline";
    else if (unsavedQuestionIds.length > 0 || this.inFlight.size > 0) status = "saving";
    else status = this.savedOnce ? "saved" : "idle";
    return { status, unsavedQuestionIds, message: this.closedMessage ?? this.failedMessage, retryInMs: this.retryInMs };
  }

  private emit(): void {
    this.options.onChange?.(this.snapshot());
    const waiters = this.waiters;
    this.waiters = [];
    for (const waiter of waiters) waiter();
  }

  private async send(questionId: string): Promise<void> {
    if (this.closed || this.inFlight.has(questionId) || this.retryInMs !== null) return;
    const entry = this.pending.get(questionId);
    if (!entry) return;
    this.inFlight.add(questionId);
    this.emit();
    let response: Response;
    try {
      const fetcher = this.options.fetchImpl ?? fetch;
      response = await fetcher(`/api/attempts/${this.options.attemptId}/answers/${encodeURIComponent(questionId)}`, {
        method: "PUT",
        headers: { "content-type": "application/json" },
        credentials: "same-origin",
        body: JSON.stringify({ answer: entry.answer, seq: entry.seq }),
      });
    } catch {
      this.inFlight.delete(questionId);
      return this.networkFailed();
    }
    this.inFlight.delete(questionId);
    const body = (await response.json().catch(() => ({}))) as { seq?: number; message?: string };
    if (response.ok) {
      this.failures = 0;
      this.savedOnce = true;
      const acknowledged = Math.max(entry.seq, typeof body.seq === "number" ? body.seq : 0);
      const current = this.pending.get(questionId);
      if (current && current.seq <= acknowledged) this.pending.delete(questionId);
      // A newer change that arrived while this one was in flight, and whose timer already fired.
      if (this.pending.has(questionId) && !this.timers.has(questionId)) void this.send(questionId);
      return this.emit();
    }
    if (response.status === 409) {
      this.closed = true;
      this.closedMessage = body.message ?? "This attempt can no longer be changed.";
      this.emit();
      this.closedHandler?.(this.closedMessage);
      return;
    }
    if (response.status >= 500 || response.status === 408 || response.status === 429) return this.networkFailed();
    // 4xx: this answer is refused for good (signed out, not valid); keep it listed as unsaved.
    this.failedMessage = body.message ?? "An answer could not be saved. Reload the page to continue.";
    this.emit();
  }

  private networkFailed(): void {
    this.failures += 1;
    const base = this.options.baseRetryMs ?? 1_000;
    const delay = Math.min(this.options.maxRetryMs ?? 30_000, base * 2 ** (this.failures - 1));
    this.retryInMs = delay;
    if (this.retryTimer) clearTimeout(this.retryTimer);
    this.retryTimer = setTimeout(() => this.retryNow(), delay);
    this.emit();
  }
}
