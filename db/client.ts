import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;

type Cache = { pool?: Pool; db?: Database };
// One pool per process; cached on globalThis so dev hot reloads don't open a new pool each time.
const cache = globalThis as unknown as { __axislineDb?: Cache };

export function pool(): Pool {
  const c = (cache.__axislineDb ??= {});
  if (!c.pool) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    c.pool = new Pool({ connectionString: url, max: Number(process.env.PG_POOL_MAX ?? 10) });
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
