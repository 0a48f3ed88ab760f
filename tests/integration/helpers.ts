import { eq, sql } from "drizzle-orm";
import { db } from "@/db/connection";
import { users, type Role } from "@/db/schema";
import { hashPassword } from "@/lib/server/passwords";
import { viewerFromClaims, type Viewer } from "@/lib/server/viewer";
import { decodeSessionToken } from "@/lib/server/session-cookie";
import { uniqueAddress, uniqueEmail } from "../support/unique";

export const testDb = () => db();
export const ctx = () => ({ address: uniqueAddress(), baseUrl: process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3100" });

/** A verified, active user with a known password. */
export async function createUser(role: Role = "apprentice", password = "a sturdy test passphrase") {
  const email = uniqueEmail(role);
  const [row] = await db()
    .insert(users)
    .values({ email, name: `Test ${role}`, role, passwordHash: await hashPassword(password), emailVerifiedAt: sql`now()` })
    .returning({ id: users.id });
  return { id: row.id, email, password };
}

export async function viewerFromToken(token: string): Promise<Viewer | null> {
  return viewerFromClaims(db(), await decodeSessionToken(token));
}

export async function countRows(table: "users" | "auth_tokens" | "mail_outbox" | "audit_log" | "sessions"): Promise<number> {
  const r = await db().execute(sql.raw(`select count(*)::int as n from ${table}`));
  return (r.rows[0] as { n: number }).n;
}

export async function userRow(id: string) {
  const [u] = await db().select().from(users).where(eq(users.id, id));
  return u;
}
