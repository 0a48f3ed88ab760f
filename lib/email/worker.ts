import "server-only";
import { hostname } from "node:os";
import { randomUUID } from "node:crypto";
import { and, asc, eq, gte, inArray, lt, lte, or, sql } from "drizzle-orm";
import { mailOutbox } from "@/db/schema";
import type { Database } from "@/db/client";
import { messageIdFor } from "./message-id";
import type { MailTransport } from "./transport";

export const MAX_ATTEMPTS = 8;

/**
 * How long a claimed row stays with its worker. It is renewed just before each message is
 * handed to SMTP, so it only has to outlast one send (SMTP_TIMEOUTS_MS in transport.ts add up to
 * 100 s); if the worker dies, the row is due again when the lease runs out.
 */
export const LEASE_SECONDS = 300;

/** Exponential backoff: 5 s, 10 s, 20 s ... capped at 30 minutes. */
export function backoffMs(attempts: number): number {
  return Math.min(5_000 * 2 ** Math.max(0, attempts - 1), 30 * 60_000);
}

/** This process, as it signs its leases. */
export const WORKER_ID = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;

type OutboxRow = typeof mailOutbox.$inferSelect;
export type DrainOptions = { workerId?: string; leaseSeconds?: number; signal?: AbortSignal };
export type DrainResult = { sent: number; failed: number; released: number; lostLease: number };

const now = sql`now()`;
const secondsFromNow = (seconds: number) => sql`now() + make_interval(secs => ${seconds})`;

/** Due: pending and its time has come, or claimed by a worker whose lease ran out. */
const isDue = or(
  and(eq(mailOutbox.status, "pending"), lte(mailOutbox.nextAttemptAt, now)),
  and(eq(mailOutbox.status, "sending"), lte(mailOutbox.leaseUntil, now)),
);

export async function hasDueMail(db: Database): Promise<boolean> {
  const rows = await db.select({ id: mailOutbox.id }).from(mailOutbox).where(isDue).limit(1);
  return rows.length > 0;
}

/**
 * Claims up to `batch` due rows for `workerId` in one autocommitted statement: the rows are
 * picked with FOR UPDATE SKIP LOCKED (two workers never pick the same row) and leave the
 * statement marked "sending" with a lease, so no lock outlives it. Counts the attempt now, so a
 * message that kills its worker every time still ends as failed.
 */
export async function claimDueMail(db: Database, workerId: string, batch: number, leaseSeconds = LEASE_SECONDS): Promise<OutboxRow[]> {
  const picked = db.$with("picked").as(
    db
      .select({ id: mailOutbox.id })
      .from(mailOutbox)
      .where(and(isDue, lt(mailOutbox.attempts, MAX_ATTEMPTS)))
      .orderBy(asc(mailOutbox.createdAt))
      .limit(batch)
      .for("update", { skipLocked: true }),
  );
  const rows = await db
    .with(picked)
    .update(mailOutbox)
    .set({ status: "sending", claimedBy: workerId, leaseUntil: secondsFromNow(leaseSeconds), attempts: sql`${mailOutbox.attempts} + 1` })
    .from(picked)
    .where(eq(mailOutbox.id, picked.id))
    .returning();
  return rows.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
}

/** A row whose worker died on its last allowed attempt is given up, not sent again. */
async function failAbandoned(db: Database): Promise<void> {
  await db
    .update(mailOutbox)
    .set({ status: "failed", leaseUntil: null, lastError: "The worker stopped while sending on the last attempt (its lease ran out)." })
    .where(and(eq(mailOutbox.status, "sending"), lte(mailOutbox.leaseUntil, now), gte(mailOutbox.attempts, MAX_ATTEMPTS)));
}

const heldBy = (id: string, workerId: string) => and(eq(mailOutbox.id, id), eq(mailOutbox.claimedBy, workerId), eq(mailOutbox.status, "sending"));

/**
 * Renews the lease just before sending and fixes the Message-ID at the first attempt. Returns
 * the Message-ID to send with, or null when the row is no longer ours (its lease ran out and
 * another worker took it).
 */
async function renewLease(db: Database, row: OutboxRow, workerId: string, leaseSeconds: number, from: string): Promise<string | null> {
  const [r] = await db
    .update(mailOutbox)
    .set({ leaseUntil: secondsFromNow(leaseSeconds), messageId: sql`coalesce(${mailOutbox.messageId}, ${messageIdFor(row.id, from)})` })
    .where(heldBy(row.id, workerId))
    .returning({ messageId: mailOutbox.messageId });
  return r?.messageId ?? null;
}

async function markSent(db: Database, id: string, workerId: string): Promise<boolean> {
  const rows = await db
    .update(mailOutbox)
    .set({ status: "sent", sentAt: now, leaseUntil: null, lastError: null })
    .where(heldBy(id, workerId))
    .returning({ id: mailOutbox.id });
  return rows.length > 0;
}

async function markFailed(db: Database, row: OutboxRow, workerId: string, err: unknown): Promise<void> {
  await db
    .update(mailOutbox)
    .set({
      status: row.attempts >= MAX_ATTEMPTS ? "failed" : "pending",
      nextAttemptAt: secondsFromNow(backoffMs(row.attempts) / 1000),
      claimedBy: null,
      leaseUntil: null,
      lastError: err instanceof Error ? err.message.slice(0, 500) : String(err).slice(0, 500),
    })
    .where(heldBy(row.id, workerId));
}

/** Hands rows we claimed but did not try back, uncounted (the worker is stopping). */
async function release(db: Database, ids: string[], workerId: string): Promise<number> {
  if (ids.length === 0) return 0;
  const rows = await db
    .update(mailOutbox)
    .set({ status: "pending", claimedBy: null, leaseUntil: null, attempts: sql`${mailOutbox.attempts} - 1` })
    .where(and(inArray(mailOutbox.id, ids), eq(mailOutbox.claimedBy, workerId), eq(mailOutbox.status, "sending")))
    .returning({ id: mailOutbox.id });
  return rows.length;
}

/**
 * Sends what is due. Claim (a short statement that commits), then each message over SMTP
 * outside any transaction, then mark it sent: a stalled relay holds no lock and blocks nobody.
 * A failure schedules a retry with backoff; a worker that dies leaves a lease that runs out.
 */
export async function drainOutbox(db: Database, transport: MailTransport, from: string, batch = 20, options: DrainOptions = {}): Promise<DrainResult> {
  const { workerId = WORKER_ID, leaseSeconds = LEASE_SECONDS, signal } = options;
  const result: DrainResult = { sent: 0, failed: 0, released: 0, lostLease: 0 };
  await failAbandoned(db);
  const claimed = await claimDueMail(db, workerId, batch, leaseSeconds);
  for (const [i, row] of claimed.entries()) {
    if (signal?.aborted) {
      result.released = await release(db, claimed.slice(i).map((r) => r.id), workerId);
      break;
    }
    const messageId = await renewLease(db, row, workerId, leaseSeconds, from);
    if (!messageId) {
      result.lostLease++;
      continue;
    }
    try {
      await transport.send({ from, to: row.toAddress, subject: row.subject, text: row.text, html: row.html, messageId });
    } catch (err) {
      await markFailed(db, row, workerId, err);
      result.failed++;
      continue;
    }
    // Not ours any more after a successful send: the lease ran out mid-send and another worker
    // may send it again (same Message-ID). Reported so the lease can be lengthened.
    if (await markSent(db, row.id, workerId)) result.sent++;
    else result.lostLease++;
  }
  return result;
}
