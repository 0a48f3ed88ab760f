// A school manager invites a roster from a CSV file, a newcomer signs up from the invitation mail
// (through the catcher) and lands in the class; the manager sees them in the sorted table and the
// CSV export. A fresh school per run, so the demo's seats are untouched.
import { readFile } from "node:fs/promises";
import { withDb } from "../support/db";
import { waitForMail } from "../support/mail";
import { uniqueEmail } from "../support/unique";
import { apiContext, signInPage } from "./helpers";
import { checkPage, expect, test } from "./page-check";

const PASSWORD = "roster test passphrase";

/** A verified school manager (signed up over HTTP, then promoted) running a school with one 4-seat class. */
async function freshSchool(): Promise<{ email: string; className: string; classId: string }> {
  const email = uniqueEmail("roster-manager");
  const api = await apiContext();
  expect((await api.post("/api/account/sign-up", { data: { name: "Wren Tallis", email, password: PASSWORD } })).status()).toBe(200);
  await api.dispose();
  const className = `Roster class ${Date.now().toString(36)}`;
  const classId = await withDb(async (c) => {
    const { rows: u } = await c.query("update users set role = 'school_manager', email_verified_at = now() where email = $1 returning id", [email]);
    const { rows: s } = await c.query("insert into schools (slug, name) values ($1, 'Harbour Light Sound School') returning id", [`roster-${Date.now()}-${Math.random().toString(36).slice(2, 8)}`]);
    await c.query("insert into school_members (school_id, user_id, role) values ($1, $2, 'manager')", [s[0].id, u[0].id]);
    const { rows: k } = await c.query("insert into classes (school_id, name, term, course_slug, seats_purchased) values ($1, $2, 'Winter 2027', 'miking-the-band', 4) returning id", [s[0].id, className]);
    return k[0].id as string;
  });
  return { email, className, classId };
}

test("a manager invites a CSV roster; a newcomer signs up from the mail and lands in the class", async ({ page, browser, browserProblems }) => {
  test.setTimeout(120_000);
  const school = await freshSchool();
  const [newcomer, second] = [uniqueEmail("newcomer"), uniqueEmail("second")];
  const roster = `email,name\n${newcomer},Robin Newcomer\nnot-an-address,Bad Line\n${second},Sam Second\n`;
  const file = { name: "roster.csv", mimeType: "text/csv", buffer: Buffer.from(roster) };

  await signInPage(page, school.email, PASSWORD, "/school");
  await expect(page.getByRole("heading", { name: "School office", level: 1 })).toBeVisible();
  await expect(page.getByTestId("office-class")).toContainText("4");
  await checkPage(page, "school-office-home");
  await page.getByRole("link", { name: school.className }).click();
  await expect(page.getByRole("heading", { name: school.className, level: 1 })).toBeVisible();

  // Every line must be good, or nothing is sent: line 3 is refused by number.
  await page.getByLabel("Or a CSV roster").setInputFiles(file);
  await page.getByRole("button", { name: "Send invitations" }).click();
  const problems = page.getByTestId("roster-problems");
  await expect(problems).toContainText('"not-an-address" is not a valid e-mail address.');
  await expect(problems.getByRole("row").nth(1)).toContainText("3");
  await expect(page.getByText(/Nothing was sent: 1 line needs another look/)).toBeVisible();
  await checkPage(page, "roster-refused");

  // The explicit choice: the good lines only.
  await page.getByLabel("Or a CSV roster").setInputFiles(file);
  await page.getByLabel("If some lines have problems, invite the good lines anyway").check();
  await page.getByRole("button", { name: "Send invitations" }).click();
  await expect(page.getByText("2 invitations sent. 1 skipped, as you chose:")).toBeVisible();
  await page.reload();
  const pending = page.getByTestId("pending-invitations");
  await expect(pending).toContainText(newcomer);
  await expect(pending).toContainText(second);
  await expect(page.getByTestId("seat-summary")).toContainText("Held by invitations2");
  await checkPage(page, "class-office-invited");

  // The newcomer, in a browser of their own, opens the mail the catcher received.
  const mail = await waitForMail(newcomer, /invites you to/);
  const link = mail.text.match(/https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]{43}/)?.[0];
  expect(link, "invitation link in the mail").toBeTruthy();
  const guest = await browser.newContext({ extraHTTPHeaders: { "x-forwarded-for": `10.3.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}` } });
  browserProblems.watch(guest);
  const visitor = await guest.newPage();
  await visitor.goto(link!);
  await expect(visitor.getByRole("heading", { name: `Join ${school.className}` })).toBeVisible();
  await expect(visitor.getByLabel("Your name")).toHaveValue("Robin Newcomer");
  await checkPage(visitor, "invitation-sign-up");
  await visitor.getByLabel("Choose a password").fill("a newcomer's own passphrase");
  await visitor.getByRole("button", { name: "Create my account and accept" }).click();
  await visitor.waitForURL((url) => url.pathname === "/learn");
  await expect(visitor.getByText(school.className)).toBeVisible();
  await checkPage(visitor, "learn-after-invitation");
  // The link worked once.
  await visitor.goto(link!);
  await expect(visitor.getByRole("heading", { name: "This invitation can't be used" })).toBeVisible();
  await guest.close();

  // The manager sees the newcomer seated, sorts the table and downloads it.
  await page.reload();
  const table = page.getByTestId("office-apprentices");
  await expect(table).toContainText("Robin Newcomer");
  await expect(page.getByTestId("seat-summary")).toContainText("Taken1");
  await page.getByRole("link", { name: /^Name.*sort descending/ }).click();
  await expect(table.getByRole("columnheader", { name: /^Name/ })).toHaveAttribute("aria-sort", "descending");
  await checkPage(page, "class-office-seated");
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download the apprentice table (CSV)" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^roster-class-[a-z0-9-]+-roster\.csv$/);
  const csv = await readFile(await download.path(), "utf8");
  expect(csv.split("\r\n")[0]).toMatch(/^name,email,joined_utc,lessons_completed,lessons_total,percent,last_opened_utc/);
  expect(csv).toContain(`Robin Newcomer,${newcomer},`);
});
