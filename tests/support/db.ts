// A short-lived connection to the test database for HTTP-level tests (e2e, security, cluster),
// which look at what a request left behind. DATABASE_URL is the throw-away database of npm test.
import pg from "pg";

export async function withDb<T>(fn: (c: pg.Client) => Promise<T>): Promise<T> {
  const c = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  try {
    return await fn(c);
  } finally {
    await c.end();
  }
}
