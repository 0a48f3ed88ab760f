import sharp from "sharp";
import { demoUser, signInPage } from "./helpers";
import { checkPage, expect, test, type Page } from "./page-check";
import { withDb } from "../support/db";
import { DEMO_USERS } from "@/db/seed-data";

// A placement brief end to end through the real upload SDK and the upload stand-in: an
// apprentice uploads two photos (progress visible), an instructor pins two comments WITH THE
// KEYBOARD (WCAG 2.2 SC 2.5.7), scores and asks for a redo, the apprentice resubmits, the
// instructor approves. Runs against the seeded demo (Mira is in Ines's miking class).

const BRIEF = "brief-kick-inside-beater";
const MIRA = DEMO_USERS.find((u) => u.key === "mira")!;

/** A photo-like JPEG made here with sharp (noise, so it has some size to upload). */
async function photo(seed: number): Promise<{ name: string; mimeType: string; buffer: Buffer }> {
  const width = 1200;
  const height = 900;
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < raw.length; i++) raw[i] = ((i * 2654435761 + seed * 97) >>> 24) ^ ((Math.random() * 48) | 0);
  return { name: `kick-${seed}.jpg`, mimeType: "image/jpeg", buffer: await sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 90 }).toBuffer() };
}

/** Uploads two photos with the upload throttled in the browser (Chromium's network emulation), so the progress bar is seen moving. */
async function uploadTwo(page: Page, seeds: [number, number]) {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 400 * 1024 });
  await page.getByLabel(/Add photos/).setInputFiles([await photo(seeds[0]), await photo(seeds[1])]);
  const bar = page.getByRole("progressbar", { name: "Uploading photo 1" });
  await expect(bar).toBeVisible();
  await checkPage(page, `placements-uploading-${seeds[0]}`);
  await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
  await expect(page.getByText("Uploaded and checked.")).toHaveCount(2, { timeout: 30_000 });
  await page.getByLabel("Caption for photo 1").fill("Through the port, level with the beater");
  await page.getByLabel("Caption for photo 2").fill("Tape from the grille to the batter head");
  await page.getByRole("button", { name: "Send 2 photos for review" }).click();
}

