// The authorization matrix of the data-access layer: every entry point that app/ calls, as each
// role, with the outcome asserted exactly. An allowed call is checked for the data it returns (the
// instructor's class progress lists the class's apprentice; the admin's user list holds the user),
// a refused one for its exact code. Pages, route handlers and server actions call exactly these
// functions, so this matrix is their authorization too.
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, desc, eq, isNull } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { closeDb, schema } from "@/db/connection";
import { auditLog, authTokens, classMembers, classes, enrollments, schoolMembers, schools, sessions, users, type Role } from "@/db/schema";
import type { ErrorCode, Ok, Result } from "@/lib/dto/result";
import { listAllLessons } from "@/lib/content";
import {
  changePassword,
  passwordStatus,
  requestPasswordReset,
  requestSignInLink,
  resetPassword,
  signInWithLink,
  signInWithPassword,
  signOut,
  signOutEverywhere,
  signUp,
  verifyEmail,
} from "@/lib/server/accounts";
import { listAudit } from "@/lib/server/audit";
import { checkHealth } from "@/lib/server/health";
import { listApprenticeClasses, listInstructorClasses, listManagedSchools } from "@/lib/server/homes";
import { getLessonBody } from "@/lib/server/lessons";
import { getProgressOverview, listClassProgress, markLessonComplete } from "@/lib/server/progress";
import { getAttemptView, getResult, saveAnswer, startAttempt, submitAttempt } from "@/lib/server/attempts";
import { getBankEntry } from "@/lib/server/quiz-banks";
import { grantExtension } from "@/lib/server/quiz-extensions";
import { listAvailableQuizzes, listMyAttempts } from "@/lib/server/quiz-history";
import { getBankStatistics, listExtensionTargets, listStatsBanks } from "@/lib/server/quiz-stats";
import { indexContent, searchContent } from "@/lib/server/search";
import { newToken } from "@/lib/server/tokens";
import { changeRole, listUsers, setStatus } from "@/lib/server/users";
import type { Viewer } from "@/lib/server/viewer";
import { uniqueEmail } from "../support/unique";
import { keyAnswerForView } from "../support/view-answer";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";
import { prepareSeats, seatsAnotherSchoolsManager, SEAT_MATRIX, SEAT_NOT_ENTRY_POINTS, SEAT_PUBLIC } from "./authorization-seats";
import { anotherSchoolsManager, closePayments, PAYMENT_MATRIX, PAYMENT_NOT_ENTRY_POINTS, PAYMENT_PUBLIC, preparePayments } from "./authorization-payments";
import { closeUploads, prepareUploads, UPLOAD_MATRIX } from "./authorization-uploads";
import { PLACEMENT_MATRIX, placementStrangerCases, preparePlacements } from "./authorization-placements";
import { CERTIFICATE_MATRIX, CERTIFICATE_NOT_ENTRY_POINTS, CERTIFICATE_PUBLIC, prepareCertificates } from "./authorization-certificates";

type Who = "anonymous" | Role;
const WHO: Who[] = ["anonymous", "apprentice", "instructor", "school_manager", "admin"];
const SIGNED_IN: Who[] = ["apprentice", "instructor", "school_manager", "admin"];

const COURSE = "miking-the-band";
const PREVIEW = "les-mtb-order-of-work"; // preview: true
const LOCKED = "les-mtb-kick-snare-hihat"; // needs a seat
const LOCKED_TEXT = "Theo plays a four-piece kit"; // in the locked lesson's body only
const MODULE_BANK = "bank-miking-the-band-setup"; // untimed
const FINAL_BANK = "bank-miking-the-band-final"; // timed

const viewers = new Map<Who, Viewer | null>();
const as = (who: Who) => viewers.get(who)!;
let target: { id: string; email: string; password: string };
let classId: string;
// The apprentice's attempts: open on the module quiz, submitted on it earlier, open on the final.
const attempts = { open: "", submitted: "", final: "" };

