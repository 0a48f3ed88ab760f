import { DEMO_USERS } from "@/db/seed-data";
import { ROLE_NAV } from "@/components/shell/nav-links";
import { openSiteMenu } from "../support/site-menu";
import { signInPage } from "./helpers";
import { checkPage, expect, test, type Page } from "./page-check";

// The site header on a phone (390 × 844 CSS px, WCAG 2.2 reflow width) and at 1280 px. Below
// 1024 px it is the brand and a "Menu" disclosure button (aria-expanded, aria-controls) that opens
// the same links, search and account; Escape closes it and gives focus back. Its height must
// not change when /api/me answers (the tests hold that answer back to see the page before it).
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 900 };
// Measured with the compact header: 12 px padding, a 40 px row, 12 px padding and a 1 px rule.
// The stacked header it replaced was 265 px for a visitor and 357 px signed in.
const PHONE_HEADER_MAX_PX = 72;

const LESSON = "/courses/miking-the-band/les-mtb-kick-snare-hihat";
const LESSON_TITLE = "Kick, snare and hi-hat";
// An apprentice of the spring class (a seat on the course) whom no other spec signs in.
const apprentice = DEMO_USERS.find((u) => u.key === "lena")!;

// The site header is the page's banner landmark (a lesson has a <header> of its own inside <main>).
const header = (page: Page) => page.getByRole("banner");
const menuButton = (page: Page) => header(page).getByRole("button", { name: "Menu", exact: true });
const headerHeight = async (page: Page) => (await header(page).boundingBox())!.height;

/** Holds /api/me's answer until `release()`, so a test can look at the page before it comes. */
async function holdMe(page: Page) {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  await page.route("**/api/me", async (route) => {
    await gate;
    await route.continue();
  });
  return {
    release: async () => {
      const answered = page.waitForResponse((response) => new URL(response.url()).pathname === "/api/me");
      release();
      await answered;
      await page.unroute("**/api/me");
    },
  };
}

/** Header height while /api/me is held back, then after it answered (the account part is drawn). */
async function heightsAroundMe(page: Page, path: string) {
  const me = await holdMe(page);
  await page.goto(path);
  await expect(header(page).getByText("Axisline", { exact: true })).toBeVisible();
  const before = await headerHeight(page);
  await me.release();
  // Attached, not visible: on a phone the account part is inside the closed panel.
  await expect(page.getByTestId("me-name").or(header(page).locator('a[href="/sign-up"]'))).toBeAttached();
  return { before, after: await headerHeight(page) };
}

