// The bytes a patched ServerResponse.end sends must be exactly what Node sends for the string.
import { createServer, ServerResponse, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { EncodedBodyCache, installCachedByteLength, installEncodedBodyEnd, MIN_CACHED_LENGTH } from "@/lib/server/runtime/encoded-body-cache";

// A subclass, so the test patches its own prototype and not the process-wide one.
class PatchedResponse extends ServerResponse {}
const cache = installEncodedBodyEnd(PatchedResponse.prototype as never);

// Non-ASCII on purpose (degree sign, minus, Greek theta): UTF-8 needs 2–3 bytes for each.
const LARGE = `<p>θ = 90° gives −6 dB</p>`.repeat(Math.ceil((MIN_CACHED_LENGTH * 2) / 26));
const SMALL = "<p>short: 48 V ± 4 V</p>";

let server: Server;
let base = "";
beforeAll(async () => {
  server = createServer({ ServerResponse: PatchedResponse as typeof ServerResponse }, (req, res) => {
    const body = req.url === "/small" ? SMALL : LARGE;
    res.setHeader("content-type", "text/html; charset=utf-8");
    if (req.url === "/latin1") {
      const text = "caf\u00e9 ".repeat(MIN_CACHED_LENGTH);
      res.setHeader("content-length", Buffer.byteLength(text, "latin1"));
      res.end(text, "latin1");
      return;
    }
    res.setHeader("content-length", Buffer.byteLength(body));
    res.end(body, undefined as never, undefined as never); // the call shape Next.js uses
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe("installEncodedBodyEnd", () => {
  it("sends the UTF-8 bytes of a large string body, encoded once and then reused", async () => {
    const before = { hits: cache.hits, misses: cache.misses };
    for (let i = 0; i < 3; i++) {
      const res = await fetch(`${base}/large`);
      const bytes = Buffer.from(await res.arrayBuffer());
      expect(bytes.equals(Buffer.from(LARGE, "utf8"))).toBe(true);
      expect(Number(res.headers.get("content-length"))).toBe(bytes.length);
    }
    expect(cache.misses - before.misses).toBe(1);
    expect(cache.hits - before.hits).toBe(2);
  });

  it("leaves small bodies and other encodings to Node", async () => {
    const before = cache.hits + cache.misses;
    expect(await (await fetch(`${base}/small`)).text()).toBe(SMALL);
    const latin1 = Buffer.from(await (await fetch(`${base}/latin1`)).arrayBuffer());
    expect(latin1.equals(Buffer.from("caf\u00e9 ".repeat(MIN_CACHED_LENGTH), "latin1"))).toBe(true);
    expect(cache.hits + cache.misses).toBe(before);
  });

  it("is installed once however often the server starts", () => {
    expect(installEncodedBodyEnd(PatchedResponse.prototype as never)).toBe(cache);
  });
});

describe("EncodedBodyCache", () => {
  it("keeps at most its limit, dropping the least recently used", () => {
    const small = new EncodedBodyCache(2);
    const [a, b, c] = ["a", "b", "c"].map((x) => x.repeat(10));
    small.bytes(a);
    small.bytes(b);
    small.bytes(a); // a is now the most recent
    small.bytes(c); // drops b
    expect(small.size).toBe(2);
    small.bytes(a);
    expect(small.hits).toBe(2);
    small.bytes(b);
    expect(small.misses).toBe(4);
  });
});

describe("EncodedBodyCache fingerprints", () => {
  it("never confuses two bodies that share length, beginning and end", () => {
    const cache = new EncodedBodyCache();
    const head = "<!DOCTYPE html>".padEnd(200, "a");
    const one = `${head}X${head}`;
    const other = `${head}Y${head}`;
    expect(cache.bytes(one).toString("utf8")).toBe(one);
    expect(cache.bytes(other).toString("utf8")).toBe(other);
    expect(cache.bytes(one).toString("utf8")).toBe(one);
    expect(cache.misses).toBe(3);
  });

  it("finds the same text handed over as a new string object", () => {
    const cache = new EncodedBodyCache();
    const text = "°".repeat(MIN_CACHED_LENGTH);
    cache.bytes(text);
    cache.bytes([...text].join(""));
    expect(cache.hits).toBe(1);
  });
});

describe("installCachedByteLength", () => {
  // Its own object, so the process-wide Buffer.byteLength is left alone.
  const calls: unknown[] = [];
  const target = {
    byteLength: ((value: string, encoding?: BufferEncoding) => {
      calls.push(value);
      return Buffer.byteLength(value, encoding);
    }) as typeof Buffer.byteLength,
  };
  const cache = new EncodedBodyCache();
  installCachedByteLength(target as never, cache);

  it("answers a kept body from its bytes, the same count Node makes, lone surrogates included", () => {
    // A lone high surrogate is sent as U+FFFD (3 bytes in UTF-8, WHATWG Encoding §4.2 "encode").
    for (const body of [LARGE, `${LARGE}\ud800`, "°".repeat(MIN_CACHED_LENGTH)]) {
      cache.bytes(body);
      calls.length = 0;
      expect(target.byteLength(body)).toBe(Buffer.byteLength(body));
      expect(target.byteLength(body, "utf8")).toBe(Buffer.byteLength(body, "utf8"));
      expect(calls).toEqual([]);
    }
  });

  it("counts anything else the usual way and never adds it to the cache", () => {
    const before = cache.size;
    const unseen = "−".repeat(MIN_CACHED_LENGTH);
    calls.length = 0;
    expect(target.byteLength(unseen)).toBe(MIN_CACHED_LENGTH * 3);
    expect(target.byteLength(LARGE, "latin1")).toBe(LARGE.length);
    expect(target.byteLength(SMALL)).toBe(Buffer.byteLength(SMALL));
    expect(target.byteLength(Buffer.from("abc"))).toBe(3);
    expect(calls).toHaveLength(4);
    expect(cache.size).toBe(before);
  });
});
