// The seat pool under concurrency, and the seat rules: one seat per person per class, releasable
// seats, reclaim before the start, moves between classes, the class's instructor.
import { afterAll, describe, expect, it } from "vitest";
import { and, eq, inArray, sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { closeDb, schema } from "@/db/connection";
import { classInvitations, classMembers, enrollments, lessonProgress, schoolMembers, users } from "@/db/schema";
import { addSeats, claimSeat, releasableSeats, removeSeats } from "@/lib/server/seat-pool";
import { assignInstructor, moveApprentice, moveSeats, reclaimSeat } from "@/lib/server/seat-actions";
import { databaseSettings } from "@/lib/env";
import { createUser, testDb } from "./helpers";
import { COURSE, OTHER_COURSE, makeClass, makeSchool, seatsOf, signedIn } from "./seats-fixtures";

afterAll(async () => {
  await closeDb();
});

const claimAlone = (classId: string, userId: string) => testDb().transaction((tx) => claimSeat(tx, classId, userId));

describe("200 concurrent claims on a 5-seat class", () => {
  it("seat exactly 5, every one of 100 rounds", async () => {
    // A pool of its own with enough connections that claims really overlap (max_connections is 100).
    const pool = new Pool({ connectionString: databaseSettings().DATABASE_URL, max: 60 });
    const racers = drizzle(pool, { schema });
    const manager = await createUser("school_manager");
    const schoolId = await makeSchool(manager.id);
    const people = await testDb()
      .insert(users)
      .values(Array.from({ length: 200 }, (_, i) => ({ email: `racer-${Date.now()}-${i}@test.example`, name: `Racer ${i}` })))
      .returning({ id: users.id });
    const seated: number[] = [];
    const started = performance.now();
    for (let round = 0; round < 100; round++) {
      const classId = await makeClass(schoolId, 5, round % 2 === 0 ? COURSE : OTHER_COURSE, `Race ${round}`);
      const results = await Promise.all(people.map((p) => racers.transaction((tx) => claimSeat(tx, classId, p.id))));
      const [{ n }] = await testDb().select({ n: sql<number>`count(*)::int` }).from(classMembers).where(eq(classMembers.classId, classId));
      expect(results.filter((r) => r.ok).length).toBe(5);
      expect(await seatsOf(classId)).toEqual({ purchased: 5, claimed: 5 });
      seated.push(n);
    }
    const seconds = (performance.now() - started) / 1000;
    await pool.end();
    expect(seated.every((n) => n === 5)).toBe(true);
    console.log(`[seats] 100 rounds × 200 concurrent claims on 5 seats (pool of 60): seated ${Math.min(...seated)}–${Math.max(...seated)} every round; ${(20_000 / seconds).toFixed(0)} claims/s, ${seconds.toFixed(1)} s`);
  }, 180_000);
});

describe("seat rules", () => {
  it("one seat per person per class, also when the same person claims 20 times at once", async () => {
    const manager = await createUser("school_manager");
    const classId = await makeClass(await makeSchool(manager.id), 3);
    const a = await createUser("apprentice");
    const results = await Promise.all(Array.from({ length: 20 }, () => claimAlone(classId, a.id)));
    expect(results.filter((r) => r.ok).length).toBe(1);
    expect(results.find((r) => !r.ok)).toMatchObject({ code: "conflict", message: "You already have a place in this class." });
    expect(await seatsOf(classId)).toEqual({ purchased: 3, claimed: 1 });
    const enrolled = await testDb().select().from(enrollments).where(eq(enrollments.userId, a.id));
    expect(enrolled).toEqual([expect.objectContaining({ courseSlug: COURSE, source: "class", classId })]);
  });

  it("the CHECK refuses more claimed than bought, whatever the code does", async () => {
    const manager = await createUser("school_manager");
    const classId = await makeClass(await makeSchool(manager.id), 1);
    await expect(testDb().execute(sql`update classes set seats_claimed = 2 where id = ${classId}`)).rejects.toMatchObject({ cause: { constraint: "classes_seats_check" } });
    await expect(testDb().execute(sql`update classes set seats_claimed = -1 where id = ${classId}`)).rejects.toMatchObject({ cause: { constraint: "classes_seats_check" } });
  });

  it("releasable seats leave out claimed seats and pending invitations; removeSeats changes nothing when short", async () => {
    const manager = await createUser("school_manager");
    const classId = await makeClass(await makeSchool(manager.id), 0);
    expect(await testDb().transaction((tx) => addSeats(tx, classId, 4))).toEqual({ ok: true, seatsPurchased: 4 });
    expect(await claimAlone(classId, (await createUser()).id)).toMatchObject({ ok: true });
    const soon = new Date(Date.now() + 3_600_000);
    await testDb().insert(classInvitations).values([
      { classId, email: "held@test.example", tokenHash: `h-${Date.now()}-1`, expiresAt: soon },
      // Expired and revoked invitations hold nothing.
      { classId, email: "old@test.example", tokenHash: `h-${Date.now()}-2`, expiresAt: new Date(Date.now() - 1000) },
      { classId, email: "gone@test.example", tokenHash: `h-${Date.now()}-3`, expiresAt: soon, revokedAt: new Date() },
    ]);
    expect(await releasableSeats(testDb(), classId)).toBe(2);
    expect(await testDb().transaction((tx) => removeSeats(tx, classId, 3))).toMatchObject({ ok: false, code: "conflict", message: expect.stringContaining("Only 2 seats are free") });
    expect(await seatsOf(classId)).toEqual({ purchased: 4, claimed: 1 });
    expect(await testDb().transaction((tx) => removeSeats(tx, classId, 2))).toEqual({ ok: true, seatsPurchased: 2 });
    for (const bad of [0, -5, 1.5, Number.NaN]) expect(await testDb().transaction((tx) => removeSeats(tx, classId, bad))).toMatchObject({ code: "invalid_input" });
  });
});

describe("manager actions", () => {
  it("reclaims a seat only from an apprentice who has not started", async () => {
    const manager = await signedIn("school_manager");
    const classId = await makeClass(await makeSchool(manager.id), 2);
    const fresh = await createUser();
    const reader = await createUser();
    for (const u of [fresh, reader]) expect((await claimAlone(classId, u.id)).ok).toBe(true);
    await testDb().insert(lessonProgress).values({ userId: reader.id, courseSlug: COURSE, lessonId: "les-mtb-order-of-work", lastViewedAt: new Date() });
    expect(await reclaimSeat(manager.viewer, { classId, userId: reader.id })).toMatchObject({ ok: false, code: "conflict", message: expect.stringContaining("already started") });
    expect(await reclaimSeat(manager.viewer, { classId, userId: fresh.id })).toMatchObject({ ok: true, name: "Test apprentice" });
    expect(await seatsOf(classId)).toEqual({ purchased: 2, claimed: 1 });
    expect(await testDb().select().from(enrollments).where(eq(enrollments.userId, fresh.id))).toEqual([]);
    expect(await reclaimSeat(manager.viewer, { classId, userId: fresh.id })).toMatchObject({ code: "not_found" });
  });

  it("moves free seats and an apprentice with their seat between classes of one course, never across courses or schools", async () => {
    const manager = await signedIn("school_manager");
    const schoolId = await makeSchool(manager.id);
    const a = await makeClass(schoolId, 3, COURSE, "A");
    const b = await makeClass(schoolId, 1, COURSE, "B");
    const other = await makeClass(schoolId, 5, OTHER_COURSE, "C");
    const elsewhere = await makeClass(await makeSchool((await createUser("school_manager")).id), 5, COURSE, "D");
    const learner = await createUser();
    expect((await claimAlone(a, learner.id)).ok).toBe(true);
    expect(await moveSeats(manager.viewer, { fromClassId: a, toClassId: b, count: 3 })).toMatchObject({ code: "conflict", message: expect.stringContaining("Only 2 seats") });
    expect(await moveSeats(manager.viewer, { fromClassId: a, toClassId: b, count: "2" })).toMatchObject({ ok: true, moved: 2, toClassName: "B" });
    expect([await seatsOf(a), await seatsOf(b)]).toEqual([{ purchased: 1, claimed: 1 }, { purchased: 3, claimed: 0 }]);
    expect(await moveSeats(manager.viewer, { fromClassId: b, toClassId: other, count: 1 })).toMatchObject({ code: "conflict", message: expect.stringContaining("same course") });
    expect(await moveSeats(manager.viewer, { fromClassId: b, toClassId: elsewhere, count: 1 })).toMatchObject({ code: "not_found" });
    for (const count of [0, -5, 1e9, 5.5, "x"]) expect(await moveSeats(manager.viewer, { fromClassId: b, toClassId: a, count })).toMatchObject({ code: "invalid_input" });

    expect(await moveApprentice(manager.viewer, { fromClassId: a, toClassId: b, userId: learner.id })).toMatchObject({ ok: true, toClassName: "B" });
    expect([await seatsOf(a), await seatsOf(b)]).toEqual([{ purchased: 0, claimed: 0 }, { purchased: 4, claimed: 1 }]);
    const [enrolled] = await testDb().select().from(enrollments).where(eq(enrollments.userId, learner.id));
    expect(enrolled.classId).toBe(b);
    expect(await moveApprentice(manager.viewer, { fromClassId: a, toClassId: b, userId: learner.id })).toMatchObject({ code: "conflict" });
  });

  it("assigns a school instructor, and no one else, as the class's instructor", async () => {
    const manager = await signedIn("school_manager");
    const schoolId = await makeSchool(manager.id);
    const classId = await makeClass(schoolId, 1);
    const [first, second, outsider] = [await createUser("instructor"), await createUser("instructor"), await createUser("instructor")];
    await testDb().insert(schoolMembers).values([first, second].map((u) => ({ schoolId, userId: u.id, role: "instructor" as const })));
    expect(await assignInstructor(manager.viewer, { classId, userId: first.id })).toMatchObject({ ok: true });
    expect(await assignInstructor(manager.viewer, { classId, userId: second.id })).toMatchObject({ ok: true });
    expect(await assignInstructor(manager.viewer, { classId, userId: outsider.id })).toMatchObject({ code: "invalid_input", message: "Choose one of your school's instructors." });
    const teaching = await testDb().select({ userId: classMembers.userId }).from(classMembers).where(and(eq(classMembers.classId, classId), eq(classMembers.role, "instructor")));
    expect(teaching).toEqual([{ userId: second.id }]);
    expect(await testDb().select().from(classMembers).where(inArray(classMembers.userId, [first.id, outsider.id]))).toEqual([]);
  });
});
