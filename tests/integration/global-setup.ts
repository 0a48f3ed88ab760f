// Applies the committed migrations to the fresh test database (scripts/test.sh creates it empty).
import { runMigrations } from "../../db/migrate";

export default async function setup() {
  const url = process.env.DATABASE_URL;
  if (!url || !/axisline_test/.test(url)) {
    throw new Error("Integration tests need DATABASE_URL pointing at the throw-away axisline_test database: run them through `npm test`.");
  }
  await runMigrations(url);
}
