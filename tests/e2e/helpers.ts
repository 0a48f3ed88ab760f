import { request as playwrightRequest, type APIRequestContext, type Page } from "@playwright/test";
import { DEMO_USERS } from "@/db/seed-data";
import { uniqueAddress } from "../support/unique";

export const baseURL = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100";

export function demoUser(role: "admin" | "instructor" | "school_manager" | "apprentice") {
  const u = DEMO_USERS.find((x) => x.role === role);
  if (!u) throw new Error(`no demo ${role}`);
  return u;
}

/** An API context with its own cookie jar and its own client address (so rate limits never collide). */
export async function apiContext(cookie?: string): Promise<APIRequestContext> {
  return playwrightRequest.newContext({
    baseURL,
    extraHTTPHeaders: { "x-forwarded-for": uniqueAddress(), ...(cookie ? { cookie } : {}) },
    maxRedirects: 0,
  });
}

/** Signs in over HTTP and returns the context and the raw session cookie ("name=value"). */
export async function signInApi(email: string, password: string) {
  const api = await apiContext();
  const res = await api.post("/api/account/sign-in", { data: { email, password } });
  if (res.status() !== 200) throw new Error(`sign-in ${email}: ${res.status()} ${await res.text()}`);
  const state = await api.storageState();
  const c = state.cookies.find((k) => k.name.includes("session-token"));
  if (!c) throw new Error("no session cookie");
  return { api, cookie: `${c.name}=${c.value}` };
}

/** Signs in through the real sign-in page, as a person would. */
export async function signInPage(page: Page, email: string, password: string, next?: string) {
  await page.goto(next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}
