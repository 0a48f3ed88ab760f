import "server-only";
// A class's seat pool: seats_purchased (bought by the school, lib/server/orders) and seats_claimed
// (taken by an apprentice). Every function takes the caller's transaction, so a purchase, a refund
// or a claim changes the pool together with the rest of its cause, or not at all.
// Concurrency: a claim is ONE conditional UPDATE (the row lock serialises claimers, the WHERE
// refuses the sixth of five seats); removals and invitations lock the class row first
// (SELECT … FOR UPDATE). The CHECK 0 <= seats_claimed <= seats_purchased is the backstop.
import { and, count, eq, gt, isNull, lt, sql } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { classInvitations, classMembers, classes, enrollments } from "@/db/schema";
import { fail, type Result } from "./errors";

export type SeatCounts = { seatsPurchased: number; seatsClaimed: number; pendingInvitations: number; releasable: number };

function positiveCount(n: number): boolean {
  return Number.isSafeInteger(n) && n > 0;
}

/** Invitations that still hold a seat: neither claimed nor revoked, and not yet expired. */
export function pendingInvitationFilter(classId: string) {
  return and(eq(classInvitations.classId, classId), isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt), gt(classInvitations.expiresAt, sql`now()`));
}

/** The pool as it stands (lock the class row first, `lockClass`, when you will act on the answer). */
export async function seatCounts(tx: Queryable, classId: string): Promise<SeatCounts | null> {
  const [row] = await tx.select({ seatsPurchased: classes.seatsPurchased, seatsClaimed: classes.seatsClaimed }).from(classes).where(eq(classes.id, classId));
  if (!row) return null;
  const [pending] = await tx.select({ n: count() }).from(classInvitations).where(pendingInvitationFilter(classId));
  const pendingInvitations = pending?.n ?? 0;
  return { ...row, pendingInvitations, releasable: Math.max(0, row.seatsPurchased - row.seatsClaimed - pendingInvitations) };
}

/** Takes the class row's lock for the rest of the transaction (claims, removals and invitations queue behind it). */
export async function lockClass(tx: Queryable, classId: string): Promise<boolean> {
  const rows = await tx.select({ id: classes.id }).from(classes).where(eq(classes.id, classId)).for("update");
  return rows.length > 0;
}

/** Seats nobody has claimed and no pending (unexpired) invitation holds. */
export async function releasableSeats(tx: Queryable, classId: string): Promise<number> {
  return (await seatCounts(tx, classId))?.releasable ?? 0;
}

/** Adds bought seats to the pool (fulfilment of a school order). */
export async function addSeats(tx: Queryable, classId: string, n: number): Promise<Result<{ seatsPurchased: number }>> {
  if (!positiveCount(n)) return fail("invalid_input", { message: "The number of seats must be a whole number above zero." });
  const [row] = await tx
    .update(classes)
    .set({ seatsPurchased: sql`${classes.seatsPurchased} + ${n}` })
    .where(eq(classes.id, classId))
    .returning({ seatsPurchased: classes.seatsPurchased });
  return row ? { ok: true, seatsPurchased: row.seatsPurchased } : fail("not_found", { message: "We couldn't find that class." });
}

/** Takes seats out of the pool (a refund, a move); changes nothing if fewer than `n` are releasable. */
export async function removeSeats(tx: Queryable, classId: string, n: number): Promise<Result<{ seatsPurchased: number }>> {
  if (!positiveCount(n)) return fail("invalid_input", { message: "The number of seats must be a whole number above zero." });
  if (!(await lockClass(tx, classId))) return fail("not_found", { message: "We couldn't find that class." });
  const free = await releasableSeats(tx, classId);
  if (free < n) {
    const message = `Only ${free} ${free === 1 ? "seat is" : "seats are"} free (not taken and not held by an invitation), so ${n} can't be released.`;
    return fail("conflict", { message });
  }
  const [row] = await tx
    .update(classes)
    .set({ seatsPurchased: sql`${classes.seatsPurchased} - ${n}` })
    .where(eq(classes.id, classId))
    .returning({ seatsPurchased: classes.seatsPurchased });
  return { ok: true, seatsPurchased: row.seatsPurchased };
}

/**
 * Seats a person in the class: one conditional UPDATE takes the seat, then the class_members row
 * (primary key class+user: one seat per person per class) and the enrollment on the class's
 * course (unique user+course; one they already have is kept). Run it inside a transaction.
 */
export async function claimSeat(tx: Queryable, classId: string, userId: string): Promise<Result<{ seatsClaimed: number }>> {
  const [taken] = await tx
    .update(classes)
    .set({ seatsClaimed: sql`${classes.seatsClaimed} + 1` })
    .where(and(eq(classes.id, classId), lt(classes.seatsClaimed, classes.seatsPurchased)))
    .returning({ seatsClaimed: classes.seatsClaimed, courseSlug: classes.courseSlug });
  if (!taken) return fail("conflict", { message: "There is no free seat left in this class. Ask your school to add one." });
  const joined = await tx.insert(classMembers).values({ classId, userId, role: "apprentice" }).onConflictDoNothing().returning({ userId: classMembers.userId });
  if (joined.length === 0) {
    // Already in the class (a second claim, or its instructor): give the seat back in the same transaction.
    await tx.update(classes).set({ seatsClaimed: sql`${classes.seatsClaimed} - 1` }).where(eq(classes.id, classId));
    return fail("conflict", { message: "You already have a place in this class." });
  }
  await tx.insert(enrollments).values({ userId, courseSlug: taken.courseSlug, source: "class", classId }).onConflictDoNothing();
  return { ok: true, seatsClaimed: taken.seatsClaimed };
}

/** Frees a claimed seat: the apprentice leaves the class and loses the enrollment it gave them. */
export async function releaseSeat(tx: Queryable, classId: string, userId: string): Promise<boolean> {
  const left = await tx
    .delete(classMembers)
    .where(and(eq(classMembers.classId, classId), eq(classMembers.userId, userId), eq(classMembers.role, "apprentice")))
    .returning({ userId: classMembers.userId });
  if (left.length === 0) return false;
  await tx.update(classes).set({ seatsClaimed: sql`${classes.seatsClaimed} - 1` }).where(eq(classes.id, classId));
  await tx.delete(enrollments).where(and(eq(enrollments.userId, userId), eq(enrollments.classId, classId), eq(enrollments.source, "class")));
  return true;
}
