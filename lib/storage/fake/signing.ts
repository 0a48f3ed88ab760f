// The upload service's signatures, as its SDK makes and checks them (uploadthing 7.7.4 /
// @uploadthing/shared: signPayload, verifySignature, generateSignedURL): "hmac-sha256=" + the hex
// HMAC-SHA256 of the payload, keyed with the API key. A presigned URL is signed over its whole
// text up to "&signature=", and carries `expires` in epoch milliseconds.
import { createHmac, timingSafeEqual } from "node:crypto";

const PREFIX = "hmac-sha256=";

export function signPayload(payload: string, apiKey: string): string {
  return PREFIX + createHmac("sha256", apiKey).update(payload).digest("hex");
}

export function verifyPayload(payload: string, signature: string | null | undefined, apiKey: string): boolean {
  if (!signature?.startsWith(PREFIX)) return false;
  const given = Buffer.from(signature.slice(PREFIX.length), "hex");
  const expected = createHmac("sha256", apiKey).update(payload).digest();
  return given.length === expected.length && timingSafeEqual(given, expected);
}

/** Like the SDK's generateSignedURL: `expires`, then each value URL-encoded (and encoded again by URLSearchParams). */
export function signUrl(base: string, apiKey: string, ttlSeconds: number, data: Record<string, string | number | undefined> = {}): string {
  const url = new URL(base);
  url.searchParams.append("expires", String(Date.now() + ttlSeconds * 1000));
  for (const [k, v] of Object.entries(data)) if (v != null) url.searchParams.append(k, encodeURIComponent(String(v)));
  url.searchParams.append("signature", signPayload(url.toString(), apiKey));
  return url.href;
}

export type UrlCheck = { ok: true; params: URLSearchParams } | { ok: false; status: number; error: string };

/** Checks a presigned URL as the request arrived (our origin + path + query). */
export function verifySignedUrl(fullUrl: string, apiKey: string, now = Date.now()): UrlCheck {
  const at = fullUrl.indexOf("&signature=");
  if (at < 0) return { ok: false, status: 403, error: "Missing signature" };
  const signed = fullUrl.slice(0, at);
  const signature = decodeURIComponent(fullUrl.slice(at + "&signature=".length).split("&")[0]);
  if (!verifyPayload(signed, signature, apiKey)) return { ok: false, status: 403, error: "Invalid signature" };
  const params = new URL(fullUrl).searchParams;
  const expires = Number(params.get("expires"));
  if (!Number.isFinite(expires) || expires < now) return { ok: false, status: 403, error: "URL expired" };
  return { ok: true, params };
}

/** A metadata value from a presigned URL: URLSearchParams decoded once, the SDK encoded twice. */
export function urlValue(params: URLSearchParams, name: string): string | null {
  const raw = params.get(name);
  if (raw == null) return null;
  try {
    return decodeURIComponent(raw);
  } catch {
    return null;
  }
}
