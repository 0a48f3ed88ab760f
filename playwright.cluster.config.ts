import { defineConfig } from "@playwright/test";

// The cluster tests (tests/cluster): HTTP against nginx (CLUSTER_PROXY_URL) in front of two app
// processes of one build (CLUSTER_A_URL, CLUSTER_B_URL), started by scripts/test.sh after the e2e
// run. One worker, in file order: the last file stops instance A.
export default defineConfig({
  testDir: "tests/cluster",
  outputDir: "test-results/playwright-cluster",
  timeout: 30_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [["list"], ["json", { outputFile: "test-results/cluster.json" }]],
  use: { baseURL: process.env.CLUSTER_PROXY_URL ?? "http://127.0.0.1:3180", trace: "off" },
});
