import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { JOBS } from "@/lib/jobs/registry";

const ROOT = path.resolve(import.meta.dirname, "../../..");

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return /\.(ts|tsx)$/.test(name) ? [full] : [];
  });
}

describe("the job registry", () => {
  it("names each queue once, in the characters pg-boss accepts", () => {
    const names = JOBS.map((j) => j.queue);
    expect(new Set(names).size).toBe(names.length);
    for (const n of names) expect(n).toMatch(/^[a-z][a-z0-9-]*$/);
  });

  it("schedules rate-limit pruning every 10 minutes and wakes mail delivery on due mail", () => {
    const byQueue = Object.fromEntries(JOBS.map((j) => [j.queue, j]));
    expect(byQueue["rate-limit-prune"].cron).toBe("*/10 * * * *");
    expect(byQueue["mail-delivery"].wake).toBeDefined();
    // pg-boss schedules are minute-grained; five fields, no seconds field.
    for (const j of JOBS.filter((x) => x.cron)) expect(j.cron!.trim().split(/\s+/)).toHaveLength(5);
  });

  it("keeps mail retries in the outbox, not in pg-boss, and at most one waiting delivery run", () => {
    const mail = JOBS.find((j) => j.queue === "mail-delivery")!;
    expect(mail).toMatchObject({ retryLimit: 0, policy: "stately" });
  });
});

describe("the web process does not need the worker", () => {
  it("no file under app/, components/ or lib/server imports pg-boss or lib/jobs", () => {
    const offenders = ["app", "components", "lib/server"]
      .flatMap((d) => sourceFiles(path.join(ROOT, d)))
      .filter((f) => /from\s+["'](pg-boss|@\/lib\/jobs[^"']*)["']/.test(readFileSync(f, "utf8")))
      .map((f) => path.relative(ROOT, f));
    expect(offenders).toEqual([]);
  });
});
