/**
 * `npm run measure:pages`: Lighthouse's mobile profile (default config: simulated slow 4G and 4×
 * CPU slowdown) in Debian's Chromium, on our pages beside a bare page of the same Next.js version,
 * in one run, median of MEASURE_RUNS (3) per page. Prints one table and whether each page meets
 * the goals below. A benchmark, not a test: it always exits 0 once it has measured.
 *
 * - The bare page lives in a scratch folder outside the app (MEASURE_BARE_DIR, default
 *   <tmp>/axisline-bare-next-<version>): a layout and one static server component, nothing else,
 *   installed from the npm registry (npm's cache when warm) at the exact versions of next, react
 *   and react-dom we use, built once and reused while those versions stay the same.
 * - Our pages come from a running production server (MEASURE_BASE_URL, default the demo's
 *   http://127.0.0.1:3000: `npm run demo` or `npm start`). Both are served by Next.js itself.
 * - The quiz page is an open attempt of the demo apprentice, so Lighthouse sends that
 *   apprentice's session cookie for it (and only for it); every other page is a visitor's.
 * - Runs alternate (bare page, then each of ours, round after round) so a busy moment of the
 *   machine falls on both sides.
 * - A reference row, not a floor: the same bare page at /with-our-headers, answered with the
 *   response headers next.config.ts gives our pages (CSP, Cross-Origin-Opener-Policy...). It shows
 *   what those headers cost in this harness (a COOP page loaded by Lighthouse, which navigates from
 *   about:blank in the same tab, starts in a new renderer process). Goals are judged against the
 *   bare page alone.
 *
 * Goals per page: performance within 5 points of the bare page, LCP ≤ 1.3 × the bare page's,
 * TBT ≤ the bare page's + 250 ms, CLS ≤ 0.05; accessibility, best practices and SEO 100.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import lighthouse from "lighthouse";
import * as chromeLauncher from "chrome-launcher";

const ROOT = join(import.meta.dirname, "..");
if (existsSync(join(ROOT, ".env"))) process.loadEnvFile(join(ROOT, ".env")); // set variables win
const BASE_URL = (process.env.MEASURE_BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
const BARE_PORT = Number(process.env.MEASURE_BARE_PORT ?? 3290);
const RUNS = Number(process.env.MEASURE_RUNS ?? 3);
const APPRENTICE = { email: "ade.brightwater@kestrel-bay.example", password: "lantern-room-learn" };
const QUIZ_BANK = "bank-miking-the-band-vocals-and-wireless";

type PageToMeasure = { label: string; path: string; signedIn?: boolean };
const PAGES: PageToMeasure[] = [
  { label: "landing page", path: "/" },
  { label: "/courses", path: "/courses" },
  { label: "a course page", path: "/courses/miking-the-band" },
  { label: "a preview lesson", path: "/courses/miking-the-band/les-mtb-order-of-work" },
  { label: "a quiz page (apprentice)", path: "/learn/quizzes/:attempt", signedIn: true },
  { label: "a Bench tool", path: "/bench/pickup-pattern" },
];

type Scores = { performance: number; accessibility: number; bestPractices: number; seo: number; lcpMs: number; tbtMs: number; cls: number; fcpMs: number };
const GOALS = { performanceBelowBare: 5, lcpRatio: 1.3, tbtAboveBareMs: 250, cls: 0.05 };

const BARE_PAGE = "export default function Page() { return (<main><h1>A bare page</h1><p>One static server component, nothing else.</p></main>); }\n";
const versionOf = (name: string) => (JSON.parse(readFileSync(join(ROOT, "node_modules", name, "package.json"), "utf8")) as { version: string }).version;

const WITH_OUR_HEADERS = "/with-our-headers";

/** The headers next.config.ts sends with every page of ours (its "/:path*" rule), read with the server's .env (loaded above). */
async function ourPageHeaders(): Promise<{ key: string; value: string }[]> {
  const { default: ourConfig } = await import("../next.config"); // after .env: the config reads it when imported
  const rules = (await ourConfig.headers?.()) ?? [];
  const everyPage = rules.find((r) => r.source === "/:path*");
  if (!everyPage) throw new Error("next.config.ts has no headers rule for /:path*");
  return everyPage.headers;
}

