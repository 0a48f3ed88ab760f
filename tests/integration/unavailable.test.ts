// A database that can't be reached is answered 503 + Retry-After with a sentence; a bug still
// throws. Errors come from the real driver (node-postgres) against a real server, not mocks.
// SQLSTATEs: PostgreSQL 15 manual, Appendix A (57P01 admin_shutdown; class 42 syntax errors).
import { afterAll, describe, expect, it } from "vitest";
import { Client, Pool } from "pg";
import { drizzle } from "drizzle-orm/node-postgres";
import { sql } from "drizzle-orm";
import { closeDb } from "@/db/client";
import { handleRoute, isDatabaseUnavailable } from "@/lib/server/unavailable";
import { testDb } from "./helpers";

afterAll(async () => {
  await closeDb();
});

async function errorOf(run: () => Promise<unknown>): Promise<unknown> {
  try {
    await run();
  } catch (err) {
    return err;
  }
  throw new Error("expected an error");
}

describe("database unavailable", () => {
  it("a refused connection, through drizzle's wrapping, is 'unavailable'", async () => {
    const pool = new Pool({ connectionString: "postgres://nobody:x@127.0.0.1:1/none", connectionTimeoutMillis: 2000 });
    pool.on("error", () => {});
    const err = await errorOf(() => drizzle(pool).execute(sql`select 1`));
    await pool.end();
    expect(isDatabaseUnavailable(err)).toBe(true);
  });

  it("a backend terminated by the server (57P01) is 'unavailable'", async () => {
    const victim = new Client({ connectionString: process.env.DATABASE_URL });
    victim.on("error", () => {});
    await victim.connect();
    const { rows } = await victim.query("select pg_backend_pid() as pid");
    await testDb().execute(sql`select pg_terminate_backend(${rows[0].pid})`);
    const err = await errorOf(() => victim.query("select 1"));
    await victim.end().catch(() => {});
    expect(isDatabaseUnavailable(err)).toBe(true);
  });

  it("a bug (bad SQL) is not", async () => {
    const err = await errorOf(() => testDb().execute(sql`selec 1`));
    expect(isDatabaseUnavailable(err)).toBe(false);
  });

  it("a route answers 503 with Retry-After and a sentence, and still throws a bug", async () => {
    const pool = new Pool({ connectionString: "postgres://nobody:x@127.0.0.1:1/none", connectionTimeoutMillis: 2000 });
    pool.on("error", () => {});
    const down = handleRoute(async () => {
      await drizzle(pool).execute(sql`select 1`);
      return new Response("never");
    });
    const res = await down();
    await pool.end();
    expect(res.status).toBe(503);
    expect(res.headers.get("retry-after")).toBe("15");
    expect(await res.json()).toMatchObject({ ok: false, code: "unavailable", message: expect.stringMatching(/can't reach its database/) });

    const buggy = handleRoute(async () => {
      await testDb().execute(sql`selec 1`);
      return new Response("never");
    });
    await expect(buggy()).rejects.toThrow();
  });
});
