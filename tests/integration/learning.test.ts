// Lessons behind a seat, lesson progress and search, against the real PostgreSQL test database.
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { classMembers, classes, enrollments, lessonProgress, schools, searchDocuments, type Role } from "@/db/schema";
import { listAllLessons } from "@/lib/content";
import { statusOf } from "@/lib/server/errors";
import { getLessonBody, SEAT_NEEDED_MESSAGE } from "@/lib/server/lessons";
import { getProgressOverview, listClassProgress, markLessonComplete } from "@/lib/server/progress";
import { indexContent, searchContent } from "@/lib/server/search";
import type { Viewer } from "@/lib/server/viewer";
import { createUser, testDb } from "./helpers";

const COURSE = "miking-the-band";
const PREVIEW = "les-mtb-order-of-work"; // the course's first lesson: preview: true
const LOCKED = "les-mtb-kick-snare-hihat";
const LOCKED_TEXT = "Theo plays a four-piece kit"; // the first sentence of the locked lesson's body

async function viewer(role: Role): Promise<Viewer> {
  const u = await createUser(role);
  return { id: u.id, email: u.email, name: `Test ${role}`, role, sessionId: randomUUID() };
}

let enrolled: Viewer; // apprentice with a seat on COURSE, in the class
let seatless: Viewer; // apprentice without a seat
let teacher: Viewer; // instructor of the class
let otherTeacher: Viewer; // instructor of another class, on another course
let classId: string;
let otherClassId: string;

beforeAll(async () => {
  const db = testDb();
  await indexContent();
  [enrolled, seatless, teacher, otherTeacher] = await Promise.all([viewer("apprentice"), viewer("apprentice"), viewer("instructor"), viewer("instructor")]);
  const [school] = await db.insert(schools).values({ slug: `learning-${Date.now()}`, name: "Learning Test School" }).returning();
  [{ id: classId }] = await db.insert(classes).values({ schoolId: school.id, name: "Band class", term: "Test", courseSlug: COURSE }).returning();
  [{ id: otherClassId }] = await db.insert(classes).values({ schoolId: school.id, name: "Mics class", term: "Test", courseSlug: "how-microphones-hear" }).returning();
  await db.insert(classMembers).values([
    { classId, userId: teacher.id, role: "instructor" },
    { classId, userId: enrolled.id, role: "apprentice" },
    { classId: otherClassId, userId: otherTeacher.id, role: "instructor" },
  ]);
  await db.insert(enrollments).values({ userId: enrolled.id, courseSlug: COURSE, source: "class", classId });
});

afterAll(async () => {
  await closeDb();
});

