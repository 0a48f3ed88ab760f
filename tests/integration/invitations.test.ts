// Rosters and invitations against real PostgreSQL: line-numbered refusals that import nothing,
// the good-lines-only choice, and the invitation link: single use, expiry, withdrawal, someone
// else's account, signing up from it, and an account registered before the address was proved.
import { afterAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { classInvitations, classMembers, sessions, users } from "@/db/schema";
import { inviteApprentices, revokeInvitation } from "@/lib/server/invitations";
import { acceptInvitation, signUpFromInvitation, viewInvitation } from "@/lib/server/invitation-claims";
import { hashPassword } from "@/lib/server/passwords";
import { uniqueEmail } from "../support/unique";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";
import { invitationTokenFor, mailsTo, makeClass, makeSchool, seatsOf, signedIn } from "./seats-fixtures";

afterAll(async () => {
  await closeDb();
});

async function office(seats: number) {
  const manager = await signedIn("school_manager");
  const classId = await makeClass(await makeSchool(manager.id), seats);
  return { manager, classId };
}

const invitationsOf = (classId: string) => testDb().select().from(classInvitations).where(eq(classInvitations.classId, classId));

describe("rosters", () => {
  it("a CSV with bad lines is refused with each line's number and problem, and nothing is invited", async () => {
    const { manager, classId } = await office(3);
    const seated = await createUser();
    await testDb().insert(classMembers).values({ classId, userId: seated.id, role: "apprentice" });
    await testDb().execute(sql`update classes set seats_claimed = 1 where id = ${classId}`);
    const staff = await createUser("instructor");
    const [good1, good2] = [uniqueEmail("good"), uniqueEmail("good")];
    // Line 1 header; 2 good; 3 bad address; 4 duplicate of 2 (other case); 5 seated; 6 staff; 7 blank; 8 good (a quoted name over two lines, 8–9); 10 over the seats.
    const csv = [
      "email,name",
      `${good1},Ada One`,
      "not-an-address,Bad Row",
      `${good1.toUpperCase()},Ada Again`,
      `${seated.email},Already Here`,
      `${staff.email},Staff Person`,
      "",
      `${good2},"Two`,
      `Lines"`,
      `${uniqueEmail("extra")},One Too Many`,
    ].join("\n");
    const r = await inviteApprentices(manager.viewer, { classId, csv }, ctx());
    expect(r).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringContaining("Nothing was sent: 5 lines need another look") });
    if (r.ok || !("problems" in r)) throw new Error("expected line problems");
    expect(r.problems!.map((p) => p.line)).toEqual([3, 4, 5, 6, 10]);
    expect(r.problems![0].problem).toBe('"not-an-address" is not a valid e-mail address.');
    expect(r.problems![1].problem).toBe(`Duplicate: ${good1} is already on line 2.`);
    expect(r.problems![2].problem).toContain("already has a place in this class");
    expect(r.problems![3].problem).toContain("staff account");
    expect(r.problems![4].problem).toContain("No free seat left");
    expect(await invitationsOf(classId)).toEqual([]);
    expect(await mailsTo(good1)).toBe(0);
  });

  it("on the explicit choice, the good lines only are invited and the others reported as skipped", async () => {
    const { manager, classId } = await office(5);
    const [a, b] = [uniqueEmail("a"), uniqueEmail("b")];
    const addresses = `${a}\nnobody@\nAda B <${b}>\n`;
    const r = await inviteApprentices(manager.viewer, { classId, addresses, goodRowsOnly: true }, ctx());
    expect(r).toMatchObject({ ok: true, invited: 2, skipped: [{ line: 2, email: "nobody@" }] });
    const rows = await invitationsOf(classId);
    expect(rows.map((i) => [i.email, i.name]).sort()).toEqual([[a, null], [b, "Ada B"]].sort());
    // Only the SHA-256 is stored: 64 hex characters, and not the mailed token.
    const token = await invitationTokenFor(b);
    expect(rows.every((i) => /^[0-9a-f]{64}$/.test(i.tokenHash) && i.tokenHash !== token)).toBe(true);
    expect(await mailsTo(a)).toBe(1);
    // Pending invitations hold their seats: 5 bought, 2 held.
    expect(await inviteApprentices(manager.viewer, { classId, addresses: `${a}` }, ctx())).toMatchObject({ ok: false, problems: [{ line: 1, problem: expect.stringContaining("already has an invitation") }] });
  });

  it("refuses an empty roster, both inputs at once, and an over-long one, with sentences", async () => {
    const { manager, classId } = await office(1);
    expect(await inviteApprentices(manager.viewer, { classId }, ctx())).toMatchObject({ code: "invalid_input", message: expect.stringContaining("at least one") });
    expect(await inviteApprentices(manager.viewer, { classId, addresses: "a@b.example", csv: "email\nc@d.example" }, ctx())).toMatchObject({ code: "invalid_input", message: expect.stringContaining("one at a time") });
    expect(await inviteApprentices(manager.viewer, { classId, csv: "x".repeat(70_000) }, ctx())).toMatchObject({ code: "invalid_input", message: expect.stringContaining("Split it") });
    expect(await inviteApprentices(manager.viewer, { classId, csv: 'email\n"unclosed@x.example\n' }, ctx())).toMatchObject({ code: "invalid_input", problems: [{ line: expect.any(Number), problem: expect.stringContaining("valid CSV") }] });
  });
});

