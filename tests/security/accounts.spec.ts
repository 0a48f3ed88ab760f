// Security probes of the account flows over HTTP against the production build (issue: "seven
// weaknesses found by black-box probes"). Each failed on the code before its fix.
import { expect, test } from "../e2e/page-check";
import { tokenFrom, waitForMail, mailTo } from "../support/mail";
import { baseURL } from "../e2e/helpers";
import { from, proxyURL, sessionCookieOf, uniqueAddress, uniqueEmail, verifiedAccount, withDb } from "./support";

test.describe("§2 the dev inbox answers only a direct request from this machine", () => {
  test("direct from loopback: shown; any forwarded header or the proxy: 404", async () => {
    expect((await (await from(null)).get("/dev/inbox")).status()).toBe(200);
    expect((await (await from("127.0.0.1")).get("/dev/inbox")).status()).toBe(404);
    expect((await (await from(null)).get("/dev/inbox", { headers: { forwarded: "for=127.0.0.1" } })).status()).toBe(404);
    expect((await (await from(null, proxyURL)).get("/dev/inbox")).status()).toBe(404);
    // A forged edge header from the client is overwritten by the edge.
    expect((await (await from(null, proxyURL)).get("/dev/inbox", { headers: { "x-axisline-forwarded": "0", "x-axisline-peer": "127.0.0.1" } })).status()).toBe(404);
  });
});

test.describe("§4 rate limits", () => {
  test("a client-sent X-Forwarded-For through the proxy does not choose the rate-limit bucket", async () => {
    const email = uniqueEmail("xff");
    // A documentation address (RFC 5737) unique to this run.
    const spoofed = `203.0.113.${Math.floor(Math.random() * 250) + 1}`;
    const api = await from(spoofed, proxyURL);
    expect((await api.post("/api/account/sign-in", { data: { email, password: "a wrong guess" } })).status()).toBe(401);
    const buckets = await withDb(async (c) => (await c.query("select bucket from rate_limit_events where created_at > now() - interval '1 minute' and bucket like $1", [`%${spoofed}%`])).rows);
    expect(buckets).toEqual([]);
  });

  test("30 concurrent wrong passwords get exactly 5 tries (count and decision are one step)", async () => {
    const { email } = await verifiedAccount();
    const api = await from(uniqueAddress());
    const statuses = await Promise.all(Array.from({ length: 30 }, () => api.post("/api/account/sign-in", { data: { email, password: "a wrong guess" } }).then((r) => r.status())));
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(25);
  });

  test("guesses from elsewhere don't lock the owner out", async () => {
    const { email, password } = await verifiedAccount();
    for (let i = 0; i < 8; i++) await (await from(uniqueAddress())).post("/api/account/sign-in", { data: { email, password: "attacker guess" } });
    const owner = await (await from(uniqueAddress())).post("/api/account/sign-in", { data: { email, password } });
    expect(owner.status()).toBe(200);
  });

  test("one address can't send a stream of sign-up mails", async () => {
    const api = await from(uniqueAddress());
    const statuses: number[] = [];
    for (let i = 0; i < 12; i++) statuses.push((await api.post("/api/account/sign-up", { data: { name: "Sprayer", email: uniqueEmail("spray"), password: "tideline stage left" } })).status());
    expect(statuses.filter((s) => s === 200)).toHaveLength(10);
    expect(statuses.at(-1)).toBe(429);
  });

  test("a taken address gets the 'account exists' mail once an hour", async () => {
    const { email } = await verifiedAccount();
    // Two more sign-ups for the address (its first sign-up counts too: 3 an hour per target).
    for (let i = 0; i < 2; i++) {
      const r = await (await from(uniqueAddress())).post("/api/account/sign-up", { data: { name: "Again", email, password: "tideline stage left" } });
      expect(r.status()).toBe(200);
    }
    await expect.poll(async () => (await mailTo(email)).filter((m) => /already have/.test(m.subject)).length, { timeout: 5000 }).toBe(1);
    await new Promise((r) => setTimeout(r, 1500)); // the worker had time to send any more
    expect((await mailTo(email)).filter((m) => /already have/.test(m.subject))).toHaveLength(1);
  });
});

