// A local wire fake of the upload service (UploadThing v7) on loopback, for the demo and the
// tests: the same SDK code talks to it as to the hosted service. What it does and does not speak:
// docs/decisions/007-uploads-stand-in.md. Test controls live under /_fake/.
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { handleApi, handleCallbackResult, handleFile, handleRouteMetadata } from "./api";
import { CORS, handleHead, handlePut } from "./ingest";
import { readJson, sendJson, type FakeSettings, type FakeState } from "./state";
import { FileStore } from "./store";

export type UploadsFakeOptions = { port: number; host?: string; dir: string; apiKey: string; appId: string; settings?: Partial<FakeSettings> };
export type UploadsFake = { url: string; state: FakeState; close(): Promise<void> };

const PREFLIGHT = {
  ...CORS,
  "access-control-allow-methods": "PUT, HEAD, GET, OPTIONS",
  "access-control-allow-headers": "range, x-uploadthing-version, b3, traceparent, content-type",
  "access-control-max-age": "600",
};

export async function startUploadsFake(opts: UploadsFakeOptions): Promise<UploadsFake> {
  const store = new FileStore(opts.dir);
  await store.load();
  const state: FakeState = {
    apiKey: opts.apiKey,
    appId: opts.appId,
    store,
    registrations: new Map(),
    waiters: new Map(),
    settings: { dropCallbacks: 0, holdTimeoutMs: 60_000, callbackRetries: 2, ...opts.settings },
    deliveries: [],
  };
  const server = createServer((req, res) => {
    route(req, res, state).catch((err: Error) => {
      if (!res.headersSent) sendJson(res, 500, { error: `Stand-in error: ${err.message}` });
      else res.destroy();
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, opts.host ?? "127.0.0.1", () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://${opts.host ?? "127.0.0.1"}:${port}`,
    state,
    close: () =>
      new Promise<void>((resolve) => {
        for (const release of state.waiters.values()) release(null);
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

async function route(req: IncomingMessage, res: ServerResponse, state: FakeState): Promise<void> {
  const { pathname } = new URL(req.url ?? "/", "http://stand-in");
  const parts = pathname.split("/").filter(Boolean);
  const method = req.method ?? "GET";
  if (method === "OPTIONS") {
    res.writeHead(204, PREFLIGHT);
    return void res.end();
  }
  if (method === "GET" && pathname === "/health") return sendJson(res, 200, { ok: true, files: state.store.list().length });
  if (parts[0] === "_fake") return control(req, res, state, parts[1] ?? "");
  if (method === "POST" && pathname === "/route-metadata") return handleRouteMetadata(req, res, state);
  if (method === "POST" && pathname === "/callback-result") return handleCallbackResult(req, res, state);
  if (method === "POST" && parts[0] === "v6" && parts.length === 2) return handleApi(req, res, state, parts[1]);
  if ((method === "GET" || method === "HEAD") && parts[0] === "f" && parts.length === 2) return handleFile(req, res, state, parts[1]);
  if ((method === "GET" || method === "HEAD") && parts[0] === "a" && parts.length === 3 && parts[1] === state.appId) return handleFile(req, res, state, parts[2]);
  if (parts.length === 1 && method === "HEAD") return handleHead(req, res, state, parts[0]);
  if (parts.length === 1 && method === "PUT") return handlePut(req, res, state, parts[0]);
  sendJson(res, 404, { error: "Not found" });
}

/**
 * GET /_fake/files and /_fake/callbacks (what was stored, each callback's fate); POST
 * /_fake/settings { dropCallbacks, holdTimeoutMs, callbackRetries } to lose callbacks on purpose.
 */
async function control(req: IncomingMessage, res: ServerResponse, state: FakeState, what: string): Promise<void> {
  if (req.method === "GET" && what === "files") return sendJson(res, 200, state.store.list());
  if (req.method === "GET" && what === "callbacks") return sendJson(res, 200, state.deliveries);
  if (req.method === "POST" && what === "settings") {
    const body = (await readJson(req)) ?? {};
    for (const k of ["dropCallbacks", "holdTimeoutMs", "callbackRetries"] as const) {
      const v = body[k];
      if (typeof v === "number" && Number.isInteger(v) && v >= 0) state.settings[k] = v;
    }
    return sendJson(res, 200, state.settings);
  }
  sendJson(res, 404, { error: "Not found" });
}
