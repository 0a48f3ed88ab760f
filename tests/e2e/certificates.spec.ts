// Certificates end to end in Chromium: the seeded graduate (db/seed-certificates.ts: course
// complete, certificate not claimed) claims the certificate and downloads the PDF and the
// credential; the PDF is read by Debian's pdftotext, its QR code by zbarimg after pdftoppm; the
// credential is verified by jose against the JWK Set fetched over HTTP from /issuer/jwks.json; a
// visitor opens the QR link and sees "valid"; an admin revokes it and the page, the status list
// (W3C Bitstring Status List v1.0 §3.3) and the graduate's page say so.
import { execFileSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createRemoteJWKSet, jwtVerify } from "jose";
import { DEMO_GRADUATE } from "@/db/seed-graduate";
import { decodeStatusList, statusBit } from "@/lib/certificates/status-list";
import { withDb } from "../support/db";
import { uniqueAddress } from "../support/unique";
import { baseURL, demoUser, signInPage } from "./helpers";
import { checkPage, expect, test } from "./page-check";

test.describe.configure({ mode: "serial" });

const jwks = createRemoteJWKSet(new URL(`${baseURL}/issuer/jwks.json`));
const state = { code: "", verifyUrl: "", index: -1 };

test.beforeAll(async () => {
  // A rerun against the same database starts from an unclaimed certificate.
  await withDb((c) => c.query("delete from certificates where user_id = (select id from users where email = $1)", [DEMO_GRADUATE.email]));
});

test("the graduate claims the certificate and downloads the PDF and the signed credential", async ({ page }) => {
  await signInPage(page, DEMO_GRADUATE.email, DEMO_GRADUATE.password, "/learn/certificates");
  await expect(page.getByRole("heading", { name: "Certificates", level: 1 })).toBeVisible();
  const course = page.locator(`section[data-course="${DEMO_GRADUATE.courseSlug}"]`);
  await expect(course.getByText("Everything is done.")).toBeVisible();
  await checkPage(page, "certificates-claim");
  await course.getByRole("button", { name: /Claim my certificate/ }).click();
  await expect(course.getByTestId("certificate-code")).toHaveText(/^[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}$/);
  state.code = (await course.getByTestId("certificate-code").textContent())!.trim();
  await checkPage(page, "certificates-issued");

  const dir = mkdtempSync(path.join(tmpdir(), "axisline-e2e-cert-"));
  const [pdf] = await Promise.all([page.waitForEvent("download"), course.getByRole("link", { name: "Download PDF (A4)" }).click()]);
  const pdfFile = path.join(dir, pdf.suggestedFilename());
  await pdf.saveAs(pdfFile);
  const text = execFileSync("pdftotext", [pdfFile, "-"], { encoding: "utf8" });
  expect(text).toContain(DEMO_GRADUATE.name);
  expect(text).toContain("Miking the band");
  expect(text).toContain(state.code);
  execFileSync("pdftoppm", ["-r", "150", "-png", "-singlefile", pdfFile, path.join(dir, "page")]);
  state.verifyUrl = execFileSync("zbarimg", ["-q", "--raw", path.join(dir, "page.png")], { encoding: "utf8" }).trim();
  expect(state.verifyUrl).toBe(`${baseURL}/verify/${state.code}`);

  const [credential] = await Promise.all([page.waitForEvent("download"), course.getByRole("link", { name: "Download credential (Open Badges 3.0)" }).click()]);
  expect(credential.suggestedFilename()).toBe(`axisline-credential-${state.code}.jwt`);
  const jwt = (await (await credential.createReadStream()).toArray()).join("");
  const { payload, protectedHeader } = await jwtVerify(jwt, jwks);
  expect(protectedHeader.typ).toBe("JWT");
  expect(payload.type).toEqual(["VerifiableCredential", "OpenBadgeCredential"]);
  const status = payload.credentialStatus as { statusListIndex: string; statusListCredential: string };
  expect(status.statusListCredential).toBe(`${baseURL}/credentials/status/1`);
  state.index = Number(status.statusListIndex);
});

test("a visitor opens the QR link and sees the certificate valid; the form finds it by a typed code", async ({ browser }) => {
  const visitor = await browser.newContext({ extraHTTPHeaders: { "x-forwarded-for": uniqueAddress() } });
  const page = await visitor.newPage();
  await page.goto(state.verifyUrl);
  await expect(page.getByText("This certificate is valid")).toBeVisible();
  await expect(page.getByText(DEMO_GRADUATE.name)).toBeVisible();
  await checkPage(page, "verify-valid");
  await page.goto("/verify");
  await page.getByLabel("Verification code").fill(state.code.toLowerCase().replaceAll("-", " "));
  await page.getByRole("button", { name: "Check the certificate" }).click();
  await expect(page).toHaveURL(new RegExp(`/verify/${state.code}$`));
  await expect(page.getByText("This certificate is valid")).toBeVisible();
  await checkPage(page, "verify-form");
  await page.goto("/verify/0000-0000-0000");
  await expect(page.getByText("We have no certificate with this code")).toBeVisible();
  await checkPage(page, "verify-unknown");
  await visitor.close();
});

test("an admin revokes it; the public page, the status list and the graduate's page say so", async ({ page, browser }) => {
  const admin = demoUser("admin");
  await signInPage(page, admin.email, admin.password, `/admin/certificates?code=${state.code}`);
  const row = page.locator(`li[data-code="${state.code}"]`);
  await row.getByLabel(/Reason for revoking/).fill("Issued by mistake during the spring term review");
  await row.getByRole("button", { name: /Revoke certificate/ }).click();
  await expect(row.getByText("Revoked", { exact: true })).toBeVisible();
  await checkPage(page, "admin-certificates");

  const visitor = await browser.newContext({ extraHTTPHeaders: { "x-forwarded-for": uniqueAddress() } });
  const view = await visitor.newPage();
  await view.goto(state.verifyUrl);
  await expect(view.getByText("This certificate has been revoked")).toBeVisible();
  await expect(view.getByText(/Issued by mistake during the spring term review/)).toBeVisible();
  await checkPage(view, "verify-revoked");

  const list = await (await view.request.get("/credentials/status/1")).text();
  const { payload } = await jwtVerify(list, jwks);
  const subject = payload.credentialSubject as { encodedList: string };
  expect(statusBit(decodeStatusList(subject.encodedList), state.index)).toBe(1);
  await visitor.close();

  const graduate = await browser.newContext({ extraHTTPHeaders: { "x-forwarded-for": uniqueAddress() } });
  const mine = await graduate.newPage();
  await signInPage(mine, DEMO_GRADUATE.email, DEMO_GRADUATE.password, "/learn/certificates");
  await expect(mine.getByText("This certificate has been revoked")).toBeVisible();
  await graduate.close();
});
