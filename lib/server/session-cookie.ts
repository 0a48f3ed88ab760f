import "server-only";
import { encode, decode } from "next-auth/jwt";
import { env, secureCookies } from "@/lib/env";
import { SESSION_MAX_AGE_SECONDS, sessionCookieName } from "./auth-options";

export type SessionClaims = { sub: string; sid: string; sv: number };

export async function encodeSessionToken(claims: SessionClaims): Promise<string> {
  return encode({ token: { ...claims }, secret: env().NEXTAUTH_SECRET, maxAge: SESSION_MAX_AGE_SECONDS });
}

export async function decodeSessionToken(token: string): Promise<SessionClaims | null> {
  try {
    const t = await decode({ token, secret: env().NEXTAUTH_SECRET });
    if (!t || typeof t.sub !== "string" || typeof t.sid !== "string" || typeof t.sv !== "number") return null;
    return { sub: t.sub, sid: t.sid, sv: t.sv };
  } catch {
    return null;
  }
}

export function sessionCookie(value: string) {
  return {
    name: sessionCookieName(),
    value,
    options: { httpOnly: true, sameSite: "lax" as const, secure: secureCookies(), path: "/", maxAge: SESSION_MAX_AGE_SECONDS },
  };
}

export function clearedSessionCookie() {
  return { name: sessionCookieName(), value: "", options: { httpOnly: true, sameSite: "lax" as const, secure: secureCookies(), path: "/", maxAge: 0 } };
}
