import "server-only";
// The first line of every data-access function (docs/decisions/003-data-access-layer.md): who may
// call it at all. Per-object rights are then checked in the query that touches the row.
import type { Role } from "@/db/schema";
import { fail, type Failure } from "./errors";
import type { Viewer } from "./viewer";

export type Guarded = { ok: true; viewer: Viewer } | Failure;

/**
 * Signed in, and (when roles are named) in one of them. Signed out is not_signed_in (401), another
 * role forbidden (403), with `forbiddenMessage` when the caller can say more precisely why.
 */
export function guard(viewer: Viewer | null, roles: readonly Role[] = [], forbiddenMessage?: string): Guarded {
  if (!viewer) return fail("not_signed_in");
  if (roles.length > 0 && !roles.includes(viewer.role)) return fail("forbidden", forbiddenMessage ? { message: forbiddenMessage } : {});
  return { ok: true, viewer };
}
