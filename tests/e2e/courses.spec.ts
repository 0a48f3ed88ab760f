import { DEMO_USERS } from "@/db/seed-data";
import { apiContext, signInPage } from "./helpers";
import { checkPage, expect, test } from "./page-check";

// The course player: catalog → course → a free preview lesson signed out → sign in → a locked
// lesson → mark it complete → reload and see the progress. Visitors get nothing of a locked body.
const COURSE = "miking-the-band";
const PREVIEW = `/courses/${COURSE}/les-mtb-order-of-work`;
const LOCKED = `/courses/${COURSE}/les-mtb-kick-snare-hihat`;
const PREVIEW_TEXT = "It is four o'clock on a Thursday at The Lantern Room";
const LOCKED_TEXT = "Theo plays a four-piece kit";

// A class member of "Miking the band" with no seeded progress (db/seed.ts), and one without a seat on it.
const apprentice = DEMO_USERS.find((u) => u.key === "sunniva")!;
const seatless = DEMO_USERS.find((u) => u.key === "callum")!;

test("a visitor browses the catalog and course, and reads a free preview lesson in full", async ({ page }) => {
  await page.goto("/courses");
  await expect(page.getByRole("heading", { level: 1, name: "Courses" })).toBeVisible();
  const cards = page.getByRole("list", { name: "Courses" }).getByRole("listitem");
  await expect(cards).toHaveCount(5);
  await expect(page.locator(`[data-course="${COURSE}"]`)).toContainText("1 free preview lesson");
  await checkPage(page, "courses-catalog");

  await page.getByRole("link", { name: "Miking the band" }).click();
  await page.waitForURL(new RegExp(`/courses/${COURSE}$`));
  await expect(page.getByRole("heading", { level: 2, name: "Syllabus" })).toBeVisible();
  await expect(page.locator('[data-lesson="les-mtb-order-of-work"]')).toContainText("Free preview");
  await expect(page.locator('[data-lesson="les-mtb-kick-snare-hihat"]')).toContainText("Seat needed");
  await expect(page.getByTestId("course-progress")).toHaveCount(0);
  await checkPage(page, "courses-course");

  await page.getByRole("link", { name: "The order of work on a band stage" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("The order of work on a band stage");
  await expect(page.getByRole("heading", { name: "What you will be able to do" })).toBeVisible();
  await expect(page.getByTestId("lesson-body")).toContainText(PREVIEW_TEXT);
  await expect(page.getByRole("navigation", { name: "On this page" }).first()).toBeVisible();
  await expect(page.getByRole("link", { name: /Next lesson/ })).toHaveAttribute("href", `/courses/${COURSE}/les-mtb-input-list`);
  await checkPage(page, "courses-lesson-preview");
});

test("a glossary term shows its definition on keyboard focus and Escape dismisses it (WCAG 1.4.13)", async ({ page }) => {
  await page.goto(PREVIEW);
  const term = page.getByTestId("lesson-body").locator("[data-term]").first();
  const link = term.getByRole("link");
  // Closed, the definition stays in the page as the link's description (screen readers), but is not shown.
  const tip = term.getByRole("tooltip");
  await expect(tip).toHaveAttribute("data-state", "closed");
  await expect(link).toHaveAccessibleDescription(/\S/);
  // (retried: a focus that lands before hydration opens nothing)
  await expect(async () => {
    await link.blur();
    await link.focus();
    await expect(tip).toHaveAttribute("data-state", "open", { timeout: 1000 });
  }).toPass();
  expect((await tip.boundingBox())!.width).toBeGreaterThan(100);
  await expect(link).toHaveAttribute("href", /^\/glossary#/);
  await page.keyboard.press("Escape");
  await expect(tip).toHaveAttribute("data-state", "closed");
  await expect(link).toBeFocused();
  // Hover opens it again, and the pointer can move onto the definition without losing it.
  await page.mouse.move(0, 0);
  await term.hover();
  await expect(tip).toHaveAttribute("data-state", "open");
  await tip.hover();
  await expect(tip).toHaveAttribute("data-state", "open");
});

test("a visitor gets nothing of a locked lesson: not in the HTML, the RSC payload or the API", async ({ page }) => {
  const api = await apiContext();
  const html = await (await api.get(LOCKED)).text();
  expect(html).toContain("Kick, snare and hi-hat");
  expect(html).not.toContain(LOCKED_TEXT);
  const rsc = await api.get(LOCKED, { headers: { RSC: "1" } });
  expect(await rsc.text()).not.toContain(LOCKED_TEXT);
  // Locked is an answer (200), not an error: a 401 would be logged in every visitor's browser.
  const body = await api.get(`/api${LOCKED.replace("/courses", "/lessons")}`);
  expect(body.status()).toBe(200);
  const json = await body.json();
  expect(json).toMatchObject({ ok: true, locked: "sign-in", signInHref: expect.stringContaining("/sign-in?next=") });
  expect(json).not.toHaveProperty("lesson");
  expect(JSON.stringify(json)).not.toContain(LOCKED_TEXT);
  await api.dispose();

  await page.goto(LOCKED);
  await expect(page.getByTestId("lesson-refusal")).toContainText("Sign in to read this lesson");
  await expect(page.getByRole("link", { name: "Sign in", exact: true }).last()).toHaveAttribute("href", /\/sign-in\?next=/);
  await expect(page.getByTestId("lesson-body")).toHaveCount(0);
  await checkPage(page, "courses-lesson-locked");
});

test("a signed-in apprentice without a seat is asked to get one", async ({ page }) => {
  await signInPage(page, seatless.email, seatless.password, LOCKED);
  await expect(page).toHaveURL(new RegExp(`${LOCKED}$`));
  await expect(page.getByTestId("lesson-refusal")).toContainText("ask your school for a seat");
  await expect(page.getByTestId("lesson-body")).toHaveCount(0);
  await expect(page.getByTestId("lesson-completion")).toHaveCount(0);
});

test("an apprentice reads a preview, signs in, opens a locked lesson, marks it complete and sees the progress after a reload", async ({ page }) => {
  test.slow(); // five pages, a sign-in and two reloads
  await page.goto(PREVIEW);
  await expect(page.getByTestId("lesson-body")).toContainText(PREVIEW_TEXT);
  await page.goto(LOCKED);
  await page.getByTestId("lesson-refusal").getByRole("link", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(/\/sign-in\?next=/);
  await page.getByLabel("E-mail").fill(apprentice.email);
  await page.getByLabel("Password").fill(apprentice.password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL(new RegExp(`${LOCKED}$`));

  const body = page.getByTestId("lesson-body");
  await expect(body).toContainText(LOCKED_TEXT);
  // The figures of a locked lesson arrive interactive.
  await expect(body.locator('figure[data-figure="pickup-pattern"]')).toBeVisible();
  await expect(body.locator('[data-diagram="drum-kit"]')).toBeVisible();

  const completion = page.getByTestId("lesson-completion");
  // Re-runs against the same database start from "not done".
  if (await completion.getByRole("button", { name: "Mark as not done" }).isVisible()) {
    await completion.getByRole("button", { name: "Mark as not done" }).click();
  }
  await completion.getByRole("button", { name: "Mark lesson complete" }).click();
  await expect(completion.getByRole("status")).toHaveText("You have completed this lesson.");
  await checkPage(page, "courses-lesson-unlocked");

  await page.reload();
  await expect(page.getByTestId("lesson-completion").getByRole("status")).toHaveText("You have completed this lesson.");

  await page.goto(`/courses/${COURSE}`);
  await expect(page.locator('[data-lesson="les-mtb-kick-snare-hihat"]').getByTestId("lesson-done")).toBeVisible();
  const progress = page.getByTestId("course-progress");
  await expect(progress.getByRole("progressbar")).toHaveAttribute("aria-valuenow", /^[1-9]\d*$/);
  await expect(progress.getByTestId("continue-link")).toContainText("Continue: ");
  await checkPage(page, "courses-course-signed-in");

  await page.goto("/learn");
  const section = page.getByTestId("progress-section");
  await expect(section.locator(`[data-course="${COURSE}"]`)).toContainText(/of 15 lessons/);
  await expect(section.getByTestId("continue-link").first()).toContainText("Continue: ");
});

test("search finds lessons and glossary terms and marks the matches", async ({ page }) => {
  await page.goto("/search?q=phantom+power");
  await expect(page.locator("#results-heading")).toContainText("for “phantom power”");
  await expect(page.locator('[data-result="term:phantom-power"]')).toBeVisible();
  await expect(page.locator("mark").first()).toBeVisible();
  await checkPage(page, "search");
});
