// Shared by the cluster tests: where the proxy and the two app instances are, HTTP contexts for
// each, and accounts made for the test. scripts/test.sh starts the pair and nginx and exports
// these variables; instance A is the e2e server.
import { request as playwrightRequest, expect, type APIRequestContext } from "@playwright/test";
import { get as httpGet, type IncomingHttpHeaders } from "node:http";
import { tokenFrom, waitForMail } from "../support/mail";
import { uniqueAddress, uniqueEmail } from "../support/unique";
export { withDb } from "../support/db";

export const PROXY = process.env.CLUSTER_PROXY_URL ?? "http://127.0.0.1:3180";
export const A = process.env.CLUSTER_A_URL ?? "http://127.0.0.1:3100";
export const B = process.env.CLUSTER_B_URL ?? "http://127.0.0.1:3101";

/**
 * An HTTP context with its own cookie jar. Straight to an instance, the test plays the proxy the
 * instances trust (TRUST_PROXY_HOPS=1) and names a fresh client address, so tests never share
 * rate-limit buckets; through nginx, whatever X-Forwarded-For is sent is overwritten anyway.
 */
export async function context(baseURL: string, opts: { cookie?: string; address?: string } = {}): Promise<APIRequestContext> {
  const headers: Record<string, string> = { "x-forwarded-for": opts.address ?? uniqueAddress() };
  if (opts.cookie) headers.cookie = opts.cookie;
  return playwrightRequest.newContext({ baseURL, extraHTTPHeaders: headers, maxRedirects: 0 });
}

/** The session cookie ("name=value") a context holds after signing in. */
export async function sessionCookieOf(api: APIRequestContext): Promise<string> {
  const c = (await api.storageState()).cookies.find((k) => k.name.includes("session-token"));
  if (!c) throw new Error("no session cookie after signing in");
  return `${c.name}=${c.value}`;
}

/** A fresh account with a verified e-mail, made straight at instance A (never through the proxy's one address). */
export async function newVerifiedAccount(password = "harbour lights at dusk") {
  const email = uniqueEmail("cluster");
  const api = await context(A);
  expect((await api.post("/api/account/sign-up", { data: { name: "Rowan Tillery", email, password } })).status()).toBe(200);
  const mail = await waitForMail(email, /Confirm your e-mail/);
  expect((await api.post("/api/account/verify-email", { data: { token: tokenFrom(mail) } })).status()).toBe(200);
  await api.dispose();
  return { email, password };
}


/** The raw response (body bytes as sent, never decoded), to compare encodings byte for byte. */
export function rawGet(url: string, headers: Record<string, string> = {}): Promise<{ status: number; headers: IncomingHttpHeaders; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const req = httpGet(url, { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      res.on("error", reject);
    });
    req.on("error", reject);
  });
}

/** A free loopback port (bound and released at once). */
export async function freePort(): Promise<number> {
  const { createServer } = await import("node:net");
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => resolve(port));
    });
  });
}
