import { randomBytes } from "node:crypto";

/** A fresh address per test so tests never share rate-limit buckets or accounts. */
export function uniqueEmail(prefix = "t"): string {
  return `${prefix}-${Date.now().toString(36)}-${randomBytes(3).toString("hex")}@test.example`;
}

/** A fresh client address for the per-address rate limits (sent as X-Forwarded-For). */
export function uniqueAddress(): string {
  const b = randomBytes(3);
  return `10.${b[0]}.${b[1]}.${b[2]}`;
}
