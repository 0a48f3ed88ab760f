import "server-only";
import { and, asc, count, eq, inArray } from "drizzle-orm";
import type { Database } from "@/db/client";
import { classMembers, classes, schoolMembers, schools } from "@/db/schema";
import { assertRole, type Viewer } from "./viewer";

export type ClassSummaryDto = { id: string; name: string; term: string; courseSlug: string; schoolName: string; apprentices: number };

async function summaries(db: Database, classIds: string[]): Promise<ClassSummaryDto[]> {
  if (classIds.length === 0) return [];
  const rows = await db
    .select({ id: classes.id, name: classes.name, term: classes.term, courseSlug: classes.courseSlug, schoolName: schools.name })
    .from(classes)
    .innerJoin(schools, eq(schools.id, classes.schoolId))
    .where(inArray(classes.id, classIds))
    .orderBy(asc(classes.name));
  const counts = await db
    .select({ classId: classMembers.classId, n: count() })
    .from(classMembers)
    .where(and(inArray(classMembers.classId, classIds), eq(classMembers.role, "apprentice")))
    .groupBy(classMembers.classId);
  const byClass = new Map(counts.map((c) => [c.classId, c.n]));
  return rows.map((r) => ({ ...r, apprentices: byClass.get(r.id) ?? 0 }));
}

async function classIdsOf(db: Database, userId: string, role: "instructor" | "apprentice"): Promise<string[]> {
  const rows = await db.select({ id: classMembers.classId }).from(classMembers).where(and(eq(classMembers.userId, userId), eq(classMembers.role, role)));
  return rows.map((r) => r.id);
}

/** Apprentice home: the classes they belong to. */
export async function apprenticeClasses(db: Database, viewer: Viewer | null): Promise<ClassSummaryDto[]> {
  const v = assertRole(viewer, "apprentice");
  return summaries(db, await classIdsOf(db, v.id, "apprentice"));
}

/** Instructor home: the classes they teach, with apprentice counts. */
export async function instructorClasses(db: Database, viewer: Viewer | null): Promise<ClassSummaryDto[]> {
  const v = assertRole(viewer, "instructor");
  return summaries(db, await classIdsOf(db, v.id, "instructor"));
}

export type SchoolOfficeDto = { schoolId: string; schoolName: string; classes: ClassSummaryDto[] };

/** School office home: every class of each school the viewer manages. */
export async function managedSchools(db: Database, viewer: Viewer | null): Promise<SchoolOfficeDto[]> {
  const v = assertRole(viewer, "school_manager");
  const mine = await db
    .select({ id: schools.id, name: schools.name })
    .from(schoolMembers)
    .innerJoin(schools, eq(schools.id, schoolMembers.schoolId))
    .where(and(eq(schoolMembers.userId, v.id), eq(schoolMembers.role, "manager")))
    .orderBy(asc(schools.name));
  const out: SchoolOfficeDto[] = [];
  for (const s of mine) {
    const ids = (await db.select({ id: classes.id }).from(classes).where(eq(classes.schoolId, s.id))).map((r) => r.id);
    out.push({ schoolId: s.id, schoolName: s.name, classes: await summaries(db, ids) });
  }
  return out;
}
