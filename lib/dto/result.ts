// The error contract as it crosses the wire (docs/decisions/002-error-contract.md). Client-safe:
// types only, so client components read a server answer without importing lib/server.
// The table that gives each code its HTTP status and its sentence is lib/server/errors.ts.

/** Every expected outcome that is not a success. Bugs are not codes: they throw. */
export type ErrorCode =
  | "invalid_input"
  | "invalid_credentials"
  | "email_unverified"
  | "account_disabled"
  | "rate_limited"
  | "token_invalid"
  | "weak_password"
  | "not_signed_in"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "payload_too_large"
  | "unavailable";

/** An expected refusal: its code, a sentence for the person, and per-field sentences for a form. */
export type Failure = {
  ok: false;
  code: ErrorCode;
  message: string;
  fieldErrors?: Record<string, string>;
  retryAfterSeconds?: number;
};

export type Ok<T extends object = object> = { ok: true } & T;

/** What a data-access function, a route handler and a server action answer. */
export type Result<T extends object = object> = Ok<T> | Failure;

/** What a server action hands back to the form that called it (useActionState). */
export type FormState = { ok: boolean; message: string | null; code?: ErrorCode; fieldErrors?: Record<string, string> };
