import { tokenFrom, waitForMail } from "../support/mail";
import { uniqueEmail } from "../support/unique";
import { demoUser, signInPage } from "./helpers";
import { checkPage, expect, test } from "./page-check";

test("landing and sign-in pages: screenshots and no axe violations", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("Mic the band right");
  await expect(page.getByRole("link", { name: "Sign in" }).first()).toBeVisible();
  await checkPage(page, "landing");
  await page.goto("/sign-in");
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  await checkPage(page, "sign-in");
});

for (const role of ["apprentice", "instructor", "school_manager", "admin"] as const) {
  test(`${role} home shows real data, role navigation, screenshots, axe`, async ({ page }) => {
    const u = demoUser(role);
    await signInPage(page, u.email, u.password);
    await expect(page.getByTestId("me-name")).toHaveText(u.name);
    const expectations = {
      apprentice: async () => {
        await expect(page).toHaveURL(/\/learn$/);
        await expect(page.getByText("Spring class: Miking the band")).toBeVisible();
      },
      instructor: async () => {
        await expect(page).toHaveURL(/\/teach$/);
        await expect(page.getByText("Spring class: Miking the band")).toBeVisible();
        // The seed's spring class: eight apprentices and the demo graduate (db/seed-graduate.ts).
        await expect(page.getByTestId("apprentice-count").first()).toHaveText("9");
      },
      school_manager: async () => {
        await expect(page).toHaveURL(/\/school$/);
        await expect(page.getByRole("heading", { name: "Kestrel Bay Audio School" })).toBeVisible();
      },
      admin: async () => {
        await expect(page).toHaveURL(/\/admin$/);
        await expect(page.getByRole("cell", { name: "Harriet Quill", exact: true })).toBeVisible();
        await expect(page.getByRole("link", { name: "Audit log" })).toBeVisible();
      },
    };
    await expectations[role]();
    await checkPage(page, `home-${role}`);
  });
}

test("a newcomer signs up, confirms the e-mail from the inbox, and signs in", async ({ page, browserProblems }) => {
  browserProblems.expectFailedRequest(400, "/api/account/sign-up", "the first try uses one of the most common passwords");
  const email = uniqueEmail("browser");
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Ottoline Brask");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("password");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByTestId("sign-up-form").getByRole("alert")).toContainText("most common");
  await page.getByLabel("Password").fill("brass and cables at dusk");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Check your inbox" })).toBeVisible();

  const mail = await waitForMail(email, /Confirm your e-mail/);
  // The dev inbox (local mode) lists what the SMTP catcher received.
  await page.goto("/dev/inbox");
  await expect(page.getByRole("link", { name: "Confirm your e-mail for Axisline" }).first()).toBeVisible();
  await page.goto(`/verify-email?token=${tokenFrom(mail)}`);
  await page.getByRole("button", { name: "Confirm my e-mail" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Your e-mail is confirmed" })).toBeVisible();
  await signInPage(page, email, "brass and cables at dusk");
  await expect(page).toHaveURL(/\/learn$/);
  await expect(page.getByText("You aren't in a class yet")).toBeVisible();
});

test("the sign-in form answers a wrong password in words", async ({ page, browserProblems }) => {
  browserProblems.expectFailedRequest(401, "/api/account/sign-in", "the test types a wrong password");
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demoUser("apprentice").email);
  await page.getByLabel("Password").fill("definitely not it");
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page.getByTestId("sign-in-form").getByRole("alert")).toHaveText(/don't match an account/);
});

test("an admin changes a role and disables an account; both are in the audit log", async ({ page, browser, browserProblems }) => {
  // A fresh apprentice, signed in in a second browser.
  const email = uniqueEmail("victim");
  const other = await browser.newContext();
  browserProblems.watch(other);
  const p2 = await other.newPage();
  await p2.goto("/sign-up");
  await p2.getByLabel("Your name").fill("Pell Varden");
  await p2.getByLabel("E-mail").fill(email);
  await p2.getByLabel("Password").fill("wedges and sidefills");
  await p2.getByRole("button", { name: "Create account" }).click();
  await expect(p2.getByRole("status").filter({ hasText: "Check your inbox" })).toBeVisible();
  await p2.goto(`/verify-email?token=${tokenFrom(await waitForMail(email, /Confirm/))}`);
  await p2.getByRole("button", { name: "Confirm my e-mail" }).click();
  await expect(p2.getByRole("status").filter({ hasText: "confirmed" })).toBeVisible();
  await signInPage(p2, email, "wedges and sidefills");
  await expect(p2).toHaveURL(/\/learn$/);

  const admin = demoUser("admin");
  await signInPage(page, admin.email, admin.password);
  // The users page shows 50 at a time: the admin finds the account by its address.
  await page.getByLabel("Find a user by name or e-mail").fill(email);
  await page.getByRole("button", { name: "Find user" }).click();
  await expect(page.getByTestId("user-count")).toHaveText(/^1 account matching/);
  const row = page.getByTestId(`user-row-${email}`);
  await row.getByLabel("Role of Pell Varden").selectOption("instructor");
  await row.getByRole("button", { name: /Change role/ }).click();
  await expect(row.getByRole("status")).toHaveText("Saved.");
  await expect(row.getByRole("cell", { name: "Instructor", exact: true })).toBeVisible();

  // The promoted user's very next request sees the new role.
  await p2.goto("/teach");
  await expect(p2.getByRole("heading", { name: "Classes you teach" })).toBeVisible();

  await row.getByRole("button", { name: /Disable/ }).click();
  await expect(row.getByRole("cell", { name: "Disabled" })).toBeVisible();
  const res = await p2.goto("/teach");
  expect(p2.url()).toContain("/sign-in");
  expect(res?.ok()).toBe(true);

  await page.goto("/admin/audit");
  await expect(page.getByRole("cell", { name: "user.disabled" }).first()).toBeVisible();
  await expect(page.getByRole("cell", { name: "user.role_changed" }).first()).toBeVisible();
  await other.close();
});
