// First-load JavaScript of a page, as Next.js counts it: the scripts its HTML references
// (framework, route and layout chunks; not the nomodule polyfills modern browsers skip), each gzipped with zlib level 9, summed in KiB.
// Chunks a page loads later on demand (a lazily loaded figure, a prefetched route) are
// reported apart, measured in Debian's Chromium during the first 3 seconds.
//   tsx scripts/measure-first-load.ts http://127.0.0.1:3000 /courses/... /bench/pickup-pattern
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";

const [base = "http://127.0.0.1:3000", ...paths] = process.argv.slice(2);
const gz = async (url: string) => gzipSync(Buffer.from(await (await fetch(url)).arrayBuffer()), { level: 9 }).length;
const kib = (n: number) => (n / 1024).toFixed(1);

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
});
for (const path of paths.length ? paths : ["/"]) {
  const html = await (await fetch(base + path)).text();
  const srcs = [...new Set([...html.matchAll(/<script(?![^>]*noModule)[^>]+src="([^"]+)"/gi)].map((m) => new URL(m[1].replace(/&amp;/g, "&"), base).href))];
  const sizes = await Promise.all(srcs.map(gz));
  const firstLoad = sizes.reduce((a, b) => a + b, 0);

  const page = await browser.newPage();
  const later = new Map<string, Promise<number>>();
  page.on("response", (res) => {
    if (res.request().resourceType() === "script" && !srcs.includes(res.url())) later.set(res.url(), gz(res.url()));
  });
  await page.goto(base + path, { waitUntil: "load" });
  await page.waitForTimeout(3000);
  const lazy = (await Promise.all(later.values())).reduce((a, b) => a + b, 0);
  await page.close();
  console.log(`${path}: first-load JS ${kib(firstLoad)} KiB gzipped (${srcs.length} scripts); then ${kib(lazy)} KiB on demand (${later.size} chunks: lazy figures, prefetch)`);
}
await browser.close();
