import "server-only";
import { and, asc, eq, inArray, sql, type SQL } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { classMembers, classes, schoolMembers, schools } from "@/db/schema";
import type { ClassSummaryDto, SchoolOfficeDto } from "@/lib/dto/classes";
import type { Result } from "./errors";
import { guard } from "./guard";
import type { Viewer } from "./viewer";

export type { ClassSummaryDto, SchoolOfficeDto } from "@/lib/dto/classes";

// Apprentices per class, counted in the same statement as the classes.
const apprenticeCount = sql<number>`(select count(*)::int from ${classMembers} where ${classMembers.classId} = ${classes.id} and ${classMembers.role} = 'apprentice')`;

/** The classes `which` selects, with their school and apprentice count, by name: one statement. */
async function summaries(database: Queryable, which: SQL): Promise<(ClassSummaryDto & { schoolId: string })[]> {
  return database
    .select({ id: classes.id, name: classes.name, term: classes.term, courseSlug: classes.courseSlug, schoolName: schools.name, apprentices: apprenticeCount, schoolId: classes.schoolId })
    .from(classes)
    .innerJoin(schools, eq(schools.id, classes.schoolId))
    .where(which)
    .orderBy(asc(classes.name));
}

const withoutSchoolId = ({ schoolId: _schoolId, ...summary }: ClassSummaryDto & { schoolId: string }): ClassSummaryDto => summary;

/** The classes the user belongs to in `role` (a subquery of the same statement). */
function classesOf(database: Queryable, userId: string, role: "instructor" | "apprentice"): SQL {
  return inArray(classes.id, database.select({ id: classMembers.classId }).from(classMembers).where(and(eq(classMembers.userId, userId), eq(classMembers.role, role))));
}

/** Apprentice home: the classes they belong to. */
export async function listApprenticeClasses(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ classes: ClassSummaryDto[] }>> {
  const allowed = guard(viewer, ["apprentice"]);
  if (!allowed.ok) return allowed;
  return { ok: true, classes: (await summaries(database, classesOf(database, allowed.viewer.id, "apprentice"))).map(withoutSchoolId) };
}

/** Instructor home: the classes they teach, with apprentice counts. */
export async function listInstructorClasses(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ classes: ClassSummaryDto[] }>> {
  const allowed = guard(viewer, ["instructor"]);
  if (!allowed.ok) return allowed;
  return { ok: true, classes: (await summaries(database, classesOf(database, allowed.viewer.id, "instructor"))).map(withoutSchoolId) };
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
  // Every class of every school managed, in one statement (not one per school).
  const all = mine.length === 0 ? [] : await summaries(database, inArray(classes.schoolId, mine.map((s) => s.id)));
  return { ok: true, schools: mine.map((s) => ({ schoolId: s.id, schoolName: s.name, classes: all.filter((c) => c.schoolId === s.id).map(withoutSchoolId) })) };
}