describe("getLessonBody: locked lessons leave the server only after an access check", () => {
  it("gives a preview lesson to anyone, signed out included", async () => {
    const r = await getLessonBody(null, { courseSlug: COURSE, lessonId: PREVIEW });
    expect(r.ok).toBe(true);
  });

  it("answers a signed-out visitor 401 with a sentence and a sign-in link, and no body", async () => {
    const r = await getLessonBody(null, { courseSlug: COURSE, lessonId: LOCKED });
    expect(r).toMatchObject({ ok: false, code: "not_signed_in", signInHref: `/sign-in?next=${encodeURIComponent(`/courses/${COURSE}/${LOCKED}`)}` });
    if (!r.ok) expect(statusOf(r.code)).toBe(401);
    expect(JSON.stringify(r)).not.toContain(LOCKED_TEXT);
  });

  it("answers a signed-in apprentice without a seat 403, asking for a seat", async () => {
    const r = await getLessonBody(seatless, { courseSlug: COURSE, lessonId: LOCKED });
    expect(r).toEqual({ ok: false, code: "forbidden", message: SEAT_NEEDED_MESSAGE });
    expect(SEAT_NEEDED_MESSAGE).toBe("This lesson is part of the course; ask your school for a seat.");
  });

  it("gives an enrolled apprentice the body as a tree and remembers the visit", async () => {
    const r = await getLessonBody(enrolled, { courseSlug: COURSE, lessonId: LOCKED });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(JSON.stringify(r.lesson.tree)).toContain(LOCKED_TEXT);
    expect(r.lesson.completedAt).toBeNull();
    const [row] = await testDb()
      .select()
      .from(lessonProgress)
      .where(and(eq(lessonProgress.userId, enrolled.id), eq(lessonProgress.lessonId, LOCKED)));
    expect(row.lastViewedAt).toBeInstanceOf(Date);
    expect(row.completedAt).toBeNull();
  });

  it("lets the instructor of a class on the course read it, but not an instructor of another course", async () => {
    expect((await getLessonBody(teacher, { courseSlug: COURSE, lessonId: LOCKED })).ok).toBe(true);
    expect(await getLessonBody(otherTeacher, { courseSlug: COURSE, lessonId: LOCKED })).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("says not found for an unknown lesson, a lesson asked for under the wrong course, or a malformed id", async () => {
    for (const ref of [
      { courseSlug: COURSE, lessonId: "les-nope" },
      { courseSlug: "how-microphones-hear", lessonId: LOCKED },
      { courseSlug: COURSE, lessonId: "../etc/passwd" },
    ]) {
      expect(await getLessonBody(enrolled, ref)).toMatchObject({ ok: false, code: "not_found" });
    }
  });
});

describe("markLessonComplete", () => {
  const input = { courseSlug: COURSE, lessonId: LOCKED };

  it("refuses visitors, apprentices without a seat and instructors, and writes nothing for them", async () => {
    expect(await markLessonComplete(null, input)).toMatchObject({ ok: false, code: "not_signed_in" });
    expect(await markLessonComplete(seatless, input)).toMatchObject({ ok: false, code: "forbidden", message: SEAT_NEEDED_MESSAGE });
    expect(await markLessonComplete(teacher, input)).toMatchObject({ ok: false, code: "forbidden" });
    const rows = await testDb().select().from(lessonProgress).where(eq(lessonProgress.userId, seatless.id));
    expect(rows).toEqual([]);
  });

  it("validates its input", async () => {
    expect(await markLessonComplete(enrolled, { courseSlug: COURSE })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await markLessonComplete(enrolled, { courseSlug: COURSE, lessonId: "les-nope" })).toMatchObject({ ok: false, code: "not_found" });
    expect(await markLessonComplete(enrolled, { courseSlug: "how-microphones-hear", lessonId: LOCKED })).toMatchObject({ ok: false, code: "not_found" });
  });

  it("marks complete once (a second time keeps the first time), and can be undone", async () => {
    const first = await markLessonComplete(enrolled, input);
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    expect(first.completedAt).not.toBeNull();
    const again = await markLessonComplete(enrolled, input);
    expect(again).toEqual({ ok: true, completedAt: first.completedAt });
    expect(await markLessonComplete(enrolled, { ...input, completed: false })).toEqual({ ok: true, completedAt: null });
    expect((await markLessonComplete(enrolled, input)).ok).toBe(true);
    const body = await getLessonBody(enrolled, input);
    expect(body.ok && body.lesson.completedAt).toBeTruthy();
  });

  it("creates the progress row when the lesson was never opened", async () => {
    const r = await markLessonComplete(enrolled, { courseSlug: COURSE, lessonId: PREVIEW });
    expect(r.ok).toBe(true);
  });
});

describe("getProgressOverview", () => {
  it("gives an enrolled apprentice percentages per course and module, and where to continue", async () => {
    const r = await getProgressOverview(enrolled);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.courses.map((c) => c.courseSlug)).toEqual([COURSE]);
    const course = r.courses[0];
    const total = (await listAllLessons()).filter((l) => l.courseSlug === COURSE).length;
    expect(course).toMatchObject({ completedLessons: 2, totalLessons: total, percent: Math.floor((2 / total) * 100) });
    expect(course.completedLessonIds.sort()).toEqual([LOCKED, PREVIEW].sort());
    expect(course.modules.find((m) => m.slug === "setup")).toMatchObject({ completedLessons: 1, totalLessons: 3, percent: 33 });
    expect(course.modules.find((m) => m.slug === "drums")).toMatchObject({ completedLessons: 1, totalLessons: 3, percent: 33 });
    // the last lesson touched (PREVIEW, marked complete last) is done, so "continue" is the next unfinished one after it
    expect(course.continueLesson?.lessonId).toBe("les-mtb-input-list");
  });

  it("is empty for an apprentice without a seat and refused when signed out", async () => {
    expect(await getProgressOverview(seatless)).toEqual({ ok: true, courses: [] });
    expect(await getProgressOverview(null)).toMatchObject({ ok: false, code: "not_signed_in" });
  });
});

describe("listClassProgress", () => {
  it("shows the instructor each apprentice of their class with their progress", async () => {
    const result = await listClassProgress(teacher, classId);
    if (!result.ok) throw new Error(`expected the class, got ${result.code}`);
    const r = result.progress;
    expect(r).toMatchObject({ classId, courseSlug: COURSE, courseTitle: "Miking the band" });
    expect(r.apprentices).toHaveLength(1);
    expect(r.apprentices[0]).toMatchObject({ userId: enrolled.id, completedLessons: 2 });
    expect(r.apprentices[0].modulePercents.setup).toBe(33);
    expect(JSON.stringify(r)).not.toMatch(/password|email/i);
  });

  it("is 'not found' for an instructor who does not teach that class, as for no such class", async () => {
    for (const [who, id] of [
      [otherTeacher, classId],
      [teacher, otherClassId],
      [teacher, randomUUID()],
      [teacher, "not-a-uuid"],
    ] as const) {
      expect(await listClassProgress(who, id)).toMatchObject({ ok: false, code: "not_found" });
    }
  });

  it("is refused to other roles and to visitors before any class is looked up", async () => {
    expect(await listClassProgress(enrolled, classId)).toMatchObject({ ok: false, code: "forbidden" });
    expect(await listClassProgress(null, classId)).toMatchObject({ ok: false, code: "not_signed_in" });
  });
});

describe("search", () => {
  it("indexes every lesson and glossary term, idempotently", async () => {
    const lessons = await listAllLessons();
    const first = await indexContent();
    const second = await indexContent();
    expect(second).toEqual(first);
    const [{ n }] = (await testDb().execute<{ n: number }>(sql`select count(*)::int as n from ${searchDocuments}`)).rows;
    expect(n).toBe(first.documents);
    expect(first.documents).toBeGreaterThan(lessons.length);
  });

  it("finds glossary terms and highlights the words that matched", async () => {
    const r = await searchContent(null, { q: "phantom power" });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.results.find((x) => x.id === "term:phantom-power")).toMatchObject({ kind: "term", href: "/glossary#phantom-power", locked: false });
    // a definition is shown whole, with the matching words marked
    const activeDi = r.results.find((x) => x.id === "term:active-di");
    expect(activeDi!.snippet.map((p) => p.text).join("")).toMatch(/^A direct box with a powered buffer amplifier/);
    expect(activeDi!.snippet.filter((p) => p.hit).map((p) => p.text.toLowerCase())).toEqual(expect.arrayContaining(["phantom", "power"]));
  });

  it("never matches or quotes a locked body for a visitor without access", async () => {
    // "Theo" (the band's drummer) appears in lesson bodies, never in a title, summary, objective or heading.
    const visitor = await searchContent(null, { q: "Theo" });
    const seatlessResult = await searchContent(seatless, { q: "Theo" });
    const member = await searchContent(enrolled, { q: "Theo" });
    if (!visitor.ok || !seatlessResult.ok || !member.ok) throw new Error("search failed");
    const lockedLessonIds = new Set((await listAllLessons()).filter((l) => !l.preview).map((l) => `lesson:${l.id}`));
    for (const res of [visitor, seatlessResult]) {
      expect(res.results.filter((x) => lockedLessonIds.has(x.id))).toEqual([]);
      expect(res.results.some((x) => x.id === `lesson:${PREVIEW}`)).toBe(true);
    }
    const hit = member.results.find((x) => x.id === `lesson:${LOCKED}`);
    expect(hit).toMatchObject({ locked: false });
    expect(hit!.snippet.some((p) => p.hit && p.text === "Theo")).toBe(true);
  });

  it("matches a locked lesson on its public shell and marks it as needing a seat", async () => {
    const r = await searchContent(null, { q: "hi-hat" });
    if (!r.ok) throw new Error("search failed");
    expect(r.results.find((x) => x.id === `lesson:${LOCKED}`)).toMatchObject({ locked: true });
  });

  it("finds by word prefix and refuses a query too short to mean anything", async () => {
    const r = await searchContent(null, { q: "cardio" });
    expect(r.ok && r.results.some((x) => x.id === "term:cardioid")).toBe(true);
    expect(await searchContent(null, { q: "a" })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await searchContent(null, { q: "x".repeat(201) })).toMatchObject({ ok: false, code: "invalid_input" });
    // characters that mean something in tsquery syntax are only text
    expect((await searchContent(null, { q: "null & | ! ( ) :*" })).ok).toBe(true);
  });
});
