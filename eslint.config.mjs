// Flat config (Next 16 has no `next lint`): Next's core-web-vitals + TypeScript rules.
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

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
      "no-restricted-imports": ["error", { paths: [{ name: "@/components/ui", message: "Import from @/components/ui/<file> instead (keeps client bundles small)." }] }],
    },
  },
];
export default config;
