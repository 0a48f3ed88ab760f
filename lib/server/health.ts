import "server-only";
// GET /api/health: the load balancer's and the start script's question "can this process serve?".
// Public and viewer-free; it says only whether the database answers, never why not.
import { sql } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import type { Result } from "./errors";
import { unavailable } from "./unavailable";

export type HealthDto = { database: "up"; ms: number };

export async function checkHealth(database: Queryable = db()): Promise<Result<HealthDto>> {
  const started = performance.now();
  try {
    await database.execute(sql`select 1`);
  } catch (err) {
    // The operator needs the cause in the log; the caller gets only the sentence.
    console.error("[health] database check failed:", err instanceof Error ? err.message : String(err));
    return unavailable();
  }
  return { ok: true, database: "up", ms: Math.round(performance.now() - started) };
}
