import { readFileSync } from "node:fs";
import { demoUser, signInPage } from "./helpers";
import { checkPage, expect, test, type Locator, type Page } from "./page-check";
import { withDb } from "../support/db";

// An apprentice takes a whole module quiz from the keyboard; an instructor reads its statistics.
// Runs against the seeded demo scenario (db/seed.ts + db/seed-quizzes.ts).

const BANK_ID = "bank-miking-the-band-drums";
type BankChoice = { id: string };
const BANK = JSON.parse(readFileSync("content/banks/miking-the-band/drums.json", "utf8")) as {
  settings: { attemptsAllowed: number };
  questions: { kind: string; explanation: string; options?: BankChoice[]; items?: BankChoice[]; left?: BankChoice[]; right?: BankChoice[]; regions?: BankChoice[] }[];
};
/** Every id an author wrote for a choice: none may reach the page, which shows ids minted per attempt. */
const AUTHORED_IDS = new Set(BANK.questions.flatMap((q) => [...(q.options ?? []), ...(q.items ?? []), ...(q.left ?? []), ...(q.right ?? []), ...(q.regions ?? [])].map((c) => c.id)));
const KINDS = ["single", "multiple", "numeric", "generated", "ordering", "matching", "hotspot"] as const;

/** The shared page check; quiz charts re-measure on resize, so they get a little longer to settle. */
async function checkQuizPage(page: Page, name: string) {
  await checkPage(page, `quiz-${name}`, { settleMs: 300 });
}

/** Presses Tab until `target` has focus: proves it is reachable from the keyboard, in order. */
async function tabTo(page: Page, target: Locator, maxPresses = 400) {
  for (let i = 0; i < maxPresses; i++) {
    if (await target.evaluate((el) => el === document.activeElement)) return;
    await page.keyboard.press("Tab");
  }
  throw new Error(`could not reach ${target} with Tab`);
}


/** Answers the first question of a kind with keys only; returns what to look for after a reload. */
async function answerWithKeyboard(page: Page, question: Locator, kind: (typeof KINDS)[number]): Promise<(q: Locator) => Promise<void>> {
  switch (kind) {
    case "single": {
      const first = question.getByRole("radio").first();
      await tabTo(page, first);
      await page.keyboard.press("ArrowDown"); // moves to and chooses the second option
      return async (q) => expect(q.getByRole("radio").nth(1)).toBeChecked();
    }
    case "multiple": {
      await tabTo(page, question.getByRole("checkbox").first());
      await page.keyboard.press("Space");
      await page.keyboard.press("Tab");
      await page.keyboard.press("Space");
      return async (q) => {
        await expect(q.getByRole("checkbox").nth(0)).toBeChecked();
        await expect(q.getByRole("checkbox").nth(1)).toBeChecked();
      };
    }
    case "numeric":
    case "generated": {
      const value = kind === "numeric" ? "12,5" : "7.25";
      await tabTo(page, question.getByLabel("Your answer"));
      await page.keyboard.type(value);
      await page.keyboard.press("Tab"); // on to the unit; leaving the field saves at once
      return async (q) => expect(q.getByLabel("Your answer")).toHaveValue(kind === "numeric" ? "12.5" : "7.25");
    }
    case "ordering": {
      const firstText = (await question.locator("li").first().locator("span").nth(1).textContent())!;
      await tabTo(page, question.getByRole("button", { name: /^Move down:/ }).first());
      await page.keyboard.press("Enter");
      await expect(question.locator("li").nth(1)).toContainText(firstText);
      return async (q) => expect(q.locator("li").nth(1)).toContainText(firstText);
    }
    case "matching": {
      const select = question.getByRole("combobox").first();
      await tabTo(page, select);
      await page.keyboard.press("ArrowDown");
      await expect(select).not.toHaveValue("");
      const chosen = await select.inputValue();
      return async (q) => expect(q.getByRole("combobox").first()).toHaveValue(chosen);
    }
    case "hotspot": {
      await tabTo(page, question.getByRole("radio", { name: "Position A" }));
      await page.keyboard.press("ArrowRight");
      await page.keyboard.press("Enter");
      await expect(question.getByRole("radio", { name: "Position B" })).toHaveAttribute("aria-checked", "true");
      return async (q) => expect(q.getByRole("radio", { name: "Position B" })).toHaveAttribute("aria-checked", "true");
    }
  }
}

test.describe.configure({ mode: "serial" });

test.beforeAll(async () => {
  // The demo apprentice takes this quiz here; earlier runs' attempts are cleared so one is always left.
  const email = demoUser("apprentice").email;
  await withDb((c) => c.query("delete from quiz_attempts where bank_id = $1 and user_id = (select id from users where email = $2)", [BANK_ID, email]));
});

