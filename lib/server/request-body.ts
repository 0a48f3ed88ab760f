import "server-only";
import { fail, type Result } from "./errors";

/**
 * The most a route reads of a request body, by kind. Checked against Content-Length before
 * anything is read, and counted while reading (a chunked body has no length), so an oversized body
 * is answered 413 without being parsed. nginx's client_max_body_size sits above the largest.
 */
export const BODY_LIMITS = {
  /** sign-in, sign-up, reset, link, password: a few short fields. */
  accountForm: 16 * 1024,
  /** one quiz answer (an ordering of a few dozen items, a long free-text numeric, hotspot points). */
  answer: 64 * 1024,
  /** small JSON commands: start an attempt, submit, grant extra time. */
  command: 16 * 1024,
} as const;

// Keys that reach for an object's prototype when a parsed body is merged or spread.
const FORBIDDEN_KEYS = new Set(["__proto__", "constructor", "prototype"]);

export type Body = { data: Record<string, unknown> };

/** The body as a plain object for zod, or a failure (413 too large, 400 unreadable or with forbidden keys). */
export async function readBody(request: Request, maxBytes: number): Promise<Result<Body>> {
  const declared = Number(request.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > maxBytes) return tooLarge(maxBytes);
  const bytes = await readAtMost(request, maxBytes);
  if (bytes === "too_large") return tooLarge(maxBytes);
  if (bytes.length === 0) return { ok: true, data: {} };
  const type = (request.headers.get("content-type") ?? "").toLowerCase();
  try {
    if (type.includes("application/json")) return fromJson(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
    if (type.includes("application/x-www-form-urlencoded") || type.includes("multipart/form-data")) {
      const form = await new Response(bytes, { headers: { "content-type": type } }).formData();
      return checked(Object.fromEntries([...form.entries()].filter(([, v]) => typeof v === "string")));
    }
  } catch {
    return fail("invalid_input", { message: "We couldn't read that request. Send it as JSON or a form." });
  }
  return fail("invalid_input", { message: "We couldn't read that request. Send it as JSON or a form." });
}

function tooLarge(maxBytes: number) {
  return fail("payload_too_large", { message: `That is more than Axisline accepts here (${Math.round(maxBytes / 1024)} KB). Send something smaller.` });
}

async function readAtMost(request: Request, maxBytes: number): Promise<Uint8Array<ArrayBuffer> | "too_large"> {
  if (!request.body) return new Uint8Array(new ArrayBuffer(0));
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      return "too_large";
    }
    chunks.push(value);
  }
  const out = new Uint8Array(new ArrayBuffer(total));
  let offset = 0;
  for (const c of chunks) {
    out.set(c, offset);
    offset += c.byteLength;
  }
  return out;
}

function fromJson(text: string): Result<Body> {
  let forbidden = false;
  const value: unknown = JSON.parse(text, (key, v) => {
    if (FORBIDDEN_KEYS.has(key)) forbidden = true;
    return v;
  });
  if (forbidden) return forbiddenKeys();
  if (!value || typeof value !== "object" || Array.isArray(value)) return { ok: true, data: {} };
  return { ok: true, data: value as Record<string, unknown> };
}

function checked(data: Record<string, unknown>): Result<Body> {
  return Object.keys(data).some((k) => FORBIDDEN_KEYS.has(k)) ? forbiddenKeys() : { ok: true, data };
}

function forbiddenKeys() {
  return fail("invalid_input", { message: "That request names a field Axisline never accepts (__proto__, constructor or prototype)." });
}
