// A large string body goes out as its cached gzip to a client that accepts gzip, in front of
// the same `compression` middleware Next.js runs, and the bytes decompress to exactly the page.
import { createServer, request, ServerResponse, type IncomingHttpHeaders, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { gunzipSync } from "node:zlib";
import { createRequire } from "node:module";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { MIN_CACHED_LENGTH } from "@/lib/server/runtime/encoded-body-cache";
import { acceptsGzip, installPrecompressedEnd } from "@/lib/server/runtime/precompressed-end";

// A subclass, so the test patches its own prototype and not the process-wide one.
class PatchedResponse extends ServerResponse {}
const cache = installPrecompressedEnd(PatchedResponse.prototype as never);

// Non-ASCII on purpose (degree sign, minus, Greek theta): UTF-8 needs 2–3 bytes for each.
const PAGE = `<p>θ = 90° gives −6 dB</p>`.repeat(Math.ceil((MIN_CACHED_LENGTH * 2) / 26));
// Next.js's own copy of the `compression` middleware (it ships no types).
type Middleware = (req: unknown, res: unknown, next: () => void) => void;
const compress = (createRequire(import.meta.url)("next/dist/compiled/compression") as () => Middleware)();

let server: Server;
let port = 0;
beforeAll(async () => {
  server = createServer({ ServerResponse: PatchedResponse as typeof ServerResponse }, (req, res) => {
    if (!req.url?.startsWith("/bare")) compress(req, res, () => {}); // as Next's router server does
    res.setHeader("content-type", "text/html; charset=utf-8");
    res.setHeader("vary", "rsc");
    if (req.url?.endsWith("/stream")) {
      res.write(PAGE.slice(0, 1000));
      res.end(PAGE.slice(1000));
      return;
    }
    if (req.url?.endsWith("/no-transform")) res.setHeader("cache-control", "no-transform");
    res.setHeader("content-length", Buffer.byteLength(PAGE));
    res.end(PAGE, undefined as never, undefined as never); // the call shape Next.js uses
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  port = (server.address() as AddressInfo).port;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

/** The raw bytes on the wire (fetch would decompress them). */
function get(path: string, headers: Record<string, string> = {}, method = "GET") {
  return new Promise<{ headers: IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
    const req = request({ host: "127.0.0.1", port, path, method, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on("error", reject);
    req.end();
  });
}

const utf8 = Buffer.from(PAGE, "utf8");
const BROWSER = { "accept-encoding": "gzip, deflate, br, zstd" };

describe("installPrecompressedEnd", () => {
  it("sends a gzip-accepting client the page gzipped once, behind the compression middleware", async () => {
    const before = cache.gzipEncodes;
    for (let i = 0; i < 3; i++) {
      const { headers, body } = await get("/page", BROWSER);
      expect(headers["content-encoding"]).toBe("gzip");
      expect(Number(headers["content-length"])).toBe(body.length);
      expect(gunzipSync(body).equals(utf8)).toBe(true);
      expect(headers.vary).toBe("rsc, Accept-Encoding");
      expect(body.length).toBeLessThan(utf8.length / 10);
    }
    expect(cache.gzipEncodes - before).toBe(1);
  });

  it("works the same without the middleware", async () => {
    const { headers, body } = await get("/bare/page", BROWSER);
    expect(headers["content-encoding"]).toBe("gzip");
    expect(gunzipSync(body).equals(utf8)).toBe(true);
  });

  it("sends the plain UTF-8 bytes when gzip is not acceptable", async () => {
    for (const accept of [undefined, "identity", "br"]) {
      const { headers, body } = await get("/page", accept === undefined ? {} : { "accept-encoding": accept });
      expect(headers["content-encoding"]).toBeUndefined();
      expect(body.equals(utf8)).toBe(true);
      expect(Number(headers["content-length"])).toBe(utf8.length);
      expect(headers.vary).toContain("Accept-Encoding");
    }
    // "*" without gzip still lets the middleware pick deflate; the gzip swap stays out.
    const { headers } = await get("/page", { "accept-encoding": "gzip;q=0, *" });
    expect(headers["content-encoding"]).toBe("deflate");
  });

  it("leaves streamed bodies to the middleware, which still compresses them", async () => {
    const { headers, body } = await get("/stream", BROWSER);
    expect(headers["content-encoding"]).toBe("gzip");
    expect(headers["transfer-encoding"]).toBe("chunked");
    expect(gunzipSync(body).equals(utf8)).toBe(true);
  });

  it("honours Cache-Control: no-transform and HEAD (RFC 9110 §9.3.2: same headers, no body)", async () => {
    const noTransform = await get("/no-transform", BROWSER);
    expect(noTransform.headers["content-encoding"]).toBeUndefined();
    expect(noTransform.body.equals(utf8)).toBe(true);
    const head = await get("/bare/page", BROWSER, "HEAD");
    expect(head.body.length).toBe(0);
    expect(head.headers["content-encoding"]).toBeUndefined();
  });

  it("is installed once however often the server starts", () => {
    expect(installPrecompressedEnd(PatchedResponse.prototype as never)).toBe(cache);
  });
});

describe("acceptsGzip", () => {
  // The Accept-Encoding examples of RFC 9110 §12.5.3, and the q=0 rule stated there.
  it.each([
    ["compress, gzip", true],
    ["", false],
    ["*", true],
    ["compress;q=0.5, gzip;q=1.0", true],
    ["gzip;q=1.0, identity; q=0.5, *;q=0", true],
    ["gzip;q=0", false],
    ["gzip;q=0, *", false],
    ["br, *;q=0", false],
    ["x-gzip", true],
    ["GZIP", true],
  ])("%j → %s", (header, expected) => {
    expect(acceptsGzip(header)).toBe(expected);
  });

  it("treats a missing header as no coding at all", () => {
    expect(acceptsGzip(undefined)).toBe(false);
  });
});
