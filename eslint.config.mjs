// Flat config (Next 16 has no `next lint`): Next's core-web-vitals + TypeScript rules, and the
// layering of STYLE.md ("arrows point one way"), enforced with no-restricted-imports.
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// Each restriction matches @/ aliases and relative paths alike. Type-only imports count too: a
// type is how a module's shape leaks across a boundary (STYLE.md habit 18).
const UI_BARREL = { name: "@/components/ui", message: "Import from @/components/ui/<file> instead (keeps client bundles small)." };
const DB = {
  regex: "^(@/|(\\.\\./)+|\\./)db(/.*)?$|^drizzle-orm(/.*)?$|^pg$",
  message: "app/ and components/ never touch the database: call a data-access function of lib/server (it takes the viewer and returns a DTO).",
};
const LIB_SERVER = {
  regex: "^(@/|(\\.\\./)+)lib/server(/.*)?$",
  message: "components/ never imports lib/server, even for types: put the DTO type in lib/dto/ and have the page pass the data in.",
};
const COMPONENTS = {
  regex: "^(@/|(\\.\\./)+)components(/.*)?$",
  message: "lib/ never imports components/: take what you need as a parameter from the page that calls you.",
};
const CLIENT_SAFE = {
  regex: "^(@/|(\\.\\./)+)(lib/server|db)(/.*)?$|^server-only$",
  message: "This folder is client-safe (it reaches the browser): no lib/server, no db/.",
};

const restrict = (...patterns) => ["error", { paths: [UI_BARREL], patterns }];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: [".next/**", ".next-*/**", "node_modules/**", ".data/**", "test-results/**", "playwright-report/**", "next-env.d.ts", "db/migrations/**"],
  },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      // The barrel re-exports client components (dialog, tabs, toast); importing it pulls them
      // into every page's bundle. Import each primitive from its own file.
      "no-restricted-imports": restrict(),
    },
  },
  // Later blocks replace the rule's options for their files, so each repeats what still applies.
  { files: ["app/**"], rules: { "no-restricted-imports": restrict(DB) } },
  { files: ["components/**"], rules: { "no-restricted-imports": restrict(DB, LIB_SERVER) } },
  { files: ["lib/**"], rules: { "no-restricted-imports": restrict(COMPONENTS) } },
  { files: ["lib/dto/**", "lib/client/**", "lib/acoustics/**", "lib/assessment/**", "lib/validation/**", "lib/design/**", "lib/pricing/**"], rules: { "no-restricted-imports": restrict(COMPONENTS, CLIENT_SAFE) } },
];
export default config;
