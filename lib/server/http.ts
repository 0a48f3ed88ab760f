import "server-only";
import { NextResponse } from "next/server";
import { env, isLoopbackHost } from "@/lib/env";
import { EDGE_HEADERS } from "@/lib/net/client-address";
import { fail, statusOf, type ErrorCode, type Failure, type Result } from "./errors";
import type { RequestContext } from "./accounts";

/**
 * The client's address, as resolved by our server edge (scripts/serve.ts, lib/net/client-address.ts)
 * from the socket and the proxy hops TRUST_PROXY_HOPS allows. The edge overwrites these headers on
 * every request; without its peer header the request did not pass through it, and no header is believed.
 */
export function clientAddress(request: Request): string {
  if (!request.headers.get(EDGE_HEADERS.peerAddress)) return "unknown";
  return request.headers.get(EDGE_HEADERS.clientAddress)?.trim() || "unknown";
}

/** The app's TCP peer is loopback and the request names no proxy: it came from this machine, directly. */
export function isDirectLoopbackRequest(headers: Headers): boolean {
  const peer = headers.get(EDGE_HEADERS.peerAddress);
  return !!peer && isLoopbackHost(peer) && headers.get(EDGE_HEADERS.forwarded) === "0";
}

/** Our public origin (scheme, host, port), from NEXTAUTH_URL. */
export function publicOrigin(): string {
  return new URL(env().NEXTAUTH_URL).origin;
}

export function requestContext(request: Request): RequestContext {
  return { address: clientAddress(request), baseUrl: env().NEXTAUTH_URL.replace(/\/$/, "") };
}

function sameOrigin(a: string, b: string): boolean {
  const norm = (u: URL) => `${u.protocol}//${u.hostname === "localhost" ? "127.0.0.1" : u.hostname}:${u.port}`;
  try {
    return norm(new URL(a)) === norm(new URL(b));
  } catch {
    return false;
  }
}

/** A browser always sends Origin on POST; one from another site is refused (CSRF defence beside SameSite=Lax). */
export function crossSiteFailure(request: Request): Failure | null {
  const origin = request.headers.get("origin");
  if (origin && !sameOrigin(origin, env().NEXTAUTH_URL)) return fail("forbidden", { message: "This request came from another site and was refused." });
  return null;
}

/**
 * Every route handler answers through here: a success as 200 JSON (minus `omit`, e.g. a session
 * token that goes into a cookie instead), a failure as its code's status from lib/server/errors.ts
 * with { ok: false, code, message } (and Retry-After when rate-limited).
 */
export function respond<T extends object>(result: Result<T>, init: { omit?: string[]; headers?: Record<string, string> } = {}): NextResponse {
  const headers: Record<string, string> = { ...init.headers };
  if (!result.ok) {
    if (result.retryAfterSeconds) headers["retry-after"] = String(result.retryAfterSeconds);
    return NextResponse.json(result, { status: statusOf(result.code), headers });
  }
  const body: Record<string, unknown> = { ...result };
  for (const k of init.omit ?? []) delete body[k];
  return NextResponse.json(body, { status: 200, headers });
}

export function failureResponse(code: ErrorCode, message?: string): NextResponse {
  return respond(fail(code, message ? { message } : {}));
}
