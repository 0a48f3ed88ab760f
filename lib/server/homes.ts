import "server-only";
import { and, asc, count, eq, inArray } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { classMembers, classes, schoolMembers, schools } from "@/db/schema";
import type { ClassSummaryDto, SchoolOfficeDto } from "@/lib/dto/classes";
import type { Result } from "./errors";
import { guard } from "./guard";
import type { Viewer } from "./viewer";

export type { ClassSummaryDto, SchoolOfficeDto } from "@/lib/dto/classes";

async function summaries(database: Queryable, classIds: string[]): Promise<ClassSummaryDto[]> {
  if (classIds.length === 0) return [];
  const rows = await database
    .select({ id: classes.id, name: classes.name, term: classes.term, courseSlug: classes.courseSlug, schoolName: schools.name })
    .from(classes)
    .innerJoin(schools, eq(schools.id, classes.schoolId))
    .where(inArray(classes.id, classIds))
    .orderBy(asc(classes.name));
  const counts = await database
    .select({ classId: classMembers.classId, n: count() })
    .from(classMembers)
    .where(and(inArray(classMembers.classId, classIds), eq(classMembers.role, "apprentice")))
    .groupBy(classMembers.classId);
  const byClass = new Map(counts.map((c) => [c.classId, c.n]));
  return rows.map((r) => ({ ...r, apprentices: byClass.get(r.id) ?? 0 }));
}

async function classIdsOf(database: Queryable, userId: string, role: "instructor" | "apprentice"): Promise<string[]> {
  const rows = await database.select({ id: classMembers.classId }).from(classMembers).where(and(eq(classMembers.userId, userId), eq(classMembers.role, role)));
  return rows.map((r) => r.id);
}

/** Apprentice home: the classes they belong to. */
export async function listApprenticeClasses(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ classes: ClassSummaryDto[] }>> {
  const allowed = guard(viewer, ["apprentice"]);
  if (!allowed.ok) return allowed;
  return { ok: true, classes: await summaries(database, await classIdsOf(database, allowed.viewer.id, "apprentice")) };
}

/** Instructor home: the classes they teach, with apprentice counts. */
export async function listInstructorClasses(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ classes: ClassSummaryDto[] }>> {
  const allowed = guard(viewer, ["instructor"]);
  if (!allowed.ok) return allowed;
  return { ok: true, classes: await summaries(database, await classIdsOf(database, allowed.viewer.id, "instructor")) };
}

/** School office home: every class of each school the viewer manages. */
export async function listManagedSchools(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ schools: SchoolOfficeDto[] }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const mine = await database
    .select({ id: schools.id, name: schools.name })
    .from(schoolMembers)
    .innerJoin(schools, eq(schools.id, schoolMembers.schoolId))
    .where(and(eq(schoolMembers.userId, allowed.viewer.id), eq(schoolMembers.role, "manager")))
    .orderBy(asc(schools.name));
  const out: SchoolOfficeDto[] = [];
  for (const s of mine) {
    const ids = (await database.select({ id: classes.id }).from(classes).where(eq(classes.schoolId, s.id))).map((r) => r.id);
    out.push({ schoolId: s.id, schoolName: s.name, classes: await summaries(database, ids) });
  }
  return { ok: true, schools: out };
}
