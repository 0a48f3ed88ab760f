// Loads the invented demo scenario (db/seed-data.ts). Idempotent: existing rows are kept.
//   tsx db/seed.ts                   seed
//   tsx db/seed.ts --print-accounts  print the demo accounts (demo only)
import { and, eq, sql } from "drizzle-orm";
import { closeDb, db, type Database } from "./connection";
import { classInvitations, classMembers, classes, enrollments, lessonProgress, schoolMembers, schools, users } from "./schema";
import { DEMO_CLASSES, DEMO_INVITATION, DEMO_SCHOOL, DEMO_USERS } from "./seed-data";
import { createHash, randomBytes } from "node:crypto";
import { listLessons } from "@/lib/content";
import { hashPassword } from "@/lib/server/passwords";
import { indexContent } from "@/lib/server/search";
import { seedQuizAttempts } from "./seed-quizzes";
import { seedGraduate } from "./seed-certificates";
import { DEMO_GRADUATE } from "./seed-graduate";

/** Demo apprentices who have already worked through some lessons: how many, per course, and how long ago (days). */
const DEMO_PROGRESS: { key: string; courseSlug: string; completed: number; daysAgo: number }[] = [
  { key: "ade", courseSlug: "miking-the-band", completed: 6, daysAgo: 1 },
  { key: "ade", courseSlug: "how-microphones-hear", completed: 2, daysAgo: 3 },
  { key: "lena", courseSlug: "miking-the-band", completed: 3, daysAgo: 2 },
  { key: "marco", courseSlug: "miking-the-band", completed: 1, daysAgo: 5 },
  { key: "callum", courseSlug: "how-microphones-hear", completed: 4, daysAgo: 1 },
  { key: "noor", courseSlug: "how-microphones-hear", completed: 7, daysAgo: 4 },
];

const DAY_MS = 86_400_000;

/** Completes the first lessons of a course and leaves the next one "last opened", as if read in order. */
async function seedProgress(database: Database, ids: Map<string, string>): Promise<void> {
  for (const p of DEMO_PROGRESS) {
    const userId = ids.get(p.key)!;
    const lessons = await listLessons(p.courseSlug);
    const base = Date.now() - p.daysAgo * DAY_MS;
    const rows = lessons.slice(0, p.completed + 1).map((lesson, index) => {
      const at = new Date(base - (p.completed - index) * 3_600_000); // an hour per lesson
      return { userId, courseSlug: p.courseSlug, lessonId: lesson.id, lastViewedAt: at, completedAt: index < p.completed ? at : null };
    });
    if (rows.length > 0) await database.insert(lessonProgress).values(rows).onConflictDoNothing();
  }
}

/** The seat pool matches the seated apprentices, plus a few seats still free (never fewer than before). */
async function seedSeats(database: Database, classId: string, freeSeats: number): Promise<void> {
  const seated = sql`(select count(*)::int from ${classMembers} where ${classMembers.classId} = ${classId} and ${classMembers.role} = 'apprentice')`;
  await database
    .update(classes)
    .set({ seatsClaimed: seated, seatsPurchased: sql`greatest(${classes.seatsPurchased}, ${seated} + ${freeSeats})` })
    .where(eq(classes.id, classId));
}

/** One pending invitation, so the office shows one (its link was never mailed: only the hash is kept). */
async function seedInvitation(database: Database, schoolId: string, managerId: string): Promise<void> {
  const [klass] = await database.select({ id: classes.id }).from(classes).where(and(eq(classes.schoolId, schoolId), eq(classes.name, DEMO_INVITATION.className)));
  const tokenHash = createHash("sha256").update(randomBytes(32).toString("base64url")).digest("hex");
  await database
    .insert(classInvitations)
    .values({ classId: klass.id, email: DEMO_INVITATION.email, name: DEMO_INVITATION.name, tokenHash, invitedBy: managerId, expiresAt: new Date(Date.now() + 7 * DAY_MS) })
    .onConflictDoNothing();
}

