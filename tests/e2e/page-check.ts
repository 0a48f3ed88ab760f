// The e2e suite's `test` and `expect`. Every spec imports them from here, not from
// "@playwright/test":
//
//   import { checkPage, expect, test } from "./page-check";
//
// 1. An automatic fixture watches every page of the test's browser context: a `console.error`
//    (the browser also logs every failed request there, e.g. "Failed to load resource: … 401") or
//    an uncaught exception fails the test once it has run, with the messages and the page's URL.
//    A page of a context the test opens itself is watched with `browserProblems.watch(context)`.
//    Nothing is allow-listed. A test that makes a request fail on purpose (a missing page, a wrong
//    password) names that one failure with `browserProblems.expectFailedRequest(status, path, why)`,
//    and then must cause it.
// 2. `checkPage(page, name)`: axe-core (WCAG 2.0/2.1/2.2 A and AA rules), no sideways scrolling
//    at 1280 and 390 CSS px (WCAG 2.2 SC 1.4.10 Reflow), and a full-page screenshot at each width
//    in test-results/screenshots/<name>-<desktop|mobile>.png.
import AxeBuilder from "@axe-core/playwright";
import { test as base, expect, type BrowserContext, type Page } from "@playwright/test";

export { expect };
export type { APIRequestContext, Locator, Page } from "@playwright/test";

type Problem = { text: string; pageUrl: string; resourceUrl: string };

const FAILED_REQUEST = /^Failed to load resource: the server responded with a status of (\d{3})\b/;

/** What the browser reported while the test ran: console errors and uncaught exceptions. */
export class BrowserProblems {
  private readonly reported: Problem[] = [];
  private readonly expected: { status: number; path: string; why: string }[] = [];
  private readonly watched = new WeakSet<Page>();

  /** Watches a page, or every page (present and future) of a context. */
  watch(target: Page | BrowserContext): void {
    if ("newPage" in target) {
      target.on("page", (page) => this.watchPage(page));
      for (const page of target.pages()) this.watchPage(page);
    } else {
      this.watchPage(target);
    }
  }

  /**
   * A request the test makes fail on purpose (a missing page, a wrong password): Chromium logs
   * every 4xx/5xx answer as a console error, which no page can prevent. Only that status for that
   * path is excused, and the test fails if the request never fails so. Not for anything a
   * visitor meets on the normal path: fix those instead.
   */
  expectFailedRequest(status: number, path: string, why: string): void {
    this.expected.push({ status, path, why });
  }

  /** What fails the test: problems not asked for, and asked-for failures that never came. */
  settle(): { unexpected: string[]; missing: string[] } {
    const seen = new Set<(typeof this.expected)[number]>();
    const unexpected = this.reported
      .filter((problem) => {
        const status = Number(FAILED_REQUEST.exec(problem.text)?.[1]);
        const path = new URL(problem.resourceUrl || problem.pageUrl).pathname;
        const match = this.expected.find((e) => e.status === status && e.path === path);
        if (match) seen.add(match);
        return !match;
      })
      .map((p) => `${p.text} (page ${p.pageUrl}${p.resourceUrl && p.resourceUrl !== p.pageUrl ? `, resource ${p.resourceUrl}` : ""})`);
    const missing = this.expected.filter((e) => !seen.has(e)).map((e) => `${e.status} from ${e.path} (${e.why})`);
    return { unexpected, missing };
  }

  private watchPage(page: Page): void {
    if (this.watched.has(page)) return;
    this.watched.add(page);
    page.on("console", (message) => {
      if (message.type() !== "error") return;
      const text = FAILED_REQUEST.test(message.text()) ? message.text() : `console.error: ${message.text()}`;
      this.reported.push({ text, pageUrl: page.url(), resourceUrl: message.location().url });
    });
    page.on("pageerror", (error) => {
      this.reported.push({ text: `uncaught ${error.name}: ${error.message}`, pageUrl: page.url(), resourceUrl: "" });
    });
  }
}

export const test = base.extend<{ browserProblems: BrowserProblems }>({
  browserProblems: [
    async ({ context }, use) => {
      const problems = new BrowserProblems();
      problems.watch(context);
      await use(problems);
      const { unexpected, missing } = problems.settle();
      expect(unexpected, "the browser logged an error (console.error, a failed request or an uncaught exception)").toEqual([]);
      expect(missing, "a request the test expected to fail did not").toEqual([]);
    },
    { auto: true },
  ],
});

export const PAGE_SIZES = [
  { label: "desktop", width: 1280, height: 900 },
  { label: "mobile", width: 390, height: 844 },
] as const;

const AXE_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];

/** No axe violations, no sideways scrolling, and screenshots at both sizes. */
export async function checkPage(page: Page, name: string, { settleMs = 150 }: { settleMs?: number } = {}): Promise<void> {
  const axe = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
  expect(axe.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`), `axe on ${name}`).toEqual([]);
  for (const size of PAGE_SIZES) {
    await page.setViewportSize({ width: size.width, height: size.height });
    await page.waitForTimeout(settleMs); // figures and charts re-measure on resize
    const overflowPx = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflowPx, `${name} scrolls sideways at ${size.width} px`).toBeLessThanOrEqual(0);
    await page.screenshot({ path: `test-results/screenshots/${name}-${size.label}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: PAGE_SIZES[0].width, height: PAGE_SIZES[0].height });
}