test.describe("§5 pre-account takeover", () => {
  test("a password planted before the owner proves the address by link no longer works", async () => {
    const email = uniqueEmail("victim");
    const planter = await from(uniqueAddress());
    expect((await planter.post("/api/account/sign-up", { data: { name: "Planter", email, password: "planted passphrase 1" } })).status()).toBe(200);
    const owner = await from(uniqueAddress());
    expect((await owner.post("/api/account/link-request", { data: { email } })).status()).toBe(200);
    const mail = await waitForMail(email, /sign-in link/);
    const signedIn = await owner.post("/api/account/link", { data: { token: tokenFrom(mail) } });
    expect(signedIn.status()).toBe(200);
    const planted = await (await from(uniqueAddress())).post("/api/account/sign-in", { data: { email, password: "planted passphrase 1" } });
    expect(planted.status()).toBe(401);
    expect((await signedIn.json()).next).toMatch(/^\/account\?choose-password=1/);
    const chosen = await owner.post("/api/account/password", { data: { newPassword: "the owner's own passphrase" } });
    expect(chosen.status()).toBe(200);
    expect((await (await from(uniqueAddress())).post("/api/account/sign-in", { data: { email, password: "the owner's own passphrase" } })).status()).toBe(200);
  });
});

test.describe("§7 smaller gaps", () => {
  test("a 5 MB body is answered 413 before it is parsed", async () => {
    const big = JSON.stringify({ email: "a@b.example", password: "x".repeat(5 * 1024 * 1024) });
    const r = await (await from(uniqueAddress())).post("/api/account/sign-in", { data: big, headers: { "content-type": "application/json" } });
    expect(r.status()).toBe(413);
    expect((await r.json()).message).toMatch(/more than Axisline accepts/);
  });

  test("__proto__ and constructor keys are refused", async () => {
    const api = await from(uniqueAddress());
    const body = `{"name":"Proto","email":"${uniqueEmail("proto")}","password":"tideline stage left","__proto__":{"role":"admin"}}`;
    const r = await api.post("/api/account/sign-up", { data: body, headers: { "content-type": "application/json" } });
    expect(r.status()).toBe(400);
  });

  test("a name with a line break is refused with a sentence", async () => {
    const r = await (await from(uniqueAddress())).post("/api/account/sign-up", { data: { name: "Wren\nBcc: someone@evil.example", email: uniqueEmail("nl"), password: "tideline stage left" } });
    expect(r.status()).toBe(400);
    expect((await r.json()).fieldErrors.name).toMatch(/line breaks/);
  });

  test("a signed-in person changes their password; other sessions end; links already sent die", async () => {
    const { email, password } = await verifiedAccount();
    const here = await from(uniqueAddress());
    expect((await here.post("/api/account/sign-in", { data: { email, password } })).status()).toBe(200);
    const elsewhere = await from(uniqueAddress());
    expect((await elsewhere.post("/api/account/sign-in", { data: { email, password } })).status()).toBe(200);
    expect((await here.post("/api/account/reset-request", { data: { email } })).status()).toBe(200);
    const resetMail = await waitForMail(email, /Reset your/);

    expect((await (await from(uniqueAddress())).post("/api/account/password", { data: { newPassword: "whatever new one" } })).status()).toBe(401);
    expect((await here.post("/api/account/password", { data: { currentPassword: "not it", newPassword: "a new passphrase" } })).status()).toBe(401);
    expect((await here.post("/api/account/password", { data: { currentPassword: password, newPassword: "a new passphrase" } })).status()).toBe(200);

    expect((await (await here.get("/api/me")).json()).me?.email).toBe(email);
    expect((await (await elsewhere.get("/api/me")).json()).me).toBeNull();
    const reset = await (await from(uniqueAddress())).post("/api/account/reset-password", { data: { token: tokenFrom(resetMail), password: "attacker's passphrase" } });
    expect(reset.status()).toBe(400);
    expect(await sessionCookieOf(here)).toBeTruthy();
  });

  test("sign out everywhere kills a reset link already sent", async () => {
    const { email, password } = await verifiedAccount();
    const api = await from(uniqueAddress());
    expect((await api.post("/api/account/sign-in", { data: { email, password } })).status()).toBe(200);
    expect((await api.post("/api/account/reset-request", { data: { email } })).status()).toBe(200);
    const mail = await waitForMail(email, /Reset your/);
    expect((await api.post("/api/account/sign-out-everywhere", { headers: { origin: new URL(baseURL).origin } })).status()).toBe(200);
    expect((await (await from(uniqueAddress())).post("/api/account/reset-password", { data: { token: tokenFrom(mail), password: "attacker's passphrase" } })).status()).toBe(400);
  });

  test("next-auth's own routes are not exposed", async () => {
    const api = await from(uniqueAddress());
    expect((await api.get("/api/auth/session")).status()).toBe(404);
    expect((await api.post("/api/auth/signout")).status()).toBe(404);
  });
});
