import "server-only";
// The school office's reads: each managed school's classes with their seat pools, and one class in
// full (seats, pending invitations, each apprentice's lessons and best quiz scores, the staff and
// the sibling classes) in a handful of queries. Sorting is done here, from the page's searchParams.
import { and, asc, count, eq, gt, inArray, isNull, max, ne, sql } from "drizzle-orm";
import { db as processDb, type Queryable } from "@/db/client";
import { classInvitations, classMembers, classes, lessonProgress, quizAttempts, schoolMembers, schools, users } from "@/db/schema";
import type { ClassOfficeDto, OfficeApprenticeDto, OfficeSchoolDto, OfficeSortKey, PendingInvitationDto, SeatPoolDto } from "@/lib/dto/school-office";
import { getCourse } from "@/lib/content";
import type { Result } from "./errors";
import { guard } from "./guard";
import { isFailure, managedClass } from "./managed-class";
import { percentOf } from "./progress";
import { listCourseBanks } from "./quiz-banks";
import type { Viewer } from "./viewer";

export type { ClassOfficeDto, OfficeSchoolDto, OfficeSortKey } from "@/lib/dto/school-office";

const stillPending = and(isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt), gt(classInvitations.expiresAt, sql`now()`));

function pool(purchased: number, claimed: number, pending: number): SeatPoolDto {
  return { purchased, claimed, pendingInvitations: pending, free: Math.max(0, purchased - claimed - pending) };
}

async function pendingCounts(database: Queryable, classIds: string[]): Promise<Map<string, number>> {
  if (classIds.length === 0) return new Map();
  const rows = await database.select({ classId: classInvitations.classId, n: count() }).from(classInvitations).where(and(inArray(classInvitations.classId, classIds), stillPending)).groupBy(classInvitations.classId);
  return new Map(rows.map((r) => [r.classId, r.n]));
}

/** The /school home: every class of each school the viewer manages, with its seat pool. */
export async function listOfficeSchools(viewer: Viewer | null, database: Queryable = processDb()): Promise<Result<{ schools: OfficeSchoolDto[] }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const rows = await database
    .select({ schoolId: schools.id, schoolName: schools.name, id: classes.id, name: classes.name, term: classes.term, courseSlug: classes.courseSlug, purchased: classes.seatsPurchased, claimed: classes.seatsClaimed })
    .from(schoolMembers)
    .innerJoin(schools, eq(schools.id, schoolMembers.schoolId))
    .leftJoin(classes, eq(classes.schoolId, schools.id))
    .where(and(eq(schoolMembers.userId, allowed.viewer.id), eq(schoolMembers.role, "manager")))
    .orderBy(asc(schools.name), asc(classes.name));
  const pending = await pendingCounts(database, rows.flatMap((r) => (r.id ? [r.id] : [])));
  const out = new Map<string, OfficeSchoolDto>();
  for (const r of rows) {
    const school = out.get(r.schoolId) ?? { schoolId: r.schoolId, schoolName: r.schoolName, classes: [] };
    out.set(r.schoolId, school);
    if (!r.id) continue;
    const course = await getCourse(r.courseSlug!);
    school.classes.push({ id: r.id, name: r.name!, term: r.term!, courseSlug: r.courseSlug!, courseTitle: course?.title ?? r.courseSlug!, seats: pool(r.purchased!, r.claimed!, pending.get(r.id) ?? 0), apprentices: r.claimed! });
  }
  return { ok: true, schools: [...out.values()] };
}

export function parseSort(key: unknown, dir: unknown): ClassOfficeDto["sort"] {
  const k = typeof key === "string" && (["name", "email", "progress", "last-active", "joined"].includes(key) || /^quiz:[\w-]{1,100}$/.test(key)) ? (key as OfficeSortKey) : "name";
  return { key: k, dir: dir === "desc" ? "desc" : "asc" };
}

function sortApprentices(list: OfficeApprenticeDto[], sort: ClassOfficeDto["sort"]): OfficeApprenticeDto[] {
  const value = (a: OfficeApprenticeDto): string | number | null => {
    if (sort.key === "name") return a.name.toLowerCase();
    if (sort.key === "email") return a.email;
    if (sort.key === "progress") return a.completedLessons;
    if (sort.key === "last-active") return a.lastViewedAt;
    if (sort.key === "joined") return a.joinedAt;
    return a.bestByBank[sort.key.slice(5)] ?? null;
  };
  const sign = sort.dir === "asc" ? 1 : -1;
  // Missing values (never opened, never submitted) go last either way; ties fall back to the name.
  return [...list].sort((a, b) => {
    const [x, y] = [value(a), value(b)];
    if (x !== y) {
      if (x === null) return 1;
      if (y === null) return -1;
      return (x < y ? -1 : 1) * sign;
    }
    return a.name.localeCompare(b.name);
  });
}

