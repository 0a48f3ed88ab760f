import { checkPage, expect, test } from "./page-check";

// The fifth course in the catalog: its card, its syllabus of three modules, and its free preview
// lesson read in full by a visitor; a gain-structure lesson shows the figure to a visitor only as
// a locked page (the body needs a seat).
const COURSE = "stage-box-to-mix";
const PREVIEW = `/courses/${COURSE}/les-sbm-channel-input`;

test("a visitor finds the stage-box course in the catalog and reads its preview lesson", async ({ page }) => {
  await page.goto("/courses");
  const card = page.locator(`[data-course="${COURSE}"]`);
  await expect(card).toContainText("From the stage box to the mix");
  await expect(card).toContainText("1 free preview lesson");

  await page.getByRole("link", { name: "From the stage box to the mix" }).click();
  await page.waitForURL(new RegExp(`/courses/${COURSE}$`));
  for (const [slug, title] of [
    ["through-the-console", "Through the console"],
    ["gain-structure", "Gain structure"],
    ["monitors-and-soundcheck", "Monitors and soundcheck"],
  ]) {
    await expect(page.locator(`[data-module="${slug}"] h3`)).toContainText(title);
  }
  await expect(page.locator('[data-lesson="les-sbm-channel-input"]')).toContainText("Free preview");
  await expect(page.locator('[data-lesson="les-sbm-noise-pads"]')).toContainText("Seat needed");
  await checkPage(page, "stage-box-course");

  await page.goto(PREVIEW);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("The top of the channel strip: input, trim, filter, polarity and insert");
  const body = page.getByTestId("lesson-body");
  await expect(body).toContainText("Every channel of a console is the same short chain of stages");
  await expect(body.locator('[data-callout="caution"][data-hazard="phantom-power"]')).toBeVisible();
  await expect(page.getByRole("link", { name: /Next lesson/ })).toHaveAttribute("href", `/courses/${COURSE}/les-sbm-eq-dynamics-sends`);
  await checkPage(page, "stage-box-preview-lesson");
});