async function signedIn(role: Role): Promise<{ viewer: Viewer; token: string; password: string }> {
  const u = await createUser(role);
  const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error(`sign-in failed: ${s.code}`);
  return { viewer: (await viewerFromToken(s.sessionToken))!, token: s.sessionToken, password: u.password };
}

/** A token as the e-mail would carry it, issued here so the matrix needs no SMTP. */
async function issueToken(userId: string, kind: "verify_email" | "reset_password" | "sign_in_link"): Promise<string> {
  const { token, tokenHash } = newToken();
  await testDb().insert(authTokens).values({ userId, kind, tokenHash, expiresAt: new Date(Date.now() + 600_000) });
  return token;
}

beforeAll(async () => {
  viewers.set("anonymous", null);
  for (const role of ["apprentice", "instructor", "school_manager", "admin"] as const) viewers.set(role, (await signedIn(role)).viewer);
  target = await createUser("apprentice");
  // A school and a class on COURSE: the instructor teaches it, the apprentice is in it with a seat,
  // the manager runs the school.
  const [school] = await testDb().insert(schools).values({ slug: `matrix-${Date.now()}`, name: "Matrix Test School" }).returning();
  [{ id: classId }] = await testDb().insert(classes).values({ schoolId: school.id, name: "Matrix class", term: "Test", courseSlug: COURSE }).returning();
  await testDb().insert(schoolMembers).values({ schoolId: school.id, userId: as("school_manager")!.id, role: "manager" });
  await testDb().insert(classMembers).values([
    { classId, userId: as("instructor")!.id, role: "instructor" },
    { classId, userId: as("apprentice")!.id, role: "apprentice" },
  ]);
  await testDb().insert(enrollments).values({ userId: as("apprentice")!.id, courseSlug: COURSE, source: "class", classId });
  await indexContent();

  const apprentice = as("apprentice");
  const start = async (bankId: string) => {
    const r = await startAttempt(apprentice, { bankId });
    if (!r.ok) throw new Error(`start failed: ${r.code}`);
    return r.attemptId;
  };
  attempts.submitted = await start(MODULE_BANK);
  if (!(await submitAttempt(apprentice, { attemptId: attempts.submitted })).ok) throw new Error("submit failed");
  attempts.open = await start(MODULE_BANK);
  attempts.final = await start(FINAL_BANK);
  await preparePayments(as("school_manager")!, classId);
  await prepareSeats(as("school_manager")!, as("apprentice")!);
  await prepareUploads(as("apprentice")!);
  await preparePlacements(as("apprentice")!);
  await prepareCertificates(as("instructor")!);
});

afterAll(async () => {
  await closePayments();
  await closeUploads();
  await closeDb();
});

// ------------------------------------------------------------------------------------ the matrix

type Entry = {
  name: string;
  run: (viewer: Viewer | null, who: Who) => Promise<Result<object>>;
  allowed: Who[];
  check: (result: Ok<object>, who: Who) => void | Promise<void>;
  denied: Partial<Record<Who, ErrorCode>>;
};

/** One entry point: who may call it and what they get, and the exact code everyone else gets. */
function entry<T extends object>(e: {
  name: string;
  run: (viewer: Viewer | null, who: Who) => Promise<Result<T>>;
  allowed: Who[];
  check: (result: Ok<T>, who: Who) => void | Promise<void>;
  denied: Partial<Record<Who, ErrorCode>>;
}): Entry {
  return e as unknown as Entry;
}

/** The usual refusal of a role-restricted function: signed out 401, any other role 403. */
function onlyFor(...allowed: Who[]): Partial<Record<Who, ErrorCode>> {
  return Object.fromEntries(WHO.filter((w) => !allowed.includes(w)).map((w) => [w, w === "anonymous" ? "not_signed_in" : "forbidden"]));
}

// Sign-out and password changes end sessions: each run signs in a fresh person of the role.
let fresh: { viewer: Viewer; token: string; password: string } | null = null;
async function freshViewer(viewer: Viewer | null): Promise<Viewer | null> {
  fresh = viewer ? await signedIn(viewer.role) : null;
  return fresh?.viewer ?? null;
}