test("an apprentice sends a placement, an instructor pins with the keyboard and asks for a redo, then approves the second attempt", async ({ page, browser, browserProblems }) => {
  test.setTimeout(180_000);
  await withDb((c) => c.query("delete from brief_submissions where brief_id = $1 and user_id = (select id from users where email = $2)", [BRIEF, MIRA.email]));

  // The apprentice: the list, the brief, two photos with progress, sent.
  await signInPage(page, MIRA.email, MIRA.password, "/learn/briefs");
  await expect(page.getByRole("heading", { name: "Placement briefs", level: 1 })).toBeVisible();
  await checkPage(page, "placements-list");
  await page.getByRole("link", { name: "Kick microphone inside the shell, aimed at the beater" }).click();
  await expect(page.getByRole("heading", { name: "Rubric" })).toBeVisible();
  await checkPage(page, "placements-brief");
  await uploadTwo(page, [1, 2]);
  await expect(page.getByText(/Your photos are waiting for review/)).toBeVisible();

  // The instructor, in a context of their own: the queue, then the review.
  const ines = demoUser("instructor");
  const teachContext = await browser.newContext();
  browserProblems.watch(teachContext);
  const teach = await teachContext.newPage();
  await signInPage(teach, ines.email, ines.password, "/teach/reviews");
  const queue = teach.getByTestId("review-queue");
  await expect(queue.getByRole("link", { name: /Mira Santel.*review Kick microphone/ })).toBeVisible();
  await checkPage(teach, "placements-queue");
  await queue.getByRole("link", { name: /Mira Santel.*review Kick microphone/ }).click();
  await expect(teach.getByRole("heading", { name: /Mira Santel/, level: 1 })).toBeVisible();

  // Two pins with the keyboard: focus the photo, move the crosshair, Enter, type the comment.
  const board = teach.getByRole("application", { name: /Photo 1: .* Pin area/ });
  await board.focus();
  for (let i = 0; i < 5; i++) await teach.keyboard.press("ArrowLeft");
  await teach.keyboard.press("Enter");
  await expect(teach.getByLabel(/Comment for pin 1/)).toBeFocused();
  await teach.keyboard.type("Aim at the beater, not the shell.");
  await board.focus();
  await teach.keyboard.press("Shift+ArrowDown");
  await teach.keyboard.press("Enter");
  await expect(teach.getByLabel(/Comment for pin 2/)).toBeFocused();
  await teach.keyboard.type("Show the tape's reading.");
  await expect(teach.getByRole("button", { name: "Pin 1: Aim at the beater, not the shell." })).toBeVisible();
  await expect(teach.getByRole("button", { name: "Pin 2: Show the tape's reading." })).toBeVisible();
  await teach.getByTestId("pin-board-0").getByRole("button", { name: /Zoom in/ }).click();

  // Score: 2 + 1 + 2 + 1 = 6 of 12, a comment, the draft autosaves, then a redo.
  await teach.getByRole("group", { name: "Aimed at the beater" }).getByLabel(/Nearly, 2 points/).check();
  await teach.getByRole("group", { name: "Distance measured" }).getByLabel(/Nearly, 1 point/).check();
  await teach.getByRole("group", { name: "Clear of the heads and the shell" }).getByLabel(/On the mark, 2 points/).check();
  await teach.getByRole("group", { name: "Stand and cable out of the way" }).getByLabel(/Nearly, 1 point/).check();
  await expect(teach.getByTestId("rubric-total")).toHaveText("Total: 6 of 12 points");
  await teach.getByLabel(/Comment for the apprentice/).fill("Move the microphone to the strike point and put the tape in the frame.");
  await expect(teach.getByText(/Draft saved at/)).toBeVisible({ timeout: 10_000 });
  await checkPage(teach, "placements-review");
  await teach.reload();
  await expect(teach.getByLabel(/Comment for pin 2/)).toHaveValue("Show the tape's reading.");
  await teach.getByRole("button", { name: "Ask for a redo" }).click();
  await expect(teach.getByRole("heading", { name: "Reviewed" })).toBeVisible();

  // The apprentice sees the pins and the comment, and resubmits.
  await page.reload();
  await expect(page.getByText("Redo requested by Ines Calloway: 6 of 12 points.")).toBeVisible();
  await expect(page.getByRole("list", { name: "Comments pinned on photo 1" }).getByText("Aim at the beater, not the shell.")).toBeVisible();
  await checkPage(page, "placements-redo");
  await uploadTwo(page, [3, 4]);
  await expect(page.getByText(/Your photos are waiting for review/)).toBeVisible();
  await expect(page.locator("[data-attempt]")).toHaveCount(2);

  // The instructor approves the second attempt with full marks; the first stays in the history.
  await teach.goto("/teach/reviews");
  await teach.getByTestId("review-queue").getByRole("link", { name: /Mira Santel.*review Kick microphone/ }).click();
  await expect(teach.getByRole("heading", { name: "Earlier attempts" })).toBeVisible();
  for (const group of ["Aimed at the beater", "Distance measured", "Clear of the heads and the shell", "Stand and cable out of the way"]) {
    await teach.getByRole("group", { name: group }).getByLabel(/On the mark/).check();
  }
  await expect(teach.getByTestId("rubric-total")).toHaveText("Total: 12 of 12 points");
  await teach.getByRole("button", { name: "Approve" }).click();
  await expect(teach.getByRole("heading", { name: "Reviewed" })).toBeVisible();
  await checkPage(teach, "placements-reviewed");

  await page.reload();
  await expect(page.getByText("Approved: this brief counts toward your course.")).toBeVisible();
  await expect(page.locator("[data-attempt]")).toHaveCount(2);
  await checkPage(page, "placements-approved");
  await teachContext.close();
});
