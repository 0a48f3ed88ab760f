// Applies the committed SQL migrations (never `push`). An advisory lock makes two
// concurrent runs wait for each other instead of colliding.
import path from "node:path";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Client } from "pg";
import { databaseSettings } from "../lib/env";

const MIGRATION_LOCK_KEY = 72_617_001; // arbitrary, fixed: Axisline's migration lock

export async function runMigrations(databaseUrl: string): Promise<void> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await client.query("select pg_advisory_lock($1)", [MIGRATION_LOCK_KEY]);
    await migrate(drizzle(client), { migrationsFolder: path.join(import.meta.dirname, "migrations") });
  } finally {
    await client.query("select pg_advisory_unlock($1)", [MIGRATION_LOCK_KEY]).catch(() => undefined);
    await client.end();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  let url: string;
  try {
    url = databaseSettings().DATABASE_URL;
  } catch (err) {
    console.error(err instanceof Error ? err.message : err, "\nCopy .env.example to .env or run the demo command.");
    process.exit(1);
  }
  const started = Date.now();
  runMigrations(url)
    .then(() => console.log(`[migrate] up to date (${Date.now() - started} ms)`))
    .catch((err) => {
      console.error("[migrate] failed:", err.message);
      process.exit(1);
    });
}
