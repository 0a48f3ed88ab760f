import "server-only";
// Taking the seat an invitation holds. The link is scanner-safe: opening it (viewInvitation) only
// shows a page; a POST claims. The invitation itself proves the invited address, so:
// - signed in with that address: accept → the seat, atomically (acceptInvitation);
// - signed in with another address: refused; nobody consumes someone else's invitation;
// - signed out, no account yet: create one here (signUpFromInvitation), already verified;
// - signed out, an account never verified: the link is the first proof of the address, so as with
//   a reset, the password set before the proof is replaced and every session of it ends
//   (pre-account takeover);
// - signed out, a verified account: sign in first, then accept.
// Consuming the invitation, creating the account and taking the seat are one transaction.
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { db as processDb, type Database, type Queryable } from "@/db/client";
import { classInvitations, classes, schools, users, type Role } from "@/db/schema";
import type { InvitationViewDto } from "@/lib/dto/school-office";
import { getCourse } from "@/lib/content";
import { TokenInput, fieldErrors, nameField, newPasswordField } from "@/lib/validation/account";
import { endEverySession, startSession, type RequestContext, type SignedIn } from "./accounts";
import { atomically } from "./atomic";
import { fail, waitInWords, type Result } from "./errors";
import { guard } from "./guard";
import { hashPassword, passwordProblem } from "./passwords";
import { limitsFor, refundSlot, takeSlot } from "./rate-limit";
import { claimSeat } from "./seat-pool";
import { hashToken } from "./tokens";
import type { Viewer } from "./viewer";

const EXPIRED = "This invitation has expired, was withdrawn or has already been used. Ask your school to send a new one.";

function pendingByToken(token: string) {
  return and(eq(classInvitations.tokenHash, hashToken(token)), isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt), gt(classInvitations.expiresAt, sql`now()`));
}

/** What the invitation page shows. Public: the token is the credential, and looking consumes nothing. */
export async function viewInvitation(viewer: Viewer | null, token: string, database: Queryable = processDb()): Promise<Result<{ invitation: InvitationViewDto }>> {
  if (!TokenInput.safeParse({ token }).success) return { ok: true, invitation: { state: "invalid" } };
  const [row] = await database
    .select({ email: classInvitations.email, name: classInvitations.name, expiresAt: classInvitations.expiresAt, className: classes.name, courseSlug: classes.courseSlug, schoolName: schools.name })
    .from(classInvitations)
    .innerJoin(classes, eq(classes.id, classInvitations.classId))
    .innerJoin(schools, eq(schools.id, classes.schoolId))
    .where(pendingByToken(token));
  if (!row) return { ok: true, invitation: { state: "invalid" } };
  const [account] = await database.select({ verifiedAt: users.emailVerifiedAt }).from(users).where(eq(users.email, row.email));
  const course = await getCourse(row.courseSlug);
  return {
    ok: true,
    invitation: {
      state: "open",
      email: row.email,
      name: row.name,
      className: row.className,
      schoolName: row.schoolName,
      courseTitle: course?.title ?? row.courseSlug,
      expiresAt: row.expiresAt.toISOString(),
      viewer: !viewer ? "signed-out" : viewer.email === row.email ? "invitee" : "other-account",
      account: !account ? "none" : account.verifiedAt ? "verified" : "unverified",
    },
  };
}

/** Marks the invitation claimed by this person (one statement: it works once) and takes the seat. */
async function claimWith(tx: Queryable, token: string, userId: string, email: string): Promise<Result<{ classId: string }>> {
  const [invitation] = await tx
    .update(classInvitations)
    .set({ claimedAt: sql`now()`, claimedBy: userId })
    .where(and(pendingByToken(token), eq(classInvitations.email, email)))
    .returning({ classId: classInvitations.classId });
  if (!invitation) {
    const [other] = await tx.select({ email: classInvitations.email }).from(classInvitations).where(pendingByToken(token));
    if (other) return fail("forbidden", { message: "This invitation was sent to another e-mail address. Sign out, then open the link again, or ask your school to invite the address you use." });
    return fail("token_invalid", { message: EXPIRED });
  }
  const seat = await claimSeat(tx, invitation.classId, userId);
  return seat.ok ? { ok: true, classId: invitation.classId } : seat;
}

