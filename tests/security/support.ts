// Shared by the security probes: raw HTTP contexts with a chosen client address, the test
// database, fresh verified accounts. Each probe reproduces an attack an outsider made with HTTP.
import { request as playwrightRequest, type APIRequestContext } from "@playwright/test";
import { tokenFrom, waitForMail } from "../support/mail";
import { uniqueAddress, uniqueEmail } from "../support/unique";
import { baseURL } from "../e2e/helpers";
export { withDb } from "../support/db";

/** nginx in front of the two app instances (scripts/test.sh). */
export const proxyURL = process.env.E2E_PROXY_URL ?? "http://127.0.0.1:3180";

/** A context whose requests claim this client address (the harness plays the trusted proxy of instance A). */
export function from(address: string | null, url = baseURL, cookie?: string): Promise<APIRequestContext> {
  const headers: Record<string, string> = {};
  if (address) headers["x-forwarded-for"] = address;
  if (cookie) headers.cookie = cookie;
  return playwrightRequest.newContext({ baseURL: url, extraHTTPHeaders: headers, maxRedirects: 0 });
}


export async function verifiedAccount(password = "kestrel bay nights") {
  const email = uniqueEmail("sec");
  const api = await from(uniqueAddress());
  const up = await api.post("/api/account/sign-up", { data: { name: "Probe Person", email, password } });
  if (up.status() !== 200) throw new Error(`sign-up: ${up.status()} ${await up.text()}`);
  const mail = await waitForMail(email, /Confirm your e-mail/);
  const ok = await api.post("/api/account/verify-email", { data: { token: tokenFrom(mail) } });
  if (ok.status() !== 200) throw new Error(`verify: ${ok.status()}`);
  return { email, password };
}

export async function sessionCookieOf(api: APIRequestContext): Promise<string> {
  const c = (await api.storageState()).cookies.find((k) => k.name.includes("session-token"));
  if (!c) throw new Error("no session cookie");
  return `${c.name}=${c.value}`;
}

export { uniqueAddress, uniqueEmail };
