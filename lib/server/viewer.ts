import "server-only";
import { cache } from "react";
import { and, eq, gt, isNull, lt, sql } from "drizzle-orm";
import { cookies } from "next/headers";
import { db, type Database } from "@/db/client";
import { sessions, users, type Role } from "@/db/schema";
import { LAST_SEEN_RESOLUTION_SECONDS, SESSION_POLICY, sessionCookieName } from "./session-policy";
import { decodeSessionToken, type SessionClaims } from "./session-cookie";

/** Who is asking. Loaded from the database on every request, never trusted from the cookie alone. */
export type Viewer = { id: string; email: string; name: string; role: Role; sessionId: string };

// Every signed-in request runs this query, so it is built once and prepared once per connection
// (a named statement) instead of being assembled by the query builder each time.
// The idle timeout and the absolute lifetime depend on the role the user has now (an admin
// promoted mid-session gets the shorter limits at once), so both are decided here, in SQL.
const idleLimit = sql`case when ${users.role} = 'admin' then make_interval(secs => ${SESSION_POLICY.admin.idleSeconds}) else make_interval(secs => ${SESSION_POLICY.standard.idleSeconds}) end`;
const absoluteLimit = sql`case when ${users.role} = 'admin' then make_interval(secs => ${SESSION_POLICY.admin.absoluteSeconds}) else make_interval(secs => ${SESSION_POLICY.standard.absoluteSeconds}) end`;
const lastSeenStale = sql<boolean>`${sessions.lastSeenAt} < now() - make_interval(secs => ${LAST_SEEN_RESOLUTION_SECONDS})`;

function buildViewerQuery(database: Database) {
  return database
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, sessionId: sessions.id, lastSeenStale })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(
      and(
        eq(sessions.id, sql.placeholder("sid")),
        eq(sessions.userId, sql.placeholder("sub")),
        isNull(sessions.revokedAt),
        gt(sessions.expiresAt, sql`now()`),
        gt(sessions.lastSeenAt, sql`now() - ${idleLimit}`),
        gt(sessions.createdAt, sql`now() - ${absoluteLimit}`),
        eq(sessions.sessionVersion, sql.placeholder("sv")),
        eq(users.sessionVersion, sql.placeholder("sv")),
        eq(users.status, "active"),
      ),
    )
    .limit(1)
    .prepare("viewer_by_session");
}
const viewerQueries = new WeakMap<Database, ReturnType<typeof buildViewerQuery>>();

export async function viewerFromClaims(database: Database, claims: SessionClaims | null): Promise<Viewer | null> {
  if (!claims) return null;
  let query = viewerQueries.get(database);
  if (!query) viewerQueries.set(database, (query = buildViewerQuery(database)));
  const [row] = await query.execute({ sid: claims.sid, sub: claims.sub, sv: claims.sv });
  if (!row) return null;
  const { lastSeenStale: stale, ...viewer } = row;
  if (stale) await touchSession(database, viewer.sessionId);
  return viewer;
}

/** Activity moves the idle deadline; written at most once a minute per session. */
async function touchSession(database: Database, sessionId: string): Promise<void> {
  await database
    .update(sessions)
    .set({ lastSeenAt: sql`now()` })
    .where(and(eq(sessions.id, sessionId), lt(sessions.lastSeenAt, sql`now() - make_interval(secs => ${LAST_SEEN_RESOLUTION_SECONDS})`)));
}

/**
 * The viewer of the current request (React-cached per request), or null when signed out.
 * The cookie is next-auth's JWT, read with next-auth's public decoder (next-auth/jwt); the
 * session row decides the rest: revoked, expired, idle too long, or an old session version.
 */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const token = (await cookies()).get(sessionCookieName())?.value;
  if (!token) return null;
  return viewerFromClaims(db(), await decodeSessionToken(token));
});
