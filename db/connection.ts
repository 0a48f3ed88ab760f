// The database connection for every process: the Next.js server (through db/client.ts), the
// scripts (seed, migrate, mail worker, benchmarks) and the tests. It has no `import "server-only"`
// so scripts and tests can load it without the react-server condition; app code reaches the
// database only through lib/server, which imports db/client.ts (server-only) instead.
import { drizzle, type NodePgDatabase, type NodePgQueryResultHKT } from "drizzle-orm/node-postgres";
import type { PgDatabase } from "drizzle-orm/pg-core";
import { Pool } from "pg";
import { databaseSettings } from "../lib/env";
import * as schema from "./schema";

/** The process's database (one pool). */
export type Database = NodePgDatabase<typeof schema>;

/** The database or a transaction on it: what a data-access function accepts as its optional last parameter. */
export type Queryable = PgDatabase<NodePgQueryResultHKT, typeof schema>;

type Cache = { pool?: Pool; db?: Database };
// One pool per process; cached on globalThis so dev hot reloads don't open a new pool each time.
const cache = globalThis as unknown as { __axislineDb?: Cache };

export function pool(): Pool {
  const c = (cache.__axislineDb ??= {});
  if (!c.pool) {
    const { DATABASE_URL, PG_POOL_MAX } = databaseSettings();
    c.pool = new Pool({ connectionString: DATABASE_URL, max: PG_POOL_MAX });
    // A dropped connection emits 'error' on an idle client; without a listener it would crash the process.
    c.pool.on("error", (err) => console.error("[db] idle client error:", err.message));
  }
  return c.pool;
}

export function db(): Database {
  const c = (cache.__axislineDb ??= {});
  c.db ??= drizzle(pool(), { schema });
  return c.db;
}

export async function closeDb(): Promise<void> {
  const c = cache.__axislineDb;
  if (c?.pool) await c.pool.end();
  if (c) {
    c.pool = undefined;
    c.db = undefined;
  }
}

export { schema };