function tooMany(wait: number) {
  return fail("rate_limited", { message: `Too many attempts. Please try again ${waitInWords(wait)}.`, retryAfterSeconds: wait });
}

/** A signed-in apprentice accepts an invitation sent to their own address. */
export async function acceptInvitation(viewer: Viewer | null, raw: unknown, ctx: RequestContext, database: Database = processDb()): Promise<Result<{ classId: string; next: string }>> {
  const allowed = guard(viewer, ["apprentice"], "Seats in a class are for apprentice accounts. Sign in with the account the invitation was sent to.");
  if (!allowed.ok) return allowed;
  const parsed = TokenInput.safeParse(raw);
  if (!parsed.success) return fail("token_invalid", { message: EXPIRED });
  const slot = await takeSlot(database, limitsFor("tokenFailures", null, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  const me = allowed.viewer;
  const result = await atomically(database, (tx) => claimWith(tx, parsed.data.token, me.id, me.email));
  if (!result.ok) return result;
  await refundSlot(database, slot);
  return { ok: true, classId: result.classId, next: "/learn" };
}

export const InvitationSignUpInput = TokenInput.extend({ name: nameField, password: newPasswordField });

type Account = { id: string; role: Role; sessionVersion: number };

/** The invited address's account: created (verified by this link), or a never-verified one taken back for its owner. */
async function accountForInvitee(tx: Queryable, email: string, name: string, passwordHash: string): Promise<Result<{ account: Account }>> {
  const [existing] = await tx.select({ id: users.id, verifiedAt: users.emailVerifiedAt, role: users.role, status: users.status }).from(users).where(eq(users.email, email)).for("update");
  if (!existing) {
    const [created] = await tx
      .insert(users)
      .values({ name, email, passwordHash, emailVerifiedAt: sql`now()` })
      .returning({ id: users.id, role: users.role, sessionVersion: users.sessionVersion });
    return { ok: true, account: created };
  }
  if (existing.verifiedAt) return fail("conflict", { message: "This address already has an Axisline account. Sign in with it, then open the invitation again." });
  if (existing.status !== "active") return fail("account_disabled");
  const [taken] = await tx
    .update(users)
    .set({ name, passwordHash, emailVerifiedAt: sql`now()`, sessionVersion: sql`${users.sessionVersion} + 1`, updatedAt: sql`now()` })
    .where(eq(users.id, existing.id))
    .returning({ id: users.id, role: users.role, sessionVersion: users.sessionVersion });
  await endEverySession(tx, existing.id);
  return { ok: true, account: taken };
}

/** A newcomer signs up from the invitation: the account, the claim and the seat commit together; then a session. */
export async function signUpFromInvitation(raw: unknown, ctx: RequestContext, database: Database = processDb()): Promise<Result<SignedIn & { classId: string; next: string }>> {
  const parsed = InvitationSignUpInput.safeParse(raw);
  if (!parsed.success) {
    const errors = fieldErrors(parsed.error);
    return errors.token ? fail("token_invalid", { message: EXPIRED }) : fail("invalid_input", { fieldErrors: errors });
  }
  const { token, name, password } = parsed.data;
  const problem = passwordProblem(password);
  if (problem) return fail("weak_password", { message: problem, fieldErrors: { password: problem } });
  const slot = await takeSlot(database, limitsFor("tokenFailures", null, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  const passwordHash = await hashPassword(password);
  const claimed = await atomically(database, async (tx) => {
    const [invitation] = await tx.select({ email: classInvitations.email }).from(classInvitations).where(pendingByToken(token)).for("update");
    if (!invitation) return fail("token_invalid", { message: EXPIRED });
    const account = await accountForInvitee(tx, invitation.email, name, passwordHash);
    if (!account.ok) return account;
    if (account.account.role !== "apprentice") return fail("forbidden", { message: "Seats in a class are for apprentice accounts." });
    const seat = await claimWith(tx, token, account.account.id, invitation.email);
    return seat.ok ? { ok: true, classId: seat.classId, account: account.account } : seat;
  });
  if (!claimed.ok) return claimed;
  await refundSlot(database, slot);
  const session = await startSession(database, { id: claimed.account.id, sessionVersion: claimed.account.sessionVersion, role: claimed.account.role });
  return { ok: true, ...session, classId: claimed.classId, next: "/learn" };
}
