import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { A, PROXY, context, rawGet } from "./cluster";

// Last of the cluster tests (files run in name order on one worker): instance A is stopped and
// stays stopped; scripts/test.sh's cleanup handles the rest.

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

test("with instance A stopped, requests through nginx still succeed via B", async () => {
  const pidFile = process.env.CLUSTER_A_PIDFILE;
  test.skip(!pidFile, "CLUSTER_A_PIDFILE is set by scripts/test.sh");
  const pid = Number(readFileSync(pidFile!, "utf8").trim());
  expect(alive(pid)).toBe(true);
  process.kill(pid, "SIGTERM");
  for (let i = 0; i < 100 && alive(pid); i++) await new Promise((r) => setTimeout(r, 100));
  expect(alive(pid)).toBe(false);
  await expect(rawGet(`${A}/api/health`)).rejects.toThrow(/ECONNREFUSED/);

  // Round robin would send every other request to A: each is passed on to B instead.
  for (let i = 0; i < 8; i++) {
    const health = await rawGet(`${PROXY}/api/health`);
    expect(health.status, `request ${i + 1}`).toBe(200);
    expect(JSON.parse(health.body.toString()).ok).toBe(true);
  }
  expect((await rawGet(`${PROXY}/courses`)).status).toBe(200);
  // A POST is answered by B too (never sent to A, whose port refuses): here a validation answer.
  const api = await context(PROXY);
  const post = await api.post("/api/account/sign-in", { data: { email: "not an address" } });
  expect(post.status()).toBe(400);
  expect((await post.json()).ok).toBe(false);
});
