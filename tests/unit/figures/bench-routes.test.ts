// Every registered figure has its own Bench route file (app/(site)/bench/<name>/page.tsx), and
// that file renders its own figure: one route per tool keeps each Bench page's code to its figure.
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { FIGURE_NAMES } from "@/components/figures/figure-names";

const BENCH_DIR = path.resolve(import.meta.dirname, "../../../app/(site)/bench");

describe("Bench routes", () => {
  it.each(FIGURE_NAMES)("/bench/%s has a route file that renders its tool", (name) => {
    const file = path.join(BENCH_DIR, name, "page.tsx");
    expect(existsSync(file)).toBe(true);
    const source = readFileSync(file, "utf8");
    expect(source).toContain(`tool="${name}"`);
    expect(source).toContain(`benchToolMetadata("${name}")`);
  });

  it("has no route folder for a figure that is not registered", () => {
    const routes = readdirSync(BENCH_DIR, { withFileTypes: true }).filter((d) => d.isDirectory() && !d.name.startsWith("_"));
    expect(routes.map((d) => d.name).sort()).toEqual([...FIGURE_NAMES].sort());
  });
});
