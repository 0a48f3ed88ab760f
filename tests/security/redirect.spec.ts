// §3 open redirect after sign-in, in a real browser: every tricky `next` lands on our origin.
// Forms from the OWASP Unvalidated Redirects and Forwards Cheat Sheet and the WHATWG URL Standard.
import { expect, test } from "../e2e/page-check";
import { baseURL, demoUser } from "../e2e/helpers";

const TRICKS = ["/%5Cevil.example", "/%09/evil.example", "//evil.example", "/%2F%2Fevil.example", "%2F%2Fevil.example", "/%0A/evil.example", "https%3A%2F%2Fevil.example", "javascript%3Aalert(1)", "/.//evil.example", "%5C%5Cevil.example"];

for (const raw of TRICKS) {
  test(`next=${raw} stays on our origin`, async ({ page }) => {
    const foreign: string[] = [];
    await page.route((url) => url.hostname.endsWith("evil.example"), async (route) => {
      foreign.push(route.request().url());
      await route.fulfill({ status: 200, contentType: "text/html", body: "<title>elsewhere</title>" });
    });
    const u = demoUser("apprentice");
    await page.goto(`/sign-in?next=${raw}`);
    await page.getByLabel("E-mail").fill(u.email);
    await page.getByLabel("Password").fill(u.password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    expect(new URL(page.url()).origin).toBe(new URL(baseURL).origin);
    expect(foreign).toEqual([]);
  });
}
