import "server-only";
import { hash, verify } from "@node-rs/argon2";
import { dictionary } from "@zxcvbn-ts/language-common";

// OWASP ASVS 5.0 / OWASP Password Storage Cheat Sheet: argon2id, m = 19 MiB, t = 2, p = 1.
export const ARGON2_PARAMS = { algorithm: 2 /* Algorithm.Argon2id (a const enum, so written as its value) */, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const PASSWORD_MIN_LENGTH = 8;
// ASVS asks that at least 64 characters be allowed; we allow 128 and never truncate.
export const PASSWORD_MAX_LENGTH = 128;

// The 3,000 most common passwords, in frequency order, from zxcvbn-ts's common list.
const COMMON_PASSWORDS: ReadonlySet<string> = new Set(
  (dictionary["passwords-common"] as string[]).slice(0, 3000).map((p) => p.toLowerCase()),
);

export function isCommonPassword(password: string): boolean {
  return COMMON_PASSWORDS.has(password.toLowerCase());
}

/** A sentence for the person, or null when the password is acceptable. */
export function passwordProblem(password: string): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
  if (isCommonPassword(password)) return "That password is one of the most common ones and is easy to guess. Choose another.";
  return null;
}

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2_PARAMS);
}

export async function verifyPassword(stored: string, password: string): Promise<boolean> {
  try {
    return await verify(stored, password);
  } catch {
    return false;
  }
}

// Verifying against a throw-away hash when the account is unknown keeps both answers equally slow.
let dummyHash: Promise<string> | undefined;
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword("axisline-timing-equaliser");
  await verifyPassword(await dummyHash, password);
}
