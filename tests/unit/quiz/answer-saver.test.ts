import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { AnswerSaver, type SaverSnapshot } from "@/components/quiz/answer-saver";

// The autosave engine against a scripted fetch: debouncing, increasing seq, backoff while the
// network is down, and the stop on 409. Timings are our own design choices (no outside source).

type Call = { url: string; body: { seq: number; answer: unknown } };

function scriptedFetch(replies: (call: Call) => Response | "network-error") {
  const calls: Call[] = [];
  const impl = vi.fn(async (url: string | URL | Request, init?: RequestInit) => {
    const call = { url: String(url), body: JSON.parse(String(init?.body)) };
    calls.push(call);
    const reply = replies(call);
    if (reply === "network-error") throw new TypeError("fetch failed");
    return reply;
  });
  return { calls, impl: impl as unknown as typeof fetch };
}

const json = (status: number, body: object) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });
const ack = (call: Call) => json(200, { ok: true, seq: call.body.seq, stale: false });

describe("AnswerSaver", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it("debounces quick changes into one PUT with the latest answer and a seq above the stored one", async () => {
    const { calls, impl } = scriptedFetch(ack);
    const statuses: SaverSnapshot["status"][] = [];
    const saver = new AnswerSaver({ attemptId: "a1", initialSeq: 7, fetchImpl: impl, onChange: (s) => statuses.push(s.status) });
    saver.change("q1", { kind: "numeric", value: 1 }, 500);
    saver.change("q1", { kind: "numeric", value: 12 }, 500);
    await vi.advanceTimersByTimeAsync(499);
    expect(calls).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(1);
    expect(calls).toHaveLength(1);
    expect(calls[0].url).toBe("/api/attempts/a1/answers/q1");
    expect(calls[0].body).toEqual({ seq: 9, answer: { kind: "numeric", value: 12 } });
    expect(saver.snapshot().status).toBe("saved");
    expect(statuses).toContain("saving");
  });

  it("keeps retrying with a doubling wait while the network is down, then saves", async () => {
    let down = 3;
    const { calls, impl } = scriptedFetch((call) => (down-- > 0 ? "network-error" : ack(call)));
    const saver = new AnswerSaver({ attemptId: "a1", initialSeq: 0, fetchImpl: impl, debounceMs: 100, baseRetryMs: 1000 });
    saver.change("q1", { kind: "single", optionId: "b" });
    await vi.advanceTimersByTimeAsync(100);
    expect(saver.snapshot()).toMatchObject({ status: "offline", retryInMs: 1000, unsavedQuestionIds: ["q1"] });
    await vi.advanceTimersByTimeAsync(1000);
    expect(saver.snapshot()).toMatchObject({ status: "offline", retryInMs: 2000 });
    await vi.advanceTimersByTimeAsync(2000);
    expect(saver.snapshot()).toMatchObject({ status: "offline", retryInMs: 4000 });
    await vi.advanceTimersByTimeAsync(4000);
    expect(saver.snapshot()).toMatchObject({ status: "saved", unsavedQuestionIds: [] });
    expect(calls.map((c) => c.body.seq)).toEqual([1, 1, 1, 1]); // the same change, never a new seq
  });

  it("a change made while offline is sent with its newer seq when the network comes back", async () => {
    let online = false;
    const { calls, impl } = scriptedFetch((call) => (online ? ack(call) : "network-error"));
    const saver = new AnswerSaver({ attemptId: "a1", initialSeq: 0, fetchImpl: impl, debounceMs: 50 });
    saver.change("q1", { kind: "single", optionId: "a" });
    await vi.advanceTimersByTimeAsync(50);
    saver.change("q1", { kind: "single", optionId: "c" });
    online = true;
    saver.retryNow(); // the browser's "online" event
    await vi.advanceTimersByTimeAsync(0);
    expect(calls.at(-1)!.body).toEqual({ seq: 2, answer: { kind: "single", optionId: "c" } });
    await vi.advanceTimersByTimeAsync(100);
    expect(saver.snapshot().status).toBe("saved");
  });

  it("stops for good on 409 and tells the player once", async () => {
    const { calls, impl } = scriptedFetch(() => json(409, { ok: false, code: "conflict", message: "Time is up." }));
    const closed = vi.fn();
    const saver = new AnswerSaver({ attemptId: "a1", initialSeq: 0, fetchImpl: impl, debounceMs: 10, onClosed: closed });
    saver.change("q1", { kind: "single", optionId: "a" });
    await vi.advanceTimersByTimeAsync(10);
    expect(closed).toHaveBeenCalledExactlyOnceWith("Time is up.");
    expect(saver.snapshot()).toMatchObject({ status: "closed", message: "Time is up." });
    saver.change("q2", { kind: "single", optionId: "a" });
    await vi.advanceTimersByTimeAsync(100);
    expect(calls).toHaveLength(1);
    await expect(saver.flush()).resolves.toBe(false);
  });

  it("flush sends pending changes at once and resolves when all are acknowledged", async () => {
    const { calls, impl } = scriptedFetch(ack);
    const saver = new AnswerSaver({ attemptId: "a1", initialSeq: 0, fetchImpl: impl, debounceMs: 10_000 });
    saver.change("q1", { kind: "single", optionId: "a" });
    saver.change("q2", { kind: "single", optionId: "b" });
    const flushed = saver.flush();
    await vi.advanceTimersByTimeAsync(0);
    await expect(flushed).resolves.toBe(true);
    expect(calls.map((c) => c.url).sort()).toEqual(["/api/attempts/a1/answers/q1", "/api/attempts/a1/answers/q2"]);
  });

  it("flush reports false while offline, and a refused answer is shown as not saved", async () => {
    const offline = new AnswerSaver({ attemptId: "a1", initialSeq: 0, fetchImpl: scriptedFetch(() => "network-error").impl });
    offline.change("q1", { kind: "single", optionId: "a" });
    const result = offline.flush();
    await vi.advanceTimersByTimeAsync(0);
    await expect(result).resolves.toBe(false);
    const refused = new AnswerSaver({ attemptId: "a1", initialSeq: 0, debounceMs: 1, fetchImpl: scriptedFetch(() => json(400, { message: "That answer does not fit the question." })).impl });
    refused.change("q1", { kind: "single", optionId: "a" });
    await vi.advanceTimersByTimeAsync(1);
    expect(refused.snapshot()).toMatchObject({ status: "failed", message: "That answer does not fit the question.", unsavedQuestionIds: ["q1"] });
  });

  it("a stale acknowledgement (the server holds a newer seq) still clears the change", async () => {
    const { impl } = scriptedFetch(() => json(200, { ok: true, seq: 40, stale: true }));
    const saver = new AnswerSaver({ attemptId: "a1", initialSeq: 0, fetchImpl: impl, debounceMs: 1 });
    saver.change("q1", { kind: "single", optionId: "a" });
    await vi.advanceTimersByTimeAsync(1);
    expect(saver.snapshot()).toMatchObject({ status: "saved", unsavedQuestionIds: [] });
  });
});
