import "server-only";
import { fail, type Failure } from "./errors";
import { respond } from "./http";

/** How long we ask a client to wait when PostgreSQL is unreachable: a restart takes seconds. */
export const DATABASE_RETRY_AFTER_SECONDS = 15;

// SQLSTATE classes and codes that mean "the database isn't there right now", not "your query is
// wrong" (PostgreSQL 15 manual, Appendix A: class 08 connection exception; 57P01 admin_shutdown,
// 57P02 crash_shutdown, 57P03 cannot_connect_now; 53300 too_many_connections).
const UNAVAILABLE_SQLSTATES = new Set(["57P01", "57P02", "57P03", "53300"]);
const UNAVAILABLE_ERRNOS = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "EHOSTUNREACH", "ENOTFOUND", "EAI_AGAIN"]);
// node-postgres's own words when a connection dies or can't be had (pg 8: client.js, pg-pool).
const UNAVAILABLE_MESSAGES = [/Connection terminated/i, /timeout exceeded when trying to connect/i, /Client has encountered a connection error/i];

/** True when an error (or any error in its `cause` chain: drizzle wraps the driver's) says the database can't be reached. */
export function isDatabaseUnavailable(error: unknown): boolean {
  for (let e: unknown = error, depth = 0; e && depth < 6; e = (e as { cause?: unknown }).cause, depth++) {
    if (e instanceof AggregateError && e.errors.some((inner) => isDatabaseUnavailable(inner))) return true;
    const { code, message } = e as { code?: unknown; message?: unknown };
    if (typeof code === "string" && (UNAVAILABLE_SQLSTATES.has(code) || code.startsWith("08") || UNAVAILABLE_ERRNOS.has(code))) return true;
    if (typeof message === "string" && UNAVAILABLE_MESSAGES.some((m) => m.test(message))) return true;
  }
  return false;
}

export function unavailable(): Failure {
  return fail("unavailable", { retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS });
}

/**
 * Every route handler is wrapped in this: a database that can't be reached is an expected outage,
 * answered 503 with Retry-After and a sentence; anything else is a bug and still throws.
 */
export function handleRoute<A extends unknown[]>(handler: (...args: A) => Promise<Response>): (...args: A) => Promise<Response> {
  return async (...args: A) => {
    try {
      return await handler(...args);
    } catch (err) {
      if (isDatabaseUnavailable(err)) {
        console.error("[db] unavailable:", err instanceof Error ? err.message : String(err));
        return respond(unavailable());
      }
      throw err;
    }
  };
}

/** The same for a server action: its form gets the sentence instead of an error page. */
export async function unlessUnavailable<T>(action: () => Promise<T>, whenDown: (failure: Failure) => T): Promise<T> {
  try {
    return await action();
  } catch (err) {
    if (isDatabaseUnavailable(err)) return whenDown(unavailable());
    throw err;
  }
}
