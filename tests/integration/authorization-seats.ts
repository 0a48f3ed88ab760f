// The school office's rows of the authorization matrix (tests/integration/authorization.test.ts
// spreads them into MATRIX and PUBLIC): seats, invitations and the class page. prepareSeats makes a
// class of its own in the matrix school (6 seats, a sibling class, two seated apprentices who have
// not started, pending invitations, a school instructor), so the allowed runs have something to act on.
import { expect } from "vitest";
import { and, eq } from "drizzle-orm";
import { classInvitations, classes, schoolMembers, type Role } from "@/db/schema";
import type { ErrorCode, Ok, Result } from "@/lib/dto/result";
import { acceptInvitation, signUpFromInvitation, viewInvitation } from "@/lib/server/invitation-claims";
import { inviteApprentices, revokeInvitation } from "@/lib/server/invitations";
import { getClassOffice, listOfficeSchools } from "@/lib/server/school-office";
import { claimSeat } from "@/lib/server/seat-pool";
import { assignInstructor, moveApprentice, moveSeats, reclaimSeat } from "@/lib/server/seat-actions";
import type { Viewer } from "@/lib/server/viewer";
import { uniqueEmail } from "../support/unique";
import { createUser, ctx, testDb } from "./helpers";
import { invitationTokenFor } from "./seats-fixtures";

type Who = "anonymous" | Role;
type Entry = {
  name: string;
  run: (viewer: Viewer | null, who: Who) => Promise<Result<object>>;
  allowed: Who[];
  check: (result: Ok<object>, who: Who) => void | Promise<void>;
  denied: Partial<Record<Who, ErrorCode>>;
};
function entry<T extends object>(e: { name: string; run: (viewer: Viewer | null, who: Who) => Promise<Result<T>>; allowed: Who[]; check: (result: Ok<T>, who: Who) => void | Promise<void>; denied: Partial<Record<Who, ErrorCode>> }): Entry {
  return e as unknown as Entry;
}
const WHO: Who[] = ["anonymous", "apprentice", "instructor", "school_manager", "admin"];
function onlyFor(...allowed: Who[]): Partial<Record<Who, ErrorCode>> {
  return Object.fromEntries(WHO.filter((w) => !allowed.includes(w)).map((w) => [w, w === "anonymous" ? "not_signed_in" : "forbidden"]));
}

const s = { classId: "", siblingId: "", schoolId: "", invitationId: "", apprenticeToken: "", newcomerToken: "", newcomer: "", reclaimable: "", movable: "", teacher: "" };

export async function prepareSeats(manager: Viewer, apprentice: Viewer): Promise<void> {
  const [membership] = await testDb().select({ schoolId: schoolMembers.schoolId }).from(schoolMembers).where(and(eq(schoolMembers.userId, manager.id), eq(schoolMembers.role, "manager")));
  s.schoolId = membership.schoolId;
  const course = "how-microphones-hear";
  const [klass, sibling] = await testDb()
    .insert(classes)
    .values([
      { schoolId: s.schoolId, name: "Seat matrix class", term: "Test", courseSlug: course, seatsPurchased: 8 },
      { schoolId: s.schoolId, name: "Seat matrix sibling", term: "Test", courseSlug: course, seatsPurchased: 0 },
    ])
    .returning({ id: classes.id });
  Object.assign(s, { classId: klass.id, siblingId: sibling.id });
  for (const key of ["reclaimable", "movable"] as const) {
    s[key] = (await createUser()).id;
    const seat = await testDb().transaction((tx) => claimSeat(tx, s.classId, s[key]));
    if (!seat.ok) throw new Error(seat.message);
  }
  s.newcomer = uniqueEmail("matrix-newcomer");
  const pendingFor = uniqueEmail("matrix-pending");
  const r = await inviteApprentices(manager, { classId: s.classId, addresses: [apprentice.email, s.newcomer, pendingFor].join("\n") }, ctx());
  if (!r.ok) throw new Error(r.message);
  s.apprenticeToken = await invitationTokenFor(apprentice.email);
  s.newcomerToken = await invitationTokenFor(s.newcomer);
  const [pending] = await testDb().select({ id: classInvitations.id }).from(classInvitations).where(eq(classInvitations.email, pendingFor));
  s.invitationId = pending.id;
  s.teacher = (await createUser("instructor")).id;
  await testDb().insert(schoolMembers).values({ schoolId: s.schoolId, userId: s.teacher, role: "instructor" });
}

