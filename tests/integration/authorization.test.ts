import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { desc, eq } from "drizzle-orm";
import { closeDb } from "@/db/client";
import { auditLog, classMembers, classes, schoolMembers, schools, type Role } from "@/db/schema";
import { signInWithPassword } from "@/lib/server/accounts";
import { listAudit } from "@/lib/server/audit";
import { AccessError } from "@/lib/server/errors";
import { apprenticeClasses, instructorClasses, managedSchools } from "@/lib/server/homes";
import { changeRole, listUsers, setStatus } from "@/lib/server/users";
import type { Viewer } from "@/lib/server/viewer";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";

type Who = "anonymous" | Role;
const WHO: Who[] = ["anonymous", "apprentice", "instructor", "school_manager", "admin"];
const viewers = new Map<Who, Viewer | null>();
let target: { id: string; email: string; password: string };

async function signedInViewer(role: Role): Promise<Viewer> {
  const u = await createUser(role);
  const s = await signInWithPassword(testDb(), { email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error("sign-in failed");
  return (await viewerFromToken(s.sessionToken))!;
}

beforeAll(async () => {
  viewers.set("anonymous", null);
  for (const role of ["apprentice", "instructor", "school_manager", "admin"] as const) viewers.set(role, await signedInViewer(role));
  target = await createUser("apprentice");
  // A school and a class that the test instructor, manager and apprentice belong to.
  const [school] = await testDb().insert(schools).values({ slug: `school-${Date.now()}`, name: "Matrix Test School" }).returning();
  const [klass] = await testDb().insert(classes).values({ schoolId: school.id, name: "Matrix class", term: "Test", courseSlug: "miking-the-band" }).returning();
  await testDb().insert(schoolMembers).values({ schoolId: school.id, userId: viewers.get("school_manager")!.id, role: "manager" });
  await testDb().insert(classMembers).values([
    { classId: klass.id, userId: viewers.get("instructor")!.id, role: "instructor" },
    { classId: klass.id, userId: viewers.get("apprentice")!.id, role: "apprentice" },
  ]);
});

afterAll(async () => {
  await closeDb();
});

// Every data-access entry point of the foundation, the roles allowed, and what it does.
// Server actions and pages call exactly these, so this matrix is the authorization of both.
const MATRIX: { name: string; allowed: Who[]; run: (v: Viewer | null) => Promise<unknown> }[] = [
  { name: "listUsers (admin users page)", allowed: ["admin"], run: (v) => listUsers(testDb(), v) },
  { name: "listAudit (admin audit page)", allowed: ["admin"], run: (v) => listAudit(testDb(), v) },
  { name: "changeRole (admin action)", allowed: ["admin"], run: (v) => changeRole(testDb(), v, { userId: target.id, role: "apprentice" }) },
  { name: "setStatus (admin action)", allowed: ["admin"], run: (v) => setStatus(testDb(), v, { userId: target.id, status: "active" }) },
  { name: "apprenticeClasses (apprentice home)", allowed: ["apprentice"], run: (v) => apprenticeClasses(testDb(), v) },
  { name: "instructorClasses (instructor home)", allowed: ["instructor"], run: (v) => instructorClasses(testDb(), v) },
  { name: "managedSchools (school office home)", allowed: ["school_manager"], run: (v) => managedSchools(testDb(), v) },
];

describe.each(MATRIX)("$name", ({ allowed, run }) => {
  it.each(WHO)("as %s", async (who) => {
    const attempt = run(viewers.get(who)!);
    if (allowed.includes(who)) {
      await expect(attempt).resolves.toBeDefined();
    } else {
      await expect(attempt).rejects.toBeInstanceOf(AccessError);
      await expect(run(viewers.get(who)!)).rejects.toMatchObject({ code: who === "anonymous" ? "not_signed_in" : "forbidden" });
    }
  });
});

describe("role homes show the viewer's own data", () => {
  it("the instructor sees their class with its apprentice count", async () => {
    const list = await instructorClasses(testDb(), viewers.get("instructor")!);
    expect(list).toEqual([expect.objectContaining({ name: "Matrix class", apprentices: 1, schoolName: "Matrix Test School" })]);
  });
  it("the manager sees the school's classes, the apprentice their class", async () => {
    expect((await managedSchools(testDb(), viewers.get("school_manager")!))[0].classes.map((c) => c.name)).toEqual(["Matrix class"]);
    expect((await apprenticeClasses(testDb(), viewers.get("apprentice")!)).map((c) => c.name)).toEqual(["Matrix class"]);
  });
});

describe("admin changes take effect at the next request and are audited", () => {
  it("a demoted instructor loses the role at the very next load of the session", async () => {
    const admin = viewers.get("admin")!;
    const u = await createUser("instructor");
    const s = await signInWithPassword(testDb(), { email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    expect((await viewerFromToken(s.sessionToken))?.role).toBe("instructor");
    expect(await changeRole(testDb(), admin, { userId: u.id, role: "apprentice" })).toMatchObject({ ok: true, user: { role: "apprentice" } });
    const after = await viewerFromToken(s.sessionToken);
    expect(after?.role).toBe("apprentice");
    await expect(instructorClasses(testDb(), after)).rejects.toMatchObject({ code: "forbidden" });
    const [entry] = await testDb().select().from(auditLog).where(eq(auditLog.targetId, u.id)).orderBy(desc(auditLog.createdAt));
    expect(entry).toMatchObject({ actorId: admin.id, action: "user.role_changed", detail: { from: "instructor", to: "apprentice" } });
    expect(entry.createdAt).toBeInstanceOf(Date);
  });

  it("a disabled account loses access at its next request, and re-enabling needs a new sign-in", async () => {
    const admin = viewers.get("admin")!;
    const u = await createUser("apprentice");
    const s = await signInWithPassword(testDb(), { email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    expect(await setStatus(testDb(), admin, { userId: u.id, status: "disabled" })).toMatchObject({ ok: true, user: { status: "disabled" } });
    expect(await viewerFromToken(s.sessionToken)).toBeNull();
    expect(await signInWithPassword(testDb(), { email: u.email, password: u.password }, ctx())).toMatchObject({ error: "account_disabled" });
    await setStatus(testDb(), admin, { userId: u.id, status: "active" });
    expect(await viewerFromToken(s.sessionToken)).toBeNull();
    expect((await signInWithPassword(testDb(), { email: u.email, password: u.password }, ctx())).ok).toBe(true);
    const actions = (await testDb().select().from(auditLog).where(eq(auditLog.targetId, u.id))).map((e) => e.action).sort();
    expect(actions).toEqual(["user.disabled", "user.enabled"]);
  });

  it("bad admin input is refused with a sentence and writes nothing", async () => {
    const admin = viewers.get("admin")!;
    const before = (await testDb().select().from(auditLog)).length;
    expect(await changeRole(testDb(), admin, { userId: target.id, role: "superuser" })).toMatchObject({ ok: false, error: "invalid_input" });
    expect(await changeRole(testDb(), admin, { userId: "not-a-uuid", role: "admin" })).toMatchObject({ ok: false, error: "invalid_input" });
    expect(await setStatus(testDb(), admin, { userId: target.id, status: "banned" })).toMatchObject({ ok: false, error: "invalid_input" });
    expect(await changeRole(testDb(), admin, { userId: admin.id, role: "apprentice" })).toMatchObject({ ok: false, error: "conflict" });
    expect(await setStatus(testDb(), admin, { userId: "00000000-0000-4000-8000-000000000000", status: "disabled" })).toMatchObject({ ok: false, error: "not_found" });
    expect((await testDb().select().from(auditLog)).length).toBe(before);
  });

  it("user DTOs never carry a password hash or session version", async () => {
    const list = await listUsers(testDb(), viewers.get("admin")!);
    const keys = new Set(list.flatMap((u) => Object.keys(u)));
    expect([...keys].sort()).toEqual(["createdAtUtc", "email", "emailVerified", "id", "name", "role", "status"]);
  });
});
