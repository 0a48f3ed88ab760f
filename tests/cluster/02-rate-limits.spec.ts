import { expect, request, test, type APIRequestContext } from "@playwright/test";
import { uniqueAddress, uniqueEmail } from "../support/unique";
import { A, B, PROXY, context, newVerifiedAccount, withDb } from "./cluster";

// Rate limits are counted in PostgreSQL, so two instances share one count; and through nginx
// the address is the one nginx saw, whatever X-Forwarded-For the client sends.
// The limit is measured first on instance A alone (the configured count of wrong passwords per
// account and address), then the same count must hold however the attempts are spread.

test.describe.configure({ mode: "serial" });

const MAX_TRIES = 40;

/** Sends wrong passwords (each through `pick(i)`) until a 429; returns how many were refused with 401 first. */
async function wrongUntilLimited(email: string, pick: (i: number) => Promise<APIRequestContext>): Promise<{ failures: number; retryAfter: number }> {
  for (let i = 0; i < MAX_TRIES; i++) {
    const res = await (await pick(i)).post("/api/account/sign-in", { data: { email, password: "not the password at all" } });
    if (res.status() === 429) return { failures: i, retryAfter: Number(res.headers()["retry-after"]) };
    expect(res.status(), `attempt ${i + 1}`).toBe(401);
  }
  throw new Error(`no 429 after ${MAX_TRIES} wrong passwords`);
}

let limit = 0;

test("the limit on wrong passwords, measured on one instance", async () => {
  const { email } = await newVerifiedAccount();
  const api = await context(A, { address: uniqueAddress() });
  const { failures, retryAfter } = await wrongUntilLimited(email, async () => api);
  expect(failures).toBeGreaterThan(1);
  expect(retryAfter).toBeGreaterThan(0);
  limit = failures;
});

test("wrong passwords alternated between A and B hit the same limit: the count is shared", async () => {
  expect(limit).toBeGreaterThan(1);
  const { email } = await newVerifiedAccount();
  const address = uniqueAddress(); // one client, as a proxy in front of both would name it
  const onA = await context(A, { address });
  const onB = await context(B, { address });
  const { failures } = await wrongUntilLimited(email, async (i) => (i % 2 === 0 ? onA : onB));
  // Counted per process, it would take twice as many.
  expect(failures).toBe(limit);
});

test("through nginx a client-sent X-Forwarded-For changes nothing: spoofed addresses still hit the same limit", async () => {
  expect(limit).toBeGreaterThan(1);
  const email = uniqueEmail("spoof");
  const startedAt = new Date();
  const spoofed: string[] = [];
  let seen: string[] = [];
  try {
    const { failures } = await wrongUntilLimited(email, async () => {
      // Every try claims another address, in each header a client could use for it.
      const address = uniqueAddress();
      spoofed.push(address);
      return request.newContext({ baseURL: PROXY, extraHTTPHeaders: { "x-forwarded-for": address, forwarded: `for=${address}`, "x-real-ip": address } });
    });
    expect(failures).toBe(limit);
    // The address each failure was counted under: one, the address nginx saw (this machine).
    const rows = await withDb((c) => c.query<{ bucket: string }>("select distinct bucket from rate_limit_events where bucket like $1", [`signInFailures:account-address:${email}|%`]));
    seen = rows.rows.map((r) => r.bucket.slice(r.bucket.indexOf("|") + 1));
    expect(seen).toHaveLength(1);
    expect(spoofed).not.toContain(seen[0]);
  } finally {
    // The proxy's one address was charged too: give those events back, so later tests and
    // re-runs against the same database are not locked out by this one.
    await withDb((c) => c.query("delete from rate_limit_events where created_at >= $1 and (bucket = any($2) or bucket like $3)", [startedAt, seen.map((a) => `signInFailures:address:${a}`), `%${email}%`]));
  }
});

test("the same holds for a request straight to an instance that claims a longer chain: only the last hop counts", async () => {
  // Instances trust one hop: of "forged, real", only "real" is the client.
  const email = uniqueEmail("chain");
  const real = uniqueAddress();
  const { failures } = await wrongUntilLimited(email, async () => context(B, { address: `${uniqueAddress()}, ${real}` }));
  expect(failures).toBe(limit);
});
