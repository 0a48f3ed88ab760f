// scripts/lib.sh's load_env_file, run by bash exactly as the start scripts run it (set -euo pipefail).
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";

const lib = path.resolve(import.meta.dirname, "../../../scripts/lib.sh");

function loadEnv(fileText: string, env: Record<string, string>, print: string) {
  const dir = mkdtempSync(path.join(tmpdir(), "axisline-env-"));
  const file = path.join(dir, ".env");
  writeFileSync(file, fileText);
  const script = `set -euo pipefail; RUN_DIR=${dir}/run LOG_DIR=${dir}/logs source "${lib}"; load_env_file "${file}"; echo "ok $${print}"`;
  return execFileSync("bash", ["-c", script], { env: { ...env, NODE_ENV: "test", PATH: process.env.PATH ?? "/usr/bin:/bin" }, encoding: "utf8" }).trim();
}

describe("load_env_file", () => {
  it("exports what the file sets and keeps variables the environment already has", () => {
    expect(loadEnv("# comment\nA=from-file\nB=\"quoted\"\n", { A: "from-env" }, "A-$B")).toBe("ok from-env-quoted");
  });

  it("does not fail a `set -e` caller when the file's last variable is already set", () => {
    // The start command runs under the demo command with every variable already exported.
    expect(loadEnv("A=1\nLAST=2\n", { LAST: "already" }, "LAST")).toBe("ok already");
  });
});
