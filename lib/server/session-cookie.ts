import "server-only";
import { hkdfSync } from "node:crypto";
import { jwtDecrypt } from "jose";
import { encode } from "next-auth/jwt";
import { env, secureCookies } from "@/lib/env";
import { SESSION_MAX_AGE_SECONDS, sessionCookieName } from "./auth-options";

export type SessionClaims = { sub: string; sid: string; sv: number };

export async function encodeSessionToken(claims: SessionClaims): Promise<string> {
  return encode({ token: { ...claims }, secret: env().NEXTAUTH_SECRET, maxAge: SESSION_MAX_AGE_SECONDS });
}

// next-auth's key for its JWTs: HKDF-SHA256 of the secret, empty salt, this info, 32 bytes
// (next-auth v4 jwt/index.js, getDerivedEncryptionKey). next-auth derives it again for every
// decode; we derive it once per secret, since every signed-in request decodes the cookie.
const KEY_INFO = "NextAuth.js Generated Encryption Key";
let derived: { secret: string; key: Uint8Array } | null = null;

function encryptionKey(secret: string): Uint8Array {
  if (derived?.secret !== secret) derived = { secret, key: new Uint8Array(hkdfSync("sha256", secret, "", KEY_INFO, 32)) };
  return derived.key;
}

/** Decodes next-auth's session JWT exactly as next-auth's decode does (same key, 15 s clock tolerance). */
export async function decodeSessionToken(token: string): Promise<SessionClaims | null> {
  try {
    const { payload: t } = await jwtDecrypt(token, encryptionKey(env().NEXTAUTH_SECRET), { clockTolerance: 15 });
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
