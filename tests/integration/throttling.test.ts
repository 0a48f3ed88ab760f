// The throttling policy of lib/server/rate-limit.ts (OWASP ASVS 5.0 V6.3.1; the per-account
// ceiling of 100 failures an hour is the figure of ASVS 4.0.3 V2.2.1), pre-account takeover
// (OWASP Web Security Testing Guide 4.2, "Testing for Account Enumeration and Guessable User
// Account" and the pre-hijacking attacks of Sudhodanan & Paverd, USENIX Security 2022), and
// tokens that die with a password change.
import { afterAll, describe, expect, it } from "vitest";
import { and, eq, isNull, sql } from "drizzle-orm";
import { authTokens, mailOutbox, sessions, users } from "@/db/schema";
import { closeDb } from "@/db/connection";
import {
  changePassword,
  requestPasswordReset,
  requestSignInLink,
  signInWithLink,
  signInWithPassword,
  signOutEverywhere,
  signUp,
} from "@/lib/server/accounts";
import { LIMITS, limitsFor, takeSlot } from "@/lib/server/rate-limit";
import { newToken } from "@/lib/server/tokens";
import { decodeSessionToken } from "@/lib/server/session-cookie";
import { uniqueAddress, uniqueEmail } from "../support/unique";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";

afterAll(async () => {
  await closeDb();
});

const failed = (r: { ok: boolean }) => (r as unknown as Record<string, unknown>);
const codeOf = (r: { ok: boolean }) => failed(r).code;

describe("sign-in throttling", () => {
  it("counts and decides in one step: 30 concurrent wrong passwords get exactly the limit's tries", async () => {
    const u = await createUser();
    const address = uniqueAddress();
    const results = await Promise.all(
      Array.from({ length: 30 }, () => signInWithPassword({ email: u.email, password: "wrong guess" }, { ...ctx(), address })),
    );
    const tried = results.filter((r) => codeOf(r) === "invalid_credentials").length;
    expect(tried).toBe(LIMITS.signInFailures.accountAddress.max);
    expect(results.filter((r) => codeOf(r) === "rate_limited").length).toBe(30 - tried);
  });

  it("guesses from other addresses never lock the owner out of their own address", async () => {
    const u = await createUser();
    for (let i = 0; i < 12; i++) {
      await signInWithPassword({ email: u.email, password: "attacker guess" }, ctx());
    }
    const owner = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    expect(owner.ok).toBe(true);
  });

  it("the same address is limited after 5 failures on one account and says when to try again", async () => {
    const u = await createUser();
    const c = ctx();
    for (let i = 0; i < LIMITS.signInFailures.accountAddress.max; i++) {
      expect(codeOf(await signInWithPassword({ email: u.email, password: "wrong guess" }, c))).toBe("invalid_credentials");
    }
    const limited = await signInWithPassword({ email: u.email, password: u.password }, c);
    expect(codeOf(limited)).toBe("rate_limited");
    if (!limited.ok) {
      expect(limited.retryAfterSeconds).toBeGreaterThan(14 * 60);
      expect(limited.message).toMatch(/try again in 1[45] minutes/);
    }
  });

  it("a right password gives its slot back: many good sign-ins never throttle", async () => {
    const u = await createUser();
    const c = ctx();
    for (let i = 0; i < LIMITS.signInFailures.accountAddress.max + 3; i++) {
      expect((await signInWithPassword({ email: u.email, password: u.password }, c)).ok).toBe(true);
    }
  });

  it("one address spraying many accounts is limited", async () => {
    const address = uniqueAddress();
    for (let i = 0; i < LIMITS.signInFailures.address.max; i++) {
      await signInWithPassword({ email: uniqueEmail("spray"), password: "guess" }, { ...ctx(), address });
    }
    expect(codeOf(await signInWithPassword({ email: uniqueEmail("spray"), password: "guess" }, { ...ctx(), address }))).toBe("rate_limited");
  });

  it("a distributed guesser meets the per-account ceiling, and the owner still gets in by e-mail link", async () => {
    const u = await createUser();
    // Fill the account's hourly ceiling directly (100 events) rather than hashing 100 passwords.
    const [ceiling] = limitsFor("signInFailures", u.email, "x").filter((l) => l.bucket.includes(":account:"));
    await testDb().execute(sql`insert into rate_limit_events (bucket) select ${ceiling.bucket} from generate_series(1, ${ceiling.max})`);
    expect(codeOf(await signInWithPassword({ email: u.email, password: u.password }, ctx()))).toBe("rate_limited");
    expect(await requestSignInLink({ email: u.email }, ctx())).toEqual({ ok: true });
  });

  it("takeSlot never hands out more than the limit under concurrency", async () => {
    const limits = [{ bucket: `test:${uniqueEmail()}`, max: 3, windowSeconds: 60 }];
    const slots = await Promise.all(Array.from({ length: 20 }, () => takeSlot(testDb(), limits)));
    expect(slots.filter((s) => s.ok).length).toBe(3);
  });
});