/** A layout and one static server component: the framework's own floor (and, at WITH_OUR_HEADERS, the same page with our headers). */
function prepareBarePage(ourHeaders: { key: string; value: string }[]): string {
  const versions = { next: versionOf("next"), react: versionOf("react"), "react-dom": versionOf("react-dom") };
  const dir = process.env.MEASURE_BARE_DIR ?? join(tmpdir(), `axisline-bare-next-${versions.next}`);
  const pkg = JSON.stringify({ name: "bare-next-page", private: true, dependencies: versions }, null, 2);
  const files: Record<string, string> = {
    "package.json": pkg,
    "next.config.mjs": [
      "export default {",
      "  turbopack: { root: import.meta.dirname },",
      `  async headers() { return [{ source: "${WITH_OUR_HEADERS}", headers: ${JSON.stringify(ourHeaders)} }]; },`,
      "};",
      "",
    ].join("\n"),
    "app/layout.js": [
      'export const metadata = { title: "A bare page", description: "One static server component of the same framework." };',
      'export default function RootLayout({ children }) { return (<html lang="en"><body>{children}</body></html>); }',
      "",
    ].join("\n"),
    "app/page.js": BARE_PAGE,
    [`app${WITH_OUR_HEADERS}/page.js`]: BARE_PAGE,
  };
  const changed = Object.entries(files).some(([name, text]) => !existsSync(join(dir, name)) || readFileSync(join(dir, name), "utf8") !== text);
  if (changed || !existsSync(join(dir, ".next", "BUILD_ID"))) {
    console.log(`[bare] preparing Next.js ${versions.next} in ${dir}`);
    mkdirSync(join(dir, "app", WITH_OUR_HEADERS.slice(1)), { recursive: true });
    for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
    run("npm", ["install", "--no-audit", "--no-fund", "--prefer-offline", "--no-package-lock"], dir);
    run(join(dir, "node_modules", ".bin", "next"), ["build"], dir);
  }
  return dir;
}

function run(command: string, args: string[], cwd: string): void {
  const result = spawnSync(command, args, { cwd, stdio: ["ignore", "ignore", "inherit"], env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", NEXT_DIST_DIR: "" } });
  if (result.status !== 0) throw new Error(`${command} ${args.join(" ")} failed in ${cwd}`);
}

async function waitFor(url: string, what: string, tries = 150): Promise<void> {
  for (let i = 0; i < tries; i++) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${what} did not answer at ${url}`);
}

function startBarePage(dir: string): ChildProcess {
  return spawn(join(dir, "node_modules", ".bin", "next"), ["start", "-H", "127.0.0.1", "-p", String(BARE_PORT)], {
    cwd: dir,
    stdio: "ignore",
    env: { ...process.env, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1", NEXT_DIST_DIR: "" },
  });
}

/** Signs the demo apprentice in and starts (or resumes) an attempt; returns the cookie and its page. */
async function apprenticeQuizPage(): Promise<{ cookie: string; path: string }> {
  const signIn = await fetch(`${BASE_URL}/api/account/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: BASE_URL },
    body: JSON.stringify(APPRENTICE),
  });
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  if (!signIn.ok || !cookie) throw new Error(`the demo apprentice could not sign in (${signIn.status}): is the demo seeded?`);
  const start = await fetch(`${BASE_URL}/api/quizzes/${QUIZ_BANK}/attempts`, { method: "POST", headers: { cookie, origin: BASE_URL } });
  const body = (await start.json()) as { attemptId?: string; message?: string };
  const attemptId = body.attemptId;
  if (!start.ok || !attemptId) throw new Error(`could not open a quiz attempt (${start.status}): ${body.message ?? JSON.stringify(body)}`);
  return { cookie, path: `/learn/quizzes/${attemptId}` };
}

