import "server-only";
// Extra time on a timed quiz, given by an apprentice's instructor (WCAG 2.2 SC 2.2.1).
import { and, eq, isNull, not, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { z } from "zod";
import { db as processDb, type Database } from "@/db/client";
import { classMembers, classes, quizAttempts, quizTimeExtensions } from "@/db/schema";
import { idSchema } from "@/lib/assessment";
import { closeOverdueAttempts, overdue } from "./attempts";
import { writeAudit } from "./audit";
import { fail, type Result } from "./errors";
import { getBankEntry } from "./quiz-banks";
import type { Viewer } from "./viewer";

export const GrantExtensionInput = z.object({
  userId: z.uuid({ error: "Choose an apprentice." }),
  bankId: idSchema,
  // 0 removes the extension; four hours is far beyond any quiz here.
  extraMinutes: z.coerce.number({ error: "Enter a number of minutes." }).int({ error: "Use whole minutes." }).min(0, { error: "Use 0 or more minutes." }).max(240, { error: "Use at most 240 minutes." }),
});

export type ExtensionDto = { userId: string; bankId: string; extraMinutes: number; openAttemptsExtended: number };

/**
 * Extra time on a timed quiz for one apprentice of a class the instructor teaches on that
 * course (WCAG 2.2 SC 2.2.1). It also moves the deadline of an attempt still under way; an
 * attempt whose time had already run out is graded and closed first (overdue attempts are
 * otherwise closed only when next touched), so extra time never reopens it.
 */
export async function grantExtension(viewer: Viewer | null, raw: unknown, db: Database = processDb()): Promise<Result<ExtensionDto>> {
  if (!viewer) return fail("not_signed_in");
  if (viewer.role !== "instructor") return fail("forbidden", { message: "Only an apprentice's instructor can give extra time." });
  const parsed = GrantExtensionInput.safeParse(raw);
  if (!parsed.success) {
    const fieldErrors = Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message]));
    return fail("invalid_input", { fieldErrors });
  }
  const { userId, bankId, extraMinutes } = parsed.data;
  const entry = await getBankEntry(bankId);
  if (!entry) return fail("not_found", { message: "There is no such quiz." });
  const limit = entry.bank.settings.timeLimitMinutes;
  if (limit === null) return fail("invalid_input", { message: "This quiz has no time limit, so no extra time is needed." });

  const teacher = alias(classMembers, "teacher");
  const learner = alias(classMembers, "learner");
  const [shared] = await db
    .select({ classId: classes.id })
    .from(classes)
    .innerJoin(teacher, and(eq(teacher.classId, classes.id), eq(teacher.userId, viewer.id), eq(teacher.role, "instructor")))
    .innerJoin(learner, and(eq(learner.classId, classes.id), eq(learner.userId, userId), eq(learner.role, "apprentice")))
    .where(eq(classes.courseSlug, entry.courseSlug))
    .limit(1);
  if (!shared) return fail("forbidden", { message: "You can give extra time only to apprentices in a class you teach on this course." });

  return db.transaction(async (tx): Promise<Result<ExtensionDto>> => {
    await tx
      .insert(quizTimeExtensions)
      .values({ userId, bankId, extraMinutes, grantedBy: viewer.id })
      .onConflictDoUpdate({ target: [quizTimeExtensions.userId, quizTimeExtensions.bankId], set: { extraMinutes, grantedBy: viewer.id, createdAt: sql`now()` } });
    await closeOverdueAttempts(tx, userId, bankId);
    // `overdue` again: now() is the transaction's start, so this is the same moment as the closing.
    const moved = await tx
      .update(quizAttempts)
      .set({ deadlineAt: sql`${quizAttempts.startedAt} + ${limit + extraMinutes}::double precision * interval '1 minute'` })
      .where(and(eq(quizAttempts.userId, userId), eq(quizAttempts.bankId, bankId), isNull(quizAttempts.submittedAt), not(overdue)))
      .returning({ id: quizAttempts.id });
    await writeAudit(tx, { actorId: viewer.id, action: "quiz.extension_granted", targetType: "user", targetId: userId, detail: { bankId, extraMinutes } });
    return { ok: true, userId, bankId, extraMinutes, openAttemptsExtended: moved.length };
  });
}
