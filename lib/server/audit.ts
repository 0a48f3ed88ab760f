import "server-only";
import { desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Database } from "@/db/client";
import { auditLog, users } from "@/db/schema";
import { assertRole, type Viewer } from "./viewer";

export async function writeAudit(
  tx: Pick<Database, "insert">,
  entry: { actorId: string | null; action: string; targetType: string; targetId: string; detail?: Record<string, unknown> },
): Promise<void> {
  await tx.insert(auditLog).values({ ...entry, detail: entry.detail ?? {} });
}

export type AuditEntryDto = { id: string; actorId: string | null; action: string; targetType: string; targetId: string; detail: Record<string, unknown>; createdAtUtc: string; actorName: string | null; targetName: string | null };

export async function listAudit(db: Database, viewer: Viewer | null, limit = 50): Promise<AuditEntryDto[]> {
  assertRole(viewer, "admin");
  const actor = alias(users, "actor");
  const target = alias(users, "target");
  const rows = await db
    .select({ entry: auditLog, actorName: actor.name, targetName: target.name })
    .from(auditLog)
    .leftJoin(actor, eq(actor.id, auditLog.actorId))
    .leftJoin(target, sql`${auditLog.targetType} = 'user' and ${target.id}::text = ${auditLog.targetId}`)
    .orderBy(desc(auditLog.createdAt))
    .limit(limit);
  return rows.map(({ entry: r, actorName, targetName }) => ({
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
}
