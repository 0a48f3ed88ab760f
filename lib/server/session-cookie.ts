import "server-only";
import { decode, encode } from "next-auth/jwt";
import { env, secureCookies } from "@/lib/env";
import { SESSION_MAX_AGE_SECONDS, sessionCookieName } from "./session-policy";

// The session cookie is next-auth's JWT (an encrypted JWE), made and read only through next-auth's
// public `next-auth/jwt` API. It names the session row; the row decides whether it is still good.
export type SessionClaims = { sub: string; sid: string; sv: number };

export async function encodeSessionToken(claims: SessionClaims, maxAgeSeconds = SESSION_MAX_AGE_SECONDS): Promise<string> {
  return encode({ token: { ...claims }, secret: env().NEXTAUTH_SECRET, maxAge: maxAgeSeconds });
}

/** The claims of a cookie made by encodeSessionToken, or null for anything else (foreign, tampered, expired). */
export async function decodeSessionToken(token: string): Promise<SessionClaims | null> {
  try {
    const t = await decode({ token, secret: env().NEXTAUTH_SECRET });
    if (!t || typeof t.sub !== "string" || typeof t.sid !== "string" || typeof t.sv !== "number") return null;
    return { sub: t.sub, sid: t.sid, sv: t.sv };
  } catch {
    return null;
  }
}

export function sessionCookie(value: string, maxAgeSeconds = SESSION_MAX_AGE_SECONDS) {
  return {
    name: sessionCookieName(),
    value,
    options: { httpOnly: true, sameSite: "lax" as const, secure: secureCookies(), path: "/", maxAge: maxAgeSeconds },
  };
}

export function clearedSessionCookie() {
  return { name: sessionCookieName(), value: "", options: { httpOnly: true, sameSite: "lax" as const, secure: secureCookies(), path: "/", maxAge: 0 } };
}