test("an apprentice takes a module quiz from the keyboard, reloads, submits and sees the result", async ({ page }) => {
  test.setTimeout(300_000);
  const u = demoUser("apprentice");
  await signInPage(page, u.email, u.password, "/learn/quizzes");
  await expect(page.getByRole("heading", { name: "Quizzes", level: 1 })).toBeVisible();
  await checkQuizPage(page, "list");

  const start = page.locator(`[data-bank="${BANK_ID}"]`).getByRole("button", { name: /^Start/ });
  await tabTo(page, start);
  await page.keyboard.press("Enter");
  await page.waitForURL(/\/learn\/quizzes\/[0-9a-f-]{36}$/, { timeout: 120_000 });
  const attemptUrl = page.url();
  await expect(page.getByText("Answered:")).toBeVisible();

  // Nothing of the key reaches the page before submission (HTML and the RSC payload in it).
  const html = await page.content();
  for (const q of BANK.questions) expect(html).not.toContain(q.explanation.slice(0, 60));
  for (const field of ["correctOptionId", "correctOrder", "correctPairs", "correctRegionIds"]) expect(html).not.toContain(field);
  // The ids the controls carry are the attempt's own, never the bank's ("a" is the key of most lettered questions).
  const controlValues = await page.locator("fieldset[data-kind] input[value], fieldset[data-kind] option[value]").evaluateAll((els) => els.map((el) => (el as HTMLInputElement).value));
  expect(controlValues.length).toBeGreaterThan(10);
  expect(controlValues.filter((value) => AUTHORED_IDS.has(value))).toEqual([]);

  const restoreChecks: { kind: string; index: number; check: (q: Locator) => Promise<void> }[] = [];
  const fieldsets = page.locator("fieldset[data-kind]");
  const count = await fieldsets.count();
  for (let i = 0; i < count; i++) {
    const kind = (await fieldsets.nth(i).getAttribute("data-kind")) as (typeof KINDS)[number];
    if (restoreChecks.some((r) => r.kind === kind)) continue;
    restoreChecks.push({ kind, index: i, check: await answerWithKeyboard(page, fieldsets.nth(i), kind) });
  }
  expect(restoreChecks.map((r) => r.kind).sort()).toEqual([...KINDS].sort());
  await expect(page.getByTestId("save-status")).toHaveAttribute("data-status", "saved", { timeout: 30_000 });
  await expect(page.getByTestId("save-status")).toHaveText(/Saved/);
  await checkQuizPage(page, "player");

  // A reload finds every acknowledged answer again.
  await page.reload();
  await expect(page.getByText("Answered:")).toBeVisible();
  for (const r of restoreChecks) await r.check(page.locator("fieldset[data-kind]").nth(r.index));
  await expect(page.getByText(/Answered:\s*7 of/)).toBeVisible();

  // Submit asks first (WCAG 3.3.4), then the result is shown and announced.
  await tabTo(page, page.getByRole("button", { name: /Submit answers/ }));
  await page.keyboard.press("Enter");
  const dialog = page.getByRole("dialog", { name: "Submit your answers?" });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText("You have answered 7 of");
  await tabTo(page, dialog.getByRole("button", { name: "Submit now" }), 10);
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: "Your result" })).toBeVisible({ timeout: 60_000 });
  // Focus moves to the result (document.activeElement: toBeFocused also needs window focus, which a second worker can hold).
  await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("quiz-result-heading");
  await expect(page.getByRole("status").filter({ hasText: "Submitted. You scored" })).toBeAttached();
  // Score and right or wrong per question always; with attempts left, no correct answers and no
  // explanations, and a sentence says when they will be shown.
  await expect(page.getByRole("list", { name: "Question by question" }).getByRole("listitem")).toHaveCount(BANK.questions.length);
  await expect(page.getByTestId("answers-note")).toContainText(`once all ${BANK.settings.attemptsAllowed} attempts at this quiz are used`);
  await expect(page.getByTestId("quiz-result")).not.toContainText("Why:");
  await expect(page.getByTestId("quiz-result").locator("dt", { hasText: "Correct answer" })).toHaveCount(0);
  await checkQuizPage(page, "result");

  // The result stays after a reload, and the attempt is listed with its score.
  await page.goto(attemptUrl);
  await expect(page.getByRole("heading", { name: "Your result" })).toBeVisible();
  await page.goto("/learn/quizzes");
  await expect(page.locator(`[data-bank="${BANK_ID}"]`)).toContainText("1 of 3 used");
});

test("an instructor opens the item statistics of the quiz and downloads them", async ({ page }) => {
  test.setTimeout(180_000);
  const u = demoUser("instructor");
  await signInPage(page, u.email, u.password, "/teach/quizzes");
  await expect(page.getByRole("heading", { name: "Quiz statistics", level: 1 })).toBeVisible();
  await checkQuizPage(page, "stats-list");
  await page.getByRole("link", { name: "Drums: module quiz" }).click();
  await page.waitForURL(new RegExp(`/teach/quizzes/${BANK_ID}$`), { timeout: 120_000 });
  await expect(page.getByRole("heading", { level: 1 })).toContainText("Drums");
  const table = page.getByTestId("item-table");
  await expect(table.getByRole("row")).toHaveCount(BANK.questions.length + 1);
  await expect(page.getByTestId("stats-summary")).toContainText("Attempts (n)");
  await expect(page.getByRole("figure", { name: "Score distribution" })).toBeVisible();
  await checkQuizPage(page, "stats");
  const csv = await page.request.get(`/api/quizzes/${BANK_ID}/stats.csv`);
  expect(csv.status()).toBe(200);
  expect(csv.headers()["content-type"]).toContain("text/csv");
  expect((await csv.text()).split("\r\n")[0]).toBe("position,question_id,kind,topic,prompt,p,D,r_pb,r_corrected,flags,n");
});