const MATRIX: Entry[] = [
  entry({
    name: "listUsers (admin: users page)",
    // Searched by the target's address: the first page holds 50 accounts, staff first, and other
    // test files create many staff accounts before this one runs.
    run: (v) => listUsers(v, { query: target.email }),
    allowed: ["admin"],
    check: (r) => {
      expect(r.users.find((u) => u.id === target.id)).toMatchObject({ email: target.email, role: "apprentice", status: "active" });
      // A DTO, never the row: no password hash or session version can leave.
      expect(Object.keys(r.users[0]).sort()).toEqual(["createdAtUtc", "email", "emailVerified", "id", "name", "role", "status"]);
    },
    denied: onlyFor("admin"),
  }),
  entry({
    name: "changeRole (admin action)",
    run: (v) => changeRole(v, { userId: target.id, role: "apprentice" }),
    allowed: ["admin"],
    check: (r) => expect(r.user).toMatchObject({ id: target.id, role: "apprentice" }),
    denied: onlyFor("admin"),
  }),
  entry({
    name: "setStatus (admin action)",
    run: (v) => setStatus(v, { userId: target.id, status: "active" }),
    allowed: ["admin"],
    check: (r) => expect(r.user).toMatchObject({ id: target.id, status: "active" }),
    denied: onlyFor("admin"),
  }),
  entry({
    name: "listAudit (admin: audit page)",
    run: (v) => listAudit(v, { limit: 500 }),
    allowed: ["admin"],
    // The admin's changeRole and setStatus above are in it, with the people named.
    check: (r) => {
      const mine = r.entries.filter((e) => e.targetId === target.id);
      expect(mine.map((e) => e.action)).toEqual(expect.arrayContaining(["user.role_changed", "user.enabled"]));
      expect(mine[0]).toMatchObject({ actorId: as("admin")!.id, targetName: "Test apprentice" });
    },
    denied: onlyFor("admin"),
  }),
  entry({
    name: "listApprenticeClasses (apprentice home)",
    run: (v) => listApprenticeClasses(v),
    allowed: ["apprentice"],
    check: (r) => expect(r.classes.map((c) => c.name)).toEqual(["Matrix class"]),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "listInstructorClasses (instructor home)",
    run: (v) => listInstructorClasses(v),
    allowed: ["instructor"],
    check: (r) => expect(r.classes).toEqual([expect.objectContaining({ id: classId, name: "Matrix class", apprentices: 1, schoolName: "Matrix Test School" })]),
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "listManagedSchools (school office home)",
    run: (v) => listManagedSchools(v),
    allowed: ["school_manager"],
    check: (r) => {
      expect(r.schools.map((s) => s.schoolName)).toEqual(["Matrix Test School"]);
      // The seat rows (authorization-seats.ts) add two classes of their own to the school.
      expect(r.schools[0].classes.map((c) => c.name)).toEqual(["Matrix class", "Seat matrix class", "Seat matrix sibling"]);
    },
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "listClassProgress (instructor: class page)",
    run: (v) => listClassProgress(v, classId),
    allowed: ["instructor"],
    check: (r) => {
      expect(r.progress).toMatchObject({ classId, courseSlug: COURSE, name: "Matrix class" });
      expect(r.progress.apprentices.map((a) => a.userId)).toEqual([as("apprentice")!.id]);
    },
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "getProgressOverview (GET /api/progress)",
    run: (v) => getProgressOverview(v),
    // Any signed-in role may ask; without a seat there is nothing to show.
    allowed: SIGNED_IN,
    check: (r, who) => expect(r.courses.map((c) => c.courseSlug)).toEqual(who === "apprentice" ? [COURSE] : []),
    denied: { anonymous: "not_signed_in" },
  }),
  entry({
    name: "markLessonComplete (lesson page action)",
    run: (v) => markLessonComplete(v, { courseSlug: COURSE, lessonId: PREVIEW }),
    allowed: ["apprentice"],
    check: (r) => expect(Date.parse(r.completedAt!)).toBeGreaterThan(0),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "getLessonBody (GET /api/lessons/…), a locked lesson",
    run: (v) => getLessonBody(v, { courseSlug: COURSE, lessonId: LOCKED }),
    // A seat, teaching a class on the course, or admin.
    allowed: ["apprentice", "instructor", "admin"],
    check: (r) => {
      expect(r.lesson).toMatchObject({ courseSlug: COURSE, lessonId: LOCKED });
      expect(JSON.stringify(r.lesson.tree)).toContain(LOCKED_TEXT);
    },
    denied: { anonymous: "not_signed_in", school_manager: "forbidden" },
  }),
  entry({
    name: "searchContent (search page)",
    run: (v) => searchContent(v, { q: "Theo" }),
    // Everyone may search; a locked body is matched only for those who may read it.
    allowed: WHO,
    check: (r, who) => {
      const readsLocked = who === "apprentice" || who === "instructor" || who === "admin";
      expect(r.results.some((x) => x.id === `lesson:${LOCKED}`)).toBe(readsLocked);
      expect(r.results.some((x) => x.id === `lesson:${PREVIEW}`)).toBe(true);
    },
    denied: {},
  }),
  entry({
    name: "startAttempt (quiz list action, POST /api/quizzes/…/attempts)",
    run: (v) => startAttempt(v, { bankId: MODULE_BANK }),
    // The open attempt is resumed, not a second one spent.
    allowed: ["apprentice"],
    check: (r) => expect(r).toMatchObject({ attemptId: attempts.open, resumed: true }),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "getAttemptView (quiz player page, GET /api/attempts/…)",
    run: (v) => getAttemptView(v, attempts.open),
    allowed: ["apprentice"],
    check: (r) => {
      expect(r.view).toMatchObject({ attemptId: attempts.open, bankId: MODULE_BANK, status: "in_progress", result: null });
      expect(r.view.questions.length).toBeGreaterThan(0);
    },
    // Someone else's attempt is not found, the same as no attempt.
    denied: { anonymous: "not_signed_in", instructor: "not_found", school_manager: "not_found", admin: "not_found" },
  }),
  entry({
    name: "saveAnswer (PUT /api/attempts/…/answers/…)",
    run: async (v) => {
      // The first question as the owner sees it, answered in its presented ids.
      const owned = await getAttemptView(as("apprentice"), attempts.open);
      if (!owned.ok) throw new Error(owned.code);
      const shown = owned.view.questions[0];
      const question = (await getBankEntry(MODULE_BANK))!.questionsById.get(shown.id)!;
      return saveAnswer(v, { attemptId: attempts.open, questionId: shown.id, seq: 1, answer: keyAnswerForView(question, shown) });
    },
    allowed: ["apprentice"],
    check: (r) => expect(r).toMatchObject({ seq: 1, stale: false }),
    denied: { anonymous: "not_signed_in", instructor: "not_found", school_manager: "not_found", admin: "not_found" },
  }),
  entry({
    name: "submitAttempt (POST /api/attempts/…/submit)",
    run: (v) => submitAttempt(v, { attemptId: attempts.final }),
    allowed: ["apprentice"],
    check: (r) => expect(r).toMatchObject({ alreadySubmitted: false, result: { attemptId: attempts.final, bankId: FINAL_BANK } }),
    denied: { anonymous: "not_signed_in", instructor: "not_found", school_manager: "not_found", admin: "not_found" },
  }),
  entry({
    name: "getResult (GET /api/attempts/…/result)",
    run: (v) => getResult(v, attempts.submitted),
    allowed: ["apprentice"],
    check: (r) => expect(r.result).toMatchObject({ attemptId: attempts.submitted, bankId: MODULE_BANK, percent: 0 }),
    denied: { anonymous: "not_signed_in", instructor: "not_found", school_manager: "not_found", admin: "not_found" },
  }),
  entry({
    name: "listMyAttempts (quizzes page, GET /api/attempts)",
    run: (v) => listMyAttempts(v),
    // Any signed-in role may ask for their own; only the apprentice has any.
    allowed: SIGNED_IN,
    check: (r, who) => {
      if (who !== "apprentice") return expect(r.attempts).toEqual([]);
      expect(r.attempts.map((a) => a.attemptId)).toEqual(expect.arrayContaining([attempts.open, attempts.submitted, attempts.final]));
      expect(r.attempts.find((a) => a.attemptId === attempts.submitted)).toMatchObject({ status: "submitted", percent: 0 });
    },
    denied: { anonymous: "not_signed_in" },
  }),
  entry({
    name: "listAvailableQuizzes (quizzes page)",
    run: (v) => listAvailableQuizzes(v),
    allowed: SIGNED_IN,
    check: (r, who) => {
      if (who !== "apprentice") return expect(r.courses).toEqual([]);
      expect(r.courses.map((c) => c.courseSlug)).toEqual([COURSE]);
      expect(r.courses[0].quizzes.find((q) => q.bankId === MODULE_BANK)).toMatchObject({ openAttemptId: attempts.open, attemptsUsed: 2 });
    },
    denied: { anonymous: "not_signed_in" },
  }),
  entry({
    name: "grantExtension (item statistics action, POST /api/quizzes/…/extensions)",
    run: (v) => grantExtension(v, { userId: as("apprentice")!.id, bankId: FINAL_BANK, extraMinutes: 10 }),
    // Only the apprentice's own instructor.
    allowed: ["instructor"],
    check: (r) => expect(r).toMatchObject({ userId: as("apprentice")!.id, bankId: FINAL_BANK, extraMinutes: 10 }),
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "listStatsBanks (instructor: quiz statistics)",
    run: (v) => listStatsBanks(v),
    // The instructor sees the banks of the course they teach; an admin every course's.
    allowed: ["instructor", "admin"],
    check: (r, who) => {
      const banks = r.banks.map((b) => b.bankId);
      expect(banks).toEqual(expect.arrayContaining([MODULE_BANK, FINAL_BANK]));
      if (who === "instructor") expect(new Set(r.banks.map((b) => b.courseSlug))).toEqual(new Set([COURSE]));
    },
    denied: onlyFor("instructor", "admin"),
  }),
  entry({
    name: "getBankStatistics (instructor: item statistics, one class)",
    run: (v) => getBankStatistics(v, { bankId: MODULE_BANK, classId }),
    allowed: ["instructor", "admin"],
    check: (r) => {
      expect(r.stats).toMatchObject({ bankId: MODULE_BANK, courseSlug: COURSE, scope: { classId, label: "Matrix class" } });
      expect(r.stats.classes.map((c) => c.id)).toContain(classId);
    },
    denied: onlyFor("instructor", "admin"),
  }),
  entry({
    name: "listExtensionTargets (instructor: extra time form)",
    run: (v) => listExtensionTargets(v, { bankId: FINAL_BANK }),
    allowed: ["instructor"],
    // With the 10 minutes grantExtension gave above (entries run in order).
    check: (r) => expect(r.targets).toEqual([{ userId: as("apprentice")!.id, name: "Test apprentice", className: "Matrix class", extraMinutes: 10 }]),
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "passwordStatus (account page)",
    run: (v) => passwordStatus(v),
    allowed: SIGNED_IN,
    check: (r) => expect(r.hasPassword).toBe(true),
    denied: { anonymous: "not_signed_in" },
  }),
  entry({
    name: "changePassword (POST /api/account/password)",
    run: async (v) => changePassword(await freshViewer(v), { currentPassword: fresh?.password, newPassword: "a matrix passphrase" }),
    allowed: SIGNED_IN,
    // The new cookie works; the session it replaced does not.
    check: async (r) => {
      expect((await viewerFromToken(r.sessionToken))?.id).toBe(fresh!.viewer.id);
      expect(await viewerFromToken(fresh!.token)).toBeNull();
    },
    denied: { anonymous: "not_signed_in" },
  }),
  entry({
    name: "signOut (POST /api/account/sign-out)",
    run: async (v) => signOut(await freshViewer(v)),
    allowed: SIGNED_IN,
    check: async () => expect(await viewerFromToken(fresh!.token)).toBeNull(),
    denied: { anonymous: "not_signed_in" },
  }),
  entry({
    name: "signOutEverywhere (POST /api/account/sign-out-everywhere)",
    run: async (v) => signOutEverywhere(await freshViewer(v)),
    allowed: SIGNED_IN,
    check: async () => {
      expect(await viewerFromToken(fresh!.token)).toBeNull();
      const live = await testDb().select().from(sessions).where(and(eq(sessions.userId, fresh!.viewer.id), isNull(sessions.revokedAt)));
      expect(live).toEqual([]);
    },
    denied: { anonymous: "not_signed_in" },
  }),
  ...PAYMENT_MATRIX,
  ...SEAT_MATRIX,
  ...UPLOAD_MATRIX,
  ...PLACEMENT_MATRIX,
  ...CERTIFICATE_MATRIX,
];

