import "server-only";
import { asc, count, desc, eq, ilike, or, sql } from "drizzle-orm";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { roleEnum, users, type AccountStatus, type Role } from "@/db/schema";
import { writeAudit } from "./audit";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import type { Viewer } from "./viewer";

export type UserDto = { id: string; email: string; name: string; role: Role; status: AccountStatus; emailVerified: boolean; createdAtUtc: string };

// The columns a DTO may carry: never the password hash or the session version.
const userColumns = { id: users.id, email: users.email, name: users.name, role: users.role, status: users.status, emailVerifiedAt: users.emailVerifiedAt, createdAt: users.createdAt };

function toDto(r: { id: string; email: string; name: string; role: Role; status: AccountStatus; emailVerifiedAt: Date | null; createdAt: Date }): UserDto {
  return { id: r.id, email: r.email, name: r.name, role: r.role, status: r.status, emailVerified: r.emailVerifiedAt !== null, createdAtUtc: r.createdAt.toISOString() };
}

export const USERS_PAGE_SIZE = 50;

export const ListUsersInput = z.object({
  // Part of a name or an e-mail address; empty lists everyone.
  query: z.string().trim().max(254, { error: "Search for at most 254 characters." }).optional().default(""),
  page: z.coerce.number({ error: "Choose a page number." }).int().min(1).max(10_000).optional().default(1),
});

export type UserListDto = { users: UserDto[]; total: number; page: number; pageSize: number; query: string };

/** Staff first (admins, school managers, instructors), then apprentices, by name; 50 a page, searchable. */
export async function listUsers(viewer: Viewer | null, raw: unknown = {}, database: Queryable = db()): Promise<Result<UserListDto>> {
  const allowed = guard(viewer, ["admin"]);
  if (!allowed.ok) return allowed;
  const parsed = ListUsersInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { fieldErrors: Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])) });
  const { query, page } = parsed.data;
  // ILIKE with the pattern's own wildcards escaped: a search for "a_b" finds "a_b", not "axb".
  const pattern = `%${query.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  const where = query ? or(ilike(users.email, pattern), ilike(users.name, pattern)) : undefined;
  const [{ total }] = await database.select({ total: count() }).from(users).where(where);
  const rows = await database
    .select(userColumns)
    .from(users)
    .where(where)
    .orderBy(desc(users.role), asc(users.name), asc(users.email))
    .limit(USERS_PAGE_SIZE)
    .offset((page - 1) * USERS_PAGE_SIZE);
  return { ok: true, users: rows.map(toDto), total, page, pageSize: USERS_PAGE_SIZE, query };
}

export const ChangeRoleInput = z.object({
  userId: z.uuid({ error: "Choose a user." }),
  role: z.enum(roleEnum.enumValues, { error: "Choose one of the four roles." }),
});

export const SetStatusInput = z.object({
  userId: z.uuid({ error: "Choose a user." }),
  status: z.enum(["active", "disabled"], { error: "Choose active or disabled." }),
});

export async function changeRole(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ user: UserDto }>> {
  const allowed = guard(viewer, ["admin"]);
  if (!allowed.ok) return allowed;
  const admin = allowed.viewer;
  const parsed = ChangeRoleInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const { userId, role } = parsed.data;
  if (userId === admin.id) return fail("conflict", { message: "You can't change your own role: ask another admin." });
  return database.transaction(async (tx) => {
    const [before] = await tx.select({ role: users.role }).from(users).where(eq(users.id, userId)).for("update");
    if (!before) return fail("not_found", { message: "That user no longer exists." });
    const [after] = await tx.update(users).set({ role, updatedAt: sql`now()` }).where(eq(users.id, userId)).returning(userColumns);
    await writeAudit(tx, { actorId: admin.id, action: "user.role_changed", targetType: "user", targetId: userId, detail: { from: before.role, to: role } });
    return { ok: true as const, user: toDto(after) };
  });
}

/** Disabling also moves the session version on, so every open session ends at its next request. */
export async function setStatus(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ user: UserDto }>> {
  const allowed = guard(viewer, ["admin"]);
  if (!allowed.ok) return allowed;
  const admin = allowed.viewer;
  const parsed = SetStatusInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const { userId, status } = parsed.data;
  if (userId === admin.id) return fail("conflict", { message: "You can't disable your own account." });
  return database.transaction(async (tx) => {
    const [before] = await tx.select({ status: users.status }).from(users).where(eq(users.id, userId)).for("update");
    if (!before) return fail("not_found", { message: "That user no longer exists." });
    const [after] = await tx
      .update(users)
      .set({ status, updatedAt: sql`now()`, ...(status === "disabled" ? { sessionVersion: sql`${users.sessionVersion} + 1` } : {}) })
      .where(eq(users.id, userId))
      .returning(userColumns);
    await writeAudit(tx, { actorId: admin.id, action: status === "disabled" ? "user.disabled" : "user.enabled", targetType: "user", targetId: userId, detail: { from: before.status, to: status } });
    return { ok: true as const, user: toDto(after) };
  });
}

/** What /api/me returns: the viewer's own public profile. */
export type MeDto = { id: string; name: string; email: string; role: Role };
export function meDto(viewer: Viewer): MeDto {
  return { id: viewer.id, name: viewer.name, email: viewer.email, role: viewer.role };
}
