import { spawn, type ChildProcess } from "node:child_process";
import { existsSync } from "node:fs";
import { createServer, type Server } from "node:http";
import path from "node:path";
import { gunzipSync } from "node:zlib";
import { expect, test } from "@playwright/test";
import { BROTLI_MODULE, writeProxyFolder, workerAccount } from "../../scripts/nginx/render-config";
import { A, PROXY, context, freePort, newVerifiedAccount, rawGet, sessionCookieOf } from "./cluster";

// What nginx keeps: statically generated pages, as Next.js's Cache-Control allows, compressed on
// the way out; never anything signed-in, private or setting a cookie.

const LESSON = "/courses/how-microphones-hear/les-mic-moving-coil";
const GZIP = { "accept-encoding": "gzip" };

test("a statically generated lesson is a MISS, then a HIT; gunzipped it is byte-identical to what instance A sends", async () => {
  // A query of its own gives a cache key no earlier request used (the page ignores it).
  const url = `${PROXY}${LESSON}?probe=${Date.now().toString(36)}`;
  const first = await rawGet(url, GZIP);
  expect(first.status).toBe(200);
  expect(first.headers["x-cache-status"]).toBe("MISS");
  expect(first.headers["cache-control"]).toMatch(/s-maxage=\d+/);
  const second = await rawGet(url, GZIP);
  expect(second.headers["x-cache-status"]).toBe("HIT");
  expect(second.headers["content-encoding"]).toBe("gzip");

  // Instance A runs with COMPRESSION_BY_PROXY=true: it never compresses, whatever the client accepts.
  const direct = await rawGet(`${A}${LESSON}`, { ...GZIP, "x-forwarded-for": "192.0.2.1" });
  expect(direct.status).toBe(200);
  expect(direct.headers["content-encoding"]).toBeUndefined();
  expect(gunzipSync(second.body).equals(direct.body)).toBe(true);
  expect(gunzipSync(first.body).equals(direct.body)).toBe(true);
  expect(second.body.length).toBeLessThan(direct.body.length / 3);
});

test("brotli is offered when nginx has the module", async () => {
  test.skip(!existsSync(BROTLI_MODULE), "nginx's brotli filter is not installed here: gzip only");
  const res = await rawGet(`${PROXY}${LESSON}`, { "accept-encoding": "br, gzip" });
  expect(res.headers["content-encoding"]).toBe("br");
});

test("signed-in responses are never cached: /api/me and a dynamic page stay MISS with the viewer's own answer", async () => {
  const { email, password } = await newVerifiedAccount();
  const signIn = await context(PROXY);
  const res = await signIn.post("/api/account/sign-in", { data: { email, password } });
  expect(res.status()).toBe(200);
  expect(res.headers()["set-cookie"]).toBeTruthy();
  expect(res.headers()["x-cache-status"] ?? "").not.toBe("HIT");
  const cookie = await sessionCookieOf(signIn);

  for (let i = 0; i < 3; i++) {
    const me = await rawGet(`${PROXY}/api/me`, { cookie });
    expect(me.headers["x-cache-status"]).not.toBe("HIT");
    expect(me.headers["cache-control"]).toMatch(/private|no-store/);
    expect(JSON.parse(me.body.toString()).me.email).toBe(email);
    const page = await rawGet(`${PROXY}/account`, { cookie });
    expect(page.status).toBe(200);
    expect(page.headers["x-cache-status"]).not.toBe("HIT");
  }
  // Someone else (signed out) right after gets their own answer, not the cached one.
  expect(JSON.parse((await rawGet(`${PROXY}/api/me`)).body.toString()).me).toBeNull();
});

test.describe("the cache rules themselves, on the same template in front of a stand-in upstream", () => {
  // The app sends no cacheable response with a cookie today; this proves the rule for the day one
  // does: a response with Set-Cookie or private / no-store is never stored, whatever else it says.
  let upstream: Server;
  let nginx: ChildProcess;
  let base = "";

  test.beforeAll(async () => {
    upstream = createServer((req, res) => {
      const headers: Record<string, string> = { "content-type": "text/plain" };
      if (req.url?.startsWith("/public")) headers["cache-control"] = "s-maxage=600, stale-while-revalidate=60";
      if (req.url?.startsWith("/with-cookie")) Object.assign(headers, { "cache-control": "s-maxage=600", "set-cookie": "crumb=1; Path=/; HttpOnly" });
      if (req.url?.startsWith("/private")) headers["cache-control"] = "private, s-maxage=600";
      if (req.url?.startsWith("/no-store")) headers["cache-control"] = "no-store, s-maxage=600";
      res.writeHead(200, headers);
      res.end(`answer ${Math.random()}`);
    });
    const upstreamPort = await freePort();
    await new Promise<void>((r) => upstream.listen(upstreamPort, "127.0.0.1", r));
    const port = await freePort();
    const dir = path.resolve("test-results", `nginx-rules-${port}`);
    const conf = writeProxyFolder({ dir, listen: `127.0.0.1:${port}`, upstreams: [`127.0.0.1:${upstreamPort}`], buildId: "rules", user: workerAccount(), brotli: existsSync(BROTLI_MODULE) });
    const bin = ["/usr/sbin/nginx", "/usr/bin/nginx"].find((b) => existsSync(b)) ?? "nginx";
    nginx = spawn(bin, ["-c", conf, "-p", dir, "-e", path.join(dir, "logs", "error.log")], { stdio: "inherit" });
    base = `http://127.0.0.1:${port}`;
    for (let i = 0; i < 50; i++) {
      if ((await rawGet(`${base}/public/ready`).catch(() => null))?.status === 200) return;
      await new Promise((r) => setTimeout(r, 100));
    }
    throw new Error("the stand-in nginx did not answer");
  });

  test.afterAll(async () => {
    nginx?.kill("SIGTERM");
    await new Promise((r) => upstream?.close(r));
  });

  test("public s-maxage is stored (control); with Set-Cookie, private or no-store it never is", async () => {
    const statuses = async (p: string) => {
      const out: string[] = [];
      for (let i = 0; i < 3; i++) out.push(String((await rawGet(`${base}${p}`)).headers["x-cache-status"]));
      return out;
    };
    expect(await statuses("/public/page")).toEqual(["MISS", "HIT", "HIT"]);
    for (const p of ["/with-cookie/page", "/private/page", "/no-store/page"]) expect(await statuses(p), p).not.toContain("HIT");
  });
});