describe("the matrix names every role once per entry point", () => {
  it.each(MATRIX.map((e) => [e.name, e] as const))("%s", (_name, e) => {
    for (const who of WHO) expect(Number(e.allowed.includes(who)) + Number(who in e.denied), `${e.name} as ${who}`).toBe(1);
  });
});

describe.each(MATRIX)("$name", (e) => {
  it.each(WHO)("as %s", async (who) => {
    const result = await e.run(as(who), who);
    const code = e.denied[who];
    if (code) {
      expect(result).toMatchObject({ ok: false, code, message: expect.stringMatching(/^[A-Z].+\.$/) });
      return;
    }
    if (!result.ok) throw new Error(`${e.name} as ${who}: expected success, got ${result.code} (${result.message})`);
    await e.check(result, who);
  });
});

describe("placement submissions and reviews: strangers are refused", () => {
  it.each(placementStrangerCases(() => as("school_manager")).map((c) => [c.name, c] as const))("%s", async (_name, c) => {
    await c.run();
  });
});

// ---------------------------------------------------------------- entry points without a viewer

// Account flows (the visitor proves who they are by what they send), the health check and the
// search index rebuild take no viewer; what they return and change is asserted here.
const PUBLIC: { name: string; run: () => Promise<void> }[] = [
  {
    name: "signUp",
    run: async () => {
      const email = uniqueEmail("matrix-signup");
      expect(await signUp({ name: "Matrix Signup", email, password: "a matrix passphrase" }, ctx())).toEqual({ ok: true, email });
      const [row] = await testDb().select().from(users).where(eq(users.email, email));
      expect(row).toMatchObject({ name: "Matrix Signup", role: "apprentice", emailVerifiedAt: null });
    },
  },
  {
    name: "verifyEmail",
    run: async () => {
      const u = await createUser();
      await testDb().update(users).set({ emailVerifiedAt: null }).where(eq(users.id, u.id));
      expect(await verifyEmail({ token: await issueToken(u.id, "verify_email") })).toEqual({ ok: true });
      const [row] = await testDb().select().from(users).where(eq(users.id, u.id));
      expect(row.emailVerifiedAt).toBeInstanceOf(Date);
    },
  },
  {
    name: "signInWithPassword",
    run: async () => {
      const u = await createUser("instructor");
      const r = await signInWithPassword({ email: u.email, password: u.password }, ctx());
      if (!r.ok) throw new Error(r.code);
      expect(await viewerFromToken(r.sessionToken)).toMatchObject({ id: u.id, email: u.email, role: "instructor" });
    },
  },
  {
    name: "requestPasswordReset",
    run: async () => {
      const u = await createUser();
      expect(await requestPasswordReset({ email: u.email }, ctx())).toEqual({ ok: true });
      const tokens = await testDb().select().from(authTokens).where(and(eq(authTokens.userId, u.id), eq(authTokens.kind, "reset_password")));
      expect(tokens).toHaveLength(1);
    },
  },
  {
    name: "resetPassword",
    run: async () => {
      const u = await createUser();
      expect(await resetPassword({ token: await issueToken(u.id, "reset_password"), password: "a reset matrix passphrase" }, ctx())).toEqual({ ok: true });
      expect((await signInWithPassword({ email: u.email, password: "a reset matrix passphrase" }, ctx())).ok).toBe(true);
    },
  },
  {
    name: "requestSignInLink",
    run: async () => {
      const u = await createUser();
      expect(await requestSignInLink({ email: u.email }, ctx())).toEqual({ ok: true });
      const tokens = await testDb().select().from(authTokens).where(and(eq(authTokens.userId, u.id), eq(authTokens.kind, "sign_in_link")));
      expect(tokens).toHaveLength(1);
    },
  },
  {
    name: "signInWithLink",
    run: async () => {
      const u = await createUser("school_manager");
      const r = await signInWithLink({ token: await issueToken(u.id, "sign_in_link") }, ctx());
      if (!r.ok) throw new Error(r.code);
      expect(r.mustChoosePassword).toBe(false);
      expect(await viewerFromToken(r.sessionToken)).toMatchObject({ id: u.id, role: "school_manager" });
    },
  },
  {
    name: "checkHealth",
    run: async () => {
      expect(await checkHealth()).toMatchObject({ ok: true, database: "up" });
      // Handed a database that can't be reached (the optional last parameter), it says so: 503 with a wait.
      const nowhere = new Pool({ connectionString: "postgres://nobody:x@127.0.0.1:1/none", connectionTimeoutMillis: 2000 });
      nowhere.on("error", () => {});
      expect(await checkHealth(drizzle(nowhere, { schema }))).toMatchObject({ ok: false, code: "unavailable", retryAfterSeconds: expect.any(Number) });
      await nowhere.end();
    },
  },
  {
    name: "indexContent",
    run: async () => {
      const r = await indexContent();
      expect(r.documents).toBeGreaterThan((await listAllLessons()).length);
    },
  },
  ...PAYMENT_PUBLIC,
  ...SEAT_PUBLIC,
  ...CERTIFICATE_PUBLIC,
];

