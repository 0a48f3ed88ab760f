// The arrows of STYLE.md, as ESLint enforces them (eslint.config.mjs, no-restricted-imports scoped
// with files: blocks): each case lints a one-line file at a path in the tree with the project's
// own configuration, so a weakened rule fails here.
import { ESLint } from "eslint";
import { beforeAll, describe, expect, it } from "vitest";

const eslint = new ESLint({ cwd: process.cwd() });

async function restrictedImports(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(`${code}\nexport const used = x;\n`, { filePath });
  return result.messages.filter((m) => m.ruleId === "no-restricted-imports").map((m) => m.message);
}

const CASES: [string, string, string, boolean][] = [
  // [why, file, import line, flagged?]
  ["a page importing the database client", "app/(site)/example/page.tsx", 'import { db as x } from "@/db/client";', true],
  ["a route handler importing the schema", "app/api/example/route.ts", 'import { users as x } from "@/db/schema";', true],
  ["a route handler building its own query", "app/api/example/route.ts", 'import { sql as x } from "drizzle-orm";', true],
  ["a page reaching db/ by a relative path", "app/(site)/example/page.tsx", 'import { db as x } from "../../../db/connection";', true],
  ["a page calling the data-access layer", "app/(site)/example/page.tsx", 'import { listUsers as x } from "@/lib/server/users";', false],
  ["a component importing a lib/server type", "components/home/example.tsx", 'import type { UserDto as x } from "@/lib/server/users";', true],
  ["a component importing the database", "components/home/example.tsx", 'import { db as x } from "@/db/client";', true],
  ["a component importing a DTO type from lib/dto", "components/home/example.tsx", 'import type { ClassSummaryDto as x } from "@/lib/dto/classes";', false],
  ["lib/ importing a component", "lib/content/example.ts", 'import { MDX_COMPONENTS as x } from "@/components/mdx/registry";', true],
  ["lib/server importing a component by a relative path", "lib/server/example.ts", 'import { Button as x } from "../../components/ui/button";', true],
  ["lib/server importing the database client", "lib/server/example.ts", 'import { db as x } from "@/db/client";', false],
  ["a client-safe DTO module importing lib/server", "lib/dto/example.ts", 'import type { Viewer as x } from "@/lib/server/viewer";', true],
  ["the browser's remote-data helper importing db/", "lib/client/example.ts", 'import { db as x } from "@/db/connection";', true],
  ["the UI barrel, anywhere", "components/home/example.tsx", 'import { Button as x } from "@/components/ui";', true],
];

describe("ESLint keeps the layers apart", () => {
  // The first lint loads the configuration and the TypeScript parser: seconds, once.
  beforeAll(() => eslint.lintText("", { filePath: "lib/warm-up.ts" }), 60_000);

  it.each(CASES)("%s (%s)", async (_why, file, line, flagged) => {
    const messages = await restrictedImports(file, line);
    if (flagged) expect(messages).toHaveLength(1);
    else expect(messages).toEqual([]);
  });
});
