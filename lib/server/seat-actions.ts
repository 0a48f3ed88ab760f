import "server-only";
// What a school manager does with seats and staff: reclaim a seat from an apprentice who hasn't
// started, move free seats or an apprentice between classes of the same course, and choose the
// class's instructor. Each is one transaction holding the class rows' locks (taken in id order, so
// two moves in opposite directions never deadlock); the seat pool's CHECK is the backstop.
import { and, count, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db as processDb, type Database, type Queryable } from "@/db/client";
import { classMembers, classes, enrollments, lessonProgress, quizAttempts, schoolMembers, users } from "@/db/schema";
import { atomically } from "./atomic";
import { fail, type Failure, type Result } from "./errors";
import { guard } from "./guard";
import { isFailure, managedClass, type ManagedClass } from "./managed-class";
import { addSeats, releaseSeat, removeSeats } from "./seat-pool";
import type { Viewer } from "./viewer";

const classId = z.uuid({ error: "Choose a class." });
const userId = z.uuid({ error: "Choose a person." });
export const ReclaimInput = z.object({ classId, userId });
export const MoveSeatsInput = z.object({ fromClassId: classId, toClassId: classId, count: z.coerce.number({ error: "Enter a number of seats." }).int({ error: "Enter a whole number of seats." }).min(1, { error: "Move at least one seat." }).max(10_000, { error: "That is more seats than a class holds." }) });
export const MoveApprenticeInput = z.object({ fromClassId: classId, toClassId: classId, userId });
export const AssignInstructorInput = z.object({ classId, userId });

function invalid(error: z.ZodError): Failure {
  const fieldErrors: Record<string, string> = {};
  for (const issue of error.issues) fieldErrors[String(issue.path[0] ?? "form")] ??= issue.message;
  return fail("invalid_input", { message: Object.values(fieldErrors)[0], fieldErrors });
}

/** Both classes, locked in id order: the manager's, distinct, of one school and one course. */
async function classPair(tx: Queryable, managerId: string, fromId: string, toId: string): Promise<{ from: ManagedClass; to: ManagedClass } | Failure> {
  if (fromId === toId) return fail("invalid_input", { message: "Choose a different class to move to.", fieldErrors: { toClassId: "Choose a different class to move to." } });
  const [first, second] = [fromId, toId].sort();
  const a = await managedClass(tx, managerId, first, true);
  if (isFailure(a)) return a;
  const b = await managedClass(tx, managerId, second, true);
  if (isFailure(b)) return b;
  const [from, to] = a.id === fromId ? [a, b] : [b, a];
  if (from.schoolId !== to.schoolId || from.courseSlug !== to.courseSlug) return fail("conflict", { message: "Seats move only between classes of the same school on the same course." });
  return { from, to };
}

/** Opened a lesson of the course or started one of its quizzes. */
async function hasStarted(tx: Queryable, who: string, courseSlug: string): Promise<boolean> {
  const [lessons] = await tx.select({ n: count() }).from(lessonProgress).where(and(eq(lessonProgress.userId, who), eq(lessonProgress.courseSlug, courseSlug)));
  const [quizzes] = await tx.select({ n: count() }).from(quizAttempts).where(and(eq(quizAttempts.userId, who), eq(quizAttempts.courseSlug, courseSlug)));
  return lessons.n + quizzes.n > 0;
}

/** Takes a seat back from an apprentice who has not started the course; the seat is free again. */
export async function reclaimSeat(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ name: string }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const parsed = ReclaimInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  const input = parsed.data;
  return atomically(database, async (tx) => {
    const klass = await managedClass(tx, allowed.viewer.id, input.classId, true);
    if (isFailure(klass)) return klass;
    const [person] = await tx.select({ name: users.name }).from(users).where(eq(users.id, input.userId));
    if (!person) return fail("not_found", { message: "That person is not an apprentice of this class." });
    if (await hasStarted(tx, input.userId, klass.courseSlug)) return fail("conflict", { message: `${person.name} has already started the course, so the seat stays theirs.` });
    if (!(await releaseSeat(tx, klass.id, input.userId))) return fail("not_found", { message: "That person is not an apprentice of this class." });
    return { ok: true, name: person.name };
  });
}

