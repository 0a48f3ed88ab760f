// One error vocabulary (docs/decisions/002-error-contract.md): an expected outcome is a value
// { ok: false, code, message }, never a throw; this table gives each code its HTTP status and
// the sentence a person sees. Only bugs throw (into error.tsx, or a 500 from a route handler).
import type { ErrorCode, Failure, FormState, Result } from "@/lib/dto/result";

export type { ErrorCode, Failure, FormState, Ok, Result } from "@/lib/dto/result";

type ErrorEntry = { status: number; message: string };

export const ERRORS = {
  invalid_input: { status: 400, message: "Some of what you entered needs another look." },
  invalid_credentials: { status: 401, message: "That e-mail and password don't match an account. Check both and try again." },
  email_unverified: { status: 403, message: "Please confirm your e-mail address first: we sent you a link when you signed up." },
  account_disabled: { status: 403, message: "This account has been disabled. Contact your school or the Axisline team." },
  rate_limited: { status: 429, message: "Too many attempts." },
  token_invalid: { status: 400, message: "This link has expired or has already been used. Ask for a new one." },
  weak_password: { status: 400, message: "Choose a different password." },
  not_signed_in: { status: 401, message: "Please sign in to continue." },
  forbidden: { status: 403, message: "You don't have access to this." },
  not_found: { status: 404, message: "We couldn't find that." },
  conflict: { status: 409, message: "That change conflicts with the current state. Reload and try again." },
  payload_too_large: { status: 413, message: "That is more than Axisline accepts in one request. Send something smaller." },
  unavailable: { status: 503, message: "Axisline can't reach its database right now. Please try again in a minute." },
} as const satisfies Record<ErrorCode, ErrorEntry>;

/** A refusal with the table's sentence, unless the caller has a more precise one. */
export function fail(code: ErrorCode, extra: Partial<Omit<Failure, "ok" | "code">> = {}): Failure {
  return { ok: false, code, ...extra, message: extra.message ?? ERRORS[code].message };
}

export function statusOf(code: ErrorCode): number {
  return ERRORS[code].status;
}

/** A server action's answer to its form: the failure's sentence, or the success sentence. */
export function formState(result: Result, successMessage: string): FormState {
  if (!result.ok) return { ok: false, code: result.code, message: result.message, fieldErrors: result.fieldErrors };
  return { ok: true, message: successMessage };
}

/** "in 12 minutes" / "in 40 seconds": the wait, in words. */
export function waitInWords(seconds: number): string {
  if (seconds < 60) return `in ${Math.max(1, Math.ceil(seconds))} seconds`;
  const minutes = Math.ceil(seconds / 60);
  return minutes === 1 ? "in a minute" : `in ${minutes} minutes`;
}