export const SEAT_MATRIX: Entry[] = [
  entry({
    name: "listOfficeSchools (school office home: classes with seats)",
    run: (v) => listOfficeSchools(v),
    allowed: ["school_manager"],
    check: (r) => expect(r.schools.flatMap((x) => x.classes).find((c) => c.id === s.classId)).toMatchObject({ name: "Seat matrix class", seats: { purchased: 8, claimed: 2, pendingInvitations: 3, free: 3 } }),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "getClassOffice (school office: class page and its CSV)",
    run: (v) => getClassOffice(v, s.classId),
    allowed: ["school_manager"],
    check: (r) => {
      expect(r.office.apprentices).toHaveLength(2);
      expect(r.office.invitations.map((i) => i.id)).toContain(s.invitationId);
      expect(r.office.siblingClasses.map((c) => c.classId)).toEqual([s.siblingId]);
    },
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "inviteApprentices (class page: invite form)",
    run: (v) => inviteApprentices(v, { classId: s.classId, addresses: uniqueEmail("matrix-invite") }, ctx()),
    allowed: ["school_manager"],
    check: (r) => expect(r).toMatchObject({ invited: 1, skipped: [] }),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "revokeInvitation (class page: withdraw)",
    run: (v) => revokeInvitation(v, { invitationId: s.invitationId }),
    allowed: ["school_manager"],
    check: (r) => expect(r.email).toContain("matrix-pending"),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "reclaimSeat (class page: reclaim)",
    run: (v) => reclaimSeat(v, { classId: s.classId, userId: s.reclaimable }),
    allowed: ["school_manager"],
    check: (r) => expect(r.name).toBe("Test apprentice"),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "moveSeats (class page: move free seats)",
    run: (v) => moveSeats(v, { fromClassId: s.classId, toClassId: s.siblingId, count: 1 }),
    allowed: ["school_manager"],
    check: (r) => expect(r).toMatchObject({ moved: 1, toClassName: "Seat matrix sibling" }),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "moveApprentice (class page: move with the seat)",
    run: (v) => moveApprentice(v, { fromClassId: s.classId, toClassId: s.siblingId, userId: s.movable }),
    allowed: ["school_manager"],
    check: (r) => expect(r.toClassName).toBe("Seat matrix sibling"),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "assignInstructor (class page: instructor)",
    run: (v) => assignInstructor(v, { classId: s.classId, userId: s.teacher }),
    allowed: ["school_manager"],
    check: (r) => expect(r.name).toBe("Test instructor"),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "acceptInvitation (invitation page: accept, signed in)",
    run: (v) => acceptInvitation(v, { token: s.apprenticeToken }, ctx()),
    allowed: ["apprentice"],
    check: (r) => expect(r.classId).toBe(s.classId),
    denied: onlyFor("apprentice"),
  }),
];

export const SEAT_PUBLIC: { name: string; run: () => Promise<void> }[] = [
  {
    name: "viewInvitation",
    run: async () => {
      expect(await viewInvitation(null, s.newcomerToken)).toMatchObject({ ok: true, invitation: { state: "open", email: s.newcomer, viewer: "signed-out", account: "none" } });
      expect(await viewInvitation(null, "x".repeat(43))).toEqual({ ok: true, invitation: { state: "invalid" } });
    },
  },
  {
    name: "signUpFromInvitation",
    run: async () => {
      const r = await signUpFromInvitation({ token: s.newcomerToken, name: "Matrix Newcomer", password: "a matrix newcomer passphrase" }, ctx());
      expect(r).toMatchObject({ ok: true, classId: s.classId, next: "/learn" });
    },
  },
];

export const SEAT_NOT_ENTRY_POINTS: Record<string, string> = {
  parseSort: "pure: the page's sort parameters checked, no database",
};

/** Another school's manager: not_found on every class-level entry point, and none of this school's classes listed. */
export async function seatsAnotherSchoolsManager(stranger: Viewer): Promise<void> {
  const notFound = { ok: false, code: "not_found" };
  expect(await getClassOffice(stranger, s.classId)).toMatchObject(notFound);
  expect(await inviteApprentices(stranger, { classId: s.classId, addresses: uniqueEmail("stranger") }, ctx())).toMatchObject(notFound);
  expect(await revokeInvitation(stranger, { invitationId: s.invitationId })).toMatchObject(notFound);
  expect(await reclaimSeat(stranger, { classId: s.classId, userId: s.movable })).toMatchObject(notFound);
  expect(await moveSeats(stranger, { fromClassId: s.classId, toClassId: s.siblingId, count: 1 })).toMatchObject(notFound);
  expect(await moveApprentice(stranger, { fromClassId: s.siblingId, toClassId: s.classId, userId: s.movable })).toMatchObject(notFound);
  expect(await assignInstructor(stranger, { classId: s.classId, userId: s.teacher })).toMatchObject(notFound);
  const listed = await listOfficeSchools(stranger);
  expect(listed.ok && listed.schools.flatMap((x) => x.classes).some((c) => c.id === s.classId)).toBe(false);
}
