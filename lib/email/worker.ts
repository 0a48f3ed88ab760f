import "server-only";
import { and, asc, eq, inArray, lte, sql } from "drizzle-orm";
import { mailOutbox } from "@/db/schema";
import type { Database } from "@/db/client";
import type { MailTransport } from "./transport";

export const MAX_ATTEMPTS = 8;

/** Exponential backoff: 5 s, 10 s, 20 s ... capped at 30 minutes. */
export function backoffMs(attempts: number): number {
  return Math.min(5_000 * 2 ** Math.max(0, attempts - 1), 30 * 60_000);
}

/**
 * Sends what is due. Rows are claimed with FOR UPDATE SKIP LOCKED, so two workers never send
 * the same message; a failure schedules a retry and records the error.
 */
export async function drainOutbox(db: Database, transport: MailTransport, from: string, batch = 20): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  await db.transaction(async (tx) => {
    const due = await tx
      .select()
      .from(mailOutbox)
      .where(and(eq(mailOutbox.status, "pending"), lte(mailOutbox.nextAttemptAt, sql`now()`)))
      .orderBy(asc(mailOutbox.createdAt))
      .limit(batch)
      .for("update", { skipLocked: true });
    for (const m of due) {
      try {
        await transport.send({ from, to: m.toAddress, subject: m.subject, text: m.text, html: m.html });
        await tx.update(mailOutbox).set({ status: "sent", sentAt: sql`now()`, attempts: m.attempts + 1, lastError: null }).where(eq(mailOutbox.id, m.id));
        sent++;
      } catch (err) {
        const attempts = m.attempts + 1;
        await tx
          .update(mailOutbox)
          .set({
            attempts,
            lastError: err instanceof Error ? err.message.slice(0, 500) : String(err),
            status: attempts >= MAX_ATTEMPTS ? "failed" : "pending",
            nextAttemptAt: new Date(Date.now() + backoffMs(attempts)),
          })
          .where(eq(mailOutbox.id, m.id));
        failed++;
      }
    }
  });
  return { sent, failed };
}

export async function pendingMailIds(db: Database): Promise<string[]> {
  const rows = await db.select({ id: mailOutbox.id }).from(mailOutbox).where(inArray(mailOutbox.status, ["pending"]));
  return rows.map((r) => r.id);
}