test.describe("at 390 × 844", () => {
  test.use({ viewport: PHONE });

  test("signed in on a lesson: a compact header, the lesson title in the first screen, a keyboard menu", async ({ page }) => {
    await signInPage(page, apprentice.email, apprentice.password);
    const heights = await heightsAroundMe(page, LESSON);
    expect(heights.before).toBeLessThanOrEqual(PHONE_HEADER_MAX_PX);
    expect(heights.after, "the header keeps its height when /api/me answers").toBe(heights.before);
    const title = page.getByRole("heading", { level: 1 });
    await expect(title).toHaveText(LESSON_TITLE);
    const titleBox = (await title.boundingBox())!;
    expect(titleBox.y + titleBox.height, "the lesson title ends inside the first screen").toBeLessThanOrEqual(PHONE.height);

    // Closed: the links are out of sight and out of the tab order.
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
    const panel = page.locator(`#${await menuButton(page).getAttribute("aria-controls")}`);
    await expect(panel).toBeHidden();

    // Tab from the top: the skip link, the brand, then the menu button; Enter opens it and focus stays on it.
    for (let i = 0; i < 3; i++) await page.keyboard.press("Tab");
    await expect(menuButton(page)).toBeFocused();
    await page.keyboard.press("Enter");
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "true");
    await expect(panel).toBeVisible();
    await expect(menuButton(page)).toBeFocused();

    // The same links as the desktop header, each in the tab order after the button.
    const main = panel.getByRole("navigation", { name: "Main" });
    for (const name of ["Courses", "Bench", "Apprentices", "Instructors", "Schools"]) await expect(main.getByRole("link", { name, exact: true })).toBeVisible();
    const areas = panel.getByRole("navigation", { name: "Your areas" });
    for (const l of ROLE_NAV.apprentice) await expect(areas.getByRole("link", { name: l.label, exact: true })).toHaveAttribute("href", l.href);
    await expect(panel.getByTestId("me-name")).toHaveText(apprentice.name);
    await expect(panel.getByRole("button", { name: "Sign out" })).toBeVisible();
    await expect(panel.getByRole("searchbox", { name: "Search lessons and glossary" })).toBeVisible();
    await page.keyboard.press("Tab");
    await expect(main.getByRole("link", { name: "Courses", exact: true })).toBeFocused();
    await page.keyboard.press("Tab");
    await expect(main.getByRole("link", { name: "Bench", exact: true })).toBeFocused();

    // axe with the panel open (the screenshots at 390 px show it open).
    await checkPage(page, "header-phone-lesson-open");
    await page.setViewportSize(PHONE);

    // Escape from inside the panel closes it and puts focus back on the button.
    await main.getByRole("link", { name: "Bench", exact: true }).focus();
    await page.keyboard.press("Escape");
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
    await expect(panel).toBeHidden();
    await expect(menuButton(page)).toBeFocused();
    await checkPage(page, "header-phone-lesson-closed");
    await page.setViewportSize(PHONE);

    // Following a link closes it; the next page's header has the same height.
    await menuButton(page).press("Enter");
    await areas.getByRole("link", { name: "Quizzes", exact: true }).click();
    await page.waitForURL(/\/learn\/quizzes$/);
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
    await expect(panel).toBeHidden();
    expect(await headerHeight(page)).toBe(heights.before);
  });

  test("a visitor: the same height before and after /api/me, sign-in in the menu, a same-page link closes it", async ({ page }) => {
    const heights = await heightsAroundMe(page, "/courses/miking-the-band/les-mtb-order-of-work");
    expect(heights.before).toBeLessThanOrEqual(PHONE_HEADER_MAX_PX);
    expect(heights.after).toBe(heights.before);

    await page.goto("/");
    await openSiteMenu(page);
    const panel = page.locator(`#${await menuButton(page).getAttribute("aria-controls")}`);
    await expect(panel.getByRole("link", { name: "Sign in", exact: true })).toBeVisible();
    await expect(panel.getByRole("link", { name: "Create account" })).toBeVisible();
    await checkPage(page, "header-phone-visitor-open");
    await page.setViewportSize(PHONE);
    // /#for-schools changes no path, and still closes the menu.
    await panel.getByRole("link", { name: "Schools", exact: true }).click();
    await expect(page).toHaveURL(/#for-schools$/);
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
  });

  test("searching from the menu closes it; signing out from it leaves the visitor's header", async ({ page }) => {
    await signInPage(page, apprentice.email, apprentice.password);
    await openSiteMenu(page);
    await page.getByRole("searchbox", { name: "Search lessons and glossary" }).fill("phantom");
    await page.getByRole("searchbox", { name: "Search lessons and glossary" }).press("Enter");
    await page.waitForURL(/\/search\?q=phantom/);
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");

    await openSiteMenu(page);
    await header(page).getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL((url) => url.pathname === "/");
    await openSiteMenu(page);
    await expect(header(page).getByRole("link", { name: "Sign in", exact: true })).toBeVisible();
  });
});

test("at 1280 px: no menu button, every link in view, and one height for visitors and the signed-in", async ({ page }) => {
  await page.setViewportSize(DESKTOP);
  const visitor = await heightsAroundMe(page, LESSON);
  expect(visitor.after).toBe(visitor.before);
  await expect(menuButton(page)).toBeHidden();
  await expect(header(page).getByRole("link", { name: "Sign in", exact: true })).toBeVisible();

  await signInPage(page, apprentice.email, apprentice.password);
  const signedIn = await heightsAroundMe(page, LESSON);
  expect(signedIn.before, "signed in, before /api/me answers").toBe(visitor.before);
  expect(signedIn.after, "signed in, after /api/me answered").toBe(visitor.before);
  await expect(menuButton(page)).toBeHidden();
  for (const name of ["Courses", "Bench", "Schools"]) await expect(header(page).getByRole("navigation", { name: "Main" }).getByRole("link", { name, exact: true })).toBeVisible();
  for (const l of ROLE_NAV.apprentice) await expect(header(page).getByRole("navigation", { name: "Your areas" }).getByRole("link", { name: l.label, exact: true })).toBeVisible();
  await expect(page.getByTestId("me-name")).toBeVisible();
  await expect(header(page).getByRole("searchbox")).toBeVisible();
  await checkPage(page, "header-desktop-lesson");
});

test("without JavaScript a phone gets the panel open and no inert button", async ({ browser, browserProblems }) => {
  const context = await browser.newContext({ viewport: PHONE, javaScriptEnabled: false });
  browserProblems.watch(context);
  const page = await context.newPage();
  await page.goto("/courses");
  await expect(menuButton(page)).toBeHidden();
  await expect(header(page).getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Courses", exact: true })).toBeVisible();
  await expect(header(page).getByRole("searchbox", { name: "Search lessons and glossary" })).toBeVisible();
  await context.close();
});
