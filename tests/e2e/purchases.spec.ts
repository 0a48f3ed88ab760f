// Buying in Chromium, against the running app and its payment stand-in (STRIPE_API_URL): a school
// manager buys 6 seats through the stand-in's hosted page and finds them in the class; an apprentice
// with no school buys a course alone and can open it; a declined card and a cancelled checkout seat
// nobody. Each page passes axe and the reflow check, with screenshots at 1280 and 390 px.
import { DEMO_CLASSES } from "@/db/seed-data";
import { withDb } from "../support/db";
import { uniqueEmail } from "../support/unique";
import { demoUser, signInPage } from "./helpers";
import { checkPage, expect, test, type Page } from "./page-check";

// Each test walks through several pages and the stand-in's page: more than the default minute on a busy machine.
test.describe.configure({ timeout: 180_000 });

const CLASS = DEMO_CLASSES[1]; // How microphones hear, at the demo school
const seatsOf = (name: string) => withDb(async (c) => (await c.query<{ n: number }>("select seats_purchased as n from classes where name = $1", [name])).rows[0].n);

async function startSchoolOrder(page: Page, quantity: string) {
  await page.goto("/school/buy");
  await page.getByRole("combobox", { name: "Course (required)" }).selectOption({ label: "How Microphones Hear" });
  const klass = page.getByRole("combobox", { name: "Class (required)" });
  const value = await klass.locator("option", { hasText: CLASS.name }).getAttribute("value");
  await klass.selectOption(value!);
  await page.getByRole("spinbutton", { name: /^Number of seats/ }).fill(quantity);
}

