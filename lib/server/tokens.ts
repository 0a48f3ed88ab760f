import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A URL-safe random token (256 bits) and the SHA-256 hex we store instead of it. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export const TOKEN_LIFETIME_MS = {
  verify_email: 24 * 60 * 60 * 1000,
  reset_password: 30 * 60 * 1000,
  sign_in_link: 10 * 60 * 1000, // the e-mail link lives at most 10 minutes
} as const;
