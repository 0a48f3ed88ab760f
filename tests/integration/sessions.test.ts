// Session lifetimes (OWASP ASVS 5.0 V7.3.1 inactivity timeout, V7.3.2 absolute lifetime) with the
// values of lib/server/session-policy.ts (NIST SP 800-63B §4.1.3, §4.2.3), checked by moving the
// session row's clock back in PostgreSQL rather than waiting.
import { afterAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { sessions, users } from "@/db/schema";
import { closeDb } from "@/db/connection";
import { signInWithPassword } from "@/lib/server/accounts";
import { SESSION_POLICY } from "@/lib/server/session-policy";
import { decodeSessionToken } from "@/lib/server/session-cookie";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";

afterAll(async () => {
  await closeDb();
});

async function signedIn(role: "apprentice" | "admin" = "apprentice") {
  const u = await createUser(role);
  const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error("sign-in failed");
  const claims = await decodeSessionToken(s.sessionToken);
  return { user: u, token: s.sessionToken, sessionId: claims!.sid, maxAgeSeconds: s.maxAgeSeconds };
}

async function shiftSession(sessionId: string, set: { lastSeenSecondsAgo?: number; createdSecondsAgo?: number }) {
  const patch: Record<string, unknown> = {};
  if (set.lastSeenSecondsAgo !== undefined) patch.lastSeenAt = sql`now() - make_interval(secs => ${set.lastSeenSecondsAgo})`;
  if (set.createdSecondsAgo !== undefined) patch.createdAt = sql`now() - make_interval(secs => ${set.createdSecondsAgo})`;
  await testDb().update(sessions).set(patch).where(eq(sessions.id, sessionId));
}

async function lastSeenSecondsAgo(sessionId: string): Promise<number> {
  const [r] = await testDb()
    .select({ ago: sql<number>`extract(epoch from now() - ${sessions.lastSeenAt})::float8` })
    .from(sessions)
    .where(eq(sessions.id, sessionId));
  return r.ago;
}

describe("idle timeout", () => {
  it("a session idle for just under the limit still works and its activity moves the deadline", async () => {
    const s = await signedIn();
    await shiftSession(s.sessionId, { lastSeenSecondsAgo: SESSION_POLICY.standard.idleSeconds - 120 });
    expect((await viewerFromToken(s.token))?.id).toBe(s.user.id);
    expect(await lastSeenSecondsAgo(s.sessionId)).toBeLessThan(5);
  });

  it("a session idle past the limit identifies nobody", async () => {
    const s = await signedIn();
    await shiftSession(s.sessionId, { lastSeenSecondsAgo: SESSION_POLICY.standard.idleSeconds + 1 });
    expect(await viewerFromToken(s.token)).toBeNull();
  });

  it("an admin's limit is 30 minutes", async () => {
    const s = await signedIn("admin");
    await shiftSession(s.sessionId, { lastSeenSecondsAgo: 29 * 60 });
    expect((await viewerFromToken(s.token))?.role).toBe("admin");
    await shiftSession(s.sessionId, { lastSeenSecondsAgo: 31 * 60 });
    expect(await viewerFromToken(s.token)).toBeNull();
  });

  it("activity is written at most once a minute", async () => {
    const s = await signedIn();
    await shiftSession(s.sessionId, { lastSeenSecondsAgo: 30 });
    await viewerFromToken(s.token);
    expect(await lastSeenSecondsAgo(s.sessionId)).toBeGreaterThanOrEqual(29);
  });
});

describe("absolute lifetime", () => {
  it("ends a session used every minute once it is older than the limit", async () => {
    const s = await signedIn();
    await shiftSession(s.sessionId, { createdSecondsAgo: SESSION_POLICY.standard.absoluteSeconds - 60, lastSeenSecondsAgo: 0 });
    expect((await viewerFromToken(s.token))?.id).toBe(s.user.id);
    await shiftSession(s.sessionId, { createdSecondsAgo: SESSION_POLICY.standard.absoluteSeconds + 1, lastSeenSecondsAgo: 0 });
    expect(await viewerFromToken(s.token)).toBeNull();
  });

  it("a user promoted to admin mid-session gets the admin limits at once", async () => {
    const s = await signedIn();
    await shiftSession(s.sessionId, { createdSecondsAgo: SESSION_POLICY.admin.absoluteSeconds + 60, lastSeenSecondsAgo: 0 });
    expect((await viewerFromToken(s.token))?.id).toBe(s.user.id);
    await testDb().update(users).set({ role: "admin" }).where(eq(users.id, s.user.id));
    expect(await viewerFromToken(s.token)).toBeNull();
  });

  it("the cookie and the session row end together: 14 days for an apprentice, 12 hours for an admin", async () => {
    expect((await signedIn()).maxAgeSeconds).toBe(14 * 24 * 3600);
    expect((await signedIn("admin")).maxAgeSeconds).toBe(12 * 3600);
    const s = await signedIn("admin");
    const [row] = await testDb()
      .select({ seconds: sql<number>`extract(epoch from ${sessions.expiresAt} - ${sessions.createdAt})::float8` })
      .from(sessions)
      .where(eq(sessions.id, s.sessionId));
    expect(row.seconds).toBeCloseTo(12 * 3600, -1);
  });
});
