// The SQL a page issues, captured and timed. The bench calls the same lib/server functions the
// page calls, with a database whose Drizzle logger records every statement and its parameters
// (the exact text the app sends), then runs each under EXPLAIN (ANALYZE, BUFFERS) inside a
// transaction that is rolled back: its plan once, and its time (median of runs) with its rows
// converted to text, as sending them needs. pg_stat_statements would need a preload library; this needs nothing.
import { drizzle } from "drizzle-orm/node-postgres";
import type { Client, Pool } from "pg";
import { schema, type Database } from "../../db/connection";

export type Statement = { sql: string; params: unknown[] };
export type PlanFacts = { seqScans: string[]; indexes: string[]; rows: number };
/**
 * `ms`: planning + execution. `unindexed`: growing tables still read by a Seq Scan when the planner
 * is told to avoid them (enable_seqscan off), i.e. no index serves the query: a missing index.
 * The other Seq Scans on growing tables are the planner's pick for a table this small (an index is there).
 */
export type TimedStatement = Statement & PlanFacts & { ms: number; unindexed: string[] };

/** Tables whose rows grow with the school: a Seq Scan on one of them is a finding. */
export const GROWING_TABLES = new Set([
  "users",
  "sessions",
  "school_members",
  "class_members",
  "enrollments",
  "lesson_progress",
  "quiz_attempts",
  "quiz_answers",
  "quiz_time_extensions",
  "class_invitations",
  "rate_limit_events",
  "auth_tokens",
]);

/** A database whose every statement is appended to `into`. */
export function recordingDb(pool: Pool, into: Statement[]): Database {
  return drizzle(pool, { schema, logger: { logQuery: (query, params) => void into.push({ sql: query, params }) } }) as unknown as Database;
}

/** Runs `work` against a recording database and returns what it sent. */
export async function capture(pool: Pool, work: (database: Database) => Promise<unknown>): Promise<Statement[]> {
  const statements: Statement[] = [];
  await work(recordingDb(pool, statements));
  return statements;
}

type PlanNode = { "Node Type": string; "Relation Name"?: string; "Index Name"?: string; "Actual Rows"?: number; Plans?: PlanNode[] };

function planFacts(root: PlanNode): PlanFacts {
  const seqScans: string[] = [];
  const indexes = new Set<string>();
  const walk = (node: PlanNode) => {
    if (node["Node Type"] === "Seq Scan" && node["Relation Name"]) seqScans.push(node["Relation Name"]);
    if (node["Index Name"]) indexes.add(node["Index Name"]);
    node.Plans?.forEach(walk);
  };
  walk(root);
  return { seqScans, indexes: [...indexes], rows: root["Actual Rows"] ?? 0 };
}

/** Planning + execution time of one statement (ms), median of `runs`, and what its plan touched. */
export async function explain(client: Client, statement: Statement, runs: number): Promise<TimedStatement> {
  const times: number[] = [];
  let facts: PlanFacts = { seqScans: [], indexes: [], rows: 0 };
  let unindexed: string[] = [];
  await client.query("begin");
  try {
    const { rows } = await client.query(`explain (analyze, buffers, format json) ${statement.sql}`, statement.params);
    facts = planFacts((rows[0]["QUERY PLAN"] as { Plan: PlanNode }[])[0].Plan);
    // EXPLAIN ANALYZE neither detoasts nor converts the rows it would send (PostgreSQL 15 has no
    // SERIALIZE option), so a select is timed with every row turned into text, as the wire needs.
    const timed = /^\s*select\b/i.test(statement.sql) ? `select count(*), sum(octet_length(sent::text)) from (${statement.sql}) sent` : statement.sql;
    for (let i = 0; i < runs; i++) {
      const { rows } = await client.query(`explain (analyze, format json) ${timed}`, statement.params);
      const [plan] = rows[0]["QUERY PLAN"] as { "Planning Time": number; "Execution Time": number }[];
      times.push(plan["Planning Time"] + plan["Execution Time"]);
    }
    if (facts.seqScans.some((t) => GROWING_TABLES.has(t))) {
      await client.query("set local enable_seqscan = off");
      const { rows } = await client.query(`explain (format json) ${statement.sql}`, statement.params);
      unindexed = planFacts((rows[0]["QUERY PLAN"] as { Plan: PlanNode }[])[0].Plan).seqScans.filter((t) => GROWING_TABLES.has(t));
    }
  } finally {
    await client.query("rollback");
  }
  times.sort((a, b) => a - b);
  return { ...statement, ...facts, ms: times[Math.floor(times.length / 2)], unindexed };
}

/** One line of SQL for a report: whitespace squeezed, cut at `width`. */
export function shortSql(text: string, width = 110): string {
  const flat = text.replace(/\s+/g, " ").trim();
  return flat.length > width ? `${flat.slice(0, width - 1)}…` : flat;
}
