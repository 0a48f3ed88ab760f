import { expect, test } from "@playwright/test";
import { A, B, PROXY, context, newVerifiedAccount, sessionCookieOf } from "./cluster";

// Sessions live in PostgreSQL, not in a process: a sign-in through the proxy works on both
// instances, and a sign-out everywhere on one is refused by the other at its next request.

test("signed in through the proxy; sign-out everywhere on A; the old cookie is refused at B", async () => {
  const { email, password } = await newVerifiedAccount();
  const viaProxy = await context(PROXY);
  const signIn = await viaProxy.post("/api/account/sign-in", { data: { email, password } });
  expect(signIn.status()).toBe(200);
  const cookie = await sessionCookieOf(viaProxy);

  for (const base of [A, B, PROXY]) {
    const me = await (await context(base, { cookie })).get("/api/me");
    expect(me.status(), base).toBe(200);
    expect((await me.json()).me?.email, base).toBe(email);
  }

  const onA = await context(A, { cookie });
  expect((await onA.post("/api/account/sign-out-everywhere")).status()).toBe(200);

  const atB = await (await context(B, { cookie })).get("/api/me");
  expect(atB.status()).toBe(200);
  expect((await atB.json()).me).toBeNull();
  expect((await (await context(B, { cookie })).get("/learn")).status()).toBe(307);
  expect((await (await (await context(PROXY, { cookie })).get("/api/me")).json()).me).toBeNull();
});
