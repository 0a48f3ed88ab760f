// Next.js compresses every response on the fly (the `compression` middleware, gzip at zlib's
// default level), so each request for a statically generated lesson page gzips the same 115 KB
// again: about 2 ms of CPU on these 2-core machines, more than serving the page. This module
// answers a large string body from the encoded-body cache's gzip, compressed once, when the
// client accepts gzip. The middleware sees Content-Encoding already set and passes the bytes
// through ("already encoded"); streamed responses (dynamic pages, route handlers) never reach
// this path and are still compressed by the middleware as before.
import type { IncomingMessage, ServerResponse } from "node:http";
import { EncodedBodyCache, installEncodedBodyEnd, isLargeUtf8Body } from "./encoded-body-cache";

type End = (this: ServerResponse, ...args: unknown[]) => ServerResponse;
type Proto = { end: ServerResponse["end"] } & Record<symbol, unknown>;

const PATCHED = Symbol.for("axisline.precompressedEnd");
const OUTER = Symbol("axisline.outerEnd");

// Types worth compressing (what the middleware's `compressible` list says of our responses).
const COMPRESSIBLE = /^\s*(text\/|application\/(json|javascript|xml)|image\/svg\+xml)/i;

/**
 * Whether an Accept-Encoding header allows gzip (RFC 9110 §12.5.3): listed as "gzip" or its
 * alias "x-gzip" with q > 0, or not listed while "*" has q > 0. No header means no coding.
 */
export function acceptsGzip(header: string | string[] | undefined): boolean {
  if (header === undefined) return false;
  let gzipQ: number | undefined;
  let anyQ: number | undefined;
  for (const part of (Array.isArray(header) ? header.join(",") : header).split(",")) {
    const [name, ...params] = part.split(";").map((p) => p.trim().toLowerCase());
    const qParam = params.find((p) => p.startsWith("q="));
    const q = qParam === undefined ? 1 : Number(qParam.slice(2));
    if (!Number.isFinite(q)) continue;
    if (name === "gzip" || name === "x-gzip") gzipQ = Math.max(gzipQ ?? 0, q);
    else if (name === "*") anyQ = q;
  }
  return (gzipQ ?? anyQ ?? 0) > 0;
}

function addVary(res: ServerResponse, field: string) {
  const current = res.getHeader("vary");
  const list = (Array.isArray(current) ? current.join(",") : String(current ?? "")).split(",").map((v) => v.trim()).filter(Boolean);
  if (list.some((v) => v === "*" || v.toLowerCase() === field.toLowerCase())) return;
  res.setHeader("vary", [...list, field].join(", "));
}

/** Swaps a large string body for its cached gzip when this response may and the client wants it. */
function precompress(res: ServerResponse, args: unknown[], cache: EncodedBodyCache) {
  const [chunk, encoding] = args;
  if (!isLargeUtf8Body(chunk, encoding) || res.headersSent) return;
  const req = (res as ServerResponse & { req?: IncomingMessage }).req;
  if (!req || req.method === "HEAD" || res.statusCode === 204 || res.statusCode === 304) return;
  if (res.getHeader("content-encoding") !== undefined) return;
  if (/\bno-transform\b/i.test(String(res.getHeader("cache-control") ?? ""))) return;
  if (!COMPRESSIBLE.test(String(res.getHeader("content-type") ?? ""))) return;
  addVary(res, "Accept-Encoding");
  if (!acceptsGzip(req.headers["accept-encoding"])) return;
  const gzip = cache.gzip(chunk);
  res.setHeader("content-encoding", "gzip");
  res.setHeader("content-length", gzip.length);
  args[0] = gzip;
  if (typeof encoding === "string" || encoding === null) args[1] = undefined; // a Buffer takes no encoding
}

/**
 * Installs the encoded-body cache and, outside it, the gzip swap. `end` becomes an accessor on
 * the prototype: when a middleware replaces `res.end` on a response (as `compression` does), the
 * setter wraps the replacement, so the swap always runs first, before anything compresses.
 * Idempotent; returns the shared cache.
 */
export function installPrecompressedEnd(proto: Proto, cache = new EncodedBodyCache()): EncodedBodyCache {
  const existing = proto[PATCHED] as EncodedBodyCache | undefined;
  if (existing) return existing;
  const shared = installEncodedBodyEnd(proto, cache);
  const wrap = (inner: End): End =>
    function end(this: ServerResponse, ...args: unknown[]) {
      precompress(this, args, shared);
      return inner.apply(this, args);
    };
  const outerOfPrototype = wrap(proto.end as unknown as End);
  Object.defineProperty(proto, "end", {
    configurable: true,
    get(this: Record<symbol, unknown>) {
      return (this[OUTER] as End | undefined) ?? outerOfPrototype;
    },
    set(this: Record<symbol, unknown>, replacement: End) {
      this[OUTER] = wrap(replacement);
    },
  });
  proto[PATCHED] = shared;
  return shared;
}
