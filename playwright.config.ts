import { defineConfig } from "@playwright/test";

// End-to-end tests run in Debian's Chromium (never a downloaded browser) against the production
// build that scripts/test.sh starts on E2E_BASE_URL with its own database and mail catcher.
export default defineConfig({
  outputDir: "test-results/playwright",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: Number(process.env.E2E_WORKERS ?? 2),
  retries: 0,
  reporter: [["list"], ["json", { outputFile: "test-results/e2e.json" }]],
  use: {
    baseURL: process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100",
    trace: "off",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    },
  },
  projects: [
    { name: "chromium", testDir: "tests/e2e", use: { browserName: "chromium", viewport: { width: 1280, height: 900 } } },
    // The black-box probes of the security review, over HTTP and in the browser (tests/security).
    { name: "security", testDir: "tests/security", use: { browserName: "chromium", viewport: { width: 1280, height: 900 } } },
  ],
});
