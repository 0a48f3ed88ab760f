import { createServer, request, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { EDGE_HEADERS } from "@/lib/net/client-address";
import { applyEdgeHeaders, edgeHeaders } from "@/lib/net/edge-headers";

// What scripts/serve.ts writes before Next.js reads a request. Chain semantics as in
// client-address.test.ts (MDN "X-Forwarded-For", trusted proxy count; RFC 7239 §8.1).

describe("edgeHeaders (pure)", () => {
  it("at 0 hops a client-sent X-Forwarded-For is ignored: the socket address is the client", () => {
    expect(edgeHeaders({ "x-forwarded-for": "203.0.113.9" }, "127.0.0.1", 0)).toEqual({
      "x-forwarded-for": "127.0.0.1",
      "x-axisline-peer": "127.0.0.1",
      "x-axisline-forwarded": "1",
    });
  });

  it("at 1 hop only the entry the trusted proxy added is used", () => {
    expect(edgeHeaders({ "x-forwarded-for": "1.2.3.4, 203.0.113.9" }, "::ffff:127.0.0.1", 1)).toEqual({
      "x-forwarded-for": "203.0.113.9",
      "x-axisline-peer": "127.0.0.1",
      "x-axisline-forwarded": "1",
    });
  });

  it("a direct request with no forwarding header is marked so, and client-sent edge headers play no part", () => {
    const values = edgeHeaders({ "x-axisline-peer": "10.9.9.9", "x-axisline-forwarded": "1" }, "127.0.0.1", 1);
    expect(values).toEqual({ "x-forwarded-for": "127.0.0.1", "x-axisline-peer": "127.0.0.1", "x-axisline-forwarded": "0" });
  });

  it("repeated X-Forwarded-For lines count as one list, in order", () => {
    expect(edgeHeaders({ "x-forwarded-for": ["1.2.3.4", "203.0.113.9"] }, "127.0.0.1", 1)["x-forwarded-for"]).toBe("203.0.113.9");
  });
});

describe("applyEdgeHeaders on a real node:http server", () => {
  // The same call serve.ts makes, in front of a handler that echoes what it was handed.
  const servers: Record<number, { server: Server; port: number }> = {};
  const startEcho = (hops: number) =>
    new Promise<void>((resolve) => {
      const server = createServer((req, res) => {
        applyEdgeHeaders(req, hops);
        res.setHeader("content-type", "application/json");
        res.end(JSON.stringify(Object.fromEntries(Object.values(EDGE_HEADERS).map((h) => [h, req.headers[h]]))));
      });
      server.listen(0, "127.0.0.1", () => {
        servers[hops] = { server, port: (server.address() as AddressInfo).port };
        resolve();
      });
    });

  function get(hops: number, headers: Record<string, string | string[]>): Promise<Record<string, string>> {
    return new Promise((resolve, reject) => {
      const req = request({ host: "127.0.0.1", port: servers[hops].port, path: "/", headers }, (res) => {
        let body = "";
        res.on("data", (chunk: Buffer) => (body += chunk));
        res.on("end", () => resolve(JSON.parse(body)));
      });
      req.on("error", reject);
      req.end();
    });
  }

  beforeAll(async () => {
    await startEcho(0);
    await startEcho(1);
  });
  afterAll(() => Promise.all(Object.values(servers).map(({ server }) => new Promise((r) => server.close(r)))));

  it("at 0 hops, whatever the client claims, the handler sees the socket address", async () => {
    const seen = await get(0, { "x-forwarded-for": "203.0.113.9", "x-axisline-peer": "10.9.9.9", "x-axisline-forwarded": "0" });
    expect(seen).toEqual({ "x-forwarded-for": "127.0.0.1", "x-axisline-peer": "127.0.0.1", "x-axisline-forwarded": "1" });
  });

  it("at 1 hop, only the entry the trusted proxy appended is used, even with repeated header lines", async () => {
    expect((await get(1, { "x-forwarded-for": "1.2.3.4, 203.0.113.9" }))["x-forwarded-for"]).toBe("203.0.113.9");
    expect((await get(1, { "x-forwarded-for": ["1.2.3.4", "198.51.100.7"] }))["x-forwarded-for"]).toBe("198.51.100.7");
  });

  it("at 1 hop a request that came straight to the process is its socket address, marked not forwarded", async () => {
    expect(await get(1, {})).toEqual({ "x-forwarded-for": "127.0.0.1", "x-axisline-peer": "127.0.0.1", "x-axisline-forwarded": "0" });
  });
});
