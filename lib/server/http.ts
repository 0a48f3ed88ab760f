import "server-only";
import { NextResponse } from "next/server";
import { env } from "@/lib/env";
import { ERRORS, fail, statusOf, type Failure, type Result } from "./errors";
import type { RequestContext } from "./accounts";

/**
 * The client's address for rate limits. Behind a reverse proxy in production the proxy must
 * overwrite X-Forwarded-For; locally the header comes from the Next server itself.
 */
export function clientAddress(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || request.headers.get("x-real-ip") || "unknown";
}

export function requestContext(request: Request): RequestContext {
  return { address: clientAddress(request), baseUrl: env().NEXTAUTH_URL.replace(/\/$/, "") };
}

/** JSON or a form post, as a plain object for zod; anything unreadable becomes {} (and fails validation). */
export async function readInput(request: Request): Promise<Record<string, unknown>> {
  const type = request.headers.get("content-type") ?? "";
  try {
    if (type.includes("application/json")) {
      const body = await request.json();
      return body && typeof body === "object" && !Array.isArray(body) ? (body as Record<string, unknown>) : {};
    }
    if (type.includes("form")) return Object.fromEntries((await request.formData()).entries());
  } catch {
    return {};
  }
  return {};
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

export function respond<T extends object>(result: Result<T>, init?: { omit?: string[] }): NextResponse {
  if (!result.ok) {
    const headers: Record<string, string> = {};
    if (result.retryAfterSeconds) headers["retry-after"] = String(result.retryAfterSeconds);
    return NextResponse.json(result, { status: statusOf(result.error), headers });
  }
  const body: Record<string, unknown> = { ...result };
  for (const k of init?.omit ?? []) delete body[k];
  return NextResponse.json(body, { status: 200 });
}

export function failureResponse(code: keyof typeof ERRORS, message?: string): NextResponse {
  return respond(fail(code, message ? { message } : {}));
}
