// One error vocabulary: each expected failure has a code, an HTTP status and a sentence a person understands.

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
} as const;

export type ErrorCode = keyof typeof ERRORS;

export type Failure = {
  ok: false;
  error: ErrorCode;
  message: string;
  fieldErrors?: Record<string, string>;
  retryAfterSeconds?: number;
};
export type Result<T extends object = object> = ({ ok: true } & T) | Failure;

export function fail(error: ErrorCode, extra: Partial<Omit<Failure, "ok" | "error">> = {}): Failure {
  return { ok: false, error, message: extra.message ?? ERRORS[error].message, ...extra };
}

export function statusOf(error: ErrorCode): number {
  return ERRORS[error].status;
}

/** Thrown by data-access functions when the viewer may not touch an object; pages map it to 403/404. */
export class AccessError extends Error {
  constructor(public readonly code: "not_signed_in" | "forbidden" | "not_found") {
    super(code);
  }
}

/** "in 12 minutes" / "in 40 seconds": the wait, in words. */
export function waitInWords(seconds: number): string {
  if (seconds < 60) return `in ${Math.max(1, Math.ceil(seconds))} seconds`;
  const minutes = Math.ceil(seconds / 60);
  return minutes === 1 ? "in a minute" : `in ${minutes} minutes`;
}
