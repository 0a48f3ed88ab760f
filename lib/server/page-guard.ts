import "server-only";
import { forbidden, redirect } from "next/navigation";
import type { Role } from "@/db/schema";
import { getViewer, type Viewer } from "./viewer";

/** For pages: signed-out visitors go to sign-in (and come back), the wrong role gets 403. */
export async function requirePageViewer(path: string, ...roles: Role[]): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) redirect(`/sign-in?next=${encodeURIComponent(path)}`);
  if (roles.length > 0 && !roles.includes(viewer.role)) forbidden();
  return viewer;
}

export const HOME_BY_ROLE: Record<Role, string> = {
  apprentice: "/learn",
  instructor: "/teach",
  school_manager: "/school",
  admin: "/admin",
};
