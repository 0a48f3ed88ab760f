import "server-only";
import { forbidden, notFound, redirect } from "next/navigation";
import type { Role } from "@/db/schema";
import type { Ok, Result } from "./errors";
import { getViewer, type Viewer } from "./viewer";

/** For pages: signed-out visitors go to sign-in (and come back), the wrong role gets 403. */
export async function requirePageViewer(path: string, ...roles: Role[]): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) redirect(`/sign-in?next=${encodeURIComponent(path)}`);
  if (roles.length > 0 && !roles.includes(viewer.role)) forbidden();
  return viewer;
}

/**
 * A page's read through the data-access layer: its data, or the page Next.js shows for the
 * refusal (not_found → 404, forbidden → 403, not_signed_in → sign-in). A read has no other
 * expected refusal, so any other code here is a bug and throws into error.tsx.
 */
export function pageData<T extends object>(result: Result<T>): Ok<T> {
  if (result.ok) return result;
  if (result.code === "not_found") notFound();
  if (result.code === "forbidden") forbidden();
  if (result.code === "not_signed_in") redirect("/sign-in");
  throw new Error(`A page read was refused with "${result.code}": ${result.message}`);
}

export const HOME_BY_ROLE: Record<Role, string> = {
  apprentice: "/learn",
  instructor: "/teach",
  school_manager: "/school",
  admin: "/admin",
};
