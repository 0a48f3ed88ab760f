import "server-only";
import { desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db, type Queryable } from "@/db/client";
import { auditLog, users } from "@/db/schema";
import type { Result } from "./errors";
import { guard } from "./guard";
import type { Viewer } from "./viewer";

/** Called inside the transaction of the change it records, so the entry and the change commit together. */
export async function writeAudit(
  tx: Pick<Queryable, "insert">,
  entry: { actorId: string | null; action: string; targetType: string; targetId: string; detail?: Record<string, unknown> },
): Promise<void> {
  await tx.insert(auditLog).values({ ...entry, detail: entry.detail ?? {} });
}

export type AuditEntryDto = { id: string; actorId: string | null; action: string; targetType: string; targetId: string; detail: Record<string, unknown>; createdAtUtc: string; actorName: string | null; targetName: string | null };

/** The newest audit entries, for admins. */
export async function listAudit(viewer: Viewer | null, options: { limit?: number } = {}, database: Queryable = db()): Promise<Result<{ entries: AuditEntryDto[] }>> {
  const allowed = guard(viewer, ["admin"]);
  if (!allowed.ok) return allowed;
  const actor = alias(users, "actor");
  const target = alias(users, "target");
  const rows = await database
    .select({ entry: auditLog, actorName: actor.name, targetName: target.name })
    .from(auditLog)
    .leftJoin(actor, eq(actor.id, auditLog.actorId))
    .leftJoin(target, sql`${auditLog.targetType} = 'user' and ${target.id}::text = ${auditLog.targetId}`)
    .orderBy(desc(auditLog.createdAt))
    .limit(Math.min(Math.max(1, Math.trunc(options.limit ?? 50)), 500));
  const entries = rows.map(({ entry: r, actorName, targetName }) => ({
    id: r.id,
    actorId: r.actorId,
    action: r.action,
    targetType: r.targetType,
    targetId: r.targetId,
    detail: r.detail,
    createdAtUtc: r.createdAt.toISOString(),
    actorName,
    targetName,
  }));
  return { ok: true, entries };
}
