// First-load JavaScript of a page as a browser receives it: every script fetched during the
// initial load (before any interaction), gzipped with zlib level 9, summed in KiB.
//   tsx scripts/measure-first-load.ts http://127.0.0.1:3000 /courses/... /bench/pickup-pattern
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";

const [base = "http://127.0.0.1:3000", ...paths] = process.argv.slice(2);
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
});
for (const path of paths.length ? paths : ["/"]) {
  const page = await browser.newPage();
  const scripts = new Map<string, number>();
  page.on("response", async (res) => {
    if (res.request().resourceType() !== "script") return;
    try {
      scripts.set(res.url(), gzipSync(await res.body(), { level: 9 }).length);
    } catch {
      /* a response without a body (redirect) */
    }
  });
  await page.goto(base + path, { waitUntil: "networkidle" });
  await page.waitForTimeout(500);
  const total = [...scripts.values()].reduce((a, b) => a + b, 0);
  console.log(`${path}: first-load JS ${(total / 1024).toFixed(1)} KiB gzipped in ${scripts.size} scripts`);
  await page.close();
}
await browser.close();
