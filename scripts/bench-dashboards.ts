/**
 * `npm run bench:dashboards`: the dashboards at a school's scale, each page beside its own SQL.
 * Needs a production build (`next build`, into NEXT_DIST_DIR, default .next) and the PostgreSQL
 * server of DATABASE_URL (its role may create databases). In one run it:
 *   1. creates a throw-away database axisline_bench_<random> on that server, migrates it and seeds
 *      a school (scripts/bench/school-seed.ts: 1,000 apprentices in 20 classes, a progress row for
 *      every lesson of every course, 100,000 graded attempts with their answers) in set-based SQL;
 *   2. starts a production app process (scripts/serve.ts) on a free loopback port against it and
 *      signs in over HTTP as an instructor (two classes of 50) and as an apprentice;
 *   3. for each page: the statements it sends, captured by calling the same lib/server functions
 *      with a recording Drizzle logger, each timed with EXPLAIN (ANALYZE, BUFFERS) (median of
 *      BENCH_EXPLAIN_RUNS), any Seq Scan on a table that grows with the school flagged; then the
 *      page under autocannon at BENCH_CONNECTIONS (10) for BENCH_SECONDS (10), and at 1 connection;
 *   4. prints the table (server p50/p95 beside the SQL total; goal p50 ≤ 3 × SQL, and no Seq Scan
 *      that no index could replace), with the floor of any signed-in route (GET /api/me) measured
 *      the same way in the same run, and drops the database.
 *   BENCH_KEEP_DB=1 keeps the database and prints its name; BENCH_DB=<name> reuses a kept one
 *   (migrations are applied again, the seed is skipped), for working on a query.
 */
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync } from "node:fs";
import path from "node:path";
import { Client, Pool } from "pg";
import { runMigrations } from "../db/migrate";
import type { Database } from "../db/connection";
import { getBankStatistics, listExtensionTargets, listStatsBanks } from "../lib/server/quiz-stats";
import { listApprenticeClasses } from "../lib/server/homes";
import { getProgressOverview, listClassProgress } from "../lib/server/progress";
import { listCourseBanks } from "../lib/server/quiz-banks";
import { decodeSessionToken } from "../lib/server/session-cookie";
import { viewerFromClaims, type Viewer } from "../lib/server/viewer";
import { signIn, startApp, type AppProcess } from "./bench/app-process";
import { loadAverage, loadGet, type LoadFigures } from "./bench/load";
import { ADMIN_EMAIL, BENCH_PASSWORD, DEFAULT_SCALE, emailOf, seedSchool } from "./bench/school-seed";
import { capture, explain, GROWING_TABLES, shortSql, type TimedStatement } from "./bench/sql-capture";

const ROOT = path.resolve(import.meta.dirname, "..");
if (existsSync(path.join(ROOT, ".env"))) process.loadEnvFile(path.join(ROOT, ".env")); // set variables win
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const EXPLAIN_RUNS = Number(process.env.BENCH_EXPLAIN_RUNS ?? 5);
const GOAL_RATIO = 3;
const log = (line: string) => console.log(`[bench:dashboards] ${line}`);

type Page = { name: string; path: string; role: "instructor" | "apprentice" | "admin"; expect: string; data: (viewer: Viewer, database: Database) => Promise<unknown> };
type Measured = { page: Page; statements: TimedStatement[]; sqlMs: number; single: LoadFigures; loaded: LoadFigures };

function databaseUrl(name: string): string {
  const url = new URL(process.env.DATABASE_URL ?? "");
  url.pathname = `/${name}`;
  return url.toString();
}

