// Lighthouse (mobile, default config) in Debian's Chromium against a running build.
//   tsx scripts/lighthouse.ts http://127.0.0.1:3000 /courses /bench
import lighthouse from "lighthouse";
import * as chromeLauncher from "chrome-launcher";

const [base = "http://127.0.0.1:3000", ...paths] = process.argv.slice(2);
const chrome = await chromeLauncher.launch({
  chromePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  chromeFlags: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});
try {
  for (const path of paths.length ? paths : ["/"]) {
    const result = await lighthouse(base + path, { port: chrome.port, output: "json", logLevel: "error" });
    const cats = result?.lhr.categories ?? {};
    const score = (k: string) => Math.round((cats[k]?.score ?? 0) * 100);
    console.log(`${path}: performance ${score("performance")}, accessibility ${score("accessibility")}, best practices ${score("best-practices")}, SEO ${score("seo")}`);
    for (const [id, audit] of Object.entries(result?.lhr.audits ?? {})) {
      if (audit.score !== null && audit.score < 1 && audit.scoreDisplayMode === "binary") console.log(`    failing: ${id} (${audit.title})`);
    }
  }
} finally {
  await chrome.kill();
}
