// A production app process for a benchmark: scripts/serve.ts from an existing `next build` (the
// folder NEXT_DIST_DIR, default .next), on a free loopback port, against the database it is given.
// It never builds: a build takes minutes and rewrites tsconfig.json, so the bench asks for one.
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, openSync } from "node:fs";
import { createServer } from "node:net";
import path from "node:path";

export type AppProcess = { baseUrl: string; child: ChildProcess; logFile: string; stop(): Promise<void> };

/** A port the OS just handed out on 127.0.0.1 (free at that moment). */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() => (typeof address === "object" && address ? resolve(address.port) : reject(new Error("no port"))));
    });
  });
}

export function requireBuild(root: string): string {
  const distDir = process.env.NEXT_DIST_DIR ?? ".next";
  if (!existsSync(path.join(root, distDir, "BUILD_ID"))) {
    throw new Error(`no production build in ${distDir}/ (NEXT_DIST_DIR): run \`NEXT_DIST_DIR=${distDir} npx next build\` first (then \`git checkout tsconfig.json\` if Next rewrote it)`);
  }
  return distDir;
}

async function waitHealthy(baseUrl: string, child: ChildProcess, logFile: string, seconds = 90): Promise<void> {
  const until = Date.now() + seconds * 1000;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`the app process exited (${child.exitCode}); see ${logFile}`);
    const res = await fetch(`${baseUrl}/api/health`).catch(() => null);
    if (res?.ok) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the app did not answer ${baseUrl}/api/health within ${seconds} s; see ${logFile}`);
}

/** Starts the app on its own port against `databaseUrl`; its output goes to `logFile`. */
export async function startApp(root: string, databaseUrl: string, logFile: string): Promise<AppProcess> {
  const distDir = requireBuild(root);
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const out = openSync(logFile, "a");
  const child = spawn(process.execPath, ["--import", "tsx", path.join(root, "scripts/serve.ts")], {
    cwd: root,
    env: { ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", PORT: String(port), DATABASE_URL: databaseUrl, NEXT_DIST_DIR: distDir, NEXTAUTH_URL: baseUrl, TRUST_PROXY_HOPS: "0" },
    stdio: ["ignore", out, out],
  });
  const stop = async () => {
    if (child.exitCode !== null) return;
    const exited = new Promise((r) => child.once("exit", r));
    child.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5_000))]);
    if (child.exitCode === null) child.kill("SIGKILL");
  };
  try {
    await waitHealthy(baseUrl, child, logFile);
  } catch (err) {
    await stop();
    throw err;
  }
  return { baseUrl, child, logFile, stop };
}

/** Signs in over HTTP as a user would; returns the session cookie ("name=value"). */
export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/account/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseUrl },
    body: JSON.stringify({ email, password }),
  });
  const cookie = res.headers.getSetCookie().map((c) => c.split(";")[0]).find((c) => c.includes("session-token"));
  if (res.status !== 200 || !cookie) throw new Error(`sign-in of ${email}: ${res.status} ${await res.text()}`);
  return cookie;
}