async function measure(port: number, url: string, cookie?: string): Promise<Scores> {
  const result = await lighthouse(url, { port, output: "json", logLevel: "error", extraHeaders: cookie ? { cookie } : undefined });
  if (!result) throw new Error(`Lighthouse returned nothing for ${url}`);
  const { categories, audits } = result.lhr;
  const score = (k: string) => Math.round((categories[k]?.score ?? 0) * 100);
  const value = (k: string) => audits[k]?.numericValue ?? Number.NaN;
  for (const [id, audit] of Object.entries(audits)) {
    if (audit.score !== null && audit.score < 1 && audit.scoreDisplayMode === "binary" && !["performance"].includes(id)) {
      const category = Object.entries(categories).find(([, c]) => c.auditRefs.some((r) => r.id === id && r.weight > 0))?.[0];
      if (category && category !== "performance") console.log(`    ${new URL(url).pathname}: failing ${category} audit ${id} (${audit.title})`);
    }
  }
  return {
    performance: score("performance"),
    accessibility: score("accessibility"),
    bestPractices: score("best-practices"),
    seo: score("seo"),
    lcpMs: value("largest-contentful-paint"),
    tbtMs: value("total-blocking-time"),
    cls: value("cumulative-layout-shift"),
    fcpMs: value("first-contentful-paint"),
  };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
function medianScores(runs: Scores[]): Scores {
  const keys = Object.keys(runs[0]) as (keyof Scores)[];
  return Object.fromEntries(keys.map((k) => [k, median(runs.map((r) => r[k]))])) as Scores;
}

function verdict(page: Scores, bare: Scores): string[] {
  const misses: string[] = [];
  if (page.performance < bare.performance - GOALS.performanceBelowBare) misses.push(`performance ${page.performance} < ${bare.performance - GOALS.performanceBelowBare}`);
  if (page.lcpMs > bare.lcpMs * GOALS.lcpRatio) misses.push(`LCP ${(page.lcpMs / bare.lcpMs).toFixed(2)}× > ${GOALS.lcpRatio}×`);
  if (page.tbtMs > bare.tbtMs + GOALS.tbtAboveBareMs) misses.push(`TBT +${Math.round(page.tbtMs - bare.tbtMs)} ms > +${GOALS.tbtAboveBareMs}`);
  if (page.cls > GOALS.cls) misses.push(`CLS ${page.cls.toFixed(3)} > ${GOALS.cls}`);
  for (const k of ["accessibility", "bestPractices", "seo"] as const) if (page[k] !== 100) misses.push(`${k} ${page[k]}`);
  return misses;
}

const fmtS = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
const row = (label: string, s: Scores, misses?: string[] | "reference") =>
  `| ${label} | ${s.performance} | ${fmtS(s.lcpMs)} | ${Math.round(s.tbtMs)} ms | ${s.cls.toFixed(3)} | ${fmtS(s.fcpMs)} | ${s.accessibility}/${s.bestPractices}/${s.seo} | ${misses === undefined ? "floor" : misses === "reference" ? "(not judged)" : misses.length ? `no: ${misses.join("; ")}` : "yes"} |`;

async function main(): Promise<void> {
  await waitFor(`${BASE_URL}/api/health`, "our production server (start it with `npm run demo` or `npm start`)", 10);
  const bareDir = prepareBarePage(await ourPageHeaders());
  const bare = startBarePage(bareDir);
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    chromeFlags: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  try {
    const bareUrl = `http://127.0.0.1:${BARE_PORT}/`;
    const headersUrl = `http://127.0.0.1:${BARE_PORT}${WITH_OUR_HEADERS}`;
    await waitFor(bareUrl, "the bare page");
    const quiz = await apprenticeQuizPage();
    const targets = PAGES.map((p) => ({ ...p, url: BASE_URL + (p.signedIn ? quiz.path : p.path), cookie: p.signedIn ? quiz.cookie : undefined }));
    // One unmeasured load of each warms Next's caches and the OS's file cache on both sides.
    await measure(chrome.port, bareUrl);
    await measure(chrome.port, headersUrl);
    for (const t of targets) await fetch(t.url, { headers: t.cookie ? { cookie: t.cookie } : {} });

    const runs = new Map<string, Scores[]>([["bare", []], ["bare with our headers", []], ...targets.map((t) => [t.label, []] as [string, Scores[]])]);
    for (let round = 1; round <= RUNS; round++) {
      console.log(`[round ${round}/${RUNS}] load ${(await import("node:os")).loadavg()[0].toFixed(2)}`);
      runs.get("bare")!.push(await measure(chrome.port, bareUrl));
      runs.get("bare with our headers")!.push(await measure(chrome.port, headersUrl));
      for (const t of targets) runs.get(t.label)!.push(await measure(chrome.port, t.url, t.cookie));
    }
    const bareScores = medianScores(runs.get("bare")!);
    const lines = [
      `Lighthouse ${versionOf("lighthouse")} mobile, Next.js ${versionOf("next")}, median of ${RUNS}`,
      "",
      "| page | performance | LCP | TBT | CLS | FCP | a11y/BP/SEO | goals met |",
      "| --- | --- | --- | --- | --- | --- | --- | --- |",
      row("bare framework page", bareScores),
      row("(reference) the bare page with our response headers", medianScores(runs.get("bare with our headers")!), "reference"),
      ...targets.map((t) => {
        const s = medianScores(runs.get(t.label)!);
        return row(t.label, s, verdict(s, bareScores));
      }),
    ];
    console.log(lines.join("\n"));
    mkdirSync(join(ROOT, "test-results"), { recursive: true });
    writeFileSync(join(ROOT, "test-results", "measure-pages.json"), JSON.stringify(Object.fromEntries(runs), null, 2));
  } finally {
    await chrome.kill();
    bare.kill();
  }
}

await main();
