import "server-only";
import { and, count, eq, gt, lt, min } from "drizzle-orm";
import { rateLimitEvents } from "@/db/schema";
import type { Database } from "@/db/client";

export type Limit = { bucket: string; max: number; windowSeconds: number };

/** Limits per action: per account and per address, counted in PostgreSQL so every server process agrees. */
export const LIMITS = {
  signInFailures: { account: 5, address: 20, windowSeconds: 15 * 60 },
  resetRequests: { account: 3, address: 10, windowSeconds: 15 * 60 },
  linkRequests: { account: 3, address: 10, windowSeconds: 15 * 60 },
  tokenFailures: { account: 10, address: 20, windowSeconds: 15 * 60 },
} as const;

export function limitsFor(action: keyof typeof LIMITS, account: string | null, address: string): Limit[] {
  const l = LIMITS[action];
  const limits: Limit[] = [{ bucket: `${action}:address:${address}`, max: l.address, windowSeconds: l.windowSeconds }];
  if (account) limits.push({ bucket: `${action}:account:${account}`, max: l.account, windowSeconds: l.windowSeconds });
  return limits;
}

/** Seconds until the caller may try again, or 0 when every limit has room. */
export async function retryAfterSeconds(db: Database, limits: Limit[], now = new Date()): Promise<number> {
  let wait = 0;
  for (const limit of limits) {
    const since = new Date(now.getTime() - limit.windowSeconds * 1000);
    const [row] = await db
      .select({ n: count(), oldest: min(rateLimitEvents.createdAt) })
      .from(rateLimitEvents)
      .where(and(eq(rateLimitEvents.bucket, limit.bucket), gt(rateLimitEvents.createdAt, since)));
    if (row && row.n >= limit.max && row.oldest) {
      const freeAt = new Date(row.oldest).getTime() + limit.windowSeconds * 1000;
      wait = Math.max(wait, Math.ceil((freeAt - now.getTime()) / 1000));
    }
  }
  return wait;
}

export async function recordAttempt(db: Pick<Database, "insert">, limits: Limit[]): Promise<void> {
  if (limits.length === 0) return;
  await db.insert(rateLimitEvents).values(limits.map((l) => ({ bucket: l.bucket })));
}

/** Old events are dropped now and then; the window never looks back further than a day. */
export async function pruneRateLimitEvents(db: Database): Promise<void> {
  await db.delete(rateLimitEvents).where(lt(rateLimitEvents.createdAt, new Date(Date.now() - 24 * 3600 * 1000)));
}