describe("sign-up throttling", () => {
  it("one address can't send a stream of sign-up mails", async () => {
    const address = uniqueAddress();
    const results = [];
    for (let i = 0; i < LIMITS.signUps.address.max + 2; i++) {
      results.push(await signUp({ name: "Sprayer", email: uniqueEmail("su"), password: "tideline stage left" }, { ...ctx(), address }));
    }
    expect(results.filter((r) => r.ok).length).toBe(LIMITS.signUps.address.max);
    expect(codeOf(results.at(-1)!)).toBe("rate_limited");
  });

  it("a taken address gets the 'account exists' mail at most once an hour", async () => {
    const u = await createUser();
    for (let i = 0; i < 3; i++) {
      expect(await signUp({ name: "Again", email: u.email, password: "tideline stage left" }, ctx())).toEqual({ ok: true, email: u.email });
    }
    const mails = await testDb().select().from(mailOutbox).where(and(eq(mailOutbox.toAddress, u.email), eq(mailOutbox.template, "account_exists")));
    expect(mails).toHaveLength(1);
  });

  it("refuses a name with a line break or control character (it reaches plain-text mail)", async () => {
    for (const name of ["Wren\nBcc: someone@evil.example", "Wren\r\nTallis", "Wren\u0007", "Wren\u2028Tallis"]) {
      const r = await signUp({ name, email: uniqueEmail("nm"), password: "tideline stage left" }, ctx());
      expect(codeOf(r)).toBe("invalid_input");
      expect(failed(r).fieldErrors).toMatchObject({ name: expect.stringMatching(/line breaks/) });
    }
  });
});

async function linkTokenFor(userId: string): Promise<string> {
  // The token as the mail would carry it: issued here so the test needs no SMTP.
  const { token, tokenHash } = newToken();
  await testDb().insert(authTokens).values({ userId, kind: "sign_in_link", tokenHash, expiresAt: new Date(Date.now() + 600_000) });
  return token;
}

describe("pre-account takeover", () => {
  it("the owner's first e-mail-link sign-in clears a planted password and ends the planter's sessions", async () => {
    const email = uniqueEmail("victim");
    // The planter signs up with the owner's address and a password of their choosing.
    expect((await signUp({ name: "Planter", email, password: "planted passphrase 1" }, ctx())).ok).toBe(true);
    const [planted] = await testDb().select().from(users).where(eq(users.email, email));
    // Even a session row made somehow for the unverified account is ended.
    await testDb().insert(sessions).values({ userId: planted.id, sessionVersion: planted.sessionVersion, expiresAt: new Date(Date.now() + 3600_000) });

    const owner = await signInWithLink({ token: await linkTokenFor(planted.id) }, ctx());
    expect(owner.ok).toBe(true);
    if (!owner.ok) return;
    expect(owner.mustChoosePassword).toBe(true);
    const [after] = await testDb().select().from(users).where(eq(users.id, planted.id));
    expect(after.passwordHash).toBeNull();
    expect(after.emailVerifiedAt).not.toBeNull();
    const live = await testDb().select().from(sessions).where(and(eq(sessions.userId, planted.id), isNull(sessions.revokedAt)));
    expect(live).toHaveLength(1); // only the owner's new session
    expect(codeOf(await signInWithPassword({ email, password: "planted passphrase 1" }, ctx()))).toBe("invalid_credentials");

    // The owner chooses a password without knowing the planted one, and it works.
    const viewer = await viewerFromToken(owner.sessionToken);
    expect((await changePassword(viewer!, { newPassword: "the owner's own passphrase" })).ok).toBe(true);
    expect((await signInWithPassword({ email, password: "the owner's own passphrase" }, ctx())).ok).toBe(true);
  });

  it("a verified account keeps its password when its owner signs in by link", async () => {
    const u = await createUser();
    const r = await signInWithLink({ token: await linkTokenFor(u.id) }, ctx());
    expect(r.ok && r.mustChoosePassword).toBe(false);
    expect((await signInWithPassword({ email: u.email, password: u.password }, ctx())).ok).toBe(true);
  });
});

describe("changing a password", () => {
  async function session(u: { email: string; password: string }) {
    const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    return s;
  }

  it("asks for the current password", async () => {
    const u = await createUser();
    const s = await session(u);
    const viewer = await viewerFromToken(s.sessionToken);
    const r = await changePassword(viewer!, { currentPassword: "not it", newPassword: "a brand new passphrase" });
    expect(codeOf(r)).toBe("invalid_credentials");
    expect(failed(r).fieldErrors).toMatchObject({ currentPassword: expect.any(String) });
  });

  it("ends the other sessions, keeps this one with a fresh cookie, and kills links already sent", async () => {
    const u = await createUser();
    const here = await session(u);
    const elsewhere = await session(u);
    const link = await linkTokenFor(u.id);
    expect((await requestPasswordReset({ email: u.email }, ctx())).ok).toBe(true);
    const viewer = await viewerFromToken(here.sessionToken);
    const r = await changePassword(viewer!, { currentPassword: u.password, newPassword: "a brand new passphrase" });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(await viewerFromToken(elsewhere.sessionToken)).toBeNull();
    expect(await viewerFromToken(here.sessionToken)).toBeNull();
    expect((await viewerFromToken(r.sessionToken))?.id).toBe(u.id);
    expect(codeOf(await signInWithLink({ token: link }, ctx()))).toBe("token_invalid");
    const unused = await testDb().select().from(authTokens).where(and(eq(authTokens.userId, u.id), isNull(authTokens.usedAt)));
    expect(unused).toHaveLength(0);
  });

  it("sign out everywhere also kills links already sent", async () => {
    const u = await createUser();
    const link = await linkTokenFor(u.id);
    const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
    if (!s.ok) throw new Error("sign-in failed");
    expect(await signOutEverywhere(await viewerFromToken(s.sessionToken))).toEqual({ ok: true });
    expect(codeOf(await signInWithLink({ token: link }, ctx()))).toBe("token_invalid");
  });

  it("the new cookie names a session of the new version", async () => {
    const u = await createUser();
    const here = await session(u);
    const r = await changePassword((await viewerFromToken(here.sessionToken))!, { currentPassword: u.password, newPassword: "another new passphrase" });
    if (!r.ok) throw new Error("change failed");
    const before = await decodeSessionToken(here.sessionToken);
    const after = await decodeSessionToken(r.sessionToken);
    expect(after!.sv).toBe(before!.sv + 1);
  });
});
