// Axisline's app process: Next.js through its documented custom-server API (`next()`,
// `app.prepare()`, `app.getRequestHandler()`) on node:http. It exists for one reason: with
// `next start` a client-sent X-Forwarded-For reaches the app untouched and route handlers cannot
// read the socket address. Here, before Next sees a request, the edge headers of
// lib/net/client-address.ts are written from the socket and the proxy hops we trust
// (TRUST_PROXY_HOPS), replacing whatever the client sent in them.
//   node --import tsx scripts/serve.ts          the production build (NEXT_DIST_DIR), HOST:PORT
//   node --import tsx scripts/serve.ts --dev    the dev server (npm run dev)
// Started with `exec` by scripts/start.sh, start-cluster.sh and test.sh, so its pid is the server's.
import { existsSync } from "node:fs";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { env, EnvError, type Env } from "../lib/env";
import { applyEdgeHeaders } from "../lib/net/edge-headers";

const dev = process.argv.includes("--dev");

function stop(message: string): never {
  console.error(message);
  process.exit(1);
}

// Variables already in the environment win over the file, as in Next.js and scripts/lib.sh.
if (existsSync(".env")) {
  if (typeof process.loadEnvFile !== "function") stop("Axisline cannot start: reading .env needs Node.js 20.12 or later (process.loadEnvFile).");
  process.loadEnvFile(".env");
}
if (dev && process.env.NODE_ENV === "production") stop("Axisline cannot start: --dev asks for the dev server but NODE_ENV is production.");
// Next.js's custom-server guide: the process decides dev or production itself (next start sets production).
// (Next's types mark NODE_ENV read-only for app code; this process is the one that sets it.)
(process.env as Record<string, string | undefined>).NODE_ENV ??= dev ? "development" : "production";

let settings: Env;
try {
  settings = env();
} catch (err) {
  if (err instanceof EnvError) stop(err.message);
  throw err;
}
const { HOST: hostname, PORT: port, TRUST_PROXY_HOPS: trustedHops } = settings;

// Imported after NODE_ENV is settled: Next reads it when it loads.
const { default: next } = await import("next");
const app = next({ dev, hostname, port });
await app.prepare();
const handle = app.getRequestHandler();

function serve(req: IncomingMessage, res: ServerResponse) {
  // Our own incoming request's headers, rewritten before the framework reads them.
  applyEdgeHeaders(req, trustedHops);
  handle(req, res).catch((err: unknown) => {
    console.error("[serve] request failed:", err);
    if (!res.headersSent) {
      res.writeHead(500, { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" });
      res.end("Something went wrong on our side. Please try again in a moment.");
    } else {
      res.destroy();
    }
  });
}

const server = createServer(serve);
server.on("error", (err: NodeJS.ErrnoException) => {
  if (err.code === "EADDRINUSE") stop(`Axisline cannot start: ${hostname}:${port} is already in use (PORT).`);
  if (err.code === "EADDRNOTAVAIL") stop(`Axisline cannot start: ${hostname} is not an address of this machine (HOST).`);
  stop(`Axisline cannot start: listening on ${hostname}:${port} failed (${err.code ?? err.message}).`);
});
server.listen(port, hostname, () => {
  console.log(`[serve] ${dev ? "dev" : "production"} server on http://${hostname}:${port} (trusted proxy hops: ${trustedHops})`);
});

let closing = false;
function shutdown(signal: NodeJS.Signals) {
  if (closing) return;
  closing = true;
  console.log(`[serve] ${signal}: closing`);
  // Stop accepting, drop idle keep-alive connections, let requests in flight finish (at most 5 s).
  server.close(() => {
    void app.close().finally(() => process.exit(0));
  });
  server.closeIdleConnections();
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on("SIGTERM", shutdown);
process.on("SIGINT", shutdown);