async function withClient<T>(url: string, work: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** The pages, the session that reads each, and the lib/server calls it makes (besides the viewer's). */
async function pagesFor(classId: string, bankId: string): Promise<Page[]> {
  const both = async (v: Viewer, d: Database) => {
    const stats = await getBankStatistics(v, { bankId, classId: null }, d);
    if (stats.ok && stats.stats.timeLimitMinutes !== null) await listExtensionTargets(v, { bankId, classId: null }, d);
  };
  return [
    { name: "class progress", path: `/teach/classes/${classId}`, role: "instructor", expect: "Apprentice 0001", data: (v, d) => listClassProgress(v, classId, d) },
    { name: "quiz list (instructor)", path: "/teach/quizzes", role: "instructor", expect: "Quiz statistics", data: (v, d) => listStatsBanks(v, d) },
    { name: "item statistics", path: `/teach/quizzes/${bankId}`, role: "instructor", expect: "KR-20", data: both },
    { name: "item statistics CSV", path: `/api/quizzes/${bankId}/stats.csv`, role: "instructor", expect: "position,question_id", data: (v, d) => getBankStatistics(v, { bankId, classId: null }, d) },
    { name: "item statistics CSV, admin: every attempt", path: `/api/quizzes/${bankId}/stats.csv`, role: "admin", expect: "position,question_id", data: (v, d) => getBankStatistics(v, { bankId, classId: null }, d) },
    { name: "apprentice home", path: "/learn", role: "apprentice", expect: "Your classes", data: (v, d) => listApprenticeClasses(v, d) },
    { name: "apprentice progress (/api/progress)", path: "/api/progress", role: "apprentice", expect: '"courses"', data: (v, d) => getProgressOverview(v, d) },
  ];
}

async function measure(app: AppProcess, page: Page, cookie: string, pool: Pool, client: Client): Promise<Measured> {
  const res = await fetch(app.baseUrl + page.path, { headers: { cookie } });
  const body = await res.text();
  if (res.status !== 200 || !body.includes(page.expect)) throw new Error(`${page.path} answered ${res.status} without "${page.expect}"`);
  const captured = await capture(pool, async (database) => {
    const viewer = await viewerFromClaims(database, await decodeSessionToken(cookie.slice(cookie.indexOf("=") + 1)));
    if (!viewer) throw new Error(`the ${page.role}'s session did not load`);
    await page.data(viewer, database);
  });
  const statements: TimedStatement[] = [];
  for (const statement of captured) statements.push(await explain(client, statement, EXPLAIN_RUNS));
  const sqlMs = statements.reduce((n, s) => n + s.ms, 0);
  await loadGet(app.baseUrl, page.path, cookie, CONNECTIONS, 2); // warm-up
  const single = await loadGet(app.baseUrl, page.path, cookie, 1, Math.max(3, SECONDS / 2));
  const loaded = await loadGet(app.baseUrl, page.path, cookie, CONNECTIONS, SECONDS);
  return { page, statements, sqlMs, single, loaded };
}

function report(m: Measured): void {
  log(`${m.page.name} — GET ${m.page.path}; load average ${loadAverage()}`);
  for (const s of m.statements) {
    const scans = s.seqScans.filter((t) => GROWING_TABLES.has(t)).map((t) => (s.unindexed.includes(t) ? `${t} (NO INDEX)` : `${t} (planner's pick, index there)`));
    console.log(`    ${s.ms.toFixed(2).padStart(7)} ms  ${String(s.rows).padStart(5)} rows  ${scans.length ? `SEQ SCAN ${scans.join(", ")}  ` : ""}${s.indexes.length ? `[${s.indexes.join(", ")}]  ` : ""}${shortSql(s.sql)}`);
  }
  const l = m.loaded;
  console.log(`    SQL ${m.sqlMs.toFixed(2)} ms in ${m.statements.length} statements; 1 connection p50 ${m.single.p50.toFixed(1)} ms; ${CONNECTIONS} connections ${l.rps.toFixed(0)} req/s, p50 ${l.p50.toFixed(1)} ms, p95 ${l.p95.toFixed(1)} ms, mean ${l.mean.toFixed(1)} ms${l.non2xx || l.errors ? `, ${l.non2xx} non-2xx, ${l.errors} errors` : ""}`);
}

function table(rows: Measured[], floor: { single: LoadFigures; loaded: LoadFigures }): boolean {
  const head = ["page", "1 conn p50", `p50 @${CONNECTIONS}`, `p95 @${CONNECTIONS}`, "SQL ms", "ratio p50/SQL", `goal ≤ ${GOAL_RATIO}×`, "seq scans, no index", "seq scans, planner's pick"];
  const lines = rows.map((m) => {
    const ratio = m.loaded.p50 / m.sqlMs;
    const growing = m.statements.flatMap((s) => s.seqScans.filter((t) => GROWING_TABLES.has(t)));
    const unindexed = [...new Set(m.statements.flatMap((s) => s.unindexed))];
    const picked = [...new Set(growing.filter((t) => !unindexed.includes(t)))];
    return [m.page.name, m.single.p50.toFixed(1), m.loaded.p50.toFixed(1), m.loaded.p95.toFixed(1), m.sqlMs.toFixed(2), ratio.toFixed(1), ratio <= GOAL_RATIO ? "met" : "NOT met", unindexed.join(", ") || "none", picked.join(", ") || "none"];
  });
  lines.push(["floor: GET /api/me signed in", floor.single.p50.toFixed(1), floor.loaded.p50.toFixed(1), floor.loaded.p95.toFixed(1), "", "", "", "", ""]);
  const widths = head.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i].length)));
  const fmt = (cells: string[]) => "  " + cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join("  ");
  console.log(`\n${fmt(head)}\n${fmt(widths.map((w) => "-".repeat(w)))}\n${lines.map(fmt).join("\n")}`);
  return rows.every((m) => m.loaded.p50 <= GOAL_RATIO * m.sqlMs && m.loaded.non2xx === 0 && m.statements.every((s) => s.unindexed.length === 0));
}

