import { afterAll, describe, expect, it } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { authTokens, mailOutbox, users } from "@/db/schema";
import { closeDb } from "@/db/connection";
import {
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
import { drainOutbox } from "@/lib/email/worker";
import { smtpTransport } from "@/lib/email/transport";
import { tokenFrom, waitForMail } from "../support/mail";
import { uniqueEmail } from "../support/unique";
import { countRows, createUser, ctx, testDb, userRow, viewerFromToken } from "./helpers";

const FROM = "Axisline <no-reply@axisline.test>";
const sendQueuedMail = () => drainOutbox(testDb(), smtpTransport(), FROM, 200);

afterAll(async () => {
  await closeDb();
});

describe("sign-up, verification mail through real SMTP, sign-in", () => {
  it("sign-up → the verification mail reaches the SMTP catcher → verify → sign in", async () => {
    const email = uniqueEmail("signup");
    const c = ctx();
    expect(await signUp({ name: "Wren Tallis", email, password: "tideline stage left" }, c)).toEqual({ ok: true, email });
    // Not verified yet: sign-in is refused with a sentence.
    const early = await signInWithPassword({ email, password: "tideline stage left" }, c);
    expect(early).toMatchObject({ ok: false, code: "email_unverified" });

    await sendQueuedMail();
    const mail = await waitForMail(email, /Confirm your e-mail/);
    expect(mail.text).toContain("/verify-email?token=");
    expect(await verifyEmail({ token: tokenFrom(mail) })).toEqual({ ok: true });
    // A confirmation link works once.
    expect(await verifyEmail({ token: tokenFrom(mail) })).toMatchObject({ ok: false, code: "token_invalid" });

    const signedIn = await signInWithPassword({ email: email.toUpperCase(), password: "tideline stage left" }, c);
    expect(signedIn.ok).toBe(true);
    if (signedIn.ok) expect((await viewerFromToken(signedIn.sessionToken))?.email).toBe(email);
  });

  it("signing up with a taken address answers the same and mails the owner instead of creating a user", async () => {
    const existing = await createUser("apprentice");
    const before = await countRows("users");
    const r = await signUp({ name: "Someone Else", email: existing.email, password: "another long passphrase" }, ctx());
    expect(r).toEqual({ ok: true, email: existing.email });
    expect(await countRows("users")).toBe(before);
    await sendQueuedMail();
    expect((await waitForMail(existing.email, /already have an Axisline account/)).text).toContain("/sign-in");
  });

  it("stores argon2id hashes at OWASP parameters (m = 19 MiB, t = 2)", async () => {
    const u = await createUser();
    // OWASP Password Storage Cheat Sheet / ASVS 5.0: argon2id, m=19456 KiB, t=2, p=1
    expect((await userRow(u.id)).passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });
});

describe("password rules", () => {
  const attempt = (password: string) => signUp({ name: "Rule Check", email: uniqueEmail("rules"), password }, ctx());

  it("needs at least 8 characters and says so", async () => {
    expect(await attempt("short1!")).toMatchObject({ ok: false, code: "invalid_input", fieldErrors: { password: "Use at least 8 characters." } });
    expect((await attempt("eightch!")).ok).toBe(true);
  });

  it("allows at least 64 (up to 128) characters and rejects longer with a sentence", async () => {
    expect((await attempt("x".repeat(63) + "!")).ok).toBe(true);
    expect((await attempt("y".repeat(128))).ok).toBe(true);
    expect(await attempt("z".repeat(129))).toMatchObject({ ok: false, fieldErrors: { password: "Use at most 128 characters." } });
  });

  it("rejects the most common passwords with a clear message", async () => {
    for (const common of ["password", "12345678", "qwertyuiop", "baseball"]) {
      const r = await attempt(common);
      expect(r).toMatchObject({ ok: false, code: "weak_password" });
      if (!r.ok) expect(r.message).toMatch(/most common/);
    }
  });

  it("never truncates: a long password's first 72 characters do not sign in", async () => {
    const password = "stage-box ".repeat(10); // 100 characters; bcrypt would ignore past 72
    const u = await createUser("apprentice", password);
    expect((await signInWithPassword({ email: u.email, password: password.slice(0, 72) }, ctx())).ok).toBe(false);
    expect((await signInWithPassword({ email: u.email, password }, ctx())).ok).toBe(true);
  });
});

describe("uniform answers and rate limits", () => {
  it("an unknown e-mail and a wrong password get the same answer", async () => {
    const u = await createUser();
    const unknown = await signInWithPassword({ email: uniqueEmail("nobody"), password: "whatever it is" }, ctx());
    const wrong = await signInWithPassword({ email: u.email, password: "not the password" }, ctx());
    expect(unknown).toEqual(wrong);
    expect(wrong).toMatchObject({ ok: false, code: "invalid_credentials" });
  });

  // Throttling: tests/integration/throttling.test.ts
});

async function latestToken(userId: string, kind: "sign_in_link" | "reset_password") {
  await sendQueuedMail();
  const [u] = await testDb().select({ email: users.email }).from(users).where(eq(users.id, userId));
  return tokenFrom(await waitForMail(u.email, kind === "sign_in_link" ? /sign-in link/ : /Reset your/));
}

describe("sign-in by e-mail link", () => {
  it("lives at most 10 minutes", async () => {
    const u = await createUser();
    await requestSignInLink({ email: u.email }, ctx());
    const [t] = await testDb().select().from(authTokens).where(and(eq(authTokens.userId, u.id), eq(authTokens.kind, "sign_in_link")));
    expect(t.expiresAt.getTime() - t.createdAt.getTime()).toBeLessThanOrEqual(10 * 60 * 1000 + 1000);
  });

  it("works once", async () => {
    const u = await createUser();
    await requestSignInLink({ email: u.email }, ctx());
    const token = await latestToken(u.id, "sign_in_link");
    expect((await signInWithLink({ token }, ctx())).ok).toBe(true);
    expect(await signInWithLink({ token }, ctx())).toMatchObject({ ok: false, code: "token_invalid" });
  });

  it("fails after its 10 minutes", async () => {
    const u = await createUser();
    await requestSignInLink({ email: u.email }, ctx());
    const token = await latestToken(u.id, "sign_in_link");
    // Age the token past its lifetime rather than waiting 10 minutes.
    await testDb().update(authTokens).set({ expiresAt: sql`now() - interval '1 second'` }).where(eq(authTokens.userId, u.id));
    expect(await signInWithLink({ token }, ctx())).toMatchObject({ ok: false, code: "token_invalid" });
  });

  it("an unknown address answers the same and sends nothing", async () => {
    const before = await countRows("mail_outbox");
    expect(await requestSignInLink({ email: uniqueEmail("ghost") }, ctx())).toEqual({ ok: true });
    expect(await countRows("mail_outbox")).toBe(before);
  });
});

describe("password reset", () => {
  it("sets the new password, ends every session, and works once", async () => {
    const u = await createUser();
    const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    await requestPasswordReset({ email: u.email }, ctx());
    const token = await latestToken(u.id, "reset_password");
    expect(await resetPassword({ token, password: "a brand new passphrase" }, ctx())).toEqual({ ok: true });
    expect(await viewerFromToken(s.sessionToken)).toBeNull();
    expect((await signInWithPassword({ email: u.email, password: "a brand new passphrase" }, ctx())).ok).toBe(true);
    expect(await resetPassword({ token, password: "yet another passphrase" }, ctx())).toMatchObject({ code: "token_invalid" });
  });

  it("a weak new password is refused and the link stays usable (nothing written)", async () => {
    const u = await createUser();
    await requestPasswordReset({ email: u.email }, ctx());
    const token = await latestToken(u.id, "reset_password");
    const hashBefore = (await userRow(u.id)).passwordHash;
    expect(await resetPassword({ token, password: "password" }, ctx())).toMatchObject({ code: "weak_password" });
    expect((await userRow(u.id)).passwordHash).toBe(hashBefore);
    expect(await resetPassword({ token, password: "now a good passphrase" }, ctx())).toEqual({ ok: true });
  });
});

describe("revocable sessions", () => {
  it("sign-out ends that session; the old cookie no longer identifies anyone", async () => {
    const u = await createUser();
    const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    const viewer = await viewerFromToken(s.sessionToken);
    expect(viewer?.id).toBe(u.id);
    expect(await signOut(viewer)).toEqual({ ok: true });
    expect(await viewerFromToken(s.sessionToken)).toBeNull();
  });

  it("sign-out everywhere ends every session of the account", async () => {
    const u = await createUser();
    const a = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    const b = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    if (!a.ok || !b.ok) throw new Error("sign-in failed");
    expect(await signOutEverywhere(await viewerFromToken(a.sessionToken))).toEqual({ ok: true });
    expect(await viewerFromToken(a.sessionToken)).toBeNull();
    expect(await viewerFromToken(b.sessionToken)).toBeNull();
  });

  it("a forged or garbled cookie identifies nobody", async () => {
    expect(await viewerFromToken("not-a-jwt")).toBeNull();
    expect(await viewerFromToken("")).toBeNull();
  });
});

describe("bad input writes nothing", () => {
  const cases: [string, () => Promise<{ ok: boolean }>][] = [
    ["sign-up without a name", () => signUp({ name: "", email: uniqueEmail(), password: "long enough pass" }, ctx())],
    ["sign-up with a bad e-mail", () => signUp({ name: "A", email: "not-an-email", password: "long enough pass" }, ctx())],
    ["sign-up with a non-string password", () => signUp({ name: "A", email: uniqueEmail(), password: 12345678 }, ctx())],
    ["sign-up with nothing", () => signUp(null, ctx())],
    ["sign-in with a bad e-mail", () => signInWithPassword({ email: "@", password: "x" }, ctx())],
    ["reset request with a bad e-mail", () => requestPasswordReset({ email: "nope" }, ctx())],
    ["link request with a bad e-mail", () => requestSignInLink({ email: 42 }, ctx())],
    ["link with a damaged token", () => signInWithLink({ token: "short" }, ctx())],
    ["reset with a damaged token", () => resetPassword({ token: "short", password: "long enough pass" }, ctx())],
    ["verify with a damaged token", () => verifyEmail({ token: "../../etc" })],
  ];
  it.each(cases)("%s", async (_name, run) => {
    const before = await Promise.all((["users", "auth_tokens", "mail_outbox", "sessions"] as const).map(countRows));
    const r = await run();
    expect(r.ok).toBe(false);
    expect((r as { message?: string }).message).toMatch(/[A-Z].+\./); // a sentence for a person
    const after = await Promise.all((["users", "auth_tokens", "mail_outbox", "sessions"] as const).map(countRows));
    expect(after).toEqual(before);
  });
});

describe("mail outbox", () => {
  it("keeps a message and retries with backoff while the SMTP server is down", async () => {
    const email = uniqueEmail("outage");
    await signUp({ name: "Outage Test", email, password: "lantern room nights" }, ctx());
    const down = { send: async () => Promise.reject(new Error("connect ECONNREFUSED 127.0.0.1:1")) };
    const first = await drainOutbox(testDb(), down, FROM, 200);
    expect(first.failed).toBeGreaterThan(0);
    const [row] = await testDb().select().from(mailOutbox).where(eq(mailOutbox.toAddress, email));
    expect(row).toMatchObject({ status: "pending", attempts: 1, lastError: expect.stringContaining("ECONNREFUSED") });
    expect(row.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());
    // Once it is due again and the server is back, it goes out.
    await testDb().update(mailOutbox).set({ nextAttemptAt: sql`now()` }).where(eq(mailOutbox.id, row.id));
    await sendQueuedMail();
    expect((await waitForMail(email, /Confirm your e-mail/)).to).toContain(email);
  });
});
