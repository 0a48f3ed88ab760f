import "server-only";
import { cache } from "react";
import { and, eq, gt, isNull } from "drizzle-orm";
import { getServerSession } from "next-auth";
import { db, type Database } from "@/db/client";
import { sessions, users, type Role } from "@/db/schema";
import { authOptions } from "./auth-options";
import { AccessError } from "./errors";
import type { SessionClaims } from "./session-cookie";

/** Who is asking. Loaded from the database on every request, never trusted from the cookie alone. */
export type Viewer = { id: string; email: string; name: string; role: Role; sessionId: string };

export async function viewerFromClaims(database: Database, claims: SessionClaims | null): Promise<Viewer | null> {
  if (!claims) return null;
  const [row] = await database
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, sessionId: sessions.id })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(
      and(
        eq(sessions.id, claims.sid),
        eq(sessions.userId, claims.sub),
        isNull(sessions.revokedAt),
        gt(sessions.expiresAt, new Date()),
        eq(sessions.sessionVersion, claims.sv),
        eq(users.sessionVersion, claims.sv),
        eq(users.status, "active"),
      ),
    )
    .limit(1);
  return row ?? null;
}

type SessionShape = { sid?: string; uid?: string; sv?: number } | null;

/** The viewer of the current request (React-cached per request), or null when signed out. */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const s = (await getServerSession(authOptions())) as SessionShape;
  if (!s?.sid || !s.uid || typeof s.sv !== "number") return null;
  return viewerFromClaims(db(), { sid: s.sid, sub: s.uid, sv: s.sv });
});

export function assertRole(viewer: Viewer | null, ...roles: Role[]): Viewer {
  if (!viewer) throw new AccessError("not_signed_in");
  if (roles.length > 0 && !roles.includes(viewer.role)) throw new AccessError("forbidden");
  return viewer;
}