async function main() {
  if (!process.env.DATABASE_URL) throw new Error("DATABASE_URL must name the PostgreSQL server to create the throw-away database on");
  const reuse = process.env.BENCH_DB;
  const name = reuse ?? `axisline_bench_${randomBytes(4).toString("hex")}`;
  if (!/^axisline_bench_[a-z0-9_]+$/.test(name)) throw new Error(`BENCH_DB must be a database this bench made (axisline_bench_…), not ${name}`);
  const adminUrl = databaseUrl("postgres");
  const url = databaseUrl(name);
  const logDir = process.env.LOG_DIR ?? path.join(ROOT, ".data/logs");
  mkdirSync(logDir, { recursive: true });
  log(`load average ${loadAverage()} (1, 5, 15 min); database ${name}`);
  if (!reuse) await withClient(adminUrl, (c) => c.query(`create database ${name}`));
  let app: AppProcess | undefined;
  const pool = new Pool({ connectionString: url, max: 2 });
  try {
    await runMigrations(url);
    let started = Date.now();
    const scale = DEFAULT_SCALE;
    if (!reuse) await withClient(url, (c) => seedSchool(c, scale, log));
    else await withClient(url, (c) => c.query("analyze"));
    log(`${reuse ? "reused" : "seeded"} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    const [{ id: classId, course_slug: courseSlug }] = (
      await pool.query(`select c.id, c.course_slug from classes c join class_members m on m.class_id = c.id join users u on u.id = m.user_id where u.email = $1 order by c.name limit 1`, [emailOf("instructor", 1)])
    ).rows;
    const bankId = (await listCourseBanks(courseSlug)).find((b) => b.moduleTitle === null)!.bankId;
    started = Date.now();
    app = await startApp(ROOT, url, path.join(logDir, "bench-dashboards-app.log"));
    log(`app from ${process.env.NEXT_DIST_DIR ?? ".next"} at ${app.baseUrl} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    const cookies = {
      instructor: await signIn(app.baseUrl, emailOf("instructor", 1), BENCH_PASSWORD),
      apprentice: await signIn(app.baseUrl, emailOf("apprentice", 1), BENCH_PASSWORD),
      admin: await signIn(app.baseUrl, ADMIN_EMAIL, BENCH_PASSWORD),
    };
    const sizes = await pool.query(`select relname, reltuples::bigint as n from pg_class where relkind = 'r' and relname = any($1) order by relname`, [[...GROWING_TABLES]]);
    log(`rows: ${sizes.rows.map((r) => `${r.relname} ${r.n}`).join(", ")}`);
    const measured: Measured[] = [];
    await withClient(url, async (client) => {
      for (const page of await pagesFor(classId, bankId)) {
        const m = await measure(app!, page, cookies[page.role], pool, client);
        report(m);
        measured.push(m);
      }
    });
    // The floor of any signed-in route on this server, same run: cookie decode and the viewer's one query.
    await loadGet(app.baseUrl, "/api/me", cookies.instructor, CONNECTIONS, 2);
    const floor = { single: await loadGet(app.baseUrl, "/api/me", cookies.instructor, 1, Math.max(3, SECONDS / 2)), loaded: await loadGet(app.baseUrl, "/api/me", cookies.instructor, CONNECTIONS, SECONDS) };
    log(`${CONNECTIONS} connections, ${SECONDS} s per page; SQL = planning + execution under EXPLAIN ANALYZE, median of ${EXPLAIN_RUNS}; load average ${loadAverage()}`);
    if (!table(measured, floor)) process.exitCode = 1;
  } finally {
    await app?.stop();
    await pool.end();
    if (process.env.BENCH_KEEP_DB === "1") log(`kept database ${name} (BENCH_DB=${name} reuses it)`);
    else await withClient(adminUrl, (c) => c.query(`drop database if exists ${name} with (force)`));
  }
}

main().catch((err) => {
  console.error(`[bench:dashboards] failed: ${err instanceof Error ? err.message : err}`);
  process.exitCode = 1;
});