/** Moves seats nobody holds (not claimed, not held by an invitation) to another class of the same course. */
export async function moveSeats(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ moved: number; toClassName: string }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const parsed = MoveSeatsInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  const input = parsed.data;
  return atomically(database, async (tx) => {
    const pair = await classPair(tx, allowed.viewer.id, input.fromClassId, input.toClassId);
    if (isFailure(pair)) return pair;
    const removed = await removeSeats(tx, pair.from.id, input.count);
    if (!removed.ok) return removed;
    const added = await addSeats(tx, pair.to.id, input.count);
    return added.ok ? { ok: true, moved: input.count, toClassName: pair.to.name } : added;
  });
}

/** Moves an apprentice to another class of the same course; their seat (and progress) go with them. */
export async function moveApprentice(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ name: string; toClassName: string }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const parsed = MoveApprenticeInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  const input = parsed.data;
  return atomically(database, async (tx) => {
    const pair = await classPair(tx, allowed.viewer.id, input.fromClassId, input.toClassId);
    if (isFailure(pair)) return pair;
    const [person] = await tx.select({ name: users.name }).from(users).where(eq(users.id, input.userId));
    const moved = await tx
      .update(classMembers)
      .set({ classId: pair.to.id })
      .where(and(eq(classMembers.classId, pair.from.id), eq(classMembers.userId, input.userId), eq(classMembers.role, "apprentice"), sql`not exists (select 1 from ${classMembers} m where m.class_id = ${pair.to.id} and m.user_id = ${input.userId})`))
      .returning({ userId: classMembers.userId });
    if (!person || moved.length === 0) return fail("conflict", { message: "That person is not an apprentice of the first class, or is already in the other one." });
    // The seat moves with them: one fewer bought and claimed here, one more there (purchased first, for the CHECK).
    await tx.update(classes).set({ seatsPurchased: sql`${classes.seatsPurchased} - 1`, seatsClaimed: sql`${classes.seatsClaimed} - 1` }).where(eq(classes.id, pair.from.id));
    await tx.update(classes).set({ seatsPurchased: sql`${classes.seatsPurchased} + 1`, seatsClaimed: sql`${classes.seatsClaimed} + 1` }).where(eq(classes.id, pair.to.id));
    await tx.update(enrollments).set({ classId: pair.to.id }).where(and(eq(enrollments.userId, input.userId), eq(enrollments.classId, pair.from.id)));
    return { ok: true, name: person.name, toClassName: pair.to.name };
  });
}

/** Makes a school instructor the class's instructor (replacing the one before). */
export async function assignInstructor(viewer: Viewer | null, raw: unknown, database: Database = processDb()): Promise<Result<{ name: string }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const parsed = AssignInstructorInput.safeParse(raw);
  if (!parsed.success) return invalid(parsed.error);
  const input = parsed.data;
  return atomically(database, async (tx) => {
    const klass = await managedClass(tx, allowed.viewer.id, input.classId, true);
    if (isFailure(klass)) return klass;
    const [teacher] = await tx
      .select({ name: users.name })
      .from(schoolMembers)
      .innerJoin(users, eq(users.id, schoolMembers.userId))
      .where(and(eq(schoolMembers.schoolId, klass.schoolId), eq(schoolMembers.userId, input.userId), eq(schoolMembers.role, "instructor")));
    if (!teacher) return fail("invalid_input", { message: "Choose one of your school's instructors.", fieldErrors: { userId: "Choose one of your school's instructors." } });
    await tx.delete(classMembers).where(and(eq(classMembers.classId, klass.id), eq(classMembers.role, "instructor")));
    const added = await tx.insert(classMembers).values({ classId: klass.id, userId: input.userId, role: "instructor" }).onConflictDoNothing().returning({ userId: classMembers.userId });
    if (added.length === 0) return fail("conflict", { message: `${teacher.name} is an apprentice of this class and can't also teach it.` });
    return { ok: true, name: teacher.name };
  });
}
