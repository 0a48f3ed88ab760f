import "server-only";
// The per-object check of every school-office entry point: the class belongs to a school the
// viewer manages. Another school's class and no such class give the same not_found, so class ids
// can't be probed.
import { and, eq } from "drizzle-orm";
import { z } from "zod";
import type { Queryable } from "@/db/client";
import { classes, schoolMembers, schools } from "@/db/schema";
import { fail, type Failure } from "./errors";

export type ManagedClass = { id: string; schoolId: string; schoolName: string; name: string; term: string; courseSlug: string; seatsPurchased: number; seatsClaimed: number };

export const NO_SUCH_CLASS = "We couldn't find that class among the classes of your school.";

/** The class, if the manager runs its school; `lock` takes the class row's lock for the transaction. */
export async function managedClass(database: Queryable, managerId: string, classId: unknown, lock = false): Promise<ManagedClass | Failure> {
  const id = z.uuid().safeParse(classId);
  if (!id.success) return fail("not_found", { message: NO_SUCH_CLASS });
  const query = database
    .select({
      id: classes.id,
      schoolId: classes.schoolId,
      schoolName: schools.name,
      name: classes.name,
      term: classes.term,
      courseSlug: classes.courseSlug,
      seatsPurchased: classes.seatsPurchased,
      seatsClaimed: classes.seatsClaimed,
    })
    .from(classes)
    .innerJoin(schools, eq(schools.id, classes.schoolId))
    .innerJoin(schoolMembers, and(eq(schoolMembers.schoolId, classes.schoolId), eq(schoolMembers.userId, managerId), eq(schoolMembers.role, "manager")))
    .where(eq(classes.id, id.data));
  const [row] = lock ? await query.for("update", { of: classes }) : await query;
  return row ?? fail("not_found", { message: NO_SUCH_CLASS });
}

export function isFailure(x: object): x is Failure {
  return "ok" in x && (x as { ok: unknown }).ok === false;
}
