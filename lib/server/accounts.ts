import "server-only";
import { and, eq, gt, inArray, isNull, sql } from "drizzle-orm";
import { db as processDb, type Database } from "@/db/client";
import { authTokens, sessions, users, type Role, type TokenKind } from "@/db/schema";
import { ChangePasswordInput } from "@/lib/validation/account";
import { enqueueMail } from "@/lib/email/outbox";
import { EmailOnlyInput, ResetPasswordInput, SignInInput, SignUpInput, TokenInput, fieldErrors } from "@/lib/validation/account";
import { fail, waitInWords, type Result } from "./errors";
import { guard } from "./guard";
import { burnPasswordCheck, hashPassword, passwordProblem, verifyPassword } from "./passwords";
import { limitsFor, refundSlot, takeSlot } from "./rate-limit";
import { sessionLimitsFor } from "./session-policy";
import { encodeSessionToken } from "./session-cookie";
import { TOKEN_LIFETIME_MS, hashToken, newToken } from "./tokens";
import type { Viewer } from "./viewer";

/** Where a request came from: its client address (for rate limits) and the app's public base URL. */
export type RequestContext = { address: string; baseUrl: string };

export type SignedIn = { sessionToken: string; userId: string; maxAgeSeconds: number };

function tooMany(wait: number) {
  return fail("rate_limited", { message: `Too many attempts. Please try again ${waitInWords(wait)}.`, retryAfterSeconds: wait });
}

async function issueToken(tx: Pick<Database, "insert">, userId: string, kind: TokenKind): Promise<string> {
  const { token, tokenHash } = newToken();
  await tx.insert(authTokens).values({ userId, kind, tokenHash, expiresAt: new Date(Date.now() + TOKEN_LIFETIME_MS[kind]) });
  return token;
}

/** Marks a token used if it is of this kind, unused and unexpired; one statement, so it works once. */
async function consumeToken(tx: Pick<Database, "update">, token: string, kind: TokenKind): Promise<string | null> {
  const [row] = await tx
    .update(authTokens)
    .set({ usedAt: sql`now()` })
    .where(and(eq(authTokens.tokenHash, hashToken(token)), eq(authTokens.kind, kind), isNull(authTokens.usedAt), gt(authTokens.expiresAt, sql`now()`)))
    .returning({ userId: authTokens.userId });
  return row?.userId ?? null;
}

/** A session row and its cookie, both ending at the role's absolute lifetime (session-policy.ts). */
export async function startSession(db: Database, user: { id: string; sessionVersion: number; role: Role }): Promise<SignedIn> {
  const { absoluteSeconds } = sessionLimitsFor(user.role);
  const [s] = await db
    .insert(sessions)
    .values({ userId: user.id, sessionVersion: user.sessionVersion, expiresAt: new Date(Date.now() + absoluteSeconds * 1000) })
    .returning({ id: sessions.id });
  const sessionToken = await encodeSessionToken({ sub: user.id, sid: s.id, sv: user.sessionVersion }, absoluteSeconds);
  return { sessionToken, userId: user.id, maxAgeSeconds: absoluteSeconds };
}