describe("the invitation link", () => {
  it("is single use: signed in with the invited address, the apprentice takes the seat once", async () => {
    const { manager, classId } = await office(2);
    const invitee = await signedIn("apprentice");
    expect(await inviteApprentices(manager.viewer, { classId, addresses: invitee.email }, ctx())).toMatchObject({ ok: true, invited: 1 });
    const token = await invitationTokenFor(invitee.email);
    expect(await viewInvitation(invitee.viewer, token)).toMatchObject({ ok: true, invitation: { state: "open", viewer: "invitee", account: "verified" } });
    expect(await acceptInvitation(invitee.viewer, { token }, ctx())).toMatchObject({ ok: true, classId, next: "/learn" });
    expect(await acceptInvitation(invitee.viewer, { token }, ctx())).toMatchObject({ ok: false, code: "token_invalid" });
    expect(await viewInvitation(null, token)).toMatchObject({ ok: true, invitation: { state: "invalid" } });
    expect(await seatsOf(classId)).toEqual({ purchased: 2, claimed: 1 });
  });

  it("another account cannot consume someone else's invitation", async () => {
    const { manager, classId } = await office(1);
    const invited = uniqueEmail("invited");
    await inviteApprentices(manager.viewer, { classId, addresses: invited }, ctx());
    const token = await invitationTokenFor(invited);
    const intruder = await signedIn("apprentice");
    expect(await viewInvitation(intruder.viewer, token)).toMatchObject({ invitation: { viewer: "other-account" } });
    expect(await acceptInvitation(intruder.viewer, { token }, ctx())).toMatchObject({ ok: false, code: "forbidden", message: expect.stringContaining("another e-mail address") });
    expect(await seatsOf(classId)).toEqual({ purchased: 1, claimed: 0 });
    const [row] = await invitationsOf(classId);
    expect(row.claimedAt).toBeNull();
  });

  it("expired and withdrawn invitations take no seat", async () => {
    const { manager, classId } = await office(2);
    const [late, withdrawn] = [await signedIn("apprentice"), await signedIn("apprentice")];
    await inviteApprentices(manager.viewer, { classId, addresses: `${late.email}\n${withdrawn.email}` }, ctx());
    await testDb().update(classInvitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(classInvitations.email, late.email));
    expect(await acceptInvitation(late.viewer, { token: await invitationTokenFor(late.email) }, ctx())).toMatchObject({ code: "token_invalid", message: expect.stringContaining("expired") });
    const [pending] = await testDb().select().from(classInvitations).where(eq(classInvitations.email, withdrawn.email));
    expect(await revokeInvitation(manager.viewer, { invitationId: pending.id })).toMatchObject({ ok: true, email: withdrawn.email });
    expect(await revokeInvitation(manager.viewer, { invitationId: pending.id })).toMatchObject({ code: "conflict" });
    expect(await acceptInvitation(withdrawn.viewer, { token: await invitationTokenFor(withdrawn.email) }, ctx())).toMatchObject({ code: "token_invalid" });
    expect(await seatsOf(classId)).toEqual({ purchased: 2, claimed: 0 });
    // An expired invitation makes way for a new one to the same address.
    expect(await inviteApprentices(manager.viewer, { classId, addresses: late.email }, ctx())).toMatchObject({ ok: true, invited: 1 });
  });

  it("a newcomer signs up from the link: a verified account, the seat and a session, in one step", async () => {
    const { manager, classId } = await office(1);
    const email = uniqueEmail("newcomer");
    await inviteApprentices(manager.viewer, { classId, csv: `email,name\n${email},Robin Newcomer` }, ctx());
    const token = await invitationTokenFor(email);
    expect(await viewInvitation(null, token)).toMatchObject({ invitation: { state: "open", viewer: "signed-out", account: "none", name: "Robin Newcomer" } });
    expect(await signUpFromInvitation({ token, name: "Robin Newcomer", password: "password" }, ctx())).toMatchObject({ code: "weak_password" });
    const r = await signUpFromInvitation({ token, name: "Robin Newcomer", password: "a long enough passphrase" }, ctx());
    if (!r.ok) throw new Error(r.message);
    expect(await viewerFromToken(r.sessionToken)).toMatchObject({ email, role: "apprentice" });
    const [u] = await testDb().select().from(users).where(eq(users.email, email));
    expect(u.emailVerifiedAt).not.toBeNull();
    expect(await seatsOf(classId)).toEqual({ purchased: 1, claimed: 1 });
    expect(await signUpFromInvitation({ token, name: "Again", password: "a long enough passphrase" }, ctx())).toMatchObject({ code: "token_invalid" });
  });

  it("an account someone registered with the address before it was proved is taken back: old password and sessions gone", async () => {
    const { manager, classId } = await office(1);
    const email = uniqueEmail("squatted");
    const [squatter] = await testDb().insert(users).values({ email, name: "Squatter", passwordHash: await hashPassword("squatter's passphrase") }).returning();
    await testDb().insert(sessions).values({ userId: squatter.id, sessionVersion: 1, expiresAt: new Date(Date.now() + 3_600_000) });
    await inviteApprentices(manager.viewer, { classId, addresses: email }, ctx());
    const token = await invitationTokenFor(email);
    expect(await viewInvitation(null, token)).toMatchObject({ invitation: { account: "unverified" } });
    const r = await signUpFromInvitation({ token, name: "Rightful Owner", password: "the owner's own passphrase" }, ctx());
    expect(r).toMatchObject({ ok: true });
    const [after] = await testDb().select().from(users).where(eq(users.id, squatter.id));
    expect(after).toMatchObject({ name: "Rightful Owner", sessionVersion: 2 });
    expect(after.passwordHash).not.toBe(squatter.passwordHash);
    const old = await testDb().select().from(sessions).where(eq(sessions.userId, squatter.id));
    expect(old.filter((s) => s.sessionVersion === 1).every((s) => s.revokedAt !== null)).toBe(true);
  });

  it("a verified account must sign in first; a signed-up link can't take it over", async () => {
    const { manager, classId } = await office(1);
    const owner = await createUser();
    await inviteApprentices(manager.viewer, { classId, addresses: owner.email }, ctx());
    const token = await invitationTokenFor(owner.email);
    expect(await viewInvitation(null, token)).toMatchObject({ invitation: { account: "verified" } });
    expect(await signUpFromInvitation({ token, name: "Someone", password: "another long passphrase" }, ctx())).toMatchObject({ code: "conflict", message: expect.stringContaining("Sign in") });
    expect(await seatsOf(classId)).toEqual({ purchased: 1, claimed: 0 });
    const [row] = await invitationsOf(classId);
    expect(row.claimedAt).toBeNull();
  });
});
