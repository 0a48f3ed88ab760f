// Large response bodies written as JavaScript strings go through Node's string write path,
// which on these 2-core machines costs about 1 ms per 120 KB page, several times the cost of
// writing the same bytes from a Buffer (measured: a bare node:http server answering a 122 KB
// lesson page as a string did 833 req/s, as a Buffer 2,775 req/s). Next.js answers every
// statically generated page by `res.end(html)` with the cached page as a string, so the
// per-request cost grows with the page. This module encodes such a body once and keeps the
// bytes, keyed by the string itself: the cached page is the same string on every request.
// Only strings over a size floor are kept, in a small LRU, so memory stays bounded.
import type { ServerResponse } from "node:http";
import { gzipSync } from "node:zlib";

/** Bodies below this many UTF-16 code units go through Node's own path: encoding them is cheap. */
export const MIN_CACHED_LENGTH = 16 * 1024;
/** Distinct large bodies kept (a lesson page is ~120 KB, so this is a few MB at most). */
export const MAX_ENTRIES = 256;

type CacheEntry = { body: string; bytes: Buffer; gzip?: Buffer };

export class EncodedBodyCache {
  // Keyed by a cheap fingerprint, not by the string itself: a Map keyed by a 115 KB string would
  // hash all of it whenever the caller hands over a new string object with the same text. A hit
  // is confirmed by comparing the whole text (native and fast), so two bodies with one
  // fingerprint can never be confused.
  private readonly entries = new Map<string, CacheEntry>();
  hits = 0;
  misses = 0;
  gzipEncodes = 0;

  constructor(private readonly maxEntries = MAX_ENTRIES) {}

  private static fingerprint(body: string): string {
    return `${body.length}:${body.slice(0, 96)}:${body.slice(-96)}`;
  }

  private entry(body: string): CacheEntry {
    const key = EncodedBodyCache.fingerprint(body);
    const found = this.entries.get(key);
    if (found && found.body === body) {
      this.hits++;
      // Map keeps insertion order: re-inserting makes this the most recent entry.
      this.entries.delete(key);
      this.entries.set(key, found);
      return found;
    }
    this.misses++;
    const entry: CacheEntry = { body, bytes: Buffer.from(body, "utf8") };
    if (found) this.entries.delete(key);
    else if (this.entries.size >= this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
    this.entries.set(key, entry);
    return entry;
  }

  /** The cached bytes of `body` if it is already kept; never adds an entry. */
  peek(body: string): Buffer | undefined {
    const found = this.entries.get(EncodedBodyCache.fingerprint(body));
    return found && found.body === body ? found.bytes : undefined;
  }

  /** The UTF-8 bytes of `body`, encoded once and reused while it stays among the recent ones. */
  bytes(body: string): Buffer {
    return this.entry(body).bytes;
  }

  /**
   * The gzip of those bytes (RFC 1952), compressed once per entry at zlib's default level, the
   * level Next.js's own compression uses, so a body seen only once costs what it cost before.
   */
  gzip(body: string): Buffer {
    const entry = this.entry(body);
    if (!entry.gzip) {
      this.gzipEncodes++;
      entry.gzip = gzipSync(entry.bytes);
    }
    return entry.gzip;
  }

  get size(): number {
    return this.entries.size;
  }
}

type End = ServerResponse["end"];

/** end(chunk, encoding) with a string over the floor in UTF-8, the only calls worth caching. */
export function isLargeUtf8Body(chunk: unknown, encoding: unknown): chunk is string {
  // Callers (Next.js among them) pass end(chunk, undefined, undefined): undefined means utf8.
  const utf8 = encoding === undefined || encoding === null || typeof encoding === "function" || encoding === "utf8" || encoding === "utf-8";
  return typeof chunk === "string" && chunk.length >= MIN_CACHED_LENGTH && utf8;
}
const PATCHED = Symbol.for("axisline.encodedBodyEnd");

/**
 * Makes `ServerResponse.prototype.end(string)` send cached bytes for large UTF-8 bodies. The
 * bytes are exactly those Node would have sent (the same UTF-8 encoding), so Content-Length,
 * already set by the caller from Buffer.byteLength, still matches. Any other call (a Buffer,
 * another encoding, a small string) is passed through untouched. Idempotent.
 */
export function installEncodedBodyEnd(proto: { end: End } & Record<symbol, unknown>, cache = new EncodedBodyCache()): EncodedBodyCache {
  const existing = proto[PATCHED] as EncodedBodyCache | undefined;
  if (existing) return existing;
  const original = proto.end;
  const end = function (this: ServerResponse, ...args: unknown[]) {
    const [chunk, second] = args;
    if (isLargeUtf8Body(chunk, second)) {
      args[0] = cache.bytes(chunk);
      if (typeof second === "string" || second === null) args[1] = undefined; // a Buffer takes no encoding
    }
    return (original as (...a: unknown[]) => ServerResponse).apply(this, args);
  } as End;
  proto.end = end;
  proto[PATCHED] = cache;
  return cache;
}

type ByteLength = typeof Buffer.byteLength;
const PATCHED_LENGTH = Symbol.for("axisline.cachedByteLength");

/**
 * Makes `Buffer.byteLength(string)` answer from the cache for a large UTF-8 body already kept.
 * Next.js sets Content-Length from `Buffer.byteLength(html)` before `res.end(html)`; for a lesson
 * page that holds θ or − (a two-byte string in V8) the count alone was 11 % of the server's CPU
 * under load. The cached bytes are `Buffer.from(body, "utf8")`, so their length is exactly what
 * byteLength computes, lone surrogates included (both count U+FFFD's 3 bytes). Strings not in the
 * cache, other encodings and non-strings go to the original. Idempotent.
 */
export function installCachedByteLength(target: { byteLength: ByteLength } & Record<symbol, unknown>, cache: EncodedBodyCache): void {
  if (target[PATCHED_LENGTH]) return;
  const original = target.byteLength;
  target.byteLength = function byteLength(value: Parameters<ByteLength>[0], encoding?: BufferEncoding) {
    if (typeof value === "string" && isLargeUtf8Body(value, encoding)) {
      const known = cache.peek(value);
      if (known) return known.length;
    }
    return original.call(target, value, encoding);
  } as ByteLength;
  target[PATCHED_LENGTH] = true;
}
