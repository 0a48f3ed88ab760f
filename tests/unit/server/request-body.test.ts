// Body caps and prototype-key refusal (OWASP ASVS 5.0 V4 "API and Web Service": request size limits;
// OWASP Prototype Pollution Prevention Cheat Sheet for __proto__/constructor/prototype keys).
import { describe, expect, it } from "vitest";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";

const json = (body: string, headers: Record<string, string> = {}) =>
  new Request("http://127.0.0.1/x", { method: "POST", headers: { "content-type": "application/json", ...headers }, body });

function chunked(totalBytes: number) {
  let sent = 0;
  let pulls = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      pulls++;
      if (sent >= totalBytes) return controller.close();
      const n = Math.min(4096, totalBytes - sent);
      sent += n;
      controller.enqueue(new Uint8Array(n).fill(0x20));
    },
  });
  const request = new Request("http://127.0.0.1/x", { method: "POST", headers: { "content-type": "application/json" }, body: stream, duplex: "half" } as RequestInit);
  return { request, pulled: () => pulls };
}

describe("readBody", () => {
  it("reads a JSON object", async () => {
    expect(await readBody(json('{"email":"a@b.example"}'), BODY_LIMITS.accountForm)).toEqual({ ok: true, data: { email: "a@b.example" } });
  });

  it("answers 413 from Content-Length alone, before reading", async () => {
    const r = await readBody(json("{}", { "content-length": String(5 * 1024 * 1024) }), BODY_LIMITS.accountForm);
    expect(r).toMatchObject({ ok: false, code: "payload_too_large" });
  });

  it("stops reading a chunked body as soon as it passes the cap", async () => {
    const { request, pulled } = chunked(5 * 1024 * 1024);
    const r = await readBody(request, BODY_LIMITS.answer);
    expect(r).toMatchObject({ ok: false, code: "payload_too_large", message: expect.stringContaining("64 KB") });
    expect(pulled()).toBeLessThan(40); // 64 KB in 4 KB chunks, not 5 MB
  });

  it.each(['{"__proto__":{"admin":true}}', '{"a":{"constructor":{"prototype":{"x":1}}}}', '{"prototype":1}'])("refuses prototype keys: %s", async (body) => {
    expect(await readBody(json(body), BODY_LIMITS.answer)).toMatchObject({ ok: false, code: "invalid_input" });
  });

  it("refuses unreadable JSON with a sentence", async () => {
    expect(await readBody(json("{not json"), BODY_LIMITS.accountForm)).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/couldn't read/) });
  });

  it("reads a urlencoded form", async () => {
    const r = await readBody(new Request("http://127.0.0.1/x", { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body: "email=a%40b.example" }), BODY_LIMITS.accountForm);
    expect(r).toEqual({ ok: true, data: { email: "a@b.example" } });
  });

  it("a JSON array or scalar becomes an empty object for zod to refuse", async () => {
    expect(await readBody(json("[1,2]"), BODY_LIMITS.command)).toEqual({ ok: true, data: {} });
  });
});