test("a school manager buys 6 seats through the hosted checkout and the class gets them", async ({ page }) => {
  const manager = demoUser("school_manager");
  await signInPage(page, manager.email, manager.password);
  const before = await seatsOf(CLASS.name);
  await startSchoolOrder(page, "6");
  // 6 × 49.00 = 294.00 (tier 1–9: list price).
  await expect(page.getByTestId("live-price")).toContainText("Total €294.00");
  await page.getByRole("spinbutton", { name: /^Number of seats/ }).fill("12");
  // 12 × (49.00 − 15 %) = 12 × 41.65 = 499.80.
  await expect(page.getByTestId("live-price")).toContainText("Total €499.80");
  await page.getByRole("spinbutton", { name: /^Number of seats/ }).fill("6");
  await checkPage(page, "purchases-school-buy");

  await page.getByRole("button", { name: "Go to payment" }).click();
  await page.waitForURL(/\/checkout\/cs_/);
  await expect(page.getByRole("table", { name: /order/i })).toContainText("€294.00");
  await page.getByRole("button", { name: /^Pay €294\.00/ }).click();

  await page.waitForURL(/\/school\/orders\/cs_/);
  const summary = page.getByTestId("order-summary");
  await expect(summary).toHaveAttribute("data-status", "paid");
  await expect(summary.getByRole("status")).toContainText(`6 seats added to the class ${CLASS.name}`);
  await checkPage(page, "purchases-school-order");
  expect(await seatsOf(CLASS.name)).toBe(before + 6);

  await page.getByRole("link", { name: "All orders" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Orders and refunds" })).toBeVisible();
  await checkPage(page, "purchases-school-orders");
});

test("a declined card and a cancelled checkout seat nobody", async ({ page }) => {
  const manager = demoUser("school_manager");
  await signInPage(page, manager.email, manager.password);
  const before = await seatsOf(CLASS.name);
  await startSchoolOrder(page, "2");
  await page.getByRole("button", { name: "Go to payment" }).click();
  await page.waitForURL(/\/checkout\/cs_/);
  await page.getByRole("button", { name: /Pay with a card that is declined/ }).click();
  await expect(page.getByRole("alert")).toContainText("Your card was declined.");
  await page.getByRole("button", { name: /Cancel and go back/ }).click();
  await page.waitForURL(/\/school\/buy\?cancelled=1/);
  await expect(page.getByRole("status").filter({ hasText: "Nothing was charged" })).toBeVisible();
  await checkPage(page, "purchases-school-cancelled");
  expect(await seatsOf(CLASS.name)).toBe(before);
});

test("an apprentice without a school buys a course alone and can open it", async ({ page }) => {
  // A fresh apprentice with the demo apprentices' password (copied hash), so no seat anywhere.
  const email = uniqueEmail("solo-buyer");
  const demo = demoUser("apprentice");
  await withDb((c) => c.query("insert into users (email, name, role, password_hash, email_verified_at) select $1, 'Sol Buyer', 'apprentice', password_hash, now() from users where email = $2", [email, demo.email]));
  await page.goto("/courses/safe-stage-practice");
  await expect(page.getByRole("link", { name: "Sign in to buy this course" })).toBeVisible();
  await checkPage(page, "purchases-course-visitor");

  await signInPage(page, email, demo.password, "/courses/safe-stage-practice");
  const panel = page.getByTestId("course-price");
  await expect(panel).toContainText("€39.00");
  await checkPage(page, "purchases-course-apprentice");
  await panel.getByRole("button", { name: /Buy this course/ }).click();
  await page.waitForURL(/\/checkout\/cs_/);
  await page.getByRole("button", { name: /^Pay €39\.00/ }).click();

  await page.waitForURL(/\/learn\/orders\/cs_/);
  await expect(page.getByTestId("order-summary")).toHaveAttribute("data-status", "paid");
  await checkPage(page, "purchases-learn-order");
  await page.getByRole("link", { name: "Open the course" }).click();
  await expect(page.getByTestId("course-price")).toContainText("You have a seat on this course.");
  const seat = await withDb(async (c) => (await c.query("select source from enrollments e join users u on u.id = e.user_id where u.email = $1 and course_slug = 'safe-stage-practice'", [email])).rows);
  expect(seat).toEqual([{ source: "purchase" }]);
});

test("a manager asks for an unused seat back and an admin approves it", async ({ page, browser, browserProblems }) => {
  const manager = demoUser("school_manager");
  await signInPage(page, manager.email, manager.password);
  // A paid order of 2 seats to take one back from.
  await startSchoolOrder(page, "2");
  await page.getByRole("button", { name: "Go to payment" }).click();
  await page.waitForURL(/\/checkout\/cs_/);
  await page.getByRole("button", { name: /^Pay €98\.00/ }).click();
  await page.waitForURL(/\/school\/orders\/cs_/);
  const ref = (await page.getByRole("heading", { level: 1 }).textContent())!.replace("Order ", "").trim();
  await page.goto("/school/orders");
  const form = page.getByTestId(`refund-form-${ref}`);
  await form.getByRole("spinbutton").fill("1");
  await form.getByRole("textbox").fill("One apprentice moved to another school");
  await form.getByRole("button", { name: `Ask for a refund of order ${ref}` }).click();
  await expect(form.getByRole("status")).toContainText("An Axisline admin will decide");
  const before = await seatsOf(CLASS.name);

  const adminContext = await browser.newContext();
  browserProblems.watch(adminContext);
  const adminPage = await adminContext.newPage();
  const admin = demoUser("admin");
  await signInPage(adminPage, admin.email, admin.password, "/admin/payments");
  await adminPage.goto("/admin/payments");
  const request = adminPage.getByRole("listitem").filter({ hasText: `order ${ref}` });
  await expect(request).toContainText("One apprentice moved to another school");
  await checkPage(adminPage, "purchases-admin-payments");
  await request.getByRole("button", { name: /^Approve and refund/ }).click();
  // Decided, the request leaves the waiting list; the order's row lists the refund.
  await expect(request).toHaveCount(0);
  await expect(adminPage.getByRole("row").filter({ hasText: ref })).toContainText(/Approved, money on its way back|Refunded/);
  expect(await seatsOf(CLASS.name)).toBe(before - 1);
  await adminContext.close();

  await page.goto("/school/orders");
  await expect(page.getByTestId(`order-${ref}`)).toContainText("Paid, partly refunded");
  await checkPage(page, "purchases-school-orders-refunded");
});