describe("entry points without a viewer", () => {
  it.each(PUBLIC.map((p) => [p.name, p] as const))("%s", async (_name, p) => {
    await p.run();
  });
});

// ------------------------------------------------------------------------------------- coverage

// What app/ may import from a data-access module without it being an entry point of the matrix.
const NOT_ENTRY_POINTS: Record<string, string> = {
  getViewer: "loads the viewer itself (sessions.test.ts)",
  meDto: "pure: the viewer as the /api/me DTO, no database",
  statsCsv: "pure: a statistics DTO as CSV text, no database",
  ...PAYMENT_NOT_ENTRY_POINTS,
  ...SEAT_NOT_ENTRY_POINTS,
  ...CERTIFICATE_NOT_ENTRY_POINTS,
};

const MATRIX_NAMES = new Set([...MATRIX.map((e) => e.name.split(" ")[0]), ...PUBLIC.map((p) => p.name)]);

async function filesUnder(dir: string): Promise<string[]> {
  const out: string[] = [];
  for (const item of await readdir(dir, { withFileTypes: true })) {
    const full = path.join(dir, item.name);
    if (item.isDirectory()) out.push(...(await filesUnder(full)));
    else if (/\.tsx?$/.test(item.name)) out.push(full);
  }
  return out;
}

describe("every data-access entry point that app/ calls is in the matrix", () => {
  it("scans app/ for value imports from lib/server modules that reach the database", async () => {
    const root = path.resolve(import.meta.dirname, "../..");
    const called = new Map<string, string>(); // function name → first app file that calls it
    for (const file of await filesUnder(path.join(root, "app"))) {
      const source = await readFile(file, "utf8");
      for (const [, names, module] of source.matchAll(/import\s*\{([^}]*)\}\s*from\s*"@\/lib\/server\/([\w-]+)"/g)) {
        const moduleSource = await readFile(path.join(root, "lib/server", `${module}.ts`), "utf8");
        if (!moduleSource.includes('"@/db/client"')) continue; // no database, not the data-access layer
        for (const raw of names.split(",")) {
          const name = raw.trim();
          if (!name || name.startsWith("type ")) continue;
          if (!called.has(name)) called.set(name, path.relative(root, file));
        }
      }
    }
    expect(called.size).toBeGreaterThan(10);
    const missing = [...called].filter(([name]) => !MATRIX_NAMES.has(name) && !(name in NOT_ENTRY_POINTS)).map(([name, file]) => `${name} (${file})`);
    expect(missing).toEqual([]);
  });
});

