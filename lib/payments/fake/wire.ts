// Wire-level conventions of the payment service's API, as its reference documents them
// (docs.stripe.com/api: "Errors", "Pagination", "Expanding responses", "Object IDs"):
// errors are `{ error: { type, code?, message, param?, doc_url? } }` with the HTTP status of their
// kind, lists are `{ object: "list", data, has_more, url }`, ids are a prefix and random characters.
import { randomBytes } from "node:crypto";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

/** `cs_test_…`, `evt_…`: the prefix and `length` random base-62 characters. */
export function newId(prefix: string, length = 24): string {
  const bytes = randomBytes(length * 2);
  let out = "";
  // 62 * 4 = 248: rejecting bytes >= 248 keeps every character equally likely.
  for (const b of bytes) {
    if (b < 248) out += ALPHABET[b % 62];
    if (out.length === length) break;
  }
  return out.length === length ? `${prefix}_${out}` : newId(prefix, length);
}

/** The stand-in's clock, in unix seconds; tests move it forward (POST /_fake/clock) to reach expiry. */
export class Clock {
  private offsetMs = 0;
  nowSeconds(): number {
    return Math.floor((Date.now() + this.offsetMs) / 1000);
  }
  advance(seconds: number): void {
    this.offsetMs += seconds * 1000;
  }
  reset(): void {
    this.offsetMs = 0;
  }
}

export type ErrorType = "invalid_request_error" | "api_error" | "card_error" | "idempotency_error";

/** An error answer of the API. Thrown inside a handler, written by the router. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: ErrorType,
    message: string,
    readonly code?: string,
    readonly param?: string,
  ) {
    super(message);
  }

  body(): { error: Record<string, string> } {
    const error: Record<string, string> = { type: this.type, message: this.message };
    if (this.code) {
      error.code = this.code;
      error.doc_url = `https://stripe.com/docs/error-codes/${this.code.replace(/_/g, "-")}`;
    }
    if (this.param) error.param = this.param;
    return { error };
  }
}

export const missingParam = (param: string) => new ApiError(400, "invalid_request_error", `Missing required param: ${param}.`, "parameter_missing", param);
export const invalidParam = (param: string, message: string) => new ApiError(400, "invalid_request_error", message, "parameter_invalid_empty", param);
export const unknownParam = (param: string) =>
  new ApiError(400, "invalid_request_error", `Received unknown parameter: ${param}. (The local payment stand-in does not implement it.)`, "parameter_unknown", param);
/** 404 for the object a URL names; 400 (`status`) when a request parameter names a missing object. */
export const noSuch = (object: string, id: string, param = "id", status = 404) => new ApiError(status, "invalid_request_error", `No such ${object}: '${id}'`, "resource_missing", param);
export const unrecognizedUrl = (method: string, path: string) =>
  new ApiError(404, "invalid_request_error", `Unrecognized request URL (${method}: ${path}). Please see https://stripe.com/docs or we can help at https://support.stripe.com/.`);

export type ApiList<T> = { object: "list"; data: T[]; has_more: boolean; url: string };

/**
 * Cursor pagination: `items` newest first; `limit` 1..100 (default 10); `starting_after` /
 * `ending_before` name an object id of the list (an unknown one is the service's resource_missing).
 */
export function paginate<T extends { id: string }>(
  items: T[],
  url: string,
  page: { limit?: number; startingAfter?: string; endingBefore?: string },
  objectName: string,
): ApiList<T> {
  const limit = page.limit ?? 10;
  if (limit < 1 || limit > 100) throw new ApiError(400, "invalid_request_error", "Invalid limit: must be between 1 and 100", "parameter_invalid_integer", "limit");
  let from = 0;
  let to = items.length;
  if (page.startingAfter) {
    const i = items.findIndex((x) => x.id === page.startingAfter);
    if (i < 0) throw noSuch(objectName, page.startingAfter, "starting_after", 400);
    from = i + 1;
  } else if (page.endingBefore) {
    const i = items.findIndex((x) => x.id === page.endingBefore);
    if (i < 0) throw noSuch(objectName, page.endingBefore, "ending_before", 400);
    to = i;
    from = Math.max(0, i - limit);
  }
  const data = items.slice(from, Math.min(to, from + limit));
  const hasMore = page.endingBefore ? from > 0 : from + data.length < to;
  return { object: "list", data, has_more: hasMore, url };
}
