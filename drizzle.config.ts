import { defineConfig } from "drizzle-kit";

// Migrations are generated (`npm run db:generate`) and committed; db/migrate.ts applies them.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema/index.ts",
  out: "./db/migrations",
  strict: true,
});