async function apprenticesOf(database: Queryable, classId: string, courseSlug: string, lessonIds: string[]): Promise<OfficeApprenticeDto[]> {
  const people = await database
    .select({ userId: users.id, name: users.name, email: users.email, joinedAt: classMembers.createdAt })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(and(eq(classMembers.classId, classId), eq(classMembers.role, "apprentice")));
  const ids = people.map((p) => p.userId);
  if (ids.length === 0) return [];
  const inCourse = lessonIds.length > 0 ? inArray(lessonProgress.lessonId, lessonIds) : sql`false`;
  const lessons = await database
    .select({ userId: lessonProgress.userId, done: sql<number>`count(*) filter (where ${lessonProgress.completedAt} is not null and ${inCourse})`.mapWith(Number), opened: count(), last: max(lessonProgress.lastViewedAt) })
    .from(lessonProgress)
    .where(and(inArray(lessonProgress.userId, ids), eq(lessonProgress.courseSlug, courseSlug)))
    .groupBy(lessonProgress.userId);
  const quizzes = await database
    .select({ userId: quizAttempts.userId, bankId: quizAttempts.bankId, best: max(quizAttempts.scorePercent), started: count() })
    .from(quizAttempts)
    .where(and(inArray(quizAttempts.userId, ids), eq(quizAttempts.courseSlug, courseSlug)))
    .groupBy(quizAttempts.userId, quizAttempts.bankId);
  const byUser = new Map(lessons.map((l) => [l.userId, l]));
  return people.map((p) => {
    const l = byUser.get(p.userId);
    const mine = quizzes.filter((q) => q.userId === p.userId);
    return {
      userId: p.userId,
      name: p.name,
      email: p.email,
      joinedAt: p.joinedAt.toISOString(),
      completedLessons: l?.done ?? 0,
      totalLessons: lessonIds.length,
      percent: percentOf(l?.done ?? 0, lessonIds.length),
      lastViewedAt: l?.last ? new Date(l.last).toISOString() : null,
      bestByBank: Object.fromEntries(mine.filter((q) => q.best !== null).map((q) => [q.bankId, Math.round(q.best!)])),
      started: (l?.opened ?? 0) > 0 || mine.length > 0,
    };
  });
}

async function invitationsOf(database: Queryable, classId: string): Promise<PendingInvitationDto[]> {
  const rows = await database
    .select({ id: classInvitations.id, email: classInvitations.email, name: classInvitations.name, invitedAt: classInvitations.createdAt, expiresAt: classInvitations.expiresAt, expired: sql<boolean>`${classInvitations.expiresAt} <= now()` })
    .from(classInvitations)
    .where(and(eq(classInvitations.classId, classId), isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt)))
    .orderBy(asc(classInvitations.email));
  return rows.map((r) => ({ ...r, invitedAt: r.invitedAt.toISOString(), expiresAt: r.expiresAt.toISOString() }));
}

/** One class of the viewer's school in full. Another school's class is not_found. */
export async function getClassOffice(viewer: Viewer | null, classId: string, sort: ClassOfficeDto["sort"] = { key: "name", dir: "asc" }, database: Queryable = processDb()): Promise<Result<{ office: ClassOfficeDto }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const klass = await managedClass(database, allowed.viewer.id, classId);
  if (isFailure(klass)) return klass;
  const course = await getCourse(klass.courseSlug);
  const lessonIds = (course?.modules ?? []).flatMap((m) => m.lessons.map((l) => l.id));
  const banks = await listCourseBanks(klass.courseSlug);
  const invitations = await invitationsOf(database, klass.id);
  const staff = await database
    .select({ userId: users.id, name: users.name })
    .from(schoolMembers)
    .innerJoin(users, eq(users.id, schoolMembers.userId))
    .where(and(eq(schoolMembers.schoolId, klass.schoolId), eq(schoolMembers.role, "instructor")))
    .orderBy(asc(users.name));
  const teaching = await database.select({ userId: users.id, name: users.name }).from(classMembers).innerJoin(users, eq(users.id, classMembers.userId)).where(and(eq(classMembers.classId, klass.id), eq(classMembers.role, "instructor")));
  const siblings = await database
    .select({ classId: classes.id, name: classes.name, term: classes.term, purchased: classes.seatsPurchased, claimed: classes.seatsClaimed })
    .from(classes)
    .where(and(eq(classes.schoolId, klass.schoolId), eq(classes.courseSlug, klass.courseSlug), ne(classes.id, klass.id)))
    .orderBy(asc(classes.name));
  const pending = await pendingCounts(database, [klass.id, ...siblings.map((s) => s.classId)]);
  const apprentices = sortApprentices(await apprenticesOf(database, klass.id, klass.courseSlug, lessonIds), sort);
  return {
    ok: true,
    office: {
      classId: klass.id,
      name: klass.name,
      term: klass.term,
      courseSlug: klass.courseSlug,
      courseTitle: course?.title ?? klass.courseSlug,
      schoolName: klass.schoolName,
      seats: pool(klass.seatsPurchased, klass.seatsClaimed, pending.get(klass.id) ?? 0),
      invitations,
      quizzes: banks.map((b) => ({ bankId: b.bankId, title: b.title })),
      apprentices,
      sort,
      instructors: teaching,
      instructorChoices: staff,
      siblingClasses: siblings.map((s) => ({ classId: s.classId, name: s.name, term: s.term, free: pool(s.purchased, s.claimed, pending.get(s.classId) ?? 0).free })),
    },
  };
}