describe("admin changes take effect at the next request and are audited", () => {
  it("a demoted instructor loses the role at the very next load of the session", async () => {
    const admin = as("admin")!;
    const s = await signedIn("instructor");
    expect(await changeRole(admin, { userId: s.viewer.id, role: "apprentice" })).toMatchObject({ ok: true, user: { role: "apprentice" } });
    const after = await viewerFromToken(s.token);
    expect(after?.role).toBe("apprentice");
    expect(await listInstructorClasses(after)).toMatchObject({ ok: false, code: "forbidden" });
    const [row] = await testDb().select().from(auditLog).where(eq(auditLog.targetId, s.viewer.id)).orderBy(desc(auditLog.createdAt));
    expect(row).toMatchObject({ actorId: admin.id, action: "user.role_changed", detail: { from: "instructor", to: "apprentice" } });
  });

  it("a disabled account loses access at its next request, and re-enabling needs a new sign-in", async () => {
    const admin = as("admin")!;
    const u = await createUser("apprentice");
    const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    expect(await setStatus(admin, { userId: u.id, status: "disabled" })).toMatchObject({ ok: true, user: { status: "disabled" } });
    expect(await viewerFromToken(s.sessionToken)).toBeNull();
    expect(await signInWithPassword({ email: u.email, password: u.password }, ctx())).toMatchObject({ code: "account_disabled" });
    await setStatus(admin, { userId: u.id, status: "active" });
    expect(await viewerFromToken(s.sessionToken)).toBeNull();
    expect((await signInWithPassword({ email: u.email, password: u.password }, ctx())).ok).toBe(true);
    const actions = (await testDb().select().from(auditLog).where(eq(auditLog.targetId, u.id))).map((e) => e.action).sort();
    expect(actions).toEqual(["user.disabled", "user.enabled"]);
  });

  it("bad admin input is refused with a sentence and writes nothing", async () => {
    const admin = as("admin")!;
    const before = (await testDb().select().from(auditLog)).length;
    expect(await changeRole(admin, { userId: target.id, role: "superuser" })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await changeRole(admin, { userId: "not-a-uuid", role: "admin" })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await setStatus(admin, { userId: target.id, status: "banned" })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await changeRole(admin, { userId: admin.id, role: "apprentice" })).toMatchObject({ ok: false, code: "conflict" });
    expect(await setStatus(admin, { userId: "00000000-0000-4000-8000-000000000000", status: "disabled" })).toMatchObject({ ok: false, code: "not_found" });
    expect((await testDb().select().from(auditLog)).length).toBe(before);
  });
});

describe("another school's manager", () => {
  it("gets 404 on this school's purchase, order and refund, and sees none of them", async () => {
    const stranger = await signedIn("school_manager");
    const [other] = await testDb().insert(schools).values({ slug: `matrix-other-${Date.now()}`, name: "Other Matrix School" }).returning();
    await testDb().insert(schoolMembers).values({ schoolId: other.id, userId: stranger.viewer.id, role: "manager" });
    await anotherSchoolsManager(stranger.viewer);
    await seatsAnotherSchoolsManager(stranger.viewer);
  });
});
