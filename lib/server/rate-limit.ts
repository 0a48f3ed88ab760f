import "server-only";
import { and, asc, count, eq, gt, inArray, lt, sql } from "drizzle-orm";
import { rateLimitEvents } from "@/db/schema";
import type { Database } from "@/db/client";

export type Limit = { bucket: string; max: number; windowSeconds: number };
type Rule = { max: number; windowSeconds: number };
type Scope = "account" | "address" | "accountAddress";

const MINUTE = 60;
const HOUR = 60 * MINUTE;

/**
 * Throttling policy (OWASP ASVS 5.0 V6.3.1: brute force and credential stuffing are slowed
 * without letting an attacker lock the owner out). Counted in PostgreSQL, so every app instance
 * agrees. Sign-in failures are limited per (account, address), so guesses from elsewhere never
 * block the owner's own address; a slow per-account ceiling (100 failures an hour, the figure of
 * ASVS 4.0.3 V2.2.1) stops a distributed guesser, and the e-mail link, limited separately, always
 * remains a way in. Requests that send mail are limited per account too (nobody's inbox is flooded).
 */
export const LIMITS = {
  signInFailures: { accountAddress: { max: 5, windowSeconds: 15 * MINUTE }, address: { max: 20, windowSeconds: 15 * MINUTE }, account: { max: 100, windowSeconds: HOUR } },
  resetRequests: { account: { max: 3, windowSeconds: 15 * MINUTE }, address: { max: 10, windowSeconds: 15 * MINUTE } },
  linkRequests: { account: { max: 3, windowSeconds: 15 * MINUTE }, address: { max: 10, windowSeconds: 15 * MINUTE } },
  tokenFailures: { address: { max: 20, windowSeconds: 15 * MINUTE } },
  signUps: { account: { max: 3, windowSeconds: HOUR }, address: { max: 10, windowSeconds: HOUR } },
  // The "you already have an account" mail: at most one an hour per address it goes to.
  accountExistsMail: { account: { max: 1, windowSeconds: HOUR } },
  passwordChanges: { account: { max: 5, windowSeconds: 15 * MINUTE } },
  // Certificate look-ups on /verify (by client address). A code that exists gives its slot back, so an
  // employer re-checking real codes is never slowed; 60 unknown codes in 15 minutes are. Codes have
  // 60 random bits (lib/certificates/code.ts): the limit is for the database, not for guessing.
  verifyLookups: { address: { max: 60, windowSeconds: 15 * MINUTE } },
  // A school manager's invitation rosters (each at most 200 addresses, lib/server/roster.ts): 20 an
  // hour, so one account can't turn the school office into a mailer.
  invitationRosters: { account: { max: 20, windowSeconds: HOUR } },
  // Photo upload requests (each up to 6 photos): room for a busy session with retries, not a flood of storage.
  photoUploads: { account: { max: 40, windowSeconds: HOUR }, address: { max: 120, windowSeconds: HOUR } },
} as const satisfies Record<string, Partial<Record<Scope, Rule>>>;

export type LimitedAction = keyof typeof LIMITS;

/** The buckets an action counts in, for this account (an e-mail or user id) and client address. */
export function limitsFor(action: LimitedAction, account: string | null, address: string): Limit[] {
  const rules: Partial<Record<Scope, Rule>> = LIMITS[action];
  const out: Limit[] = [];
  if (rules.address) out.push({ bucket: `${action}:address:${address}`, ...rules.address });
  if (account && rules.account) out.push({ bucket: `${action}:account:${account}`, ...rules.account });
  if (account && rules.accountAddress) out.push({ bucket: `${action}:account-address:${account}|${address}`, ...rules.accountAddress });
  return out;
}

export type Slot = { ok: true; eventIds: string[] } | { ok: false; retryAfterSeconds: number };

/**
 * Counts and decides in one step: inside a transaction, each bucket is locked (a transaction-level
 * advisory lock, taken in a fixed order so two callers never deadlock), counted, and, if every
 * bucket has room, charged with one event. Thirty concurrent calls against a limit of five get
 * exactly five slots. A caller whose attempt turns out fine gives its slot back (refundSlots).
 */
export async function takeSlot(db: Database, limits: Limit[]): Promise<Slot> {
  if (limits.length === 0) return { ok: true, eventIds: [] };
  const ordered = [...limits].sort((a, b) => a.bucket.localeCompare(b.bucket));
  return db.transaction(async (tx) => {
    for (const l of ordered) await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${l.bucket}, 0))`);
    let wait = 0;
    for (const l of ordered) wait = Math.max(wait, await secondsUntilRoom(tx, l));
    if (wait > 0) return { ok: false as const, retryAfterSeconds: wait };
    const rows = await tx.insert(rateLimitEvents).values(ordered.map((l) => ({ bucket: l.bucket }))).returning({ id: rateLimitEvents.id });
    return { ok: true as const, eventIds: rows.map((r) => r.id) };
  });
}

/** A successful sign-in (or a token that worked) does not count against anyone. */
export async function refundSlot(db: Pick<Database, "delete">, slot: Slot): Promise<void> {
  if (slot.ok && slot.eventIds.length > 0) await db.delete(rateLimitEvents).where(inArray(rateLimitEvents.id, slot.eventIds));
}

/** Seconds until this bucket has room again, or 0 when it has room now. */
async function secondsUntilRoom(tx: Pick<Database, "select">, limit: Limit): Promise<number> {
  const since = sql`now() - make_interval(secs => ${limit.windowSeconds})`;
  const inWindow = and(eq(rateLimitEvents.bucket, limit.bucket), gt(rateLimitEvents.createdAt, since));
  const [{ n }] = await tx.select({ n: count() }).from(rateLimitEvents).where(inWindow);
  if (n < limit.max) return 0;
  // Room comes back when the event that put the bucket at its limit leaves the window.
  const [row] = await tx
    .select({ wait: sql<number>`extract(epoch from ${rateLimitEvents.createdAt} + make_interval(secs => ${limit.windowSeconds}) - now())::float8` })
    .from(rateLimitEvents)
    .where(inWindow)
    .orderBy(asc(rateLimitEvents.createdAt))
    .offset(n - limit.max)
    .limit(1);
  return Math.max(1, Math.ceil(row?.wait ?? limit.windowSeconds));
}

/**
 * Drops the events no window can see any more: older than the longest window in LIMITS. The
 * worker runs it every 10 minutes (lib/jobs). Returns how many rows went.
 */
export async function pruneRateLimitEvents(db: Database, now = new Date()): Promise<number> {
  const rules: Rule[] = Object.values(LIMITS).flatMap((scopes) => Object.values(scopes));
  const longestSeconds = Math.max(...rules.map((r) => r.windowSeconds));
  const cutoff = new Date(now.getTime() - longestSeconds * 1000);
  const result = await db.delete(rateLimitEvents).where(lt(rateLimitEvents.createdAt, cutoff));
  return result.rowCount ?? 0;
}