/** Runs last, after every step that seats someone (the demo graduate joins the spring class too). */
export async function syncDemoSeats(database: Database): Promise<void> {
  const [school] = await database.select({ id: schools.id }).from(schools).where(eq(schools.slug, DEMO_SCHOOL.slug));
  for (const c of DEMO_CLASSES) {
    const [klass] = await database.select({ id: classes.id }).from(classes).where(and(eq(classes.schoolId, school.id), eq(classes.name, c.name)));
    await seedSeats(database, klass.id, c.freeSeats);
  }
}

export async function seedDemo(database: Database): Promise<void> {
  const ids = new Map<string, string>();
  for (const u of DEMO_USERS) {
    const [existing] = await database.select({ id: users.id }).from(users).where(eq(users.email, u.email));
    if (existing) {
      ids.set(u.key, existing.id);
      continue;
    }
    const [row] = await database
      .insert(users)
      .values({ name: u.name, email: u.email, role: u.role, passwordHash: await hashPassword(u.password), emailVerifiedAt: sql`now()` })
      .returning({ id: users.id });
    ids.set(u.key, row.id);
  }
  await database.insert(schools).values(DEMO_SCHOOL).onConflictDoNothing();
  const [school] = await database.select({ id: schools.id }).from(schools).where(eq(schools.slug, DEMO_SCHOOL.slug));
  const members: { key: string; role: "manager" | "instructor" | "apprentice" }[] = DEMO_USERS.filter((u) => u.role !== "admin").map((u) => ({
    key: u.key,
    role: u.role === "school_manager" ? "manager" : u.role === "instructor" ? "instructor" : "apprentice",
  }));
  await database
    .insert(schoolMembers)
    .values(members.map((m) => ({ schoolId: school.id, userId: ids.get(m.key)!, role: m.role })))
    .onConflictDoNothing();
  for (const c of DEMO_CLASSES) {
    let [klass] = await database.select({ id: classes.id }).from(classes).where(and(eq(classes.schoolId, school.id), eq(classes.name, c.name)));
    if (!klass) [klass] = await database.insert(classes).values({ schoolId: school.id, name: c.name, term: c.term, courseSlug: c.courseSlug }).returning({ id: classes.id });
    await database
      .insert(classMembers)
      .values([
        { classId: klass.id, userId: ids.get(c.instructor)!, role: "instructor" as const },
        ...c.apprentices.map((k) => ({ classId: klass.id, userId: ids.get(k)!, role: "apprentice" as const })),
      ])
      .onConflictDoNothing();
    // Every apprentice of a class has a seat on the class's course.
    await database
      .insert(enrollments)
      .values(c.apprentices.map((k) => ({ userId: ids.get(k)!, courseSlug: c.courseSlug, source: "class" as const, classId: klass.id })))
      .onConflictDoNothing();
  }
  await seedInvitation(database, school.id, ids.get("harriet")!);
  await seedProgress(database, ids);
  await indexContent(database);
}

function printAccounts() {
  console.log("Demo accounts (local demo only):");
  const seen = new Set<string>();
  for (const u of DEMO_USERS) {
    if (u.role === "apprentice" && seen.has("apprentice")) continue;
    seen.add(u.role);
    const label = u.role === "apprentice" ? "apprentice (and 11 more, same password)" : u.role.replace("_", " ");
    console.log(`  ${label.padEnd(42)} ${u.email.padEnd(40)} ${u.password}`);
  }
  console.log(`  ${"graduate (certificate ready to claim)".padEnd(42)} ${DEMO_GRADUATE.email.padEnd(40)} ${DEMO_GRADUATE.password}`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  if (process.argv.includes("--print-accounts")) {
    printAccounts();
  } else {
    const started = Date.now();
    seedDemo(db())
      .then(() => seedQuizAttempts(db()))
      .then(() => seedGraduate(db()))
      .then(() => syncDemoSeats(db()))
      .then(() => console.log(`[seed] demo scenario loaded (${Date.now() - started} ms)`))
      .catch((err) => {
        console.error("[seed] failed:", err.message);
        process.exitCode = 1;
      })
      .finally(() => closeDb());
  }
}