export async function signUp(raw: unknown, ctx: RequestContext, db: Database = processDb()): Promise<Result<{ email: string }>> {
  const parsed = SignUpInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { fieldErrors: fieldErrors(parsed.error) });
  const { name, email, password } = parsed.data;
  const problem = passwordProblem(password);
  if (problem) return fail("weak_password", { message: problem, fieldErrors: { password: problem } });
  const slot = await takeSlot(db, limitsFor("signUps", email, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  const passwordHash = await hashPassword(password);

  const existing = await db.transaction(async (tx) => {
    const [found] = await tx.select({ id: users.id, name: users.name }).from(users).where(eq(users.email, email)).limit(1);
    if (found) return found;
    const [user] = await tx.insert(users).values({ name, email, passwordHash }).returning({ id: users.id });
    const token = await issueToken(tx, user.id, "verify_email");
    await enqueueMail(tx, email, { template: "verify_email", name, url: `${ctx.baseUrl}/verify-email?token=${token}` });
    return null;
  });
  if (existing) {
    // Same answer as a new sign-up, so the form can't be used to find out who has an account;
    // the owner hears about it at most once an hour.
    const mailSlot = await takeSlot(db, limitsFor("accountExistsMail", email, ctx.address));
    if (mailSlot.ok) {
      await enqueueMail(db, email, { template: "account_exists", name: existing.name, signInUrl: `${ctx.baseUrl}/sign-in`, resetUrl: `${ctx.baseUrl}/reset-password` });
    }
  }
  return { ok: true, email };
}

export async function verifyEmail(raw: unknown, db: Database = processDb()): Promise<Result> {
  const parsed = TokenInput.safeParse(raw);
  if (!parsed.success) return fail("token_invalid");
  const ok = await db.transaction(async (tx) => {
    const userId = await consumeToken(tx, parsed.data.token, "verify_email");
    if (!userId) return false;
    await tx.update(users).set({ emailVerifiedAt: sql`now()`, updatedAt: sql`now()` }).where(eq(users.id, userId));
    return true;
  });
  return ok ? { ok: true } : fail("token_invalid");
}

export async function signInWithPassword(raw: unknown, ctx: RequestContext, db: Database = processDb()): Promise<Result<SignedIn>> {
  const parsed = SignInInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { fieldErrors: fieldErrors(parsed.error) });
  const { email, password } = parsed.data;
  // Every try takes a slot first (counted and decided in one step); a right password gives it back.
  const slot = await takeSlot(db, limitsFor("signInFailures", email, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);

  const [user] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  const valid = user?.passwordHash ? await verifyPassword(user.passwordHash, password) : (await burnPasswordCheck(password), false);
  if (!user || !valid) return fail("invalid_credentials");
  await refundSlot(db, slot);
  if (user.status !== "active") return fail("account_disabled");
  if (!user.emailVerifiedAt) return fail("email_unverified");
  return { ok: true, ...(await startSession(db, user)) };
}

/** Always answers the same for known and unknown addresses; mails only a known, active account. */
export async function requestPasswordReset(raw: unknown, ctx: RequestContext, db: Database = processDb()): Promise<Result> {
  const parsed = EmailOnlyInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { fieldErrors: fieldErrors(parsed.error) });
  const { email } = parsed.data;
  const slot = await takeSlot(db, limitsFor("resetRequests", email, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  await db.transaction(async (tx) => {
    const [user] = await tx.select({ id: users.id, name: users.name, status: users.status }).from(users).where(eq(users.email, email)).limit(1);
    if (!user || user.status !== "active") return;
    const token = await issueToken(tx, user.id, "reset_password");
    await enqueueMail(tx, email, { template: "reset_password", name: user.name, url: `${ctx.baseUrl}/reset-password?token=${token}` });
  });
  return { ok: true };
}

/**
 * A new password ends every session of the account (the session version moves on) and every
 * reset or sign-in link already sent. It also proves the address: an account that was never
 * verified is verified now, with the owner's password replacing any set before the proof.
 */
export async function resetPassword(raw: unknown, ctx: RequestContext, db: Database = processDb()): Promise<Result> {
  const parsed = ResetPasswordInput.safeParse(raw);
  if (!parsed.success) {
    const errors = fieldErrors(parsed.error);
    return errors.token ? fail("token_invalid") : fail("invalid_input", { fieldErrors: errors });
  }
  const problem = passwordProblem(parsed.data.password);
  if (problem) return fail("weak_password", { message: problem, fieldErrors: { password: problem } });
  const slot = await takeSlot(db, limitsFor("tokenFailures", null, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  const passwordHash = await hashPassword(parsed.data.password);
  const ok = await db.transaction(async (tx) => {
    const userId = await consumeToken(tx, parsed.data.token, "reset_password");
    if (!userId) return false;
    await tx
      .update(users)
      .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1`, emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`, updatedAt: sql`now()` })
      .where(eq(users.id, userId));
    await endEverySession(tx, userId);
    return true;
  });
  if (!ok) return fail("token_invalid");
  await refundSlot(db, slot);
  return { ok: true };
}

export async function requestSignInLink(raw: unknown, ctx: RequestContext, db: Database = processDb()): Promise<Result> {
  const parsed = EmailOnlyInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { fieldErrors: fieldErrors(parsed.error) });
  const { email } = parsed.data;
  const slot = await takeSlot(db, limitsFor("linkRequests", email, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  await db.transaction(async (tx) => {
    const [user] = await tx.select({ id: users.id, name: users.name, status: users.status }).from(users).where(eq(users.email, email)).limit(1);
    if (!user || user.status !== "active") return;
    const token = await issueToken(tx, user.id, "sign_in_link");
    await enqueueMail(tx, email, { template: "sign_in_link", name: user.name, url: `${ctx.baseUrl}/sign-in/link?token=${token}` });
  });
  return { ok: true };
}

/**
 * Only the person's POST from the confirmation page gets here; opening the link consumes nothing.
 * The link proves the address. For an account that was never verified that proof comes first:
 * a password set before it (perhaps by someone who signed up with another person's address) is
 * cleared and every session ended, and the owner chooses a password afterwards on their account page.
 */
export async function signInWithLink(raw: unknown, ctx: RequestContext, db: Database = processDb()): Promise<Result<SignedIn & { mustChoosePassword: boolean }>> {
  const slot = await takeSlot(db, limitsFor("tokenFailures", null, ctx.address));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  const parsed = TokenInput.safeParse(raw);
  if (!parsed.success) return fail("token_invalid");
  const user = await db.transaction(async (tx) => {
    const userId = await consumeToken(tx, parsed.data.token, "sign_in_link");
    if (!userId) return null;
    const [before] = await tx.select({ verifiedAt: users.emailVerifiedAt }).from(users).where(eq(users.id, userId)).for("update");
    const firstProof = !before?.verifiedAt;
    const [u] = await tx
      .update(users)
      .set(
        firstProof
          ? { emailVerifiedAt: sql`now()`, passwordHash: null, sessionVersion: sql`${users.sessionVersion} + 1`, updatedAt: sql`now()` }
          : { updatedAt: sql`now()` },
      )
      .where(eq(users.id, userId))
      .returning({ id: users.id, status: users.status, sessionVersion: users.sessionVersion, role: users.role, passwordHash: users.passwordHash });
    if (firstProof) await endEverySession(tx, userId);
    return u ?? null;
  });
  if (!user) return fail("token_invalid");
  await refundSlot(db, slot);
  if (user.status !== "active") return fail("account_disabled");
  return { ok: true, mustChoosePassword: user.passwordHash === null, ...(await startSession(db, user)) };
}

/** Ends the viewer's own session (this device). */
export async function signOut(viewer: Viewer | null, db: Database = processDb()): Promise<Result> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  await db.update(sessions).set({ revokedAt: sql`now()` }).where(and(eq(sessions.id, allowed.viewer.sessionId), isNull(sessions.revokedAt)));
  return { ok: true };
}

/** Every session ends and every reset or sign-in link already sent dies with them. */
export async function signOutEverywhere(viewer: Viewer | null, db: Database = processDb()): Promise<Result> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  const userId = allowed.viewer.id;
  await db.transaction(async (tx) => {
    await tx.update(users).set({ sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, userId));
    await endEverySession(tx, userId);
  });
  return { ok: true };
}

/** Revokes the user's sessions and burns the sign-in and reset links still unused (one transaction with the cause). */
export async function endEverySession(tx: Pick<Database, "update">, userId: string): Promise<void> {
  await tx.update(sessions).set({ revokedAt: sql`now()` }).where(and(eq(sessions.userId, userId), isNull(sessions.revokedAt)));
  await tx
    .update(authTokens)
    .set({ usedAt: sql`now()` })
    .where(and(eq(authTokens.userId, userId), isNull(authTokens.usedAt), inArray(authTokens.kind, ["reset_password", "sign_in_link"])));
}

/**
 * A signed-in person changes (or, after an e-mail-link first sign-in, chooses) their password.
 * The current password is asked when there is one. Every other session ends; this one carries on
 * with a fresh cookie.
 */
export async function changePassword(viewer: Viewer | null, raw: unknown, db: Database = processDb()): Promise<Result<SignedIn>> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  const me = allowed.viewer;
  const parsed = ChangePasswordInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { fieldErrors: fieldErrors(parsed.error) });
  const problem = passwordProblem(parsed.data.newPassword);
  if (problem) return fail("weak_password", { message: problem, fieldErrors: { newPassword: problem } });
  const slot = await takeSlot(db, limitsFor("passwordChanges", me.id, "any"));
  if (!slot.ok) return tooMany(slot.retryAfterSeconds);
  const [user] = await db.select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, me.id)).limit(1);
  if (!user) return fail("not_signed_in");
  if (user.passwordHash && !(await verifyPassword(user.passwordHash, parsed.data.currentPassword ?? ""))) {
    const message = "That is not your current password.";
    return fail("invalid_credentials", { message, fieldErrors: { currentPassword: message } });
  }
  await refundSlot(db, slot);
  const passwordHash = await hashPassword(parsed.data.newPassword);
  const updated = await db.transaction(async (tx) => {
    const [u] = await tx
      .update(users)
      .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1`, updatedAt: sql`now()` })
      .where(eq(users.id, me.id))
      .returning({ id: users.id, sessionVersion: users.sessionVersion, role: users.role });
    await endEverySession(tx, me.id);
    return u;
  });
  return { ok: true, ...(await startSession(db, updated)) };
}

/** Whether the signed-in person has a password yet (after a first e-mail-link sign-in they may not). */
export async function passwordStatus(viewer: Viewer | null, db: Database = processDb()): Promise<Result<{ hasPassword: boolean }>> {
  const allowed = guard(viewer);
  if (!allowed.ok) return allowed;
  const [u] = await db.select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, allowed.viewer.id)).limit(1);
  return { ok: true, hasPassword: !!u?.passwordHash };
}
